using System.Numerics;
using System.Runtime.CompilerServices;

namespace Integrable.Numbers;

public readonly partial struct Rational
{
    /// <summary>Sum of two rationals.</summary>
    /// <param name="a">First summand.</param>
    /// <param name="b">Second summand.</param>
    /// <returns><paramref name="a"/> + <paramref name="b"/>, canonical.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Rational operator +(Rational a, Rational b)
    {
        if (a._big is null && b._big is null)
        {
            if ((a._denMinusOne | b._denMinusOne) == 0)
            {
                long s = a._num + b._num;
                // Overflow iff both operands have the same sign and the result's sign differs.
                if (((a._num ^ s) & (b._num ^ s)) >= 0 && s != long.MinValue) return new Rational(s, 1, true);
                return FromInteger((Int128)a._num + b._num);
            }
            return AddSmall(a._num, a.SmallDen, b._num, b.SmallDen);
        }
        return AddBig(a, b);
    }

    private static Rational AddSmall(long an, long ad, long bn, long bd)
    {
        ulong g = IntegerMath.Gcd((ulong)ad, (ulong)bd);
        if (g == 1)
            return FromReducedWide((Int128)an * bd + (Int128)bn * ad, (Int128)ad * bd);
        long adg = ad / (long)g, bdg = bd / (long)g;
        Int128 t = (Int128)an * bdg + (Int128)bn * adg;
        if (t == 0) return default;
        ulong tg = (ulong)Int128.Abs(t % (long)g);
        ulong g2 = IntegerMath.Gcd(tg, g);
        if (g2 != 1) t /= (long)g2;
        return FromReducedWide(t, (Int128)adg * (bd / (long)g2));
    }

    private static Rational AddBig(Rational a, Rational b)
    {
        BigInteger an = a.Numerator, ad = a.Denominator, bn = b.Numerator, bd = b.Denominator;
        if (ad.IsOne && bd.IsOne) return FromBig(an + bn, BigInteger.One);
        var g = BigInteger.GreatestCommonDivisor(ad, bd);
        if (g.IsOne) return FromBig(an * bd + bn * ad, ad * bd);
        BigInteger adg = ad / g, bdg = bd / g;
        BigInteger t = an * bdg + bn * adg;
        if (t.IsZero) return default;
        var g2 = BigInteger.GreatestCommonDivisor(t, g);
        if (!g2.IsOne) { t /= g2; bd /= g2; }
        return FromBig(t, adg * bd);
    }

    /// <summary>Difference of two rationals.</summary>
    /// <param name="a">Minuend.</param>
    /// <param name="b">Subtrahend.</param>
    /// <returns><paramref name="a"/> − <paramref name="b"/>, canonical.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Rational operator -(Rational a, Rational b) => a + (-b);

    /// <summary>Negation.</summary>
    /// <param name="a">The value.</param>
    /// <returns>−<paramref name="a"/>.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Rational operator -(Rational a)
    {
        if (a._big is null) return new Rational(-a._num, a.SmallDen, true);
        return FromBig(-a._big.Num, a._big.Den);
    }

    /// <summary>Identity (unary plus).</summary>
    /// <param name="a">The value.</param>
    /// <returns><paramref name="a"/>.</returns>
    public static Rational operator +(Rational a) => a;

    /// <summary>Product of two rationals.</summary>
    /// <param name="a">First factor.</param>
    /// <param name="b">Second factor.</param>
    /// <returns><paramref name="a"/>·<paramref name="b"/>, canonical.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Rational operator *(Rational a, Rational b)
    {
        if (a._big is null && b._big is null)
        {
            if ((a._denMinusOne | b._denMinusOne) == 0)
            {
                long hi = Math.BigMul(a._num, b._num, out long lo);
                if (hi == (lo >> 63) && lo != long.MinValue) return new Rational(lo, 1, true);
                return FromInteger((Int128)a._num * b._num);
            }
            return MultiplySmall(a._num, a.SmallDen, b._num, b.SmallDen);
        }
        return MultiplyBig(a, b);
    }

    private static Rational MultiplySmall(long an, long ad, long bn, long bd)
    {
        if (an == 0 || bn == 0) return default;
        ulong g1 = IntegerMath.Gcd(IntegerMath.UnsignedAbs(an), (ulong)bd);
        ulong g2 = IntegerMath.Gcd(IntegerMath.UnsignedAbs(bn), (ulong)ad);
        if (g1 != 1) { an /= (long)g1; bd /= (long)g1; }
        if (g2 != 1) { bn /= (long)g2; ad /= (long)g2; }
        return FromReducedWide((Int128)an * bn, (Int128)ad * bd);
    }

    private static Rational MultiplyBig(Rational a, Rational b)
    {
        BigInteger an = a.Numerator, ad = a.Denominator, bn = b.Numerator, bd = b.Denominator;
        if (an.IsZero || bn.IsZero) return default;
        var g1 = BigInteger.GreatestCommonDivisor(an, bd);
        var g2 = BigInteger.GreatestCommonDivisor(bn, ad);
        if (!g1.IsOne) { an /= g1; bd /= g1; }
        if (!g2.IsOne) { bn /= g2; ad /= g2; }
        return FromBig(an * bn, ad * bd);
    }

    /// <summary>Quotient of two rationals.</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor, non-zero.</param>
    /// <returns><paramref name="a"/>/<paramref name="b"/>, canonical.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="b"/> is zero.</exception>
    public static Rational operator /(Rational a, Rational b) => a * b.Inverse();

    /// <summary>Remainder of truncated division: a − b·trunc(a/b).</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor, non-zero.</param>
    /// <returns>The remainder, with the sign of <paramref name="a"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="b"/> is zero.</exception>
    public static Rational operator %(Rational a, Rational b)
    {
        var q = a / b;
        return a - b * Truncate(q);
    }

    /// <summary>Adds one.</summary>
    /// <param name="a">The value.</param>
    /// <returns><paramref name="a"/> + 1.</returns>
    public static Rational operator ++(Rational a) => a + One;

    /// <summary>Subtracts one.</summary>
    /// <param name="a">The value.</param>
    /// <returns><paramref name="a"/> − 1.</returns>
    public static Rational operator --(Rational a) => a - One;

    /// <summary>The multiplicative inverse 1/this.</summary>
    /// <returns>1/this.</returns>
    /// <exception cref="DivideByZeroException">The value is zero.</exception>
    public Rational Inverse()
    {
        if (_big is null)
        {
            if (_num == 0) throw new DivideByZeroException("Inverse of zero rational.");
            long d = SmallDen;
            return _num > 0 ? new Rational(d, _num, true) : new Rational(-d, -_num, true);
        }
        var n = _big.Num;
        return n.Sign > 0 ? FromBig(_big.Den, n) : FromBig(-_big.Den, -n);
    }

    /// <summary>Integer power, negative exponents included (by repeated squaring).</summary>
    /// <param name="exponent">The exponent.</param>
    /// <returns>this^<paramref name="exponent"/>; 0^0 = 1.</returns>
    /// <exception cref="DivideByZeroException">Zero raised to a negative power.</exception>
    public Rational Pow(int exponent)
    {
        if (exponent < 0) return Inverse().Pow(checked(-exponent));
        if (exponent == 0) return One;
        // Powers of a reduced fraction stay reduced, so numerator and denominator are powered separately.
        var n = BigInteger.Pow(Numerator, exponent);
        var d = BigInteger.Pow(Denominator, exponent);
        return FromBig(n, d);
    }

    /// <summary>Absolute value.</summary>
    /// <param name="value">The value.</param>
    /// <returns>|<paramref name="value"/>|.</returns>
    public static Rational Abs(Rational value) => value.Sign < 0 ? -value : value;

    /// <summary>Largest integer not above <paramref name="value"/>.</summary>
    /// <param name="value">The value.</param>
    /// <returns>⌊<paramref name="value"/>⌋ as a big integer.</returns>
    public static BigInteger Floor(Rational value)
    {
        if (value._big is null) return new BigInteger(FloorDiv(value._num, value.SmallDen));
        return BigInteger.DivRem(value._big.Num, value._big.Den, out var r) - (r.Sign < 0 ? 1 : 0);
    }

    /// <summary>Smallest integer not below <paramref name="value"/>.</summary>
    /// <param name="value">The value.</param>
    /// <returns>⌈<paramref name="value"/>⌉ as a big integer.</returns>
    public static BigInteger Ceiling(Rational value) => -Floor(-value);

    /// <summary>Integer part, rounding toward zero.</summary>
    /// <param name="value">The value.</param>
    /// <returns>The value truncated toward zero, as a rational.</returns>
    public static Rational Truncate(Rational value) => new(BigInteger.Divide(value.Numerator, value.Denominator));

    private static long FloorDiv(long n, long d)
    {
        long q = n / d;
        return (n % d != 0 && n < 0) ? q - 1 : q;
    }

    /// <summary>Named form of <c>a + b</c>.</summary>
    /// <param name="a">First summand.</param>
    /// <param name="b">Second summand.</param>
    /// <returns>The sum.</returns>
    public static Rational Add(Rational a, Rational b) => a + b;

    /// <summary>Named form of <c>a - b</c>.</summary>
    /// <param name="a">Minuend.</param>
    /// <param name="b">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static Rational Subtract(Rational a, Rational b) => a - b;

    /// <summary>Named form of <c>a * b</c>.</summary>
    /// <param name="a">First factor.</param>
    /// <param name="b">Second factor.</param>
    /// <returns>The product.</returns>
    public static Rational Multiply(Rational a, Rational b) => a * b;

    /// <summary>Named form of <c>a / b</c>.</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor.</param>
    /// <returns>The quotient.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="b"/> is zero.</exception>
    public static Rational Divide(Rational a, Rational b) => a / b;

    /// <summary>Named form of unary minus.</summary>
    /// <param name="a">The value.</param>
    /// <returns>−<paramref name="a"/>.</returns>
    public static Rational Negate(Rational a) => -a;

    /// <summary>Named form of <c>a % b</c>.</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor.</param>
    /// <returns>The truncated remainder.</returns>
    public static Rational Mod(Rational a, Rational b) => a % b;

    /// <summary>The integer <paramref name="value"/> as a rational.</summary>
    /// <param name="value">The integer.</param>
    public static implicit operator Rational(int value) => new(value, 1, true);

    /// <summary>The integer <paramref name="value"/> as a rational.</summary>
    /// <param name="value">The integer.</param>
    public static implicit operator Rational(long value) => new(value);

    /// <summary>The integer <paramref name="value"/> as a rational.</summary>
    /// <param name="value">The integer.</param>
    public static implicit operator Rational(BigInteger value) => new(value);

    /// <summary>The nearest double (correctly scaled also for huge numerators and denominators).</summary>
    /// <param name="value">The value.</param>
    public static explicit operator double(Rational value) => value.ToDouble();

    /// <summary>The value as an integer word.</summary>
    /// <param name="value">The value; must be an integer that fits in a word.</param>
    /// <exception cref="OverflowException">Not an integer, or out of range.</exception>
    public static explicit operator long(Rational value)
    {
        if (value._big is null && value._denMinusOne == 0) return value._num;
        if (!value.IsInteger) throw new OverflowException($"{value} is not an integer.");
        return (long)value._big!.Num;
    }

    /// <summary>The value as a big integer.</summary>
    /// <param name="value">The value; must be an integer.</param>
    /// <exception cref="InvalidCastException">The value is not an integer.</exception>
    public static explicit operator BigInteger(Rational value)
    {
        if (!value.IsInteger) throw new InvalidCastException($"{value} is not an integer.");
        return value.Numerator;
    }

    /// <summary>The exact value of a finite double.</summary>
    /// <param name="value">A finite double.</param>
    /// <exception cref="OverflowException"><paramref name="value"/> is NaN or infinite.</exception>
    public static explicit operator Rational(double value) => FromDouble(value);

    /// <summary>The exact rational value of a finite double (every double is a dyadic rational).</summary>
    /// <param name="value">A finite double.</param>
    /// <returns>The exact value.</returns>
    /// <exception cref="OverflowException"><paramref name="value"/> is NaN or infinite.</exception>
    public static Rational FromDouble(double value)
    {
        if (!double.IsFinite(value)) throw new OverflowException($"Cannot convert {value} to a rational.");
        if (value == 0) return default;
        long bits = BitConverter.DoubleToInt64Bits(value);
        bool negative = bits < 0;
        int exp = (int)((bits >> 52) & 0x7FF);
        long mant = bits & 0xFFFFFFFFFFFFFL;
        if (exp == 0) exp++; else mant |= 1L << 52;
        exp -= 1075;
        BigInteger n = mant;
        if (negative) n = -n;
        return exp >= 0 ? new Rational(n << exp) : new Rational(n, BigInteger.One << -exp);
    }

    /// <summary>The nearest double to this value.</summary>
    /// <returns>A double approximation (±infinity only for values beyond the double range).</returns>
    public double ToDouble()
    {
        if (_big is null) return (double)_num / SmallDen;
        var n = _big.Num; var d = _big.Den;
        long shift = (long)n.GetBitLength() - (long)d.GetBitLength() - 60;
        // Scale so that the integer quotient has about 60 significant bits, then rescale.
        BigInteger q = shift >= 0 ? n / (d << (int)Math.Min(shift, int.MaxValue)) : (n << (int)Math.Min(-shift, int.MaxValue)) / d;
        return Math.ScaleB((double)q, (int)shift);
    }
}
