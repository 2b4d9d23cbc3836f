using Integrable.Text;

namespace Integrable.Polynomials;

public sealed partial class LaurentPolynomial
{
    /// <summary>Reads a Laurent polynomial written as on paper (<c>3*x^2*y^-1 - 1/2 z + 1</c>,
    /// <c>(x + 1)(x_{n+1} - 2)/x^3</c>) in the variables of <paramref name="ring"/>; the text written by
    /// <see cref="ToString"/> reads back to an equal value.</summary>
    /// <param name="ring">The ring whose variables the text may use.</param>
    /// <param name="text">The expression.</param>
    /// <returns>The Laurent polynomial.</returns>
    /// <exception cref="ExpressionParseException">Malformed text (with position and caret).</exception>
    /// <exception cref="ExpressionEvaluationException">An unknown variable, or a division that is not exact
    /// in the Laurent ring (the span points at the divisor).</exception>
    /// <example><code>
    /// var ring = new LaurentPolynomialRing("x", "y");
    /// var p = LaurentPolynomial.Parse(ring, "(x^2 - y^2)/(x - y)");   // x + y
    /// </code></example>
    public static LaurentPolynomial Parse(LaurentPolynomialRing ring, string text)
    {
        ArgumentNullException.ThrowIfNull(ring);
        var expression = ExpressionParser.Parse(text);
        return ExpressionEvaluator.Evaluate(expression, ring, s =>
            ring.Contains(s.Name) ? ring.Variable(s.Name) : throw new KeyNotFoundException(s.Name));
    }
}
