using Integrable.Numbers;
using Integrable.Univariate;
using static Integrable.Tests.Univariate.UnivariateTestSupport;

namespace Integrable.Tests.Univariate;

public class PolynomialModPTests
{
    private static readonly PrimeField F101 = new(101);

    [Fact]
    public void Factories_CanonicalForm()
    {
        var f = PolynomialModP.FromCoefficients(F101, 1, -1, 0, 0);
        Assert.Equal(1, f.Degree);
        Assert.Equal(100UL, f[1]);
        Assert.Equal(0UL, f[7]);
        Assert.True(PolynomialModP.FromCoefficients(F101, 0, 0, 101).IsZero);
        Assert.Equal(-1, PolynomialModP.Zero(F101).Degree);
        Assert.Equal(0UL, PolynomialModP.Zero(F101).LeadingCoefficient);
        Assert.True(PolynomialModP.One(F101).IsOne);
        Assert.True(PolynomialModP.Monomial(F101, 1, 5).IsMonic);
        Assert.Throws<ArgumentOutOfRangeException>(() => PolynomialModP.Monomial(F101, 1, -1));
        Assert.Throws<ArgumentOutOfRangeException>(() => f[-1]);
    }

    [Fact]
    public void RingLaws_RandomElements()
    {
        var rng = new Random(11);
        foreach (ulong p in Moduli)
        {
            var f = new PrimeField(p);
            for (int t = 0; t < 20; t++)
            {
                var a = RandomPoly(rng, f, rng.Next(-1, 30));
                var b = RandomPoly(rng, f, rng.Next(-1, 30));
                var c = RandomPoly(rng, f, rng.Next(-1, 30));
                Assert.Equal(a + b, b + a);
                Assert.Equal(a * b, b * a);
                Assert.Equal((a + b) + c, a + (b + c));
                Assert.Equal((a * b) * c, a * (b * c));
                Assert.Equal(a * (b + c), a * b + a * c);
                Assert.True((a - a).IsZero);
                Assert.Equal(-(-a), a);
                Assert.Equal(a, a * PolynomialModP.One(f));
                Assert.Equal(a - b, a + (-b));
                Assert.Equal(a.GetHashCode(), PolynomialModP.FromCoefficients(f, a.Coefficients).GetHashCode());
            }
        }
    }

    [Fact]
    public void ScalarOperators_AgreeWithConstants()
    {
        var x = PolynomialModP.X(F101);
        var p = x * x + 3;
        Assert.Equal(PolynomialModP.FromCoefficients(F101, 3, 0, 1), p);
        Assert.Equal(PolynomialModP.FromCoefficients(F101, -3, 0, -1), -p);
        Assert.Equal(PolynomialModP.FromCoefficients(F101, 6, 0, 2), 2 * p);
        Assert.Equal(PolynomialModP.FromCoefficients(F101, -2, 0, 1), p - 5);
        Assert.Equal(PolynomialModP.FromCoefficients(F101, 2, 0, -1), 5 - p);
        Assert.True((p * 101).IsZero);
    }

    [Fact]
    public void Pow_MatchesRepeatedProduct_AndFrobenius()
    {
        var x = PolynomialModP.X(F101);
        var a = x + 7;
        var expected = PolynomialModP.One(F101);
        for (int i = 0; i < 13; i++) expected *= a;
        Assert.Equal(expected, a.Pow(13));
        Assert.True(a.Pow(0).IsOne);
        // Frobenius in characteristic p: (x + 7)^p = x^p + 7^p = x^p + 7 (common knowledge).
        Assert.Equal(x.Pow(101) + 7, a.Pow(101));
    }

    [Fact]
    public void EvaluateDerivativeShift_Basics()
    {
        var f = PolynomialModP.Parse(F101, "3*x^3 + 2*x + 5");
        Assert.Equal((3UL * 8 + 4 + 5) % 101, f.Evaluate(2));
        Assert.Equal(PolynomialModP.Parse(F101, "9*x^2 + 2"), f.Derivative());
        Assert.True(PolynomialModP.Monomial(F101, 1, 101).Derivative().IsZero);   // d/dx x^p = p·x^(p−1) = 0
        Assert.Equal(f * PolynomialModP.X(F101).Pow(4), f.ShiftLeft(4));
        Assert.Equal(1UL, f.MakeMonic().LeadingCoefficient);
        Assert.Throws<DivideByZeroException>(() => PolynomialModP.Zero(F101).MakeMonic());
    }

    [Fact]
    public void Compose_MatchesEvaluation()
    {
        var rng = new Random(12);
        var f = new PrimeField(2147483647);
        var a = RandomPoly(rng, f, 40);
        var b = RandomPoly(rng, f, 7);
        var c = a.Compose(b);
        Assert.Equal(280, c.Degree);
        for (int i = 0; i < 10; i++)
        {
            ulong x = rng.NextResidue(f.Modulus);
            Assert.Equal(a.Evaluate(b.Evaluate(x)), c.Evaluate(x));
        }
        Assert.Equal(a, a.Compose(PolynomialModP.X(f)));
        Assert.Equal(PolynomialModP.FromCoefficients(f, [a.Evaluate(5)]), a.Compose(PolynomialModP.Constant(f, 5)));
    }

    [Fact]
    public void TextRoundTrip()
    {
        var rng = new Random(13);
        var f = new PrimeField(1000003);
        for (int t = 0; t < 20; t++)
        {
            var a = RandomPoly(rng, f, rng.Next(-1, 12));
            Assert.Equal(a, PolynomialModP.Parse(f, a.ToString()));
            Assert.Equal(a, PolynomialModP.Parse(f, a.ToString("t"), "t"));
        }
        Assert.Equal("x^2 + 100", (PolynomialModP.X(F101).Pow(2) - 1).ToString());
        Assert.Equal("0", PolynomialModP.Zero(F101).ToString());
        Assert.Equal(PolynomialModP.FromCoefficients(F101, [F101.Inverse(2)]), PolynomialModP.Parse(F101, "1/2"));
        Assert.Throws<FormatException>(() => PolynomialModP.Parse(F101, "3*y"));
        Assert.Throws<FormatException>(() => PolynomialModP.Parse(F101, "3 x"));
        Assert.Throws<FormatException>(() => PolynomialModP.Parse(F101, "x^99999999999"));
        Assert.Throws<DivideByZeroException>(() => PolynomialModP.Parse(F101, "1/101"));
    }

    [Fact]
    public void FromRoots_IsProductOfLinearFactors()
    {
        var roots = new ulong[] { 1, 5, 5, 100, 42 };
        var f = PolynomialModP.FromRoots(F101, roots);
        var x = PolynomialModP.X(F101);
        var expected = PolynomialModP.One(F101);
        foreach (var r in roots) expected *= x - (long)r;
        Assert.Equal(expected, f);
        Assert.Equal(new ulong[] { 1, 5, 42, 100 }, f.Roots());
    }

    [Fact]
    public void Fermat_XToThePMinusX_SplitsIntoAllLinearFactors()
    {
        // Common knowledge: x^p − x = Π_{a ∈ F_p} (x − a).
        foreach (ulong p in new ulong[] { 2, 3, 101, 257, 1009 })
        {
            var f = new PrimeField(p);
            var all = new ulong[p];
            for (ulong a = 0; a < p; a++) all[a] = a;
            var lhs = PolynomialModP.Monomial(f, 1, (int)p) - PolynomialModP.X(f);
            Assert.Equal(lhs, PolynomialModP.FromRoots(f, all));
            Assert.Equal(all, lhs.Roots());
        }
    }

    [Fact]
    public void Roots_LargePrime_FindsPlantedRoots()
    {
        var f = new PrimeField(Primes.Large(1));
        var rng = new Random(14);
        var planted = new ulong[12];
        for (int i = 0; i < planted.Length; i++) planted[i] = rng.NextResidue(f.Modulus);
        // Multiply by a factor without roots: x^2 − n for a non-residue n has none.
        ulong n = 2;
        while (f.Pow(n, (long)((f.Modulus - 1) / 2)) == 1) n++;
        var g = PolynomialModP.FromRoots(f, planted) * (PolynomialModP.X(f).Pow(2) - (long)n);
        var expected = planted.Distinct().OrderBy(r => r).ToArray();
        Assert.Equal(expected, g.Roots());
    }
}
