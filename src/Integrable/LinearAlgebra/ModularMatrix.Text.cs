using System.Globalization;
using System.Text;
using Integrable.Numbers;

namespace Integrable.LinearAlgebra;

public sealed partial class ModularMatrix
{
    /// <summary>Plain text: the residues row by row followed by the modulus,
    /// <c>[[1, 2], [3, 4]] (mod 101)</c>; parses back with <see cref="Parse"/>.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        if (RowCount == 0) sb.Append(ColumnCount == 0 ? "[]" : $"[](0x{ColumnCount})");
        else
        {
            sb.Append('[');
            for (int i = 0; i < RowCount; i++)
            {
                if (i > 0) sb.Append(", ");
                sb.Append('[');
                for (int j = 0; j < ColumnCount; j++)
                {
                    if (j > 0) sb.Append(", ");
                    sb.Append(_data[i * ColumnCount + j].ToString(CultureInfo.InvariantCulture));
                }
                sb.Append(']');
            }
            sb.Append(']');
        }
        sb.Append(" (mod ").Append(Field.Modulus.ToString(CultureInfo.InvariantCulture)).Append(')');
        return sb.ToString();
    }

    /// <summary>Parses the text written by <see cref="ToString"/>: bracketed rows of integers (any
    /// signed integers; they are reduced) followed by <c>(mod p)</c>.</summary>
    /// <param name="text">The text.</param>
    /// <returns>The matrix.</returns>
    /// <exception cref="FormatException">The text is malformed; the message gives the position.</exception>
    /// <exception cref="ArgumentException">The modulus is not a prime below 2^62.</exception>
    /// <exception cref="DimensionMismatchException">The rows have different lengths.</exception>
    public static ModularMatrix Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        int mod = text.LastIndexOf("(mod", StringComparison.Ordinal);
        if (mod < 0) throw new FormatException($"missing '(mod p)' in '{text}'");
        var tail = text.AsSpan(mod + 4).Trim();
        if (tail.Length < 2 || tail[^1] != ')' || !ulong.TryParse(tail[..^1].Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out ulong p))
            throw new FormatException($"expected '(mod p)' at position {mod} in '{text}'");
        if (p < 2 || p >= PrimeField.ModulusLimit || !Primes.IsPrime(p))
            throw new ArgumentException($"modulus {p} in '{text}' is not a prime below 2^62", nameof(text));
        var field = new PrimeField(p);
        var rows = MatrixText.ParseRows(text[..mod], out int emptyColumns);
        if (rows.Count == 0) return Zero(field, 0, emptyColumns);
        int n = rows[0].Count;
        var d = new ulong[rows.Count * n];
        for (int i = 0; i < rows.Count; i++)
        {
            if (rows[i].Count != n) throw new DimensionMismatchException($"row {i} has {rows[i].Count} entries but row 0 has {n}", nameof(text));
            for (int j = 0; j < n; j++)
            {
                var (token, position) = rows[i][j];
                if (!System.Numerics.BigInteger.TryParse(token, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var v))
                    throw new FormatException($"entry ({i}, {j}) at position {position} is not an integer: '{token}'");
                d[i * n + j] = field.FromBigInteger(v);
            }
        }
        return new ModularMatrix(field, rows.Count, n, d);
    }
}
