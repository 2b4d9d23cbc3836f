using Integrable.Analyses;

namespace Integrable.Tests.Analyses;

public class GrowthFitTests
{
    [Fact]
    public void FromDegrees_HietarintaViallet_EntropyLogGoldenSquare()
    {
        // Degrees of the Hietarinta–Viallet map on a line: 1, 1, 3, 9, 25, 67, … with
        // d_{n+1} = 3 d_n − d_{n−1} + 1 (Hietarinta–Viallet, PRL 81 (1998) 325; reproduced by FLINT,
        // Singular, PARI in the performance anchors); entropy log((3 + √5)/2).
        long[] d = [1, 1, 3, 9, 25, 67, 177, 465, 1219, 3193, 8361, 21891];
        var fit = GrowthFit.FromDegrees(d);
        Assert.True(fit.IsFound);
        Assert.Equal(GrowthClass.Exponential, fit.Class);
        Assert.Equal("x^2 - 3*x + 1", fit.MinimalPolynomial);
        Assert.Equal(Math.Log((3 + Math.Sqrt(5)) / 2), fit.Entropy, 12);
        Assert.True(fit.TermsConfirmed >= 5);
    }

    [Theory]
    [InlineData(new long[] { 1, 1, 1, 1, 1, 1, 1, 1, 1, 1 }, GrowthClass.Bounded, 0)]
    [InlineData(new long[] { 1, 2, 1, 2, 1, 2, 1, 2, 1, 2, 1 }, GrowthClass.Bounded, 0)]
    [InlineData(new long[] { 1, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12 }, GrowthClass.Linear, 1)]
    [InlineData(new long[] { 1, 1, 2, 4, 7, 11, 16, 22, 29, 37, 46, 56, 67 }, GrowthClass.Quadratic, 2)]
    [InlineData(new long[] { 0, 1, 8, 27, 64, 125, 216, 343, 512, 729, 1000, 1331, 1728, 2197 }, GrowthClass.Polynomial, 3)]
    public void FromDegrees_PolynomialClasses(long[] degrees, GrowthClass expected, int degree)
    {
        // Kronecker: an integer polynomial with constant term ±1 and all roots on the unit circle is a
        // product of cyclotomic polynomials (common knowledge); growth n^(multiplicity − 1).
        var fit = GrowthFit.FromDegrees(degrees);
        Assert.True(fit.IsFound, fit.Explanation);
        Assert.Equal(expected, fit.Class);
        Assert.Equal(degree, fit.PolynomialDegree);
        Assert.Equal(0.0, fit.Entropy);
    }

    [Fact]
    public void FromDegrees_PeriodSixWithQuadratic_UsesAllCyclotomicFactors()
    {
        // d_n = n^2 + (n mod 6): denominator (1 − x)^3 Φ_2 Φ_3 Φ_6-type factors; quadratic.
        var d = Enumerable.Range(0, 30).Select(n => (long)n * n + n % 6).ToArray();
        var fit = GrowthFit.FromDegrees(d);
        Assert.Equal(GrowthClass.Quadratic, fit.Class);
    }

    [Fact]
    public void FromDegrees_Fibonacci_GoldenRatio()
    {
        long[] d = [1, 1, 2, 3, 5, 8, 13, 21, 34, 55, 89, 144];
        var fit = GrowthFit.FromDegrees(d);
        Assert.Equal("x^2 - x - 1", fit.MinimalPolynomial);
        Assert.Equal((1 + Math.Sqrt(5)) / 2, fit.DominantRoot, 12);
    }

    [Fact]
    public void FromDegrees_ProductOfTwoQuadratics_PicksDominantFactor()
    {
        // d_n = F_{2n} + L_n-like mix: roots of x^2 − 3x + 1 and x^2 − x − 1; λ = (3 + √5)/2 dominates.
        var a = new long[16]; var b = new long[16];
        a[0] = 1; a[1] = 3; b[0] = 2; b[1] = 1;
        for (int i = 2; i < 16; i++) { a[i] = 3 * a[i - 1] - a[i - 2]; b[i] = b[i - 1] + b[i - 2]; }
        var fit = GrowthFit.FromDegrees(a.Zip(b, (x, y) => x + y).ToArray());
        Assert.Equal("x^2 - 3*x + 1", fit.MinimalPolynomial);
    }

    [Fact]
    public void FromDegrees_TooFewTerms_NotFound()
    {
        var fit = GrowthFit.FromDegrees([1, 1, 3, 9, 25]);
        Assert.False(fit.IsFound);
        Assert.Null(fit.Class);
        Assert.True(double.IsNaN(fit.Entropy));
        Assert.Throws<ArgumentException>(() => GrowthFit.FromDegrees([1, -1]));
    }
}
