using System.Collections.Immutable;
using System.Diagnostics;
using System.Numerics;

namespace Integrable.Clusters;

/// <summary>An extended exchange matrix B̃ of a cluster algebra of geometric type: an integer matrix
/// with n columns and n + m rows whose top n×n block (the principal part B, indexed by the mutable
/// directions) is skew-symmetrizable and whose bottom m rows are the coefficient (frozen) rows.</summary>
/// <remarks>
/// <para><b>Indexing.</b> Every index that names a direction, a vertex or an entry is 1-based, as
/// written in the literature and typed by users: entry b_ij is <c>B[i, j]</c> with 1 ≤ i ≤ n + m and
/// 1 ≤ j ≤ n, and μ_k mutates in direction k with 1 ≤ k ≤ n. Rows n+1 … n+m are the frozen rows.
/// Plain containers (the <c>int[,]</c> passed to the constructor, lists returned by properties) keep
/// their usual 0-based positions: position p holds index p + 1.</para>
/// <para><b>Invariant.</b> Checked by every public factory: the principal part is skew-symmetrizable,
/// i.e. there is a diagonal D = diag(d_1, …, d_n) with positive integer entries such that DB is
/// skew-symmetric (d_i b_ij = −d_j b_ji; in particular b_ii = 0). The minimal such D (on each connected
/// component of the diagram the d_i are coprime) is found once and exposed as
/// <see cref="Symmetrizer"/>; mutation preserves it (Fomin–Zelevinsky, Cluster algebras I, 2002,
/// Prop. 4.5). No entry equals <see cref="int.MinValue"/>, so every entry can be negated.</para>
/// <para>Instances are immutable; equality compares the shape and every entry.</para>
/// </remarks>
/// <example><code>
/// var b = ExchangeMatrix.Parse("[[0,1],[-1,0]]");   // type A_2
/// var b1 = b.Mutate(1);                             // [[0,-1],[1,0]]
/// var e8 = ExchangeMatrix.FiniteType("E8");
/// </code></example>
[DebuggerDisplay("{ToString(),nq}")]
public sealed partial class ExchangeMatrix : IEquatable<ExchangeMatrix>
{
    private readonly int[] _b;      // row-major, (n + m) rows of n entries
    private readonly long[] _d;     // minimal symmetriser, length n
    private int _hash;              // computed on first use; 0 = not yet (a computed 0 is stored as 1)

    /// <summary>Creates an exchange matrix from its entries; the number of columns is the number n of
    /// mutable directions and the rows after the first n are frozen (coefficient) rows.</summary>
    /// <param name="entries">The (n + m)×n matrix; <c>entries[i - 1, j - 1]</c> is b_ij.</param>
    /// <exception cref="ArgumentNullException"><paramref name="entries"/> is null.</exception>
    /// <exception cref="ArgumentException">There are no columns, fewer rows than columns, or an entry
    /// equals <see cref="int.MinValue"/>.</exception>
    /// <exception cref="NotSkewSymmetrizableException">The principal part is not skew-symmetrizable.</exception>
    public ExchangeMatrix(int[,] entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        int rows = entries.GetLength(0), n = entries.GetLength(1);
        CheckShape(n, rows - n, nameof(entries));
        var b = new int[rows * n];
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < n; j++)
                b[i * n + j] = entries[i, j];
        MutableCount = n;
        FrozenCount = rows - n;
        _b = b;
        _d = FindSymmetrizer(n, b, nameof(entries));
    }

    /// <summary>Trusted constructor: the caller guarantees shape, entries and symmetriser.</summary>
    private ExchangeMatrix(int n, int m, int[] b, long[] d)
    {
        Debug.Assert(b.Length == (n + m) * n && d.Length == n);
        MutableCount = n;
        FrozenCount = m;
        _b = b;
        _d = d;
    }

    /// <summary>Creates an exchange matrix from its entries listed row by row.</summary>
    /// <param name="mutableCount">n, the number of columns and of mutable rows; at least 1.</param>
    /// <param name="frozenCount">m, the number of frozen rows; at least 0.</param>
    /// <param name="rowMajor">The (n + m)·n entries, row after row.</param>
    /// <returns>The matrix.</returns>
    /// <exception cref="ArgumentException">Sizes are out of range, the span has the wrong length, or an
    /// entry equals <see cref="int.MinValue"/>.</exception>
    /// <exception cref="NotSkewSymmetrizableException">The principal part is not skew-symmetrizable.</exception>
    public static ExchangeMatrix FromRows(int mutableCount, int frozenCount, ReadOnlySpan<int> rowMajor)
    {
        CheckShape(mutableCount, frozenCount, nameof(mutableCount), nameof(frozenCount));
        long expected = (long)(mutableCount + frozenCount) * mutableCount;
        if (rowMajor.Length != expected)
            throw new ArgumentException(
                $"expected {expected} entries for {mutableCount + frozenCount} rows of {mutableCount}, got {rowMajor.Length}",
                nameof(rowMajor));
        var b = rowMajor.ToArray();
        return new ExchangeMatrix(mutableCount, frozenCount, b, FindSymmetrizer(mutableCount, b, nameof(rowMajor)));
    }

    /// <summary>Trusted factory for internal callers that already hold a valid matrix and its symmetriser.</summary>
    internal static ExchangeMatrix CreateUnchecked(int n, int m, int[] b, long[] d) => new(n, m, b, d);

    private static void CheckShape(int n, int m, string paramName, string? frozenParamName = null)
    {
        if (n < 1)
            throw new ArgumentException($"an exchange matrix needs at least one column (mutable direction), got {n}", paramName);
        if (m < 0)
            throw frozenParamName is null
                ? new ArgumentException(
                    $"an exchange matrix with {n} columns needs at least {n} rows (n mutable rows, then frozen rows), got {n + m}", paramName)
                : new ArgumentException($"the number of frozen rows must be at least 0, got {m}", frozenParamName);
    }

    /// <summary>n: the number of mutable directions (columns, and the first rows).</summary>
    public int MutableCount { get; }

    /// <summary>m: the number of frozen (coefficient) rows, below the mutable rows.</summary>
    public int FrozenCount { get; }

    /// <summary>n + m: the number of rows.</summary>
    public int RowCount => MutableCount + FrozenCount;

    /// <summary>Entry b_ij with 1-based indices.</summary>
    /// <param name="i">Row, 1 ≤ i ≤ n + m (rows above n are frozen).</param>
    /// <param name="j">Column, 1 ≤ j ≤ n.</param>
    /// <returns>b_ij.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range.</exception>
    public int this[int i, int j]
    {
        get
        {
            if ((uint)(i - 1) >= (uint)RowCount)
                throw new ArgumentOutOfRangeException(nameof(i), i, $"row index must be in 1..{RowCount}");
            if ((uint)(j - 1) >= (uint)MutableCount)
                throw new ArgumentOutOfRangeException(nameof(j), j, $"column index must be in 1..{MutableCount}");
            return _b[(i - 1) * MutableCount + j - 1];
        }
    }

    /// <summary>The minimal symmetriser: d_1, …, d_n &gt; 0 with d_i b_ij = −d_j b_ji for 1 ≤ i, j ≤ n,
    /// coprime on each connected component of the diagram (position p holds d_{p+1}).</summary>
    public ImmutableArray<long> Symmetrizer => ImmutableArray.Create(_d);

    /// <summary>True when the principal part is skew-symmetric (b_ij = −b_ji), i.e. B̃ is the matrix of
    /// a quiver; see <see cref="Quiver"/>.</summary>
    public bool IsSkewSymmetric
    {
        get
        {
            int n = MutableCount;
            for (int i = 0; i < n; i++)
                for (int j = i + 1; j < n; j++)
                    if (_b[i * n + j] != -_b[j * n + i]) return false;
            return true;
        }
    }

    /// <summary>The principal part B: the n×n matrix of the mutable rows, with no frozen rows.</summary>
    public ExchangeMatrix PrincipalPart =>
        FrozenCount == 0 ? this : new ExchangeMatrix(MutableCount, 0, _b[..(MutableCount * MutableCount)], _d);

    /// <summary>A copy of the entries as a 2-D array: <c>result[i - 1, j - 1]</c> is b_ij.</summary>
    /// <returns>A new (n + m)×n array.</returns>
    public int[,] ToArray()
    {
        int n = MutableCount, rows = RowCount;
        var a = new int[rows, n];
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < n; j++)
                a[i, j] = _b[i * n + j];
        return a;
    }

    /// <summary>Raw row-major entries, for internal kernels (do not modify).</summary>
    internal int[] Entries => _b;

    /// <summary>Raw symmetriser, for internal kernels (do not modify).</summary>
    internal long[] SymmetrizerArray => _d;

    /// <summary>Entry at 0-based row and column, unchecked, for internal kernels.</summary>
    internal int At(int row, int column) => _b[row * MutableCount + column];

    /// <inheritdoc/>
    public bool Equals(ExchangeMatrix? other) =>
        other is not null && (ReferenceEquals(this, other) ||
            (other.GetHashCode() == GetHashCode() && other.MutableCount == MutableCount && other.FrozenCount == FrozenCount
             && other._b.AsSpan().SequenceEqual(_b)));

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as ExchangeMatrix);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        int h = _hash;
        if (h == 0)
        {
            h = ComputeHash(MutableCount, FrozenCount, _b);
            if (h == 0) h = 1;
            _hash = h;   // benign race: every thread computes the same value
        }
        return h;
    }

    /// <summary>Value equality.</summary>
    /// <param name="left">First matrix.</param>
    /// <param name="right">Second matrix.</param>
    /// <returns>True when both are null or equal.</returns>
    public static bool operator ==(ExchangeMatrix? left, ExchangeMatrix? right) =>
        left is null ? right is null : left.Equals(right);

    /// <summary>Value inequality.</summary>
    /// <param name="left">First matrix.</param>
    /// <param name="right">Second matrix.</param>
    /// <returns>True when not equal.</returns>
    public static bool operator !=(ExchangeMatrix? left, ExchangeMatrix? right) => !(left == right);

    private static int ComputeHash(int n, int m, int[] b)
    {
        var h = new HashCode();
        h.Add(n);
        h.Add(m);
        foreach (int x in b) h.Add(x);
        return h.ToHashCode();
    }

    /// <summary>Checks the entries and finds the minimal symmetriser of the principal part.</summary>
    /// <remarks>On each connected component of the graph {i ~ j : b_ij ≠ 0} the ratios d_j/d_i = −b_ij/b_ji
    /// are propagated along a spanning tree from the lowest vertex (d = 1) as exact rationals, every
    /// other edge is checked against them, and the component is scaled to coprime positive integers.</remarks>
    private static long[] FindSymmetrizer(int n, int[] b, string paramName)
    {
        for (int p = 0; p < b.Length; p++)
            if (b[p] == int.MinValue)
                throw new ArgumentException(
                    $"entry b_{p / n + 1},{p % n + 1} = {int.MinValue} is out of range (its negation overflows)", paramName);

        for (int i = 0; i < n; i++)
            if (b[i * n + i] != 0)
                throw new NotSkewSymmetrizableException(i + 1, i + 1,
                    $"diagonal entry b_{i + 1},{i + 1} = {b[i * n + i]} must be 0 for the matrix to be skew-symmetrizable");

        for (int i = 0; i < n; i++)
            for (int j = i + 1; j < n; j++)
            {
                int bij = b[i * n + j], bji = b[j * n + i];
                if (Math.Sign(bij) != -Math.Sign(bji))
                    throw new NotSkewSymmetrizableException(i + 1, j + 1,
                        $"b_{i + 1},{j + 1} = {bij} and b_{j + 1},{i + 1} = {bji} must both be 0 or have opposite signs " +
                        "for the matrix to be skew-symmetrizable");
            }

        // Exact ratios r_i = d_i / d_root as numerator/denominator big integers.
        var num = new BigInteger[n];
        var den = new BigInteger[n];
        var seen = new bool[n];
        var d = new long[n];
        var component = new List<int>();
        var queue = new Queue<int>();
        for (int root = 0; root < n; root++)
        {
            if (seen[root]) continue;
            component.Clear();
            seen[root] = true;
            num[root] = BigInteger.One;
            den[root] = BigInteger.One;
            queue.Enqueue(root);
            while (queue.Count > 0)
            {
                int i = queue.Dequeue();
                component.Add(i);
                for (int j = 0; j < n; j++)
                {
                    int bij = b[i * n + j];
                    if (bij == 0 || j == i) continue;
                    int bji = b[j * n + i];
                    // d_j = d_i · b_ij / (−b_ji), with b_ij and −b_ji of the same sign.
                    BigInteger nj = num[i] * Math.Abs(bij), dj = den[i] * Math.Abs(bji);
                    if (!seen[j])
                    {
                        var g = BigInteger.GreatestCommonDivisor(nj, dj);
                        num[j] = nj / g;
                        den[j] = dj / g;
                        seen[j] = true;
                        queue.Enqueue(j);
                    }
                    else if (num[j] * dj != nj * den[j])
                    {
                        throw new NotSkewSymmetrizableException(i + 1, j + 1,
                            $"no positive diagonal D makes DB skew-symmetric: the ratio d_{j + 1}/d_{i + 1} = " +
                            $"-b_{i + 1},{j + 1}/b_{j + 1},{i + 1} = {Math.Abs(bij)}/{Math.Abs(bji)} contradicts the other entries " +
                            "on a cycle through these vertices");
                    }
                }
            }
            BigInteger lcm = BigInteger.One;
            foreach (int i in component) lcm = lcm / BigInteger.GreatestCommonDivisor(lcm, den[i]) * den[i];
            BigInteger gcd = BigInteger.Zero;
            foreach (int i in component) gcd = BigInteger.GreatestCommonDivisor(gcd, num[i] * (lcm / den[i]));
            foreach (int i in component)
            {
                var v = num[i] * (lcm / den[i]) / gcd;
                if (v > long.MaxValue)
                    throw new OverflowException(
                        $"the symmetriser entry d_{i + 1} = {v} does not fit in a 64-bit integer");
                d[i] = (long)v;
            }
        }
        return d;
    }
}
