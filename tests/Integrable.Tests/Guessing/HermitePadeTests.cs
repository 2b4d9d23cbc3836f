using Integrable.Guessing;
using Integrable.Numbers;
using Integrable.Series;
using Integrable.Tests.Series;

namespace Integrable.Tests.Guessing;

public class HermitePadeTests
{
    private static readonly PowerSeriesRing<Rational> Q = PowerSeriesRing.Rationals;

    [Fact]
    public void RationalFunction_FibonacciShifted_RecoversOneOverOneMinusXMinusXSquared()
    {
        // 1/(1 − x − x²) = Σ F_{n+1} x^n (OEIS A000045, generating function).
        var x = Q.X;
        var s = (1 - x - x * x + Q.O(30)).Inverse();
        var g = PadeApproximation.RationalFunction(s);
        Assert.True(g.IsFound, g.Explanation);
        Assert.Equal(Q.One, g.Value.Numerator);
        Assert.Equal(1 - x - x * x, g.Value.Denominator);
        Assert.Equal(s, g.Value.Expand(30));
        var pade = PadeApproximation.Pade(s, 0, 2);
        Assert.True(pade.IsFound, pade.Explanation);
        Assert.Equal(1 - x - x * x, pade.Value.Denominator);
        Assert.Equal(Q.One, pade.Value.Numerator);
        Assert.False(PadeApproximation.Pade(s, 0, 1).IsFound);
    }

    [Fact]
    public void AlgebraicEquation_Catalan_FindsXCSquaredMinusCPlusOne()
    {
        // C = 1 + x C², i.e. x C² − C + 1 = 0 (OEIS A000108); data from C_n = binom(2n, n)/(n + 1).
        var c = Q.FromFunction(n => new Rational(SeriesTestData.Catalan(n)), 30);
        var g = HermitePade.AlgebraicEquation(c, 3, 3);
        Assert.True(g.IsFound, g.Explanation);
        var p = g.Value.Polynomials;
        Assert.Equal(3, p.Count);
        Assert.Equal(Q.One, p[0]);
        Assert.Equal(-Q.One, p[1]);
        Assert.Equal(Q.X, p[2]);
        Assert.Equal(1, g.Value.NullspaceDimension);
        Assert.Equal(30, g.TermsUsed + g.TermsConfirmed);
        Assert.True(g.TermsConfirmed >= 20);
        Assert.Equal("(1) + (-1)*y + (x)*y^2 = 0", g.Value.ToString());
    }

    [Fact]
    public void AlgebraicEquation_Motzkin_FindsEquation()
    {
        // Motzkin numbers, OEIS A001006: M = 1 + x M + x² M², i.e. x² M² + (x − 1) M + 1 = 0;
        // data from the formula M_n = Σ_k binom(n, 2k) C_k (OEIS A001006).
        var m = Q.FromFunction(n => new Rational(SeriesTestData.Motzkin(n)), 40);
        var g = HermitePade.AlgebraicEquation(m, 2, 3);
        Assert.True(g.IsFound, g.Explanation);
        var x = Q.X;
        Assert.Equal(Q.One, g.Value.Polynomials[0]);
        Assert.Equal(x - 1, g.Value.Polynomials[1]);
        Assert.Equal(x * x, g.Value.Polynomials[2]);
    }

    [Fact]
    public void AlgebraicEquation_CatalanModP_AgreesWithQ()
    {
        var zp = PowerSeriesRing.Modular(new PrimeField(10007));
        var c = SeriesEquations.SolveNewton(zp, y => 1 + zp.X * y * y, 25);
        var g = HermitePade.AlgebraicEquation(c, 2, 2);
        Assert.True(g.IsFound, g.Explanation);
        Assert.Equal(zp.Polynomial([10006UL]), g.Value.Polynomials[1]);   // −1 mod 10007
        Assert.Equal(zp.X, g.Value.Polynomials[2]);
    }

    [Fact]
    public void AlgebraicEquation_TooFewTerms_NotFound()
    {
        var c = Q.FromFunction(n => new Rational(SeriesTestData.Catalan(n)), 8);
        var g = HermitePade.AlgebraicEquation(c, 2, 2);
        Assert.False(g.IsFound);
    }

    [Fact]
    public void DifferentialEquation_Exp_FindsYPrimeEqualsY()
    {
        var e = (Q.X + Q.O(20)).Exp();
        var g = HermitePade.DifferentialEquation(e, 2, 1);
        Assert.True(g.IsFound, g.Explanation);
        Assert.Equal(Q.One, g.Value.Polynomials[0]);
        Assert.Equal(-Q.One, g.Value.Polynomials[1]);
    }

    [Fact]
    public void DifferentialEquation_Catalan_Inhomogeneous()
    {
        // C = (1 − sqrt(1 − 4x))/(2x) satisfies x(1 − 4x) C′ + (1 − 2x) C − 1 = 0 (from memory; verified below
        // against the series itself, and found with the inhomogeneous term).
        var c = Q.FromFunction(n => new Rational(SeriesTestData.Catalan(n)), 30);
        var x = Q.X;
        Assert.True((x * (1 - 4 * x) * c.Derivative() + (1 - 2 * x) * c - 1).IsZero);
        var g = HermitePade.DifferentialEquation(c, 1, 2, inhomogeneous: true);
        Assert.True(g.IsFound, g.Explanation);
        var p = g.Value.Polynomials;
        Assert.Equal(1 - 2 * x, p[0] * (p[0].Coefficients[0].Inverse()));
        Assert.Equal(x * (1 - 4 * x), p[1] * (p[0].Coefficients[0].Inverse()));
    }

    [Fact]
    public void Find_MismatchedArguments_Throw()
    {
        var s = Q.X + Q.O(5);
        Assert.Throws<ArgumentException>(() => HermitePade.Find([s, s], [1]));
        Assert.Throws<ArgumentException>(() => HermitePade.Find([Q.X, Q.One], [1, 1]));
    }
}
