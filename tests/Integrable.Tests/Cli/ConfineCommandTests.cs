using System.Text.Json;

namespace Integrable.Tests.Cli;

public class ConfineCommandTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    [Fact]
    public void Json_DiscretePainleveI_Confined()
    {
        // Grammaticos–Ramani–Papageorgiou, PRL 67 (1991) 1825: pattern {0, ∞², 0}, confined.
        var (exit, stdout, _) = Run("confine", "x_{n+1} + x_{n-1} = a/x_n + 1/x_n^2", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.True(root.GetProperty("confined").GetBoolean());
        var s = root.GetProperty("singularities")[0];
        Assert.Equal(["0", "∞^2", "0"], s.GetProperty("pattern").EnumerateArray().Select(e => e.GetString()!).ToArray());
        Assert.Equal(4, s.GetProperty("confinedAt").GetInt32());
        Assert.True(s.GetProperty("recoversInitialData").GetBoolean());
    }

    [Fact]
    public void Json_HietarintaViallet_ConfinedAndNonAutonomous()
    {
        // Hietarinta–Viallet 1998: confined ({0, ∞², ∞², 0}) although non-integrable.
        var (exit, stdout, _) = Run("confine", "x_{n+1} + x_{n-1} = x_n + 1/x_n^2", "--json");
        Assert.Equal(0, exit);
        Assert.True(JsonDocument.Parse(stdout).RootElement.GetProperty("confined").GetBoolean());
        // d-PI with z_n = a n + b confines (Ramani–Grammaticos–Hietarinta, PRL 67 (1991) 1829).
        (exit, stdout, _) = Run("confine", "x_{n+1} + x_n + x_{n-1} = (a n + b)/x_n + c", "--start", "3", "--set", "a=1,b=1/2,c=2", "--json");
        Assert.Equal(0, exit);
        Assert.True(JsonDocument.Parse(stdout).RootElement.GetProperty("confined").GetBoolean());
    }

    [Fact]
    public void Text_Unconfined()
    {
        var (exit, stdout, _) = Run("confine", "x_{n+1} = x_n + 1/x_n", "--steps", "6");
        Assert.Equal(0, exit);
        Assert.Contains("NOT confined", stdout);
    }

    [Theory]
    [InlineData("confine")]
    [InlineData("confine", "x_{n+1} = x_n; y_{n+1} = y_n")]
    [InlineData("confine", "x_{n+1} = x_n + 1/x_n", "--steps", "0")]
    [InlineData("confine", "x_{n+1} = x_n + 1/x_n", "--value", "zero")]
    [InlineData("confine", "x_{n+1} = x_n + 1/x_n", "--bogus")]
    public void BadInput_Exit2_OneLine(params string[] args)
    {
        var (exit, stdout, stderr) = Run(args);
        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
    }
}
