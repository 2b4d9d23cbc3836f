using System.Globalization;
using System.Text;
using Integrable.Numbers;

namespace Integrable.Polynomials;

public sealed partial class LaurentPolynomial
{
    /// <summary>Plain text that the library's expression parser reads back: terms in canonical order
    /// joined by <c> + </c> / <c> - </c>, each term a coefficient and powers joined by <c>*</c>, powers
    /// written <c>name^k</c> with a signed integer k (omitted when 1), coefficients as integers or
    /// <c>p/q</c> (omitted when ±1 unless the term is constant). Example:
    /// <c>3*x^2*y^-1 - 1/2*z + 1</c>; the zero polynomial is <c>0</c>. Variable names are printed
    /// verbatim; invariant culture.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        if (IsZero) return "0";
        var sb = new StringBuilder();
        int n = _ring.VariableCount;
        for (int t = 0; t < _coeffs.Length; t++)
        {
            var c = _coeffs[t];
            bool negative = c.Sign < 0;
            if (t == 0) { if (negative) sb.Append('-'); }
            else sb.Append(negative ? " - " : " + ");
            var abs = negative ? -c : c;
            bool wroteFactor = false;
            var e = _exps.AsSpan(t * n, n);
            bool constant = !e.ContainsAnyExcept(0);
            if (!abs.IsOne || constant)
            {
                sb.Append(abs.ToString());
                wroteFactor = true;
            }
            for (int v = 0; v < n; v++)
            {
                if (e[v] == 0) continue;
                if (wroteFactor) sb.Append('*');
                sb.Append(_ring.Variables[v]);
                if (e[v] != 1) sb.Append('^').Append(e[v].ToString(CultureInfo.InvariantCulture));
                wroteFactor = true;
            }
        }
        return sb.ToString();
    }

    /// <summary>LaTeX markup, e.g. <c>3 x^{2} y^{-1} - \frac{1}{2} z + 1</c>. Variable names are
    /// inserted verbatim (names such as <c>x_{n+1}</c> are already valid LaTeX); a power of a name
    /// that contains a subscript or several characters is braced: <c>{x_{n+1}}^{2}</c>.</summary>
    /// <returns>The LaTeX text (math mode, without delimiters).</returns>
    public string ToLatex()
    {
        if (IsZero) return "0";
        var sb = new StringBuilder();
        int n = _ring.VariableCount;
        for (int t = 0; t < _coeffs.Length; t++)
        {
            var c = _coeffs[t];
            bool negative = c.Sign < 0;
            if (t == 0) { if (negative) sb.Append('-'); }
            else sb.Append(negative ? " - " : " + ");
            var abs = negative ? -c : c;
            var e = _exps.AsSpan(t * n, n);
            bool constant = !e.ContainsAnyExcept(0);
            bool wrote = false;
            if (!abs.IsOne || constant)
            {
                sb.Append(abs.IsInteger ? abs.Numerator.ToString(CultureInfo.InvariantCulture)
                    : "\\frac{" + abs.Numerator.ToString(CultureInfo.InvariantCulture) + "}{" + abs.Denominator.ToString(CultureInfo.InvariantCulture) + "}");
                wrote = true;
            }
            for (int v = 0; v < n; v++)
            {
                if (e[v] == 0) continue;
                if (wrote) sb.Append(' ');
                var name = _ring.Variables[v];
                if (e[v] == 1) sb.Append(name);
                else
                {
                    if (name.Length == 1) sb.Append(name);
                    else sb.Append('{').Append(name).Append('}');
                    sb.Append("^{").Append(e[v].ToString(CultureInfo.InvariantCulture)).Append('}');
                }
                wrote = true;
            }
        }
        return sb.ToString();
    }
}
