using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace Integrable.Kernels;

/// <summary>A multi-limb integer magnitude with a sign: the coefficient type of the multi-limb paths
/// (<see cref="Magnitude192"/>, <see cref="Magnitude256"/>), which take over from the word paths when
/// coefficients outgrow 63 bits and keep big integers out of the inner loops.</summary>
internal interface IMagnitude<TSelf> where TSelf : struct, IMagnitude<TSelf>
{
    /// <summary>The largest supported bit length of a magnitude.</summary>
    static abstract int MaxBits { get; }

    /// <summary>The value, or false when |value| has more than <see cref="MaxBits"/> bits.</summary>
    static abstract bool TryFrom(in BigInteger value, out TSelf result);

    /// <summary>The magnitude of a word (any long, including long.MinValue).</summary>
    static abstract TSelf FromWord(long value);

    /// <summary>The value as a big integer.</summary>
    BigInteger ToBigInteger();

    /// <summary>The value as a word when it fits in one (|value| ≤ 2^63 − 1).</summary>
    bool TryGetWord(out long value);
}

/// <summary>A two's-complement multi-limb accumulator that can be loaded with a dividend.</summary>
internal interface IMultiLimbAccumulator<TSelf> where TSelf : struct, IMultiLimbAccumulator<TSelf>
{
    /// <summary>The largest dividend bit length for which every partial sum of an exact division (the
    /// dividend minus fewer than 2^63 products of a divisor and a quotient coefficient of the matching
    /// magnitude type) stays inside the accumulator.</summary>
    static abstract int MaxDividendBits { get; }

    /// <summary>The accumulator holding <paramref name="value"/>, or false when it has more than
    /// <see cref="MaxDividendBits"/> bits.</summary>
    static abstract bool TryFrom(in BigInteger value, out TSelf result);
}

/// <summary>Limb arithmetic shared by the multi-limb coefficient families: 64×64-bit multiply-add
/// steps, unrolled schoolbook products, and conversions between limbs and big integers.</summary>
internal static class MultiLimb
{
    /// <summary>hi:lo = x·y + t + c (never overflows 128 bits).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ulong MulAddLimb(ulong x, ulong y, ulong t, ulong c, out ulong lo)
    {
        ulong hi = Math.BigMul(x, y, out ulong l);
        l += t;
        hi += l < t ? 1UL : 0UL;
        l += c;
        hi += l < c ? 1UL : 0UL;
        lo = l;
        return hi;
    }

    /// <summary>(w0, w1) += (lo, hi); true when a carry leaves w1 (then <see cref="Increment"/> the limbs above).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool AddTwo(ref ulong w0, ref ulong w1, ulong lo, ulong hi)
    {
        ulong s0 = w0 + lo;
        ulong c = s0 < lo ? 1UL : 0UL;
        ulong t = w1 + hi;
        ulong c1 = t < hi ? 1UL : 0UL;
        ulong s1 = t + c;
        c1 |= s1 < t ? 1UL : 0UL;
        w0 = s0;
        w1 = s1;
        return c1 != 0;
    }

    /// <summary>(w0, w1) −= (lo, hi); true when a borrow leaves w1 (then <see cref="Decrement"/> the limbs above).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool SubtractTwo(ref ulong w0, ref ulong w1, ulong lo, ulong hi)
    {
        ulong s0 = w0 - lo;
        ulong b = w0 < lo ? 1UL : 0UL;
        ulong t = w1 - hi;
        ulong b1 = w1 < hi ? 1UL : 0UL;
        ulong s1 = t - b;
        b1 |= t < b ? 1UL : 0UL;
        w0 = s0;
        w1 = s1;
        return b1 != 0;
    }

    /// <summary>Adds one to the limbs (two's complement: a carry out of the top is dropped).</summary>
    [MethodImpl(MethodImplOptions.NoInlining)]
    public static void Increment(Span<ulong> limbs)
    {
        for (int i = 0; i < limbs.Length; i++)
            if (++limbs[i] != 0) return;
    }

    /// <summary>Subtracts one from the limbs (two's complement: a borrow out of the top is dropped).</summary>
    [MethodImpl(MethodImplOptions.NoInlining)]
    public static void Decrement(Span<ulong> limbs)
    {
        for (int i = 0; i < limbs.Length; i++)
            if (limbs[i]-- != 0) return;
    }

    /// <summary>(p0…p5) = (a0, a1, a2)·(b0, b1, b2): four multiplications when both third limbs are
    /// zero, else nine, row by row, with every limb in a register.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Product3(ulong a0, ulong a1, ulong a2, ulong b0, ulong b1, ulong b2,
        out ulong p0, out ulong p1, out ulong p2, out ulong p3, out ulong p4, out ulong p5)
    {
        ulong c;
        if ((a2 | b2) == 0)
        {
            c = MulAddLimb(a0, b0, 0, 0, out p0);
            p2 = MulAddLimb(a0, b1, 0, c, out p1);
            c = MulAddLimb(a1, b0, p1, 0, out p1);
            p3 = MulAddLimb(a1, b1, p2, c, out p2);
            p4 = 0;
            p5 = 0;
            return;
        }
        c = MulAddLimb(a0, b0, 0, 0, out p0);
        c = MulAddLimb(a0, b1, 0, c, out p1);
        p3 = MulAddLimb(a0, b2, 0, c, out p2);
        c = MulAddLimb(a1, b0, p1, 0, out p1);
        c = MulAddLimb(a1, b1, p2, c, out p2);
        p4 = MulAddLimb(a1, b2, p3, c, out p3);
        c = MulAddLimb(a2, b0, p2, 0, out p2);
        c = MulAddLimb(a2, b1, p3, c, out p3);
        p5 = MulAddLimb(a2, b2, p4, c, out p4);
    }

    /// <summary>(p0…p4) = (a0, a1, a2, a3)·b: one row of four multiplications.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void ProductByLimb(ulong a0, ulong a1, ulong a2, ulong a3, ulong b,
        out ulong p0, out ulong p1, out ulong p2, out ulong p3, out ulong p4)
    {
        ulong c = MulAddLimb(a0, b, 0, 0, out p0);
        c = MulAddLimb(a1, b, 0, c, out p1);
        c = MulAddLimb(a2, b, 0, c, out p2);
        p4 = MulAddLimb(a3, b, 0, c, out p3);
    }

    /// <summary>(p0…p7) = (a0…a3)·(b0…b3): sixteen multiplications, row by row.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Product4(ulong a0, ulong a1, ulong a2, ulong a3, ulong b0, ulong b1, ulong b2, ulong b3,
        out ulong p0, out ulong p1, out ulong p2, out ulong p3, out ulong p4, out ulong p5, out ulong p6, out ulong p7)
    {
        ulong c = MulAddLimb(a0, b0, 0, 0, out p0);
        c = MulAddLimb(a0, b1, 0, c, out p1);
        c = MulAddLimb(a0, b2, 0, c, out p2);
        p4 = MulAddLimb(a0, b3, 0, c, out p3);
        c = MulAddLimb(a1, b0, p1, 0, out p1);
        c = MulAddLimb(a1, b1, p2, c, out p2);
        c = MulAddLimb(a1, b2, p3, c, out p3);
        p5 = MulAddLimb(a1, b3, p4, c, out p4);
        c = MulAddLimb(a2, b0, p2, 0, out p2);
        c = MulAddLimb(a2, b1, p3, c, out p3);
        c = MulAddLimb(a2, b2, p4, c, out p4);
        p6 = MulAddLimb(a2, b3, p5, c, out p5);
        c = MulAddLimb(a3, b0, p3, 0, out p3);
        c = MulAddLimb(a3, b1, p4, c, out p4);
        c = MulAddLimb(a3, b2, p5, c, out p5);
        p7 = MulAddLimb(a3, b3, p6, c, out p6);
    }

    /// <summary>Writes |value| into <paramref name="limbs"/> (least significant first); false when it
    /// has more than <paramref name="maxBits"/> bits.</summary>
    public static bool TryWriteMagnitude(in BigInteger value, int maxBits, Span<ulong> limbs)
    {
        if (BigInteger.Abs(value).GetBitLength() > maxBits) return false;
        LinearAlgebra.WordArithmetic.WriteMagnitude(value, limbs);
        return true;
    }

    /// <summary>Writes value in two's complement into <paramref name="limbs"/> (sign-extended); false
    /// when |value| has more than <paramref name="maxBits"/> bits.</summary>
    public static bool TryWriteTwosComplement(in BigInteger value, int maxBits, Span<ulong> limbs)
    {
        if (BigInteger.Abs(value).GetBitLength() > maxBits) return false;
        limbs.Fill(value.Sign < 0 ? ulong.MaxValue : 0UL);
        value.TryWriteBytes(MemoryMarshal.AsBytes(limbs), out _, isUnsigned: false, isBigEndian: false);
        return true;
    }

    /// <summary>The integer whose two's-complement form is <paramref name="limbs"/>.</summary>
    public static BigInteger FromTwosComplement(ReadOnlySpan<ulong> limbs) =>
        new(MemoryMarshal.AsBytes(limbs), isUnsigned: false, isBigEndian: false);

    /// <summary>The exact quotient of big integers in magnitude form: 0 on success, 1 when the division
    /// leaves a remainder, 2 when the quotient has too many bits for <typeparamref name="TM"/> (the
    /// status convention of <see cref="ICoefficientOps{TCoef, TAcc}.TryDivideExact"/>).</summary>
    public static int TryDivideExact<TM>(in BigInteger dividend, in BigInteger divisor, out TM quotient)
        where TM : struct, IMagnitude<TM>
    {
        quotient = default;
        var q = BigInteger.DivRem(dividend, divisor, out var r);
        if (!r.IsZero) return 1;
        return TM.TryFrom(q, out quotient) ? 0 : 2;
    }

    /// <summary>The value of a sign and a one-limb magnitude as a word, when it fits.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool TryWord(ulong magnitude, bool negative, out long value)
    {
        value = negative ? -(long)magnitude : (long)magnitude;
        return magnitude <= long.MaxValue;
    }
}
