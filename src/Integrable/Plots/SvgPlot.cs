using System.Text;

namespace Integrable.Plots;

/// <summary>A finished plot as a self-contained SVG document (no scripts, no external resources, no
/// native code): the markup, its size, and how many data marks it draws.</summary>
/// <remarks>Data marks carry a <c>class</c> attribute naming what they show (<c>point</c>,
/// <c>level</c>, <c>degree</c>, <c>fit</c>, <c>terms</c>, <c>node</c>, <c>arrow</c>), so a page's
/// style sheet or a test can find them.</remarks>
/// <example><code>
/// var plot = GrowthPlot.Render(DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1"), 15));
/// plot.Save("growth.svg");
/// string markup = plot.Svg;
/// </code></example>
public sealed class SvgPlot
{
    internal SvgPlot(string svg, string title, int width, int height, int markCount)
    {
        Svg = svg;
        Title = title;
        Width = width;
        Height = height;
        MarkCount = markCount;
    }

    /// <summary>The SVG document (UTF-8 text, starting with the <c>&lt;svg</c> element).</summary>
    public string Svg { get; }

    /// <summary>The plot's title.</summary>
    public string Title { get; }

    /// <summary>Width in pixels.</summary>
    public int Width { get; }

    /// <summary>Height in pixels.</summary>
    public int Height { get; }

    /// <summary>The number of data marks drawn (points, curve pieces, nodes and arrows; not axes or labels).</summary>
    public int MarkCount { get; }

    /// <summary>Writes the SVG document to a file (UTF-8, no byte-order mark), replacing it if it exists.</summary>
    /// <param name="path">The file to write, e.g. <c>orbit.svg</c>.</param>
    /// <exception cref="ArgumentException"><paramref name="path"/> is empty.</exception>
    public void Save(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        File.WriteAllText(path, Svg, new UTF8Encoding(false));
    }

    /// <summary>The SVG document.</summary>
    /// <returns><see cref="Svg"/>.</returns>
    public override string ToString() => Svg;
}
