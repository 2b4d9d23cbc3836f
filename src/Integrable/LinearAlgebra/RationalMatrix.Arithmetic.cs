using System.Numerics;
using Integrable.Kernels.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.LinearAlgebra;

public sealed partial class RationalMatrix
{
    /// <summary>Sum of two matrices of the same shape.</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns>The entrywise sum.</returns>
    /// <exception cref="DimensionMismatchException">The shapes differ.</exception>
    public static RationalMatrix operator +(RationalMatrix left, RationalMatrix right)
    {
        SameShape(left, right, "add");
        var d = new Rational[left._data.Length];
        for (int e = 0; e < d.Length; e++) d[e] = left._data[e] + right._data[e];
        return new RationalMatrix(left.RowCount, left.ColumnCount, d);
    }

    /// <summary>Difference of two matrices of the same shape.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The entrywise difference.</returns>
    /// <exception cref="DimensionMismatchException">The shapes differ.</exception>
    public static RationalMatrix operator -(RationalMatrix left, RationalMatrix right)
    {
        SameShape(left, right, "subtract");
        var d = new Rational[left._data.Length];
        for (int e = 0; e < d.Length; e++) d[e] = left._data[e] - right._data[e];
        return new RationalMatrix(left.RowCount, left.ColumnCount, d);
    }

    /// <summary>Negation.</summary>
    /// <param name="matrix">The matrix.</param>
    /// <returns>−<paramref name="matrix"/>.</returns>
    public static RationalMatrix operator -(RationalMatrix matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        var d = new Rational[matrix._data.Length];
        for (int e = 0; e < d.Length; e++) d[e] = -matrix._data[e];
        return new RationalMatrix(matrix.RowCount, matrix.ColumnCount, d);
    }

    /// <summary>Scalar multiple.</summary>
    /// <param name="scalar">The scalar.</param>
    /// <param name="matrix">The matrix.</param>
    /// <returns>Every entry multiplied by <paramref name="scalar"/>.</returns>
    public static RationalMatrix operator *(Rational scalar, RationalMatrix matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        var d = new Rational[matrix._data.Length];
        for (int e = 0; e < d.Length; e++) d[e] = scalar * matrix._data[e];
        return new RationalMatrix(matrix.RowCount, matrix.ColumnCount, d);
    }

    /// <summary>Scalar multiple.</summary>
    /// <param name="matrix">The matrix.</param>
    /// <param name="scalar">The scalar.</param>
    /// <returns>Every entry multiplied by <paramref name="scalar"/>.</returns>
    public static RationalMatrix operator *(RationalMatrix matrix, Rational scalar) => scalar * matrix;

    /// <summary>Matrix product.</summary>
    /// <param name="left">An m×n matrix.</param>
    /// <param name="right">An n×p matrix.</param>
    /// <returns>The m×p product.</returns>
    /// <exception cref="DimensionMismatchException">The column count of <paramref name="left"/> is not the row count of <paramref name="right"/>.</exception>
    /// <remarks>Computed over Z: the rows of <paramref name="left"/> and the columns of
    /// <paramref name="right"/> are cleared of denominators, the integer product is formed with
    /// 128-bit accumulation when the entry sizes allow it, and each entry is divided by its two scales.</remarks>
    public static RationalMatrix operator *(RationalMatrix left, RationalMatrix right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (left.ColumnCount != right.RowCount)
            throw new DimensionMismatchException($"cannot multiply a {left.RowCount}×{left.ColumnCount} matrix by a {right.RowCount}×{right.ColumnCount} matrix", nameof(right));
        int m = left.RowCount, n = left.ColumnCount, p = right.ColumnCount;
        var result = new Rational[m * p];
        if (m == 0 || p == 0 || n == 0) return new RationalMatrix(m, p, result);
        using var a = IntegerRows.FromRational(left._data, m, n);
        using var bt = IntegerRows.FromRational(right.Transpose()._data, p, n);
        int logN = 64 - BitOperations.LeadingZeroCount((ulong)n);
        bool small = a.Small is not null && bt.Small is not null && a.MaxBits + bt.MaxBits + logN + 1 <= 126;
        for (int i = 0; i < m; i++)
        {
            for (int j = 0; j < p; j++)
            {
                BigInteger num;
                if (small)
                {
                    Int128 s = 0;
                    var ra = a.Small.AsSpan(i * n, n);
                    var rb = bt.Small.AsSpan(j * n, n);
                    for (int k = 0; k < n; k++) s += (Int128)ra[k] * rb[k];
                    num = (BigInteger)s;
                }
                else
                {
                    num = BigInteger.Zero;
                    for (int k = 0; k < n; k++)
                    {
                        var x = a.Entry(i, k);
                        if (x.IsZero) continue;
                        var y = bt.Entry(j, k);
                        if (!y.IsZero) num += x * y;
                    }
                }
                if (num.IsZero) continue;
                var den = a.RowScales[i] * bt.RowScales[j];
                result[i * p + j] = den.IsOne ? new Rational(num) : new Rational(num, den);
            }
        }
        return new RationalMatrix(m, p, result);
    }

    /// <summary>Matrix times column vector.</summary>
    /// <param name="vector">A vector with <see cref="ColumnCount"/> entries.</param>
    /// <returns>The vector A·v with <see cref="RowCount"/> entries.</returns>
    /// <exception cref="DimensionMismatchException">The vector has the wrong length.</exception>
    public Rational[] Multiply(ReadOnlySpan<Rational> vector)
    {
        if (vector.Length != ColumnCount)
            throw new DimensionMismatchException($"a {RowCount}×{ColumnCount} matrix cannot multiply a vector of length {vector.Length}", nameof(vector));
        var column = new RationalMatrix(ColumnCount, 1, vector.ToArray());
        return (this * column)._data;
    }

    /// <summary>Named form of <c>left + right</c>.</summary>
    /// <param name="left">First summand.</param>
    /// <param name="right">Second summand.</param>
    /// <returns>The sum.</returns>
    public static RationalMatrix Add(RationalMatrix left, RationalMatrix right) => left + right;

    /// <summary>Named form of <c>left - right</c>.</summary>
    /// <param name="left">Minuend.</param>
    /// <param name="right">Subtrahend.</param>
    /// <returns>The difference.</returns>
    public static RationalMatrix Subtract(RationalMatrix left, RationalMatrix right) => left - right;

    /// <summary>Named form of <c>left * right</c>.</summary>
    /// <param name="left">Left factor.</param>
    /// <param name="right">Right factor.</param>
    /// <returns>The product.</returns>
    public static RationalMatrix Multiply(RationalMatrix left, RationalMatrix right) => left * right;

    /// <summary>Named form of <c>scalar * matrix</c>.</summary>
    /// <param name="scalar">The scalar.</param>
    /// <param name="matrix">The matrix.</param>
    /// <returns>The scalar multiple.</returns>
    public static RationalMatrix Multiply(Rational scalar, RationalMatrix matrix) => scalar * matrix;

    /// <summary>Named form of unary minus.</summary>
    /// <param name="matrix">The matrix.</param>
    /// <returns>The negation.</returns>
    public static RationalMatrix Negate(RationalMatrix matrix) => -matrix;

    private static void SameShape(RationalMatrix left, RationalMatrix right, string what)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (left.RowCount != right.RowCount || left.ColumnCount != right.ColumnCount)
            throw new DimensionMismatchException($"cannot {what} a {left.RowCount}×{left.ColumnCount} and a {right.RowCount}×{right.ColumnCount} matrix", nameof(right));
    }
}
