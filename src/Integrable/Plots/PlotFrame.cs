using System.Globalization;

namespace Integrable.Plots;

/// <summary>A rectangular plotting area with a linear x axis and a linear or base-10 logarithmic y
/// axis: maps data to pixels and draws the frame, ticks, tick labels and axis titles.</summary>
internal sealed class PlotFrame
{
    public const int MarginLeft = 70, MarginRight = 20, MarginTop = 36, MarginBottom = 48;

    public PlotFrame(SvgCanvas canvas, double xMin, double xMax, double yMin, double yMax, bool logY)
    {
        Canvas = canvas;
        LogY = logY;
        if (logY)
        {
            yMin = Math.Log10(Math.Max(yMin, 1e-300));
            yMax = Math.Log10(Math.Max(yMax, 1e-300));
        }
        (XMin, XMax) = Widen(xMin, xMax);
        (YMin, YMax) = Widen(yMin, yMax);
        Left = MarginLeft;
        Right = canvas.Width - MarginRight;
        Top = MarginTop;
        Bottom = canvas.Height - MarginBottom;
    }

    public SvgCanvas Canvas { get; }
    public bool LogY { get; }
    public double XMin { get; }
    public double XMax { get; }
    /// <summary>Bounds of the y axis (log10 of the data when <see cref="LogY"/>).</summary>
    public double YMin { get; }
    public double YMax { get; }
    public double Left { get; }
    public double Right { get; }
    public double Top { get; }
    public double Bottom { get; }

    private static (double, double) Widen(double lo, double hi)
    {
        if (!double.IsFinite(lo) || !double.IsFinite(hi)) return (0, 1);
        if (hi - lo < 1e-12 * Math.Max(1, Math.Abs(lo))) return (lo - 0.5, hi + 0.5);
        double pad = 0.04 * (hi - lo);
        return (lo - pad, hi + pad);
    }

    public double X(double x) => Left + (x - XMin) / (XMax - XMin) * (Right - Left);

    public double Y(double y)
    {
        double v = LogY ? Math.Log10(Math.Max(y, 1e-300)) : y;
        return Bottom - (v - YMin) / (YMax - YMin) * (Bottom - Top);
    }

    public bool Contains(double x, double y) =>
        double.IsFinite(x) && double.IsFinite(y) && x >= XMin && x <= XMax && (LogY ? y > 0 && Math.Log10(y) >= YMin && Math.Log10(y) <= YMax : y >= YMin && y <= YMax);

    /// <summary>Round tick values covering [lo, hi], about <paramref name="count"/> of them.</summary>
    public static List<double> Ticks(double lo, double hi, int count = 6)
    {
        var ticks = new List<double>();
        double span = hi - lo;
        if (!(span > 0)) return ticks;
        double raw = span / count, mag = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        double step = raw / mag < 1.5 ? mag : raw / mag < 3.5 ? 2 * mag : raw / mag < 7.5 ? 5 * mag : 10 * mag;
        for (double t = Math.Ceiling(lo / step) * step; t <= hi + 1e-9 * step; t += step)
            ticks.Add(Math.Abs(t) < 1e-12 * step ? 0 : t);
        return ticks;
    }

    public static string Label(double v) =>
        Math.Abs(v) >= 1e5 || (Math.Abs(v) < 1e-3 && v != 0)
            ? v.ToString("0.##E0", CultureInfo.InvariantCulture)
            : v.ToString("0.###", CultureInfo.InvariantCulture);

    /// <summary>Draws the frame, grid, ticks and labels, the title and the axis titles.</summary>
    public void DrawAxes(string title, string xTitle, string yTitle, bool integerX = false)
    {
        var c = Canvas;
        c.Rect(Left, Top, Right - Left, Bottom - Top, "none", "frame", "#444");
        foreach (var t in Ticks(XMin, XMax))
        {
            if (integerX && Math.Abs(t - Math.Round(t)) > 1e-9) continue;
            double x = X(t);
            c.Line(x, Bottom, x, Bottom + 5, "#444");
            c.Line(x, Top, x, Bottom, "#eee");
            c.Text(x, Bottom + 18, Label(t), "middle", 11);
        }
        if (LogY)
        {
            for (int e = (int)Math.Ceiling(YMin); e <= Math.Floor(YMax); e++)
            {
                double y = Bottom - (e - YMin) / (YMax - YMin) * (Bottom - Top);
                c.Line(Left - 5, y, Left, y, "#444");
                c.Line(Left, y, Right, y, "#eee");
                c.Text(Left - 8, y + 4, e is >= 0 and <= 4 ? Math.Pow(10, e).ToString("0", CultureInfo.InvariantCulture) : $"1E{e}", "end", 11);
            }
        }
        else
        {
            foreach (var t in Ticks(YMin, YMax))
            {
                double y = Y(t);
                c.Line(Left - 5, y, Left, y, "#444");
                c.Line(Left, y, Right, y, "#eee");
                c.Text(Left - 8, y + 4, Label(t), "end", 11);
            }
        }
        c.Text((Left + Right) / 2, 22, title, "middle", 14, "font-weight=\"bold\"");
        c.Text((Left + Right) / 2, c.Height - 10, xTitle, "middle", 12);
        c.Text(16, (Top + Bottom) / 2, yTitle, "middle", 12, $"transform=\"rotate(-90 16 {SvgCanvas.N((Top + Bottom) / 2)})\"");
    }

    /// <summary>A legend entry in the upper left corner of the plotting area (index 0, 1, …).</summary>
    public void Legend(int index, string color, string text, bool line)
    {
        double y = Top + 16 + 16 * index, x = Left + 12;
        if (line) Canvas.Line(x, y - 4, x + 18, y - 4, color, 2);
        else Canvas.Circle(x + 9, y - 4, 3.5, color, "legend");
        Canvas.Text(x + 24, y, text, "start", 11);
    }
}
