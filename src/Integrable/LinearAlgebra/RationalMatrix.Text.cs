using System.Text;
using Integrable.Numbers;

namespace Integrable.LinearAlgebra;

public sealed partial class RationalMatrix
{
    /// <summary>Plain text, row by row: <c>[[1, -2/3], [0, 5]]</c>. A matrix without rows prints as
    /// <c>[]</c> followed by its shape, e.g. <c>[](0x3)</c>. The text parses back with <see cref="Parse"/>.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        if (RowCount == 0) return ColumnCount == 0 ? "[]" : $"[](0x{ColumnCount})";
        var sb = new StringBuilder();
        sb.Append('[');
        for (int i = 0; i < RowCount; i++)
        {
            if (i > 0) sb.Append(", ");
            sb.Append('[');
            for (int j = 0; j < ColumnCount; j++)
            {
                if (j > 0) sb.Append(", ");
                sb.Append(_data[i * ColumnCount + j].ToString());
            }
            sb.Append(']');
        }
        sb.Append(']');
        return sb.ToString();
    }

    /// <summary>LaTeX markup: a <c>pmatrix</c> environment.</summary>
    /// <returns>The markup.</returns>
    public string ToLatex()
    {
        var sb = new StringBuilder("\\begin{pmatrix}");
        for (int i = 0; i < RowCount; i++)
        {
            if (i > 0) sb.Append(" \\\\ ");
            for (int j = 0; j < ColumnCount; j++)
            {
                if (j > 0) sb.Append(" & ");
                sb.Append(_data[i * ColumnCount + j].ToLatex());
            }
        }
        sb.Append("\\end{pmatrix}");
        return sb.ToString();
    }

    /// <summary>Parses the text form written by <see cref="ToString"/>: <c>[[1, 2/3], [4, 5]]</c>
    /// (entries as accepted by <see cref="Rational.Parse(string)"/>), <c>[]</c>, or <c>[](0xN)</c>.</summary>
    /// <param name="text">The text.</param>
    /// <returns>The matrix.</returns>
    /// <exception cref="FormatException">The text is malformed; the message gives the position.</exception>
    /// <exception cref="DimensionMismatchException">The rows have different lengths.</exception>
    public static RationalMatrix Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var rows = MatrixText.ParseRows(text, out int emptyColumns);
        if (rows.Count == 0) return Zero(0, emptyColumns);
        var parsed = new Rational[rows.Count][];
        for (int i = 0; i < rows.Count; i++)
        {
            parsed[i] = new Rational[rows[i].Count];
            for (int j = 0; j < rows[i].Count; j++)
            {
                var (token, position) = rows[i][j];
                if (!Rational.TryParse(token, out parsed[i][j]))
                    throw new FormatException($"entry ({i}, {j}) at position {position} is not a rational number: '{token}'");
            }
        }
        return FromRows(parsed);
    }
}
