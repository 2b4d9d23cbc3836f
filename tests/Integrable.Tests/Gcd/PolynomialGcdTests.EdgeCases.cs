using System.Numerics;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Gcd;

public sealed class PolynomialGcdEdgeCaseTests
{
    private static readonly LaurentPolynomialRing R = new("x", "y", "z");

    private static LaurentPolynomial P(string s) => LaurentPolynomial.Parse(R, s);

    [Fact]
    public void Gcd_Zeros_FollowTheConvention()
    {
        var (g, a, b) = R.Zero.GcdWithCofactors(R.Zero);
        Assert.True(g.IsZero && a.IsZero && b.IsZero);
        var p = P("-6 x^-1 (y + 2)");
        (g, a, b) = p.GcdWithCofactors(R.Zero);
        Assert.Equal(P("y + 2"), g);
        Assert.Equal(p, g * a);
        Assert.True(b.IsZero);
        (g, a, b) = R.Zero.GcdWithCofactors(p);
        Assert.Equal(P("y + 2"), g);
        Assert.True(a.IsZero);
        Assert.Equal(p, g * b);
    }

    [Fact]
    public void Gcd_Constants_IsOne()
    {
        Assert.Equal(R.One, P("2/3").Gcd(P("4")));
        Assert.Equal(R.One, P("7").Gcd(P("x + 1")));
        var (g, a, b) = P("3/5").GcdWithCofactors(P("x y - 1"));
        Assert.True(g.IsOne);
        Assert.Equal(P("3/5"), a);
        Assert.Equal(P("x y - 1"), b);
    }

    [Fact]
    public void Gcd_OfPolynomialWithItself_IsItsNormalisation()
    {
        var p = P("-4 x^2 y + 6 z^3");
        Assert.Equal(P("2 x^2 y - 3 z^3"), p.Gcd(p));
        Assert.Equal(P("2 x^2 y - 3 z^3"), p.Gcd(-p * new Rational(5, 7)));
    }

    [Fact]
    public void Gcd_OneVariable_MatchesEuclidOverQ()
    {
        var u = new LaurentPolynomialRing("t");
        var rng = new Random(4);
        for (int i = 0; i < 25; i++)
        {
            var f = GcdTestData.Random(rng, u, 4, 6, 40);
            var g = GcdTestData.Random(rng, u, 4, 6, 40);
            var h = GcdTestData.Random(rng, u, 4, 6, 40);
            var a = f * g;
            var b = f * h;
            Assert.Equal(EuclidReference(a, b), a.Gcd(b));
        }
    }

    /// <summary>Textbook Euclid over Q (division with remainder), normalised like the library's gcd.</summary>
    private static LaurentPolynomial EuclidReference(LaurentPolynomial a, LaurentPolynomial b)
    {
        a = GcdTestData.Normalised(a);
        b = GcdTestData.Normalised(b);
        while (!b.IsZero)
        {
            var r = a.DivRem(b, MonomialOrder.Lex).Remainder;
            (a, b) = (b, GcdTestData.Normalised(r));
        }
        return GcdTestData.Normalised(a);
    }

    [Fact]
    public void Gcd_ManyVariables_SparseFactors()
    {
        var ring = new LaurentPolynomialRing(Enumerable.Range(0, 9).Select(i => $"v_{i}").ToArray());
        var rng = new Random(9);
        for (int i = 0; i < 4; i++)
        {
            var f = GcdTestData.Random(rng, ring, 4, 2);
            var g = GcdTestData.Random(rng, ring, 3, 2);
            var h = g + 1;
            var (gcd, ca, cb) = (f * g).GcdWithCofactors(f * h);
            Assert.Equal(GcdTestData.Normalised(f), gcd);
            Assert.Equal(f * g, gcd * ca);
            Assert.Equal(f * h, gcd * cb);
        }
    }

    [Fact]
    public void Gcd_HugeCoefficients_PastSixtyFourBits()
    {
        var rng = new Random(12);
        for (int i = 0; i < 5; i++)
        {
            var f = GcdTestData.Random(rng, R, 5, 3, bits: 200);
            var g = GcdTestData.Random(rng, R, 4, 3, bits: 150);
            var h = g - new Rational(BigInteger.Pow(10, 30) + 7);
            var (gcd, ca, cb) = (f * g).GcdWithCofactors(f * h);
            Assert.Equal(GcdTestData.Normalised(f), gcd);
            Assert.Equal(f * g, gcd * ca);
            Assert.Equal(f * h, gcd * cb);
        }
    }

    [Fact]
    public void Gcd_LaurentInputs_MonomialsAreUnits()
    {
        var a = P("x^-2 (x + y) (x - 1)");
        var b = P("3 y^-1 z^4 (x + y)^2");
        var (g, ca, cb) = a.GcdWithCofactors(b);
        Assert.Equal(P("x + y"), g);
        Assert.Equal(a, g * ca);
        Assert.Equal(b, g * cb);
        var rng = new Random(15);
        for (int i = 0; i < 10; i++)
        {
            var f = GcdTestData.Random(rng, R, 4, 2, minExp: -3);
            var u = GcdTestData.Random(rng, R, 3, 2, minExp: -2);
            var v = u + 5;
            Assert.Equal(GcdTestData.Normalised(f), (f * u).Gcd(f * v));
        }
    }

    [Fact]
    public void Gcd_KeepMonomials_IsThePolynomialGcd()
    {
        Assert.Equal(P("x y"), P("x^2 y").Gcd(P("x y^3"), MonomialFactor.Keep));
        Assert.Equal(R.One, P("x^2 y").Gcd(P("x y^3")));
        Assert.Equal(P("x y (x + z)"), P("x^2 y (x + z)").Gcd(P("2 x y^3 (x + z)(y - 1)"), MonomialFactor.Keep));
        // Laurent monomial parts: x^-1 y and x give x^min(-1, 1) y^min(1, 0) = x^-1
        var (g, a, b) = P("x^-1 y (z + 1)").GcdWithCofactors(P("x (z + 1)^2"), MonomialFactor.Keep);
        Assert.Equal(P("x^-1 (z + 1)"), g);
        Assert.Equal(P("x^-1 y (z + 1)"), g * a);
        Assert.Equal(P("x (z + 1)^2"), g * b);
    }

    [Fact]
    public void Lcm_TimesGcd_IsTheNormalisedProduct()
    {
        var rng = new Random(16);
        for (int i = 0; i < 10; i++)
        {
            var f = GcdTestData.Random(rng, R, 3, 2);
            var a = f * GcdTestData.Random(rng, R, 3, 2, minExp: -1);
            var b = f * GcdTestData.Random(rng, R, 3, 2);
            Assert.Equal(GcdTestData.Normalised(a * b), a.Lcm(b) * a.Gcd(b));
        }
        Assert.Equal(P("x^2 y^3"), P("x^2 y").Lcm(P("x y^3"), MonomialFactor.Keep));
        Assert.True(P("x").Lcm(R.Zero).IsZero);
    }

    [Fact]
    public void Gcd_OfSeveral_IsTheCommonFactor()
    {
        var f = P("x y - z^2 + 1");
        var list = new[] { f * P("x + 1"), f * P("y - 2"), R.Zero, f * f * P("z") };
        Assert.Equal(f, PolynomialGcd.Gcd(list));
        Assert.Equal(R.One, PolynomialGcd.Gcd(new[] { f, P("x + 1") }));
        Assert.True(PolynomialGcd.Gcd(new[] { R.Zero, R.Zero }).IsZero);
        Assert.Throws<ArgumentException>(() => PolynomialGcd.Gcd(Array.Empty<LaurentPolynomial>()));
    }

    [Fact]
    public void Gcd_DifferentRings_Throws()
    {
        var other = new LaurentPolynomialRing("x", "w");
        Assert.Throws<IncompatibleRingException>(() => P("x").Gcd(other.Variable("x")));
        Assert.Throws<ArgumentOutOfRangeException>(() => P("x").Gcd(P("y"), (MonomialFactor)7));
    }

    [Fact]
    public void Gcd_HietarintaVialletStep_AgreesWithSingular()
    {
        // The anchors' generic W3 step (num = (P^3 + Q^3)Q' - P'P^2Q, den = P^2 Q Q') at n = 5 from x0 = x,
        // x1 = y. Reference: Singular 4.3.1, `ring r = 0, (x, y), lp; gcd(num, den)` (run on this machine),
        // which printed x4y12-4x3y13-4x3y10+6x2y14+12x2y11+6x2y8-4xy15-12xy12-12xy9-4xy6+y16+4y13+6y10+4y7+y4.
        var ring = new LaurentPolynomialRing("x", "y");
        LaurentPolynomial p0 = ring.Variable(0), q0 = ring.One, p1 = ring.Variable(1), q1 = ring.One, g = ring.One;
        for (int n = 2; n <= 5; n++)
        {
            var num = (p1.Pow(3) + q1.Pow(3)) * q0 - p0 * p1 * p1 * q1;
            var den = p1 * p1 * q1 * q0;
            (g, var pn, var qn) = num.GcdWithCofactors(den, MonomialFactor.Keep);
            if (qn.LeadingCoefficient.Sign < 0) { pn = -pn; qn = -qn; }
            (p0, q0, p1, q1) = (p1, q1, pn, qn);
        }
        var singular = LaurentPolynomial.Parse(ring,
            "x^4 y^12 - 4 x^3 y^13 - 4 x^3 y^10 + 6 x^2 y^14 + 12 x^2 y^11 + 6 x^2 y^8 - 4 x y^15 - 12 x y^12 - 12 x y^9 - 4 x y^6 + y^16 + 4 y^13 + 6 y^10 + 4 y^7 + y^4");
        Assert.Equal(singular, g);
    }
}
