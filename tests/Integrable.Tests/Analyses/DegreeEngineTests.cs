using Integrable.Analyses;
using Integrable.Numbers;
using Integrable.Recursions;

namespace Integrable.Tests.Analyses;

public class DegreeEngineTests
{
    private static GrowthReport Run(string equation, int steps, GrowthOptions? options = null) =>
        DegreeEngine.Run(new RecursionMap(Recurrence.Parse(equation)), steps, options ?? GrowthOptions.Default, f => new NaiveLineField(f), null, default);

    [Fact]
    public void Run_HietarintaViallet_DegreesOnNaiveReference()
    {
        // Hietarinta–Viallet, PRL 81 (1998) 325: degrees 1, 1, 3, 9, 25, 67, 177, … with
        // d_{n+1} = 3 d_n − d_{n−1} + 1 (as reproduced by FLINT/Singular/PARI in the anchors). The slow
        // reference field keeps this short; the fitted entropy is tested with the fast field.
        var r = Run("x_{n+1} + x_{n-1} = x_n + 1/x_n^2", 5);
        Assert.Equal([1, 1, 3, 9, 25, 67, 177], r.Degrees.ToArray());
        Assert.False(r.Fit.IsFound);                   // 7 degrees cannot confirm an order-3 recurrence
        Assert.True(r.ExactlyConfirmed >= 5);         // exact rational functions over Q agree
        Assert.Null(r.ExactMismatch);
    }

    [Fact]
    public void Run_QrtMap_QuadraticGrowth()
    {
        // x_{n+1} + x_{n-1} = 1/x_n + 1/x_n^2 (QRT, the anchors' control map): quadratic growth
        // (Bellon–Viallet, Comm. Math. Phys. 204 (1999)); degree 91 at n = 10 in the anchors.
        var r = Run("x_{n+1} + x_{n-1} = 1/x_n + 1/x_n^2", 16);
        Assert.Equal(91, r.Degrees[10]);
        Assert.Equal(GrowthClass.Quadratic, r.Fit.Class);
        Assert.Equal(0.0, r.Fit.Entropy);
    }

    [Fact]
    public void Run_Linearisable_LinearGrowth()
    {
        // x_n = coth(u_n) with u_{n+1} = 2u_n − u_{n−1} (coth subtraction formula, from memory): the map is
        // linearisable and x_n has degree 2n − 1 in (x_0, x_1).
        var r = Run("x_{n+1} (2 x_n x_{n-1} - x_n^2 - 1) = (x_n^2 + 1) x_{n-1} - 2 x_n", 14);
        Assert.Equal(Enumerable.Range(1, 15).Select(n => (long)(2 * n - 1)).Prepend(1).ToArray(), r.Degrees.ToArray());
        Assert.Equal(GrowthClass.Linear, r.Fit.Class);
    }

    [Fact]
    public void Run_Lyness_Bounded()
    {
        var r = Run("x_{n+1} x_{n-1} = x_n + 1", 16);
        Assert.Equal(GrowthClass.Bounded, r.Fit.Class);
        Assert.True(r.ExactlyConfirmed >= 6);
    }

    [Fact]
    public void Run_DegreeBudget_StopsWithLimit()
    {
        var r = Run("x_{n+1} + x_{n-1} = x_n + 1/x_n^2", 30, GrowthOptions.Default with { Budget = AnalysisBudget.Default with { MaxDegree = 500 } });
        Assert.Equal(BudgetLimit.Degree, r.Limit);
        Assert.Equal(1219, r.Degrees[^1]);          // the step that passed the limit is kept
        Assert.Equal(465, r.Degrees[^2]);
    }
}
