using Integrable.Clusters;
using Integrable.Plots;

namespace Integrable.Tests.Plots;

public class QuiverPlotTests
{
    [Fact]
    public void Render_QuiverWithFrozenVertex_NodesArrowsAndMultiplicities()
    {
        var q = new Quiver(3, 1, [new Arrow(1, 2, 2), new Arrow(2, 3), new Arrow(3, 1), new Arrow(4, 1)]);
        var doc = PlotFiles.SaveAndParse(QuiverPlot.Render(q, "our quiver"), "quiver.svg");
        Assert.Equal(3, PlotFiles.Count(doc, "circle", "node"));
        Assert.Equal(1, PlotFiles.Count(doc, "rect", "node"));
        Assert.Equal(4, PlotFiles.Count(doc, "line", "arrow"));
        Assert.Equal(["2"], PlotFiles.Labels(doc));
    }

    [Fact]
    public void Render_SkewSymmetrizableMatrix_ValuedArrowLabel()
    {
        // B2: [[0, 1], [-2, 0]], symmetrizer diag(2, 1) (common knowledge: rank-2 finite type B2)
        var b = new ExchangeMatrix(new[,] { { 0, 1 }, { -2, 0 } });
        var doc = PlotFiles.SaveAndParse(QuiverPlot.Render(b), "valued-quiver.svg");
        Assert.Equal(2, PlotFiles.Count(doc, "circle", "node"));
        Assert.Equal(1, PlotFiles.Count(doc, "line", "arrow"));
        Assert.Equal(["1,2"], PlotFiles.Labels(doc));
    }
}
