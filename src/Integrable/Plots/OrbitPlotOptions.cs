using Integrable.Polynomials;

namespace Integrable.Plots;

/// <summary>Settings of an <see cref="OrbitPlot"/>: orbit length, parameter values, the invariant whose
/// level curves are drawn, the window and the size.</summary>
public sealed record OrbitPlotOptions
{
    /// <summary>Points per orbit (default 2000).</summary>
    public int Points { get; init; } = 2000;

    /// <summary>Values of the map's parameters, in the order of <see cref="Recursions.Recurrence.Parameters"/> (null when it has none).</summary>
    public IReadOnlyList<double>? ParameterValues { get; init; }

    /// <summary>An invariant of the map as a Laurent polynomial in two variables (the first is the
    /// horizontal coordinate x_n, the second the vertical one x_{n+1}); its level curves are drawn
    /// under the points. Null: no curves.</summary>
    public LaurentPolynomial? Invariant { get; init; }

    /// <summary>The levels to draw; null: the invariant's value at each orbit's first point (the curve
    /// the orbit should stay on).</summary>
    public IReadOnlyList<double>? Levels { get; init; }

    /// <summary>Grid cells per side for the marching squares (default 160).</summary>
    public int GridCells { get; init; } = 160;

    /// <summary>The window (x from, x to, y from, y to); null: fitted to the points (values beyond ±1e6 ignored).</summary>
    public (double XMin, double XMax, double YMin, double YMax)? Window { get; init; }

    /// <summary>The title; null: "Orbits of" and the map.</summary>
    public string? Title { get; init; }

    /// <summary>Width in pixels (default 640).</summary>
    public int Width { get; init; } = 640;

    /// <summary>Height in pixels (default 600).</summary>
    public int Height { get; init; } = 600;
}
