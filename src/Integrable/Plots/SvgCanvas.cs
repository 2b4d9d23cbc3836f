using System.Globalization;
using System.Text;

namespace Integrable.Plots;

/// <summary>Writes SVG markup: numbers in invariant culture with two decimals, text escaped.</summary>
internal sealed class SvgCanvas
{
    private readonly StringBuilder _sb = new();
    private int _marks;

    public SvgCanvas(int width, int height, string title)
    {
        Width = width;
        Height = height;
        Title = title;
        _sb.Append(CultureInfo.InvariantCulture,
            $"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{width}\" height=\"{height}\" viewBox=\"0 0 {width} {height}\" font-family=\"sans-serif\" font-size=\"12\">\n");
        _sb.Append("<title>").Append(Escape(title)).Append("</title>\n");
        _sb.Append(CultureInfo.InvariantCulture, $"<rect class=\"background\" x=\"0\" y=\"0\" width=\"{width}\" height=\"{height}\" fill=\"white\"/>\n");
    }

    public int Width { get; }
    public int Height { get; }
    public string Title { get; }

    public static string N(double v) => v.ToString("0.##", CultureInfo.InvariantCulture);

    public static string Escape(string s) =>
        s.Replace("&", "&amp;").Replace("<", "&lt;").Replace(">", "&gt;").Replace("\"", "&quot;");

    /// <summary>Counts one data mark (called by the plots for every mark they add).</summary>
    public void Mark(int count = 1) => _marks += count;

    public SvgCanvas Raw(string markup)
    {
        _sb.Append(markup).Append('\n');
        return this;
    }

    public void Line(double x1, double y1, double x2, double y2, string stroke, double width = 1, string? cls = null, string? extra = null) =>
        _sb.Append("<line").Append(cls is null ? "" : $" class=\"{cls}\"")
           .Append(" x1=\"").Append(N(x1)).Append("\" y1=\"").Append(N(y1)).Append("\" x2=\"").Append(N(x2)).Append("\" y2=\"").Append(N(y2))
           .Append("\" stroke=\"").Append(stroke).Append("\" stroke-width=\"").Append(N(width)).Append('"')
           .Append(extra is null ? "" : " " + extra).Append("/>\n");

    public void Circle(double cx, double cy, double r, string fill, string cls, string? stroke = null) =>
        _sb.Append("<circle class=\"").Append(cls).Append("\" cx=\"").Append(N(cx)).Append("\" cy=\"").Append(N(cy)).Append("\" r=\"").Append(N(r))
           .Append("\" fill=\"").Append(fill).Append('"').Append(stroke is null ? "" : $" stroke=\"{stroke}\"").Append("/>\n");

    public void Rect(double x, double y, double w, double h, string fill, string? cls = null, string? stroke = null) =>
        _sb.Append("<rect").Append(cls is null ? "" : $" class=\"{cls}\"").Append(" x=\"").Append(N(x)).Append("\" y=\"").Append(N(y))
           .Append("\" width=\"").Append(N(w)).Append("\" height=\"").Append(N(h)).Append("\" fill=\"").Append(fill).Append('"')
           .Append(stroke is null ? "" : $" stroke=\"{stroke}\"").Append("/>\n");

    public void Path(string data, string stroke, double width, string cls, string fill = "none", string? extra = null) =>
        _sb.Append("<path class=\"").Append(cls).Append("\" d=\"").Append(data).Append("\" stroke=\"").Append(stroke)
           .Append("\" stroke-width=\"").Append(N(width)).Append("\" fill=\"").Append(fill).Append('"')
           .Append(extra is null ? "" : " " + extra).Append("/>\n");

    public void Text(double x, double y, string text, string anchor = "start", double size = 12, string? extra = null) =>
        _sb.Append("<text x=\"").Append(N(x)).Append("\" y=\"").Append(N(y)).Append("\" text-anchor=\"").Append(anchor)
           .Append("\" font-size=\"").Append(N(size)).Append('"').Append(extra is null ? "" : " " + extra).Append('>')
           .Append(Escape(text)).Append("</text>\n");

    public SvgPlot Finish()
    {
        _sb.Append("</svg>\n");
        return new SvgPlot(_sb.ToString(), Title, Width, Height, _marks);
    }
}
