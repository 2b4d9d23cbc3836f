using System.Globalization;
using System.Numerics;
using System.Text;
using Integrable.Numbers;

namespace Integrable.Univariate;

/// <summary>Shared text handling for the univariate types: terms <c>c*x^k</c> joined by <c>+</c>/<c>-</c>.</summary>
internal static class UnivariateText
{
    /// <summary>Largest exponent accepted by the parser (dense storage: the degree fixes the array length).</summary>
    public const int MaxExponent = 1 << 28;

    /// <summary>Parses a sum of terms such as <c>3*x^2 - x/2 + 1/3</c> or <c>-2/3*t + 5</c>; repeated
    /// exponents are added. Returns (coefficient, exponent) pairs.</summary>
    public static List<(Rational Coefficient, int Exponent)> ParseTerms(string text, string variable)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentException.ThrowIfNullOrEmpty(variable);
        var terms = new List<(Rational, int)>();
        int i = 0, n = text.Length;
        void SkipSpaces() { while (i < n && char.IsWhiteSpace(text[i])) i++; }
        FormatException Error(string what) => new($"cannot parse polynomial '{text}': {what} at position {i}");
        SkipSpaces();
        if (i == n) throw Error("empty text");
        bool first = true;
        while (true)
        {
            SkipSpaces();
            if (i == n) break;
            int sign = 1;
            if (text[i] == '+' || text[i] == '-')
            {
                sign = text[i] == '-' ? -1 : 1;
                i++;
                SkipSpaces();
            }
            else if (!first) throw Error("expected '+' or '-'");
            first = false;
            Rational coef = Rational.One;
            bool haveCoef = false;
            if (i < n && char.IsAsciiDigit(text[i]))
            {
                coef = ParseNumber(ref i);
                SkipSpaces();
                if (i < n && text[i] == '/')
                {
                    i++;
                    SkipSpaces();
                    if (i == n || !char.IsAsciiDigit(text[i])) throw Error("expected a denominator");
                    var den = ParseNumber(ref i);
                    if (den.IsZero) throw new DivideByZeroException($"zero denominator in '{text}'");
                    coef /= den;
                }
                haveCoef = true;
                SkipSpaces();
                if (i < n && text[i] == '*') { i++; SkipSpaces(); if (!StartsVariable()) throw Error($"expected '{variable}' after '*'"); }
                else if (StartsVariable()) throw Error("expected '*' between a coefficient and the variable");
            }
            int exponent = 0;
            if (StartsVariable())
            {
                i += variable.Length;
                SkipSpaces();
                exponent = 1;
                if (i < n && text[i] == '^')
                {
                    i++;
                    SkipSpaces();
                    if (i == n || !char.IsAsciiDigit(text[i])) throw Error("expected an exponent");
                    var e = ParseNumber(ref i);
                    if (e > MaxExponent) throw Error($"exponent above {MaxExponent}");
                    exponent = (int)(long)e;
                }
                SkipSpaces();
                if (i < n && text[i] == '/')
                {
                    i++;
                    SkipSpaces();
                    if (i == n || !char.IsAsciiDigit(text[i])) throw Error("expected a denominator");
                    var den = ParseNumber(ref i);
                    if (den.IsZero) throw new DivideByZeroException($"zero denominator in '{text}'");
                    coef /= den;
                }
            }
            else if (!haveCoef) throw Error($"expected a number or '{variable}'");
            terms.Add((sign < 0 ? -coef : coef, exponent));
        }
        return terms;

        bool StartsVariable() =>
            string.CompareOrdinal(text, i, variable, 0, variable.Length) == 0 &&
            (i + variable.Length == n || !char.IsLetterOrDigit(text[i + variable.Length]));

        Rational ParseNumber(ref int pos)
        {
            int start = pos;
            while (pos < n && char.IsAsciiDigit(text[pos])) pos++;
            return new Rational(BigInteger.Parse(text.AsSpan(start, pos - start), NumberStyles.None, CultureInfo.InvariantCulture));
        }
    }

    /// <summary>Appends one term c·x^k given the absolute value text of c (empty when |c| = 1 and k &gt; 0).</summary>
    public static void AppendTerm(StringBuilder sb, bool negative, string absCoefficient, int exponent, string variable, bool first)
    {
        if (first) { if (negative) sb.Append('-'); }
        else sb.Append(negative ? " - " : " + ");
        bool unit = absCoefficient == "1" && exponent > 0;
        if (!unit) sb.Append(absCoefficient);
        if (exponent == 0) return;
        if (!unit) sb.Append('*');
        sb.Append(variable);
        if (exponent > 1) sb.Append('^').Append(exponent.ToString(CultureInfo.InvariantCulture));
    }
}
