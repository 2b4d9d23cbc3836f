namespace Integrable.Polynomials;

/// <summary>How <see cref="PolynomialGcd"/> treats monomial factors x^e of its inputs.</summary>
public enum MonomialFactor
{
    /// <summary>Monomials are units of the Laurent ring Q[x₁^±1, …, xₙ^±1], so the gcd is taken up to
    /// them: the result has no monomial factor (no variable divides it and no exponent is negative).
    /// This is the gcd in the Laurent ring.</summary>
    Unit,

    /// <summary>Each input is split as x^m·P with P free of monomial factors (m = its per-variable minimum
    /// exponents), and the gcd of the monomial parts, x^min(m_A, m_B), is kept as a factor of the result.
    /// For ordinary polynomials this is the usual polynomial gcd (gcd(x²y, xy³) = xy).</summary>
    Keep,
}
