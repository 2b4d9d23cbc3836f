using System.Text.Json;

namespace Integrable.Tests.Cli;

public class IterateCommandTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    [Fact]
    public void Json_Somos4_ValuesIncludeInitialAndMatchOeis()
    {
        // Somos-4 integers, OEIS A006720.
        var (exit, stdout, _) = Run("iterate", "x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2", "--initial", "1,1,1,1", "--steps", "12", "--json");
        Assert.Equal(0, exit);
        var values = JsonDocument.Parse(stdout).RootElement.GetProperty("values").EnumerateArray().Select(v => v.GetString()!).ToArray();
        Assert.Equal(16, values.Length);
        Assert.Equal(["1", "1", "1", "1", "2", "3", "7", "23", "59", "314", "1529", "8209", "83313", "620297", "7869898", "126742987"], values);
    }

    [Fact]
    public void Json_ModAndFloat_SwitchDomain()
    {
        var (exit, stdout, _) = Run("iterate", "x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2", "--initial", "1,1,1,1", "--steps", "12", "--mod", "101", "--json");
        Assert.Equal(0, exit);
        var values = JsonDocument.Parse(stdout).RootElement.GetProperty("values").EnumerateArray().Select(v => v.GetString()!).ToArray();
        Assert.Equal((126742987 % 101).ToString(), values[^1]);
        (exit, stdout, _) = Run("iterate", "x_{n+1} x_{n-1} = x_n + 1", "--initial", "1/2,3", "--steps", "5", "--float", "--json");
        Assert.Equal(0, exit);
        var f = JsonDocument.Parse(stdout).RootElement.GetProperty("values").EnumerateArray().Select(v => double.Parse(v.GetString()!, System.Globalization.CultureInfo.InvariantCulture)).ToArray();
        Assert.Equal(0.5, f[5], 12); // period 5 (Lyness 1942)
    }

    [Fact]
    public void Parameters_SetWithSet()
    {
        var (exit, stdout, _) = Run("iterate", "R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})", "--initial", "1/2,2/3", "--set", "g=1/12", "--steps", "1", "--json");
        Assert.Equal(0, exit);
        var values = JsonDocument.Parse(stdout).RootElement.GetProperty("values").EnumerateArray().Select(v => v.GetString()!).ToArray();
        // R_2 = (R_1 - 1)/(g R_1) - R_0 - R_1 with g = 1/12: (-1/3)/(1/18) - 1/2 - 2/3 = -6 - 7/6 = -43/6.
        Assert.Equal("-43/6", values[2]);
    }

    [Fact]
    public void SingularStep_ExitCode1_NamesStep()
    {
        var (exit, stdout, stderr) = Run("iterate", "x_{n+1} x_{n-1} = x_n + 1", "--initial", "1,-1", "--steps", "5");
        Assert.Equal(1, exit);
        Assert.Equal("", stdout);
        Assert.Contains("x_4", stderr);
    }

    [Theory]
    [InlineData("iterate")]
    [InlineData("iterate", "x_{n+1} = x_n +", "--initial", "1")]
    [InlineData("iterate", "x_{n+1}^2 = x_n", "--initial", "1")]
    [InlineData("iterate", "x_{n+1} = x_n + 1")]
    [InlineData("iterate", "x_{n+1} = x_n + 1", "--initial", "1,2")]
    [InlineData("iterate", "x_{n+1} = x_n + 1", "--initial", "one")]
    [InlineData("iterate", "x_{n+1} = g x_n", "--initial", "1")]
    [InlineData("iterate", "x_{n+1} = g x_n", "--initial", "1", "--set", "h=2")]
    [InlineData("iterate", "x_{n+1} = g x_n", "--initial", "1", "--set", "g")]
    [InlineData("iterate", "x_{n+1} = x_n + 1", "--initial", "1", "--mod", "100")]
    [InlineData("iterate", "x_{n+1} = x_n + 1", "--initial", "1", "--mod", "7", "--float")]
    [InlineData("iterate", "x_{n+1} = x_n + 1", "--initial", "1", "--steps", "-1")]
    [InlineData("iterate", "x_{n+1} = x_n / 7", "--initial", "1/7", "--mod", "7")]
    public void BadInput_ExitCode2_OneLine_NoStdout(params string[] args)
    {
        var (exit, stdout, stderr) = Run(args);
        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
    }
}
