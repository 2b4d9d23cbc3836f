using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Kernels.LinearAlgebra;

/// <summary>Fraction-free (Bareiss) elimination over Z: row echelon form, reduced row echelon entries,
/// rank profile and determinant with exact integer divisions only.</summary>
/// <remarks>After k pivots every entry of the active part is a (k+1)×(k+1) minor of the input (Bareiss
/// 1968, Sylvester's identity), so intermediate entries stay as small as the minors themselves; the
/// division by the previous pivot is exact. Columns without a pivot are skipped, which keeps that
/// property. Cost O(m·c·r) operations on integers of up to r times the input size.</remarks>
internal sealed class FractionFreeElimination
{
    private readonly BigInteger[] _m;   // the echelon form U (row-major), rows 0..Rank-1 meaningful

    private FractionFreeElimination(BigInteger[] m, int rows, int cols, int rank, int[] pivotColumns, int[] rowOrder, bool odd)
    {
        _m = m;
        Rows = rows;
        Cols = cols;
        Rank = rank;
        PivotColumns = pivotColumns;
        RowOrder = rowOrder;
        OddPermutation = odd;
    }

    public int Rows { get; }
    public int Cols { get; }
    public int Rank { get; }
    public int[] PivotColumns { get; }

    /// <summary>Original index of each row of the echelon form (after the row swaps).</summary>
    public int[] RowOrder { get; }

    /// <summary>True when an odd number of row swaps was made.</summary>
    public bool OddPermutation { get; }

    /// <summary>The last pivot: the r×r minor of the input on the pivot rows and pivot columns (up to the sign of the row order).</summary>
    public BigInteger LastPivot => Rank == 0 ? BigInteger.One : _m[(Rank - 1) * Cols + PivotColumns[Rank - 1]];

    /// <summary>Runs the elimination on a copy of <paramref name="entries"/> (row-major).</summary>
    public static FractionFreeElimination Compute(ReadOnlySpan<BigInteger> entries, int rows, int cols)
    {
        var m = entries.ToArray();
        var pivots = new List<int>();
        var order = new int[rows];
        for (int i = 0; i < rows; i++) order[i] = i;
        bool odd = false;
        BigInteger prev = BigInteger.One;
        int r = 0;
        for (int j = 0; j < cols && r < rows; j++)
        {
            int found = -1;
            for (int i = r; i < rows; i++) if (!m[i * cols + j].IsZero) { found = i; break; }
            if (found < 0) continue;
            if (found != r)
            {
                for (int l = 0; l < cols; l++) (m[r * cols + l], m[found * cols + l]) = (m[found * cols + l], m[r * cols + l]);
                (order[r], order[found]) = (order[found], order[r]);
                odd = !odd;
            }
            var piv = m[r * cols + j];
            for (int i = r + 1; i < rows; i++)
            {
                var mij = m[i * cols + j];
                int bi = i * cols, br = r * cols;
                if (mij.IsZero)
                {
                    if (piv.IsOne && prev.IsOne) continue;
                    for (int l = j + 1; l < cols; l++)
                    {
                        var x = m[bi + l];
                        if (!x.IsZero) m[bi + l] = prev.IsOne ? piv * x : piv * x / prev;
                    }
                }
                else
                {
                    for (int l = j + 1; l < cols; l++)
                    {
                        var x = piv * m[bi + l] - mij * m[br + l];
                        m[bi + l] = prev.IsOne ? x : x / prev;
                    }
                }
                m[bi + j] = BigInteger.Zero;
            }
            prev = piv;
            pivots.Add(j);
            r++;
        }
        return new FractionFreeElimination(m, rows, cols, r, pivots.ToArray(), order, odd);
    }

    /// <summary>The determinant of a square input.</summary>
    public BigInteger Determinant()
    {
        if (Rows != Cols) throw new InvalidOperationException("determinant of a non-square matrix");
        if (Rank < Rows) return BigInteger.Zero;
        return OddPermutation ? -LastPivot : LastPivot;
    }

    /// <summary>The reduced row echelon entries on the given free columns: E[k, q] (row-major,
    /// Rank × <paramref name="freeColumns"/>.Length).</summary>
    public Rational[] ReducedFreeEntries(int[] freeColumns)
    {
        int r = Rank, nf = freeColumns.Length, c = Cols;
        var e = new Rational[r * nf];
        if (r == 0 || nf == 0) return e;
        var d = LastPivot;
        var x = new BigInteger[r];
        for (int q = 0; q < nf; q++)
        {
            int f = freeColumns[q];
            // Back substitution for d·x with U_PP x = U_f; every d·x_k is an integer (Cramer's rule), so
            // each division is exact.
            for (int k = r - 1; k >= 0; k--)
            {
                if (PivotColumns[k] > f) { x[k] = BigInteger.Zero; continue; }
                var s = d * _m[k * c + f];
                for (int l = k + 1; l < r; l++)
                {
                    if (PivotColumns[l] > f) break;
                    var u = _m[k * c + PivotColumns[l]];
                    if (!u.IsZero && !x[l].IsZero) s -= u * x[l];
                }
                x[k] = s / _m[k * c + PivotColumns[k]];
            }
            for (int k = 0; k < r; k++) e[k * nf + q] = x[k].IsZero ? Rational.Zero : new Rational(x[k], d);
        }
        return e;
    }
}
