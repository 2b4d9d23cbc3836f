using Integrable.Algebra;

namespace Integrable.Recursions;

/// <summary>The T-system of type A_r (or A_∞): T_{a,j,k+1}·T_{a,j,k−1} = T_{a,j+1,k}·T_{a,j−1,k} + T_{a+1,j,k}·T_{a−1,j,k}
/// on the points with a + j + k even, with the boundary T_{0,j,k} = T_{r+1,j,k} = 1 in type A_r (the
/// octahedron recurrence in a strip; Di Francesco–Kedem, Positivity of the T-system cluster algebra, 2009;
/// Speyer, Perfect matchings and the octahedron recurrence, 2007).</summary>
/// <remarks>
/// <para><b>Initial data</b> are T_{a,j,0} and T_{a,j,1} (the flat stepped surface): T_{a,j,k} for k ≥ 2 is
/// computed in its light cone by <see cref="OctahedronRecurrence"/>.</para>
/// <para><b>Reductions.</b> Since a + j + k is even, the data T_{a,j,0}, T_{a,j,1} live on one parity class of j
/// for each a, so data of period 2 in j are the same as data independent of j. For such data the two
/// j-neighbours coincide and the recurrence becomes the two-index lattice recurrence
/// <see cref="ReducedRecurrence"/>, T_{a,n+1}·T_{a,n−1} = T_{a,n}^2 + T_{a+1,n}·T_{a−1,n}, evaluated by
/// <see cref="EvaluateReduced{T}"/>; in type A_r that is the A_r Q-system in the cluster convention
/// (T_{a,n} = Q_{a,n}).</para>
/// </remarks>
/// <example><code>
/// var t = TSystem.TypeA(2);
/// var v = t.Evaluate(RationalField.Instance, 1, 0, 3, (a, j, k) => Rational.One);
/// var w = TSystem.Unbounded.EvaluateReduced(RationalField.Instance, 0, 4, (a, n) => Rational.One);   // 64
/// </code></example>
public sealed class TSystem
{
    private static readonly Lazy<LatticeRecurrence> Reduced =
        new(() => LatticeRecurrence.Parse("T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n}"));

    private TSystem(int? rank) => Rank = rank;

    /// <summary>The T-system of type A_r: nodes 1 ≤ a ≤ r, with T_{0,j,k} = T_{r+1,j,k} = 1.</summary>
    /// <param name="rank">r ≥ 1.</param>
    /// <returns>The T-system.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="rank"/> is below 1.</exception>
    public static TSystem TypeA(int rank)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(rank, 1);
        return new TSystem(rank);
    }

    /// <summary>The T-system of type A_∞: every a ∈ Z is a node (no boundary); this is the octahedron
    /// recurrence of <see cref="OctahedronRecurrence"/> with coordinates (a, j, k).</summary>
    public static TSystem Unbounded { get; } = new(null);

    /// <summary>The rank r, or null for A_∞.</summary>
    public int? Rank { get; }

    /// <summary>The two-index reduction T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n} as a
    /// <see cref="LatticeRecurrence"/> (space index a, time index n).</summary>
    public static LatticeRecurrence ReducedRecurrence => Reduced.Value;

    /// <summary>Computes T_{a,j,k} from the initial data at k = 0 and k = 1.</summary>
    /// <typeparam name="T">Element type of the domain.</typeparam>
    /// <param name="ring">The domain (needs exact division).</param>
    /// <param name="a">The node (1 ≤ a ≤ r in type A_r).</param>
    /// <param name="j">The second (spectral) index.</param>
    /// <param name="k">The time index k ≥ 0, with a + j + k even.</param>
    /// <param name="initial">T_{a,j,k} for k ∈ {0, 1} with a + j + k even (called only for nodes and only
    /// in the light cone of the wanted value).</param>
    /// <param name="cancellation">Cancels the computation.</param>
    /// <returns>T_{a,j,k}.</returns>
    /// <exception cref="ArgumentException">The point is not a node or a + j + k is odd or k &lt; 0.</exception>
    /// <exception cref="SingularStepException">A division fails in <paramref name="ring"/>.</exception>
    public T Evaluate<T>(IRing<T> ring, int a, int j, int k, Func<int, int, int, T> initial, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(initial);
        CheckNode(a);
        if (k < 0) throw new ArgumentException($"the time index must be at least 0, got {k}", nameof(k));
        if ((((long)a + j + k) & 1) != 0) throw new ArgumentException($"T_{{{a},{j},{k}}} is not defined: a + j + k must be even", nameof(k));
        var surface = SteppedSurface.Flat(0);
        T Initial(int x, int y) => initial(x, y, surface.Height(x, y));
        if (Rank is int r)
        {
            var one = ring.One;
            return OctahedronRecurrence.Evaluate(ring, surface, Initial, a, j, k, (_, _, _) => one, 1, r, cancellation);
        }
        return OctahedronRecurrence.Evaluate(ring, surface, Initial, a, j, k, cancellation);
    }

    /// <summary>Computes T_{a,n} of the two-index reduction <see cref="ReducedRecurrence"/> from T_{a,0} and
    /// T_{a,1}, with the boundary T_{0,n} = T_{r+1,n} = 1 in type A_r.</summary>
    /// <typeparam name="T">Element type of the domain.</typeparam>
    /// <param name="ring">The domain (needs exact division).</param>
    /// <param name="a">The node (1 ≤ a ≤ r in type A_r).</param>
    /// <param name="n">The time index n ≥ 0.</param>
    /// <param name="initial">T_{a,n} for n ∈ {0, 1} (called only for nodes in the light cone).</param>
    /// <param name="cancellation">Cancels the computation.</param>
    /// <returns>T_{a,n}.</returns>
    /// <exception cref="ArgumentException">The node is out of range.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="n"/> is negative.</exception>
    /// <exception cref="SingularStepException">A division fails in <paramref name="ring"/>.</exception>
    public T EvaluateReduced<T>(IRing<T> ring, int a, int n, Func<int, int, T> initial, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(initial);
        CheckNode(a);
        if (Rank is int r)
        {
            var one = ring.One;
            return ReducedRecurrence.Evaluate(ring, a, n, initial, boundary: (_, _) => one, spaceMin: 1, spaceMax: r, cancellation: cancellation);
        }
        return ReducedRecurrence.Evaluate(ring, a, n, initial, cancellation: cancellation);
    }

    /// <summary>The A_r T-system with the spectral index j taken modulo an even period P, as a cluster algebra
    /// (see <see cref="TSystemCluster"/>).</summary>
    /// <param name="period">The period P of the initial data in j: even, at least 2.</param>
    /// <returns>The cluster realisation.</returns>
    /// <exception cref="InvalidOperationException">The T-system is of type A_∞ (the quiver would be infinite).</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="period"/> is odd or below 2.</exception>
    public TSystemCluster ToCluster(int period)
    {
        if (Rank is not int r) throw new InvalidOperationException("the A_∞ T-system has no finite cluster realisation; use TSystem.TypeA(r)");
        if (period < 2 || period % 2 != 0)
            throw new ArgumentOutOfRangeException(nameof(period), period, "the period in j must be even and at least 2");
        return new TSystemCluster(r, period);
    }

    /// <summary>The equation and the type, e.g.
    /// <c>T_{a,j,k+1} T_{a,j,k-1} = T_{a,j+1,k} T_{a,j-1,k} + T_{a+1,j,k} T_{a-1,j,k} (A_3: T_{0,j,k} = T_{4,j,k} = 1)</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "T_{a,j,k+1} T_{a,j,k-1} = T_{a,j+1,k} T_{a,j-1,k} + T_{a+1,j,k} T_{a-1,j,k}" +
        (Rank is int r ? $" (A_{r}: T_{{0,j,k}} = T_{{{r + 1},j,k}} = 1)" : " (A_∞)");

    private void CheckNode(int a)
    {
        if (Rank is int r && (a < 1 || a > r))
            throw new ArgumentException($"node {a} is outside 1..{r} of type A_{r}", nameof(a));
    }
}
