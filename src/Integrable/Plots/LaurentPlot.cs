using Integrable.Analyses;

namespace Integrable.Plots;

/// <summary>The number of terms of each iterate of a <see cref="LaurentReport"/> on a log scale,
/// positive iterates filled, the others hollow, and the first non-Laurent iterate marked.</summary>
/// <example><code>
/// var report = LaurentPhenomenon.Check(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1"), 8);
/// LaurentPlot.Render(report).Save("terms.svg");
/// </code></example>
public static class LaurentPlot
{
    /// <summary>Plots the term counts.</summary>
    /// <param name="report">A Laurent-property report.</param>
    /// <param name="width">Width in pixels (default 640).</param>
    /// <param name="height">Height in pixels (default 420).</param>
    /// <returns>The plot: one <c>terms</c> mark per iterate, joined by a line.</returns>
    public static SvgPlot Render(LaurentReport report, int width = 640, int height = 420)
    {
        ArgumentNullException.ThrowIfNull(report);
        GrowthPlot.CheckSize(width, height);
        var steps = report.Steps;
        double xMin = steps.Length == 0 ? 0 : steps[0].Index, xMax = steps.Length == 0 ? 1 : steps[^1].Index;
        if (report.Failure is { } f) xMax = Math.Max(xMax, f.Index);
        double yMax = steps.Length == 0 ? 10 : Math.Max(2, steps.Max(s => s.TermCount));
        var canvas = new SvgCanvas(width, height, $"Terms of the iterates of {report.Subject}");
        var frame = new PlotFrame(canvas, xMin, Math.Max(xMax, xMin + 1), 1, yMax, logY: true);
        frame.DrawAxes(canvas.Title, "n", "number of terms (log scale)", integerX: true);
        if (steps.Length > 1)
        {
            var path = string.Concat(steps.Select((s, i) => $"{(i == 0 ? 'M' : 'L')}{SvgCanvas.N(frame.X(s.Index))} {SvgCanvas.N(frame.Y(s.TermCount))}"));
            canvas.Path(path, "#9bb5e0", 1.2, "trend");
        }
        foreach (var s in steps)
            canvas.Circle(frame.X(s.Index), frame.Y(Math.Max(1, s.TermCount)), 3.5, s.IsPositive ? "#1f5fbf" : "white", "terms", "#1f5fbf");
        canvas.Mark(steps.Length);
        frame.Legend(0, "#1f5fbf", "Laurent iterate (filled: positive coefficients)", line: false);
        if (report.Failure is { } failure)
        {
            double x = frame.X(failure.Index);
            canvas.Line(x, frame.Top, x, frame.Bottom, "#c62828", 1.5, "failure", "stroke-dasharray=\"4 3\"");
            canvas.Text(x - 4, frame.Top + 14, $"{failure.Term} not Laurent", "end", 11, "fill=\"#c62828\"");
            canvas.Mark();
        }
        return canvas.Finish();
    }
}
