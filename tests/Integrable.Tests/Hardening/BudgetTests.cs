using Integrable.Analyses;
using Integrable.Clusters;
using Integrable.Recursions;
using Xunit;

namespace Integrable.Tests.Hardening;

/// <summary>Every analysis that can blow up stops at its limits (terms, degree, precision, time, seeds) with
/// a partial report that names the limit, or a typed exception — never by exhausting memory or running on.</summary>
public class BudgetTests
{
    private static readonly Recurrence Somos5 = Recurrence.Parse("x_{n+5} x_n = x_{n+4} x_{n+1} + x_{n+3} x_{n+2}");
    private static readonly Recurrence HietarintaViallet = Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2");
    private static readonly TimeSpan Short = TimeSpan.FromMilliseconds(300);

    private static AnalysisBudget Only(Func<AnalysisBudget, AnalysisBudget> set) => set(AnalysisBudget.Unlimited);

    [Fact]
    public void Laurent_TermLimit_PartialReportNamesTerms()
    {
        var r = LaurentPhenomenon.Check(Somos5, 40, new LaurentOptions { Budget = Only(b => b with { MaxTerms = 2_000 }) });
        Assert.Equal(BudgetLimit.Terms, r.Limit);
        Assert.False(r.IsComplete);
        Assert.True(r.IsLaurent); // what was computed is still a valid verdict
        Assert.InRange(r.Steps.Length, 1, 39);
        Assert.Contains("terms", r.LimitMessage);
    }

    [Fact]
    public void Laurent_TimeLimit_StopsPromptlyWithPartialReport()
    {
        var clock = System.Diagnostics.Stopwatch.StartNew();
        var r = LaurentPhenomenon.Check(Somos5, 60, new LaurentOptions { Budget = Only(b => b with { TimeLimit = Short }) });
        Assert.Equal(BudgetLimit.Time, r.Limit);
        Assert.True(clock.Elapsed < Short + TimeSpan.FromSeconds(2), $"took {clock.Elapsed}");
        Assert.False(r.IsComplete);
    }

    [Fact]
    public void Growth_DegreeLimit_KeepsTheDegreesFound()
    {
        var r = DegreeGrowth.Analyse(HietarintaViallet, 40, new GrowthOptions { Budget = Only(b => b with { MaxDegree = 5_000 }) });
        Assert.Equal(BudgetLimit.Degree, r.Limit);
        Assert.Equal([1, 1, 3, 9, 25, 67], r.Degrees.Take(6)); // Hietarinta–Viallet 1998, degree sequence
        Assert.True(r.Degrees.Max() <= 5_000 * 3);
    }

    [Fact]
    public void Growth_TimeLimit_StopsPromptly()
    {
        var clock = System.Diagnostics.Stopwatch.StartNew();
        var r = DegreeGrowth.Analyse(HietarintaViallet, 60, new GrowthOptions { Budget = Only(b => b with { TimeLimit = Short }) });
        Assert.Equal(BudgetLimit.Time, r.Limit);
        Assert.True(clock.Elapsed < Short + TimeSpan.FromSeconds(2), $"took {clock.Elapsed}");
    }

    [Fact]
    public void Confinement_PrecisionLimit_IsNamed()
    {
        // The ε-series of a non-confining map need ever more precision; a tiny cap must be reported, not exceeded.
        var nonConfining = Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^3");
        try
        {
            var r = SingularityConfinement.Test(nonConfining, new ConfinementOptions { Budget = Only(b => b with { MaxPrecision = 2 }) });
            Assert.Equal(BudgetLimit.Precision, r.Limit);
        }
        catch (BudgetExceededException e)
        {
            Assert.Equal(BudgetLimit.Precision, e.Limit);
        }
    }

    [Fact]
    public void Exploration_SeedLimit_ReportsIncomplete()
    {
        // The Markov quiver's exchange graph is infinite.
        var r = ExchangeGraph.Explore(ExchangeMatrix.Parse("[[0,2,-2],[-2,0,2],[2,-2,0]]"), new ExplorationOptions { MaxSeeds = 500 });
        Assert.False(r.Complete);
        Assert.InRange(r.SeedCount, 1, 500);
    }

    [Fact]
    public void Integrals_TimeLimit_PartialReportNamesTime()
    {
        var r = Integrable.Integrals.FirstIntegrals.Find(Somos5,
            new Integrable.Integrals.IntegralOptions { Degree = 11, Budget = Only(b => b with { TimeLimit = Short }) });
        Assert.Equal(BudgetLimit.Time, r.Limit);
        Assert.False(r.IsComplete);
    }

    [Fact]
    public void Integrals_AnsatzTooLarge_PartialReportNamesTermsBeforeAllocating()
    {
        // Degree 12 in 5 variables: C(17, 5) − 1 = 6187 unknowns, past the default MaxUnknowns = 6000 (common knowledge: monomial counts).
        var clock = System.Diagnostics.Stopwatch.StartNew();
        var r = Integrable.Integrals.FirstIntegrals.Find(Somos5, new Integrable.Integrals.IntegralOptions { Degree = 12 });
        Assert.Equal(BudgetLimit.Terms, r.Limit);
        Assert.Contains("6187 unknown coefficients", r.LimitMessage);
        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(5), $"took {clock.Elapsed}");
    }

    [Fact]
    public void Series_TimeLimit_TypedExceptionWithPrecisionReached()
    {
        var clock = System.Diagnostics.Stopwatch.StartNew();
        var e = Assert.Throws<BudgetExceededException>(() => Integrable.Solutions.SeriesSolver.SolveBoundaryValue(
            Recurrence.Parse("R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})"), "g", 0, [Integrable.Numbers.Rational.Zero],
            new Integrable.Solutions.SeriesOptions { Order = 800, Budget = Only(b => b with { TimeLimit = Short }) }));
        Assert.Equal(BudgetLimit.Time, e.Limit);
        Assert.True(clock.Elapsed < Short + TimeSpan.FromSeconds(3), $"took {clock.Elapsed}");
    }
}
