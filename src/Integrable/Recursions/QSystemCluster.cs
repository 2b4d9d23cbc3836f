using System.Collections.Immutable;
using Integrable.Algebra;
using Integrable.Clusters;

namespace Integrable.Recursions;

/// <summary>A Q-system as a cluster algebra: an initial seed whose 2r cluster variables are Q_{1,0}, …, Q_{r,0},
/// Q_{1,1}, …, Q_{r,1}, and a sequence of mutations each of which is one relation of the Q-system in the
/// cluster (plus) convention, Q_{a,n}·Q_{a,n−2} = Q_{a,n−1}^2 + Π (Kedem, Q-systems as cluster algebras, 2008,
/// for the simply-laced types; Di Francesco–Kedem, Q-systems as cluster algebras II, 2009, for all finite types).</summary>
/// <remarks>
/// <para><b>Exchange matrix.</b> In block form, rows and columns ordered (Q_{·,0}, Q_{·,1}),
/// B = [[Cᵀ − C, −Cᵀ], [C, 0]] with C the Cartan matrix. It is skew-symmetric for every finite type (for the
/// simply-laced ones it is [[0, −C], [C, 0]]). Column a has +2 at Q_{a,1}, so the exchange relation at Q_{a,0}
/// is Q_{a,0}·Q_{a,2} = Q_{a,1}^2 + Π_b Q_{b,1}^{−C_ba} — for a short node next to a long one the product also
/// takes factors from level 0 (through the block Cᵀ − C), as the Q-system requires.</para>
/// <para><b>Mutation order.</b> Q_{a,n} is created by mutating the position that holds Q_{a,n−2}; the positions
/// are mutated in increasing κ(a, n) = d_a·(n − 1), ties in node order (the evaluation order of
/// <see cref="QSystemSolution{T}"/>). After one <see cref="Period"/> (κ advanced by 2·max d) the exchange matrix
/// is <see cref="Matrix"/> again and every index has advanced by <see cref="Shift"/>. The constructor checks,
/// for one full period, that every mutation's exchange relation is the Q-system relation for the labels of the
/// current seed, and that the matrix returns.</para>
/// </remarks>
/// <example><code>
/// var cluster = QSystem.FromType("A2", QSystemConvention.Cluster).ToCluster();
/// var ring = QSystem.FromType("A2").InitialDataRing();
/// var q = cluster.Evaluate(ring, [ring.Variable(0), ring.Variable(1)], [ring.Variable(2), ring.Variable(3)], 1, 4);
/// </code></example>
public sealed class QSystemCluster
{
    private readonly int _r;
    private readonly int[] _d;

    internal QSystemCluster(QSystem system)
    {
        System = system;
        int r = _r = system.Rank;
        _d = [.. system.Symmetrizer];
        var c = system.CartanArray;
        var b = new int[2 * r * 2 * r];
        int n = 2 * r;
        for (int i = 0; i < r; i++)
            for (int j = 0; j < r; j++)
            {
                b[i * n + j] = c[j, i] - c[i, j];
                b[i * n + r + j] = -c[j, i];
                b[(r + i) * n + j] = c[i, j];
            }
        Matrix = ExchangeMatrix.FromRows(n, 0, b);
        var labels = ImmutableArray.CreateBuilder<(int, int)>(n);
        for (int a = 1; a <= r; a++) labels.Add((a, 0));
        for (int a = 1; a <= r; a++) labels.Add((a, 1));
        InitialCluster = labels.MoveToImmutable();
        long period = 2L * _d.Max();
        Period = [.. Steps().TakeWhile(s => system.Key(s.Node - 1, s.Index) <= period)];
        Verify();
    }

    /// <summary>The Q-system (in the cluster convention).</summary>
    public QSystem System { get; }

    /// <summary>The initial exchange matrix, 2r×2r.</summary>
    public ExchangeMatrix Matrix { get; }

    /// <summary>The labels (a, n) of the initial cluster: position p holds Q_{p+1,0} for p &lt; r and
    /// Q_{p−r+1,1} for p ≥ r.</summary>
    public ImmutableArray<(int Node, int Index)> InitialCluster { get; }

    /// <summary>The mutations of one period, from the initial seed.</summary>
    public ImmutableArray<QSystemStep> Period { get; }

    /// <summary>How far the index of node a advances in one period: 2·max(d)/d_a.</summary>
    /// <param name="a">The node, 1 ≤ a ≤ r.</param>
    /// <returns>The shift.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="a"/> is out of range.</exception>
    public int Shift(int a)
    {
        if ((uint)(a - 1) >= (uint)_r) throw new ArgumentOutOfRangeException(nameof(a), a, $"nodes are 1..{_r}");
        return 2 * _d.Max() / _d[a - 1];
    }

    /// <summary>The infinite sequence of mutations from the initial seed: every Q_{a,n}, n ≥ 2, once, in
    /// increasing κ(a, n), ties in node order.</summary>
    /// <returns>The steps (enumerate lazily, e.g. with <c>Take</c>).</returns>
    public IEnumerable<QSystemStep> Steps()
    {
        for (long k = 1; ; k++)
            for (int b = 0; b < _r; b++)
            {
                if (k % _d[b] != 0) continue;
                int m = checked((int)(k / _d[b] + 1));
                yield return new QSystemStep((m % 2 == 0 ? b : _r + b) + 1, b + 1, m);
            }
    }

    /// <summary>The initial seed with the given values of Q_{a,0} and Q_{a,1}.</summary>
    /// <typeparam name="T">The ring element type.</typeparam>
    /// <param name="ring">The ring.</param>
    /// <param name="level0">Q_{1,0}, …, Q_{r,0}.</param>
    /// <param name="level1">Q_{1,1}, …, Q_{r,1}.</param>
    /// <returns>The seed (<see cref="Matrix"/>, cluster level0 then level1).</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">A list does not have r entries.</exception>
    public Seed<T> InitialSeed<T>(IRing<T> ring, IReadOnlyList<T> level0, IReadOnlyList<T> level1)
    {
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(level0);
        ArgumentNullException.ThrowIfNull(level1);
        if (level0.Count != _r) throw new ArgumentException($"give Q_{{a,0}} for the {_r} nodes, got {level0.Count} values", nameof(level0));
        if (level1.Count != _r) throw new ArgumentException($"give Q_{{a,1}} for the {_r} nodes, got {level1.Count} values", nameof(level1));
        return new Seed<T>(ring, Matrix, level0.Concat(level1));
    }

    /// <summary>Q_{a,n} computed by mutations only: the initial seed is mutated along <see cref="Steps"/>
    /// until Q_{a,n} is created.</summary>
    /// <typeparam name="T">The ring element type.</typeparam>
    /// <param name="ring">The ring.</param>
    /// <param name="level0">Q_{1,0}, …, Q_{r,0}.</param>
    /// <param name="level1">Q_{1,1}, …, Q_{r,1}.</param>
    /// <param name="a">The node, 1 ≤ a ≤ r.</param>
    /// <param name="n">The index, n ≥ 0.</param>
    /// <returns>The cluster variable Q_{a,n}.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range.</exception>
    /// <exception cref="ExchangeDivisionException">An exchange division fails in the ring.</exception>
    public T Evaluate<T>(IRing<T> ring, IReadOnlyList<T> level0, IReadOnlyList<T> level1, int a, int n)
    {
        var seed = InitialSeed(ring, level0, level1);
        if ((uint)(a - 1) >= (uint)_r) throw new ArgumentOutOfRangeException(nameof(a), a, $"nodes are 1..{_r}");
        ArgumentOutOfRangeException.ThrowIfNegative(n);
        if (n <= 1) return seed[n * _r + a];
        foreach (var step in Steps())
        {
            seed = seed.Mutate(step.Direction);
            if (step.Node == a && step.Index == n) return seed[step.Direction];
        }
        throw new InvalidOperationException("unreachable: the step sequence is infinite");
    }

    /// <summary>Checks one period: each exchange relation is the Q-system relation of the current labels,
    /// and the matrix comes back.</summary>
    private void Verify()
    {
        int n = 2 * _r;
        var labels = InitialCluster.ToArray();
        var b = Matrix;
        foreach (var step in Period)
        {
            int k = step.Direction;
            var want = new Dictionary<(int, int), int>();
            foreach (var t in System.ProductTerms(step.Node, step.Index - 1))
                want[t] = want.GetValueOrDefault(t) + 1;
            var rel = b.ExchangeRelation(k);
            Dictionary<(int, int), int> plus = [], minus = [];
            for (int i = 0; i < n; i++)
            {
                if (rel.PlusExponents[i] != 0) plus[labels[i]] = rel.PlusExponents[i];
                if (rel.MinusExponents[i] != 0) minus[labels[i]] = rel.MinusExponents[i];
            }
            var square = new Dictionary<(int, int), int> { [(step.Node, step.Index - 1)] = 2 };
            bool ok = labels[k - 1] == (step.Node, step.Index - 2)
                && ((Same(plus, square) && Same(minus, want)) || (Same(minus, square) && Same(plus, want)));
            if (!ok)
                throw new InvalidOperationException(
                    $"internal error: the exchange relation in direction {k} does not create Q_{{{step.Node},{step.Index}}} for the Q-system {System}");
            b = b.Mutate(k);
            labels[k - 1] = (step.Node, step.Index);
        }
        if (b != Matrix)
            throw new InvalidOperationException($"internal error: the exchange matrix is not periodic for the Q-system {System}");
        for (int p = 0; p < n; p++)
        {
            var (node, index) = InitialCluster[p];
            if (labels[p] != (node, index + Shift(node)))
                throw new InvalidOperationException($"internal error: position {p + 1} does not advance by the period shift");
        }
    }

    private static bool Same(Dictionary<(int, int), int> x, Dictionary<(int, int), int> y) =>
        x.Count == y.Count && x.All(kv => y.TryGetValue(kv.Key, out int v) && v == kv.Value);
}
