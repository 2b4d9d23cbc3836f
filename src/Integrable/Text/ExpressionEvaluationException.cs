namespace Integrable.Text;

/// <summary>Thrown when an expression cannot be evaluated in a ring: a division that is not exact (or by zero),
/// a number that does not exist in the ring, or a symbol without a value. It carries the offending
/// sub-expression and its span; when the expression was parsed, the message shows the input with a caret
/// line under that sub-expression.</summary>
public sealed class ExpressionEvaluationException : Exception
{
    /// <summary>Creates the exception.</summary>
    /// <param name="expression">The sub-expression at fault.</param>
    /// <param name="reason">A short description such as <c>division by zero</c>.</param>
    /// <param name="innerException">The exception raised by the ring, if any.</param>
    public ExpressionEvaluationException(Expression expression, string reason, Exception? innerException = null)
        : base(BuildMessage(expression, reason), innerException)
    {
        Expression = expression;
        Reason = reason;
    }

    /// <summary>The sub-expression at fault.</summary>
    public Expression Expression { get; }

    /// <summary>Where <see cref="Expression"/> was read from (<see cref="SourceSpan.None"/> when built in code).</summary>
    public SourceSpan Span => Expression.Span;

    /// <summary>The short description, without the caret display.</summary>
    public string Reason { get; }

    private static string BuildMessage(Expression expression, string reason)
    {
        ArgumentNullException.ThrowIfNull(expression);
        ArgumentNullException.ThrowIfNull(reason);
        var span = expression.Span;
        return span.HasSource
            ? $"{reason} at position {span.Start}\n{span.ToCaretDisplay()}"
            : $"{reason} in '{ExpressionFormatter.ToText(expression)}'";
    }
}
