using System.Text.Json;
using Integrable.Analyses;
using Integrable.Numbers;
using Integrable.Recursions;

namespace Integrable.Tests.Analyses;

public class PeriodicityTests
{
    [Fact]
    public void Find_LynessA1_Period5Symbolic()
    {
        // x_{n+1} x_{n-1} = x_n + 1 has period 5 (Lyness 1942; Kocic–Ladas, Global behavior of nonlinear
        // difference equations of higher order, 1993, Section 3).
        var report = Periodicity.Find(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1"), 30);
        Assert.Equal(5, report.Period);
        Assert.Equal(PeriodVerification.Symbolic, report.Method);
        Assert.Equal(2, report.RationalPoints);
    }

    [Fact]
    public void Find_LynessSymbolicParameter_NoneUnlessSetToOne()
    {
        // Lyness with a generic a is not periodic (its invariant curves carry a varying rotation number;
        // Zeeman 1996, Bastien–Rogalski 2004); a = 1 gives period 5.
        var rec = Recurrence.Parse("x_{n+1} x_{n-1} = x_n + a");
        var generic = Periodicity.Find(rec, 30);
        Assert.Null(generic.Period);
        Assert.Equal(PeriodVerification.Counterexamples, generic.Method);
        var one = Periodicity.Find(rec, 30, new PeriodOptions { ParameterValues = new Dictionary<string, Rational> { ["a"] = 1 } });
        Assert.Equal(5, one.Period);
    }

    [Theory]
    [InlineData("x_{n+3} x_n = 1 + x_{n+1} + x_{n+2}", 8)]   // Todd's recurrence (Todd 1975; Kocic–Ladas 1993)
    [InlineData("x_{n+1} x_{n-1} = x_n", 6)]                 // common knowledge: x, y, y/x, 1/x, 1/y, x/y
    [InlineData("x_{n+1} = -1/(x_n + 1)", 3)]                // Möbius map of order 3 (common knowledge)
    [InlineData("x_{n+1} = x_n", 1)]
    public void Find_KnownPeriods(string equation, int period)
    {
        var report = Periodicity.Find(Recurrence.Parse(equation), 20);
        Assert.Equal(period, report.Period);
        Assert.Equal(PeriodVerification.Symbolic, report.Method);
    }

    [Fact]
    public void Find_HietarintaViallet_None()
    {
        var report = Periodicity.Find(Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2"), 25);
        Assert.Null(report.Period);
        Assert.Contains("disproves", report.Verification);
    }

    [Fact]
    public void Find_WithoutSymbolicCheck_ProbabilisticBound()
    {
        var report = Periodicity.Find(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1"), 10, new PeriodOptions { SymbolicCheck = false });
        Assert.Equal(5, report.Period);
        Assert.Equal(PeriodVerification.Probabilistic, report.Method);
        Assert.InRange(report.ErrorBound!.Value, 0, 1e-40);
        Assert.True(report.DegreeBound >= 2);
    }

    [Fact]
    public void Find_SymbolicCheckOverBudget_FallsBackToProbabilistic()
    {
        // Todd's 8-cycle with a tiny term budget: the exact check stops, the period stands with an error bound.
        var report = Periodicity.Find(Recurrence.Parse("x_{n+3} x_n = 1 + x_{n+1} + x_{n+2}"), 10,
            new PeriodOptions { Budget = AnalysisBudget.Default with { MaxTerms = 5 } });
        Assert.Equal(8, report.Period);
        Assert.Equal(PeriodVerification.Probabilistic, report.Method);
        Assert.Equal(BudgetLimit.None, report.Limit);
        Assert.Contains("symbolic check stopped", report.Verification);
    }

    [Fact]
    public void Find_System_LynessAsSystem()
    {
        var report = Periodicity.Find(RecurrenceSystem.Parse("x_{n+1} = y_n, y_{n+1} x_n = y_n + 1"), 12);
        Assert.Equal(5, report.Period);
    }

    [Fact]
    public void Find_NonAutonomous_CheckedOverTwoPeriods()
    {
        // x_{n+1} = (-1)^n-free example: x_{n+1} x_n = n + 1 is not periodic.
        var report = Periodicity.Find(Recurrence.Parse("x_{n+1} x_n = n + 1"), 8);
        Assert.Null(report.Period);
        Assert.False(report.IsAutonomous);
    }

    [Fact]
    public void Find_UndefinedMap_SingularStepException()
    {
        // y_1 = x_0 - x_0 = 0, then x_2 = 1/y_1: every orbit is singular at the second step.
        var e = Assert.Throws<SingularStepException>(() => Periodicity.Find(RecurrenceSystem.Parse("x_{n+1} = 1/y_n, y_{n+1} = x_n - x_n"), 5));
        Assert.Contains("not defined", e.Message);
    }

    [Fact]
    public void Report_Json_PeriodField()
    {
        var found = JsonDocument.Parse(Periodicity.Find(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1"), 30).ToJson()).RootElement;
        Assert.Equal(5, found.GetProperty("period").GetInt32());
        Assert.Equal("symbolic", found.GetProperty("method").GetString());
        var none = JsonDocument.Parse(Periodicity.Find(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 2"), 10).ToJson()).RootElement;
        Assert.Equal(JsonValueKind.Null, none.GetProperty("period").ValueKind);
        var text = Periodicity.Find(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1"), 30).ToString();
        Assert.Contains("period 5", text);
    }

    [Fact]
    public void Find_BadArguments_Typed()
    {
        var rec = Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1");
        Assert.Throws<ArgumentOutOfRangeException>(() => Periodicity.Find(rec, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => Periodicity.Find(rec, 5, new PeriodOptions { Points = 0 }));
        Assert.Throws<ArgumentException>(() => Periodicity.Find(rec, 5, new PeriodOptions { ParameterValues = new Dictionary<string, Rational> { ["b"] = 1 } }));
        Assert.Throws<ArgumentNullException>(() => Periodicity.Find((Recurrence)null!, 5));
    }
}
