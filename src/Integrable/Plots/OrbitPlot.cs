using Integrable.Algebra;
using Integrable.Recursions;

namespace Integrable.Plots;

/// <summary>Phase portraits of a second-order map (x_{n−1}, x_n) ↦ (x_n, x_{n+1}): orbits iterated in
/// double precision as scattered points, optionally over the level curves of an invariant (drawn by
/// marching squares on a grid, evaluating the invariant in doubles).</summary>
/// <remarks>The picture is numerical evidence only: the points are floating-point iterates, and a
/// curve drawn here is not a proof of invariance (the exact checks live in the analyses).</remarks>
/// <example><code>
/// var map = Recurrence.Parse("x_{n+1} + x_{n-1} = (3*x_n - 1)/(x_n^2 + 1)");
/// var ring = new LaurentPolynomialRing("x", "y");
/// var invariant = LaurentPolynomial.Parse(ring, "x^2*y^2 + x^2 + y^2 - 3*x*y + x + y");
/// OrbitPlot.Render(map, [(0.5, 0.5), (1.0, 0.2)], new OrbitPlotOptions { Invariant = invariant }).Save("orbits.svg");
/// </code></example>
public static class OrbitPlot
{
    private static readonly string[] Palette = ["#1f5fbf", "#d0582a", "#2a9d4b", "#8a3fb8", "#b8860b", "#c2185b", "#00838f", "#5d4037"];

    /// <summary>The orbit of a second-order map from (x_0, x_1) = <paramref name="start"/> in double
    /// precision, as points (x_n, x_{n+1}); it ends early at a singular step (division by zero) or
    /// a non-finite value.</summary>
    /// <param name="map">A recurrence of order 2.</param>
    /// <param name="start">(x_0, x_1).</param>
    /// <param name="points">The number of points wanted (at least 1).</param>
    /// <param name="parameterValues">Values of the parameters (null when none).</param>
    /// <returns>Up to <paramref name="points"/> points, the first being <paramref name="start"/>.</returns>
    /// <exception cref="ArgumentException">The recurrence is not of order 2, or the parameter values do not match.</exception>
    public static IReadOnlyList<(double X, double Y)> Orbit(Recurrence map, (double X, double Y) start, int points, IReadOnlyList<double>? parameterValues = null)
    {
        ArgumentNullException.ThrowIfNull(map);
        ArgumentOutOfRangeException.ThrowIfLessThan(points, 1);
        if (map.Order != 2) throw new ArgumentException($"an orbit plot needs a map of order 2 (a plane map); {map.Text} has order {map.Order}", nameof(map));
        if ((parameterValues?.Count ?? 0) != map.Parameters.Length)
            throw new ArgumentException($"{map.Text} has {map.Parameters.Length} parameter(s) ({string.Join(", ", map.Parameters)}); give that many values", nameof(parameterValues));
        var result = new List<(double, double)>(points) { start };
        double a = start.X, b = start.Y;
        var pair = new double[2];
        for (int n = 1; n < points; n++)
        {
            pair[0] = a; pair[1] = b;
            double c;
            try
            {
                c = map.Iterate(DoubleField.Instance, pair, 1, parameterValues, start: n - 1)[2];
            }
            catch (SingularStepException)
            {
                break;
            }
            if (!double.IsFinite(c)) break;
            a = b; b = c;
            result.Add((a, b));
        }
        return result;
    }

    /// <summary>Iterates the map from each start and plots the orbits (and the invariant's level curves).</summary>
    /// <param name="map">A recurrence of order 2.</param>
    /// <param name="starts">The starting points (x_0, x_1), one orbit each (at most 64).</param>
    /// <param name="options">Settings (null: defaults).</param>
    /// <returns>The plot.</returns>
    /// <exception cref="ArgumentException">Not a plane map, no starts, or settings out of range.</exception>
    public static SvgPlot Render(Recurrence map, IReadOnlyList<(double X, double Y)> starts, OrbitPlotOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(map);
        ArgumentNullException.ThrowIfNull(starts);
        options ??= new OrbitPlotOptions();
        if (starts.Count is 0 or > 64) throw new ArgumentException($"give between 1 and 64 starting points, not {starts.Count}", nameof(starts));
        var orbits = starts.Select(s => Orbit(map, s, options.Points, options.ParameterValues)).ToList();
        return Render(orbits, options with { Title = options.Title ?? $"Orbits of {map.Text}" });
    }

    /// <summary>Plots given point sets (e.g. orbits computed elsewhere) with the optional level curves.</summary>
    /// <param name="orbits">The point sets, each drawn in its own colour.</param>
    /// <param name="options">Settings (null: defaults; <see cref="OrbitPlotOptions.Points"/> and the parameters are not used).</param>
    /// <returns>The plot.</returns>
    /// <exception cref="ArgumentException">The invariant has more than two variables, or a setting is out of range.</exception>
    public static SvgPlot Render(IReadOnlyList<IReadOnlyList<(double X, double Y)>> orbits, OrbitPlotOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(orbits);
        options ??= new OrbitPlotOptions();
        if (options.Width < 200 || options.Height < 200) throw new ArgumentException("the plot must be at least 200 x 200 pixels", nameof(options));
        if (options.GridCells is < 4 or > 1000) throw new ArgumentException($"GridCells must be between 4 and 1000, not {options.GridCells}", nameof(options));
        var inv = options.Invariant;
        if (inv is not null && inv.Ring.VariableCount is < 1 or > 2)
            throw new ArgumentException($"the invariant must be a Laurent polynomial in two variables (x_n, x_{{n+1}}), not in {inv.Ring.VariableCount}", nameof(options));

        static bool Usable((double X, double Y) p) => double.IsFinite(p.X) && double.IsFinite(p.Y) && Math.Abs(p.X) <= 1e6 && Math.Abs(p.Y) <= 1e6;
        double xMin, xMax, yMin, yMax;
        if (options.Window is { } w) (xMin, xMax, yMin, yMax) = w;
        else
        {
            var all = orbits.SelectMany(o => o).Where(Usable).ToList();
            if (all.Count == 0) (xMin, xMax, yMin, yMax) = (-1, 1, -1, 1);
            else (xMin, xMax, yMin, yMax) = (all.Min(p => p.X), all.Max(p => p.X), all.Min(p => p.Y), all.Max(p => p.Y));
        }
        if (!(xMax > xMin) || !(yMax > yMin))
        {
            if (options.Window is not null) throw new ArgumentException("the window must have XMax > XMin and YMax > YMin", nameof(options));
        }

        var canvas = new SvgCanvas(options.Width, options.Height, options.Title ?? "Orbits");
        var frame = new PlotFrame(canvas, xMin, xMax, yMin, yMax, logY: false);
        frame.DrawAxes(canvas.Title, "x_n", "x_{n+1}");
        canvas.Raw($"<clipPath id=\"plotarea\"><rect x=\"{SvgCanvas.N(frame.Left)}\" y=\"{SvgCanvas.N(frame.Top)}\" width=\"{SvgCanvas.N(frame.Right - frame.Left)}\" height=\"{SvgCanvas.N(frame.Bottom - frame.Top)}\"/></clipPath>");

        if (inv is not null)
        {
            var levels = options.Levels ?? orbits.Where(o => o.Count > 0).Select(o => EvaluateInvariant(inv, o[0].X, o[0].Y)).ToList();
            var grid = LevelCurves.Sample((x, y) => EvaluateInvariant(inv, x, y), frame.XMin, frame.XMax, frame.YMin, frame.YMax, options.GridCells);
            for (int l = 0; l < levels.Count; l++)
            {
                if (!double.IsFinite(levels[l])) continue;
                var segments = LevelCurves.Segments(grid, frame.XMin, frame.XMax, frame.YMin, frame.YMax, options.GridCells, levels[l]);
                if (segments.Count == 0) continue;
                string color = options.Levels is null ? Palette[l % Palette.Length] : "#888";
                canvas.Path(LevelCurves.PathData(segments, frame.X, frame.Y), color, 1, "level", extra: $"stroke-opacity=\"0.45\" clip-path=\"url(#plotarea)\" data-level=\"{SvgCanvas.N(levels[l])}\"");
                canvas.Mark();
            }
        }

        int drawn = 0;
        for (int o = 0; o < orbits.Count; o++)
        {
            string color = Palette[o % Palette.Length];
            foreach (var p in orbits[o])
            {
                if (!Usable(p) || !frame.Contains(p.X, p.Y)) continue;
                canvas.Circle(frame.X(p.X), frame.Y(p.Y), 1.3, color, "point");
                drawn++;
            }
        }
        canvas.Mark(drawn);
        if (inv is not null) frame.Legend(0, "#888", $"level curves of {Shorten(inv.ToString())}", line: true);
        return canvas.Finish();
    }

    internal static double EvaluateInvariant(Integrable.Polynomials.LaurentPolynomial invariant, double x, double y)
    {
        Span<double> point = stackalloc double[2];
        point[0] = x; point[1] = y;
        try
        {
            return invariant.Evaluate(DoubleField.Instance, point[..invariant.Ring.VariableCount]);
        }
        catch (ArithmeticException)
        {
            return double.NaN;
        }
    }

    private static string Shorten(string s) => s.Length <= 60 ? s : s[..57] + "...";
}
