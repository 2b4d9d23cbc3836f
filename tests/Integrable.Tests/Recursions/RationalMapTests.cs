using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.RationalFunctions;
using Integrable.Recursions;
using Integrable.Text;

namespace Integrable.Tests.Recursions;

public class RationalMapTests
{
    private static readonly RationalMap Lyness = RationalMap.Parse("(x, y) -> (y, (y + 1)/x)");

    [Fact]
    public void Parse_PlaneText_RoundTripsAndFindsParameters()
    {
        var m = RationalMap.Parse("(x, y) ↦ (y, (y + a)/x)");
        Assert.Equal(["x", "y"], m.StateVariables.ToArray());
        Assert.Equal(["a"], m.Parameters.ToArray());
        Assert.True(m.IsPlane);
        Assert.Equal(m, RationalMap.Parse(m.ToString()));
        Assert.Equal("(x, y) \\mapsto \\left(y, \\frac{y + a}{x}\\right)", m.ToLatex());
    }

    [Fact]
    public void Parse_MalformedText_ThrowsWithPosition()
    {
        var e = Assert.Throws<ExpressionParseException>(() => RationalMap.Parse("(x, y) (y, x)"));
        Assert.Contains("arrow", e.Reason);
        var count = Assert.Throws<ExpressionParseException>(() => RationalMap.Parse("(x, y) -> (y)"));
        Assert.Contains("2 components", count.Reason);
        var name = Assert.Throws<ExpressionParseException>(() => RationalMap.Parse("(x, x + 1) -> (y, x)"));
        Assert.Equal(4, name.Position);
        var inner = Assert.Throws<ExpressionParseException>(() => RationalMap.Parse("(x, y) -> (y, (x + )"));
        Assert.True(inner.Position > 10);
    }

    [Fact]
    public void Create_BadArguments_Throw()
    {
        var f = new RationalFunctionField("x", "y");
        Assert.Throws<ArgumentException>(() => RationalMap.Create(["x", "x"], [f.Variable("x"), f.Variable("y")]));
        Assert.Throws<ArgumentException>(() => RationalMap.Create(["x", "y"], [f.Variable("x")]));
        Assert.Throws<ArgumentException>(() => RationalMap.Create([], []));
    }

    [Fact]
    public void FromRecurrence_SecondOrder_IsPlaneMapWithParameters()
    {
        // (x, y) -> (y, (y + a)/x): the Lyness map with parameter (common knowledge).
        var r = Recurrence.Parse("x_{n+1} x_{n-1} = x_n + a");
        var m = RationalMap.FromRecurrence(r);
        Assert.Equal(RationalMap.Parse("(x, y) -> (y, (y + a)/x)"), m);
        var somos = RationalMap.FromRecurrence(Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2"));
        Assert.Equal(["x_0", "x_1", "x_2", "x_3"], somos.StateVariables.ToArray());
        // Somos-4 from 1,1,1,1 gives 2, 3, 7, 23 (OEIS A006720).
        var orbit = somos.Orbit(RationalField.Instance, [Rational.One, Rational.One, Rational.One, Rational.One], 4);
        Assert.Equal([new Rational(2), new Rational(3), new Rational(7), new Rational(23)], orbit[4]);
        Assert.Throws<ArgumentException>(() => RationalMap.FromRecurrence(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + n")));
    }

    [Fact]
    public void JacobianDeterminant_LynessMap_IsHandComputed()
    {
        // By hand: J = [[0, 1], [-(1+y)/x^2, 1/x]], det = (1 + y)/x^2.
        var det = Lyness.JacobianDeterminant();
        Assert.Equal(Lyness.Field.Parse("(1 + y)/x^2"), det);
    }

    [Fact]
    public void Power_LynessMap_HasPeriodFive()
    {
        // x_{n+1} x_{n-1} = x_n + 1 has period 5 (Lyness 1942).
        for (int n = 1; n < 5; n++) Assert.False(Lyness.Power(n).IsIdentity);
        Assert.True(Lyness.Power(5).IsIdentity);
        Assert.True(Lyness.Compose(Lyness).Compose(Lyness).Compose(Lyness).Compose(Lyness).IsIdentity);
        // With a general parameter the map is not periodic of period 5 (Lyness 1942: only a = 1).
        Assert.False(RationalMap.Parse("(x, y) -> (y, (y + a)/x)").Power(5).IsIdentity);
    }

    [Fact]
    public void Invert_LynessMap_IsLinearAndVerified()
    {
        // Inverse by hand: x_{n-1} = (x_n + 1)/x_{n+1}, i.e. (x, y) -> ((x + 1)/y, x).
        var inv = Lyness.Invert();
        Assert.Equal(RationalMap.Parse("(x, y) -> ((x + 1)/y, x)"), inv.Inverse);
        Assert.Equal(InversionMethod.Linear, inv.Method);
        Assert.Contains("ψ∘φ = id", inv.Verification);
        Assert.True(Lyness.Power(-1).Compose(Lyness).IsIdentity);
        Assert.Equal(Lyness.Power(4), Lyness.Power(-1));
    }

    [Fact]
    public void Invert_NoLinearEquation_UsesResultantAndVerifies()
    {
        // Built by hand as L∘T∘L with T(x, y) = (x + y^2, y) and L(x, y) = (x + y, x - y): birational,
        // yet each component is quadratic in x and in y.
        var phi = RationalMap.Parse("(x, y) -> (2 x + (x - y)^2, 2 y + (x - y)^2)");
        var inv = phi.Invert();
        Assert.Equal(InversionMethod.Resultant, inv.Method);
        Assert.True(phi.Compose(inv.Inverse).IsIdentity);
        Assert.True(inv.Inverse.Compose(phi).IsIdentity);
    }

    [Fact]
    public void Invert_ThreeVariables_SolvesTriangularSystem()
    {
        // Somos-4 map (x0..x3) -> (x1, x2, x3, (x3 x1 + x2^2)/x0): inverse x0 = (x3 x1 + x2^2)/x4 (by hand).
        var m = RationalMap.FromRecurrence(Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2"));
        var inv = m.Invert().Inverse;
        Assert.Equal(RationalMap.Parse("(x_0, x_1, x_2, x_3) -> ((x_2 x_0 + x_1^2)/x_3, x_0, x_1, x_2)"), inv);
    }

    [Fact]
    public void Invert_NotBirational_ThrowsTyped()
    {
        var square = Assert.Throws<MapInversionException>(() => RationalMap.Parse("(x, y) -> (x^2, y)").Invert());
        Assert.Equal(InversionFailure.HigherDegree, square.Failure);
        Assert.Contains("x", square.Reason);
        var flat = Assert.Throws<MapInversionException>(() => RationalMap.Parse("(x, y) -> (x + y, (x + y)^2)").Invert());
        Assert.Equal(InversionFailure.NotDominant, flat.Failure);
        var cubic = Assert.Throws<MapInversionException>(() => RationalMap.Parse("(x, y) -> (x^3 + y, y^2 + x)").Invert());
        Assert.Equal(InversionFailure.HigherDegree, cubic.Failure);
    }

    [Fact]
    public void Apply_RationalAndModular_AgreeWithHandValues()
    {
        var q = Lyness.Apply<Rational>(RationalField.Instance, [new Rational(2), new Rational(3)]);
        Assert.Equal([new Rational(3), new Rational(2)], q);
        var f = new PrimeField(7);
        var p = Lyness.Apply<ulong>(f, [2UL, 3UL]);
        Assert.Equal([3UL, 2UL], p);
        var withParameter = RationalMap.Parse("(x, y) -> (y, (y + a)/x)");
        var r = withParameter.Apply<Rational>(RationalField.Instance, [new Rational(2), new Rational(3)], [new Rational(5)]);
        Assert.Equal(new Rational(4), r[1]);
        Assert.Throws<ArgumentException>(() => withParameter.Apply<Rational>(RationalField.Instance, [Rational.One, Rational.One]));
        Assert.Throws<PoleException>(() => Lyness.Apply<Rational>(RationalField.Instance, [Rational.Zero, Rational.One]));
    }

    [Fact]
    public void Orbit_LynessMap_ReturnsAfterFiveSteps()
    {
        // Period 5 (Lyness 1942): 2, 3, 2, 1, 1, 2, 3.
        var orbit = Lyness.Orbit(RationalField.Instance, [new Rational(2), new Rational(3)], 5);
        Assert.Equal(orbit[0], orbit[5]);
        Assert.Equal([new Rational(2), new Rational(1)], orbit[2]);
        // (1, -1) -> (-1, 0) -> (0, -1) -> (-1, 0/0): the third step divides by zero.
        var e = Assert.Throws<SingularStepException>(() => Lyness.Orbit(RationalField.Instance, [new Rational(1), new Rational(-1)], 5));
        Assert.Equal(3, e.Index);
    }

    [Fact]
    public void ToRecurrenceSystem_IteratesLikeOrbit()
    {
        var m = RationalMap.Parse("(x, y) -> (y, (y + a)/x)");
        var s = m.ToRecurrenceSystem();
        Assert.Equal(["x", "y"], s.Unknowns.ToArray());
        Assert.Equal(["a"], s.Parameters.ToArray());
        var start = new[] { new Rational(2), new Rational(7) };
        var a = new[] { new Rational(3) };
        var viaSystem = s.Iterate(RationalField.Instance, start, 6, a);
        var viaMap = m.Orbit(RationalField.Instance, start, 6, a);
        for (int i = 0; i <= 6; i++) Assert.Equal(viaMap[i], viaSystem[i]);
        Assert.Throws<InvalidOperationException>(() => RationalMap.Parse("(x, n) -> (n, x)").ToRecurrenceSystem());
    }

    [Fact]
    public void ToRecurrenceSystem_PeriodicityAnalysisFindsFive()
    {
        // Period 5 of the Lyness map (Lyness 1942), found by the existing analysis on the map's system.
        var report = Integrable.Analyses.Periodicity.Find(Lyness.ToRecurrenceSystem(), 8);
        Assert.Equal(5, report.Period);
    }

    [Fact]
    public void ToProgram_EvaluatesInDoubles()
    {
        var p = Lyness.ToProgram();
        Assert.Equal(2, p.InputCount);
        Assert.Equal(2, p.Outputs.Length);
        var output = new double[2];
        p.EvaluateAll(DoubleField.Instance, [2.0, 3.0], output);
        Assert.Equal([3.0, 2.0], output);
    }

    [Fact]
    public void Compose_DifferentStateVariables_Throws()
    {
        var other = RationalMap.Parse("(u, v) -> (v, u)");
        Assert.Throws<ArgumentException>(() => Lyness.Compose(other));
    }

    [Fact]
    public void DensityRatio_LynessMap_PreservesDxDyOverXy()
    {
        // (x,y) -> (y, (y+a)/x) preserves dx dy/(x y): by hand, (x/(y(y+a)))·((y+a)/x^2) = 1/(x y).
        var m = RationalMap.Parse("(x, y) -> (y, (y + a)/x)");
        Assert.True(m.DensityRatio(m.Field.Parse("1/(x*y)")).IsOne);
        Assert.False(m.DensityRatio(m.Field.One).IsOne);
    }
}
