namespace Integrable.Polynomials;

/// <summary>The square-free factorisation p = u·f₁^1·f₂^2⋯f_k^k of a non-zero Laurent polynomial: u is a
/// unit c·x^e of the Laurent ring (the rational content and the monomial part of p) and the fᵢ are
/// square-free, pairwise coprime, primitive with positive leading coefficient and free of monomial
/// factors.</summary>
/// <remarks>Computed by <see cref="PolynomialGcd.FactorSquareFree"/> (Yun's algorithm per variable). Only
/// multiplicities that occur are listed, in increasing order; each multiplicity appears once (all
/// factors of that multiplicity are multiplied together).</remarks>
/// <example><code>
/// var r = new LaurentPolynomialRing("x", "y");
/// var p = LaurentPolynomial.Parse(r, "3 x^-1 (x + y)^2 (x - 1)");
/// var s = p.FactorSquareFree();   // unit 3*x^-1, factors (x - 1)^1, (x + y)^2
/// </code></example>
public sealed class SquareFreeFactorization
{
    private readonly SquareFreeFactor[] _factors;

    internal SquareFreeFactorization(LaurentPolynomial unit, SquareFreeFactor[] factors)
    {
        Unit = unit;
        _factors = factors;
    }

    /// <summary>The unit c·x^e (a monomial; for an ordinary polynomial, x^e is its monomial factor).</summary>
    public LaurentPolynomial Unit { get; }

    /// <summary>The square-free factors with their multiplicities, in increasing multiplicity.</summary>
    public IReadOnlyList<SquareFreeFactor> Factors => _factors;

    /// <summary>The product u·Π fᵢ^i, equal to the factorised polynomial.</summary>
    /// <returns>The expanded polynomial.</returns>
    public LaurentPolynomial Expand()
    {
        var p = Unit;
        foreach (var f in _factors) p *= f.Factor.Pow(f.Multiplicity);
        return p;
    }

    /// <summary>Text such as <c>3*x^-1 * (x - 1) * (x + y)^2</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var parts = new List<string> { Unit.ToString() };
        foreach (var f in _factors) parts.Add(f.ToString());
        return string.Join(" * ", parts);
    }
}
