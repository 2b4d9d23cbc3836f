using Integrable.Text;

namespace Integrable.RationalFunctions;

public sealed partial class RationalFunction
{
    /// <summary>Plain text that <see cref="Parse"/> reads back: the numerator alone for polynomials,
    /// otherwise <c>num/den</c> with parentheses around a numerator of several terms and around a
    /// denominator that is not a single power (e.g. <c>(x + 1)/(x*y - 2)</c>, <c>3*x/y^2</c>).</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        if (Denominator.IsOne) return Numerator.ToString();
        var num = Numerator.ToString();
        var den = Denominator.ToString();
        if (Numerator.TermCount > 1) num = "(" + num + ")";
        if (Denominator.TermCount > 1 || den.Contains('*')) den = "(" + den + ")";
        return num + "/" + den;
    }

    /// <summary>LaTeX: the numerator alone for polynomials, otherwise <c>\frac{num}{den}</c>.</summary>
    /// <returns>The LaTeX text (math mode, without delimiters).</returns>
    public string ToLatex() =>
        Denominator.IsOne ? Numerator.ToLatex() : "\\frac{" + Numerator.ToLatex() + "}{" + Denominator.ToLatex() + "}";

    /// <summary>Reads a rational function written as on paper, e.g. <c>(x^2 + 1)/(x y - 2) + 1/x</c>,
    /// in the variables of <paramref name="field"/>; the text written by <see cref="ToString"/> reads
    /// back to an equal value.</summary>
    /// <param name="field">The field whose variables the text may use.</param>
    /// <param name="text">The expression.</param>
    /// <returns>The value in canonical form.</returns>
    /// <exception cref="ExpressionParseException">Malformed text (with position and caret).</exception>
    /// <exception cref="ExpressionEvaluationException">An unknown variable or a division by zero (with
    /// the position of the offending sub-expression).</exception>
    public static RationalFunction Parse(RationalFunctionField field, string text)
    {
        ArgumentNullException.ThrowIfNull(field);
        var expression = ExpressionParser.Parse(text);
        return ExpressionEvaluator.Evaluate(expression, field, s =>
            field.PolynomialRing.Contains(s.Name) ? field.Variable(s.Name) : throw new KeyNotFoundException(s.Name));
    }
}
