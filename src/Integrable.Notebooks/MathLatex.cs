using System.Globalization;
using System.Text;
using Integrable.Clusters;
using Integrable.LinearAlgebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;

namespace Integrable.Notebooks;

/// <summary>LaTeX for the library's mathematical objects, as shown by the notebook formatters.</summary>
public static class MathLatex
{
    /// <summary>LaTeX of a value: Laurent polynomials, rational functions, rationals and matrices use
    /// their own <c>ToLatex</c>; exchange matrices become a <c>pmatrix</c>; anything else is set as text.</summary>
    /// <param name="value">The value (null gives an empty string).</param>
    /// <returns>LaTeX math-mode markup (without delimiters).</returns>
    public static string Of(object? value) => value switch
    {
        null => "",
        LaurentPolynomial p => p.ToLatex(),
        RationalFunction f => f.ToLatex(),
        Rational r => r.ToLatex(),
        RationalMatrix m => m.ToLatex(),
        ExchangeMatrix b => Matrix(b),
        Quiver q => Matrix(q.ToMatrix()),
        IFormattable f => f.ToString(null, CultureInfo.InvariantCulture),
        _ => "\\text{" + EscapeText(value.ToString() ?? "") + "}",
    };

    /// <summary>An exchange matrix as a LaTeX <c>pmatrix</c>, frozen rows below a rule.</summary>
    /// <param name="matrix">The matrix.</param>
    /// <returns>LaTeX math-mode markup.</returns>
    public static string Matrix(ExchangeMatrix matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        var sb = new StringBuilder("\\begin{pmatrix}");
        for (int i = 1; i <= matrix.RowCount; i++)
        {
            if (i > 1) sb.Append(" \\\\ ");
            if (i == matrix.MutableCount + 1) sb.Append("\\hline ");
            for (int j = 1; j <= matrix.MutableCount; j++)
            {
                if (j > 1) sb.Append(" & ");
                sb.Append(matrix[i, j].ToString(CultureInfo.InvariantCulture));
            }
        }
        return sb.Append("\\end{pmatrix}").ToString();
    }

    /// <summary>A seed as <c>\left(x_1, …, x_n \mid \text{frozen}; B\right)</c>.</summary>
    /// <typeparam name="T">The type of the cluster variables.</typeparam>
    /// <param name="seed">The seed.</param>
    /// <returns>LaTeX math-mode markup.</returns>
    public static string Seed<T>(Seed<T> seed)
    {
        ArgumentNullException.ThrowIfNull(seed);
        var sb = new StringBuilder("\\left(");
        var vars = seed.Variables;
        for (int i = 0; i < vars.Length; i++)
        {
            if (i > 0) sb.Append(i == seed.MutableCount ? " \\;\\middle|\\; " : ",\\ ");
            sb.Append(Of(vars[i]));
        }
        return sb.Append(";\\ ").Append(Matrix(seed.Matrix)).Append("\\right)").ToString();
    }

    /// <summary>Wraps math-mode markup as display math, <c>$$…$$</c> (what notebook front ends and MathJax/KaTeX render).</summary>
    /// <param name="latex">Math-mode markup.</param>
    /// <returns>The display-math string.</returns>
    public static string Display(string latex) => "$$" + latex + "$$";

    internal static string EscapeText(string s) =>
        s.Replace("\\", "\\textbackslash{}").Replace("{", "\\{").Replace("}", "\\}").Replace("_", "\\_")
         .Replace("^", "\\^{}").Replace("%", "\\%").Replace("&", "\\&").Replace("#", "\\#").Replace("$", "\\$");
}
