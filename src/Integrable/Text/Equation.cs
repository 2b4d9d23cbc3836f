namespace Integrable.Text;

/// <summary>An equation <c>left = right</c> as typed, e.g. <c>x_{n+1} x_{n-1} = x_n^2 + 1</c>.</summary>
/// <example><code>
/// Equation eq = ExpressionParser.ParseEquation("x_{n+1} x_{n-1} = x_n^2 + 1");
/// string text = eq.ToString();   // "x_{n+1}*x_{n-1} = x_n^2 + 1"
/// </code></example>
public sealed record Equation
{
    /// <summary>Creates the equation.</summary>
    /// <param name="left">The left-hand side.</param>
    /// <param name="right">The right-hand side.</param>
    /// <exception cref="ArgumentNullException">A side is null.</exception>
    public Equation(Expression left, Expression right)
    {
        Left = left ?? throw new ArgumentNullException(nameof(left));
        Right = right ?? throw new ArgumentNullException(nameof(right));
    }

    /// <summary>The left-hand side.</summary>
    public Expression Left { get; }

    /// <summary>The right-hand side.</summary>
    public Expression Right { get; }

    /// <summary>Canonical text <c>left = right</c>; parses back with <see cref="ExpressionParser.ParseEquation(string)"/>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => ExpressionFormatter.ToText(this);
}
