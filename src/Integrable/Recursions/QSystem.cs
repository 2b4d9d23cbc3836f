using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using Integrable.Algebra;
using Integrable.Clusters;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Recursions;

/// <summary>The Q-system of a Cartan matrix C of finite type (A–G): for every node a = 1, …, r and n ≥ 1,
/// Q_{a,n+1}·Q_{a,n−1} = Q_{a,n}^2 ∓ Π_{b: C_ab &lt; 0} Π_{k=0}^{−C_ab−1} Q_{b, ⌊(C_ba·n − k)/C_ab⌋},
/// with the sign chosen by <see cref="Convention"/>.</summary>
/// <remarks>
/// <para><b>Conventions.</b> C_ab = 2(α_a, α_b)/(α_a, α_a) (so in type B_2 with α_2 short, C_12 = −1 and
/// C_21 = −2), the numbering of <see cref="FromType(char, int, QSystemConvention)"/> is Bourbaki's. For a
/// simply-laced type the product is Π_{b adjacent to a} Q_{b,n}; at a long node a next to a short node b
/// (ratio t = |C_ba|) the single factor is Q_{b,t·n}; at a short node a next to a long node b (ratio
/// t = |C_ab|) the t factors are Q_{b,⌊(n+k)/t⌋}, k = 0, …, t − 1 (Hatayama–Kuniba–Okado–Takagi–Yamada,
/// Remarks on fermionic formula, 1999; Kirillov–Reshetikhin 1987). With the minus sign, Q_{a,0} = 1 and
/// Q_{a,1} = dim W^{(a)}_1 the solution is Q_{a,n} = dim W^{(a)}_n (for B_2: Q_{1,2} = 14, Q_{2,2} = 11).</para>
/// <para><b>Order of evaluation.</b> With d the minimal symmetriser (d_a·C_ab = d_b·C_ba, d_a ∝ (α_a, α_a)),
/// every factor of the relation for Q_{a,n+1} has a strictly smaller key κ(b, m) = d_b·(m − 1) than
/// κ(a, n + 1) = d_a·n. Values are therefore computed in increasing κ, ties in node order, which is also
/// the order of the mutations of <see cref="ToCluster"/>.</para>
/// <para>Immutable and thread-safe.</para>
/// </remarks>
/// <example><code>
/// var q = QSystem.FromType("B2");                          // Kirillov–Reshetikhin convention
/// var dims = q.Solve(RationalField.Instance, [1, 1], [5, 4]);
/// var q12 = dims[1, 2];                                    // 14
/// var laurent = QSystem.FromType("A2", QSystemConvention.Cluster).SolveSymbolically();
/// var q13 = laurent[1, 3];                                 // a Laurent polynomial with positive coefficients
/// </code></example>
public sealed partial class QSystem
{
    private readonly int[,] _c;
    private readonly int[] _d;
    private readonly Coupling[][] _couplings;

    /// <summary>A factor group of the product at node a: Q_{b, ⌊(Numerator·n + k)/Denominator⌋} for
    /// k = 0, …, Denominator − 1, where Numerator = |C_ba| and Denominator = |C_ab|.</summary>
    private readonly record struct Coupling(int Node, int Numerator, int Denominator);

    private QSystem(int[,] cartan, int[] d, Coupling[][] couplings, QSystemConvention convention, string? typeName)
    {
        _c = cartan;
        _d = d;
        _couplings = couplings;
        Convention = convention;
        TypeName = typeName;
    }

    /// <summary>The Q-system of a finite type given by name, e.g. <c>A3</c>, <c>B_2</c>, <c>E8</c>
    /// (Bourbaki numbering; see <see cref="ExchangeMatrix.FiniteType(char, int)"/>).</summary>
    /// <param name="name">A family letter A–G followed by the rank, with an optional underscore.</param>
    /// <param name="convention">The sign of the product term.</param>
    /// <returns>The Q-system.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException">The name is not a finite type.</exception>
    public static QSystem FromType(string name, QSystemConvention convention = QSystemConvention.KirillovReshetikhin)
    {
        var (family, rank) = ParseTypeName(name);
        return FromType(family, rank, convention);
    }

    /// <summary>The Q-system of a finite type (Bourbaki numbering).</summary>
    /// <param name="family">One of A, B, C, D, E, F, G (case-insensitive).</param>
    /// <param name="rank">The rank: A r ≥ 1; B, C r ≥ 2; D r ≥ 4; E r ∈ {6, 7, 8}; F r = 4; G r = 2.</param>
    /// <param name="convention">The sign of the product term.</param>
    /// <returns>The Q-system.</returns>
    /// <exception cref="ArgumentException">The family is unknown or the rank is not allowed for it.</exception>
    public static QSystem FromType(char family, int rank, QSystemConvention convention = QSystemConvention.KirillovReshetikhin) =>
        FromCartanMatrix(ExchangeMatrix.CartanMatrix(family, rank), convention);

    /// <summary>The Q-system of a Cartan matrix of finite type.</summary>
    /// <param name="cartan">C with C_aa = 2, C_ab ≤ 0 for a ≠ b, C_ab = 0 exactly when C_ba = 0,
    /// symmetrisable, and of finite type (D·C positive definite for the symmetriser D). The matrix is copied.</param>
    /// <param name="convention">The sign of the product term.</param>
    /// <returns>The Q-system; <see cref="TypeName"/> is set when the matrix is a finite type in Bourbaki numbering.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="cartan"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="cartan"/> is not a Cartan matrix of finite type; the
    /// message names the offending entry or minor.</exception>
    public static QSystem FromCartanMatrix(int[,] cartan, QSystemConvention convention = QSystemConvention.KirillovReshetikhin)
    {
        ArgumentNullException.ThrowIfNull(cartan);
        if (!Enum.IsDefined(convention)) throw new ArgumentOutOfRangeException(nameof(convention), convention, "unknown Q-system convention");
        int r = cartan.GetLength(0);
        if (r < 1 || cartan.GetLength(1) != r)
            throw new ArgumentException($"a Cartan matrix must be square and non-empty, got {r}×{cartan.GetLength(1)}", nameof(cartan));
        var c = (int[,])cartan.Clone();
        for (int a = 0; a < r; a++)
            for (int b = 0; b < r; b++)
            {
                int v = c[a, b];
                if (a == b ? v != 2 : v > 0 || v < -3 || (v == 0) != (c[b, a] == 0))
                    throw new ArgumentException(
                        $"entry C_{a + 1},{b + 1} = {v} is not allowed in a Cartan matrix of finite type " +
                        "(C_aa = 2; -3 <= C_ab <= 0 off the diagonal; C_ab = 0 exactly when C_ba = 0)", nameof(cartan));
            }
        var d = Symmetriser(c);
        CheckPositiveDefinite(c, d);
        var couplings = new Coupling[r][];
        for (int a = 0; a < r; a++)
        {
            var list = new List<Coupling>();
            for (int b = 0; b < r; b++)
                if (b != a && c[a, b] < 0) list.Add(new Coupling(b, -c[b, a], -c[a, b]));
            couplings[a] = [.. list];
        }
        return new QSystem(c, d, couplings, convention, DetectType(c));
    }

    /// <summary>The rank r (number of nodes).</summary>
    public int Rank => _d.Length;

    /// <summary>The sign convention of the product term.</summary>
    public QSystemConvention Convention { get; }

    /// <summary>The finite type in Bourbaki numbering, e.g. <c>B2</c>, or null when the Cartan matrix is of
    /// finite type but numbered differently (or a product of types).</summary>
    public string? TypeName { get; }

    /// <summary>The minimal symmetriser: positive integers d_a with d_a·C_ab = d_b·C_ba, coprime on each
    /// component (d_a is proportional to the squared length of α_a). Position p holds d_{p+1}.</summary>
    public ImmutableArray<int> Symmetrizer => ImmutableArray.Create(_d);

    /// <summary>The Cartan matrix entry C_ab (1-based indices).</summary>
    /// <param name="a">Row, 1 ≤ a ≤ r.</param>
    /// <param name="b">Column, 1 ≤ b ≤ r.</param>
    /// <returns>C_ab.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range.</exception>
    public int CartanEntry(int a, int b)
    {
        CheckNode(a, nameof(a));
        CheckNode(b, nameof(b));
        return _c[a - 1, b - 1];
    }

    /// <summary>A copy of the Cartan matrix (position [a − 1, b − 1] holds C_ab).</summary>
    /// <returns>The matrix.</returns>
    public int[,] GetCartanMatrix() => (int[,])_c.Clone();

    /// <summary>The same Q-system with another sign convention.</summary>
    /// <param name="convention">The convention.</param>
    /// <returns>The Q-system (this one when the convention is already <paramref name="convention"/>).</returns>
    public QSystem WithConvention(QSystemConvention convention)
    {
        if (!Enum.IsDefined(convention)) throw new ArgumentOutOfRangeException(nameof(convention), convention, "unknown Q-system convention");
        return convention == Convention ? this : new QSystem(_c, _d, _couplings, convention, TypeName);
    }

    /// <summary>The factors Q_{b,m} of the product term in the relation for Q_{a,n+1}, in the order of the
    /// formula (b increasing, then k), repeated factors listed once per occurrence.</summary>
    /// <param name="a">The node, 1 ≤ a ≤ r.</param>
    /// <param name="n">The middle index n ≥ 1 of the relation Q_{a,n+1}·Q_{a,n−1} = Q_{a,n}^2 ∓ Π.</param>
    /// <returns>Pairs (node b, index m), 1-based nodes.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is out of range.</exception>
    public ImmutableArray<(int Node, int Index)> ProductTerms(int a, int n)
    {
        CheckNode(a, nameof(a));
        ArgumentOutOfRangeException.ThrowIfNegative(n);
        var result = ImmutableArray.CreateBuilder<(int, int)>();
        foreach (var g in _couplings[a - 1])
            for (int k = 0; k < g.Denominator; k++)
                result.Add((g.Node + 1, FactorIndex(g, n, k)));
        return result.ToImmutable();
    }

    /// <summary>The relation at node <paramref name="a"/> as text, e.g.
    /// <c>Q_{2,n+1} Q_{2,n-1} = Q_{2,n}^2 - Q_{1,⌊n/2⌋} Q_{1,⌊(n+1)/2⌋}</c>.</summary>
    /// <param name="a">The node, 1 ≤ a ≤ r.</param>
    /// <returns>The relation.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="a"/> is out of range.</exception>
    public string Relation(int a)
    {
        CheckNode(a, nameof(a));
        var sb = new StringBuilder();
        sb.Append(CultureInfo.InvariantCulture, $"Q_{{{a},n+1}} Q_{{{a},n-1}} = Q_{{{a},n}}^2 ");
        sb.Append(Convention == QSystemConvention.KirillovReshetikhin ? "- " : "+ ");
        var factors = new List<string>();
        foreach (var g in _couplings[a - 1])
            for (int k = 0; k < g.Denominator; k++)
            {
                string num = g.Numerator == 1 ? "n" : $"{g.Numerator}n";
                string index = g.Denominator == 1 ? num
                    : k == 0 ? $"⌊{num}/{g.Denominator}⌋" : $"⌊({num}+{k})/{g.Denominator}⌋";
                factors.Add($"Q_{{{g.Node + 1},{index}}}");
            }
        sb.Append(factors.Count == 0 ? "1" : string.Join(" ", factors));
        return sb.ToString();
    }

    /// <summary>All relations, one per node, joined by "; ".</summary>
    /// <returns>The text.</returns>
    public override string ToString() => string.Join("; ", Enumerable.Range(1, Rank).Select(Relation));

    /// <summary>The solution from initial data Q_{a,0} and Q_{a,1} in a ring, computed on demand and
    /// memoised.</summary>
    /// <typeparam name="T">The ring element type.</typeparam>
    /// <param name="ring">The ring (exact division through <see cref="IRing{T}.TryDivide"/>).</param>
    /// <param name="level0">Q_{1,0}, …, Q_{r,0}.</param>
    /// <param name="level1">Q_{1,1}, …, Q_{r,1}.</param>
    /// <returns>The solution; values Q_{a,n} are computed when first asked for.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">A list does not have r entries.</exception>
    public QSystemSolution<T> Solve<T>(IRing<T> ring, IReadOnlyList<T> level0, IReadOnlyList<T> level1)
    {
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(level0);
        ArgumentNullException.ThrowIfNull(level1);
        if (level0.Count != Rank) throw new ArgumentException($"give Q_{{a,0}} for the {Rank} nodes, got {level0.Count} values", nameof(level0));
        if (level1.Count != Rank) throw new ArgumentException($"give Q_{{a,1}} for the {Rank} nodes, got {level1.Count} values", nameof(level1));
        return new QSystemSolution<T>(this, ring, level0, level1);
    }

    /// <summary>The solution with symbolic initial data: Laurent polynomials in the 2r variables named
    /// <c>Q_{a,0}</c> and <c>Q_{a,1}</c> (in that order: all of level 0, then level 1).</summary>
    /// <returns>The solution over <see cref="InitialDataRing"/>.</returns>
    public QSystemSolution<LaurentPolynomial> SolveSymbolically()
    {
        var ring = InitialDataRing();
        return Solve(ring, Enumerable.Range(0, Rank).Select(ring.Variable).ToList(),
            Enumerable.Range(Rank, Rank).Select(ring.Variable).ToList());
    }

    /// <summary>The Laurent polynomial ring in the initial data <c>Q_{1,0}</c>, …, <c>Q_{r,0}</c>,
    /// <c>Q_{1,1}</c>, …, <c>Q_{r,1}</c>.</summary>
    /// <returns>The ring.</returns>
    public LaurentPolynomialRing InitialDataRing() =>
        new([.. Enumerable.Range(1, Rank).Select(a => $"Q_{{{a},0}}"), .. Enumerable.Range(1, Rank).Select(a => $"Q_{{{a},1}}")]);

    /// <summary>The Q-system as a cluster algebra: initial seed, exchange matrix and mutation sequence (see
    /// <see cref="QSystemCluster"/>).</summary>
    /// <returns>The cluster realisation.</returns>
    /// <exception cref="InvalidOperationException"><see cref="Convention"/> is
    /// <see cref="QSystemConvention.KirillovReshetikhin"/>: mutations give the plus sign; use
    /// <c>WithConvention(QSystemConvention.Cluster)</c>.</exception>
    public QSystemCluster ToCluster() =>
        Convention == QSystemConvention.Cluster ? new QSystemCluster(this)
            : throw new InvalidOperationException("mutations realise the Q-system with the plus sign; call WithConvention(QSystemConvention.Cluster).ToCluster()");

    /// <summary>The ordering key κ(a, n) = d_a·(n − 1) of Q_{a,n} (0-based node).</summary>
    internal long Key(int node, int n) => (long)_d[node] * (n - 1);

    /// <summary>The factor Q_{b,m} of a coupling for the relation centred at n.</summary>
    private static int FactorIndex(Coupling g, int n, int k) => (int)(((long)g.Numerator * n + k) / g.Denominator);

    /// <summary>The product term of the relation for Q_{a,n+1} (0-based node), with values from <paramref name="value"/>.</summary>
    internal T Product<T>(IRing<T> ring, int node, int n, Func<int, int, T> value)
    {
        T p = ring.One;
        bool any = false;
        foreach (var g in _couplings[node])
            for (int k = 0; k < g.Denominator; k++)
            {
                var f = value(g.Node, FactorIndex(g, n, k));
                p = any ? ring.Multiply(p, f) : f;
                any = true;
            }
        return p;
    }

    internal int[,] CartanArray => _c;

    private void CheckNode(int a, string paramName)
    {
        if ((uint)(a - 1) >= (uint)Rank)
            throw new ArgumentOutOfRangeException(paramName, a, $"nodes are 1..{Rank}");
    }

    private static (char Family, int Rank) ParseTypeName(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        var s = name.Trim();
        var digits = s.Length >= 2 && s[1] == '_' ? s[2..] : s.Length >= 1 ? s[1..] : "";
        if (s.Length < 2 || !int.TryParse(digits, NumberStyles.None, CultureInfo.InvariantCulture, out int rank))
            throw new ArgumentException(
                $"'{name}' is not a finite type name; expected a letter A-G followed by the rank, e.g. A3, B_2, E8", nameof(name));
        return (s[0], rank);
    }

    /// <summary>The minimal positive integer symmetriser, found along the edges of each component.</summary>
    private static int[] Symmetriser(int[,] c)
    {
        int r = c.GetLength(0);
        var ratio = new Rational?[r];
        var d = new int[r];
        for (int root = 0; root < r; root++)
        {
            if (ratio[root] is not null) continue;
            ratio[root] = Rational.One;
            var component = new List<int> { root };
            for (int i = 0; i < component.Count; i++)
            {
                int a = component[i];
                for (int b = 0; b < r; b++)
                {
                    if (b == a || c[a, b] == 0) continue;
                    var want = ratio[a]!.Value * new Rational(c[a, b], c[b, a]);   // d_b = d_a·C_ab/C_ba
                    if (ratio[b] is null) { ratio[b] = want; component.Add(b); }
                    else if (ratio[b]!.Value != want)
                        throw new ArgumentException(
                            $"the Cartan matrix is not symmetrisable: the entries C_{a + 1},{b + 1} and C_{b + 1},{a + 1} contradict the other entries on a cycle through nodes {a + 1} and {b + 1}", "cartan");
                }
            }
            var lcm = System.Numerics.BigInteger.One;
            foreach (int a in component)
            {
                var den = ratio[a]!.Value.Denominator;
                lcm = lcm / System.Numerics.BigInteger.GreatestCommonDivisor(lcm, den) * den;
            }
            var g = System.Numerics.BigInteger.Zero;
            foreach (int a in component) g = System.Numerics.BigInteger.GreatestCommonDivisor(g, (ratio[a]!.Value * new Rational(lcm)).Numerator);
            foreach (int a in component) d[a] = (int)((ratio[a]!.Value * new Rational(lcm)).Numerator / g);
        }
        return d;
    }

    /// <summary>Checks that the symmetric matrix (d_a·C_ab) is positive definite (leading principal minors
    /// positive, by exact elimination), which characterises the finite types.</summary>
    private static void CheckPositiveDefinite(int[,] c, int[] d)
    {
        int r = c.GetLength(0);
        var m = new Rational[r, r];
        for (int a = 0; a < r; a++)
            for (int b = 0; b < r; b++)
                m[a, b] = new Rational((long)d[a] * c[a, b]);
        for (int p = 0; p < r; p++)
        {
            if (m[p, p].Sign <= 0)
                throw new ArgumentException(
                    $"the Cartan matrix is not of finite type: its leading principal minor of size {p + 1} (after symmetrisation) is not positive", "cartan");
            for (int i = p + 1; i < r; i++)
            {
                var f = m[i, p] / m[p, p];
                if (f.IsZero) continue;
                for (int j = p; j < r; j++) m[i, j] -= f * m[p, j];
            }
        }
    }

    private static string? DetectType(int[,] c)
    {
        int r = c.GetLength(0);
        foreach (char family in "ABCDEFG")
        {
            int[,] candidate;
            try
            {
                candidate = ExchangeMatrix.CartanMatrix(family, r);
            }
            catch (ArgumentException)
            {
                continue;
            }
            bool same = true;
            for (int a = 0; a < r && same; a++)
                for (int b = 0; b < r && same; b++)
                    same = candidate[a, b] == c[a, b];
            if (same) return family.ToString() + r.ToString(CultureInfo.InvariantCulture);
        }
        return null;
    }
}
