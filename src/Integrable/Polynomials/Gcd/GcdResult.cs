namespace Integrable.Polynomials;

/// <summary>A greatest common divisor together with both cofactors:
/// <c>A = Gcd·CofactorA</c> and <c>B = Gcd·CofactorB</c> exactly.</summary>
/// <remarks>Returned by <see cref="PolynomialGcd.GcdWithCofactors"/>. The cofactors carry the inputs'
/// rational contents and (in the Laurent normalisation) their monomial parts, so the two identities
/// hold as written.</remarks>
public readonly struct GcdResult
{
    internal GcdResult(LaurentPolynomial gcd, LaurentPolynomial cofactorA, LaurentPolynomial cofactorB)
    {
        Gcd = gcd;
        CofactorA = cofactorA;
        CofactorB = cofactorB;
    }

    /// <summary>The normalised greatest common divisor.</summary>
    public LaurentPolynomial Gcd { get; }

    /// <summary>The first input divided by <see cref="Gcd"/>.</summary>
    public LaurentPolynomial CofactorA { get; }

    /// <summary>The second input divided by <see cref="Gcd"/>.</summary>
    public LaurentPolynomial CofactorB { get; }

    /// <summary>Deconstructs into the gcd and the two cofactors.</summary>
    /// <param name="gcd">The gcd.</param>
    /// <param name="cofactorA">First input / gcd.</param>
    /// <param name="cofactorB">Second input / gcd.</param>
    public void Deconstruct(out LaurentPolynomial gcd, out LaurentPolynomial cofactorA, out LaurentPolynomial cofactorB)
    {
        gcd = Gcd;
        cofactorA = CofactorA;
        cofactorB = CofactorB;
    }
}
