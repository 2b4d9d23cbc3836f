using Integrable.Algebra;
using Integrable.Kernels.LinearAlgebra;

namespace Integrable.LinearAlgebra;

public sealed partial class ModularMatrix
{
    /// <summary>Sum of two matrices of the same shape over the same field.</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns>The entrywise sum.</returns>
    /// <exception cref="DimensionMismatchException">The shapes differ.</exception>
    /// <exception cref="IncompatibleRingException">The fields differ.</exception>
    public static ModularMatrix operator +(ModularMatrix left, ModularMatrix right)
    {
        SameShape(left, right, "add");
        var f = left.Field;
        var d = new ulong[left._data.Length];
        for (int e = 0; e < d.Length; e++) d[e] = f.Add(left._data[e], right._data[e]);
        return new ModularMatrix(f, left.RowCount, left.ColumnCount, d);
    }

    /// <summary>Difference of two matrices of the same shape over the same field.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The entrywise difference.</returns>
    /// <exception cref="DimensionMismatchException">The shapes differ.</exception>
    /// <exception cref="IncompatibleRingException">The fields differ.</exception>
    public static ModularMatrix operator -(ModularMatrix left, ModularMatrix right)
    {
        SameShape(left, right, "subtract");
        var f = left.Field;
        var d = new ulong[left._data.Length];
        for (int e = 0; e < d.Length; e++) d[e] = f.Subtract(left._data[e], right._data[e]);
        return new ModularMatrix(f, left.RowCount, left.ColumnCount, d);
    }

    /// <summary>Negation.</summary>
    /// <param name="matrix">The matrix.</param>
    /// <returns>−<paramref name="matrix"/>.</returns>
    public static ModularMatrix operator -(ModularMatrix matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        var f = matrix.Field;
        var d = new ulong[matrix._data.Length];
        for (int e = 0; e < d.Length; e++) d[e] = f.Negate(matrix._data[e]);
        return new ModularMatrix(f, matrix.RowCount, matrix.ColumnCount, d);
    }

    /// <summary>Scalar multiple.</summary>
    /// <param name="scalar">The scalar, a residue in [0, p).</param>
    /// <param name="matrix">The matrix.</param>
    /// <returns>Every entry multiplied by <paramref name="scalar"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="scalar"/> is not below p.</exception>
    public static ModularMatrix operator *(ulong scalar, ModularMatrix matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        var f = matrix.Field;
        if (scalar >= f.Modulus) throw new ArgumentOutOfRangeException(nameof(scalar), scalar, $"not a residue modulo {f.Modulus}");
        var d = new ulong[matrix._data.Length];
        for (int e = 0; e < d.Length; e++) d[e] = f.Multiply(scalar, matrix._data[e]);
        return new ModularMatrix(f, matrix.RowCount, matrix.ColumnCount, d);
    }

    /// <summary>Scalar multiple.</summary>
    /// <param name="matrix">The matrix.</param>
    /// <param name="scalar">The scalar, a residue in [0, p).</param>
    /// <returns>Every entry multiplied by <paramref name="scalar"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="scalar"/> is not below p.</exception>
    public static ModularMatrix operator *(ModularMatrix matrix, ulong scalar) => scalar * matrix;

    /// <summary>Matrix product (dot products with delayed reduction).</summary>
    /// <param name="left">An m×n matrix.</param>
    /// <param name="right">An n×q matrix over the same field.</param>
    /// <returns>The m×q product.</returns>
    /// <exception cref="DimensionMismatchException">The inner dimensions differ.</exception>
    /// <exception cref="IncompatibleRingException">The fields differ.</exception>
    public static ModularMatrix operator *(ModularMatrix left, ModularMatrix right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        SameField(left, right);
        if (left.ColumnCount != right.RowCount)
            throw new DimensionMismatchException($"cannot multiply a {left.RowCount}×{left.ColumnCount} matrix by a {right.RowCount}×{right.ColumnCount} matrix", nameof(right));
        int m = left.RowCount, n = left.ColumnCount, q = right.ColumnCount;
        var reducer = new ModularReducer(left.Field);
        var bt = right.Transpose()._data;
        var d = new ulong[m * q];
        for (int i = 0; i < m; i++)
        {
            var row = left._data.AsSpan(i * n, n);
            for (int j = 0; j < q; j++) d[i * q + j] = reducer.Dot(row, bt.AsSpan(j * n, n));
        }
        return new ModularMatrix(left.Field, m, q, d);
    }

    /// <summary>Matrix times column vector.</summary>
    /// <param name="vector">Residues in [0, p), <see cref="ColumnCount"/> of them.</param>
    /// <returns>A·v.</returns>
    /// <exception cref="DimensionMismatchException">The vector has the wrong length.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An entry of the vector is not below p.</exception>
    public ulong[] Multiply(ReadOnlySpan<ulong> vector)
    {
        if (vector.Length != ColumnCount)
            throw new DimensionMismatchException($"a {RowCount}×{ColumnCount} matrix cannot multiply a vector of length {vector.Length}", nameof(vector));
        CheckResidues(vector, nameof(vector));
        var reducer = new ModularReducer(Field);
        var r = new ulong[RowCount];
        for (int i = 0; i < RowCount; i++) r[i] = reducer.Dot(_data.AsSpan(i * ColumnCount, ColumnCount), vector);
        return r;
    }

    /// <summary>Named form of <c>left + right</c>.</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns>The sum.</returns>
    public static ModularMatrix Add(ModularMatrix left, ModularMatrix right) => left + right;

    /// <summary>Named form of <c>left - right</c>.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static ModularMatrix Subtract(ModularMatrix left, ModularMatrix right) => left - right;

    /// <summary>Named form of <c>left * right</c>.</summary>
    /// <param name="left">Left factor.</param>
    /// <param name="right">Right factor.</param>
    /// <returns>The product.</returns>
    public static ModularMatrix Multiply(ModularMatrix left, ModularMatrix right) => left * right;

    /// <summary>Named form of <c>scalar * matrix</c>.</summary>
    /// <param name="scalar">The scalar residue.</param>
    /// <param name="matrix">The matrix.</param>
    /// <returns>The scalar multiple.</returns>
    public static ModularMatrix Multiply(ulong scalar, ModularMatrix matrix) => scalar * matrix;

    /// <summary>Named form of unary minus.</summary>
    /// <param name="matrix">The matrix.</param>
    /// <returns>The negation.</returns>
    public static ModularMatrix Negate(ModularMatrix matrix) => -matrix;

    private static void SameShape(ModularMatrix left, ModularMatrix right, string what)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        SameField(left, right);
        if (left.RowCount != right.RowCount || left.ColumnCount != right.ColumnCount)
            throw new DimensionMismatchException($"cannot {what} a {left.RowCount}×{left.ColumnCount} and a {right.RowCount}×{right.ColumnCount} matrix", nameof(right));
    }

    private void CheckResidues(ReadOnlySpan<ulong> values, string name)
    {
        for (int i = 0; i < values.Length; i++)
            if (values[i] >= Field.Modulus)
                throw new ArgumentOutOfRangeException(name, values[i], $"entry {i} is not a residue modulo {Field.Modulus}");
    }
}
