namespace Integrable.Text;

/// <summary>A stretch of the text an expression was read from: the whole input plus a start index and
/// a length in UTF-16 code units. Nodes built in code (not parsed) carry <see cref="None"/>.</summary>
/// <example><code>
/// var e = ExpressionParser.Parse("x_n + 1/(y - y)");
/// // e's second term is the quotient 1/(y - y); its divisor's span covers "(y - y)": Start 8, Length 7.
/// </code></example>
public readonly record struct SourceSpan
{
    /// <summary>Creates a span into <paramref name="source"/>.</summary>
    /// <param name="source">The whole input text, or null when there is none.</param>
    /// <param name="start">0-based index of the first character.</param>
    /// <param name="length">Number of characters (0 for a position between characters).</param>
    /// <exception cref="ArgumentOutOfRangeException">The span does not lie inside <paramref name="source"/>.</exception>
    public SourceSpan(string? source, int start, int length)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(start);
        ArgumentOutOfRangeException.ThrowIfNegative(length);
        if (source is not null && start + length > source.Length)
            throw new ArgumentOutOfRangeException(nameof(length), "The span runs past the end of the source text.");
        Source = source;
        Start = start;
        Length = length;
    }

    /// <summary>The span of a node that was not read from text.</summary>
    public static SourceSpan None => default;

    /// <summary>The whole input the span points into, or null for <see cref="None"/>.</summary>
    public string? Source { get; }

    /// <summary>0-based index of the first character.</summary>
    public int Start { get; }

    /// <summary>Number of characters covered.</summary>
    public int Length { get; }

    /// <summary>Index just after the last character.</summary>
    public int End => Start + Length;

    /// <summary>True when the span points into a source text.</summary>
    public bool HasSource => Source is not null;

    /// <summary>The covered text, or the empty string when there is no source.</summary>
    public string Text => Source is null ? "" : Source.Substring(Start, Length);

    /// <summary>The smallest span covering this span and <paramref name="other"/> (same source assumed).</summary>
    /// <param name="other">The other span.</param>
    /// <returns>The covering span; <see cref="None"/> when either has no source.</returns>
    public SourceSpan Union(SourceSpan other)
    {
        if (Source is null || other.Source is null) return None;
        int start = Math.Min(Start, other.Start);
        return new SourceSpan(Source, start, Math.Max(End, other.End) - start);
    }

    /// <summary>The input line with a caret line under the span, two spaces indented, as used in error messages:
    /// <c>"  x_n + )\n        ^"</c>. Long inputs are cut to a window around the span.</summary>
    /// <returns>The two-line display, or the empty string when there is no source.</returns>
    public string ToCaretDisplay() => Source is null ? "" : CaretDisplay.Format(Source, Start, Length);

    /// <summary>Debug text: <c>[start..end)</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Source is null ? "[no source]" : $"[{Start}..{End})";
}
