using System.Globalization;
using System.Text;
using Integrable.Analyses;

namespace Integrable.Plots;

/// <summary>The degrees d_n of a <see cref="GrowthReport"/> on log-linear axes, with a curve fitted to
/// the growth class found: C·λ^n for exponential growth (λ the dominant root of the fitted generating
/// function, C by least squares on log d_n over the second half of the data), a least-squares
/// polynomial of the found degree for polynomial growth, the largest degree when bounded.</summary>
/// <example><code>
/// var report = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1"), 15);
/// GrowthPlot.Render(report).Save("growth.svg");
/// </code></example>
public static class GrowthPlot
{
    /// <summary>Plots the degrees and the fitted curve.</summary>
    /// <param name="report">A degree-growth report.</param>
    /// <param name="width">Width in pixels (default 640).</param>
    /// <param name="height">Height in pixels (default 420).</param>
    /// <returns>The plot: one <c>degree</c> mark per degree, one <c>fit</c> path when a class was found.</returns>
    public static SvgPlot Render(GrowthReport report, int width = 640, int height = 420)
    {
        ArgumentNullException.ThrowIfNull(report);
        CheckSize(width, height);
        var d = report.Degrees;
        var fit = FittedCurve(report.Fit, d);
        double yMax = d.Length == 0 ? 10 : Math.Max(2, d.Max());
        if (fit is not null) yMax = Math.Max(yMax, Enumerable.Range(0, d.Length).Max(n => fit(n)));
        var canvas = new SvgCanvas(width, height, $"Degree growth of {report.Subject}");
        var frame = new PlotFrame(canvas, 0, Math.Max(1, d.Length - 1), 1, yMax, logY: true);
        frame.DrawAxes(canvas.Title, "n", "degree d_n (log scale)", integerX: true);
        if (fit is not null && d.Length > 1)
        {
            var sb = new StringBuilder();
            int samples = 200;
            for (int s = 0; s <= samples; s++)
            {
                double n = (d.Length - 1) * (double)s / samples;
                double v = Math.Max(fit(n), 1e-300);
                sb.Append(s == 0 ? 'M' : 'L').Append(SvgCanvas.N(frame.X(n))).Append(' ').Append(SvgCanvas.N(Math.Min(frame.Bottom + 40, frame.Y(v))));
            }
            canvas.Path(sb.ToString(), "#d0582a", 1.8, "fit", extra: "stroke-dasharray=\"6 3\"");
            canvas.Mark();
            frame.Legend(1, "#d0582a", "fit: " + report.Fit, line: true);
        }
        for (int n = 0; n < d.Length; n++)
            canvas.Circle(frame.X(n), frame.Y(Math.Max(d[n], 1)), 3.5, "#1f5fbf", "degree");
        canvas.Mark(d.Length);
        frame.Legend(0, "#1f5fbf", "degree of x_n", line: false);
        return canvas.Finish();
    }

    /// <summary>The fitted curve n ↦ value, or null when the growth class is unknown.</summary>
    internal static Func<double, double>? FittedCurve(GrowthFit fit, IReadOnlyList<long> d)
    {
        if (fit.Class is null || d.Count == 0) return null;
        if (fit.Class == GrowthClass.Bounded)
        {
            double m = d.Max();
            return _ => m;
        }
        int half = d.Count / 2;
        if (fit.Class == GrowthClass.Exponential && fit.DominantRoot > 1)
        {
            double logL = Math.Log(fit.DominantRoot), sum = 0;
            int count = 0;
            for (int n = half; n < d.Count; n++) { sum += Math.Log(Math.Max(d[n], 1)) - n * logL; count++; }
            double logC = sum / count;
            return n => Math.Exp(logC + n * logL);
        }
        int k = fit.PolynomialDegree;
        if (k < 0) return null;
        var coeffs = LeastSquaresPolynomial(d, Math.Min(k, d.Count - 1));
        return n =>
        {
            double v = 0;
            for (int i = coeffs.Length - 1; i >= 0; i--) v = v * n + coeffs[i];
            return v;
        };
    }

    /// <summary>Coefficients c_0..c_k of the least-squares polynomial through (n, d_n), by the normal equations.</summary>
    internal static double[] LeastSquaresPolynomial(IReadOnlyList<long> d, int k)
    {
        int m = k + 1;
        var a = new double[m, m + 1];
        for (int n = 0; n < d.Count; n++)
        {
            var pow = new double[2 * m];
            pow[0] = 1;
            for (int i = 1; i < pow.Length; i++) pow[i] = pow[i - 1] * n;
            for (int i = 0; i < m; i++)
            {
                for (int j = 0; j < m; j++) a[i, j] += pow[i + j];
                a[i, m] += pow[i] * d[n];
            }
        }
        for (int c = 0; c < m; c++)
        {
            int p = c;
            for (int r = c + 1; r < m; r++) if (Math.Abs(a[r, c]) > Math.Abs(a[p, c])) p = r;
            for (int j = 0; j <= m; j++) (a[c, j], a[p, j]) = (a[p, j], a[c, j]);
            if (a[c, c] == 0) continue;
            for (int r = 0; r < m; r++)
            {
                if (r == c) continue;
                double f = a[r, c] / a[c, c];
                for (int j = c; j <= m; j++) a[r, j] -= f * a[c, j];
            }
        }
        var x = new double[m];
        for (int i = 0; i < m; i++) x[i] = a[i, i] == 0 ? 0 : a[i, m] / a[i, i];
        return x;
    }

    internal static void CheckSize(int width, int height)
    {
        if (width < 200 || height < 200)
            throw new ArgumentOutOfRangeException(nameof(width), string.Create(CultureInfo.InvariantCulture, $"a plot must be at least 200 x 200 pixels, not {width} x {height}"));
    }
}
