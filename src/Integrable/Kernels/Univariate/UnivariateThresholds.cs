namespace Integrable.Kernels.Univariate;

/// <summary>Crossover points between the algorithm variants of the dense univariate kernels. They are
/// plain static fields so tests can force every variant on small inputs (set them low, run, restore).</summary>
/// <remarks>Values were chosen by timing on a 2-core AMD EPYC (AVX2/AVX-512) with p = 2^31 − 1; see the
/// UnivariateMultiplyBenchmarks class. All lengths are coefficient counts (degree + 1).</remarks>
internal static class UnivariateThresholds
{
    /// <summary>Karatsuba replaces schoolbook multiplication when the shorter operand has at least this many
    /// coefficients (and transforms are not cheaper).</summary>
    internal static int Karatsuba = 32;

    /// <summary>Below this shorter-operand length transforms are never used; above it a cost model picks
    /// between transforms and the classical product (see PolyMod.Multiply).</summary>
    internal static int Ntt = 16;

    /// <summary>Weight of the transform cost k·L·log₂L against the classical cost in the multiplication cost
    /// model (0 forces transforms whenever the shorter operand reaches <see cref="Ntt"/>).</summary>
    internal static double TransformCostFactor = 0.9;

    /// <summary>2×2 polynomial matrix products (half-GCD) share the transforms of their entries once the
    /// shortest entry has this many coefficients; below, each product is dispatched on its own.</summary>
    internal static int MatrixTransform = 40;

    /// <summary>Newton (reciprocal) division replaces long division when both the quotient and the divisor
    /// have at least this many coefficients and their product reaches <see cref="NewtonDivisionWork"/>.</summary>
    internal static int NewtonDivision = 32;

    /// <summary>Minimum (quotient length)·(divisor length) for Newton division (measured crossover ≈ 6000–16000).</summary>
    internal static long NewtonDivisionWork = 8192;

    /// <summary>Half-GCD replaces the plain Euclidean algorithm at this degree of the larger operand.</summary>
    internal static int HalfGcd = 600;

    /// <summary>Degree below which the half-GCD recursion falls back to plain Euclidean steps with matrix tracking.</summary>
    internal static int HalfGcdBase = 200;
}
