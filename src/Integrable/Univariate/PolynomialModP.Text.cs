using System.Globalization;
using System.Text;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;

namespace Integrable.Univariate;

public sealed partial class PolynomialModP
{
    /// <summary>Text from the highest degree down, residues in [0, p), e.g. <c>3*x^2 + x + 100</c>; zero is <c>0</c>.
    /// Parses back with <see cref="Parse(PrimeField, string, string)"/>.</summary>
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
            if (_c[k] == 0) continue;
            UnivariateText.AppendTerm(sb, false, _c[k].ToString(CultureInfo.InvariantCulture), k, variable, first);
            first = false;
        }
        return sb.ToString();
    }

    /// <summary>Parses a sum of terms <c>c*x^k</c> (c an integer or fraction, reduced mod p; signs allowed).</summary>
    /// <param name="field">The coefficient field.</param>
    /// <param name="text">The text, e.g. <c>x^3 - 2*x + 1/2</c>.</param>
    /// <param name="variable">The variable name (default x).</param>
    /// <returns>The polynomial.</returns>
    /// <exception cref="FormatException">The text is malformed; the message gives the position.</exception>
    /// <exception cref="DivideByZeroException">A denominator is zero mod p.</exception>
    public static PolynomialModP Parse(PrimeField field, string text, string variable = "x")
    {
        var ctx = Ctx(field);
        var terms = UnivariateText.ParseTerms(text, variable);
        int deg = 0;
        foreach (var (_, e) in terms) deg = Math.Max(deg, e);
        var c = new ulong[deg + 1];
        foreach (var (coef, e) in terms) c[e] = ctx.Mod.Add(c[e], field.FromRational(coef));
        return new(ctx, PolyMod.Trim(c));
    }
}
