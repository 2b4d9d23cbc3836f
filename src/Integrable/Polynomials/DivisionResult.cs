namespace Integrable.Polynomials;

/// <summary>Quotient and remainder of a polynomial division: dividend = <see cref="Quotient"/>·divisor
/// + <see cref="Remainder"/>, exactly.</summary>
/// <remarks>Returned by <see cref="LaurentPolynomial.DivRem"/> and by
/// <see cref="LaurentPolynomial.DivideExact"/>; in the latter a non-zero remainder is the witness that
/// the divisor does not divide the dividend.</remarks>
public readonly struct DivisionResult
{
    internal DivisionResult(LaurentPolynomial quotient, LaurentPolynomial remainder)
    {
        Quotient = quotient;
        Remainder = remainder;
    }

    /// <summary>The quotient q.</summary>
    public LaurentPolynomial Quotient { get; }

    /// <summary>The remainder r (zero when the division is exact).</summary>
    public LaurentPolynomial Remainder { get; }

    /// <summary>True when the remainder is zero, i.e. the divisor divides the dividend and
    /// <see cref="Quotient"/> is the exact quotient.</summary>
    public bool IsExact => Remainder.IsZero;

    /// <summary>Deconstructs into quotient and remainder.</summary>
    /// <param name="quotient">The quotient.</param>
    /// <param name="remainder">The remainder.</param>
    public void Deconstruct(out LaurentPolynomial quotient, out LaurentPolynomial remainder)
    {
        quotient = Quotient;
        remainder = Remainder;
    }
}
