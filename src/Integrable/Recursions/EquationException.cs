using Integrable.Text;

namespace Integrable.Recursions;

/// <summary>An equation that parses but cannot be read as a recursion: no index variable, a
/// subscript that is not "index ± integer", several unknowns, or a highest shift that does not enter
/// linearly. The message names the offending term and shows it with a caret.</summary>
public sealed class EquationException : FormatException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="reason">What is wrong, without position information.</param>
    /// <param name="span">Where in the input (may be <see cref="SourceSpan.None"/>).</param>
    public EquationException(string reason, SourceSpan span)
        : base(span.HasSource ? $"{reason}\n{span.ToCaretDisplay()}" : reason)
    {
        Reason = reason;
        Span = span;
    }

    /// <summary>What is wrong.</summary>
    public string Reason { get; }

    /// <summary>The offending part of the input.</summary>
    public SourceSpan Span { get; }

    /// <summary>0-based position of the offending part in the input (0 when unknown).</summary>
    public int Position => Span.Start;
}
