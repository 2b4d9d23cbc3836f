using System.Text.Json;
using Integrable.Tests.Plots;

namespace Integrable.Tests.Cli;

/// <summary>The <c>--svg FILE</c> option of growth, laurent, iterate, mutate and explore (files left in the test folder <c>plots</c>).</summary>
public class SvgOptionTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    private static string File(string name) => Path.Combine(PlotFiles.Directory, name);

    [Fact]
    public void Growth_Svg_OneMarkPerDegree()
    {
        var (exit, stdout, _) = Run("growth", "x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1", "--steps", "12", "--json", "--svg", File("cli-growth.svg"));
        Assert.Equal(0, exit);
        int degrees = JsonDocument.Parse(stdout).RootElement.GetProperty("degrees").GetArrayLength();
        var doc = System.Xml.Linq.XDocument.Load(File("cli-growth.svg"));
        Assert.Equal(degrees, PlotFiles.Count(doc, "circle", "degree"));
    }

    [Fact]
    public void Laurent_Svg_OneMarkPerIterate()
    {
        var (exit, _, _) = Run("laurent", "x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1", "--steps", "5", "--svg", File("cli-laurent.svg"));
        Assert.Equal(0, exit);
        Assert.Equal(5, PlotFiles.Count(System.Xml.Linq.XDocument.Load(File("cli-laurent.svg")), "circle", "terms"));
    }

    [Fact]
    public void Iterate_SvgOfPlaneMap_OnePointPerConsecutivePair()
    {
        var (exit, _, _) = Run("iterate", "x_{n+1} + x_{n-1} = (3*x_n - 1)/(x_n^2 + 1)", "--initial", "1/2,1/4", "--float", "--steps", "2000", "--svg", File("cli-orbit.svg"));
        Assert.Equal(0, exit);
        Assert.Equal(2001, PlotFiles.Count(System.Xml.Linq.XDocument.Load(File("cli-orbit.svg")), "circle", "point"));
    }

    [Fact]
    public void Iterate_SvgOfFirstOrderMap_Exit2()
    {
        var (exit, _, stderr) = Run("iterate", "x_{n+1} = x_n + 1", "--initial", "1", "--svg", File("never.svg"));
        Assert.Equal(2, exit);
        Assert.Contains("second-order", stderr);
    }

    [Fact]
    public void MutateAndExplore_Svg_QuiverGraphs()
    {
        // A3 has 3 vertices and 2 arrows, and mutation at 1 then 2 gives the oriented 3-cycle (common knowledge)
        Assert.Equal(0, Run("mutate", "--type", "A3", "--sequence", "1,2", "--svg", File("cli-mutate.svg")).Item1);
        var mutated = System.Xml.Linq.XDocument.Load(File("cli-mutate.svg"));
        Assert.Equal(3, PlotFiles.Count(mutated, "circle", "node"));
        Assert.Equal(3, PlotFiles.Count(mutated, "line", "arrow"));
        Assert.Equal(0, Run("explore", "--type", "A3", "--svg", File("cli-explore.svg")).Item1);
        Assert.Equal(2, PlotFiles.Count(System.Xml.Linq.XDocument.Load(File("cli-explore.svg")), "line", "arrow"));
    }

    [Fact]
    public void Growth_SvgUnwritable_Exit2()
    {
        var (exit, _, stderr) = Run("growth", "x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1", "--steps", "5", "--svg", Path.Combine(PlotFiles.Directory, "no-such-folder", "g.svg"));
        Assert.Equal(2, exit);
        Assert.StartsWith("integrable: --svg: cannot write", stderr);
    }
}
