using Integrable.Algebra;
using Integrable.Polynomials;
using Integrable.Tests.Algebra;

namespace Integrable.Tests.Polynomials;

/// <summary>The ring-law suite on Q[x^±1, y^±1, z^±1] with random small Laurent polynomials.</summary>
public sealed class LaurentPolynomialRingLawsTests : RingLaws<LaurentPolynomial>
{
    private static readonly LaurentPolynomialRing R = new("x", "y", "z");

    protected override IRing<LaurentPolynomial> Ring => R;

    protected override int Iterations => 60;

    protected override LaurentPolynomial Generate(Random rng) => PolynomialTestData.Random(rng, R, new(MaxTerms: 6));

    protected override bool IsCanonical(LaurentPolynomial value) => value.IsCanonical();
}

/// <summary>The ring-law suite on a ring of 30 variables, each polynomial using a few of them with
/// large exponents and coefficients (multi-word packing, big-integer paths).</summary>
public sealed class LaurentPolynomialManyVariablesRingLawsTests : RingLaws<LaurentPolynomial>
{
    private static readonly LaurentPolynomialRing R = new(Enumerable.Range(0, 30).Select(i => $"x_{{{i}}}").ToArray());

    protected override IRing<LaurentPolynomial> Ring => R;

    protected override int Iterations => 30;

    protected override int Seed => 777;

    protected override LaurentPolynomial Generate(Random rng) =>
        PolynomialTestData.Random(rng, R, new(MaxTerms: 5, MinExp: -40000, MaxExp: 40000, ActiveVariables: 6));

    protected override bool IsCanonical(LaurentPolynomial value) => value.IsCanonical();
}
