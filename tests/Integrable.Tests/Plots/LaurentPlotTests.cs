using Integrable.Analyses;
using Integrable.Plots;
using Integrable.Recursions;

namespace Integrable.Tests.Plots;

public class LaurentPlotTests
{
    [Fact]
    public void Render_LaurentRecurrence_OneMarkPerIterate()
    {
        // Somos-4 has the Laurent property (Fomin, Zelevinsky, "The Laurent phenomenon", 2002)
        var report = LaurentPhenomenon.Check(Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2"), 6);
        var doc = PlotFiles.SaveAndParse(LaurentPlot.Render(report), "laurent-terms.svg");
        Assert.Equal(report.Steps.Length, PlotFiles.Count(doc, "circle", "terms"));
        Assert.Equal(0, PlotFiles.Count(doc, "line", "failure"));
    }

    [Fact]
    public void Render_NonLaurentRecurrence_MarksTheFailure()
    {
        // x_{n+1} x_{n-1} = x_n + 2 is not Laurent at x_4 (worked out by hand: x_4 = (x_1 + 2 + 2 x_0 (1 + x_1))/(x_1 (x_1 + 2))
        // and x_1 + 2 does not divide 2 x_0 (1 + x_1); with 2 replaced by 1 it is the 5-periodic Lyness map, common knowledge).
        var report = LaurentPhenomenon.Check(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 2"), 6);
        Assert.False(report.IsLaurent);
        var doc = PlotFiles.SaveAndParse(LaurentPlot.Render(report), "laurent-failure.svg");
        Assert.Equal(report.Steps.Length, PlotFiles.Count(doc, "circle", "terms"));
        Assert.Equal(1, PlotFiles.Count(doc, "line", "failure"));
        Assert.Equal(4, report.FirstFailure);
    }
}
