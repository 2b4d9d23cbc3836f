using System.Buffers;
using System.Runtime.CompilerServices;
using Integrable.Numbers;

namespace Integrable.Kernels.LinearAlgebra;

/// <summary>Row echelon decomposition of a matrix over Z/pZ by left-looking (Crout-style) elimination
/// with delayed reduction, giving the column rank profile, an echelon form U and, on demand, the
/// reduced row echelon entries on the free columns.</summary>
/// <remarks>
/// <para>Columns are processed left to right. For column j the entries of U above the current rank are
/// found by forward substitution with the unit lower factor L, and every row that is not yet a pivot row
/// gets t_i = a_ij − Σ_k L_ik U_kj; both are dot products of contiguous word arrays, accumulated in
/// 128 bits and reduced once per sixteen terms (<see cref="ModularReducer.Dot"/>). Column j is a pivot
/// column when some t_i is non-zero (the first such row becomes its pivot row) and a free column
/// otherwise. The work is the same ≈ m·c·r multiply-adds as right-looking elimination, but each inner
/// step is one 64×64→128-bit product and an add-with-carry instead of a full modular multiplication.</para>
/// <para>The pivot columns form the lexicographically first set of linearly independent columns mod p.
/// The input is column-major: entry (i, j) at index j·rows + i.</para>
/// <para>Work arrays come from the shared array pool (no large-object-heap garbage per prime);
/// <see cref="Dispose"/> returns the ones the result keeps.</para>
/// </remarks>
internal sealed class ModularEchelon : IDisposable
{
    private ulong[] _ut;                 // U transposed: column j at [j·_stride, j·_stride + rank at j]
    private int[] _rankAt;               // rank reached after processing column j
    private readonly int _stride;

    private ModularEchelon(ModularReducer reducer, int rows, int cols, int rank, int[] pivotColumns, int[] pivotRows, ulong[] ut, int[] rankAt, int stride)
    {
        Reducer = reducer;
        Rows = rows;
        Cols = cols;
        Rank = rank;
        PivotColumns = pivotColumns;
        PivotRows = pivotRows;
        _ut = ut;
        _rankAt = rankAt;
        _stride = stride;
    }

    public ModularReducer Reducer { get; }
    public int Rows { get; }
    public int Cols { get; }
    public int Rank { get; }

    /// <summary>Pivot columns in increasing order (length <see cref="Rank"/>).</summary>
    public int[] PivotColumns { get; }

    /// <summary>Original row index of the k-th pivot (length <see cref="Rank"/>).</summary>
    public int[] PivotRows { get; }

    /// <summary>Runs the elimination.</summary>
    /// <param name="columnMajor">The matrix, entry (i, j) at j·rows + i, residues in [0, p).</param>
    /// <param name="rows">Row count.</param>
    /// <param name="cols">Column count.</param>
    /// <param name="reducer">Arithmetic modulo p.</param>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ModularEchelon Compute(ReadOnlySpan<ulong> columnMajor, int rows, int cols, ModularReducer reducer)
    {
        int stride = Math.Max(1, Math.Min(rows, cols));
        if ((long)rows * stride > Array.MaxLength || (long)cols * stride > Array.MaxLength)
            throw new OutOfMemoryException($"a {rows}×{cols} elimination needs more than {Array.MaxLength} words");
        // Every entry of these arrays is written before it is read (see the loop), so rented arrays
        // need no clearing.
        var l = ArrayPool<ulong>.Shared.Rent(rows * stride);
        var ut = ArrayPool<ulong>.Shared.Rent(cols * stride);
        var rankAt = ArrayPool<int>.Shared.Rent(cols);
        var pivotCols = new int[Math.Min(rows, cols)];
        var pivotRows = new int[Math.Min(rows, cols)];
        var active = ArrayPool<int>.Shared.Rent(rows);   // rows that are not pivot rows yet, in increasing order
        for (int i = 0; i < rows; i++) active[i] = i;
        int activeCount = rows;
        var t = ArrayPool<ulong>.Shared.Rent(rows);
        int r = 0;
        for (int j = 0; j < cols; j++)
        {
            var col = columnMajor.Slice(j * rows, rows);
            var u = ut.AsSpan(j * stride, stride);
            for (int k = 0; k < r; k++)
            {
                int i = pivotRows[k];
                ulong s = k == 0 ? 0 : reducer.Dot(l.AsSpan(i * stride, k), u[..k]);
                u[k] = reducer.Subtract(col[i], s);
            }
            int first = -1;
            var uSpan = u[..r];
            for (int a = 0; a < activeCount; a++)
            {
                int i = active[a];
                ulong s = r == 0 ? 0 : reducer.Dot(l.AsSpan(i * stride, r), uSpan);
                ulong v = reducer.Subtract(col[i], s);
                t[i] = v;
                if (v != 0 && first < 0) first = a;
            }
            if (first < 0)
            {
                rankAt[j] = r;
                continue;
            }
            int pivotRow = active[first];
            ulong pivot = t[pivotRow];
            u[r] = pivot;
            ulong inv = reducer.Inverse(pivot);
            for (int a = 0; a < activeCount; a++)
            {
                int i = active[a];
                if (i == pivotRow) continue;
                ulong v = t[i];
                l[i * stride + r] = v == 0 ? 0 : reducer.Multiply(v, inv);
            }
            // Remove the pivot row from the active list, keeping the order.
            Array.Copy(active, first + 1, active, first, activeCount - first - 1);
            activeCount--;
            pivotCols[r] = j;
            pivotRows[r] = pivotRow;
            r++;
            rankAt[j] = r;
        }
        ArrayPool<ulong>.Shared.Return(l);
        ArrayPool<ulong>.Shared.Return(t);
        ArrayPool<int>.Shared.Return(active);
        return new ModularEchelon(reducer, rows, cols, r, pivotCols[..r], pivotRows[..r], ut, rankAt, stride);
    }

    /// <summary>Returns the work arrays to the pool; the object must not be used afterwards.</summary>
    public void Dispose()
    {
        if (_ut.Length > 0) ArrayPool<ulong>.Shared.Return(_ut);
        if (_rankAt.Length > 0) ArrayPool<int>.Shared.Return(_rankAt);
        _ut = [];
        _rankAt = [];
    }

    /// <summary>The free (non-pivot) columns in increasing order.</summary>
    public int[] FreeColumns()
    {
        var free = new int[Cols - Rank];
        int k = 0, f = 0;
        for (int j = 0; j < Cols; j++)
        {
            if (k < Rank && PivotColumns[k] == j) { k++; continue; }
            free[f++] = j;
        }
        return free;
    }

    /// <summary>The reduced row echelon entries on the free columns: E[k, q] (row-major, Rank × free
    /// count) is the entry of the RREF in row k and free column <c>FreeColumns()[q]</c>; the RREF is the
    /// identity on the pivot columns.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public ulong[] ReducedFreeEntries(int[] freeColumns)
    {
        int r = Rank, nf = freeColumns.Length;
        var e = new ulong[r * nf];
        if (r == 0 || nf == 0) return e;
        // Dense copy of the pivot block U_PP (upper triangular), row-major, and its diagonal inverses.
        var upp = new ulong[r * r];
        var invDiag = new ulong[r];
        for (int l2 = 0; l2 < r; l2++)
        {
            int pc = PivotColumns[l2];
            var u = _ut.AsSpan(pc * _stride, l2 + 1);
            for (int k = 0; k <= l2; k++) upp[k * r + l2] = u[k];
        }
        // All diagonal inverses from one inversion (Montgomery's trick): prefix products, one inverse,
        // then back.
        ulong acc = 1;
        for (int k = 0; k < r; k++) { invDiag[k] = acc; acc = Reducer.Multiply(acc, upp[k * r + k]); }
        ulong inv = Reducer.Inverse(acc);
        for (int k = r - 1; k >= 0; k--)
        {
            ulong d = upp[k * r + k];
            invDiag[k] = Reducer.Multiply(inv, invDiag[k]);
            inv = Reducer.Multiply(inv, d);
        }
        var x = new ulong[r];
        for (int q = 0; q < nf; q++)
        {
            int f = freeColumns[q];
            int rf = _rankAt[f];
            var u = _ut.AsSpan(f * _stride, rf);
            // Back substitution: U_PP[0..rf, 0..rf] x = u.
            for (int k = rf - 1; k >= 0; k--)
            {
                ulong s = k + 1 < rf ? Reducer.Dot(upp.AsSpan(k * r + k + 1, rf - k - 1), x.AsSpan(k + 1, rf - k - 1)) : 0;
                x[k] = Reducer.Multiply(Reducer.Subtract(u[k], s), invDiag[k]);
            }
            for (int k = 0; k < rf; k++) e[k * nf + q] = x[k];
        }
        return e;
    }

    /// <summary>The determinant of a square matrix (zero when singular).</summary>
    public ulong Determinant()
    {
        if (Rows != Cols) throw new InvalidOperationException("determinant of a non-square matrix");
        if (Rank < Rows) return 0;
        ulong d = Reducer.Field.One;
        for (int k = 0; k < Rank; k++) d = Reducer.Multiply(d, _ut[PivotColumns[k] * _stride + k]);
        // Sign of the permutation k -> PivotRows[k].
        var perm = (int[])PivotRows.Clone();
        bool odd = false;
        for (int k = 0; k < perm.Length; k++)
        {
            while (perm[k] != k)
            {
                int t = perm[k];
                (perm[k], perm[t]) = (perm[t], perm[k]);
                odd = !odd;
            }
        }
        return odd && d != 0 ? Reducer.P - d : d;
    }
}
