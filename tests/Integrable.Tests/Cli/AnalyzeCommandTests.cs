using System.Text.Json;

namespace Integrable.Tests.Cli;

public class AnalyzeCommandTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    // The Lyness map x_{n+1} x_{n-1} = x_n + 1 is periodic with period 5 and Laurent (Lyness 1942; common knowledge).
    private const string Lyness = "x_{n+1} x_{n-1} = x_n + 1";

    [Fact]
    public void Json_Lyness_OneObjectPerAnalysis()
    {
        var (exit, stdout, stderr) = Run("analyze", Lyness, "--json");
        Assert.Equal(0, exit);
        Assert.Equal("", stderr);   // no progress display when stderr is not the terminal
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.Equal(Lyness, root.GetProperty("subject").GetString());
        Assert.Equal(["subject", "laurent", "growth", "period", "confinement", "integrals"], root.EnumerateObject().Select(p => p.Name));
        Assert.True(root.GetProperty("laurent").GetProperty("laurent").GetBoolean());
        Assert.Equal("bounded", root.GetProperty("growth").GetProperty("class").GetString());
        Assert.Equal(5, root.GetProperty("period").GetProperty("period").GetInt32());
        // Its rational integral (x+1)(y+1)(x+y+1)/(xy) (Lyness 1942; Kocic–Ladas 1993) is found and proven.
        var integrals = root.GetProperty("integrals");
        Assert.True(integrals.GetProperty("verified").GetBoolean());
        Assert.Equal(1, integrals.GetProperty("independent").GetInt32());
        Assert.NotEmpty(integrals.GetProperty("integrals").EnumerateArray());
    }

    [Fact]
    public void Text_HietarintaViallet_NoIntegralSummary()
    {
        // Hietarinta–Viallet 1998: confined but non-integrable, no polynomial integral.
        var (_, stdout, _) = Run("analyze", "x_{n+1} + x_{n-1} = x_n + 1/x_n^2", "--quiet", "--growth-steps", "10");
        Assert.Contains("  integrals    no first integral up to degree 4", stdout);
        Assert.Contains("== integrals ==", stdout);
    }

    [Fact]
    public void Json_GrowthMember_SameAsTheGrowthCommand()
    {
        var (_, battery, _) = Run("analyze", "x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1", "--growth-steps", "12", "--json");
        var (_, single, _) = Run("growth", "x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1", "--steps", "12", "--json");
        var a = JsonDocument.Parse(battery).RootElement.GetProperty("growth");
        var b = JsonDocument.Parse(single).RootElement;
        Assert.Equal(b.GetProperty("degrees").EnumerateArray().Select(e => e.GetInt64()), a.GetProperty("degrees").EnumerateArray().Select(e => e.GetInt64()));
        Assert.Equal(b.GetProperty("generatingFunction").GetString(), a.GetProperty("generatingFunction").GetString());
    }

    [Fact]
    public void Text_Lyness_SummaryThenReports()
    {
        var (exit, stdout, _) = Run("analyze", Lyness, "--quiet");
        Assert.Equal(0, exit);
        Assert.StartsWith($"Analysis of {Lyness}", stdout);
        Assert.Contains("  period       period 5", stdout);
        Assert.Contains("== laurent ==", stdout);
        Assert.Contains("== confinement ==", stdout);
    }

    [Fact]
    public void BadEquation_Exit2OneLine()
    {
        var (exit, stdout, stderr) = Run("analyze", "x_{n+1} = = 1");
        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Single(stderr.TrimEnd().Split('\n'));
    }
}
