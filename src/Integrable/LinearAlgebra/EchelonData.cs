namespace Integrable.LinearAlgebra;

/// <summary>The essential data of a reduced row echelon form: pivot and free columns and the entries of
/// the pivot rows on the free columns (the form is the identity on the pivot columns).</summary>
/// <typeparam name="T">Scalar type.</typeparam>
internal sealed class EchelonData<T>
{
    public EchelonData(int rows, int cols, int[] pivotColumns, int[] freeColumns, T[] reduced)
    {
        Rows = rows;
        Cols = cols;
        PivotColumns = pivotColumns;
        FreeColumns = freeColumns;
        Reduced = reduced;
    }

    public int Rows { get; }
    public int Cols { get; }
    public int[] PivotColumns { get; }
    public int[] FreeColumns { get; }

    /// <summary>Row-major Rank × FreeColumns.Length: entry (k, q) is the RREF entry in row k, column FreeColumns[q].</summary>
    public T[] Reduced { get; }

    public int Rank => PivotColumns.Length;

    public static int[] Complement(int[] pivots, int cols)
    {
        var free = new int[cols - pivots.Length];
        int k = 0, f = 0;
        for (int j = 0; j < cols; j++)
        {
            if (k < pivots.Length && pivots[k] == j) { k++; continue; }
            free[f++] = j;
        }
        return free;
    }
}
