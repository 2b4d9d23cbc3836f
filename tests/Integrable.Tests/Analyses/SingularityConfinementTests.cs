using System.Text.Json;
using Integrable.Analyses;
using Integrable.Numbers;
using Integrable.Recursions;
using Xunit.Abstractions;

namespace Integrable.Tests.Analyses;

public class SingularityConfinementTests(ITestOutputHelper output)
{
    private static string[] Pattern(ConfinementReport r, int i = 0) => r.Singularities[i].Pattern.Select(e => e.Symbol).ToArray();

    [Fact]
    public void Test_AutonomousDiscretePainleveI_Pattern0Inf2_0Confined()
    {
        // Grammaticos, Ramani, Papageorgiou, "Do integrable mappings have the Painlevé property?",
        // PRL 67 (1991) 1825: x_{n+1} + x_{n-1} = a/x_n + 1/x_n^2 has the confined pattern {0, ∞², 0}.
        var report = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} + x_{n-1} = a/x_n + 1/x_n^2"));
        output.WriteLine(report.ToString());
        Assert.True(report.IsConfined);
        Assert.Equal(["0", "∞^2", "0"], Pattern(report));
        Assert.True(report.Singularities[0].RecoversInitialData);
        Assert.Equal(4, report.Singularities[0].ConfinedAt);   // x_1 = ε, x_2 ~ ε^-2, x_3 ~ -ε, x_4 regular
    }

    [Fact]
    public void Test_HietarintaViallet_ConfinedDespiteChaos()
    {
        // Hietarinta, Viallet, "Singularity confinement and chaos in discrete systems", PRL 81 (1998) 325:
        // x_{n+1} + x_{n-1} = x_n + 1/x_n^2 has the confined pattern {0, ∞², ∞², 0}.
        var report = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2"));
        output.WriteLine(report.ToString());
        Assert.True(report.IsConfined);
        Assert.Equal(["0", "∞^2", "∞^2", "0"], Pattern(report));
    }

    [Fact]
    public void Test_NonAutonomousDiscretePainleveI_LinearConfinedQuadraticNot()
    {
        // d-PI x_{n+1} + x_n + x_{n-1} = z_n/x_n + c confines ({0, ∞, ∞, 0}) exactly when
        // z_{n+3} − z_{n+2} − z_{n+1} + z_n = 0, i.e. z_n = a n + b (+ a period-3 term)
        // (Ramani, Grammaticos, Hietarinta, "Discrete versions of the Painlevé equations", PRL 67 (1991) 1829).
        var linear = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} + x_n + x_{n-1} = (a n + b)/x_n + c"));
        output.WriteLine(linear.ToString());
        Assert.True(linear.IsConfined);
        Assert.Equal(["0", "∞", "∞", "0"], Pattern(linear));
        var quadratic = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} + x_n + x_{n-1} = (a n^2 + b)/x_n + c"));
        output.WriteLine(quadratic.ToString());
        Assert.False(quadratic.IsConfined);
    }

    [Fact]
    public void Test_UnconfinedMap_Reported()
    {
        // x_{n+1} = x_n + 1/x_n: from x_0 = ε every later term is ~ 1/ε (common knowledge).
        var report = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} = x_n + 1/x_n"));
        Assert.False(report.IsConfined);
        Assert.All(report.Singularities[0].Terms.Skip(1), e => Assert.True(e.IsInfinite));
    }

    [Fact]
    public void Test_Lyness_CyclicPattern()
    {
        // Lyness x_{n+1} x_{n-1} = x_n + 1 has period 5, so the orbit through x = ε returns to it:
        // x_1 = ε, x_2 = (1 + ε)/u, x_3 ~ 1/ε, x_4 ~ 1/ε, x_5 finite, x_6 = ε (common knowledge from the 5-cycle).
        var report = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1"));
        var p = report.Singularities[0];
        Assert.True(p.IsCyclic);
        Assert.Equal(5, p.CycleLength);
        Assert.Equal(["0", "f", "∞", "∞", "f"], p.Pattern.Select(e => e.Symbol).ToArray());
        Assert.True(report.IsConfined);
    }

    [Fact]
    public void Test_RationalRootsOnlyWhenParametersMakeThemRational()
    {
        // x_{n+1} + x_{n-1} = (a x_n + b)/(x_n^2 - c): singular at x_n = ±√c; with c = 4 they are ±2.
        var report = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} + x_{n-1} = (a x_n + b)/(x_n^2 - c)"),
            new ConfinementOptions { ParameterValues = new Dictionary<string, Rational> { ["c"] = 4 } });
        Assert.Contains(new Rational(2), report.Candidates);
        Assert.Contains(new Rational(-2), report.Candidates);
        Assert.True(report.IsConfined);
        Assert.Equal(2, report.Singularities.Length);
    }

    [Fact]
    public void Test_DetectsNonZeroSingularValue()
    {
        // x_{n+1} = x_{n-1} + 1/(x_n - 1): the denominator vanishes at x_n = 1.
        var report = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} = x_{n-1} + 1/(x_n - 1)"));
        Assert.Contains(Rational.One, report.Candidates);
        Assert.Contains(report.Singularities, s => s.SingularValue == Rational.One);
    }

    [Fact]
    public void Report_JsonAndLatex()
    {
        var report = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} + x_{n-1} = a/x_n + 1/x_n^2"),
            new ConfinementOptions { ParameterValues = new Dictionary<string, Rational> { ["a"] = 3 } });
        var root = JsonDocument.Parse(report.ToJson()).RootElement;
        Assert.True(root.GetProperty("confined").GetBoolean());
        var s = root.GetProperty("singularities")[0];
        Assert.Equal(["0", "∞^2", "0"], s.GetProperty("pattern").EnumerateArray().Select(e => e.GetString()!).ToArray());
        Assert.Equal("3", root.GetProperty("parameters").GetProperty("a").GetString());
        Assert.Contains("\\infty^{2}", report.ToLatex());
    }

    [Fact]
    public void Test_BadArguments_Typed()
    {
        var rec = Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2");
        Assert.Throws<ArgumentOutOfRangeException>(() => SingularityConfinement.Test(rec, new ConfinementOptions { Steps = 0 }));
        Assert.Throws<ArgumentException>(() => SingularityConfinement.Test(rec, new ConfinementOptions { ParameterValues = new Dictionary<string, Rational> { ["q"] = 1 } }));
        Assert.Throws<ArgumentNullException>(() => SingularityConfinement.Test(null!));
    }
}
