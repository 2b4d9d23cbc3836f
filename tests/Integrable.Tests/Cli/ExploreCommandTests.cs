using System.Text.Json;

namespace Integrable.Tests.Cli;

public class ExploreCommandTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    private static (int Seeds, int Variables, bool Complete) Parse(string json)
    {
        var root = JsonDocument.Parse(json).RootElement;
        return (root.GetProperty("seeds").GetInt32(), root.GetProperty("variables").GetInt32(), root.GetProperty("complete").GetBoolean());
    }

    // Finite-type counts (clusters, cluster variables): Fomin–Zelevinsky, Y-systems and generalized associahedra (2003).
    [Theory]
    [InlineData("--type", "E6", 833, 42)]
    [InlineData("--type", "D4", 50, 16)]
    [InlineData("--matrix", "[[0,1,0],[-1,0,1],[0,-1,0]]", 14, 9)]
    [InlineData("--matrix", "[[0,1],[-2,0]]", 6, 6)]
    public void Json_FiniteTypes_CompleteCounts(string option, string value, int seeds, int variables)
    {
        var (exit, stdout, _) = Run("explore", option, value, "--limit", "100000", "--json");
        Assert.Equal(0, exit);
        Assert.Equal((seeds, variables, true), Parse(stdout));
    }

    [Fact]
    public void Json_Exact_SameCounts()
    {
        var (exit, stdout, _) = Run("explore", "--type", "B3", "--exact", "--json");
        Assert.Equal(0, exit);
        Assert.Equal((20, 12, true), Parse(stdout));
    }

    [Fact]
    public void Json_InfiniteType_StoppedByTheLimit()
    {
        // The Markov quiver has infinitely many seeds (Fomin–Shapiro–Thurston 2008; every mutation gives -B).
        var (exit, stdout, _) = Run("explore", "--type", "Markov", "--limit", "40", "--json");
        Assert.Equal(0, exit);
        var (seeds, _, complete) = Parse(stdout);
        Assert.Equal(40, seeds);
        Assert.False(complete);
    }

    [Fact]
    public void Text_ReportsCounts()
    {
        var (exit, stdout, _) = Run("explore", "--type", "A3");
        Assert.Equal(0, exit);
        Assert.Contains("seeds:             14", stdout);
        Assert.Contains("cluster variables: 9", stdout);
        Assert.Contains("complete:          yes", stdout);
    }

    [Theory]
    [InlineData("explore")]
    [InlineData("explore", "--type", "A3", "--matrix", "[[0]]")]
    [InlineData("explore", "--matrix", "[[0,1],[1,0]]")]
    [InlineData("explore", "--matrix", "[[0,1],[-1,0]")]
    [InlineData("explore", "--matrix", "[[1]]")]
    [InlineData("explore", "--type", "E9")]
    [InlineData("explore", "--type", "A3", "--limit", "0")]
    [InlineData("explore", "--type", "A3", "--limit", "many")]
    [InlineData("explore", "--type", "A3", "--exact", "yes")]
    [InlineData("explore", "A3")]
    public void BadInput_ExitCode2_OneLine_NoStdout(params string[] args)
    {
        var (exit, stdout, stderr) = Run(args);
        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
        Assert.StartsWith("integrable: ", stderr);
    }
}
