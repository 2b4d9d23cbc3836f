using Integrable.Numbers;

namespace Integrable.LinearAlgebra;

/// <summary>A mutable matrix over Q of fixed shape, filled entry by entry or row by row and then
/// frozen into an immutable <see cref="RationalMatrix"/>.</summary>
/// <remarks>Starts as the zero matrix. <see cref="ToImmutable"/> copies the entries, so the builder can
/// be changed and frozen again afterwards.</remarks>
/// <example><code>
/// var b = new RationalMatrixBuilder(2, 2);
/// b[0, 0] = 1; b[1, 1] = new Rational(1, 2);
/// RationalMatrix m = b.ToImmutable();
/// </code></example>
public sealed class RationalMatrixBuilder
{
    private readonly Rational[] _data;

    /// <summary>Creates a zero matrix builder.</summary>
    /// <param name="rows">Number of rows, non-negative.</param>
    /// <param name="columns">Number of columns, non-negative.</param>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is negative.</exception>
    public RationalMatrixBuilder(int rows, int columns)
    {
        RationalMatrix.CheckShape(rows, columns);
        RowCount = rows;
        ColumnCount = columns;
        _data = new Rational[rows * columns];
    }

    /// <summary>Creates a builder holding the entries of <paramref name="matrix"/>.</summary>
    /// <param name="matrix">The starting matrix.</param>
    public RationalMatrixBuilder(RationalMatrix matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        RowCount = matrix.RowCount;
        ColumnCount = matrix.ColumnCount;
        _data = matrix.AsSpan().ToArray();
    }

    /// <summary>The number of rows.</summary>
    public int RowCount { get; }

    /// <summary>The number of columns.</summary>
    public int ColumnCount { get; }

    /// <summary>Gets or sets the entry in row <paramref name="row"/> and column <paramref name="column"/>.</summary>
    /// <param name="row">Row index.</param>
    /// <param name="column">Column index.</param>
    /// <exception cref="ArgumentOutOfRangeException">An index is outside the matrix.</exception>
    public Rational this[int row, int column]
    {
        get => _data[Index(row, column)];
        set => _data[Index(row, column)] = value;
    }

    /// <summary>Overwrites one row.</summary>
    /// <param name="row">Row index.</param>
    /// <param name="values">Exactly <see cref="ColumnCount"/> values.</param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="row"/> is outside the matrix.</exception>
    /// <exception cref="DimensionMismatchException"><paramref name="values"/> has the wrong length.</exception>
    public void SetRow(int row, ReadOnlySpan<Rational> values)
    {
        if ((uint)row >= (uint)RowCount) throw new ArgumentOutOfRangeException(nameof(row), row, $"row index must be in [0, {RowCount})");
        if (values.Length != ColumnCount) throw new DimensionMismatchException($"row {row} needs {ColumnCount} values, got {values.Length}", nameof(values));
        values.CopyTo(_data.AsSpan(row * ColumnCount, ColumnCount));
    }

    /// <summary>An immutable copy of the current entries.</summary>
    /// <returns>The matrix.</returns>
    public RationalMatrix ToImmutable() => new(RowCount, ColumnCount, (Rational[])_data.Clone());

    private int Index(int row, int column)
    {
        if ((uint)row >= (uint)RowCount) throw new ArgumentOutOfRangeException(nameof(row), row, $"row index must be in [0, {RowCount})");
        if ((uint)column >= (uint)ColumnCount) throw new ArgumentOutOfRangeException(nameof(column), column, $"column index must be in [0, {ColumnCount})");
        return row * ColumnCount + column;
    }
}
