using System.Diagnostics;
using System.Numerics;
using System.Runtime.CompilerServices;

namespace Integrable.Numbers;

/// <summary>An exact rational number p/q, an element of the field Q.</summary>
/// <remarks>
/// <para>Always canonical: gcd(p, q) = 1 and q &gt; 0. Values whose numerator and denominator both fit
/// in a signed word (numerator strictly above <see cref="long.MinValue"/>) are stored inline with no
/// allocation, and every operation on two such values runs on 64/128-bit machine arithmetic; only
/// results that do not fit fall back to <see cref="BigInteger"/>. A value has exactly one
/// representation (small whenever it fits), so equality and hashing compare fields directly.</para>
/// <para><c>default(Rational)</c> is zero.</para>
/// </remarks>
/// <example><code>
/// var r = new Rational(6, -4);           // -3/2
/// var s = r * r + 1;                     // 13/4
/// Rational t = Rational.Parse("13/4");   // t == s
/// </code></example>
[DebuggerDisplay("{ToString(),nq}")]
public readonly partial struct Rational
{
    // Small form (valid when _big is null): value = _num / (_denMinusOne + 1).
    // Storing the denominator minus one makes default(Rational) equal to 0/1.
    private readonly long _num;
    private readonly long _denMinusOne;
    private readonly BigForm? _big;

    private sealed class BigForm(BigInteger num, BigInteger den)
    {
        public readonly BigInteger Num = num;
        public readonly BigInteger Den = den;
    }

    /// <summary>Trusted constructor for an already canonical small value.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private Rational(long num, long den, bool _)
    {
        Debug.Assert(den > 0 && num != long.MinValue);
        _num = num;
        _denMinusOne = den - 1;
        _big = null;
    }

    private Rational(BigForm big)
    {
        _num = 0;
        _denMinusOne = 0;
        _big = big;
    }

    /// <summary>The integer <paramref name="value"/> as a rational number.</summary>
    /// <param name="value">The integer.</param>
    public Rational(long value)
    {
        if (value == long.MinValue)
        {
            this = new Rational(new BigForm(value, BigInteger.One));
            return;
        }
        _num = value;
        _denMinusOne = 0;
        _big = null;
    }

    /// <summary>The integer <paramref name="value"/> as a rational number.</summary>
    /// <param name="value">The integer.</param>
    public Rational(BigInteger value) => this = FromBig(value, BigInteger.One);

    /// <summary>The fraction <paramref name="numerator"/>/<paramref name="denominator"/>, reduced to lowest terms.</summary>
    /// <param name="numerator">Numerator.</param>
    /// <param name="denominator">Denominator, non-zero.</param>
    /// <exception cref="DivideByZeroException"><paramref name="denominator"/> is zero.</exception>
    public Rational(long numerator, long denominator) => this = FromWide(numerator, denominator);

    /// <summary>The fraction <paramref name="numerator"/>/<paramref name="denominator"/>, reduced to lowest terms.</summary>
    /// <param name="numerator">Numerator.</param>
    /// <param name="denominator">Denominator, non-zero.</param>
    /// <exception cref="DivideByZeroException"><paramref name="denominator"/> is zero.</exception>
    public Rational(BigInteger numerator, BigInteger denominator)
    {
        if (denominator.IsZero) throw new DivideByZeroException("Rational with zero denominator.");
        var g = BigInteger.GreatestCommonDivisor(numerator, denominator);
        if (denominator.Sign < 0) g = -g;
        this = g.IsOne ? FromBig(numerator, denominator) : FromBig(numerator / g, denominator / g);
    }

    /// <summary>Zero.</summary>
    public static Rational Zero => default;

    /// <summary>One.</summary>
    public static Rational One => new(1, 1, true);

    /// <summary>Minus one.</summary>
    public static Rational NegativeOne => new(-1, 1, true);

    /// <summary>The numerator p of the canonical form p/q (sign carried here).</summary>
    public BigInteger Numerator => _big is null ? new BigInteger(_num) : _big.Num;

    /// <summary>The denominator q &gt; 0 of the canonical form p/q.</summary>
    public BigInteger Denominator => _big is null ? new BigInteger(_denMinusOne + 1) : _big.Den;

    /// <summary>True when the value is stored inline (numerator and denominator fit in a word).</summary>
    public bool IsSmall => _big is null;

    /// <summary>Gets the numerator and denominator as words when the value is stored inline.</summary>
    /// <param name="numerator">Numerator when the call succeeds.</param>
    /// <param name="denominator">Denominator (&gt; 0) when the call succeeds.</param>
    /// <returns>True when the value is small.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public bool TryGetSmall(out long numerator, out long denominator)
    {
        numerator = _num;
        denominator = _denMinusOne + 1;
        return _big is null;
    }

    /// <summary>-1, 0 or 1 according to the sign of the value.</summary>
    public int Sign => _big is null ? Math.Sign(_num) : _big.Num.Sign;

    /// <summary>True for zero.</summary>
    public bool IsZero => _big is null && _num == 0;

    /// <summary>True for one.</summary>
    public bool IsOne => _big is null && _num == 1 && _denMinusOne == 0;

    /// <summary>True when the denominator is 1.</summary>
    public bool IsInteger => _big is null ? _denMinusOne == 0 : _big.Den.IsOne;

    /// <summary>Builds a canonical value from a numerator and denominator given as 128-bit integers (reduces).</summary>
    internal static Rational FromWide(Int128 num, Int128 den)
    {
        if (den == 0) throw new DivideByZeroException("Rational with zero denominator.");
        if (den < 0) { num = -num; den = -den; }
        if (num == 0) return default;
        UInt128 g = Gcd128(num < 0 ? (UInt128)(-num) : (UInt128)num, (UInt128)den);
        if (g != 1) { num /= (Int128)g; den /= (Int128)g; }
        return FromReducedWide(num, den);
    }

    /// <summary>Builds a value from an already reduced 128-bit numerator and positive denominator.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Rational FromReducedWide(Int128 num, Int128 den)
    {
        if (IntegerMath.TryNarrow(num, out long n) && den <= long.MaxValue)
            return new Rational(n, (long)den, true);
        return new Rational(new BigForm((BigInteger)num, (BigInteger)den));
    }

    /// <summary>Builds a value from a reduced integer given as 128 bits.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Rational FromInteger(Int128 value)
    {
        if (IntegerMath.TryNarrow(value, out long n)) return new Rational(n, 1, true);
        return new Rational(new BigForm((BigInteger)value, BigInteger.One));
    }

    /// <summary>Builds a value from a small reduced pair without checks.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static Rational CreateUnchecked(long num, long den) => new(num, den, true);

    /// <summary>Builds a value from a reduced big pair with positive denominator, choosing the small form when it fits.</summary>
    internal static Rational FromBig(BigInteger num, BigInteger den)
    {
        if (den >= long.MinValue + 1 && den <= long.MaxValue && num > long.MinValue && num <= long.MaxValue)
            return new Rational((long)num, (long)den, true);
        return new Rational(new BigForm(num, den));
    }

    private static UInt128 Gcd128(UInt128 a, UInt128 b)
    {
        if (a <= ulong.MaxValue && b <= ulong.MaxValue) return IntegerMath.Gcd((ulong)a, (ulong)b);
        while (b != 0) { (a, b) = (b, a % b); }
        return a;
    }

    private long SmallDen
    {
        [MethodImpl(MethodImplOptions.AggressiveInlining)]
        get => _denMinusOne + 1;
    }
}
