using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using Integrable.Numbers;

namespace Integrable.Kernels;

/// <summary>A coefficient of at most 255 bits in sign–magnitude form (four 64-bit limbs and a sign): the
/// second multi-limb path, for coefficients past the 191 bits of <see cref="Magnitude192"/> (Somos-4
/// iterates cross that line near the 39th term).</summary>
internal struct Magnitude256 : IMagnitude<Magnitude256>
{
    public ulong L0, L1, L2, L3;
    public bool Negative;

    /// <summary>The largest supported bit length of a magnitude.</summary>
    public const int MaxBits = 255;

    static int IMagnitude<Magnitude256>.MaxBits => MaxBits;

    public static bool TryFrom(in BigInteger value, out Magnitude256 result)
    {
        result = default;
        if (!MultiLimb.TryWriteMagnitude(value, MaxBits, MemoryMarshal.CreateSpan(ref result.L0, 4))) return false;
        result.Negative = value.Sign < 0;
        return true;
    }

    public static Magnitude256 FromWord(long value) => new() { L0 = IntegerMath.UnsignedAbs(value), Negative = value < 0 };

    public readonly BigInteger ToBigInteger() => Integrable.Kernels.LinearAlgebra.WordArithmetic.ToBigInteger([L0, L1, L2, L3], Negative);

    public readonly bool TryGetWord(out long value)
    {
        value = 0;
        return (L1 | L2 | L3) == 0 && MultiLimb.TryWord(L0, Negative, out value);
    }
}

/// <summary>A signed 576-bit two's-complement accumulator (nine limbs): holds any sum of fewer than
/// 2^63 products of two <see cref="Magnitude256"/> values plus a dividend of at most 573 bits.</summary>
internal struct Int576 : IMultiLimbAccumulator<Int576>
{
    public ulong W0, W1, W2, W3, W4, W5, W6, W7, W8;

    public readonly bool IsZero => (W0 | W1 | W2 | W3 | W4 | W5 | W6 | W7 | W8) == 0;

    public static int MaxDividendBits => 573;

    public readonly BigInteger ToBigInteger() => MultiLimb.FromTwosComplement([W0, W1, W2, W3, W4, W5, W6, W7, W8]);

    /// <summary>The value in sign–magnitude form, or false when it needs more than 255 bits.</summary>
    public readonly bool TryToMagnitude(out Magnitude256 result)
    {
        result = default;
        bool negative = (long)W8 < 0;
        ulong w0 = W0, w1 = W1, w2 = W2, w3 = W3, w4 = W4, w5 = W5, w6 = W6, w7 = W7, w8 = W8;
        if (negative)
        {
            // Two's-complement negation: invert and add one.
            w0 = ~w0; w1 = ~w1; w2 = ~w2; w3 = ~w3; w4 = ~w4; w5 = ~w5; w6 = ~w6; w7 = ~w7; w8 = ~w8;
            if (++w0 == 0 && ++w1 == 0 && ++w2 == 0 && ++w3 == 0 && ++w4 == 0 && ++w5 == 0 && ++w6 == 0 && ++w7 == 0) ++w8;
        }
        if ((w4 | w5 | w6 | w7 | w8) != 0 || (long)w3 < 0) return false;
        result.L0 = w0; result.L1 = w1; result.L2 = w2; result.L3 = w3;
        result.Negative = negative;
        return true;
    }

    /// <summary>The accumulator holding <paramref name="value"/>, or false when |value| has more than
    /// <see cref="MaxDividendBits"/> bits.</summary>
    public static bool TryFrom(in BigInteger value, out Int576 result)
    {
        result = default;
        return MultiLimb.TryWriteTwosComplement(value, MaxDividendBits, MemoryMarshal.CreateSpan(ref result.W0, 9));
    }
}

/// <summary>Multi-limb coefficients of up to four limbs (<see cref="Magnitude256"/>) accumulated in
/// <see cref="Int576"/>. A product costs one multiplication for one-limb operands, four per limb of the
/// wider operand when the other has one limb, four or nine when both fit three limbs, and sixteen
/// otherwise; carries stop as soon as they vanish.</summary>
internal struct Wide576Ops : ICoefficientOps<Magnitude256, Int576>
{
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAdd(ref Int576 acc, Magnitude256 a, Magnitude256 b) =>
        Accumulate(ref acc, in a, in b, subtract: a.Negative != b.Negative);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulSub(ref Int576 acc, Magnitude256 a, Magnitude256 b) =>
        Accumulate(ref acc, in a, in b, subtract: a.Negative == b.Negative);

    /// <summary>acc ± |a|·|b|.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Accumulate(ref Int576 acc, in Magnitude256 a, in Magnitude256 b, bool subtract)
    {
        if ((a.L1 | a.L2 | a.L3 | b.L1 | b.L2 | b.L3) == 0)
        {
            ulong hi = Math.BigMul(a.L0, b.L0, out ulong lo);
            if (subtract) Sub2(ref acc, lo, hi); else Add2(ref acc, lo, hi);
            return;
        }
        AccumulateWide(ref acc, in a, in b, subtract);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Add2(ref Int576 a, ulong lo, ulong hi)
    {
        if (MultiLimb.AddTwo(ref a.W0, ref a.W1, lo, hi)) MultiLimb.Increment(MemoryMarshal.CreateSpan(ref a.W2, 7));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Sub2(ref Int576 a, ulong lo, ulong hi)
    {
        if (MultiLimb.SubtractTwo(ref a.W0, ref a.W1, lo, hi)) MultiLimb.Decrement(MemoryMarshal.CreateSpan(ref a.W2, 7));
    }

    /// <summary>The general product into eight limbs, then one add or subtract with carry over all nine.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void AccumulateWide(ref Int576 acc, in Magnitude256 a, in Magnitude256 b, bool subtract)
    {
        ulong p0, p1, p2, p3, p4, p5 = 0, p6 = 0, p7 = 0;
        if ((b.L1 | b.L2 | b.L3) == 0)
            MultiLimb.ProductByLimb(a.L0, a.L1, a.L2, a.L3, b.L0, out p0, out p1, out p2, out p3, out p4);
        else if ((a.L1 | a.L2 | a.L3) == 0)
            MultiLimb.ProductByLimb(b.L0, b.L1, b.L2, b.L3, a.L0, out p0, out p1, out p2, out p3, out p4);
        else if ((a.L3 | b.L3) == 0)
            MultiLimb.Product3(a.L0, a.L1, a.L2, b.L0, b.L1, b.L2, out p0, out p1, out p2, out p3, out p4, out p5);
        else
            MultiLimb.Product4(a.L0, a.L1, a.L2, a.L3, b.L0, b.L1, b.L2, b.L3, out p0, out p1, out p2, out p3, out p4, out p5, out p6, out p7);
        if (!subtract)
        {
            ulong s, k, k1;
            s = acc.W0 + p0; k = s < p0 ? 1UL : 0UL; acc.W0 = s;
            s = acc.W1 + p1; k1 = s < p1 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W1 = s; k = k1;
            s = acc.W2 + p2; k1 = s < p2 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W2 = s; k = k1;
            s = acc.W3 + p3; k1 = s < p3 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W3 = s; k = k1;
            s = acc.W4 + p4; k1 = s < p4 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W4 = s; k = k1;
            s = acc.W5 + p5; k1 = s < p5 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W5 = s; k = k1;
            s = acc.W6 + p6; k1 = s < p6 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W6 = s; k = k1;
            s = acc.W7 + p7; k1 = s < p7 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W7 = s; k = k1;
            acc.W8 += k;
        }
        else
        {
            ulong d, w, k, k1;
            w = acc.W0; d = w - p0; k = w < p0 ? 1UL : 0UL; acc.W0 = d;
            w = acc.W1; d = w - p1; k1 = w < p1 ? 1UL : 0UL; k1 |= d < k ? 1UL : 0UL; acc.W1 = d - k; k = k1;
            w = acc.W2; d = w - p2; k1 = w < p2 ? 1UL : 0UL; k1 |= d < k ? 1UL : 0UL; acc.W2 = d - k; k = k1;
            w = acc.W3; d = w - p3; k1 = w < p3 ? 1UL : 0UL; k1 |= d < k ? 1UL : 0UL; acc.W3 = d - k; k = k1;
            w = acc.W4; d = w - p4; k1 = w < p4 ? 1UL : 0UL; k1 |= d < k ? 1UL : 0UL; acc.W4 = d - k; k = k1;
            w = acc.W5; d = w - p5; k1 = w < p5 ? 1UL : 0UL; k1 |= d < k ? 1UL : 0UL; acc.W5 = d - k; k = k1;
            w = acc.W6; d = w - p6; k1 = w < p6 ? 1UL : 0UL; k1 |= d < k ? 1UL : 0UL; acc.W6 = d - k; k = k1;
            w = acc.W7; d = w - p7; k1 = w < p7 ? 1UL : 0UL; k1 |= d < k ? 1UL : 0UL; acc.W7 = d - k; k = k1;
            acc.W8 -= k;
        }
    }

    public static void MulAddRow(ref Int576 dest, Magnitude256 a, ref Magnitude256 b, ref nint off, int count) =>
        CoefficientLoops.MulAddRow<Wide576Ops, Magnitude256, Int576>(ref dest, a, ref b, ref off, count);

    public static void MulSubBlock(ref Int576 buf, ref Magnitude256 a, ref int la, int na, ref Magnitude256 b, ref int lb, int nb) =>
        CoefficientLoops.MulSubBlock<Wide576Ops, Magnitude256, Int576>(ref buf, ref a, ref la, na, ref b, ref lb, nb);

    public static void MulAddBlock(ref Int576 buf, ref Magnitude256 a, ref int la, int na, ref Magnitude256 b, ref nint lb, int nb) =>
        CoefficientLoops.MulAddBlock<Wide576Ops, Magnitude256, Int576>(ref buf, ref a, ref la, na, ref b, ref lb, nb);

    public static void Set(out Int576 acc, Magnitude256 a)
    {
        acc = default;
        if (!a.Negative) { acc.W0 = a.L0; acc.W1 = a.L1; acc.W2 = a.L2; acc.W3 = a.L3; return; }
        // 0 − |a| in two's complement: invert and add one.
        ulong w0 = ~a.L0, w1 = ~a.L1, w2 = ~a.L2, w3 = ~a.L3, rest = ulong.MaxValue;
        if (++w0 == 0 && ++w1 == 0 && ++w2 == 0 && ++w3 == 0) rest = 0;
        acc.W0 = w0; acc.W1 = w1; acc.W2 = w2; acc.W3 = w3;
        acc.W4 = rest; acc.W5 = rest; acc.W6 = rest; acc.W7 = rest; acc.W8 = rest;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsZero(in Int576 acc) => acc.IsZero;

    public static BigInteger ToBigInteger(in Int576 acc) => acc.ToBigInteger();

    public static Rational ToRational(in Int576 acc, in BigInteger denominator)
    {
        // Most coefficients of a wide polynomial are still small: read them without BigInteger.
        ulong sign = (ulong)((long)acc.W1 >> 63);
        if (denominator.IsOne && acc.W1 == sign && acc.W2 == sign && acc.W3 == sign && acc.W4 == sign && acc.W5 == sign
            && acc.W6 == sign && acc.W7 == sign && acc.W8 == sign && (long)acc.W0 >> 63 == (long)sign)
            return new Rational((long)acc.W0);
        return denominator.IsOne ? new Rational(acc.ToBigInteger()) : new Rational(acc.ToBigInteger(), denominator);
    }

    public static int TryDivideExact(in Int576 acc, Magnitude256 divisor, Magnitude256 limit, out Magnitude256 quotient)
    {
        quotient = default;
        if ((divisor.L0 == 1) & ((divisor.L1 | divisor.L2 | divisor.L3) == 0))
        {
            // Unit divisor (the usual monic leading coefficient): the quotient is ±acc.
            if (!acc.TryToMagnitude(out quotient)) return 2;
            if (divisor.Negative && (quotient.L0 | quotient.L1 | quotient.L2 | quotient.L3) != 0) quotient.Negative = !quotient.Negative;
            return 0;
        }
        return MultiLimb.TryDivideExact(acc.ToBigInteger(), divisor.ToBigInteger(), out quotient);
    }
}
