using Integrable.Integrals;
using Integrable.RationalFunctions;
using Integrable.Recursions;

namespace Integrable.Tests.Integrals;

public class IntegralMapTests
{
    [Fact]
    public void FromRecurrence_Lyness_ComponentsAndJacobian()
    {
        // (x, y) ↦ (y, (a + y)/x) has Jacobian determinant (a + y)/x² (direct computation, common knowledge).
        var map = IntegralMap.FromRecurrence(Recurrence.Parse("x_{n+1} x_{n-1} = a + x_n"));
        Assert.Equal(["x_n", "x_{n+1}"], map.StateVariables.ToArray());
        Assert.Equal(["a"], map.Parameters.ToArray());
        Assert.Equal(map.Field.Parse("(a + x_{n+1})/x_n"), map.Components(0)[1]);
        Assert.Equal(map.Field.Parse("(a + x_{n+1})/x_n^2"), map.JacobianDeterminant());
        Assert.True(map.IsAutonomous);
    }

    [Fact]
    public void FromComponents_ThirdOrder_JacobianOfRotation()
    {
        // The cyclic shift (x, y, z) ↦ (y, z, x) has determinant 1 (common knowledge).
        var field = new RationalFunctionField("x", "y", "z");
        var map = IntegralMap.FromComponents(field, [field.Variable(1), field.Variable(2), field.Variable(0)]);
        Assert.Equal(field.One, map.JacobianDeterminant());
    }

    [Fact]
    public void Periodic_PhasesOfDifferentSizes_Throws()
    {
        var field = new RationalFunctionField("x", "y");
        Assert.Throws<ArgumentException>(() => IntegralMap.Periodic(field, [[field.Variable(1), field.Variable(0)], [field.Variable(1)]]));
    }

    [Fact]
    public void FromComponents_OtherField_Throws()
    {
        var field = new RationalFunctionField("x", "y");
        var other = new RationalFunctionField("u", "v");
        Assert.Throws<ArgumentException>(() => IntegralMap.FromComponents(field, [other.Variable(1), other.Variable(0)]));
    }

    [Fact]
    public void FromRecurrence_PhaseValues_PeriodTwoAndNewParameter()
    {
        var map = IntegralMap.FromRecurrence(Recurrence.Parse("x_{n+1} + x_{n-1} = b/x_n"),
            [new Dictionary<string, string> { ["b"] = "1" }, new Dictionary<string, string> { ["b"] = "c" }]);
        Assert.Equal(2, map.Period);
        Assert.Equal(["c"], map.Parameters.ToArray());
        Assert.NotEqual(map.Components(0)[1], map.Components(1)[1]);
    }
}

public class IntegralMapFromRationalMapTests
{
    [Fact]
    public void Find_QrtMapFromTheLibrary_RecoversItsBiquadraticInvariant()
    {
        // QRT from its two matrices (Quispel, Roberts, Thompson, Phys. Lett. A 126 (1988) 419); with these
        // matrices the map is McMillan's, with invariant x²y² + x² + y² − 2mxy (McMillan 1971).
        var qrt = Integrable.Recursions.QrtMap.Symmetric("[[1, 0, 1], [0, -2 m, 0], [1, 0, 0]]", "[[0,0,0],[0,0,0],[0,0,1]]");
        var report = FirstIntegrals.Find(qrt.Map, new IntegralOptions { Degree = 4 });
        var found = Assert.Single(report.PolynomialIntegrals);
        var field = report.Map.Field;
        // The found integral is a constant multiple of the QRT invariant.
        var ratio = found.Value / field.Embed(qrt.Invariant);
        Assert.True(ratio.IsConstant, $"{found.Value} is not a multiple of {qrt.Invariant}");
        Assert.Equal(["x", "y"], report.Map.StateVariables.ToArray());
        Assert.Equal(["m"], report.Map.Parameters.ToArray());
    }
}
