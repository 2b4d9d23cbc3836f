using Integrable.Kernels.Gcd;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Gcd;

public sealed class PolynomialGcdTests
{
    private static readonly LaurentPolynomialRing R2 = new("x", "y");
    private static readonly LaurentPolynomialRing R4 = new("x", "y", "z", "t");

    private static LaurentPolynomial P(LaurentPolynomialRing r, string s) => LaurentPolynomial.Parse(r, s);

    private static void CheckGcd(LaurentPolynomial a, LaurentPolynomial b, LaurentPolynomial expected)
    {
        var (g, ca, cb) = a.GcdWithCofactors(b);
        Assert.Equal(GcdTestData.Normalised(expected), g);
        Assert.Equal(a, g * ca);
        Assert.Equal(b, g * cb);
        Assert.True(ca.Gcd(cb).IsOne, "the cofactors must be coprime");
    }

    [Fact]
    public void Gcd_SmallBivariate_IsCommonFactor()
    {
        CheckGcd(P(R2, "(x + y)^2 (x - 1)"), P(R2, "(x + y) (x + 1)"), P(R2, "x + y"));
        CheckGcd(P(R2, "(x y + 1)^3 (x - y)"), P(R2, "(x y + 1)^2 (x + y)^2"), P(R2, "(x y + 1)^2"));
        CheckGcd(P(R2, "x^2 - 1"), P(R2, "x^2 + 1"), R2.One);
    }

    [Fact]
    public void Gcd_RandomProducts_GivesTheCommonFactor()
    {
        var rng = new Random(11);
        for (int i = 0; i < 20; i++)
        {
            var f = GcdTestData.Random(rng, R4, 6, 3);
            var g = GcdTestData.Random(rng, R4, 5, 3);
            var h = g + GcdTestData.RandomInteger(rng, 5); // gcd(g, g + c) = 1 by construction
            CheckGcd(f * g, f * h, f);
        }
    }

    [Fact]
    public void Gcd_DenseFourVariables_GivesTheCommonFactor()
    {
        var rng = new Random(5);
        var f = GcdTestData.Dense(rng, R4, 4);
        var g = GcdTestData.Dense(rng, R4, 4);
        var h = g * R4.Variable(0) + 1; // gcd(g, x·g + 1) = 1 by construction
        CheckGcd(f * g, f * h, f);
    }
}
