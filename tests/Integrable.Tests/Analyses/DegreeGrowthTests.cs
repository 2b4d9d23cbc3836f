using System.Text.Json;
using Integrable.Analyses;
using Integrable.Numbers;
using Integrable.Recursions;

namespace Integrable.Tests.Analyses;

public class DegreeGrowthTests
{
    private const string HietarintaViallet = "x_{n+1} + x_{n-1} = x_n + 1/x_n^2";

    // Sizes are chosen so that each verdict needs well under 2 s of CPU (measured with the Growth
    // workload on an idle core); wall-clock checks are left to the benchmarks because the test runner
    // shares the cores.

    [Fact]
    public void Analyse_HietarintaViallet_ExponentialEntropyLogGoldenSquare()
    {
        // Hietarinta–Viallet, "Singularity confinement and chaos in discrete systems", PRL 81 (1998) 325:
        // degrees 1, 1, 3, 9, 25, 67, 177, 465, … satisfy d_{n+1} = 3 d_n − d_{n−1} + 1 (also the anchors'
        // FLINT/Singular/PARI runs), so the entropy is log((3 + √5)/2), λ a root of x² − 3x + 1.
        var r = DegreeGrowth.Analyse(Recurrence.Parse(HietarintaViallet), 9);
        long[] expected = [1, 1, 3, 9, 25, 67, 177, 465, 1219, 3193, 8361];
        Assert.Equal(expected, r.Degrees.ToArray());
        Assert.Equal(expected.Skip(2).Select(d => (int)d - 1), r.DenominatorDegrees.Skip(2));   // num/den = d/(d−1)
        Assert.Equal(GrowthClass.Exponential, r.Fit.Class);
        Assert.Equal("x^2 - 3*x + 1", r.Fit.MinimalPolynomial);
        Assert.Equal(Math.Log((3 + Math.Sqrt(5)) / 2), r.Fit.Entropy, 12);
        Assert.Equal(5, r.Fit.TermsConfirmed);
        Assert.True(r.ExactlyConfirmed >= 5);          // x_0 … x_4 also as exact reduced rational functions over Q
        Assert.Equal(BudgetLimit.None, r.Limit);
    }

    [Fact]
    public void Analyse_QrtMap_Quadratic()
    {
        // QRT maps have quadratic degree growth (Bellon–Viallet, Comm. Math. Phys. 204 (1999) 425); the
        // anchors' control map x_{n+1} = 1/x_n + 1/x_n^2 − x_{n−1} has degree 91 at n = 10 and 1561 at n = 40.
        var r = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} + x_{n-1} = 1/x_n + 1/x_n^2"), 39);
        Assert.Equal(91, r.Degrees[10]);
        Assert.Equal(1561, r.Degrees[40]);
        Assert.Equal(GrowthClass.Quadratic, r.Fit.Class);
        Assert.Equal(0.0, r.Fit.Entropy);
    }

    [Fact]
    public void Analyse_GeneralQrtWithSymbolicParameters_Quadratic()
    {
        // A symmetric QRT map with generic parameters (Quispel–Roberts–Thompson 1988): quadratic growth.
        var r = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} + x_{n-1} = (a x_n + b)/(x_n^2 - c)"), 20);
        Assert.Equal(GrowthClass.Quadratic, r.Fit.Class);
    }

    [Fact]
    public void Analyse_DiscretePainleveI_NonAutonomous_Quadratic()
    {
        // d-PI x_{n+1} + x_n + x_{n−1} = (a n + b)/x_n + c: integrable, quadratic growth
        // (Ramani–Grammaticos–Hietarinta, PRL 67 (1991) 1829; Bellon–Viallet 1999).
        var r = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} + x_n + x_{n-1} = (a n + b)/x_n + c"), 24);
        Assert.Equal(GrowthClass.Quadratic, r.Fit.Class);
    }

    [Fact]
    public void Analyse_Linearisable_Linear()
    {
        // x_n = coth u_n with u_{n+1} = 2u_n − u_{n−1} (coth subtraction formula, from memory): degree 2n − 1.
        var r = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} (2 x_n x_{n-1} - x_n^2 - 1) = (x_n^2 + 1) x_{n-1} - 2 x_n"), 16);
        Assert.Equal(GrowthClass.Linear, r.Fit.Class);
        Assert.Equal(33, r.Degrees[17]);
    }

    [Fact]
    public void Analyse_Lyness_Bounded_ExactlyConfirmed()
    {
        var r = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1"), 16);
        Assert.Equal(GrowthClass.Bounded, r.Fit.Class);
        Assert.True(r.ExactlyConfirmed >= 8);
    }

    [Fact]
    public void Analyse_Somos4_QuadraticConfirmedExactly()
    {
        // Somos-4 is integrable (elliptic), quadratic degree growth (Hone, "Elliptic curves and quadratic
        // recurrence sequences", Bull. LMS 37 (2005)); its first degrees are confirmed by exact iterates.
        var r = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2"), 24);
        Assert.Equal(GrowthClass.Quadratic, r.Fit.Class);
        Assert.True(r.ExactlyConfirmed >= 10);
    }

    [Fact]
    public void Analyse_System_UsesLargestDegree()
    {
        var r = DegreeGrowth.Analyse(RecurrenceSystem.Parse("x_{n+1} = y_n, y_{n+1} = 1/y_n + 1/y_n^2 - x_n"), 24);
        Assert.Equal(GrowthClass.Quadratic, r.Fit.Class);
    }

    [Fact]
    public void Analyse_Budgets_PartialReport()
    {
        var r = DegreeGrowth.Analyse(Recurrence.Parse(HietarintaViallet), 40,
            new GrowthOptions { Budget = AnalysisBudget.Default with { MaxDegree = 5_000 } });
        Assert.Equal(BudgetLimit.Degree, r.Limit);
        Assert.Equal(8361, r.Degrees[^1]);
        Assert.Equal(GrowthClass.Exponential, r.Fit.Class);   // still enough degrees for the verdict
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => DegreeGrowth.Analyse(Recurrence.Parse(HietarintaViallet), 5, cancellation: cts.Token));
    }

    [Fact]
    public void Report_Json_ContractFields()
    {
        var r = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} + x_{n-1} = 1/x_n + 1/x_n^2"), 20);
        var root = JsonDocument.Parse(r.ToJson()).RootElement;
        Assert.Equal(r.Degrees.ToArray(), root.GetProperty("degrees").EnumerateArray().Select(e => e.GetInt64()).ToArray());
        Assert.Equal("quadratic", root.GetProperty("class").GetString());
        Assert.Equal(0.0, root.GetProperty("entropy").GetDouble());
        Assert.Contains("/", root.GetProperty("generatingFunction").GetString());
        Assert.Contains("quadratic", r.ToString());
        Assert.Contains("quadratic", r.ToLatex());
    }

    [Fact]
    public void Analyse_BadArguments_Typed()
    {
        var rec = Recurrence.Parse(HietarintaViallet);
        Assert.Throws<ArgumentOutOfRangeException>(() => DegreeGrowth.Analyse(rec, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => DegreeGrowth.Analyse(rec, 3, new GrowthOptions { PrimeBits = 70 }));
        Assert.Throws<ArgumentException>(() => DegreeGrowth.Analyse(rec, 3, new GrowthOptions { ParameterValues = new Dictionary<string, Rational> { ["z"] = 1 } }));
    }
}
