using System.Collections.Immutable;
using Integrable.Algebra;
using Integrable.Clusters;

namespace Integrable.Recursions;

/// <summary>The A_r T-system with initial data of even period P in the spectral index j, as a cluster
/// algebra: one cluster variable per vertex (a, j), 1 ≤ a ≤ r, 0 ≤ j &lt; P, holding T_{a,j,k} at the latest
/// or second-latest time k; one round of mutations at all vertices of one parity advances that parity class
/// by two time steps (Di Francesco–Kedem, Positivity of the T-system cluster algebra, 2009).</summary>
/// <remarks>
/// <para><b>Quiver.</b> Vertex (a, j) sits at seed position (a − 1)·P + j + 1 and initially holds T_{a,j,k} with
/// k = (a + j) mod 2. With ε(a, j) = +1 when a + j is even and −1 otherwise, b_{u,v} adds ε(u) for each of the two
/// j-neighbours v = (a, j ± 1 mod P) and −ε(u) for each a-neighbour v = (a ± 1, j) with 1 ≤ a ± 1 ≤ r (the
/// boundary nodes 0 and r + 1 carry the value 1 and are left out). For P = 2 the two j-neighbours coincide
/// (entries ±2) and the mutations reproduce the two-index reduction, i.e. the A_r Q-system.</para>
/// <para><b>Mutations.</b> Round s = 0, 1, 2, … mutates, in position order, every vertex with a + j ≡ s
/// (mod 2); these vertices are pairwise unconnected, and μ at (a, j) gives
/// T_{a,j,s+2}·T_{a,j,s} = T_{a+1,j,s+1}·T_{a−1,j,s+1} + T_{a,j+1,s+1}·T_{a,j−1,s+1}. After a round the matrix is
/// the same rule with ε negated, so it returns after two rounds; the constructor checks both rounds.</para>
/// </remarks>
/// <example><code>
/// var cluster = TSystem.TypeA(2).ToCluster(4);
/// var v = cluster.Evaluate(RationalField.Instance, (a, j, k) => Rational.One, 1, 1, 4);
/// </code></example>
public sealed class TSystemCluster
{
    internal TSystemCluster(int rank, int period)
    {
        Rank = rank;
        SitePeriod = period;
        int n = rank * period;
        var b = new int[n * n];
        for (int a = 1; a <= rank; a++)
            for (int j = 0; j < period; j++)
            {
                int u = Position(a, j) - 1, e = Epsilon(a, j);
                b[u * n + Position(a, (j + 1) % period) - 1] += e;
                b[u * n + Position(a, (j + period - 1) % period) - 1] += e;
                if (a < rank) b[u * n + Position(a + 1, j) - 1] -= e;
                if (a > 1) b[u * n + Position(a - 1, j) - 1] -= e;
            }
        Matrix = ExchangeMatrix.FromRows(n, 0, b);
        var labels = ImmutableArray.CreateBuilder<(int, int, int)>(n);
        for (int a = 1; a <= rank; a++)
            for (int j = 0; j < period; j++) labels.Add((a, j, (a + j) % 2));
        InitialCluster = labels.MoveToImmutable();
        Verify();
    }

    /// <summary>The rank r.</summary>
    public int Rank { get; }

    /// <summary>The period P of the spectral index j.</summary>
    public int SitePeriod { get; }

    /// <summary>The initial exchange matrix, (r·P)×(r·P).</summary>
    public ExchangeMatrix Matrix { get; }

    /// <summary>The labels (a, j, k) of the initial cluster, position p holding T_{a,j,k} for
    /// p = (a − 1)·P + j, k = (a + j) mod 2.</summary>
    public ImmutableArray<(int Node, int Site, int Time)> InitialCluster { get; }

    /// <summary>The 1-based seed position of the vertex (a, j).</summary>
    /// <param name="a">The node, 1 ≤ a ≤ r.</param>
    /// <param name="j">The site; taken modulo P.</param>
    /// <returns>(a − 1)·P + (j mod P) + 1.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="a"/> is out of range.</exception>
    public int Position(int a, int j)
    {
        if (a < 1 || a > Rank) throw new ArgumentOutOfRangeException(nameof(a), a, $"nodes are 1..{Rank}");
        return (a - 1) * SitePeriod + Mod(j, SitePeriod) + 1;
    }

    /// <summary>The infinite sequence of mutations: round s = 0, 1, … creates T_{a,j,s+2} for every vertex with
    /// a + j ≡ s (mod 2), in position order.</summary>
    /// <returns>The steps (enumerate lazily).</returns>
    public IEnumerable<TSystemStep> Steps()
    {
        for (int s = 0; ; s++)
            for (int a = 1; a <= Rank; a++)
                for (int j = 0; j < SitePeriod; j++)
                    if (((a + j - s) & 1) == 0)
                        yield return new TSystemStep(Position(a, j), a, j, checked(s + 2));
    }

    /// <summary>The initial seed with values T_{a,j,k} from <paramref name="initial"/> (k = (a + j) mod 2).</summary>
    /// <typeparam name="T">The ring element type.</typeparam>
    /// <param name="ring">The ring.</param>
    /// <param name="initial">T_{a,j,k} for 1 ≤ a ≤ r, 0 ≤ j &lt; P, k ∈ {0, 1}, a + j + k even.</param>
    /// <returns>The seed.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public Seed<T> InitialSeed<T>(IRing<T> ring, Func<int, int, int, T> initial)
    {
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(initial);
        return new Seed<T>(ring, Matrix, InitialCluster.Select(l => initial(l.Node, l.Site, l.Time)));
    }

    /// <summary>T_{a,j,k} computed by mutations only (j modulo P).</summary>
    /// <typeparam name="T">The ring element type.</typeparam>
    /// <param name="ring">The ring.</param>
    /// <param name="initial">The initial data, as for <see cref="InitialSeed{T}"/>.</param>
    /// <param name="a">The node, 1 ≤ a ≤ r.</param>
    /// <param name="j">The site (any integer; taken modulo P).</param>
    /// <param name="k">The time, k ≥ 0 with a + j + k even.</param>
    /// <returns>The cluster variable T_{a,j,k}.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range.</exception>
    /// <exception cref="ArgumentException">a + j + k is odd.</exception>
    /// <exception cref="ExchangeDivisionException">An exchange division fails in the ring.</exception>
    public T Evaluate<T>(IRing<T> ring, Func<int, int, int, T> initial, int a, int j, int k)
    {
        int p = Position(a, j);
        ArgumentOutOfRangeException.ThrowIfNegative(k);
        if ((((long)a + j + k) & 1) != 0) throw new ArgumentException($"T_{{{a},{j},{k}}} is not defined: a + j + k must be even", nameof(k));
        var seed = InitialSeed(ring, initial);
        if (k <= 1) return seed[p];
        foreach (var step in Steps())
        {
            seed = seed.Mutate(step.Direction);
            if (step.Direction == p && step.Time == k) return seed[p];
        }
        throw new InvalidOperationException("unreachable: the step sequence is infinite");
    }

    private int Epsilon(int a, int j) => ((a + j) & 1) == 0 ? 1 : -1;

    private static int Mod(int x, int m) => ((x % m) + m) % m;

    /// <summary>Checks two rounds: each exchange relation is the T-system relation of the current labels, and
    /// the matrix comes back.</summary>
    private void Verify()
    {
        int n = Rank * SitePeriod;
        var labels = InitialCluster.ToArray();
        var b = Matrix;
        foreach (var step in Steps().TakeWhile(s => s.Time <= 3))
        {
            int a = step.Node, j = step.Site, t = step.Time - 1;
            var rel = b.ExchangeRelation(step.Direction);
            var aSide = new Dictionary<(int, int, int), int>();
            if (a < Rank) aSide[(a + 1, j, t)] = 1;
            if (a > 1) aSide[(a - 1, j, t)] = 1;
            var jSide = new Dictionary<(int, int, int), int>();
            foreach (int s in new[] { 1, -1 })
            {
                var key = (a, Mod(j + s, SitePeriod), t);
                jSide[key] = jSide.GetValueOrDefault(key) + 1;
            }
            Dictionary<(int, int, int), int> plus = [], minus = [];
            for (int i = 0; i < n; i++)
            {
                if (rel.PlusExponents[i] != 0) plus[labels[i]] = rel.PlusExponents[i];
                if (rel.MinusExponents[i] != 0) minus[labels[i]] = rel.MinusExponents[i];
            }
            bool ok = labels[step.Direction - 1] == (a, j, t - 1)
                && ((Same(plus, aSide) && Same(minus, jSide)) || (Same(minus, aSide) && Same(plus, jSide)));
            if (!ok)
                throw new InvalidOperationException($"internal error: the exchange relation in direction {step.Direction} does not create T_{{{a},{j},{step.Time}}}");
            b = b.Mutate(step.Direction);
            labels[step.Direction - 1] = (a, j, step.Time);
        }
        if (b != Matrix) throw new InvalidOperationException("internal error: the T-system exchange matrix is not periodic");
    }

    private static bool Same(Dictionary<(int, int, int), int> x, Dictionary<(int, int, int), int> y) =>
        x.Count == y.Count && x.All(kv => y.TryGetValue(kv.Key, out int v) && v == kv.Value);
}
