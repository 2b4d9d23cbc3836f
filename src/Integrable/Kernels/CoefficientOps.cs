using System.Numerics;
using System.Runtime.CompilerServices;
using Integrable.Numbers;

namespace Integrable.Kernels;

/// <summary>Arithmetic used by the polynomial kernels on integer coefficients of type
/// <typeparamref name="TCoef"/> accumulated in <typeparamref name="TAcc"/>.</summary>
/// <remarks>Implemented by structs so that the JIT specializes every kernel for each pair of
/// types (no virtual calls, no boxing). The word implementations never check for overflow: the
/// caller picks the accumulator from an a-priori bound on |Σ a·b| (see
/// <see cref="CoefficientBounds"/>), which is exact and cheaper than checking every addition.</remarks>
internal interface ICoefficientOps<TCoef, TAcc>
{
    /// <summary>acc += a·b.</summary>
    static abstract void MulAdd(ref TAcc acc, TCoef a, TCoef b);

    /// <summary>acc −= a·b.</summary>
    static abstract void MulSub(ref TAcc acc, TCoef a, TCoef b);

    /// <summary>dest[off[j]] += a·b[j] for j in [0, count), with <paramref name="off"/> given in
    /// bytes: the inner loop of the dense method.</summary>
    static abstract void MulAddRow(ref TAcc dest, TCoef a, ref TCoef b, ref nint off, int count);

    /// <summary>A block of the dense method: buf[la[i] + lb[j]] += a[i]·b[j] for i &lt; na, j &lt; nb
    /// (la in cells, lb in bytes, so the inner loop adds a precomputed byte offset).
    /// Implementations are separate non-inlined methods so that the JIT allocates registers for this
    /// loop nest alone.</summary>
    static abstract void MulAddBlock(ref TAcc buf, ref TCoef a, ref int la, int na, ref TCoef b, ref nint lb, int nb);

    /// <summary>buf[la[i] + lb[j]] −= a[i]·b[j] for i &lt; na, j &lt; nb (dense exact division).</summary>
    static abstract void MulSubBlock(ref TAcc buf, ref TCoef a, ref int la, int na, ref TCoef b, ref int lb, int nb);

    /// <summary>acc = a.</summary>
    static abstract void Set(out TAcc acc, TCoef a);

    /// <summary>True when acc is zero.</summary>
    static abstract bool IsZero(in TAcc acc);

    /// <summary>The accumulated value as a big integer.</summary>
    static abstract BigInteger ToBigInteger(in TAcc acc);

    /// <summary>The accumulated value divided by <paramref name="denominator"/> (positive), canonical.</summary>
    static abstract Rational ToRational(in TAcc acc, in BigInteger denominator);

    /// <summary>Divides acc by <paramref name="divisor"/> when the quotient is an exact integer of
    /// coefficient type whose magnitude is at most <paramref name="limit"/>.</summary>
    /// <returns>0 on success, 1 when the division is not exact (a definite "no"), 2 when the
    /// quotient is too large for this representation (retry with a wider one).</returns>
    static abstract int TryDivideExact(in TAcc acc, TCoef divisor, TCoef limit, out TCoef quotient);
}

/// <summary>Word coefficients accumulated in a word; valid when every partial sum fits in 63 bits.</summary>
internal struct Word64Ops : ICoefficientOps<long, long>
{
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAdd(ref long acc, long a, long b) => acc += a * b;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulSub(ref long acc, long a, long b) => acc -= a * b;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAddRow(ref long dest, long a, ref long b, ref nint off, int count)
    {
        nint j = 0;
        for (; j + 1 < count; j += 2)
        {
            Unsafe.AddByteOffset(ref dest, Unsafe.Add(ref off, j)) += a * Unsafe.Add(ref b, j);
            Unsafe.AddByteOffset(ref dest, Unsafe.Add(ref off, j + 1)) += a * Unsafe.Add(ref b, j + 1);
        }
        if (j < count) Unsafe.AddByteOffset(ref dest, Unsafe.Add(ref off, j)) += a * Unsafe.Add(ref b, j);
    }

    [MethodImpl(MethodImplOptions.NoInlining | MethodImplOptions.AggressiveOptimization)]
    public static void MulSubBlock(ref long buf, ref long a, ref int la, int na, ref long b, ref int lb, int nb)
    {
        for (int i = 0; i < na; i++)
        {
            ref long row = ref Unsafe.Add(ref buf, Unsafe.Add(ref la, i));
            long ai = Unsafe.Add(ref a, i);
            for (int j = 0; j < nb; j++)
                MulSub(ref Unsafe.Add(ref row, Unsafe.Add(ref lb, j)), ai, Unsafe.Add(ref b, j));
        }
    }

    [MethodImpl(MethodImplOptions.NoInlining | MethodImplOptions.AggressiveOptimization)]
    public static void MulAddBlock(ref long buf, ref long a, ref int la, int na, ref long b, ref nint lb, int nb)
    {
        for (int i = 0; i < na; i++)
            MulAddRow(ref Unsafe.Add(ref buf, Unsafe.Add(ref la, i)), Unsafe.Add(ref a, i), ref b, ref lb, nb);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Set(out long acc, long a) => acc = a;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsZero(in long acc) => acc == 0;

    public static BigInteger ToBigInteger(in long acc) => acc;

    public static Rational ToRational(in long acc, in BigInteger denominator) =>
        denominator.IsOne ? new Rational(acc) : Rational.FromWide(acc, (Int128)denominator);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static int TryDivideExact(in long acc, long divisor, long limit, out long quotient)
    {
        quotient = Math.DivRem(acc, divisor, out long r);
        if (r != 0) return 1;
        return (ulong)Math.Abs(quotient) <= (ulong)limit ? 0 : 2;
    }
}

/// <summary>Word coefficients accumulated in 128 bits; valid when every partial sum fits in 127 bits.</summary>
internal struct Word128Ops : ICoefficientOps<long, Int128>
{
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAdd(ref Int128 acc, long a, long b)
    {
        long hi = Math.BigMul(a, b, out long lo);
        acc += new Int128((ulong)hi, (ulong)lo);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulSub(ref Int128 acc, long a, long b)
    {
        long hi = Math.BigMul(a, b, out long lo);
        acc -= new Int128((ulong)hi, (ulong)lo);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAddRow(ref Int128 dest, long a, ref long b, ref nint off, int count)
    {
        // Unsigned 64×64→128 product corrected to the signed one: hi −= (a<0 ? b : 0) + (b<0 ? a : 0).
        ref ulong d = ref Unsafe.As<Int128, ulong>(ref dest);
        ulong ua = (ulong)a;
        long aSign = a >> 63;
        for (int j = 0; j < count; j++)
        {
            long bj = Unsafe.Add(ref b, j);
            ulong lo = ua * (ulong)bj;
            ulong hi = UWord128Ops.MulHigh(ua, (ulong)bj) - (ulong)((aSign & bj) + ((bj >> 63) & a));
            ref ulong s = ref Unsafe.AddByteOffset(ref d, Unsafe.Add(ref off, j));
            ulong nlo = s + lo;
            Unsafe.Add(ref s, 1) += hi + (nlo < lo ? 1UL : 0UL);
            s = nlo;
        }
    }

    [MethodImpl(MethodImplOptions.NoInlining | MethodImplOptions.AggressiveOptimization)]
    public static void MulSubBlock(ref Int128 buf, ref long a, ref int la, int na, ref long b, ref int lb, int nb)
    {
        ref ulong d = ref Unsafe.As<Int128, ulong>(ref buf);
        for (int i = 0; i < na; i++)
        {
            long ai = Unsafe.Add(ref a, i);
            ulong ua = (ulong)ai;
            long aSign = ai >> 63;
            ref ulong row = ref Unsafe.Add(ref d, (nint)Unsafe.Add(ref la, i) * 2);
            for (int j = 0; j < nb; j++)
            {
                long bj = Unsafe.Add(ref b, j);
                ulong lo = (ulong)bj * ua;
                ulong hi = UWord128Ops.MulHigh((ulong)bj, ua) - (ulong)((aSign & bj) + ((bj >> 63) & ai));
                ref ulong c = ref Unsafe.Add(ref row, (nint)Unsafe.Add(ref lb, j) * 2);
                ulong old = c;
                Unsafe.Add(ref c, 1) -= hi + (old < lo ? 1UL : 0UL);
                c = old - lo;
            }
        }
    }

    [MethodImpl(MethodImplOptions.NoInlining | MethodImplOptions.AggressiveOptimization)]
    public static void MulAddBlock(ref Int128 buf, ref long a, ref int la, int na, ref long b, ref nint lb, int nb)
    {
        for (int i = 0; i < na; i++)
            MulAddRow(ref Unsafe.Add(ref buf, Unsafe.Add(ref la, i)), Unsafe.Add(ref a, i), ref b, ref lb, nb);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Set(out Int128 acc, long a) => acc = a;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsZero(in Int128 acc) => acc == Int128.Zero;

    public static BigInteger ToBigInteger(in Int128 acc) => (BigInteger)acc;

    public static Rational ToRational(in Int128 acc, in BigInteger denominator) =>
        denominator.IsOne ? Rational.FromInteger(acc) : Rational.FromWide(acc, (Int128)denominator);

    public static int TryDivideExact(in Int128 acc, long divisor, long limit, out long quotient)
    {
        quotient = 0;
        var q = Int128.DivRem(acc, divisor);
        if (q.Remainder != 0) return 1;
        if (q.Quotient > limit || q.Quotient < -limit) return 2;
        quotient = (long)q.Quotient;
        return 0;
    }
}

/// <summary>Non-negative word coefficients accumulated in 128 bits (plain unsigned products, no
/// sign correction); valid when all inputs are ≥ 0 and every partial sum fits in 127 bits.</summary>
internal struct UWord128Ops : ICoefficientOps<long, Int128>
{
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAdd(ref Int128 acc, long a, long b) => Word128Ops.MulAdd(ref acc, a, b);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulSub(ref Int128 acc, long a, long b) => Word128Ops.MulSub(ref acc, a, b);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAddRow(ref Int128 dest, long a, ref long b, ref nint off, int count)
    {
        ref ulong d = ref Unsafe.As<Int128, ulong>(ref dest);
        ulong ua = (ulong)a;
        for (int j = 0; j < count; j++)
        {
            ulong bj = (ulong)Unsafe.Add(ref b, j);
            ulong hi = MulHigh(ua, bj);
            ulong lo = ua * bj;
            ref ulong s = ref Unsafe.AddByteOffset(ref d, Unsafe.Add(ref off, j));
            ulong nlo = s + lo;
            Unsafe.Add(ref s, 1) += hi + (nlo < lo ? 1UL : 0UL);
            s = nlo;
        }
    }

    /// <summary>High word of the unsigned 128-bit product; with BMI2 this is one <c>mulx</c> whose low
    /// half is discarded (the low half is recomputed with <c>imul</c>, which keeps both in registers;
    /// <see cref="Math.BigMul(ulong, ulong, out ulong)"/> would spill the low half to memory).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static ulong MulHigh(ulong a, ulong b) =>
        System.Runtime.Intrinsics.X86.Bmi2.X64.IsSupported ? System.Runtime.Intrinsics.X86.Bmi2.X64.MultiplyNoFlags(a, b) : Math.BigMul(a, b, out _);

    [MethodImpl(MethodImplOptions.NoInlining | MethodImplOptions.AggressiveOptimization)]
    public static void MulSubBlock(ref Int128 buf, ref long a, ref int la, int na, ref long b, ref int lb, int nb)
    {
        for (int i = 0; i < na; i++)
        {
            ref Int128 row = ref Unsafe.Add(ref buf, Unsafe.Add(ref la, i));
            long ai = Unsafe.Add(ref a, i);
            for (int j = 0; j < nb; j++)
                MulSub(ref Unsafe.Add(ref row, Unsafe.Add(ref lb, j)), ai, Unsafe.Add(ref b, j));
        }
    }

    [MethodImpl(MethodImplOptions.NoInlining | MethodImplOptions.AggressiveOptimization)]
    public static void MulAddBlock(ref Int128 buf, ref long a, ref int la, int na, ref long b, ref nint lb, int nb)
    {
        for (int i = 0; i < na; i++)
            MulAddRow(ref Unsafe.Add(ref buf, Unsafe.Add(ref la, i)), Unsafe.Add(ref a, i), ref b, ref lb, nb);
    }

    public static void Set(out Int128 acc, long a) => acc = a;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsZero(in Int128 acc) => acc == Int128.Zero;

    public static BigInteger ToBigInteger(in Int128 acc) => (BigInteger)acc;

    public static Rational ToRational(in Int128 acc, in BigInteger denominator) => Word128Ops.ToRational(in acc, in denominator);

    public static int TryDivideExact(in Int128 acc, long divisor, long limit, out long quotient) =>
        Word128Ops.TryDivideExact(in acc, divisor, limit, out quotient);
}

/// <summary>Carry-free accumulator for non-negative products: a sum Σ p_k is kept as
/// <see cref="Low"/> = Σ (p_k mod 2^32) and <see cref="High"/> = Σ ⌊p_k / 2^32⌋, so the value is
/// High·2^32 + Low and no carry has to be propagated per product.</summary>
internal struct Split96
{
    public ulong Low;
    public ulong High;

    public readonly UInt128 Value => ((UInt128)High << 32) + Low;
}

/// <summary>Non-negative word coefficients accumulated carry-free in <see cref="Split96"/>; valid when
/// all inputs are ≥ 0, every sum of products is below 2^96 (so each ⌊Σ p/2^32⌋ fits in a word) and
/// fewer than 2^32 products meet in one cell (so the low sum fits in a word). About half the
/// instructions per product of <see cref="UWord128Ops"/>: no compare/set-carry sequence.</summary>
internal struct UWord96Ops : ICoefficientOps<long, Split96>
{
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAdd(ref Split96 acc, long a, long b)
    {
        ulong lo = (ulong)a * (ulong)b, hi = UWord128Ops.MulHigh((ulong)a, (ulong)b);
        acc.Low += (uint)lo;
        acc.High += (hi << 32) | (lo >> 32);
    }

    public static void MulSub(ref Split96 acc, long a, long b) =>
        throw new InvalidOperationException("Split96 accumulators only add non-negative products.");

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAddRow(ref Split96 dest, long a, ref long b, ref nint off, int count)
    {
        ref ulong d = ref Unsafe.As<Split96, ulong>(ref dest);
        ulong ua = (ulong)a;
        nint j = 0;
        for (; j + 1 < count; j += 2)
        {
            ulong b0 = (ulong)Unsafe.Add(ref b, j);
            ulong hi0 = UWord128Ops.MulHigh(b0, ua);
            ulong lo0 = b0 * ua;
            ref ulong c0 = ref Unsafe.AddByteOffset(ref d, Unsafe.Add(ref off, j));
            c0 += (uint)lo0;
            Unsafe.Add(ref c0, 1) += (hi0 << 32) | (lo0 >> 32);
            ulong b1 = (ulong)Unsafe.Add(ref b, j + 1);
            ulong hi1 = UWord128Ops.MulHigh(b1, ua);
            ulong lo1 = b1 * ua;
            ref ulong c1 = ref Unsafe.AddByteOffset(ref d, Unsafe.Add(ref off, j + 1));
            c1 += (uint)lo1;
            Unsafe.Add(ref c1, 1) += (hi1 << 32) | (lo1 >> 32);
        }
        if (j < count)
        {
            ulong bj = (ulong)Unsafe.Add(ref b, j);
            ulong hi = UWord128Ops.MulHigh(bj, ua);
            ulong lo = bj * ua;
            ref ulong c = ref Unsafe.AddByteOffset(ref d, Unsafe.Add(ref off, j));
            c += (uint)lo;
            Unsafe.Add(ref c, 1) += (hi << 32) | (lo >> 32);
        }
    }

    [MethodImpl(MethodImplOptions.NoInlining | MethodImplOptions.AggressiveOptimization)]
    public static void MulSubBlock(ref Split96 buf, ref long a, ref int la, int na, ref long b, ref int lb, int nb)
    {
        for (int i = 0; i < na; i++)
        {
            ref Split96 row = ref Unsafe.Add(ref buf, Unsafe.Add(ref la, i));
            long ai = Unsafe.Add(ref a, i);
            for (int j = 0; j < nb; j++)
                MulSub(ref Unsafe.Add(ref row, Unsafe.Add(ref lb, j)), ai, Unsafe.Add(ref b, j));
        }
    }

    [MethodImpl(MethodImplOptions.NoInlining | MethodImplOptions.AggressiveOptimization)]
    public static void MulAddBlock(ref Split96 buf, ref long a, ref int la, int na, ref long b, ref nint lb, int nb)
    {
        for (int i = 0; i < na; i++)
            MulAddRow(ref Unsafe.Add(ref buf, Unsafe.Add(ref la, i)), Unsafe.Add(ref a, i), ref b, ref lb, nb);
    }

    public static void Set(out Split96 acc, long a)
    {
        if (a < 0) throw new InvalidOperationException("Split96 accumulators hold non-negative values.");
        acc.Low = (uint)a;
        acc.High = (ulong)a >> 32;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsZero(in Split96 acc) => (acc.Low | acc.High) == 0;

    public static BigInteger ToBigInteger(in Split96 acc) => (BigInteger)acc.Value;

    public static Rational ToRational(in Split96 acc, in BigInteger denominator)
    {
        var v = acc.Value;
        if (v <= (UInt128)Int128.MaxValue) return Word128Ops.ToRational((Int128)v, in denominator);
        return denominator.IsOne ? new Rational((BigInteger)v) : new Rational((BigInteger)v, denominator);
    }

    public static int TryDivideExact(in Split96 acc, long divisor, long limit, out long quotient) =>
        throw new InvalidOperationException("Split96 accumulators are for multiplication only.");
}

/// <summary>A signed 192-bit two's-complement integer used as an accumulator.</summary>
internal struct Int192
{
    public ulong Lo;
    public ulong Mid;
    public long Hi;

    public readonly bool IsZero => (Lo | Mid | (ulong)Hi) == 0;

    public readonly BigInteger ToBigInteger()
    {
        Span<byte> bytes = stackalloc byte[24];
        System.Buffers.Binary.BinaryPrimitives.WriteUInt64LittleEndian(bytes, Lo);
        System.Buffers.Binary.BinaryPrimitives.WriteUInt64LittleEndian(bytes[8..], Mid);
        System.Buffers.Binary.BinaryPrimitives.WriteInt64LittleEndian(bytes[16..], Hi);
        return new BigInteger(bytes, isUnsigned: false, isBigEndian: false);
    }
}

/// <summary>Word coefficients accumulated in 192 bits; always wide enough for word inputs
/// (|a·b| &lt; 2^126, and fewer than 2^62 products per term).</summary>
internal struct Word192Ops : ICoefficientOps<long, Int192>
{
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulAdd(ref Int192 acc, long a, long b)
    {
        long hi = Math.BigMul(a, b, out long lo);
        Add(ref acc, (ulong)lo, (ulong)hi, (ulong)(hi >> 63));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void MulSub(ref Int192 acc, long a, long b)
    {
        long hi = Math.BigMul(a, b, out long lo);
        // Negate the sign-extended 192-bit product.
        ulong l = ~(ulong)lo, m = ~(ulong)hi, h = ~(ulong)(hi >> 63);
        l++;
        if (l == 0) { m++; if (m == 0) h++; }
        Add(ref acc, l, m, h);
    }

    public static void MulAddRow(ref Int192 dest, long a, ref long b, ref nint off, int count) =>
        CoefficientLoops.MulAddRow<Word192Ops, long, Int192>(ref dest, a, ref b, ref off, count);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Add(ref Int192 acc, ulong l, ulong m, ulong h)
    {
        ulong s0 = acc.Lo + l;
        ulong c0 = s0 < l ? 1UL : 0UL;
        ulong s1 = acc.Mid + m;
        ulong c1 = s1 < m ? 1UL : 0UL;
        s1 += c0;
        if (s1 < c0) c1 = 1;
        acc.Lo = s0;
        acc.Mid = s1;
        acc.Hi = (long)((ulong)acc.Hi + h + c1);
    }

    public static void MulSubBlock(ref Int192 buf, ref long a, ref int la, int na, ref long b, ref int lb, int nb) =>
        CoefficientLoops.MulSubBlock<Word192Ops, long, Int192>(ref buf, ref a, ref la, na, ref b, ref lb, nb);

    public static void MulAddBlock(ref Int192 buf, ref long a, ref int la, int na, ref long b, ref nint lb, int nb) =>
        CoefficientLoops.MulAddBlock<Word192Ops, long, Int192>(ref buf, ref a, ref la, na, ref b, ref lb, nb);

    public static void Set(out Int192 acc, long a)
    {
        acc.Lo = (ulong)a;
        acc.Mid = (ulong)(a >> 63);
        acc.Hi = a >> 63;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsZero(in Int192 acc) => acc.IsZero;

    public static BigInteger ToBigInteger(in Int192 acc) => acc.ToBigInteger();

    public static Rational ToRational(in Int192 acc, in BigInteger denominator) =>
        denominator.IsOne ? new Rational(acc.ToBigInteger()) : new Rational(acc.ToBigInteger(), denominator);

    public static int TryDivideExact(in Int192 acc, long divisor, long limit, out long quotient)
    {
        quotient = 0;
        var q = BigInteger.DivRem(acc.ToBigInteger(), divisor, out var r);
        if (!r.IsZero) return 1;
        if (q > limit || q < -limit) return 2;
        quotient = (long)q;
        return 0;
    }
}

/// <summary>Big-integer coefficients and accumulators (the general fallback).</summary>
internal struct BigOps : ICoefficientOps<BigInteger, BigInteger>
{
    public static void MulAdd(ref BigInteger acc, BigInteger a, BigInteger b) => acc += a * b;

    public static void MulSub(ref BigInteger acc, BigInteger a, BigInteger b) => acc -= a * b;

    public static void MulAddRow(ref BigInteger dest, BigInteger a, ref BigInteger b, ref nint off, int count) =>
        CoefficientLoops.MulAddRow<BigOps, BigInteger, BigInteger>(ref dest, a, ref b, ref off, count);

    public static void MulSubBlock(ref BigInteger buf, ref BigInteger a, ref int la, int na, ref BigInteger b, ref int lb, int nb) =>
        CoefficientLoops.MulSubBlock<BigOps, BigInteger, BigInteger>(ref buf, ref a, ref la, na, ref b, ref lb, nb);

    public static void MulAddBlock(ref BigInteger buf, ref BigInteger a, ref int la, int na, ref BigInteger b, ref nint lb, int nb) =>
        CoefficientLoops.MulAddBlock<BigOps, BigInteger, BigInteger>(ref buf, ref a, ref la, na, ref b, ref lb, nb);

    public static void Set(out BigInteger acc, BigInteger a) => acc = a;

    public static bool IsZero(in BigInteger acc) => acc.IsZero;

    public static BigInteger ToBigInteger(in BigInteger acc) => acc;

    public static Rational ToRational(in BigInteger acc, in BigInteger denominator) =>
        denominator.IsOne ? new Rational(acc) : new Rational(acc, denominator);

    public static int TryDivideExact(in BigInteger acc, BigInteger divisor, BigInteger limit, out BigInteger quotient)
    {
        quotient = BigInteger.DivRem(acc, divisor, out var r);
        return r.IsZero ? 0 : 1;
    }
}

/// <summary>Bounds that decide which accumulator is wide enough.</summary>
internal static class CoefficientBounds
{
    /// <summary>Bit length of the largest magnitude in <paramref name="values"/>.</summary>
    public static int MaxBits(ReadOnlySpan<long> values)
    {
        ulong or = 0;
        foreach (var v in values) or |= IntegerMathAbs(v);
        return 64 - BitOperations.LeadingZeroCount(or);
    }

    /// <summary>Bit length of an upper bound for every |Σ a_i·b_j| over any set of pairs with
    /// distinct i and distinct j (which covers every partial sum of one product coefficient):
    /// min(‖A‖₁·max|B|, max|A|·‖B‖₁).</summary>
    public static int ProductSumBits(ReadOnlySpan<long> a, ReadOnlySpan<long> b)
    {
        UInt128 l1a = 0, l1b = 0;
        ulong ma = 0, mb = 0;
        foreach (var x in a) { ulong u = IntegerMathAbs(x); l1a += u; if (u > ma) ma = u; }
        foreach (var x in b) { ulong u = IntegerMathAbs(x); l1b += u; if (u > mb) mb = u; }
        return Math.Min(BoundBits(l1a, mb), BoundBits(l1b, ma));
    }

    private static int BoundBits(UInt128 l1, ulong max)
    {
        int bl = 128 - (int)UInt128.LeadingZeroCount(l1), bm = Bits(max);
        if (bl + bm > 127) return bl + bm; // too big for an exact product; the sum of lengths bounds it
        UInt128 p = l1 * max;
        return 128 - (int)UInt128.LeadingZeroCount(p);
    }

    /// <summary>Bit length of <paramref name="value"/> (0 for 0).</summary>
    public static int Bits(ulong value) => 64 - BitOperations.LeadingZeroCount(value);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static ulong IntegerMathAbs(long v) => v < 0 ? (ulong)(-(v + 1)) + 1UL : (ulong)v;
}
