namespace Integrable.LinearAlgebra;

/// <summary>The reduced row echelon form of a matrix together with its pivot columns.</summary>
/// <typeparam name="TMatrix">The matrix type (<see cref="RationalMatrix"/> or <see cref="ModularMatrix"/>).</typeparam>
/// <remarks>The reduced matrix has the shape of the input: its first <see cref="Rank"/> rows have a
/// leading 1 in the pivot columns (the only non-zero entry of each pivot column), the remaining rows
/// are zero. The pivot columns are the lexicographically first set of linearly independent columns
/// (the column rank profile). Over Q the form has been verified exactly before it is returned.</remarks>
/// <example><code>
/// var a = RationalMatrix.FromRows([[1, 2, 3], [2, 4, 7]]);
/// var rref = a.ReducedRowEchelonForm();   // [[1, 2, 0], [0, 0, 1]], pivots 0 and 2
/// </code></example>
public sealed class RowEchelonForm<TMatrix> where TMatrix : class
{
    private readonly int[] _pivots;
    private readonly int[] _free;

    internal RowEchelonForm(TMatrix matrix, int[] pivotColumns, int[] freeColumns)
    {
        Matrix = matrix;
        _pivots = pivotColumns;
        _free = freeColumns;
    }

    /// <summary>The reduced row echelon form (same shape as the input).</summary>
    public TMatrix Matrix { get; }

    /// <summary>The pivot columns, increasing.</summary>
    public ReadOnlySpan<int> PivotColumns => _pivots;

    /// <summary>The columns without a pivot, increasing; one kernel basis vector belongs to each.</summary>
    public ReadOnlySpan<int> FreeColumns => _free;

    /// <summary>The rank: the number of pivot columns.</summary>
    public int Rank => _pivots.Length;

    /// <inheritdoc/>
    public override string ToString() => $"rank {Rank}, pivots [{string.Join(", ", _pivots)}]: {Matrix}";
}
