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

    /// <summary>acc += x·y (schoolbook). <paramref name="acc"/> must have room for the result; the
    /// carry out of its top word is lost, so callers size it generously.</summary>
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
}
