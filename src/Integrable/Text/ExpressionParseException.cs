namespace Integrable.Text;

/// <summary>Thrown when text is not a well-formed expression or equation. The message names the problem and
/// shows the input with a caret under the offending place:
/// <code>
/// unexpected ')' at position 6
///   x_n + )
///         ^
/// </code></summary>
public sealed class ExpressionParseException : FormatException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="input">The whole input text.</param>
    /// <param name="position">0-based index of the offending character (the input length for "at the end").</param>
    /// <param name="length">Number of offending characters (0 for a position between characters).</param>
    /// <param name="reason">A short description such as <c>unexpected ')'</c>.</param>
    public ExpressionParseException(string input, int position, int length, string reason)
        : base(BuildMessage(input, position, length, reason))
    {
        Input = input;
        Position = position;
        Length = length;
        Reason = reason;
    }

    /// <summary>The whole input text.</summary>
    public string Input { get; }

    /// <summary>0-based index (UTF-16 code units) of the offending place; equal to the input length when the input ended too early.</summary>
    public int Position { get; }

    /// <summary>Number of characters at fault (0 at the end of the input).</summary>
    public int Length { get; }

    /// <summary>The short description, without position or caret display.</summary>
    public string Reason { get; }

    private static string BuildMessage(string input, int position, int length, string reason)
    {
        ArgumentNullException.ThrowIfNull(input);
        ArgumentNullException.ThrowIfNull(reason);
        return $"{reason} at position {position}\n{CaretDisplay.Format(input, position, length)}";
    }
}
