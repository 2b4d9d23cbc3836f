using System.Globalization;
using System.Numerics;
using System.Text;
using Integrable.Numbers;

namespace Integrable.Univariate;

public sealed partial class UnivariatePolynomial
{
    /// <summary>Text from the highest degree down, e.g. <c>-1/2*x^3 + 2*x - 1</c>; zero is <c>0</c>.
    /// Parses back with <see cref="Parse(string, string)"/>.</summary>
    /// <returns>The text in the variable x.</returns>
    public override string ToString() => ToString("x");

    /// <summary>Text in a chosen variable name.</summary>
    /// <param name="variable">The variable name.</param>
    /// <returns>The text.</returns>
    /// <exception cref="ArgumentException"><paramref name="variable"/> is empty.</exception>
    public string ToString(string variable)
    {
        ArgumentException.ThrowIfNullOrEmpty(variable);
        if (_c.Length == 0) return "0";
        var sb = new StringBuilder();
        bool first = true;
        for (int k = _c.Length - 1; k >= 0; k--)
        {
            var c = _c[k];
            if (c.IsZero) continue;
            UnivariateText.AppendTerm(sb, c.Sign < 0, Rational.Abs(c).ToString(), k, variable, first);
            first = false;
        }
        return sb.ToString();
    }

    /// <summary>Parses a sum of terms <c>c*x^k</c> with integer or fractional coefficients.</summary>
    /// <param name="text">The text, e.g. <c>x^3 - 2/3*x + 1</c>.</param>
    /// <param name="variable">The variable name (default x).</param>
    /// <returns>The polynomial.</returns>
    /// <exception cref="FormatException">The text is malformed; the message gives the position.</exception>
    /// <exception cref="DivideByZeroException">A denominator is zero.</exception>
    public static UnivariatePolynomial Parse(string text, string variable = "x")
    {
        var terms = UnivariateText.ParseTerms(text, variable);
        int deg = 0;
        foreach (var (_, e) in terms) deg = Math.Max(deg, e);
        var c = new Rational[deg + 1];
        foreach (var (coef, e) in terms) c[e] += coef;
        return new(Trim(c));
    }
}
