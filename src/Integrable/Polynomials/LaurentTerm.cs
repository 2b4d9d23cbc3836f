using Integrable.Numbers;

namespace Integrable.Polynomials;

/// <summary>One term c·x^e of a <see cref="LaurentPolynomial"/>: a view on the polynomial's arrays.</summary>
public readonly ref struct LaurentTerm
{
    internal LaurentTerm(Rational coefficient, ReadOnlySpan<int> exponents)
    {
        Coefficient = coefficient;
        Exponents = exponents;
    }

    /// <summary>The coefficient c (never zero).</summary>
    public Rational Coefficient { get; }

    /// <summary>The exponent vector e, one entry per ring variable.</summary>
    public ReadOnlySpan<int> Exponents { get; }
}
