using Integrable.Numbers;
using Integrable.Univariate;
using static Integrable.Tests.Univariate.UnivariateTestSupport;

namespace Integrable.Tests.Univariate;

public class RationalFunctionModPTests
{
    private static readonly PrimeField F = new(1000003);

    private static RationalFunctionModP RandomFunction(Random rng, int maxDegree)
    {
        var num = RandomPoly(rng, F, rng.Next(-1, maxDegree));
        var den = RandomPoly(rng, F, rng.Next(0, maxDegree));
        // Plant a common factor so that canonicalisation has something to cancel.
        var common = RandomPoly(rng, F, rng.Next(0, 3));
        return RationalFunctionModP.Create(num * common, den * common);
    }

    private static void AssertCanonical(RationalFunctionModP r)
    {
        Assert.True(r.Denominator.IsMonic);
        Assert.True(PolynomialModP.Gcd(r.Numerator, r.Denominator).IsOne || r.IsZero);
        if (r.IsZero) Assert.True(r.Denominator.IsOne);
    }

    [Fact]
    public void FieldLaws_RandomElements()
    {
        var rng = new Random(41);
        for (int t = 0; t < 40; t++)
        {
            var a = RandomFunction(rng, 8);
            var b = RandomFunction(rng, 8);
            var c = RandomFunction(rng, 8);
            foreach (var r in new[] { a + b, a - b, a * b, a + c * b }) AssertCanonical(r);
            Assert.Equal(a + b, b + a);
            Assert.Equal(a * b, b * a);
            Assert.Equal((a + b) + c, a + (b + c));
            Assert.Equal((a * b) * c, a * (b * c));
            Assert.Equal(a * (b + c), a * b + a * c);
            Assert.True((a - a).IsZero);
            if (!b.IsZero)
            {
                AssertCanonical(a / b);
                Assert.Equal(a, a / b * b);
                Assert.True((b * b.Inverse()).IsOne);
            }
        }
    }

    [Fact]
    public void Create_CancelsAndNormalises()
    {
        var x = PolynomialModP.X(F);
        var r = RationalFunctionModP.Create((x - 1) * (x + 2) * 3, (x - 1) * (x + 5) * 7);
        Assert.Equal((x + 2) * 3 * (long)F.Inverse(7), r.Numerator);
        Assert.Equal(x + 5, r.Denominator);
        Assert.Throws<DivideByZeroException>(() => RationalFunctionModP.Create(x, PolynomialModP.Zero(F)));
        Assert.True(RationalFunctionModP.Create(PolynomialModP.Zero(F), x).Denominator.IsOne);
    }

    [Fact]
    public void Pow_NegativeAndPositive()
    {
        var rng = new Random(42);
        var a = RandomFunction(rng, 6);
        while (a.IsZero) a = RandomFunction(rng, 6);
        Assert.Equal(a * a * a, a.Pow(3));
        Assert.Equal((a * a).Inverse(), a.Pow(-2));
        Assert.True(a.Pow(0).IsOne);
        AssertCanonical(a.Pow(-3));
        Assert.Throws<DivideByZeroException>(() => RationalFunctionModP.Zero(F).Pow(-1));
    }

    [Fact]
    public void EvaluateAndCompose_AgreeWithPointwiseValues()
    {
        var rng = new Random(43);
        for (int t = 0; t < 10; t++)
        {
            var a = RandomFunction(rng, 6);
            var b = RandomFunction(rng, 5);
            var c = a.Compose(b);
            AssertCanonical(c);
            for (int k = 0; k < 5; k++)
            {
                ulong x = rng.NextResidue(F.Modulus);
                if (b.Denominator.Evaluate(x) == 0) continue;
                ulong bx = b.Evaluate(x);
                if (a.Denominator.Evaluate(bx) == 0 || c.Denominator.Evaluate(x) == 0) continue;
                Assert.Equal(a.Evaluate(bx), c.Evaluate(x));
            }
        }
        var xr = RationalFunctionModP.X(F);
        var inv = 1 / xr;
        Assert.Equal(xr, inv.Compose(inv));                  // 1/(1/x) = x
        Assert.Throws<DivideByZeroException>(() => inv.Evaluate(0));
    }

    [Fact]
    public void Degrees_AndScalars()
    {
        var x = RationalFunctionModP.X(F);
        var r = (x * x + 1) / (x - 3) + 2;
        Assert.Equal(2, r.NumeratorDegree);
        Assert.Equal(1, r.DenominatorDegree);
        Assert.Equal(2, r.Degree);
        Assert.Equal(r * 5, 5 * r);
        Assert.Equal(r / 5 * 5, r);
        Assert.Equal(r - 2 + 2, r);
        Assert.Throws<DivideByZeroException>(() => r / 1000003);
        Assert.Throws<DivideByZeroException>(() => r / RationalFunctionModP.Zero(F));
        Assert.Equal("(x^2 + 2*x + 999998)/(x + 1000000)", ((x * x + 1) / (x - 3) + 2).ToString());
    }

    [Fact]
    public void HietarintaVialletLine_DegreesMatchTheKnownSequence()
    {
        // x_{n+1} = x_n + 1/x_n² − x_{n−1} on the line x_0 = a + b t, x_1 = c + d t: numerator degrees
        // 3, 9, 25, 67, 177, 465 for n = 2..7, the project's W3 reference values (FLINT, Singular and PARI
        // runs), d_{n+1} = 3 d_n − d_{n−1} + 1, i.e. growth (3 + √5)/2 as found by Hietarinta and Viallet,
        // "Singularity confinement and chaos in discrete systems", Phys. Rev. Lett. 81 (1998) 325.
        var f = new PrimeField(2147483647);
        var x0 = RationalFunctionModP.FromPolynomial(PolynomialModP.FromCoefficients(f, 123456789, 987654321));
        var x1 = RationalFunctionModP.FromPolynomial(PolynomialModP.FromCoefficients(f, 192837465, 564738291));
        int[] expected = [3, 9, 25, 67, 177, 465];
        foreach (int d in expected)
        {
            var x2 = x1 + x1.Pow(-2) - x0;
            (x0, x1) = (x1, x2);
            Assert.Equal(d, x1.NumeratorDegree);
            Assert.Equal(d - 1, x1.DenominatorDegree);
        }
    }
}
