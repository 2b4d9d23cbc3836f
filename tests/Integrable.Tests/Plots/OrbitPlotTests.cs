using Integrable.Plots;
using Integrable.Polynomials;
using Integrable.Recursions;

namespace Integrable.Tests.Plots;

public class OrbitPlotTests
{
    // Our own plane map, built by the QRT construction (Quispel, Roberts, Thompson, "Integrable mappings
    // and soliton equations", 1988): for the symmetric biquadratic I(x, y) = x^2 y^2 + x^2 + y^2 − 3xy + x + y,
    // I(t, y) = K is the quadratic (y^2+1) t^2 + (1 − 3y) t + (y^2 + y − K) in t, whose two roots x_{n−1}, x_{n+1}
    // sum to (3y − 1)/(y^2 + 1); so the map below keeps I constant (worked out here).
    private const string Map = "x_{n+1} + x_{n-1} = (3*x_n - 1)/(x_n^2 + 1)";
    private const string Invariant = "x^2*y^2 + x^2 + y^2 - 3*x*y + x + y";

    private static LaurentPolynomial ParseInvariant() => LaurentPolynomial.Parse(new LaurentPolynomialRing("x", "y"), Invariant);

    [Fact]
    public void Orbit_InvariantMap_KeepsTheInvariantInDoubles()
    {
        var inv = ParseInvariant();
        var orbit = OrbitPlot.Orbit(Recurrence.Parse(Map), (0.5, 0.25), 3000);
        Assert.Equal(3000, orbit.Count);
        double k = OrbitPlot.EvaluateInvariant(inv, 0.5, 0.25);
        Assert.All(orbit, p => Assert.InRange(OrbitPlot.EvaluateInvariant(inv, p.X, p.Y), k - 1e-9, k + 1e-9));
    }

    [Fact]
    public void Render_ThreeOrbitsWithInvariant_DrawsEveryPointAndOneCurvePerOrbit()
    {
        var plot = OrbitPlot.Render(Recurrence.Parse(Map), [(0.5, 0.25), (1.0, -0.5), (0.1, 1.5)],
            new OrbitPlotOptions { Points = 1500, Invariant = ParseInvariant() });
        var doc = PlotFiles.SaveAndParse(plot, "orbits.svg");
        Assert.Equal(4500, PlotFiles.Count(doc, "circle", "point"));
        Assert.Equal(3, PlotFiles.Count(doc, "path", "level"));
        Assert.Equal(4503, plot.MarkCount);
    }

    [Fact]
    public void Render_MapOfOrderThree_Throws()
    {
        var map = Recurrence.Parse("x_{n+3} x_n = x_{n+2} x_{n+1} + 1");
        Assert.Throws<ArgumentException>(() => OrbitPlot.Render(map, [(1.0, 1.0)]));
    }

    [Fact]
    public void Segments_UnitCircle_EndpointsLieOnTheCircle()
    {
        // marching squares with linear interpolation: endpoints are within the interpolation error of
        // x^2 + y^2 = 1 (cell size 4/200 = 0.02, error O(h^2)); common knowledge.
        var segments = LevelCurves.Segments((x, y) => x * x + y * y, -2, 2, -2, 2, 200, 1.0);
        Assert.True(segments.Count > 300);
        foreach (var (x1, y1, x2, y2) in segments)
        {
            Assert.InRange(Math.Sqrt(x1 * x1 + y1 * y1), 0.999, 1.001);
            Assert.InRange(Math.Sqrt(x2 * x2 + y2 * y2), 0.999, 1.001);
        }
    }
}
