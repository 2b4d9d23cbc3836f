using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Tests.Algebra;

namespace Integrable.Tests.RationalFunctions;

/// <summary>The shared ring-law suite on Q(x, y, z) with random small rational functions (edge cases:
/// zero, constants, monomials, Laurent numerators, big coefficients), canonical form checked after
/// every operation.</summary>
public sealed class RationalFunctionFieldLawsTests : RingLaws<RationalFunction>
{
    private static readonly RationalFunctionField F = new("x", "y", "z");

    protected override IRing<RationalFunction> Ring => F;

    protected override int Iterations => 40;

    protected override RationalFunction Generate(Random rng) => RationalFunctionTestData.Random(rng, F);

    protected override bool IsCanonical(RationalFunction value) => value.IsCanonical();
}

public sealed class RationalFunctionFieldTests
{
    private static readonly RationalFunctionField F = new("x", "y");

    [Fact]
    public void Create_LaurentInputs_MonomialsGoToTheDenominator()
    {
        var r = F.PolynomialRing;
        var q = F.Create(LaurentPolynomial.Parse(r, "x^-1 y"), LaurentPolynomial.Parse(r, "x y^-2"));
        Assert.Equal(LaurentPolynomial.Parse(r, "y^3"), q.Numerator);
        Assert.Equal(LaurentPolynomial.Parse(r, "x^2"), q.Denominator);
        Assert.True(q.IsCanonical());
    }

    [Fact]
    public void Create_SignAndContent_MovedToTheNumerator()
    {
        var r = F.PolynomialRing;
        var q = F.Create(LaurentPolynomial.Parse(r, "2 x"), LaurentPolynomial.Parse(r, "-4 y - 6"));
        Assert.Equal(LaurentPolynomial.Parse(r, "-x"), q.Numerator);
        Assert.Equal(LaurentPolynomial.Parse(r, "2 y + 3"), q.Denominator);
    }

    [Fact]
    public void Create_CommonFactor_Cancels()
    {
        var q = F.Parse("(x^2 - y^2)/(x - y)");
        Assert.True(q.IsPolynomial);
        Assert.Equal(F.Parse("x + y"), q);
        Assert.Equal(F.Parse("1/x"), F.Parse("x/x^2"));
    }

    [Fact]
    public void Create_ZeroDenominator_Throws()
    {
        var r = F.PolynomialRing;
        Assert.Throws<DivideByZeroException>(() => F.Create(r.One, r.Zero));
        Assert.Throws<DivideByZeroException>(() => F.One / F.Zero);
        Assert.Throws<DivideByZeroException>(() => F.Zero.Pow(-1));
    }

    [Fact]
    public void Mixing_DifferentFields_Throws()
    {
        var other = new RationalFunctionField("x", "z");
        Assert.Throws<IncompatibleRingException>(() => F.Variable("x") + other.Variable("x"));
        var u = F.Unify(other);
        Assert.Equal(new[] { "x", "y", "z" }, u.Variables);
        Assert.Equal(u.Parse("x + z"), u.Embed(F.Variable("x")) + u.Embed(other.Variable("z")));
    }

    [Fact]
    public void TryDivide_ByZero_ReturnsFalse()
    {
        Assert.False(((IRing<RationalFunction>)F).TryDivide(F.One, F.Zero, out _));
        Assert.True(F.TryDivide(F.Variable("x"), F.Variable("y"), out var q));
        Assert.Equal(F.Parse("x/y"), q);
    }

    [Fact]
    public void Constant_AndFromPolynomial_AreCanonical()
    {
        Assert.Equal(F.Parse("-3/7"), F.Constant(new Rational(-3, 7)));
        Assert.True(F.Constant(0).IsZero);
        Assert.Equal(F.Parse("1/(x y)"), F.FromPolynomial(LaurentPolynomial.Parse(F.PolynomialRing, "x^-1 y^-1")));
    }
}
