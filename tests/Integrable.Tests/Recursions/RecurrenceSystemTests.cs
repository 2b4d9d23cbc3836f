using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Recursions;

namespace Integrable.Tests.Recursions;

public class RecurrenceSystemTests
{
    [Fact]
    public void PlaneMapForm_AgreesWithScalarRecurrence()
    {
        // The Lyness map as a system: (x, y) -> (y, (y + 1)/x), period 5 (Lyness 1942).
        var s = RecurrenceSystem.Parse("x_{n+1} = y_n; y_{n+1} = (y_n + 1)/x_n");
        Assert.Equal(2, s.Dimension);
        var orbit = s.Iterate(RationalField.Instance, [new Rational(2), new Rational(3)], 5);
        Assert.Equal(orbit[0], orbit[5]);
        var scalar = Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1").Iterate(RationalField.Instance, [new Rational(2), new Rational(3)], 5);
        for (int j = 0; j <= 5; j++) Assert.Equal(scalar[j], orbit[j][0]);
    }

    [Fact]
    public void TriangularSystem_UsesNewTermOfEarlierUnknown()
    {
        // Two-step form: x_{n+1} = y_n + x_n, y_{n+1} = x_{n+1} y_n.
        var s = RecurrenceSystem.Parse("y_{n+1} = x_{n+1} y_n, x_{n+1} = y_n + x_n");
        var orbit = s.Iterate(RationalField.Instance, [new Rational(2), new Rational(5)], 2);
        // order of unknowns: y first (first appearance), then x; state (y, x).
        Assert.Equal(new[] { "y", "x" }, s.Unknowns.ToArray());
        var (y0, x0) = (new Rational(2), new Rational(5));
        var x1 = y0 + x0; var y1 = x1 * y0;
        Assert.Equal(new[] { y1, x1 }, orbit[1]);
    }

    [Fact]
    public void Parameters_AndHigherOrderUnknowns()
    {
        var s = RecurrenceSystem.Parse("u_{n+2} = u_{n+1} + a v_n, v_{n+1} = u_n");
        Assert.Equal(3, s.Dimension);
        Assert.Equal(new[] { "a" }, s.Parameters.ToArray());
        var orbit = s.Iterate(RationalField.Instance, [1, 2, 3], 1, [new Rational(10)]);
        // state (u_0, u_1, v_0) = (1, 2, 3) -> (u_1, u_2, v_1) = (2, 2 + 30, 1).
        Assert.Equal(new Rational[] { 2, 32, 1 }, orbit[1]);
    }

    [Theory]
    [InlineData("x_{n+1} = y_{n+1} + x_n; y_{n+1} = x_{n+1} + y_n", "not triangular")]
    [InlineData("x_{n+1} = x_n + y_n; y_{n+1} = y_n; x_{n+1} = 2 x_n", "one equation per unknown")]
    [InlineData("x_{n+1} = y_n; y_n = 2", "one shift only")]
    public void BadSystems_TypedError(string text, string fragment)
    {
        var e = Assert.Throws<EquationException>(() => RecurrenceSystem.Parse(text));
        Assert.Contains(fragment, e.Reason);
    }

    [Fact]
    public void SingularStep_Reported()
    {
        var s = RecurrenceSystem.Parse("x_{n+1} = y_n; y_{n+1} = (y_n + 1)/x_n");
        Assert.Throws<SingularStepException>(() => s.Iterate(RationalField.Instance, [Rational.Zero, Rational.One], 3));
    }
}
