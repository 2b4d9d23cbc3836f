using System.Text;

namespace Integrable.Plots;

/// <summary>Level curves f(x, y) = c of a function sampled on a grid, by marching squares: each grid
/// cell whose corners straddle c gets one or two segments between linearly interpolated edge points
/// (saddle cells are split by the value at the cell centre).</summary>
internal static class LevelCurves
{
    /// <summary>The segments of the level c, in data coordinates.</summary>
    /// <param name="f">The function; non-finite values make a cell be skipped.</param>
    /// <param name="xMin">Left edge of the grid.</param>
    /// <param name="xMax">Right edge.</param>
    /// <param name="yMin">Bottom edge.</param>
    /// <param name="yMax">Top edge.</param>
    /// <param name="cells">Number of cells per side.</param>
    /// <param name="level">c.</param>
    public static List<(double X1, double Y1, double X2, double Y2)> Segments(Func<double, double, double> f,
        double xMin, double xMax, double yMin, double yMax, int cells, double level)
    {
        var grid = Sample(f, xMin, xMax, yMin, yMax, cells);
        return Segments(grid, xMin, xMax, yMin, yMax, cells, level);
    }

    public static double[,] Sample(Func<double, double, double> f, double xMin, double xMax, double yMin, double yMax, int cells)
    {
        var g = new double[cells + 1, cells + 1];
        for (int i = 0; i <= cells; i++)
        for (int j = 0; j <= cells; j++)
            g[i, j] = f(xMin + (xMax - xMin) * i / cells, yMin + (yMax - yMin) * j / cells);
        return g;
    }

    public static List<(double X1, double Y1, double X2, double Y2)> Segments(double[,] g,
        double xMin, double xMax, double yMin, double yMax, int cells, double level)
    {
        var result = new List<(double, double, double, double)>();
        double hx = (xMax - xMin) / cells, hy = (yMax - yMin) / cells;
        Span<int> edges = stackalloc int[4];
        for (int i = 0; i < cells; i++)
        for (int j = 0; j < cells; j++)
        {
            // corners counter-clockwise: 0 (i,j), 1 (i+1,j), 2 (i+1,j+1), 3 (i,j+1)
            double v0 = g[i, j] - level, v1 = g[i + 1, j] - level, v2 = g[i + 1, j + 1] - level, v3 = g[i, j + 1] - level;
            if (!double.IsFinite(v0) || !double.IsFinite(v1) || !double.IsFinite(v2) || !double.IsFinite(v3)) continue;
            int code = (v0 > 0 ? 1 : 0) | (v1 > 0 ? 2 : 0) | (v2 > 0 ? 4 : 0) | (v3 > 0 ? 8 : 0);
            if (code is 0 or 15) continue;
            double x0 = xMin + i * hx, y0 = yMin + j * hy;
            // edge crossing points: edge e joins corner e and corner (e+1) % 4
            (double X, double Y) Edge(int e) => e switch
            {
                0 => (x0 + hx * Frac(v0, v1), y0),
                1 => (x0 + hx, y0 + hy * Frac(v1, v2)),
                2 => (x0 + hx * (1 - Frac(v2, v3)), y0 + hy),
                _ => (x0, y0 + hy * (1 - Frac(v3, v0))),
            };
            int n = 0;
            bool s0 = v0 > 0, s1 = v1 > 0, s2 = v2 > 0, s3 = v3 > 0;
            if (s0 != s1) edges[n++] = 0;
            if (s1 != s2) edges[n++] = 1;
            if (s2 != s3) edges[n++] = 2;
            if (s3 != s0) edges[n++] = 3;
            if (n == 2)
            {
                var a = Edge(edges[0]); var b = Edge(edges[1]);
                result.Add((a.X, a.Y, b.X, b.Y));
            }
            else if (n == 4)
            {
                // saddle: the centre value decides which corners are joined
                bool centre = (v0 + v1 + v2 + v3) / 4 > 0;
                if (centre == s0)
                {   // corner 0's sign region connects through the middle: cut off corners 1 and 3
                    var a = Edge(0); var b = Edge(1); result.Add((a.X, a.Y, b.X, b.Y));
                    var c = Edge(2); var d = Edge(3); result.Add((c.X, c.Y, d.X, d.Y));
                }
                else
                {   // cut off corners 0 and 2
                    var a = Edge(3); var b = Edge(0); result.Add((a.X, a.Y, b.X, b.Y));
                    var c = Edge(1); var d = Edge(2); result.Add((c.X, c.Y, d.X, d.Y));
                }
            }
        }
        return result;
    }

    private static double Frac(double a, double b) => a == b ? 0.5 : Math.Clamp(a / (a - b), 0, 1);

    /// <summary>An SVG path "M … L …" for the segments, mapped to pixels.</summary>
    public static string PathData(IEnumerable<(double X1, double Y1, double X2, double Y2)> segments, Func<double, double> px, Func<double, double> py)
    {
        var sb = new StringBuilder();
        foreach (var (x1, y1, x2, y2) in segments)
            sb.Append('M').Append(SvgCanvas.N(px(x1))).Append(' ').Append(SvgCanvas.N(py(y1)))
              .Append('L').Append(SvgCanvas.N(px(x2))).Append(' ').Append(SvgCanvas.N(py(y2)));
        return sb.ToString();
    }
}
