using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace Integrable.Kernels.LinearAlgebra;

/// <summary>Natural-number arithmetic on little-endian 64-bit word arrays, for the exact checks of the
/// linear algebra (sums of products of big integers by small ones without allocating).</summary>
internal static class WordArithmetic
{
    /// <summary>Number of 64-bit words of |<paramref name="value"/>| (zero has none).</summary>
    public static int WordCount(BigInteger value)
    {
        if (value.IsZero) return 0;
        long bits = value.Sign < 0 ? (-value).GetBitLength() : value.GetBitLength();
        return (int)((bits + 63) / 64);
    }

    /// <summary>Writes |<paramref name="value"/>| into <paramref name="destination"/> (exactly
    /// <see cref="WordCount"/> words).</summary>
    public static void WriteMagnitude(BigInteger value, Span<ulong> destination)
    {
        if (destination.Length == 0) return;
        var mag = value.Sign < 0 ? -value : value;
        destination.Clear();
        var bytes = MemoryMarshal.AsBytes(destination);
        if (!mag.TryWriteBytes(bytes, out _, isUnsigned: true, isBigEndian: false))
            throw new InvalidOperationException("word buffer too small");
        if (!BitConverter.IsLittleEndian)
            for (int i = 0; i < destination.Length; i++) destination[i] = System.Buffers.Binary.BinaryPrimitives.ReverseEndianness(destination[i]);
    }

    /// <summary>Builds a big integer from a magnitude and a sign.</summary>
    public static BigInteger ToBigInteger(ReadOnlySpan<ulong> words, bool negative)
    {
        var bytes = MemoryMarshal.AsBytes(words);
        var v = new BigInteger(bytes, isUnsigned: true, isBigEndian: false);
        return negative ? -v : v;
    }

    /// <summary>x ← x·factor + addend over the first <paramref name="used"/> words (Horner step of a mixed-radix
    /// reconstruction); x must have room for one more word. Returns the new word count.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static int MulWordAdd(Span<ulong> x, int used, ulong factor, ulong addend)
    {
        ulong carry = addend;
        for (int t = 0; t < used; t++)
        {
            ulong hi = Math.BigMul(x[t], factor, out ulong lo);
            lo += carry;
            hi += lo < carry ? 1UL : 0UL;
            x[t] = lo;
            carry = hi;
        }
        if (carry != 0) x[used++] = carry;
        return used;
    }

    /// <summary>acc += x·y (schoolbook). <paramref name="acc"/> must have room for the result; the
    /// carry out of its top word is lost, so callers size it generously.</summary>
    /// <remarks>One word of y per pass: without an add-with-carry intrinsic the JIT compiles a two-word
    /// (addmul_2) variant into more instructions per product than it saves (measured).</remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void AddMul(Span<ulong> acc, ReadOnlySpan<ulong> x, ReadOnlySpan<ulong> y)
    {
        for (int s = 0; s < y.Length; s++)
        {
            ulong ys = y[s];
            if (ys == 0) continue;
            AddMulWord(acc[s..], x, ys);
        }
    }

    /// <summary>acc += x·y for a single word y.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void AddMulWord(Span<ulong> acc, ReadOnlySpan<ulong> x, ulong y)
    {
        ulong carry = 0;
        int n = x.Length;
        ref ulong ra = ref MemoryMarshal.GetReference(acc);
        ref ulong rx = ref MemoryMarshal.GetReference(x);
        if (acc.Length < n) throw new ArgumentException("accumulator too short");
        for (int t = 0; t < n; t++)
        {
            // x·y + a + carry <= (2^64-1)^2 + 2(2^64-1) = 2^128 - 1: no overflow.
            ulong hi = Math.BigMul(Unsafe.Add(ref rx, t), y, out ulong lo);
            ref ulong a = ref Unsafe.Add(ref ra, t);
            lo += a;
            hi += lo < a ? 1UL : 0UL;
            lo += carry;
            hi += lo < carry ? 1UL : 0UL;
            a = lo;
            carry = hi;
        }
        for (int t = n; carry != 0; t++)
        {
            if (t >= acc.Length) throw new OverflowException("accumulator overflow");
            ref ulong a = ref Unsafe.Add(ref ra, t);
            a += carry;
            carry = a < carry ? 1UL : 0UL;
        }
    }

    /// <summary>Length of <paramref name="x"/> without leading (most significant) zero words.</summary>
    public static int Normalized(ReadOnlySpan<ulong> x)
    {
        int n = x.Length;
        while (n > 0 && x[n - 1] == 0) n--;
        return n;
    }

    /// <summary>The product x·y as a new normalized word array.</summary>
    public static ulong[] Multiply(ReadOnlySpan<ulong> x, ReadOnlySpan<ulong> y)
    {
        if (x.Length == 0 || y.Length == 0) return [];
        var r = new ulong[x.Length + y.Length];
        if (x.Length >= y.Length) AddMul(r, x, y); else AddMul(r, y, x);
        int n = Normalized(r);
        return n == r.Length ? r : r[..n];
    }

    /// <summary>The exact quotient a/d when d divides a (both normalized magnitudes, d non-zero);
    /// null otherwise. Uses 2-adic (Jebelean) exact division on the odd part of d: each quotient word is
    /// the low word of the running remainder times d⁻¹ mod 2^64, so no long division is needed, and
    /// divisibility is decided by the remainder vanishing.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[]? TryDivideExact(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> d)
    {
        if (d.Length == 0) throw new DivideByZeroException("exact division by zero");
        if (a.Length == 0) return [];
        int tzd = TrailingZeroBits(d), tza = TrailingZeroBits(a);
        if (tza < tzd) return null;
        var dd = ShiftRight(d, tzd);
        var r = ShiftRight(a, tzd);
        int n = Normalized(r), m = Normalized(dd);
        if (n < m) return null;
        ulong d0 = dd[0];
        ulong inv = d0;                              // Newton iteration for d0⁻¹ mod 2^64 (d0 odd)
        for (int t = 0; t < 6; t++) inv *= 2 - d0 * inv;
        int qlen = n - m + 1;
        var q = new ulong[qlen];
        for (int k = 0; k < qlen; k++)
        {
            ulong qk = r[k] * inv;
            q[k] = qk;
            if (qk == 0) continue;
            // r[k..n) -= qk·dd (mpn_submul_1); the remainder of an exact division never goes negative.
            ulong cy = 0;
            for (int t = 0; t < m; t++)
            {
                ulong hi = Math.BigMul(qk, dd[t], out ulong lo);
                lo += cy;
                hi += lo < cy ? 1UL : 0UL;               // qk·d + cy < 2^128 − 2^64: hi + 1 fits
                ulong x = r[k + t];
                r[k + t] = x - lo;
                cy = hi + (x < lo ? 1UL : 0UL);
            }
            for (int u = k + m; cy != 0; u++)
            {
                if (u >= n) return null;                 // went negative: not divisible
                ulong x = r[u];
                r[u] = x - cy;
                cy = x < cy ? 1UL : 0UL;
            }
        }
        for (int u = qlen; u < n; u++) if (r[u] != 0) return null;
        int ql = Normalized(q);
        return ql == qlen ? q : q[..ql];
    }

    private static int TrailingZeroBits(ReadOnlySpan<ulong> x)
    {
        int i = 0;
        while (x[i] == 0) i++;
        return 64 * i + BitOperations.TrailingZeroCount(x[i]);
    }

    private static ulong[] ShiftRight(ReadOnlySpan<ulong> x, int bits)
    {
        int words = bits / 64, s = bits % 64;
        int n = x.Length - words;
        var r = new ulong[Math.Max(n, 0)];
        for (int i = 0; i < n; i++)
        {
            ulong lo = x[i + words] >> s;
            if (s != 0 && i + words + 1 < x.Length) lo |= x[i + words + 1] << (64 - s);
            r[i] = lo;
        }
        return r;
    }
}
