using System.Diagnostics.CodeAnalysis;
using System.Globalization;
using System.Numerics;

namespace Integrable.Numbers;

public readonly partial struct Rational : ISpanFormattable
{
    /// <summary>Plain text in the invariant culture: <c>-3/4</c>, <c>5</c>; parses back with <see cref="Parse(string)"/>.</summary>
    /// <returns>The canonical text.</returns>
    public override string ToString()
    {
        if (_big is null)
            return _denMinusOne == 0
                ? _num.ToString(CultureInfo.InvariantCulture)
                : string.Concat(_num.ToString(CultureInfo.InvariantCulture), "/", SmallDen.ToString(CultureInfo.InvariantCulture));
        return _big.Den.IsOne
            ? _big.Num.ToString(CultureInfo.InvariantCulture)
            : string.Concat(_big.Num.ToString(CultureInfo.InvariantCulture), "/", _big.Den.ToString(CultureInfo.InvariantCulture));
    }

    /// <summary>Formats the value; the format string is ignored (the text is always exact).</summary>
    /// <param name="format">Ignored.</param>
    /// <param name="formatProvider">Ignored; the invariant culture is used.</param>
    /// <returns>The canonical text.</returns>
    public string ToString(string? format, IFormatProvider? formatProvider) => ToString();

    /// <summary>Writes the canonical text into a span.</summary>
    /// <param name="destination">Target span.</param>
    /// <param name="charsWritten">Number of characters written.</param>
    /// <param name="format">Ignored.</param>
    /// <param name="provider">Ignored.</param>
    /// <returns>False when the span is too short.</returns>
    public bool TryFormat(Span<char> destination, out int charsWritten, ReadOnlySpan<char> format, IFormatProvider? provider)
    {
        var s = ToString();
        if (s.Length > destination.Length) { charsWritten = 0; return false; }
        s.AsSpan().CopyTo(destination);
        charsWritten = s.Length;
        return true;
    }

    /// <summary>LaTeX text: <c>\frac{3}{4}</c>, <c>-\frac{3}{4}</c>, <c>5</c>.</summary>
    /// <returns>The LaTeX markup.</returns>
    public string ToLatex()
    {
        if (IsInteger) return ToString();
        var n = Numerator;
        return (n.Sign < 0 ? "-" : "") + "\\frac{" + BigInteger.Abs(n).ToString(CultureInfo.InvariantCulture) + "}{" +
               Denominator.ToString(CultureInfo.InvariantCulture) + "}";
    }

    /// <summary>Parses <c>p</c>, <c>p/q</c> or a decimal <c>d.ddd</c> (optional sign, invariant culture).</summary>
    /// <param name="s">The text.</param>
    /// <returns>The value.</returns>
    /// <exception cref="FormatException"><paramref name="s"/> is not a rational number; the message gives the position.</exception>
    /// <exception cref="DivideByZeroException">The denominator is zero.</exception>
    public static Rational Parse(string s)
    {
        ArgumentNullException.ThrowIfNull(s);
        return Parse(s.AsSpan());
    }

    /// <summary>Parses <c>p</c>, <c>p/q</c> or a decimal <c>d.ddd</c>.</summary>
    /// <param name="s">The text.</param>
    /// <returns>The value.</returns>
    /// <exception cref="FormatException">Not a rational number.</exception>
    /// <exception cref="DivideByZeroException">The denominator is zero.</exception>
    public static Rational Parse(ReadOnlySpan<char> s)
    {
        if (!TryParseCore(s, out var r, out var error))
        {
            if (error == "zero denominator") throw new DivideByZeroException("Rational with zero denominator.");
            throw new FormatException($"Not a rational number: '{s.ToString()}' ({error}).");
        }
        return r;
    }

    /// <summary>Tries to parse <c>p</c>, <c>p/q</c> or a decimal.</summary>
    /// <param name="s">The text.</param>
    /// <param name="result">The value when the call succeeds.</param>
    /// <returns>True on success.</returns>
    public static bool TryParse([NotNullWhen(true)] string? s, out Rational result)
    {
        if (s is null) { result = default; return false; }
        return TryParseCore(s.AsSpan(), out result, out _);
    }

    /// <summary>Tries to parse <c>p</c>, <c>p/q</c> or a decimal.</summary>
    /// <param name="s">The text.</param>
    /// <param name="result">The value when the call succeeds.</param>
    /// <returns>True on success.</returns>
    public static bool TryParse(ReadOnlySpan<char> s, out Rational result) => TryParseCore(s, out result, out _);

    private static bool TryParseCore(ReadOnlySpan<char> s, out Rational result, out string error)
    {
        result = default;
        s = s.Trim();
        int slash = s.IndexOf('/');
        if (slash >= 0)
        {
            if (!TryParseInteger(s[..slash].Trim(), true, out var n) || !TryParseInteger(s[(slash + 1)..].Trim(), true, out var d))
            { error = "expected integer/integer"; return false; }
            if (d.IsZero) { error = "zero denominator"; return false; }
            result = new Rational(n, d);
            error = "";
            return true;
        }
        int dot = s.IndexOf('.');
        if (dot >= 0)
        {
            var intPart = s[..dot];
            var frac = s[(dot + 1)..];
            bool neg = intPart.Length > 0 && intPart[0] == '-';
            if (intPart.Length > 0 && (intPart[0] == '-' || intPart[0] == '+')) intPart = intPart[1..];
            if ((intPart.Length == 0 && frac.Length == 0) || !AllDigits(intPart) || !AllDigits(frac))
            { error = "malformed decimal"; return false; }
            var digits = string.Concat(intPart, frac);
            var n = digits.Length == 0 ? BigInteger.Zero : BigInteger.Parse(digits, NumberStyles.None, CultureInfo.InvariantCulture);
            result = new Rational(neg ? -n : n, BigInteger.Pow(10, frac.Length));
            error = "";
            return true;
        }
        if (!TryParseInteger(s, true, out var k)) { error = "expected an integer, p/q or a decimal"; return false; }
        result = new Rational(k);
        error = "";
        return true;
    }

    private static bool AllDigits(ReadOnlySpan<char> s)
    {
        foreach (var c in s) if (c < '0' || c > '9') return false;
        return true;
    }

    private static bool TryParseInteger(ReadOnlySpan<char> s, bool allowSign, out BigInteger value)
    {
        value = default;
        if (s.Length == 0) return false;
        var body = s;
        if (allowSign && (s[0] == '-' || s[0] == '+')) body = s[1..];
        if (body.Length == 0 || !AllDigits(body)) return false;
        if (body.Length <= 18)
        {
            long v = long.Parse(body, NumberStyles.None, CultureInfo.InvariantCulture);
            value = s[0] == '-' ? -v : v;
            return true;
        }
        value = BigInteger.Parse(body, NumberStyles.None, CultureInfo.InvariantCulture);
        if (s[0] == '-') value = -value;
        return true;
    }
}
