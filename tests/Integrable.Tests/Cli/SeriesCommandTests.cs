using System.Text.Json;

namespace Integrable.Tests.Cli;

public class SeriesCommandTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    [Fact]
    public void Json_Quadrangulations_SeriesPerIndex()
    {
        // R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1}), R_0 = 0: R_1 = 1 + 2g + 9g² + … (Bouttier, Di Francesco, Guitter,
        // Nucl. Phys. B 663 (2003) 535; the first coefficients follow from R_n = R u_n u_{n+3}/(u_{n+1}u_{n+2})).
        var (exit, stdout, stderr) = Run("series", "R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})", "--parameter", "g", "--order", "20",
            "--boundary", "R_0=0", "--json");
        Assert.True(exit == 0, stderr);
        var series = JsonDocument.Parse(stdout).RootElement.GetProperty("series");
        Assert.True(series.EnumerateObject().Count() >= 10);
        var r1 = series.GetProperty("R_1").EnumerateArray().Select(e => e.GetString()!).ToArray();
        Assert.Equal(21, r1.Length);
        Assert.Equal(["1", "2", "9"], r1[..3]);
        Assert.True(series.TryGetProperty("R_{10}", out _));
    }

    [Fact]
    public void Initial_OddFibonacciWeighted_TextOutput()
    {
        var (exit, stdout, _) = Run("series", "x_{n+1} x_{n-1} = x_n^2 + g", "--parameter", "g", "--order", "4", "--initial", "1,1");
        Assert.Equal(0, exit);
        Assert.Contains("x_3 = 1 + 3 g + g^2", stdout, StringComparison.Ordinal);   // ((1+g)² + g)/1
    }

    [Theory]
    [InlineData("R_n = 1 + g R_n (R_{n-1} + R_{n+1})", "--parameter", "h", "--boundary", "R_0=0")]
    [InlineData("R_n = 1 + g R_n (R_{n-1} + R_{n+1})", "--parameter", "g", "--boundary", "S_0=0")]
    [InlineData("R_n = 1 + g R_n (R_{n-1} + R_{n+1})", "--parameter", "g", "--boundary", "R_0=abc")]
    [InlineData("R_n = 1 + g R_n (R_{n-1} + R_{n+1}", "--parameter", "g", "--boundary", "R_0=0")]
    [InlineData("R_n = 1 + g R_n (R_{n-1} + R_{n+1})", "--parameter", "g", "--order", "-3", "--boundary", "R_0=0")]
    [InlineData("R_n = 1 + g R_n (R_{n-1} + R_{n+1})", "--parameter", "g")]
    [InlineData("R_n = 1 + g R_n (R_{n-1} + n R_{n+1})", "--parameter", "g", "--boundary", "R_0=0")]
    public void BadInput_Exit2_OneLine(params string[] rest)
    {
        var (exit, _, stderr) = Run(["series", .. rest]);
        Assert.Equal(2, exit);
        Assert.Single(stderr.Trim().Split('\n'));
    }

    [Fact]
    public void NoConvergence_Exit1_SaysWhy()
    {
        var (exit, _, stderr) = Run("series", "x_n = 1 + x_{n-1}/2 + g x_{n+1}", "--parameter", "g", "--boundary", "x_0=0");
        Assert.Equal(1, exit);
        Assert.Contains("g = 0", stderr, StringComparison.Ordinal);
    }
}
