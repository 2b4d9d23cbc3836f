using System.Text;

namespace Integrable.Text;

/// <summary>Draws an input line with a caret line under a span, for error messages.</summary>
internal static class CaretDisplay
{
    /// <summary>Characters shown on each side of the span when the input is too long for one screen line.</summary>
    private const int Context = 40;

    public static string Format(string source, int start, int length)
    {
        start = Math.Clamp(start, 0, source.Length);
        length = Math.Clamp(length, 0, source.Length - start);
        int from = Math.Max(0, start - Context);
        int to = Math.Min(source.Length, start + Math.Min(length, 2 * Context) + Context);
        // Do not cut a surrogate pair in half.
        if (from > 0 && char.IsLowSurrogate(source[from])) from--;
        if (to < source.Length && to > 0 && char.IsHighSurrogate(source[to - 1])) to++;

        var line = new StringBuilder("  ");
        if (from > 0) line.Append("...");
        int caretColumn = line.Length + (start - from);
        foreach (char c in source.AsSpan(from, to - from))
            line.Append(char.IsControl(c) ? ' ' : c); // tabs and line breaks would shift the caret
        if (to < source.Length) line.Append("...");

        int carets = Math.Max(1, Math.Min(length, to - start));
        return line.Append('\n').Append(' ', caretColumn).Append('^', carets).ToString();
    }
}
