using Integrable.Analyses;
using Integrable.Polynomials;

namespace Integrable.Integrals;

/// <summary>Settings of a first-integral search: degree bounds, whether rational integrals (Darboux polynomials)
/// and invariant measures are searched, budget and random seed.</summary>
/// <example><code>
/// var options = IntegralOptions.Default with { Degree = 6, Rational = true };
/// </code></example>
public sealed record IntegralOptions
{
    /// <summary>Degree 4, polynomial integrals only, parameter degree up to 8, cofactor exponents up to 2.</summary>
    public static IntegralOptions Default { get; } = new();

    /// <summary>Largest total degree in the state variables of a polynomial integral (and, by default, of a Darboux polynomial).</summary>
    public int Degree { get; init; } = 4;

    /// <summary>Largest degree in each single state variable (a multidegree bound, e.g. 2 for biquadratic
    /// integrals), or null for none; applies to polynomial integrals and Darboux polynomials.</summary>
    public int? MaxVariableDegree { get; init; }

    /// <summary>Also search Darboux polynomials, rational integrals (ratios with equal cofactors) and invariant measures.</summary>
    public bool Rational { get; init; }

    /// <summary>Largest degree of a Darboux polynomial, or null for <see cref="Degree"/>.</summary>
    public int? DarbouxDegree { get; init; }

    /// <summary>Cofactors are products f₁^e₁⋯f_s^e_s of the factors of the map's denominators and Jacobian with
    /// |eᵢ| ≤ this bound.</summary>
    public int MaxCofactorExponent { get; init; } = 2;

    /// <summary>Largest degree in the parameters tried for the coefficients (before dividing out their common
    /// factor); the search stops earlier as soon as the dimension bound is reached.</summary>
    public int MaxParameterDegree { get; init; } = 8;

    /// <summary>Largest number of unknown coefficients in one ansatz (monomials × parameter monomials × phases).
    /// The sampled linear system is about that size squared (8 bytes an entry), so the default 6000 keeps it
    /// under 300 MB; a larger ansatz stops the search with a partial report whose limit is
    /// <see cref="BudgetLimit.Terms"/>.</summary>
    /// <example>Degree 12 in 5 variables has 6187 monomials, just past the default.</example>
    public int MaxUnknowns { get; init; } = 6000;

    /// <summary>Time limit (the term and degree limits of <see cref="AnalysisBudget"/> do not apply; see <see cref="MaxUnknowns"/>).</summary>
    public AnalysisBudget Budget { get; init; } = AnalysisBudget.Default;

    /// <summary>Seed of the random points and primes.</summary>
    public int RandomSeed { get; init; } = 20240;

    /// <summary>Test hook: the number of sampled rows per linear system (null: unknowns + 12).</summary>
    internal int? RowsOverride { get; init; }

    /// <summary>Test hook: rewrites the reconstructed candidates before their exact proof.</summary>
    internal Func<IReadOnlyList<LaurentPolynomial[]>, IEnumerable<LaurentPolynomial[]>>? CandidateHook { get; init; }

    /// <summary>Most primes used to reconstruct one kernel.</summary>
    internal int MaxPrimes { get; init; } = 24;
}
