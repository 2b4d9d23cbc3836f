using System.Diagnostics.CodeAnalysis;
using System.Globalization;
using System.Text;

namespace Integrable.Clusters;

public sealed partial class ExchangeMatrix
{
    /// <summary>The entries as nested brackets, row by row, e.g. <c>[[0,1],[-1,0]]</c>; the rows after
    /// the first n (n = number of columns) are the frozen rows. Parses back with <see cref="Parse"/>.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        int n = MutableCount;
        var sb = new StringBuilder(RowCount * (2 + 3 * n) + 2);
        sb.Append('[');
        for (int i = 0; i < RowCount; i++)
        {
            if (i > 0) sb.Append(',');
            sb.Append('[');
            for (int j = 0; j < n; j++)
            {
                if (j > 0) sb.Append(',');
                sb.Append(_b[i * n + j].ToString(CultureInfo.InvariantCulture));
            }
            sb.Append(']');
        }
        return sb.Append(']').ToString();
    }

    /// <summary>Reads a matrix written as nested brackets, e.g. <c>[[0,1],[-1,0]]</c> or
    /// <c>[[0, 2, -2], [-2, 0, 2], [2, -2, 0]]</c>. All rows must have the same length n, which is the
    /// number of mutable directions; rows after the first n are frozen rows. Whitespace (including
    /// line breaks) is allowed between tokens.</summary>
    /// <param name="text">The text.</param>
    /// <returns>The matrix.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="text"/> is null.</exception>
    /// <exception cref="ClusterFormatException">The text is malformed (unexpected character, ragged rows,
    /// fewer rows than columns, an integer out of range); the exception gives the position.</exception>
    /// <exception cref="NotSkewSymmetrizableException">The principal part is not skew-symmetrizable.</exception>
    public static ExchangeMatrix Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var (rows, n, error) = ReadRows(text);
        if (error is not null) throw error;
        return FromRows(n, rows!.Count / n - n, rows.ToArray());
    }

    /// <summary>Reads a matrix as <see cref="Parse"/> does, without throwing.</summary>
    /// <param name="text">The text, possibly null.</param>
    /// <param name="result">The matrix when the call succeeds.</param>
    /// <returns>False when the text is malformed or the matrix is not skew-symmetrizable.</returns>
    public static bool TryParse([NotNullWhen(true)] string? text, [NotNullWhen(true)] out ExchangeMatrix? result)
    {
        result = null;
        if (text is null) return false;
        var (entries, n, error) = ReadRows(text);
        if (error is not null) return false;
        try
        {
            result = FromRows(n, entries!.Count / n - n, entries.ToArray());
            return true;
        }
        catch (ArgumentException)
        {
            return false;
        }
    }

    /// <summary>Tokenises nested-bracket text into row-major entries and the row length.</summary>
    private static (List<int>? Entries, int Columns, ClusterFormatException? Error) ReadRows(string text)
    {
        int pos = 0;
        var entries = new List<int>();
        int columns = -1, rowCount = 0;

        void SkipSpace() { while (pos < text.Length && char.IsWhiteSpace(text[pos])) pos++; }
        ClusterFormatException Fail(string problem) => new(text, pos, problem);
        string Found() => pos < text.Length ? $"'{text[pos]}'" : "end of text";

        SkipSpace();
        if (pos >= text.Length || text[pos] != '[') return (null, 0, Fail($"expected '[' to open the matrix, found {Found()}"));
        pos++;
        while (true)
        {
            SkipSpace();
            int rowStart = pos;
            if (pos >= text.Length || text[pos] != '[')
                return (null, 0, Fail($"expected '[' to open row {rowCount + 1}, found {Found()}"));
            pos++;
            int length = 0;
            while (true)
            {
                SkipSpace();
                int start = pos;
                if (pos < text.Length && (text[pos] == '-' || text[pos] == '+')) pos++;
                int digits = pos;
                while (pos < text.Length && char.IsAsciiDigit(text[pos])) pos++;
                if (pos == digits)
                {
                    pos = start;
                    return (null, 0, Fail($"expected an integer in row {rowCount + 1}, found {Found()}"));
                }
                if (!int.TryParse(text.AsSpan(start, pos - start), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out int value)
                    || value == int.MinValue)
                {
                    string literal = text[start..pos];
                    pos = start;
                    return (null, 0, Fail($"integer '{literal}' is out of range"));
                }
                entries.Add(value);
                length++;
                SkipSpace();
                if (pos < text.Length && text[pos] == ',') { pos++; continue; }
                if (pos < text.Length && text[pos] == ']') { pos++; break; }
                return (null, 0, Fail($"expected ',' or ']' in row {rowCount + 1}, found {Found()}"));
            }
            rowCount++;
            if (columns < 0) columns = length;
            else if (length != columns)
            {
                pos = rowStart;
                return (null, 0, Fail($"row {rowCount} has {length} entries but row 1 has {columns}"));
            }
            SkipSpace();
            if (pos < text.Length && text[pos] == ',') { pos++; continue; }
            if (pos < text.Length && text[pos] == ']') { pos++; break; }
            return (null, 0, Fail($"expected ',' or ']' after row {rowCount}, found {Found()}"));
        }
        SkipSpace();
        if (pos < text.Length) return (null, 0, Fail($"unexpected {Found()} after the matrix"));
        if (rowCount < columns)
            return (null, 0, Fail($"the matrix has {columns} columns but only {rowCount} rows; it needs at least one row per column"));
        return (entries, columns, null);
    }
}
