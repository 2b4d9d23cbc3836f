namespace Integrable.LinearAlgebra;

/// <summary>What the solution set of a linear system A·x = b looks like.</summary>
/// <example><code>
/// var s = RationalMatrix.FromRows([[1, 1]]).Solve([2]);
/// // s.Status == LinearSystemStatus.Underdetermined: x = (2, 0) + t·(−1, 1)
/// </code></example>
public enum LinearSystemStatus
{
    /// <summary>Exactly one solution (A has full column rank and b lies in its column space).</summary>
    Unique,

    /// <summary>Infinitely many solutions (over Q) or several (over Z/pZ): a particular solution plus
    /// any vector of the non-trivial kernel of A.</summary>
    Underdetermined,

    /// <summary>No solution: b does not lie in the column space of A.</summary>
    Inconsistent,
}
