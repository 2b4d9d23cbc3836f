using System.Numerics;
using Integrable.Analyses;
using Integrable.Numbers;
using Integrable.Recursions;
using Integrable.Series;
using Integrable.Solutions;

namespace Integrable.Tests.Solutions;

public class SeriesSolverTests
{
    private const string Quadrangulations = "R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})";

    private static BigInteger Catalan(int n)
    {
        BigInteger c = 1;
        for (int i = 0; i < n; i++) c = c * 2 * (2 * i + 1) / (i + 2);
        return c;
    }

    [Fact]
    public void FixedPoint_QuadrangulationEquation_GivesThreePowersTimesCatalan()
    {
        // R = 1 + 3 g R² has R = Σ 3^n Cat(n) g^n (common knowledge: the Catalan equation with x = 3g; OEIS A005159).
        var r = SeriesSolver.FixedPoint(Recurrence.Parse(Quadrangulations), "g", new SeriesOptions { Order = 15 });
        for (int n = 0; n <= 15; n++) Assert.Equal(new Rational(BigInteger.Pow(3, n) * Catalan(n)), r[n]);
    }

    [Fact]
    public void SolveBoundaryValue_Quadrangulations_MatchesPublishedClosedFormToOrder20()
    {
        // Bouttier, Di Francesco, Guitter, "Geodesic distance in planar graphs", Nucl. Phys. B 663 (2003) 535–567:
        // R_n = R u_n u_{n+3}/(u_{n+1} u_{n+2}), u_n = 1 − x^n, R = 1 + 3 g R², x + 1/x + 1 = 1/(g R²).
        const int order = 20;
        var sol = SeriesSolver.SolveBoundaryValue(Recurrence.Parse(Quadrangulations), "g", 0, [Rational.Zero],
            new SeriesOptions { Order = order, Count = 10 });
        Assert.Equal(1, sol.FirstIndex);
        Assert.Equal(10, sol.Terms.Count);
        var ring = PowerSeriesRing.OverRationals("g");
        var g = ring.X;
        int p = order + 1;
        var bigR = SeriesEquations.SolveNewton(ring, y => 1 + 3 * g * y * y, p);
        // x = g R² (1 + x + x²), x = O(g)
        var x = SeriesEquations.SolveNewton(ring, y => (g * bigR * bigR * (1 + y + y * y)).Truncate(y.Precision), p,
            initial: ring.Zero.Truncate(1));
        PowerSeries<Rational> U(int n) => (ring.One - x.Pow(n)).Truncate(p);
        for (int n = 1; n <= 10; n++)
        {
            var closed = PowerSeries<Rational>.Divide(bigR * U(n) * U(n + 3), U(n + 1) * U(n + 2), p).Truncate(p);
            Assert.True((closed - sol[n]).Truncate(p).IsZero, $"R_{n} differs from the closed form");
        }
        // R_n − R = O(g^n) (the boundary is felt at order n)
        for (int n = 1; n <= 10; n++) Assert.Equal(n, (sol[n] - bigR.Truncate(p)).Valuation);
    }

    [Fact]
    public void SolveBoundaryValue_LargerWindow_GivesSameSeries()
    {
        var rec = Recurrence.Parse(Quadrangulations);
        var a = SeriesSolver.SolveBoundaryValue(rec, "g", 0, [Rational.Zero], new SeriesOptions { Order = 12 });
        var b = SeriesSolver.SolveBoundaryValue(rec, "g", 0, [Rational.Zero], new SeriesOptions { Order = 12, Window = 40 });
        Assert.Equal(40, b.Window);
        for (int n = 1; n <= 10; n++) Assert.Equal(a[n], b[n]);
    }

    [Fact]
    public void SolveBoundaryValue_CheckLargerWindow_ReportsStability()
    {
        var sol = SeriesSolver.SolveBoundaryValue(Recurrence.Parse(Quadrangulations), "g", 0, [Rational.Zero],
            new SeriesOptions { Order = 10, CheckLargerWindow = true });
        Assert.Contains("solving again on a window of", sol.Verification, StringComparison.Ordinal);
    }

    [Fact]
    public void SolveBoundaryValue_EquationWithDivision_SameAsCleared()
    {
        // the same equation written with a division by R_n must give the same series
        var plain = SeriesSolver.SolveBoundaryValue(Recurrence.Parse("W_n = 1 + t W_n (W_{n-1} + W_{n+1})"), "t", 0, [Rational.Zero],
            new SeriesOptions { Order = 10 });
        var divided = SeriesSolver.SolveBoundaryValue(Recurrence.Parse("W_n = 1 + t W_n^2 (W_{n-1} + W_{n+1}) / W_n"), "t", 0, [Rational.Zero],
            new SeriesOptions { Order = 10 });
        for (int n = 1; n <= 10; n++) Assert.Equal(plain[n], divided[n]);
    }

    [Fact]
    public void SolveBoundaryValue_TooSmallWindow_IsEnlarged()
    {
        var rec = Recurrence.Parse(Quadrangulations);
        var sol = SeriesSolver.SolveBoundaryValue(rec, "g", 0, [Rational.Zero], new SeriesOptions { Order = 16, Window = 5, Count = 3 });
        Assert.True(sol.Window >= 17, $"window {sol.Window}");
        Assert.Contains("exact", sol.Verification, StringComparison.Ordinal);
    }

    [Fact]
    public void SolveInitialValue_SomosTypeWithWeight_SumsToA001519()
    {
        // x_{n+1} x_{n-1} = x_n^2 + g, x_0 = x_1 = 1: Laurent phenomenon makes x_n a polynomial in g, and at g = 1 the
        // values are 1, 1, 2, 5, 13, 34 (OEIS A001519, Fibonacci numbers F_{2n-1}).
        var rec = Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + g");
        var sol = SeriesSolver.SolveInitialValue(rec, "g", [Rational.One, Rational.One], 0, new SeriesOptions { Order = 20, Count = 4 });
        Assert.Equal(2, sol.FirstIndex);
        long[] expected = [2, 5, 13, 34];
        for (int n = 2; n <= 5; n++)
        {
            var c = sol.Coefficients(n);
            Assert.Equal(new Rational(expected[n - 2]), c.Aggregate(Rational.Zero, (s, v) => s + v));
        }
        Assert.Equal(new Rational(3), sol[3][1]);   // x_3 = 1 + 3g + g²
    }

    [Fact]
    public void FixedPoint_TwoRationalFixedPoints_SaysWhy()
    {
        var rec = Recurrence.Parse("x_{n+1} = x_n^2 + g x_{n-1}");
        var e = Assert.Throws<SeriesConvergenceException>(() => SeriesSolver.FixedPoint(rec, "g"));
        Assert.Contains("several", e.Message, StringComparison.Ordinal);
        var chosen = SeriesSolver.FixedPoint(rec, "g", new SeriesOptions { Order = 5, LimitAtZero = Rational.Zero });
        Assert.True(chosen.Truncate(6).IsZero);   // y = y² + g y has the solution y = 0
    }

    [Fact]
    public void SolveBoundaryValue_BoundaryFeltAtOrderZero_SaysWhy()
    {
        // x_n = 1 + x_{n-1}/2 + g x_{n+1}: at g = 0 the boundary value propagates, so the window cannot start at the limit
        var rec = Recurrence.Parse("x_n = 1 + x_{n-1}/2 + g x_{n+1}");
        var e = Assert.Throws<SeriesConvergenceException>(() => SeriesSolver.SolveBoundaryValue(rec, "g", 0, [Rational.Zero]));
        Assert.Contains("g = 0", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void SolveBoundaryValue_UnknownParameter_Throws()
    {
        var rec = Recurrence.Parse(Quadrangulations);
        Assert.Throws<ArgumentException>(() => SeriesSolver.SolveBoundaryValue(rec, "h", 0, [Rational.Zero]));
        Assert.Throws<ArgumentException>(() => SeriesSolver.SolveBoundaryValue(rec, "g", 0, []));
    }

    [Fact]
    public void SolveBoundaryValue_ZeroTimeLimit_ThrowsBudgetExceeded()
    {
        var rec = Recurrence.Parse(Quadrangulations);
        var e = Assert.Throws<BudgetExceededException>(() => SeriesSolver.SolveBoundaryValue(rec, "g", 0, [Rational.Zero],
            new SeriesOptions { Order = 50, Budget = AnalysisBudget.Default with { TimeLimit = TimeSpan.Zero } }));
        Assert.Equal(BudgetLimit.Time, e.Limit);
    }

    [Fact]
    public void SolveBoundaryValue_Cancelled_Throws()
    {
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => SeriesSolver.SolveBoundaryValue(Recurrence.Parse(Quadrangulations), "g", 0,
            [Rational.Zero], new SeriesOptions { Order = 10 }, cancellation: cts.Token));
    }

    [Fact]
    public void SolveBoundaryValue_Report_PrintsTextLatexJson()
    {
        var progress = new List<AnalysisProgress>();
        var sol = SeriesSolver.SolveBoundaryValue(Recurrence.Parse("W_n = 1 + t W_n (W_{n-1} + W_{n+1})"), "t", 0, [Rational.Zero],
            new SeriesOptions { Order = 8 }, progress: new Progress(progress));
        Assert.NotEmpty(progress);
        Assert.Contains("W_1 = 1 + t", sol.ToText(), StringComparison.Ordinal);
        Assert.Contains("\\begin{align*}", sol.ToLatex(), StringComparison.Ordinal);
        using var doc = System.Text.Json.JsonDocument.Parse(sol.ToJson());
        var w1 = doc.RootElement.GetProperty("series").GetProperty("W_1");
        Assert.Equal(9, w1.GetArrayLength());
        Assert.Equal("1", w1[0].GetString());
    }

    private sealed class Progress(List<AnalysisProgress> sink) : IProgress<AnalysisProgress>
    {
        public void Report(AnalysisProgress value) => sink.Add(value);
    }
}
