using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Tests.Series;

public class SeriesEquationsTests
{
    private static readonly PowerSeriesRing<Rational> Q = PowerSeriesRing.Rationals;

    [Fact]
    public void SolveNewton_Catalan_GivesCatalanNumbers()
    {
        // C = 1 + x C² generates the Catalan numbers (OEIS A000108).
        var x = Q.X;
        var c = SeriesEquations.SolveNewton(Q, y => 1 + x * y * y, 30);
        Assert.Equal(30, c.Precision);
        for (int k = 0; k < 30; k++) Assert.Equal(new Rational(SeriesTestData.Catalan(k)), c[k]);
        var withDerivative = SeriesEquations.SolveNewton(Q, y => 1 + x * y * y, 30, derivative: y => 2 * x * y);
        Assert.Equal(c, withDerivative);
    }

    [Fact]
    public void Iterate_Catalan_ConvergesXAdically()
    {
        var x = Q.X;
        var r = SeriesEquations.Iterate(Q, y => 1 + x * y * y, 30);
        Assert.True(r.Converged, r.Explanation);
        for (int k = 0; k < 30; k++) Assert.Equal(new Rational(SeriesTestData.Catalan(k)), r.Solution[k]);
        for (int i = 1; i < r.ChangeValuations.Count; i++) Assert.True(r.ChangeValuations[i] > r.ChangeValuations[i - 1]);
        Assert.True(r.Steps <= 32);
    }

    [Fact]
    public void Iterate_NonContraction_ReportsWhy_NewtonSolves()
    {
        // y = 2y + x has the solution y = −x, but ∂F/∂y = 2 makes plain iteration diverge x-adically.
        var x = Q.X;
        var r = SeriesEquations.Iterate(Q, y => 2 * y + x, 10);
        Assert.False(r.Converged);
        Assert.Contains("contraction", r.Explanation);
        Assert.Throws<InvalidOperationException>(() => r.Solution);
        var y = SeriesEquations.SolveNewton(Q, y => 2 * y + x, 10, initial: Q.Zero);
        Assert.Equal(-x + Q.O(10), y);
    }

    [Fact]
    public void SolveNewton_SingularJacobian_Throws()
    {
        var x = Q.X;
        // y = y² + x … at y(0) = 0 has 1 − ∂F/∂y = 1, fine; y = (y² + 1)/2 at y(0)=1 has ∂F/∂y = 1: singular.
        Assert.Throws<ArgumentException>(() => SeriesEquations.SolveNewton(Q, y => (y * y + 1 + x) / 2, 8, initial: Q.One));
        Assert.Throws<ArgumentException>(() => SeriesEquations.SolveNewton(Q, y => y * y + x, 8));   // y(0) not determined
        Assert.Throws<ArgumentException>(() => SeriesEquations.SolveNewton(Q, y => 1 + x * y, 8, initial: 2 + Q.O(1)));
    }

    [Fact]
    public void Iterate_IntegralEquation_GivesExp_NewtonRefuses()
    {
        // y = 1 + ∫ y has the solution exp(x) (common knowledge); the integral raises valuations, so plain
        // iteration contracts, while ∂F/∂y is an operator, not a series, so Newton's step is not valid.
        var r = SeriesEquations.Iterate(Q, y => 1 + y.Integral(), 25);
        Assert.True(r.Converged, r.Explanation);
        Assert.Equal((Q.X + Q.O(25)).Exp(), r.Solution);
        Assert.Throws<InvalidOperationException>(() => SeriesEquations.SolveNewton(Q, y => 1 + y.Integral(), 25));
    }

    [Fact]
    public void SolveNewton_Modular_AgreesWithRational()
    {
        var field = new PrimeField(1_000_000_007);
        var zp = PowerSeriesRing.Modular(field);
        var x = zp.X;
        var c = SeriesEquations.SolveNewton(zp, y => 1 + x * y * y, 200);
        var cq = SeriesEquations.SolveNewton(Q, y => 1 + Q.X * y * y, 200, derivative: y => 2 * Q.X * y);
        Assert.Equal(PowerSeriesRing.Reduce(cq, zp), c);
        Assert.Equal(new Rational(SeriesTestData.Catalan(199)), cq[199]);
    }
}
