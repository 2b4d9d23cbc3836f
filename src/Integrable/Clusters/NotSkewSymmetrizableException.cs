namespace Integrable.Clusters;

/// <summary>Thrown when the principal (mutable) part of an exchange matrix is not skew-symmetrizable,
/// i.e. no diagonal D with positive integer entries makes DB skew-symmetric.</summary>
/// <remarks><see cref="Row"/> and <see cref="Column"/> name (1-based, as b_ij is written) an entry
/// where the condition fails.</remarks>
public sealed class NotSkewSymmetrizableException : ArgumentException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="row">1-based row index of an offending entry.</param>
    /// <param name="column">1-based column index of an offending entry.</param>
    /// <param name="message">Why the matrix is rejected.</param>
    public NotSkewSymmetrizableException(int row, int column, string message) : base(message)
    {
        Row = row;
        Column = column;
    }

    /// <summary>1-based row index i of an entry b_ij where the condition fails.</summary>
    public int Row { get; }

    /// <summary>1-based column index j of an entry b_ij where the condition fails.</summary>
    public int Column { get; }
}
