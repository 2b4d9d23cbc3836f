namespace Integrable.Analyses;

/// <summary>How the degrees of the iterates grow.</summary>
public enum GrowthClass
{
    /// <summary>Bounded degrees (e.g. periodic or linearisable of degree zero growth).</summary>
    Bounded,
    /// <summary>Degrees grow linearly (linearisable maps).</summary>
    Linear,
    /// <summary>Degrees grow quadratically (QRT maps, discrete Painlevé equations: integrable).</summary>
    Quadratic,
    /// <summary>Degrees grow like n^d for some d ≥ 3 (see <see cref="GrowthFit.PolynomialDegree"/>).</summary>
    Polynomial,
    /// <summary>Degrees grow like λ^n with λ &gt; 1: positive algebraic entropy log λ (non-integrable).</summary>
    Exponential,
}
