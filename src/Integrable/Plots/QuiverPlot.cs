using System.Globalization;
using Integrable.Clusters;

namespace Integrable.Plots;

/// <summary>A quiver (or the valued quiver of a skew-symmetrizable exchange matrix) drawn as a graph:
/// vertices evenly on a circle (mutable ones as discs, frozen ones as squares), one arrow per pair of
/// joined vertices, labelled with its multiplicity when above 1 (or with "b_ij, −b_ji" for a valued
/// arrow).</summary>
/// <example><code>
/// var q = new Quiver(3, 1, [new Arrow(1, 2, 2), new Arrow(2, 3), new Arrow(3, 1), new Arrow(4, 1)]);
/// QuiverPlot.Render(q).Save("quiver.svg");
/// </code></example>
public static class QuiverPlot
{
    /// <summary>Draws a quiver.</summary>
    /// <param name="quiver">The quiver.</param>
    /// <param name="title">The title (null: "Quiver").</param>
    /// <param name="size">Width and height in pixels (default 480).</param>
    /// <returns>The plot: one <c>node</c> mark per vertex and one <c>arrow</c> mark per joined pair.</returns>
    public static SvgPlot Render(Quiver quiver, string? title = null, int size = 480)
    {
        ArgumentNullException.ThrowIfNull(quiver);
        return Render(quiver.ToMatrix(), title ?? "Quiver", size);
    }

    /// <summary>Draws the valued quiver of an exchange matrix: an arrow i → j for every b_ij &gt; 0.</summary>
    /// <param name="matrix">The exchange matrix (frozen rows included).</param>
    /// <param name="title">The title (null: "Exchange matrix").</param>
    /// <param name="size">Width and height in pixels (default 480).</param>
    /// <returns>The plot: one <c>node</c> mark per vertex and one <c>arrow</c> mark per joined pair.</returns>
    public static SvgPlot Render(ExchangeMatrix matrix, string? title = null, int size = 480)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        GrowthPlot.CheckSize(size, size);
        int n = matrix.MutableCount, N = matrix.RowCount;
        var canvas = new SvgCanvas(size, size, title ?? "Exchange matrix");
        canvas.Raw("<defs><marker id=\"head\" viewBox=\"0 0 10 10\" refX=\"10\" refY=\"5\" markerWidth=\"8\" markerHeight=\"8\" orient=\"auto-start-reverse\"><path d=\"M0 0L10 5L0 10z\" fill=\"#333\"/></marker></defs>");
        canvas.Text(size / 2.0, 22, canvas.Title, "middle", 14, "font-weight=\"bold\"");
        double cx = size / 2.0, cy = size / 2.0 + 10, radius = size * 0.36, nodeR = 15;
        var pos = new (double X, double Y)[N];
        for (int i = 0; i < N; i++)
        {
            double angle = -Math.PI / 2 + 2 * Math.PI * i / N;
            pos[i] = (cx + radius * Math.Cos(angle), cy + radius * Math.Sin(angle));
        }
        for (int i = 0; i < N; i++)
        for (int j = i + 1; j < N; j++)
        {
            if (i >= n && j >= n) continue;
            int bij = j < n ? matrix[i + 1, j + 1] : -matrix[j + 1, i + 1];
            int bji = i < n ? matrix[j + 1, i + 1] : -matrix[i + 1, j + 1];
            if (bij == 0 && bji == 0) continue;
            var (from, to) = bij > 0 || (bij == 0 && bji < 0) ? (i, j) : (j, i);
            int forward = from == i ? bij : bji, backward = from == i ? -bji : -bij;
            var (x1, y1) = pos[from];
            var (x2, y2) = pos[to];
            double dx = x2 - x1, dy = y2 - y1, len = Math.Sqrt(dx * dx + dy * dy);
            double ux = dx / len, uy = dy / len;
            canvas.Line(x1 + ux * (nodeR + 2), y1 + uy * (nodeR + 2), x2 - ux * (nodeR + 4), y2 - uy * (nodeR + 4), "#333", 1.6, "arrow", "marker-end=\"url(#head)\"");
            canvas.Mark();
            string label = forward == backward ? (forward == 1 ? "" : forward.ToString(CultureInfo.InvariantCulture))
                                               : $"{forward},{backward}";
            if (label.Length > 0)
            {
                double mx = (x1 + x2) / 2 - uy * 12, my = (y1 + y2) / 2 + ux * 12;
                canvas.Text(mx, my + 4, label, "middle", 12, "class=\"multiplicity\" fill=\"#b00020\"");
            }
        }
        for (int i = 0; i < N; i++)
        {
            var (x, y) = pos[i];
            if (i < n) canvas.Circle(x, y, nodeR, "#dce8fa", "node", "#1f5fbf");
            else canvas.Rect(x - nodeR, y - nodeR, 2 * nodeR, 2 * nodeR, "#f3e0c8", "node", "#b8860b");
            canvas.Text(x, y + 4, (i + 1).ToString(CultureInfo.InvariantCulture), "middle", 12);
        }
        canvas.Mark(N);
        return canvas.Finish();
    }
}
