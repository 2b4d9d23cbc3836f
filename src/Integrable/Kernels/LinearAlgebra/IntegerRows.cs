using System.Buffers;
using System.Runtime.CompilerServices;
using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Kernels.LinearAlgebra;

/// <summary>An integer matrix B obtained from a rational matrix A by clearing denominators row by row:
/// row i of B is L_i times row i of A, where L_i is the least common multiple of the denominators of
/// that row. B has the same rank profile, reduced row echelon form and right kernel as A.</summary>
/// <remarks>Entries are stored as words when every entry fits (<see cref="Small"/>), otherwise as big
/// integers with a pool of magnitude words used for fast reduction modulo word-size primes and for the
/// exact kernel checks.</remarks>
internal sealed class IntegerRows : IDisposable
{
    private readonly ulong[]? _words;     // magnitudes of the big entries, little-endian words
    private readonly int[]? _start;       // entry e occupies _words[_start[e] .. _start[e + 1])
    private readonly bool[]? _negative;
    private BigInteger[]? _big;

    private IntegerRows(int rows, int cols, long[] small, BigInteger[] rowScales)
    {
        Rows = rows;
        Cols = cols;
        Small = small;
        RowScales = rowScales;
        long maxAbs = 0;
        foreach (var v in small.AsSpan(0, rows * cols)) { long a = v < 0 ? -v : v; if (a > maxAbs) maxAbs = a; }
        MaxBits = 64 - BitOperations.LeadingZeroCount((ulong)maxAbs);
        TotalWords = small.Length;
    }

    private IntegerRows(int rows, int cols, ulong[] words, int[] start, bool[] negative, BigInteger[] rowScales)
    {
        Rows = rows;
        Cols = cols;
        _words = words;
        _start = start;
        _negative = negative;
        RowScales = rowScales;
        long maxBits = 0;
        for (int e = 0; e < negative.Length; e++)
        {
            int len = start[e + 1] - start[e];
            if (len == 0) continue;
            long bits = 64L * (len - 1) + 64 - BitOperations.LeadingZeroCount(words[start[e + 1] - 1]);
            if (bits > maxBits) maxBits = bits;
        }
        MaxBits = maxBits;
        TotalWords = words.Length;
    }

    public int Rows { get; }
    public int Cols { get; }

    /// <summary>Row-major entries when every one fits in a word (a pooled array, possibly longer than
    /// Rows × Cols); null otherwise.</summary>
    public long[]? Small { get; private set; }

    /// <summary>Returns the pooled word array; the object must not be used afterwards.</summary>
    public void Dispose()
    {
        if (Small is { Length: > 0 } s) ArrayPool<long>.Shared.Return(s);
        Small = null;
    }

    /// <summary>Bit length of entry (i, j) (0 for zero).</summary>
    public long EntryBits(int i, int j)
    {
        int e = i * Cols + j;
        if (Small is not null)
        {
            long v = Small[e];
            return 64 - BitOperations.LeadingZeroCount(IntegerMath.UnsignedAbs(v));
        }
        int len = _start![e + 1] - _start[e];
        return len == 0 ? 0 : 64L * (len - 1) + 64 - BitOperations.LeadingZeroCount(_words![_start[e + 1] - 1]);
    }

    /// <summary>The factors L_i by which the rows of the rational matrix were multiplied.</summary>
    public BigInteger[] RowScales { get; }

    /// <summary>Largest bit length of an entry.</summary>
    public long MaxBits { get; }

    /// <summary>Total number of words of all entries (a size measure for cost estimates).</summary>
    public long TotalWords { get; }

    /// <summary>Entry (i, j) as a big integer.</summary>
    public BigInteger Entry(int i, int j) => Small is not null ? Small[i * Cols + j] : BigEntries()[i * Cols + j];

    private BigInteger[] BigEntries()
    {
        var big = Volatile.Read(ref _big);
        if (big is not null) return big;
        big = new BigInteger[Rows * Cols];
        for (int e = 0; e < big.Length; e++)
            big[e] = WordArithmetic.ToBigInteger(_words.AsSpan(_start![e], _start[e + 1] - _start[e]), _negative![e]);
        Volatile.Write(ref _big, big);
        return big;
    }

    /// <summary>All entries as big integers (a fresh row-major array).</summary>
    public BigInteger[] ToBigIntegers()
    {
        var r = new BigInteger[Rows * Cols];
        if (Small is not null) for (int e = 0; e < r.Length; e++) r[e] = Small[e];
        else BigEntries().CopyTo(r, 0);
        return r;
    }

    /// <summary>Clears the denominators of a rational matrix row by row.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static IntegerRows FromRational(ReadOnlySpan<Rational> a, int rows, int cols)
    {
        var small = TryClearSmall(a, rows, cols, out var smallScales);
        if (small is not null) return new IntegerRows(rows, cols, small, smallScales!);
        return ClearBig(a, rows, cols);
    }

    /// <summary>Row clearing with big entries, on word arrays: the lcm of each row's denominators is
    /// built largest first; a denominator that already divides it is detected by exact (2-adic)
    /// division, which also yields the quotient, and only the others need a gcd. Quotients computed
    /// before the lcm grew are scaled by the cofactors added later.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static IntegerRows ClearBig(ReadOnlySpan<Rational> a, int rows, int cols)
    {
        var pool = new List<ulong[]>(rows * cols);
        var negative = new bool[rows * cols];
        var scales = new BigInteger[rows];
        var order = new int[cols];
        var bits = new long[cols];
        var quotient = new ulong[]?[cols];
        var step = new int[cols];
        ulong[] one = [1];
        for (int i = 0; i < rows; i++)
        {
            var row = a.Slice(i * cols, cols);
            for (int j = 0; j < cols; j++) { order[j] = j; bits[j] = row[j].IsInteger ? 0 : row[j].Denominator.GetBitLength(); }
            Array.Sort(bits, order);
            ulong[]? l = null;
            var cofactors = new List<ulong[]>();
            Array.Clear(quotient);
            for (int t = cols - 1; t >= 0 && bits[t] > 0; t--)
            {
                int j = order[t];
                var d = Words(row[j].Denominator);
                if (l is null) { l = d; quotient[j] = one; step[j] = 0; continue; }
                var q = WordArithmetic.TryDivideExact(l, d);
                if (q is not null) { quotient[j] = q; step[j] = cofactors.Count; continue; }
                var lb = WordArithmetic.ToBigInteger(l, false);
                var db = row[j].Denominator;
                var gw = Words(BigInteger.GreatestCommonDivisor(lb, db));
                var c = WordArithmetic.TryDivideExact(d, gw) ?? throw new InvalidOperationException("gcd does not divide");
                quotient[j] = WordArithmetic.TryDivideExact(l, gw) ?? throw new InvalidOperationException("gcd does not divide");
                cofactors.Add(c);
                step[j] = cofactors.Count;
                l = WordArithmetic.Multiply(l, c);
            }
            // suffix[s] = product of the cofactors added at steps s, s+1, …
            var suffix = new ulong[cofactors.Count + 1][];
            suffix[cofactors.Count] = one;
            for (int s2 = cofactors.Count - 1; s2 >= 0; s2--) suffix[s2] = WordArithmetic.Multiply(cofactors[s2], suffix[s2 + 1]);
            var lFinal = l ?? one;
            scales[i] = WordArithmetic.ToBigInteger(lFinal, false);
            for (int j = 0; j < cols; j++)
            {
                var x = row[j];
                negative[i * cols + j] = x.Sign < 0;
                if (x.IsZero) { pool.Add([]); continue; }
                ulong[] q;
                if (x.IsInteger) q = lFinal;
                else
                {
                    q = quotient[j]!;
                    var scale = suffix[step[j]];
                    if (!(scale.Length == 1 && scale[0] == 1)) q = WordArithmetic.Multiply(q, scale);
                }
                var n = Words(x.Numerator);
                pool.Add(q.Length == 1 && q[0] == 1 ? n : WordArithmetic.Multiply(n, q));
            }
        }
        var start = new int[rows * cols + 1];
        long total = 0;
        for (int e = 0; e < pool.Count; e++) { start[e] = checked((int)total); total += pool[e].Length; }
        start[pool.Count] = checked((int)total);
        var words = new ulong[total];
        for (int e = 0; e < pool.Count; e++) pool[e].CopyTo(words, start[e]);
        return new IntegerRows(rows, cols, words, start, negative, scales);
    }

    private static ulong[] Words(BigInteger v)
    {
        var w = new ulong[WordArithmetic.WordCount(v)];
        WordArithmetic.WriteMagnitude(v, w);
        return w;
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static long[]? TryClearSmall(ReadOnlySpan<Rational> a, int rows, int cols, out BigInteger[]? scales)
    {
        scales = null;
        var b = ArrayPool<long>.Shared.Rent(rows * cols);
        var sc = new BigInteger[rows];
        for (int i = 0; i < rows; i++)
        {
            long l = 1;
            for (int j = 0; j < cols; j++)
            {
                if (!a[i * cols + j].TryGetSmall(out _, out long d)) { ArrayPool<long>.Shared.Return(b); return null; }
                if (d == 1) continue;
                long g = (long)IntegerMath.Gcd(l, d);
                if (!TryMultiply(l / g, d, out l)) { ArrayPool<long>.Shared.Return(b); return null; }
            }
            sc[i] = l;
            if (l == 1)
            {
                // An integer row: the numerators are the entries.
                for (int j = 0; j < cols; j++)
                {
                    a[i * cols + j].TryGetSmall(out long n, out _);
                    b[i * cols + j] = n;
                }
                continue;
            }
            for (int j = 0; j < cols; j++)
            {
                a[i * cols + j].TryGetSmall(out long n, out long d);
                if (!TryMultiply(n, l / d, out long v) || v == long.MinValue) { ArrayPool<long>.Shared.Return(b); return null; }
                b[i * cols + j] = v;
            }
        }
        scales = sc;
        return b;
    }

    private static bool TryMultiply(long x, long y, out long product)
    {
        long hi = Math.BigMul(x, y, out product);
        return hi == (product >> 63);
    }

    /// <summary>Writes B mod p in column-major order: entry (i, j) at j·Rows + i.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void ReduceColumnMajor(ModularReducer reducer, Span<ulong> destination)
    {
        int rows = Rows, cols = Cols;
        if (Small is not null)
        {
            var s = Small;
            for (int i = 0; i < rows; i++)
                for (int j = 0; j < cols; j++)
                    destination[j * rows + i] = reducer.FromSigned(s[i * cols + j]);
            return;
        }
        var words = _words!;
        var start = _start!;
        var neg = _negative!;
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < cols; j++)
            {
                int e = i * cols + j;
                destination[j * rows + i] = reducer.FromWords(words.AsSpan(start[e], start[e + 1] - start[e]), neg[e]);
            }
    }

    /// <summary>Exact test that B·w = 0 for an integer vector w given by its support and values.</summary>
    /// <param name="support">Column indices of the non-zero entries of w.</param>
    /// <param name="values">The entries of w on <paramref name="support"/>.</param>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public bool Annihilates(ReadOnlySpan<int> support, ReadOnlySpan<BigInteger> values)
    {
        int n = support.Length;
        if (n == 0) return true;
        long maxValueBits = 0;
        bool valuesSmall = true;
        foreach (var v in values)
        {
            long b = v.Sign < 0 ? (-v).GetBitLength() : v.GetBitLength();
            if (b > maxValueBits) maxValueBits = b;
            if (b > 62) valuesSmall = false;
        }
        int logN = 64 - BitOperations.LeadingZeroCount((ulong)n);
        if (Small is not null && valuesSmall && MaxBits + maxValueBits + logN + 1 <= 126)
        {
            var w = new long[n];
            for (int t = 0; t < n; t++) w[t] = (long)values[t];
            var s = Small;
            for (int i = 0; i < Rows; i++)
            {
                Int128 acc = 0;
                int baseIndex = i * Cols;
                for (int t = 0; t < n; t++) acc += (Int128)s[baseIndex + support[t]] * w[t];
                if (acc != 0) return false;
            }
            return true;
        }
        return AnnihilatesWords(support, values, maxValueBits, logN);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private bool AnnihilatesWords(ReadOnlySpan<int> support, ReadOnlySpan<BigInteger> values, long maxValueBits, int logN)
    {
        int n = support.Length;
        // Value magnitudes as words.
        var vStart = new int[n + 1];
        var vNeg = new bool[n];
        int total = 0;
        for (int t = 0; t < n; t++) { vStart[t] = total; total += WordArithmetic.WordCount(values[t]); vNeg[t] = values[t].Sign < 0; }
        vStart[n] = total;
        var vWords = new ulong[total];
        for (int t = 0; t < n; t++) WordArithmetic.WriteMagnitude(values[t], vWords.AsSpan(vStart[t], vStart[t + 1] - vStart[t]));
        int accLen = (int)((MaxBits + maxValueBits + logN + 2) / 64) + 2;
        var pos = new ulong[accLen];
        var neg = new ulong[accLen];
        var one = new ulong[1];
        for (int i = 0; i < Rows; i++)
        {
            pos.AsSpan().Clear();
            neg.AsSpan().Clear();
            for (int t = 0; t < n; t++)
            {
                int e = i * Cols + support[t];
                ReadOnlySpan<ulong> x;
                bool xNeg;
                if (Small is not null)
                {
                    long v = Small[e];
                    if (v == 0) continue;
                    one[0] = IntegerMath.UnsignedAbs(v);
                    x = one;
                    xNeg = v < 0;
                }
                else
                {
                    x = _words.AsSpan(_start![e], _start[e + 1] - _start[e]);
                    if (x.Length == 0) continue;
                    xNeg = _negative![e];
                }
                var y = vWords.AsSpan(vStart[t], vStart[t + 1] - vStart[t]);
                WordArithmetic.AddMul(xNeg != vNeg[t] ? neg : pos, x, y);
            }
            if (!pos.AsSpan().SequenceEqual(neg)) return false;
        }
        return true;
    }
}
