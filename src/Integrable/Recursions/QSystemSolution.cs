using System.Collections.Immutable;
using Integrable.Algebra;

namespace Integrable.Recursions;

/// <summary>A solution Q_{a,n} (1 ≤ a ≤ r, n ≥ 0) of a <see cref="QSystem"/> in a ring, from initial data
/// Q_{a,0}, Q_{a,1}; values are computed on demand and memoised.</summary>
/// <typeparam name="T">The ring element type.</typeparam>
/// <remarks>Asking for Q_{a,n} computes every Q_{b,m} whose ordering key κ(b, m) = d_b·(m − 1) does not
/// exceed κ(a, n) (see <see cref="QSystem"/>), each once, by the exact division
/// Q_{b,m} = (Q_{b,m−1}^2 ∓ Π)/Q_{b,m−2} of the ring. Thread-safe: concurrent readers share one table.</remarks>
/// <example><code>
/// var s = QSystem.FromType("A1").Solve(RationalField.Instance, [1], [2]);
/// var q9 = s[1, 9];   // 10: the A_1 dimensions are n + 1
/// </code></example>
public sealed class QSystemSolution<T>
{
    private readonly List<T>[] _q;
    private readonly object _gate = new();
    private long _nextKey = 1;   // every value with key below this is computed

    internal QSystemSolution(QSystem system, IRing<T> ring, IReadOnlyList<T> level0, IReadOnlyList<T> level1)
    {
        System = system;
        Ring = ring;
        _q = new List<T>[system.Rank];
        for (int a = 0; a < system.Rank; a++) _q[a] = [level0[a], level1[a]];
    }

    /// <summary>The Q-system.</summary>
    public QSystem System { get; }

    /// <summary>The ring of the values.</summary>
    public IRing<T> Ring { get; }

    /// <summary>The value Q_{a,n}.</summary>
    /// <param name="a">The node, 1 ≤ a ≤ r.</param>
    /// <param name="n">The index, n ≥ 0.</param>
    /// <returns>Q_{a,n}.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range.</exception>
    /// <exception cref="SingularStepException">A division Q_{b,m} = (…)/Q_{b,m−2} is not exact in the ring
    /// (or divides by zero); the exception names the term.</exception>
    public T this[int a, int n]
    {
        get
        {
            if ((uint)(a - 1) >= (uint)System.Rank)
                throw new ArgumentOutOfRangeException(nameof(a), a, $"nodes are 1..{System.Rank}");
            ArgumentOutOfRangeException.ThrowIfNegative(n);
            lock (_gate)
            {
                if (n >= _q[a - 1].Count) ExtendTo(System.Key(a - 1, n));
                return _q[a - 1][n];
            }
        }
    }

    /// <summary>All values of one level: Q_{1,n}, …, Q_{r,n}.</summary>
    /// <param name="n">The index, n ≥ 0.</param>
    /// <returns>The values (position p holds Q_{p+1,n}).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="n"/> is negative.</exception>
    /// <exception cref="SingularStepException">A division is not exact in the ring.</exception>
    public ImmutableArray<T> Level(int n)
    {
        var b = ImmutableArray.CreateBuilder<T>(System.Rank);
        for (int a = 1; a <= System.Rank; a++) b.Add(this[a, n]);
        return b.MoveToImmutable();
    }

    /// <summary>Computes every value with key up to <paramref name="key"/>, in increasing key and node order.</summary>
    private void ExtendTo(long key)
    {
        var d = System.Symmetrizer;
        int r = System.Rank;
        for (long k = _nextKey; k <= key; k++)
        {
            for (int b = 0; b < r; b++)
            {
                if (k % d[b] != 0) continue;
                int m = checked((int)(k / d[b] + 1));   // κ(b, m) = d_b·(m − 1) = k
                var list = _q[b];
                global::System.Diagnostics.Debug.Assert(list.Count == m, "values are computed in key order");
                list.Add(Compute(b, m));
            }
            _nextKey = k + 1;
        }
    }

    private T Compute(int b, int m)
    {
        int n = m - 1;
        var ring = Ring;
        var mid = _q[b][n];
        var product = System.Product(ring, b, n, (node, index) => _q[node][index]);
        var square = ring.Multiply(mid, mid);
        var numerator = System.Convention == QSystemConvention.KirillovReshetikhin
            ? ring.Subtract(square, product) : ring.Add(square, product);
        var divisor = _q[b][n - 1];
        if (!ring.TryDivide(numerator, divisor, out var q))
            throw new SingularStepException(m, $"Q_{{{b + 1},{m}}}",
                ring.IsZero(divisor) ? $"Q_{{{b + 1},{m - 2}}} is zero" : $"Q_{{{b + 1},{m - 2}}} = {Short(divisor)} does not divide {Short(numerator)} in {ring}");
        return q;
    }

    private static string Short(T value)
    {
        var s = value?.ToString() ?? "";
        return s.Length <= 200 ? s : s[..200] + "…";
    }
}
