namespace Integrable.LinearAlgebra;

/// <summary>The solution set of a linear system A·x = b: empty, or a particular solution plus the
/// kernel of A.</summary>
/// <typeparam name="T">The scalar type (<see cref="Integrable.Numbers.Rational"/> or residues as <see cref="ulong"/>).</typeparam>
/// <typeparam name="TMatrix">The matrix type holding the kernel basis.</typeparam>
/// <remarks>The particular solution is the one with every free variable (non-pivot column of A) equal
/// to zero; the kernel basis is the canonical one read off the reduced row echelon form of A (see
/// <see cref="RationalMatrix.Nullspace"/>). Over Q everything has been verified exactly.</remarks>
/// <example><code>
/// var s = RationalMatrix.FromRows([[1, 1], [1, -1]]).Solve([3, 1]);
/// // s.Status == LinearSystemStatus.Unique, s.Particular is [2, 1]
/// </code></example>
public sealed class LinearSystemSolution<T, TMatrix> where TMatrix : class
{
    private readonly T[]? _particular;

    internal LinearSystemSolution(T[]? particular, TMatrix kernel, int kernelDimension)
    {
        _particular = particular;
        Kernel = kernel;
        Status = particular is null ? LinearSystemStatus.Inconsistent
            : kernelDimension == 0 ? LinearSystemStatus.Unique : LinearSystemStatus.Underdetermined;
    }

    /// <summary>Whether the system has no, one or many solutions.</summary>
    public LinearSystemStatus Status { get; }

    /// <summary>True unless the system is inconsistent.</summary>
    public bool IsConsistent => Status != LinearSystemStatus.Inconsistent;

    /// <summary>A particular solution: the one whose free variables are zero.</summary>
    /// <exception cref="InvalidOperationException">The system is inconsistent (<see cref="Status"/> is
    /// <see cref="LinearSystemStatus.Inconsistent"/>).</exception>
    public ReadOnlySpan<T> Particular => _particular ?? throw new InvalidOperationException("the linear system is inconsistent: it has no solution");

    /// <summary>A basis of the kernel of A, one vector per row (also given when the system is inconsistent).</summary>
    public TMatrix Kernel { get; }

    /// <inheritdoc/>
    public override string ToString() => Status switch
    {
        LinearSystemStatus.Inconsistent => "inconsistent",
        LinearSystemStatus.Unique => $"unique: [{string.Join(", ", _particular!)}]",
        _ => $"[{string.Join(", ", _particular!)}] + span of rows of {Kernel}",
    };
}
