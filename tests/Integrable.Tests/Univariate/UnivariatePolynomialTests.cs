using System.Numerics;
using Fractions;
using Integrable.Numbers;
using Integrable.Univariate;
using static Integrable.Tests.Univariate.UnivariateTestSupport;

namespace Integrable.Tests.Univariate;

[Collection(ThresholdCollection.Name)]
public class UnivariatePolynomialTests
{
    private static readonly UnivariatePolynomial X = UnivariatePolynomial.X;

    private static UnivariatePolynomial RandomQ(Random rng, int degree, int bits = 20, bool fractions = true)
    {
        if (degree < 0) return UnivariatePolynomial.Zero;
        var c = new Rational[degree + 1];
        for (int i = 0; i <= degree; i++)
        {
            var num = new BigInteger(rng.NextInt64(-(1L << bits), 1L << bits));
            var den = fractions ? new BigInteger(rng.NextInt64(1, 1L << Math.Min(bits, 30))) : BigInteger.One;
            c[i] = new Rational(num, den);
        }
        if (c[degree].IsZero) c[degree] = Rational.One;
        return UnivariatePolynomial.FromCoefficients(c);
    }

    private static Rational[] SchoolbookReference(UnivariatePolynomial a, UnivariatePolynomial b)
    {
        // Outside reference: Fractions.Fraction arithmetic.
        if (a.IsZero || b.IsZero) return [];
        var r = new Fraction[a.Degree + b.Degree + 1];
        for (int i = 0; i < r.Length; i++) r[i] = Fraction.Zero;
        for (int i = 0; i <= a.Degree; i++)
            for (int j = 0; j <= b.Degree; j++)
                r[i + j] += new Fraction(a[i].Numerator, a[i].Denominator) * new Fraction(b[j].Numerator, b[j].Denominator);
        return r.Select(f => new Rational(f.Numerator, f.Denominator)).ToArray();
    }

    [Fact]
    public void Multiply_ModularPath_MatchesFractionsReference()
    {
        var rng = new Random(51);
        using var _ = new ThresholdScope(rationalModular: 1, integerModular: 1);
        foreach (var (da, db, bits) in new[] { (0, 3, 10), (5, 5, 40), (40, 33, 62), (70, 9, 120), (30, 24, 200) })
        {
            var a = RandomQ(rng, da, bits);
            var b = RandomQ(rng, db, bits);
            Assert.Equal(SchoolbookReference(a, b), (a * b).ToArray());
        }
    }

    [Fact]
    public void Multiply_DegreeThreeThousand_MatchesEvaluation()
    {
        var rng = new Random(52);
        var a = RandomQ(rng, 3000, 30, fractions: false);
        var b = RandomQ(rng, 2500, 30, fractions: false) * new Rational(5, 6);
        var c = a * b;
        Assert.Equal(5500, c.Degree);
        foreach (var x in new Rational[] { 2, new(-3, 7), 1 })
            Assert.Equal(a.Evaluate(x) * b.Evaluate(x), c.Evaluate(x));
    }

    [Fact]
    public void RingLaws_AndText()
    {
        var rng = new Random(53);
        for (int t = 0; t < 20; t++)
        {
            var a = RandomQ(rng, rng.Next(-1, 20));
            var b = RandomQ(rng, rng.Next(-1, 20));
            var c = RandomQ(rng, rng.Next(-1, 20));
            Assert.Equal(a * (b + c), a * b + a * c);
            Assert.Equal((a * b) * c, a * (b * c));
            Assert.True((a - a).IsZero);
            Assert.Equal(a, UnivariatePolynomial.Parse(a.ToString()));
        }
        Assert.Equal("-1/2*x^3 + 2*x - 1", UnivariatePolynomial.Parse("-x^3/2 + 2*x - 1").ToString());
        Assert.Throws<FormatException>(() => UnivariatePolynomial.Parse("x^"));
    }

    [Fact]
    public void DivRem_Identity_AndExactDivision()
    {
        var rng = new Random(54);
        foreach (var (da, db) in new[] { (3, 5), (10, 3), (40, 39), (80, 30), (200, 60), (400, 150) })
        {
            var a = RandomQ(rng, da, 12, fractions: da < 100) * new Rational(3, 7);
            var b = RandomQ(rng, db, 12, fractions: db < 100) * new Rational(-5, 2);
            var (q, r) = UnivariatePolynomial.DivRem(a, b);
            Assert.Equal(a, q * b + r);
            Assert.True(r.Degree < b.Degree);
            Assert.True((a * b).TryDivideExact(b, out var back));
            Assert.Equal(a, back);
            Assert.False((a * b + 1).TryDivideExact(b, out _));
        }
        Assert.Throws<DivideByZeroException>(() => UnivariatePolynomial.DivRem(X, UnivariatePolynomial.Zero));
    }

    [Fact]
    public void Gcd_OfProducts_IsTheMonicCommonFactor()
    {
        var rng = new Random(55);
        for (int t = 0; t < 6; t++)
        {
            var f = RandomQ(rng, 3 + 4 * t, 15);
            var g = RandomQ(rng, 5 + 3 * t, 15);
            var h = RandomQ(rng, 4 + 5 * t, 15);
            if (!UnivariatePolynomial.Gcd(g, h).IsOne) continue;
            var d = UnivariatePolynomial.Gcd(f * g, f * h);
            Assert.Equal(f.MakeMonic(), d);
            Assert.True((f * g).TryDivideExact(d, out _) && (f * h).TryDivideExact(d, out _));
        }
        Assert.Equal(UnivariatePolynomial.One, UnivariatePolynomial.Gcd(X + 1, X - 1));
        Assert.Equal(X + 1, UnivariatePolynomial.Gcd(UnivariatePolynomial.Zero, 3 * X + 3));
    }

    [Fact]
    public void ExtendedGcd_BezoutIdentity()
    {
        var rng = new Random(56);
        for (int t = 0; t < 5; t++)
        {
            var f = RandomQ(rng, 2 + t, 8);
            var a = f * RandomQ(rng, 6 + t, 8);
            var b = f * RandomQ(rng, 4 + 2 * t, 8);
            var (g, s, u) = UnivariatePolynomial.ExtendedGcd(a, b);
            Assert.Equal(UnivariatePolynomial.Gcd(a, b), g);
            Assert.Equal(g, s * a + u * b);
            Assert.True(s.Degree < b.Degree - g.Degree && u.Degree < a.Degree - g.Degree);
        }
    }

    [Fact]
    public void Resultant_MatchesSylvesterDeterminant_AndRootFormula()
    {
        var rng = new Random(57);
        for (int t = 0; t < 8; t++)
        {
            var a = RandomQ(rng, rng.Next(1, 7), 10, fractions: false);
            var b = RandomQ(rng, rng.Next(1, 7), 10, fractions: false);
            var sa = a.Coefficients.ToArray().Select(c => c.Numerator).ToArray();
            var sb = b.Coefficients.ToArray().Select(c => c.Numerator).ToArray();
            var res = UnivariatePolynomial.Resultant(a, b);
            Assert.True(res.IsInteger);
            // Compare with the Sylvester determinant (the definition of the resultant, common knowledge)
            // modulo two large primes.
            foreach (ulong p in new[] { Primes.Large(5), Primes.Large(6) })
                Assert.Equal(DeterminantModP(Sylvester(sa, sb), p), new PrimeField(p).FromRational(res));
        }
        // res(c·Π(x − αᵢ), g) = c^deg g·Π g(αᵢ) (common knowledge).
        var roots = new Rational[] { new(1, 2), -3, new(5, 7) };
        var f = UnivariatePolynomial.FromRoots(roots) * new Rational(3, 4);
        var gq = RandomQ(rng, 4, 10);
        var expected = new Rational(3, 4).Pow(4);
        foreach (var r in roots) expected *= gq.Evaluate(r);
        Assert.Equal(expected, UnivariatePolynomial.Resultant(f, gq));
    }

    [Fact]
    public void SquareFreeFactorization_OfProductOfPowers()
    {
        var f1 = X * X + 1;
        var f2 = X - new Rational(2, 3);
        var f3 = X * X * X - 2;
        var f = new Rational(-5, 2) * f1 * f2.Pow(2) * f3.Pow(3) * (X + 7).Pow(3);
        var (unit, factors) = f.SquareFreeFactorization();
        Assert.Equal(new Rational(-5, 2), unit);
        Assert.Equal(new[] { 1, 2, 3 }, factors.Select(p => p.Multiplicity).ToArray());
        Assert.Equal(f1, factors[0].Factor);
        Assert.Equal(f2, factors[1].Factor);
        Assert.Equal(f3 * (X + 7), factors[2].Factor);
        var back = UnivariatePolynomial.Constant(unit);
        foreach (var (g, m) in factors) back *= g.Pow(m);
        Assert.Equal(f, back);
        Assert.Equal(f1 * f2 * f3 * (X + 7), f.SquareFreePart());
    }

    [Fact]
    public void RationalRoots_OfProductsOfKnownLinearFactors()
    {
        var rng = new Random(58);
        for (int t = 0; t < 6; t++)
        {
            var expected = new SortedDictionary<Rational, int>();
            var f = UnivariatePolynomial.Constant(new Rational(rng.Next(1, 50), rng.Next(1, 50)));
            for (int k = 0; k < 4 + t; k++)
            {
                var r = new Rational(rng.Next(-200, 200), rng.Next(1, 60));
                int m = rng.Next(1, 4);
                expected[r] = expected.GetValueOrDefault(r) + m;
                f *= (X - r).Pow(m);
            }
            f *= X * X + 3;                      // a factor without rational roots
            var roots = f.RationalRoots();
            Assert.Equal(expected.Select(kv => (kv.Key, kv.Value)).ToArray(), roots.ToArray());
        }
        Assert.Equal(new[] { (Rational.Zero, 3) }, (X.Pow(3) * (X * X - 2)).RationalRoots().ToArray());
        Assert.Empty((X * X + 1).RationalRoots());
    }

    [Fact]
    public void ContentAndPrimitivePart()
    {
        var f = UnivariatePolynomial.Parse("-4/3*x^2 + 2/9*x - 6");
        Assert.Equal(new Rational(2, 9), f.Content());
        Assert.Equal(UnivariatePolynomial.Parse("-6*x^2 + x - 27"), f.PrimitivePart());
        Assert.Equal(f, f.PrimitivePart() * f.Content());
        Assert.Equal(Rational.Zero, UnivariatePolynomial.Zero.Content());
    }

    [Fact]
    public void Compose_Derivative_Evaluate()
    {
        var f = UnivariatePolynomial.Parse("x^3 - 2*x + 1/2");
        var g = UnivariatePolynomial.Parse("2*x^2 - 1/3");
        var c = f.Compose(g);
        foreach (var x in new Rational[] { 0, 1, new(-2, 5) })
            Assert.Equal(f.Evaluate(g.Evaluate(x)), c.Evaluate(x));
        Assert.Equal(UnivariatePolynomial.Parse("3*x^2 - 2"), f.Derivative());
        Assert.Equal(new Rational(1, 2) - 2 * new Rational(3, 5) + new Rational(27, 125), f.Evaluate(new Rational(3, 5)));
    }

    [Fact]
    public void ReduceModulo_MatchesPolynomialModP()
    {
        var f = UnivariatePolynomial.Parse("x^3 - 2/3*x + 5");
        var field = new PrimeField(101);
        Assert.Equal(PolynomialModP.Parse(field, "x^3 - 2/3*x + 5"), f.ReduceModulo(field));
        Assert.Throws<DivideByZeroException>(() => UnivariatePolynomial.Parse("x/101").ReduceModulo(field));
    }
}
