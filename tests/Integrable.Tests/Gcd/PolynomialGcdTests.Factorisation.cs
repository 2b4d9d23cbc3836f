using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Gcd;

public sealed class PolynomialGcdFactorisationTests
{
    private static readonly LaurentPolynomialRing R = new("x", "y", "z");

    private static LaurentPolynomial P(string s) => LaurentPolynomial.Parse(R, s);

    [Fact]
    public void ContentIn_ProductOfContentAndPrimitive_SplitsBack()
    {
        // q = x·a + (a + 1) is primitive in x (its coefficients a and a + 1 are coprime), c is free of x.
        var rng = new Random(31);
        for (int i = 0; i < 8; i++)
        {
            var a = GcdTestData.Random(rng, R, 3, 2).Substitute("x", R.One) + P("y");
            var q = P("x") * a + a + 1;
            var c = GcdTestData.Random(rng, R, 3, 2).Substitute("x", P("2"));
            if (c.IsZero) continue;
            var p = c * q;
            var content = p.ContentIn("x");
            Assert.Equal(GcdTestData.Normalised(c), content);
            Assert.Equal(p, content * p.PrimitivePartIn("x"));
        }
    }

    [Fact]
    public void ContentIn_Laurent_AndZero()
    {
        var p = P("x^-1 y^2 (y + z) + x^3 (y + z) (y - 1)");
        Assert.Equal(P("y + z"), p.ContentIn("x"));
        Assert.Equal(P("x^-1 y^2 + x^3 (y - 1)"), p.PrimitivePartIn("x"));
        Assert.True(R.Zero.ContentIn("x").IsZero);
        Assert.Throws<ArgumentException>(() => p.ContentIn("w"));
    }

    [Fact]
    public void FactorSquareFree_ProductOfPowers_RecoversTheFactors()
    {
        // f_k = x·a_k + (a_k + k) is linear in x with coprime coefficients, hence irreducible; distinct
        // random a_k make the f_k pairwise coprime (checked).
        var rng = new Random(41);
        for (int round = 0; round < 4; round++)
        {
            var f = new LaurentPolynomial[4];
            for (int k = 1; k <= 3; k++)
            {
                var a = GcdTestData.Random(rng, R, 3, 2).Substitute("x", R.One) + P("y z");
                f[k] = P("x") * a + a + k;
            }
            for (int i = 1; i <= 3; i++)
                for (int j = i + 1; j <= 3; j++) Assert.True(f[i].Gcd(f[j]).IsOne);
            var unit = P("-5/3 x^-2 y^4");
            var p = unit * f[1] * f[2].Pow(2) * f[3].Pow(3);
            var s = p.FactorSquareFree();
            Assert.True(s.Unit.IsMonomial);
            Assert.Equal(unit.Exponents.ToArray(), s.Unit.Exponents.ToArray());
            Assert.Equal(3, s.Factors.Count);
            for (int k = 1; k <= 3; k++)
            {
                Assert.Equal(k, s.Factors[k - 1].Multiplicity);
                Assert.Equal(GcdTestData.Normalised(f[k]), s.Factors[k - 1].Factor);
            }
            Assert.Equal(p, s.Expand());
        }
    }

    [Fact]
    public void FactorSquareFree_ContentFactorsAndEqualMultiplicities_AreMerged()
    {
        // (y + 1)^2 is free of x (it is found in the content), (x + y)^2 in the primitive part: one factor of multiplicity 2.
        var p = P("(y + 1)^2 (x + y)^2 (x - z)^5 z^3");
        var s = p.FactorSquareFree();
        Assert.Equal(P("z^3"), s.Unit);
        Assert.Equal(2, s.Factors.Count);
        Assert.Equal(2, s.Factors[0].Multiplicity);
        Assert.Equal(GcdTestData.Normalised(P("(y + 1)(x + y)")), s.Factors[0].Factor);
        Assert.Equal(5, s.Factors[1].Multiplicity);
        Assert.Equal(P("x - z"), s.Factors[1].Factor);
    }

    [Fact]
    public void FactorSquareFree_SquareFreeInput_IsOneFactor()
    {
        var p = P("x^2 + y^2 + z^2 - 1");
        var s = p.FactorSquareFree();
        Assert.True(s.Unit.IsOne);
        Assert.Single(s.Factors);
        Assert.Equal(1, s.Factors[0].Multiplicity);
        Assert.Equal(p, s.Factors[0].Factor);
        Assert.Empty(P("4 x^-3").FactorSquareFree().Factors);
        Assert.Throws<ArgumentException>(() => R.Zero.FactorSquareFree());
        Assert.Equal("4*x^-3", P("4 x^-3").FactorSquareFree().ToString());
    }
}
