using System.Text.Json;

namespace Integrable.Tests.Cli;

public class GrowthCommandTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    [Fact]
    public void Json_QrtMap_QuadraticContract()
    {
        // QRT maps grow quadratically (Bellon–Viallet 1999); the anchors' control map has degree 91 at n = 10.
        var (exit, stdout, _) = Run("growth", "x_{n+1} + x_{n-1} = 1/x_n + 1/x_n^2", "--steps", "30", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        var degrees = root.GetProperty("degrees").EnumerateArray().Select(e => e.GetInt64()).ToArray();
        Assert.Equal(32, degrees.Length);
        Assert.Equal([1, 1, 3], degrees[..3]);   // x_2 = (x_1 + 1 − x_0 x_1²)/x_1²
        Assert.Equal(91, degrees[10]);
        Assert.Equal("quadratic", root.GetProperty("class").GetString());
        Assert.Equal(0.0, root.GetProperty("entropy").GetDouble());
        Assert.Equal(JsonValueKind.String, root.GetProperty("generatingFunction").ValueKind);
    }

    [Fact]
    public void Json_HietarintaViallet_ExponentialEntropy()
    {
        // Hietarinta–Viallet 1998: entropy log((3 + √5)/2) ≈ 0.9624.
        var (exit, stdout, _) = Run("growth", "x_{n+1} + x_{n-1} = x_n + 1/x_n^2", "--steps", "9", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.Equal("exponential", root.GetProperty("class").GetString());
        Assert.Equal(Math.Log((3 + Math.Sqrt(5)) / 2), root.GetProperty("entropy").GetDouble(), 10);
        Assert.Equal("x^2 - 3*x + 1", root.GetProperty("minimalPolynomial").GetString());
    }

    [Fact]
    public void DegreeLimit_Exit1_PartialReportKeepsVerdict()
    {
        var (exit, stdout, stderr) = Run("growth", "x_{n+1} + x_{n-1} = x_n + 1/x_n^2", "--steps", "30", "--max-degree", "5000", "--json");
        Assert.Equal(1, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.Equal("degree", root.GetProperty("limit").GetString());
        Assert.Equal("exponential", root.GetProperty("class").GetString());
        Assert.Contains("degree", stderr);
    }

    [Fact]
    public void TooFewSteps_Exit1_NoVerdict()
    {
        var (exit, stdout, stderr) = Run("growth", "x_{n+1} + x_{n-1} = x_n + 1/x_n^2", "--steps", "3", "--json");
        Assert.Equal(1, exit);
        Assert.Equal(JsonValueKind.Null, JsonDocument.Parse(stdout).RootElement.GetProperty("class").ValueKind);
        Assert.Contains("more --steps", stderr);
    }

    [Fact]
    public void Text_Linearisable_Linear()
    {
        var (exit, stdout, _) = Run("growth", "x_{n+1} (2 x_n x_{n-1} - x_n^2 - 1) = (x_n^2 + 1) x_{n-1} - 2 x_n", "--steps", "16");
        Assert.Equal(0, exit);
        Assert.Contains("growth: linear", stdout);
    }

    [Theory]
    [InlineData("growth")]
    [InlineData("growth", "x_{n+1} = x_n +")]
    [InlineData("growth", "x_{n+1} = x_n", "--max-degree", "-4")]
    [InlineData("growth", "x_{n+1} = x_n", "--steps", "many")]
    [InlineData("growth", "x_{n+1} = c x_n", "--set", "d=1")]
    public void BadInput_Exit2_OneLine(params string[] args)
    {
        var (exit, stdout, stderr) = Run(args);
        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
    }
}
