namespace Integrable.Kernels.Univariate;

/// <summary>Crossover points between the algorithm variants of the dense univariate kernels. They are
/// plain static fields so tests can force every variant on small inputs (set them low, run, restore).</summary>
/// <remarks>Values were chosen by timing on a 2-core AMD EPYC (AVX2/AVX-512) with p = 2^31 − 1; see the
/// UnivariateMultiplyBenchmarks class. All lengths are coefficient counts (degree + 1).</remarks>
internal static class UnivariateThresholds
{
    /// <summary>Karatsuba replaces schoolbook multiplication when the shorter operand has at least this many coefficients.</summary>
    internal static int Karatsuba = 40;

    /// <summary>Transform (NTT) multiplication replaces Karatsuba when the shorter operand has at least this many coefficients.</summary>
    internal static int Ntt = 200;

    /// <summary>Newton (reciprocal) division replaces long division when both the quotient and the divisor have at least this many coefficients.</summary>
    internal static int NewtonDivision = 400;

    /// <summary>Half-GCD replaces the plain Euclidean algorithm at this degree of the larger operand.</summary>
    internal static int HalfGcd = 200;

    /// <summary>Degree below which the half-GCD recursion falls back to plain Euclidean steps with matrix tracking.</summary>
    internal static int HalfGcdBase = 100;
}
