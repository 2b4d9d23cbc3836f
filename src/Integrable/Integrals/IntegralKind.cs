namespace Integrable.Integrals;

/// <summary>The kind of a first integral.</summary>
public enum IntegralKind
{
    /// <summary>A polynomial in the state variables (coefficients polynomial in the parameters).</summary>
    Polynomial,

    /// <summary>A ratio of two Darboux polynomials with the same cofactor.</summary>
    Rational,
}
