using Integrable.Analyses;
using Integrable.Plots;
using Integrable.Recursions;

namespace Integrable.Tests.Plots;

public class GrowthPlotTests
{
    [Fact]
    public void Render_ExponentialGrowth_OneMarkPerDegreeAndAFit()
    {
        // Hietarinta–Viallet, "Singularity confinement and chaos in discrete systems", PRL 81 (1998) 325:
        // exponential growth, entropy log((3 + √5)/2).
        var report = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2"), 9);
        Assert.Equal(GrowthClass.Exponential, report.Fit.Class);
        var plot = GrowthPlot.Render(report);
        var doc = PlotFiles.SaveAndParse(plot, "growth.svg");
        Assert.Equal(report.Degrees.Length, PlotFiles.Count(doc, "circle", "degree"));
        Assert.Equal(1, PlotFiles.Count(doc, "path", "fit"));
        Assert.Equal((3 + Math.Sqrt(5)) / 2, report.Fit.DominantRoot, 9);
    }

    [Fact]
    public void FittedCurve_QuadraticDegrees_ReproducesThem()
    {
        // exact quadratic data: the least-squares quadratic is the data itself (common knowledge)
        long[] d = Enumerable.Range(0, 16).Select(n => (long)n * n + 1).ToArray();   // n^2 + 1
        var fit = GrowthFit.FromDegrees(d);
        Assert.Equal(GrowthClass.Quadratic, fit.Class);
        var curve = GrowthPlot.FittedCurve(fit, d)!;
        for (int n = 0; n < d.Length; n++) Assert.Equal(d[n], curve(n), 6);
    }
}
