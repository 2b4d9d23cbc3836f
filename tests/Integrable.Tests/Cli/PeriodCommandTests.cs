using System.Text.Json;

namespace Integrable.Tests.Cli;

public class PeriodCommandTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    [Fact]
    public void Json_LynessA1_Period5()
    {
        // Lyness 1942: x_{n+1} x_{n-1} = x_n + 1 has period 5.
        var (exit, stdout, _) = Run("period", "x_{n+1} x_{n-1} = x_n + 1", "--max", "30", "--json");
        Assert.Equal(0, exit);
        Assert.Equal(5, JsonDocument.Parse(stdout).RootElement.GetProperty("period").GetInt32());
    }

    [Fact]
    public void Json_SymbolicParameter_NullUnlessSet()
    {
        var (exit, stdout, _) = Run("period", "x_{n+1} x_{n-1} = x_n + a", "--max", "30", "--json");
        Assert.Equal(0, exit);
        Assert.Equal(JsonValueKind.Null, JsonDocument.Parse(stdout).RootElement.GetProperty("period").ValueKind);
        (exit, stdout, _) = Run("period", "x_{n+1} x_{n-1} = x_n + a", "--max", "30", "--set", "a=1", "--json");
        Assert.Equal(0, exit);
        Assert.Equal(5, JsonDocument.Parse(stdout).RootElement.GetProperty("period").GetInt32());
    }

    [Fact]
    public void Text_ToddPeriod8()
    {
        // Todd's recurrence x_{n+3} x_n = 1 + x_{n+1} + x_{n+2} has period 8 (Todd 1975; Kocic–Ladas 1993).
        var (exit, stdout, _) = Run("period", "x_{n+3} x_n = 1 + x_{n+1} + x_{n+2}");
        Assert.Equal(0, exit);
        Assert.Contains("period 8", stdout);
    }

    [Fact]
    public void UndefinedMap_Exit1()
    {
        var (exit, stdout, stderr) = Run("period", "x_{n+1} = 1/y_n; y_{n+1} = x_n - x_n", "--max", "4");
        Assert.Equal(1, exit);
        Assert.Equal("", stdout);
        Assert.Contains("not defined", stderr);
    }

    [Theory]
    [InlineData("period")]
    [InlineData("period", "x_{n+1} = x_n", "--max", "0")]
    [InlineData("period", "x_{n+1} = x_n", "--points", "x")]
    [InlineData("period", "T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n}")]
    [InlineData("period", "x_{n+1} = a x_n", "--set", "b=2")]
    public void BadInput_Exit2_OneLine(params string[] args)
    {
        var (exit, stdout, stderr) = Run(args);
        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
    }
}
