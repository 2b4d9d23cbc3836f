using System.Xml.Linq;
using Integrable.Plots;

namespace Integrable.Tests.Plots;

/// <summary>Where the plot tests leave their SVG files (beside the test assembly, folder <c>plots</c>),
/// and XML helpers to count marks.</summary>
internal static class PlotFiles
{
    public static string Directory { get; } = System.IO.Directory.CreateDirectory(Path.Combine(AppContext.BaseDirectory, "plots")).FullName;

    /// <summary>Saves the plot under <paramref name="name"/>, reads the file back and parses it as XML.</summary>
    public static XDocument SaveAndParse(SvgPlot plot, string name)
    {
        var path = Path.Combine(Directory, name);
        plot.Save(path);
        var doc = XDocument.Parse(File.ReadAllText(path));
        Assert.Equal("svg", doc.Root!.Name.LocalName);
        Assert.Equal("http://www.w3.org/2000/svg", doc.Root.Name.NamespaceName);
        return doc;
    }

    public static int Count(XDocument doc, string element, string cls) =>
        doc.Descendants().Count(e => e.Name.LocalName == element && (string?)e.Attribute("class") == cls);

    /// <summary>The multiplicity labels of a quiver plot.</summary>
    public static string[] Labels(XDocument doc) =>
        doc.Descendants().Where(e => e.Name.LocalName == "text" && (string?)e.Attribute("class") == "multiplicity").Select(e => e.Value).ToArray();
}
