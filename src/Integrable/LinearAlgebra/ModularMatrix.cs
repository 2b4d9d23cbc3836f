using System.Diagnostics;
using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.LinearAlgebra;

/// <summary>An immutable dense matrix over the prime field Z/pZ (p &lt; 2^62), with rank, reduced row
/// echelon form, nullspace, linear solving, determinant and inverse.</summary>
/// <remarks>
/// <para>Entries are residues in [0, p) stored row-major as <see cref="ulong"/>, together with the
/// <see cref="PrimeField"/>; a matrix may have zero rows or columns. Operations between matrices over
/// different fields throw <see cref="IncompatibleRingException"/>.</para>
/// <para>Elimination is left-looking (Crout-style): every update is a dot product of two contiguous
/// word arrays accumulated in 128 bits and reduced once per sixteen terms, so the inner loop is one
/// 64×64→128-bit product and an add-with-carry per term. The echelon data is computed once per matrix.</para>
/// </remarks>
/// <example><code>
/// var f = new PrimeField(101);
/// var a = ModularMatrix.FromRows(f, [1, 2], [3, 4]);
/// ulong d = a.Determinant();                 // -2 mod 101 = 99
/// ModularMatrix inv = a.Inverse();
/// </code></example>
[DebuggerDisplay("{RowCount}×{ColumnCount} matrix over {Field}")]
public sealed partial class ModularMatrix : IEquatable<ModularMatrix>
{
    private readonly ulong[] _data;
    private EchelonData<ulong>? _echelon;

    /// <summary>Wraps a row-major array of residues without copying (the caller gives up the array).</summary>
    internal ModularMatrix(PrimeField field, int rows, int columns, ulong[] data)
    {
        Debug.Assert(rows >= 0 && columns >= 0 && data.Length == rows * columns);
        Field = field;
        RowCount = rows;
        ColumnCount = columns;
        _data = data;
    }

    /// <summary>The field of the entries.</summary>
    public PrimeField Field { get; }

    /// <summary>The number of rows.</summary>
    public int RowCount { get; }

    /// <summary>The number of columns.</summary>
    public int ColumnCount { get; }

    /// <summary>True when the matrix has as many rows as columns.</summary>
    public bool IsSquare => RowCount == ColumnCount;

    /// <summary>True when every entry is zero.</summary>
    public bool IsZero => !_data.AsSpan().ContainsAnyExcept(0UL);

    /// <summary>The entry (a residue in [0, p)) in row <paramref name="row"/> and column <paramref name="column"/>.</summary>
    /// <param name="row">Row index.</param>
    /// <param name="column">Column index.</param>
    /// <exception cref="ArgumentOutOfRangeException">An index is outside the matrix.</exception>
    public ulong this[int row, int column]
    {
        get
        {
            if ((uint)row >= (uint)RowCount) throw new ArgumentOutOfRangeException(nameof(row), row, $"row index must be in [0, {RowCount})");
            if ((uint)column >= (uint)ColumnCount) throw new ArgumentOutOfRangeException(nameof(column), column, $"column index must be in [0, {ColumnCount})");
            return _data[row * ColumnCount + column];
        }
    }

    /// <summary>The entries of one row.</summary>
    /// <param name="row">Row index.</param>
    /// <returns>A read-only view of the row.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="row"/> is outside the matrix.</exception>
    public ReadOnlySpan<ulong> Row(int row)
    {
        if ((uint)row >= (uint)RowCount) throw new ArgumentOutOfRangeException(nameof(row), row, $"row index must be in [0, {RowCount})");
        return _data.AsSpan(row * ColumnCount, ColumnCount);
    }

    /// <summary>All entries, row by row.</summary>
    /// <returns>A read-only row-major view.</returns>
    public ReadOnlySpan<ulong> AsSpan() => _data;

    /// <summary>The zero matrix.</summary>
    /// <param name="field">The field.</param>
    /// <param name="rows">Number of rows, non-negative.</param>
    /// <param name="columns">Number of columns, non-negative.</param>
    /// <returns>The zero matrix.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is negative.</exception>
    public static ModularMatrix Zero(PrimeField field, int rows, int columns)
    {
        ArgumentNullException.ThrowIfNull(field);
        RationalMatrix.CheckShape(rows, columns);
        return new ModularMatrix(field, rows, columns, new ulong[rows * columns]);
    }

    /// <summary>The identity matrix.</summary>
    /// <param name="field">The field.</param>
    /// <param name="size">Number of rows and columns, non-negative.</param>
    /// <returns>The identity.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="size"/> is negative.</exception>
    public static ModularMatrix Identity(PrimeField field, int size)
    {
        ArgumentNullException.ThrowIfNull(field);
        RationalMatrix.CheckShape(size, size);
        var d = new ulong[size * size];
        for (int i = 0; i < size; i++) d[i * size + i] = field.One;
        return new ModularMatrix(field, size, size, d);
    }

    /// <summary>The matrix whose entry (i, j) is <paramref name="entry"/>(i, j) reduced mod p.</summary>
    /// <param name="field">The field.</param>
    /// <param name="rows">Number of rows, non-negative.</param>
    /// <param name="columns">Number of columns, non-negative.</param>
    /// <param name="entry">The entry function (any signed integer; it is reduced).</param>
    /// <returns>The matrix.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is negative.</exception>
    public static ModularMatrix Create(PrimeField field, int rows, int columns, Func<int, int, long> entry)
    {
        ArgumentNullException.ThrowIfNull(field);
        ArgumentNullException.ThrowIfNull(entry);
        RationalMatrix.CheckShape(rows, columns);
        var d = new ulong[rows * columns];
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < columns; j++) d[i * columns + j] = field.FromInteger(entry(i, j));
        return new ModularMatrix(field, rows, columns, d);
    }

    /// <summary>The matrix with the given rows of signed integers, reduced mod p.</summary>
    /// <param name="field">The field.</param>
    /// <param name="rows">The rows, all of the same length.</param>
    /// <returns>The matrix.</returns>
    /// <exception cref="DimensionMismatchException">The rows have different lengths.</exception>
    public static ModularMatrix FromRows(PrimeField field, params long[][] rows)
    {
        ArgumentNullException.ThrowIfNull(field);
        ArgumentNullException.ThrowIfNull(rows);
        int m = rows.Length, n = m == 0 ? 0 : (rows[0] ?? throw new ArgumentNullException(nameof(rows), "row 0 is null")).Length;
        var d = new ulong[m * n];
        for (int i = 0; i < m; i++)
        {
            var row = rows[i] ?? throw new ArgumentNullException(nameof(rows), $"row {i} is null");
            if (row.Length != n) throw new DimensionMismatchException($"row {i} has {row.Length} entries but row 0 has {n}", nameof(rows));
            for (int j = 0; j < n; j++) d[i * n + j] = field.FromInteger(row[j]);
        }
        return new ModularMatrix(field, m, n, d);
    }

    /// <summary>The matrix with the given row-major residues.</summary>
    /// <param name="field">The field.</param>
    /// <param name="rows">Number of rows, non-negative.</param>
    /// <param name="columns">Number of columns, non-negative.</param>
    /// <param name="residues">rows × columns residues in [0, p), row by row (copied).</param>
    /// <returns>The matrix.</returns>
    /// <exception cref="DimensionMismatchException">The number of residues is not rows × columns.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A residue is not below p.</exception>
    public static ModularMatrix FromRowMajor(PrimeField field, int rows, int columns, ReadOnlySpan<ulong> residues)
    {
        ArgumentNullException.ThrowIfNull(field);
        RationalMatrix.CheckShape(rows, columns);
        if (residues.Length != rows * columns)
            throw new DimensionMismatchException($"{residues.Length} residues given for a {rows}×{columns} matrix", nameof(residues));
        for (int e = 0; e < residues.Length; e++)
            if (residues[e] >= field.Modulus)
                throw new ArgumentOutOfRangeException(nameof(residues), residues[e], $"entry ({e / columns}, {e % columns}) is not a residue modulo {field.Modulus}");
        return new ModularMatrix(field, rows, columns, residues.ToArray());
    }

    /// <summary>The transpose.</summary>
    /// <returns>The matrix with entry (j, i) equal to entry (i, j) of this one.</returns>
    public ModularMatrix Transpose()
    {
        int m = RowCount, n = ColumnCount;
        var d = new ulong[m * n];
        for (int i = 0; i < m; i++)
            for (int j = 0; j < n; j++) d[j * m + i] = _data[i * n + j];
        return new ModularMatrix(Field, n, m, d);
    }

    /// <summary>This matrix with the columns of <paramref name="right"/> appended: [this | right].</summary>
    /// <param name="right">A matrix over the same field with the same number of rows.</param>
    /// <returns>The augmented matrix.</returns>
    /// <exception cref="DimensionMismatchException">The row counts differ.</exception>
    /// <exception cref="IncompatibleRingException">The fields differ.</exception>
    public ModularMatrix Augment(ModularMatrix right)
    {
        ArgumentNullException.ThrowIfNull(right);
        SameField(this, right);
        if (right.RowCount != RowCount)
            throw new DimensionMismatchException($"cannot append a {right.RowCount}-row matrix to a {RowCount}-row matrix", nameof(right));
        int m = RowCount, a = ColumnCount, b = right.ColumnCount, n = a + b;
        var d = new ulong[m * n];
        for (int i = 0; i < m; i++)
        {
            _data.AsSpan(i * a, a).CopyTo(d.AsSpan(i * n, a));
            right._data.AsSpan(i * b, b).CopyTo(d.AsSpan(i * n + a, b));
        }
        return new ModularMatrix(Field, m, n, d);
    }

    /// <inheritdoc/>
    public bool Equals(ModularMatrix? other) =>
        other is not null && (ReferenceEquals(this, other) ||
            (other.Field.Equals(Field) && other.RowCount == RowCount && other.ColumnCount == ColumnCount && _data.AsSpan().SequenceEqual(other._data)));

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as ModularMatrix);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(Field.Modulus);
        h.Add(RowCount);
        h.Add(ColumnCount);
        foreach (var x in _data) h.Add(x);
        return h.ToHashCode();
    }

    /// <summary>Equality of field, shape and entries.</summary>
    /// <param name="left">First matrix.</param>
    /// <param name="right">Second matrix.</param>
    /// <returns>True when equal.</returns>
    public static bool operator ==(ModularMatrix? left, ModularMatrix? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Inequality.</summary>
    /// <param name="left">First matrix.</param>
    /// <param name="right">Second matrix.</param>
    /// <returns>True when field, shape or an entry differs.</returns>
    public static bool operator !=(ModularMatrix? left, ModularMatrix? right) => !(left == right);

    private static void SameField(ModularMatrix a, ModularMatrix b)
    {
        if (!a.Field.Equals(b.Field)) throw new IncompatibleRingException($"cannot combine a matrix over {a.Field} with one over {b.Field}");
    }
}
