using Integrable.Numbers;

namespace Integrable.LinearAlgebra;

/// <summary>A mutable matrix over Z/pZ of fixed shape, filled entry by entry and then frozen into an
/// immutable <see cref="ModularMatrix"/>.</summary>
/// <remarks>Starts as the zero matrix; entries are residues in [0, p). <see cref="ToImmutable"/> copies.</remarks>
/// <example><code>
/// var b = new ModularMatrixBuilder(new PrimeField(7), 2, 2);
/// b[0, 1] = 3;
/// ModularMatrix m = b.ToImmutable();
/// </code></example>
public sealed class ModularMatrixBuilder
{
    private readonly ulong[] _data;

    /// <summary>Creates a zero matrix builder.</summary>
    /// <param name="field">The field.</param>
    /// <param name="rows">Number of rows, non-negative.</param>
    /// <param name="columns">Number of columns, non-negative.</param>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is negative.</exception>
    public ModularMatrixBuilder(PrimeField field, int rows, int columns)
    {
        ArgumentNullException.ThrowIfNull(field);
        RationalMatrix.CheckShape(rows, columns);
        Field = field;
        RowCount = rows;
        ColumnCount = columns;
        _data = new ulong[rows * columns];
    }

    /// <summary>The field.</summary>
    public PrimeField Field { get; }

    /// <summary>The number of rows.</summary>
    public int RowCount { get; }

    /// <summary>The number of columns.</summary>
    public int ColumnCount { get; }

    /// <summary>Gets or sets the residue in row <paramref name="row"/> and column <paramref name="column"/>.</summary>
    /// <param name="row">Row index.</param>
    /// <param name="column">Column index.</param>
    /// <exception cref="ArgumentOutOfRangeException">An index is outside the matrix, or the value is not below p.</exception>
    public ulong this[int row, int column]
    {
        get => _data[Index(row, column)];
        set
        {
            if (value >= Field.Modulus) throw new ArgumentOutOfRangeException(nameof(value), value, $"not a residue modulo {Field.Modulus}");
            _data[Index(row, column)] = value;
        }
    }

    /// <summary>An immutable copy of the current entries.</summary>
    /// <returns>The matrix.</returns>
    public ModularMatrix ToImmutable() => new(Field, RowCount, ColumnCount, (ulong[])_data.Clone());

    private int Index(int row, int column)
    {
        if ((uint)row >= (uint)RowCount) throw new ArgumentOutOfRangeException(nameof(row), row, $"row index must be in [0, {RowCount})");
        if ((uint)column >= (uint)ColumnCount) throw new ArgumentOutOfRangeException(nameof(column), column, $"column index must be in [0, {ColumnCount})");
        return row * ColumnCount + column;
    }
}
