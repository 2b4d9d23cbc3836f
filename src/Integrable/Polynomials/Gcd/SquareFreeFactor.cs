namespace Integrable.Polynomials;

/// <summary>One factor f^k of a square-free factorisation: a square-free polynomial and its multiplicity.</summary>
public readonly struct SquareFreeFactor
{
    internal SquareFreeFactor(LaurentPolynomial factor, int multiplicity)
    {
        Factor = factor;
        Multiplicity = multiplicity;
    }

    /// <summary>The square-free factor (primitive, positive leading coefficient, no monomial factor,
    /// not constant).</summary>
    public LaurentPolynomial Factor { get; }

    /// <summary>Its multiplicity k ≥ 1.</summary>
    public int Multiplicity { get; }

    /// <summary>Text such as <c>(x + y)^2</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Multiplicity == 1 ? $"({Factor})" : $"({Factor})^{Multiplicity}";
}
