using System.Text.Json;

namespace Integrable.Tests.Cli;

public class LaurentCommandTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    [Fact]
    public void Json_Somos4_LaurentPositiveContract()
    {
        // Somos-4 is Laurent with positive coefficients (Fomin–Zelevinsky 2002; Fordy–Marsh 2011).
        var (exit, stdout, _) = Run("laurent", "x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2", "--steps", "10", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.True(root.GetProperty("laurent").GetBoolean());
        Assert.True(root.GetProperty("positive").GetBoolean());
        Assert.Equal(JsonValueKind.Null, root.GetProperty("firstFailure").ValueKind);
        var steps = root.GetProperty("steps");
        Assert.Equal(10, steps.GetArrayLength());
        Assert.Equal(4, steps[0].GetProperty("n").GetInt32());
        Assert.Equal(2, steps[0].GetProperty("terms").GetInt32());
        Assert.True(steps[0].GetProperty("positive").GetBoolean());
        Assert.True(steps[0].GetProperty("integer").GetBoolean());
    }

    [Theory]
    [InlineData("x_{n+5} x_n = x_{n+4} x_{n+1} + x_{n+3} x_{n+2}")]
    [InlineData("x_{n+6} x_n = x_{n+5} x_{n+1} + x_{n+4} x_{n+2} + x_{n+3}^2")]
    [InlineData("x_{n+7} x_n = x_{n+6} x_{n+1} + x_{n+5} x_{n+2} + x_{n+4} x_{n+3}")]
    public void Json_Somos5To7_Laurent(string equation)
    {
        // Somos-5, 6, 7 are Laurent with integer coefficients (Fomin–Zelevinsky, The Laurent phenomenon, 2002).
        var (exit, stdout, _) = Run("laurent", equation, "--steps", "9", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.True(root.GetProperty("laurent").GetBoolean());
        Assert.True(root.GetProperty("integer").GetBoolean());
        Assert.Equal(9, root.GetProperty("steps").GetArrayLength());
    }

    [Fact]
    public void Json_Somos8_FirstFailure16()
    {
        // Somos-8 is not Laurent; the first non-Laurent term is x_16 (symbolic), x_17 = 420514/7 at all ones (OEIS A030127).
        var (exit, stdout, _) = Run("laurent", "x_{n+8} x_n = x_{n+7} x_{n+1} + x_{n+6} x_{n+2} + x_{n+5} x_{n+3} + x_{n+4}^2", "--steps", "12", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.False(root.GetProperty("laurent").GetBoolean());
        Assert.Equal(16, root.GetProperty("firstFailure").GetInt32());
    }

    [Theory]
    [InlineData("1")]
    [InlineData("2")]
    [InlineData("3")]
    [InlineData("4")]
    public void Json_XnPowerB_LaurentPositive(string b)
    {
        // x_{n+1} x_{n-1} = x_n^b + 1: rank-2 cluster algebras, Laurent and positive (FZ 2002; Lee–Schiffler 2015).
        var (exit, stdout, _) = Run("laurent", $"x_{{n+1}} x_{{n-1}} = x_n^{b} + 1", "--steps", "4", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.True(root.GetProperty("laurent").GetBoolean());
        Assert.True(root.GetProperty("positive").GetBoolean());
    }

    [Fact]
    public void Text_SystemLatticeAndMutations()
    {
        var (exit, stdout, _) = Run("laurent", "x_{n+1} = y_n; y_{n+1} x_n = y_n^2 + 1", "--steps", "4");
        Assert.Equal(0, exit);
        Assert.Contains("Laurent up to", stdout);
        (exit, stdout, _) = Run("laurent", "T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n}", "--steps", "4", "--json");
        Assert.Equal(0, exit);
        Assert.Equal([2, 7, 41], JsonDocument.Parse(stdout).RootElement.GetProperty("steps").EnumerateArray().Select(s => s.GetProperty("terms").GetInt32()));
        (exit, stdout, _) = Run("laurent", "--matrix", "[[0,2],[-2,0]]", "--mutations", "1,2,1,2", "--json");
        Assert.Equal(0, exit);
        Assert.True(JsonDocument.Parse(stdout).RootElement.GetProperty("positive").GetBoolean());
        (exit, stdout, _) = Run("laurent", "x_{n+1} x_{n-1} = x_n^2 + 1", "--steps", "3", "--latex");
        Assert.Equal(0, exit);
        Assert.Contains("\\begin{tabular}", stdout);
    }

    [Fact]
    public void Budget_TermLimit_Exit1WithPartialReport()
    {
        var (exit, stdout, stderr) = Run("laurent", "x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2", "--steps", "40", "--max-terms", "30", "--json");
        Assert.Equal(1, exit);
        Assert.Equal("terms", JsonDocument.Parse(stdout).RootElement.GetProperty("limit").GetString());
        Assert.Contains("limit", stderr);
    }

    [Theory]
    [InlineData("laurent")]
    [InlineData("laurent", "x_{n+1} = x_n +")]
    [InlineData("laurent", "x_{n+1}^2 = x_n")]
    [InlineData("laurent", "x_{n+1} = g x_n", "--set", "h=1")]
    [InlineData("laurent", "x_{n+1} = x_n", "--steps", "0")]
    [InlineData("laurent", "x_{n+1} = x_n", "--time-limit", "soon")]
    [InlineData("laurent", "--matrix", "[[0,1],[-1,0]]")]
    [InlineData("laurent", "--matrix", "[[0,1],[-1,0]]", "--mutations", "3")]
    [InlineData("laurent", "--matrix", "[[0,1],[1,0]]", "--mutations", "1")]
    [InlineData("laurent", "x_{n+1} = x_n", "--json", "--latex")]
    public void BadInput_Exit2_OneLine(params string[] args)
    {
        var (exit, stdout, stderr) = Run(args);
        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
    }
}
