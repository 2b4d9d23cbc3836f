using System.Globalization;

namespace Integrable.LinearAlgebra;

/// <summary>Tokenizer for the bracketed matrix text <c>[[a, b], [c, d]]</c>, <c>[]</c> and <c>[](0xN)</c>.</summary>
internal static class MatrixText
{
    /// <summary>The entry tokens of each row with their positions in <paramref name="text"/>.</summary>
    /// <param name="text">The text.</param>
    /// <param name="emptyColumns">For a matrix without rows, its column count (0 for <c>[]</c>).</param>
    public static List<List<(string Token, int Position)>> ParseRows(string text, out int emptyColumns)
    {
        emptyColumns = 0;
        var rows = new List<List<(string, int)>>();
        int pos = 0;
        SkipSpace(text, ref pos);
        Expect(text, ref pos, '[');
        SkipSpace(text, ref pos);
        if (pos < text.Length && text[pos] == ']')
        {
            pos++;
            SkipSpace(text, ref pos);
            if (pos < text.Length && text[pos] == '(')
            {
                int close = text.IndexOf(')', pos);
                if (close < 0) throw new FormatException($"missing ')' after position {pos} in '{text}'");
                var shape = text.AsSpan(pos + 1, close - pos - 1).Trim();
                if (!shape.StartsWith("0x") || !int.TryParse(shape[2..], NumberStyles.None, CultureInfo.InvariantCulture, out emptyColumns))
                    throw new FormatException($"expected a shape '(0xN)' at position {pos} in '{text}'");
                pos = close + 1;
            }
            End(text, pos);
            return rows;
        }
        while (true)
        {
            SkipSpace(text, ref pos);
            Expect(text, ref pos, '[');
            var row = new List<(string, int)>();
            SkipSpace(text, ref pos);
            if (pos < text.Length && text[pos] == ']') pos++;
            else
            {
                while (true)
                {
                    SkipSpace(text, ref pos);
                    int start = pos;
                    while (pos < text.Length && text[pos] != ',' && text[pos] != ']' && text[pos] != '[') pos++;
                    var token = text[start..pos].Trim();
                    if (token.Length == 0) throw new FormatException($"missing entry at position {start} in '{text}'");
                    row.Add((token, start));
                    if (pos >= text.Length) throw new FormatException($"unterminated row at position {start} in '{text}'");
                    if (text[pos] == ',') { pos++; continue; }
                    Expect(text, ref pos, ']');
                    break;
                }
            }
            rows.Add(row);
            SkipSpace(text, ref pos);
            if (pos < text.Length && text[pos] == ',') { pos++; continue; }
            Expect(text, ref pos, ']');
            break;
        }
        End(text, pos);
        return rows;
    }

    private static void End(string text, int pos)
    {
        SkipSpace(text, ref pos);
        if (pos != text.Length) throw new FormatException($"unexpected '{text[pos]}' at position {pos} in '{text}'");
    }

    private static void SkipSpace(string text, ref int pos)
    {
        while (pos < text.Length && char.IsWhiteSpace(text[pos])) pos++;
    }

    private static void Expect(string text, ref int pos, char c)
    {
        if (pos >= text.Length) throw new FormatException($"expected '{c}' at the end of '{text}'");
        if (text[pos] != c) throw new FormatException($"expected '{c}' at position {pos} in '{text}', found '{text[pos]}'");
        pos++;
    }
}
