using System.Diagnostics.CodeAnalysis;
using System.Globalization;
using System.Numerics;

namespace Integrable.Numbers;

// The .NET generic-math surface of Rational. Members whose names clash with the instance
// properties (IsZero, IsInteger) are implemented explicitly.
public readonly partial struct Rational : INumber<Rational>, ISignedNumber<Rational>, Integrable.Algebra.IRingElement<Rational>
{
    /// <summary>The radix used by generic math (10, for formatting).</summary>
    public static int Radix => 10;

    /// <summary>Zero, the additive identity.</summary>
    public static Rational AdditiveIdentity => default;

    /// <summary>One, the multiplicative identity.</summary>
    public static Rational MultiplicativeIdentity => One;

    static bool INumberBase<Rational>.IsCanonical(Rational value) => true;
    static bool INumberBase<Rational>.IsComplexNumber(Rational value) => false;
    static bool INumberBase<Rational>.IsEvenInteger(Rational value) => value.IsInteger && value.Numerator.IsEven;
    static bool INumberBase<Rational>.IsFinite(Rational value) => true;
    static bool INumberBase<Rational>.IsImaginaryNumber(Rational value) => false;
    static bool INumberBase<Rational>.IsInfinity(Rational value) => false;
    static bool INumberBase<Rational>.IsInteger(Rational value) => value.IsInteger;
    static bool INumberBase<Rational>.IsNaN(Rational value) => false;
    static bool INumberBase<Rational>.IsNegative(Rational value) => value.Sign < 0;
    static bool INumberBase<Rational>.IsNegativeInfinity(Rational value) => false;
    static bool INumberBase<Rational>.IsNormal(Rational value) => !value.IsZero;
    static bool INumberBase<Rational>.IsOddInteger(Rational value) => value.IsInteger && !value.Numerator.IsEven;
    static bool INumberBase<Rational>.IsPositive(Rational value) => value.Sign >= 0;
    static bool INumberBase<Rational>.IsPositiveInfinity(Rational value) => false;
    static bool INumberBase<Rational>.IsRealNumber(Rational value) => true;
    static bool INumberBase<Rational>.IsSubnormal(Rational value) => false;
    static bool INumberBase<Rational>.IsZero(Rational value) => value.IsZero;

    /// <summary>The value of larger magnitude (the larger one when magnitudes tie).</summary>
    /// <param name="x">First value.</param>
    /// <param name="y">Second value.</param>
    /// <returns>The value of larger absolute value.</returns>
    public static Rational MaxMagnitude(Rational x, Rational y)
    {
        int c = Abs(x).CompareTo(Abs(y));
        return c > 0 ? x : c < 0 ? y : Max(x, y);
    }

    /// <summary>Same as <see cref="MaxMagnitude"/> (rationals have no NaN).</summary>
    /// <param name="x">First value.</param>
    /// <param name="y">Second value.</param>
    /// <returns>The value of larger absolute value.</returns>
    public static Rational MaxMagnitudeNumber(Rational x, Rational y) => MaxMagnitude(x, y);

    /// <summary>The value of smaller magnitude (the smaller one when magnitudes tie).</summary>
    /// <param name="x">First value.</param>
    /// <param name="y">Second value.</param>
    /// <returns>The value of smaller absolute value.</returns>
    public static Rational MinMagnitude(Rational x, Rational y)
    {
        int c = Abs(x).CompareTo(Abs(y));
        return c < 0 ? x : c > 0 ? y : Min(x, y);
    }

    /// <summary>Same as <see cref="MinMagnitude"/> (rationals have no NaN).</summary>
    /// <param name="x">First value.</param>
    /// <param name="y">Second value.</param>
    /// <returns>The value of smaller absolute value.</returns>
    public static Rational MinMagnitudeNumber(Rational x, Rational y) => MinMagnitude(x, y);

    /// <summary>Parses like <see cref="Parse(string)"/>; style and provider are ignored.</summary>
    /// <param name="s">The text.</param>
    /// <param name="style">Ignored.</param>
    /// <param name="provider">Ignored.</param>
    /// <returns>The value.</returns>
    /// <exception cref="FormatException">Not a rational number.</exception>
    public static Rational Parse(ReadOnlySpan<char> s, NumberStyles style, IFormatProvider? provider) => Parse(s);

    /// <summary>Parses like <see cref="Parse(string)"/>; style and provider are ignored.</summary>
    /// <param name="s">The text.</param>
    /// <param name="style">Ignored.</param>
    /// <param name="provider">Ignored.</param>
    /// <returns>The value.</returns>
    /// <exception cref="FormatException">Not a rational number.</exception>
    public static Rational Parse(string s, NumberStyles style, IFormatProvider? provider) => Parse(s);

    /// <summary>Parses like <see cref="Parse(string)"/>; the provider is ignored.</summary>
    /// <param name="s">The text.</param>
    /// <param name="provider">Ignored.</param>
    /// <returns>The value.</returns>
    /// <exception cref="FormatException">Not a rational number.</exception>
    public static Rational Parse(ReadOnlySpan<char> s, IFormatProvider? provider) => Parse(s);

    /// <summary>Parses like <see cref="Parse(string)"/>; the provider is ignored.</summary>
    /// <param name="s">The text.</param>
    /// <param name="provider">Ignored.</param>
    /// <returns>The value.</returns>
    /// <exception cref="FormatException">Not a rational number.</exception>
    public static Rational Parse(string s, IFormatProvider? provider) => Parse(s);

    /// <summary>Tries to parse; style and provider are ignored.</summary>
    /// <param name="s">The text.</param>
    /// <param name="style">Ignored.</param>
    /// <param name="provider">Ignored.</param>
    /// <param name="result">The value on success.</param>
    /// <returns>True on success.</returns>
    public static bool TryParse(ReadOnlySpan<char> s, NumberStyles style, IFormatProvider? provider, out Rational result) => TryParse(s, out result);

    /// <summary>Tries to parse; style and provider are ignored.</summary>
    /// <param name="s">The text.</param>
    /// <param name="style">Ignored.</param>
    /// <param name="provider">Ignored.</param>
    /// <param name="result">The value on success.</param>
    /// <returns>True on success.</returns>
    public static bool TryParse([NotNullWhen(true)] string? s, NumberStyles style, IFormatProvider? provider, out Rational result) => TryParse(s, out result);

    /// <summary>Tries to parse; the provider is ignored.</summary>
    /// <param name="s">The text.</param>
    /// <param name="provider">Ignored.</param>
    /// <param name="result">The value on success.</param>
    /// <returns>True on success.</returns>
    public static bool TryParse(ReadOnlySpan<char> s, IFormatProvider? provider, out Rational result) => TryParse(s, out result);

    /// <summary>Tries to parse; the provider is ignored.</summary>
    /// <param name="s">The text.</param>
    /// <param name="provider">Ignored.</param>
    /// <param name="result">The value on success.</param>
    /// <returns>True on success.</returns>
    public static bool TryParse([NotNullWhen(true)] string? s, IFormatProvider? provider, out Rational result) => TryParse(s, out result);

    static bool INumberBase<Rational>.TryConvertFromChecked<TOther>(TOther value, out Rational result) => TryConvertFrom(value, out result);
    static bool INumberBase<Rational>.TryConvertFromSaturating<TOther>(TOther value, out Rational result) => TryConvertFrom(value, out result);
    static bool INumberBase<Rational>.TryConvertFromTruncating<TOther>(TOther value, out Rational result) => TryConvertFrom(value, out result);
    static bool INumberBase<Rational>.TryConvertToChecked<TOther>(Rational value, [MaybeNullWhen(false)] out TOther result) => TryConvertTo(value, out result);
    static bool INumberBase<Rational>.TryConvertToSaturating<TOther>(Rational value, [MaybeNullWhen(false)] out TOther result) => TryConvertTo(value, out result);
    static bool INumberBase<Rational>.TryConvertToTruncating<TOther>(Rational value, [MaybeNullWhen(false)] out TOther result) => TryConvertTo(value, out result);

    private static bool TryConvertFrom<TOther>(TOther value, out Rational result) where TOther : INumberBase<TOther>
    {
        switch (value)
        {
            case Rational r: result = r; return true;
            case int i: result = i; return true;
            case long l: result = l; return true;
            case short s: result = s; return true;
            case sbyte sb: result = sb; return true;
            case byte b: result = b; return true;
            case ushort us: result = us; return true;
            case uint ui: result = (long)ui; return true;
            case ulong ul: result = new BigInteger(ul); return true;
            case BigInteger bi: result = bi; return true;
            case Int128 i128: result = new Rational((BigInteger)i128); return true;
            case double d when double.IsFinite(d): result = FromDouble(d); return true;
            case float f when float.IsFinite(f): result = FromDouble(f); return true;
            case decimal m:
                var bits = decimal.GetBits(m);
                var mant = new BigInteger((uint)bits[0]) | (new BigInteger((uint)bits[1]) << 32) | (new BigInteger((uint)bits[2]) << 64);
                int scale = (bits[3] >> 16) & 0xFF;
                if (bits[3] < 0) mant = -mant;
                result = new Rational(mant, BigInteger.Pow(10, scale));
                return true;
            default: result = default; return false;
        }
    }

    private static bool TryConvertTo<TOther>(Rational value, [MaybeNullWhen(false)] out TOther result) where TOther : INumberBase<TOther>
    {
        object? boxed = null;
        if (typeof(TOther) == typeof(double)) boxed = value.ToDouble();
        else if (typeof(TOther) == typeof(float)) boxed = (float)value.ToDouble();
        else if (typeof(TOther) == typeof(decimal)) boxed = (decimal)value.ToDouble();
        else if (typeof(TOther) == typeof(BigInteger) && value.IsInteger) boxed = value.Numerator;
        else if (typeof(TOther) == typeof(long) && value.IsInteger && value.IsSmall) boxed = value._num;
        else if (typeof(TOther) == typeof(int) && value.IsInteger && value.IsSmall && value._num is >= int.MinValue and <= int.MaxValue) boxed = (int)value._num;
        if (boxed is TOther t) { result = t; return true; }
        result = default;
        return false;
    }
}
