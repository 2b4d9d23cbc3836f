namespace Integrable.LinearAlgebra;

/// <summary>Thrown when an operation needs an invertible matrix (an inverse, for instance) and the
/// matrix is singular; <see cref="Rank"/> says how far from invertible it is.</summary>
/// <example><code>
/// try { RationalMatrix.FromRows([[1, 2], [2, 4]]).Inverse(); }
/// catch (SingularMatrixException e) { Console.WriteLine(e.Rank); }   // 1
/// </code></example>
public sealed class SingularMatrixException : ArithmeticException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="size">The number of rows (and columns) of the matrix.</param>
    /// <param name="rank">Its rank, below <paramref name="size"/>.</param>
    public SingularMatrixException(int size, int rank)
        : base($"the {size}×{size} matrix is singular (rank {rank}), so it has no inverse")
    {
        Size = size;
        Rank = rank;
    }

    /// <summary>The number of rows (and columns) of the singular matrix.</summary>
    public int Size { get; }

    /// <summary>The rank of the singular matrix.</summary>
    public int Rank { get; }
}
