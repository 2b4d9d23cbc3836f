using System.Numerics;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using Integrable.Numbers;

namespace Integrable.Kernels;

/// <summary>A coefficient of at most 191 bits in sign–magnitude form (three 64-bit limbs and a sign): the
/// input form of the first multi-limb path, which takes over from the word paths when coefficients outgrow
/// 63 bits (Somos-type iterates reach 100–200 bits) and keeps big integers out of the inner loops.</summary>
internal struct Magnitude192 : IMagnitude<Magnitude192>
{
    public ulong L0, L1, L2;
    public bool Negative;

    /// <summary>The largest supported bit length of a magnitude.</summary>
    public const int MaxBits = 191;

    static int IMagnitude<Magnitude192>.MaxBits => MaxBits;

    public static bool TryFrom(in BigInteger value, out Magnitude192 result)
    {
        result = default;
        if (!MultiLimb.TryWriteMagnitude(value, MaxBits, MemoryMarshal.CreateSpan(ref result.L0, 3))) return false;
        result.Negative = value.Sign < 0;
        return true;
    }

    public static Magnitude192 FromWord(long value) => new() { L0 = IntegerMath.UnsignedAbs(value), Negative = value < 0 };

    public readonly BigInteger ToBigInteger() => Integrable.Kernels.LinearAlgebra.WordArithmetic.ToBigInteger([L0, L1, L2], Negative);

    public readonly bool TryGetWord(out long value)
    {
        value = 0;
        return (L1 | L2) == 0 && MultiLimb.TryWord(L0, Negative, out value);
    }
}

/// <summary>A signed 448-bit two's-complement accumulator (seven limbs): holds any sum of fewer than
/// 2^63 products of two <see cref="Magnitude192"/> values plus a dividend of at most 446 bits.</summary>
internal struct Int448 : IMultiLimbAccumulator<Int448>
{
    public ulong W0, W1, W2, W3, W4, W5, W6;

    public readonly bool IsZero => (W0 | W1 | W2 | W3 | W4 | W5 | W6) == 0;

    public static int MaxDividendBits => 446;

    public readonly BigInteger ToBigInteger() => MultiLimb.FromTwosComplement([W0, W1, W2, W3, W4, W5, W6]);

    /// <summary>The value in sign–magnitude form, or false when it needs more than 191 bits.</summary>
    public readonly bool TryToMagnitude(out Magnitude192 result)
    {
        result = default;
        bool negative = (long)W6 < 0;
        ulong w0 = W0, w1 = W1, w2 = W2, w3 = W3, w4 = W4, w5 = W5, w6 = W6;
        if (negative)
        {
            // Two's-complement negation: invert and add one.
            w0 = ~w0; w1 = ~w1; w2 = ~w2; w3 = ~w3; w4 = ~w4; w5 = ~w5; w6 = ~w6;
            if (++w0 == 0 && ++w1 == 0 && ++w2 == 0 && ++w3 == 0 && ++w4 == 0 && ++w5 == 0) ++w6;
        }
        if ((w3 | w4 | w5 | w6) != 0 || (long)w2 < 0) return false;
        result.L0 = w0; result.L1 = w1; result.L2 = w2;
        result.Negative = negative;
        return true;
    }

    /// <summary>The accumulator holding <paramref name="value"/>, or false when |value| has more than
    /// <see cref="MaxDividendBits"/> bits.</summary>
    public static bool TryFrom(in BigInteger value, out Int448 result)
    {
        result = default;
        return MultiLimb.TryWriteTwosComplement(value, MaxDividendBits, MemoryMarshal.CreateSpan(ref result.W0, 7));
    }
}

/// <summary>Multi-limb coefficients (<see cref="Magnitude192"/>) accumulated in <see cref="Int448"/>.
/// Products use one, four or nine 64×64-bit multiplications depending on the operands' limb counts,
/// and carries stop as soon as they vanish, so small coefficients inside a wide polynomial stay cheap.</summary>
internal struct Wide448Ops : ICoefficientOps<Magnitude192, Int448>
{
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAdd(ref Int448 acc, Magnitude192 a, Magnitude192 b)
    {
        if (a.Negative != b.Negative) Accumulate(ref acc, in a, in b, subtract: true);
        else Accumulate(ref acc, in a, in b, subtract: false);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulSub(ref Int448 acc, Magnitude192 a, Magnitude192 b)
    {
        if (a.Negative != b.Negative) Accumulate(ref acc, in a, in b, subtract: false);
        else Accumulate(ref acc, in a, in b, subtract: true);
    }

    /// <summary>acc ± |a|·|b|.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Accumulate(ref Int448 acc, in Magnitude192 a, in Magnitude192 b, bool subtract)
    {
        if ((a.L1 | a.L2 | b.L1 | b.L2) == 0)
        {
            ulong hi = Math.BigMul(a.L0, b.L0, out ulong lo);
            if (subtract) Sub2(ref acc, lo, hi); else Add2(ref acc, lo, hi);
            return;
        }
        AccumulateWide(ref acc, in a, in b, subtract);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Add2(ref Int448 a, ulong lo, ulong hi)
    {
        if (MultiLimb.AddTwo(ref a.W0, ref a.W1, lo, hi)) MultiLimb.Increment(MemoryMarshal.CreateSpan(ref a.W2, 5));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Sub2(ref Int448 a, ulong lo, ulong hi)
    {
        if (MultiLimb.SubtractTwo(ref a.W0, ref a.W1, lo, hi)) MultiLimb.Decrement(MemoryMarshal.CreateSpan(ref a.W2, 5));
    }

    /// <summary>The general product: schoolbook over two or three limbs per operand into six limbs, then one
    /// add or subtract with carry over all seven, written out so that every limb stays in a register.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void AccumulateWide(ref Int448 acc, in Magnitude192 a, in Magnitude192 b, bool subtract)
    {
        MultiLimb.Product3(a.L0, a.L1, a.L2, b.L0, b.L1, b.L2, out ulong p0, out ulong p1, out ulong p2, out ulong p3, out ulong p4, out ulong p5);
        if (!subtract)
        {
            ulong s, k;
            s = acc.W0 + p0; k = s < p0 ? 1UL : 0UL; acc.W0 = s;
            s = acc.W1 + p1; ulong k1 = s < p1 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W1 = s; k = k1;
            s = acc.W2 + p2; k1 = s < p2 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W2 = s; k = k1;
            s = acc.W3 + p3; k1 = s < p3 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W3 = s; k = k1;
            s = acc.W4 + p4; k1 = s < p4 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W4 = s; k = k1;
            s = acc.W5 + p5; k1 = s < p5 ? 1UL : 0UL; s += k; k1 |= s < k ? 1UL : 0UL; acc.W5 = s; k = k1;
            acc.W6 += k;
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
            acc.W6 -= k;
        }
    }

    public static void MulAddRow(ref Int448 dest, Magnitude192 a, ref Magnitude192 b, ref nint off, int count) =>
        CoefficientLoops.MulAddRow<Wide448Ops, Magnitude192, Int448>(ref dest, a, ref b, ref off, count);

    public static void MulSubBlock(ref Int448 buf, ref Magnitude192 a, ref int la, int na, ref Magnitude192 b, ref int lb, int nb) =>
        CoefficientLoops.MulSubBlock<Wide448Ops, Magnitude192, Int448>(ref buf, ref a, ref la, na, ref b, ref lb, nb);

    public static void MulAddBlock(ref Int448 buf, ref Magnitude192 a, ref int la, int na, ref Magnitude192 b, ref nint lb, int nb) =>
        CoefficientLoops.MulAddBlock<Wide448Ops, Magnitude192, Int448>(ref buf, ref a, ref la, na, ref b, ref lb, nb);

    public static void Set(out Int448 acc, Magnitude192 a)
    {
        acc = default;
        if (a.Negative) Sub3(ref acc, a.L0, a.L1, a.L2);
        else { acc.W0 = a.L0; acc.W1 = a.L1; acc.W2 = a.L2; }
    }

    /// <summary>0 − (l0, l1, l2) in two's complement (acc is zero on entry).</summary>
    private static void Sub3(ref Int448 acc, ulong l0, ulong l1, ulong l2)
    {
        ulong w0 = ~l0, w1 = ~l1, w2 = ~l2, rest = ulong.MaxValue;
        if (++w0 == 0 && ++w1 == 0 && ++w2 == 0) rest = 0;
        acc.W0 = w0; acc.W1 = w1; acc.W2 = w2; acc.W3 = rest; acc.W4 = rest; acc.W5 = rest; acc.W6 = rest;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsZero(in Int448 acc) => acc.IsZero;

    public static BigInteger ToBigInteger(in Int448 acc) => acc.ToBigInteger();

    public static Rational ToRational(in Int448 acc, in BigInteger denominator)
    {
        // Most coefficients of a wide polynomial are still small: read them without BigInteger.
        ulong sign = (ulong)((long)acc.W1 >> 63);
        if (acc.W2 == sign && acc.W3 == sign && acc.W4 == sign && acc.W5 == sign && acc.W6 == sign && acc.W1 == sign
            && (long)acc.W0 >> 63 == (long)sign && denominator.IsOne)
            return new Rational((long)acc.W0);
        return denominator.IsOne ? new Rational(acc.ToBigInteger()) : new Rational(acc.ToBigInteger(), denominator);
    }

    public static int TryDivideExact(in Int448 acc, Magnitude192 divisor, Magnitude192 limit, out Magnitude192 quotient)
    {
        quotient = default;
        if ((divisor.L0 == 1) & ((divisor.L1 | divisor.L2) == 0))
        {
            // Unit divisor (the usual monic leading coefficient): the quotient is ±acc.
            if (!acc.TryToMagnitude(out quotient)) return 2;
            if (divisor.Negative && (quotient.L0 | quotient.L1 | quotient.L2) != 0) quotient.Negative = !quotient.Negative;
            return 0;
        }
        return MultiLimb.TryDivideExact(acc.ToBigInteger(), divisor.ToBigInteger(), out quotient);
    }
}
