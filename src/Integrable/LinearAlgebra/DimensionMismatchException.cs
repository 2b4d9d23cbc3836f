namespace Integrable.LinearAlgebra;

/// <summary>Thrown when the shapes of matrices or vectors do not fit the operation (for example a sum of
/// a 2×3 and a 3×2 matrix, or a right-hand side whose length is not the row count).</summary>
/// <example><code>
/// try { _ = RationalMatrix.Identity(2) + RationalMatrix.Zero(2, 3); }
/// catch (DimensionMismatchException e) { Console.WriteLine(e.Message); }   // cannot add a 2×2 and a 2×3 matrix
/// </code></example>
public sealed class DimensionMismatchException : ArgumentException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="message">What did not fit, with both shapes.</param>
    /// <param name="paramName">The offending argument.</param>
    public DimensionMismatchException(string message, string? paramName = null) : base(message, paramName) { }
}
