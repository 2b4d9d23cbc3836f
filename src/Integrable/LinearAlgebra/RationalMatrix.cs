using System.Diagnostics;
using System.Numerics;
using Integrable.Numbers;

namespace Integrable.LinearAlgebra;

/// <summary>An immutable dense matrix over Q, with exact rank, reduced row echelon form, nullspace,
/// linear solving, determinant and inverse.</summary>
/// <remarks>
/// <para>Entries are canonical <see cref="Rational"/> values stored row-major; a matrix may have zero
/// rows or zero columns. Instances never change; build one entry by entry with
/// <see cref="RationalMatrixBuilder"/> or use the factories. Equality compares shapes and entries.</para>
/// <para>Elimination runs on the integer matrix obtained by clearing denominators row by row. Larger
/// matrices use a multimodular method (images modulo word-size primes, Chinese remaindering, rational
/// reconstruction with early termination) whose result is always verified exactly before it is
/// returned; tiny ones use fraction-free (Bareiss) elimination. The verified echelon data is computed
/// once per matrix and shared by <see cref="Rank"/>, <see cref="ReducedRowEchelonForm"/> and
/// <see cref="Nullspace"/>.</para>
/// </remarks>
/// <example><code>
/// var a = RationalMatrix.FromRows([[1, 2, 3], [2, 4, 6], [1, 0, 1]]);
/// int r = a.Rank();                      // 2
/// RationalMatrix k = a.Nullspace();      // one row: [-1, -1, 1]
/// Rational d = a.Determinant();          // 0
/// </code></example>
[DebuggerDisplay("{RowCount}×{ColumnCount} rational matrix")]
public sealed partial class RationalMatrix : IEquatable<RationalMatrix>
{
    private readonly Rational[] _data;
    private EchelonData<Rational>? _echelon;

    /// <summary>Wraps a row-major array without copying (the caller gives up the array).</summary>
    internal RationalMatrix(int rows, int columns, Rational[] data)
    {
        Debug.Assert(rows >= 0 && columns >= 0 && data.Length == rows * columns);
        RowCount = rows;
        ColumnCount = columns;
        _data = data;
    }

    /// <summary>The number of rows.</summary>
    public int RowCount { get; }

    /// <summary>The number of columns.</summary>
    public int ColumnCount { get; }

    /// <summary>True when the matrix has as many rows as columns.</summary>
    public bool IsSquare => RowCount == ColumnCount;

    /// <summary>True when every entry is zero (also for a matrix without entries).</summary>
    public bool IsZero
    {
        get
        {
            foreach (var x in _data) if (!x.IsZero) return false;
            return true;
        }
    }

    /// <summary>The entry in row <paramref name="row"/> and column <paramref name="column"/> (zero-based).</summary>
    /// <param name="row">Row index.</param>
    /// <param name="column">Column index.</param>
    /// <exception cref="ArgumentOutOfRangeException">An index is outside the matrix.</exception>
    public Rational this[int row, int column]
    {
        get
        {
            CheckIndex(row, column);
            return _data[row * ColumnCount + column];
        }
    }

    /// <summary>The entries of one row.</summary>
    /// <param name="row">Row index.</param>
    /// <returns>A read-only view of the row.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="row"/> is outside the matrix.</exception>
    public ReadOnlySpan<Rational> Row(int row)
    {
        if ((uint)row >= (uint)RowCount) throw new ArgumentOutOfRangeException(nameof(row), row, $"row index must be in [0, {RowCount})");
        return _data.AsSpan(row * ColumnCount, ColumnCount);
    }

    /// <summary>The entries of one column, as a new array.</summary>
    /// <param name="column">Column index.</param>
    /// <returns>The column.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="column"/> is outside the matrix.</exception>
    public Rational[] Column(int column)
    {
        if ((uint)column >= (uint)ColumnCount) throw new ArgumentOutOfRangeException(nameof(column), column, $"column index must be in [0, {ColumnCount})");
        var c = new Rational[RowCount];
        for (int i = 0; i < RowCount; i++) c[i] = _data[i * ColumnCount + column];
        return c;
    }

    /// <summary>All entries, row by row.</summary>
    /// <returns>A read-only row-major view.</returns>
    public ReadOnlySpan<Rational> AsSpan() => _data;

    /// <summary>The entries as a new two-dimensional array.</summary>
    /// <returns>An array with <see cref="RowCount"/> × <see cref="ColumnCount"/> entries.</returns>
    public Rational[,] ToArray()
    {
        var a = new Rational[RowCount, ColumnCount];
        for (int i = 0; i < RowCount; i++)
            for (int j = 0; j < ColumnCount; j++) a[i, j] = _data[i * ColumnCount + j];
        return a;
    }

    /// <summary>The zero matrix.</summary>
    /// <param name="rows">Number of rows, non-negative.</param>
    /// <param name="columns">Number of columns, non-negative.</param>
    /// <returns>The <paramref name="rows"/> × <paramref name="columns"/> zero matrix.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is negative.</exception>
    public static RationalMatrix Zero(int rows, int columns)
    {
        CheckShape(rows, columns);
        return new RationalMatrix(rows, columns, new Rational[rows * columns]);
    }

    /// <summary>The identity matrix.</summary>
    /// <param name="size">Number of rows and columns, non-negative.</param>
    /// <returns>The <paramref name="size"/> × <paramref name="size"/> identity.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="size"/> is negative.</exception>
    public static RationalMatrix Identity(int size)
    {
        CheckShape(size, size);
        var d = new Rational[size * size];
        for (int i = 0; i < size; i++) d[i * size + i] = Rational.One;
        return new RationalMatrix(size, size, d);
    }

    /// <summary>A diagonal matrix.</summary>
    /// <param name="diagonal">The diagonal entries.</param>
    /// <returns>The square matrix with the given diagonal and zeros elsewhere.</returns>
    public static RationalMatrix Diagonal(params ReadOnlySpan<Rational> diagonal)
    {
        int n = diagonal.Length;
        var d = new Rational[n * n];
        for (int i = 0; i < n; i++) d[i * n + i] = diagonal[i];
        return new RationalMatrix(n, n, d);
    }

    /// <summary>The matrix whose entry (i, j) is <paramref name="entry"/>(i, j).</summary>
    /// <param name="rows">Number of rows, non-negative.</param>
    /// <param name="columns">Number of columns, non-negative.</param>
    /// <param name="entry">The entry function, called once per entry, row by row.</param>
    /// <returns>The matrix.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A dimension is negative.</exception>
    public static RationalMatrix Create(int rows, int columns, Func<int, int, Rational> entry)
    {
        ArgumentNullException.ThrowIfNull(entry);
        CheckShape(rows, columns);
        var d = new Rational[rows * columns];
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < columns; j++) d[i * columns + j] = entry(i, j);
        return new RationalMatrix(rows, columns, d);
    }

    /// <summary>The matrix with the given entries.</summary>
    /// <param name="entries">A two-dimensional array (copied).</param>
    /// <returns>The matrix.</returns>
    public static RationalMatrix FromArray(Rational[,] entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        int m = entries.GetLength(0), n = entries.GetLength(1);
        var d = new Rational[m * n];
        for (int i = 0; i < m; i++)
            for (int j = 0; j < n; j++) d[i * n + j] = entries[i, j];
        return new RationalMatrix(m, n, d);
    }

    /// <summary>The integer matrix with the given entries.</summary>
    /// <param name="entries">A two-dimensional array of integers.</param>
    /// <returns>The matrix.</returns>
    public static RationalMatrix FromArray(long[,] entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        int m = entries.GetLength(0), n = entries.GetLength(1);
        var d = new Rational[m * n];
        for (int i = 0; i < m; i++)
            for (int j = 0; j < n; j++) d[i * n + j] = entries[i, j];
        return new RationalMatrix(m, n, d);
    }

    /// <summary>The matrix with the given rows.</summary>
    /// <param name="rows">The rows (copied); all of the same length. No rows gives the 0×0 matrix.</param>
    /// <returns>The matrix.</returns>
    /// <exception cref="DimensionMismatchException">The rows have different lengths.</exception>
    public static RationalMatrix FromRows(params Rational[][] rows)
    {
        ArgumentNullException.ThrowIfNull(rows);
        int m = rows.Length, n = m == 0 ? 0 : (rows[0] ?? throw new ArgumentNullException(nameof(rows), "row 0 is null")).Length;
        var d = new Rational[m * n];
        for (int i = 0; i < m; i++)
        {
            var row = rows[i] ?? throw new ArgumentNullException(nameof(rows), $"row {i} is null");
            if (row.Length != n) throw new DimensionMismatchException($"row {i} has {row.Length} entries but row 0 has {n}", nameof(rows));
            row.CopyTo(d, i * n);
        }
        return new RationalMatrix(m, n, d);
    }

    /// <summary>The matrix with the given row-major entries.</summary>
    /// <param name="rows">Number of rows, non-negative.</param>
    /// <param name="columns">Number of columns, non-negative.</param>
    /// <param name="entries">rows × columns entries, row by row (copied).</param>
    /// <returns>The matrix.</returns>
    /// <exception cref="DimensionMismatchException">The number of entries is not rows × columns.</exception>
    public static RationalMatrix FromRowMajor(int rows, int columns, ReadOnlySpan<Rational> entries)
    {
        CheckShape(rows, columns);
        if (entries.Length != rows * columns)
            throw new DimensionMismatchException($"{entries.Length} entries given for a {rows}×{columns} matrix", nameof(entries));
        return new RationalMatrix(rows, columns, entries.ToArray());
    }

    /// <summary>The transpose.</summary>
    /// <returns>The matrix with entry (j, i) equal to entry (i, j) of this one.</returns>
    public RationalMatrix Transpose()
    {
        int m = RowCount, n = ColumnCount;
        var d = new Rational[m * n];
        for (int i = 0; i < m; i++)
            for (int j = 0; j < n; j++) d[j * m + i] = _data[i * n + j];
        return new RationalMatrix(n, m, d);
    }

    /// <summary>This matrix with the columns of <paramref name="right"/> appended: [this | right].</summary>
    /// <param name="right">A matrix with the same number of rows.</param>
    /// <returns>The augmented matrix.</returns>
    /// <exception cref="DimensionMismatchException">The row counts differ.</exception>
    public RationalMatrix Augment(RationalMatrix right)
    {
        ArgumentNullException.ThrowIfNull(right);
        if (right.RowCount != RowCount)
            throw new DimensionMismatchException($"cannot append a {right.RowCount}-row matrix to a {RowCount}-row matrix", nameof(right));
        int m = RowCount, a = ColumnCount, b = right.ColumnCount, n = a + b;
        var d = new Rational[m * n];
        for (int i = 0; i < m; i++)
        {
            _data.AsSpan(i * a, a).CopyTo(d.AsSpan(i * n, a));
            right._data.AsSpan(i * b, b).CopyTo(d.AsSpan(i * n + a, b));
        }
        return new RationalMatrix(m, n, d);
    }

    /// <summary>Each non-zero row scaled by a positive rational to a primitive integer vector (integer
    /// entries with greatest common divisor 1); zero rows stay zero. Handy for kernel vectors that are
    /// coefficient vectors, e.g. of an invariant.</summary>
    /// <returns>The rescaled matrix; it has the same row space as this one, row by row.</returns>
    /// <example><c>RationalMatrix.FromRows([[new Rational(1, 2), new Rational(-3, 4)]]).WithPrimitiveIntegerRows()</c> is <c>[[2, -3]]</c>.</example>
    public RationalMatrix WithPrimitiveIntegerRows()
    {
        int n = ColumnCount;
        var d = (Rational[])_data.Clone();
        for (int i = 0; i < RowCount; i++)
        {
            var row = d.AsSpan(i * n, n);
            BigInteger l = BigInteger.One, g = BigInteger.Zero;
            foreach (var x in row)
                if (!x.IsZero && !x.IsInteger) l = l / BigInteger.GreatestCommonDivisor(l, x.Denominator) * x.Denominator;
            foreach (var x in row)
                if (!x.IsZero) g = BigInteger.GreatestCommonDivisor(g, x.Numerator * (l / x.Denominator));
            if (g.IsZero) continue;
            for (int j = 0; j < n; j++)
                if (!row[j].IsZero) row[j] = new Rational(row[j].Numerator * (l / row[j].Denominator) / g);
        }
        return new RationalMatrix(RowCount, n, d);
    }

    /// <summary>The image of this matrix in Z/pZ.</summary>
    /// <param name="field">The prime field.</param>
    /// <returns>The matrix of residues.</returns>
    /// <exception cref="DivideByZeroException">p divides the denominator of an entry; the message names it.</exception>
    public ModularMatrix ToModular(PrimeField field)
    {
        ArgumentNullException.ThrowIfNull(field);
        var d = new ulong[_data.Length];
        for (int e = 0; e < d.Length; e++)
        {
            if (!field.CanReduce(_data[e]))
                throw new DivideByZeroException($"entry ({e / ColumnCount}, {e % ColumnCount}) = {_data[e]} has a denominator divisible by {field.Modulus}");
            d[e] = field.FromRational(_data[e]);
        }
        return new ModularMatrix(field, RowCount, ColumnCount, d);
    }

    /// <inheritdoc/>
    public bool Equals(RationalMatrix? other) =>
        other is not null && (ReferenceEquals(this, other) ||
            (other.RowCount == RowCount && other.ColumnCount == ColumnCount && _data.AsSpan().SequenceEqual(other._data)));

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as RationalMatrix);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(RowCount);
        h.Add(ColumnCount);
        foreach (var x in _data) h.Add(x);
        return h.ToHashCode();
    }

    /// <summary>Equality of shape and entries.</summary>
    /// <param name="left">First matrix.</param>
    /// <param name="right">Second matrix.</param>
    /// <returns>True when equal.</returns>
    public static bool operator ==(RationalMatrix? left, RationalMatrix? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Inequality.</summary>
    /// <param name="left">First matrix.</param>
    /// <param name="right">Second matrix.</param>
    /// <returns>True when shape or an entry differs.</returns>
    public static bool operator !=(RationalMatrix? left, RationalMatrix? right) => !(left == right);

    private void CheckIndex(int row, int column)
    {
        if ((uint)row >= (uint)RowCount) throw new ArgumentOutOfRangeException(nameof(row), row, $"row index must be in [0, {RowCount})");
        if ((uint)column >= (uint)ColumnCount) throw new ArgumentOutOfRangeException(nameof(column), column, $"column index must be in [0, {ColumnCount})");
    }

    internal static void CheckShape(int rows, int columns)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(rows);
        ArgumentOutOfRangeException.ThrowIfNegative(columns);
        if ((long)rows * columns > Array.MaxLength) throw new ArgumentOutOfRangeException(nameof(rows), $"a {rows}×{columns} matrix is too large");
    }
}
