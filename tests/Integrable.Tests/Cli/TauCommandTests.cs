using System.Text.Json;

namespace Integrable.Tests.Cli;

public class TauCommandTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    [Fact]
    public void Json_Quadrangulations_ContractFields()
    {
        // Bouttier, Di Francesco, Guitter, "Geodesic distance in planar graphs", Nucl. Phys. B 663 (2003) 535–567.
        var (exit, stdout, stderr) = Run("tau", "R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})", "--parameter", "g", "--boundary", "R_0=0", "--json");
        Assert.True(exit == 0, stderr);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.Equal("R_n = R_∞ τ_n τ_{n+3} / (τ_{n+1} τ_{n+2})", root.GetProperty("substitution").GetString());
        Assert.Equal("τ_n = 1 - lambda^n", root.GetProperty("tau").GetString());
        Assert.True(root.GetProperty("verified").GetBoolean());
        Assert.Contains("τ_{n+4}", root.GetProperty("bilinear").GetString(), StringComparison.Ordinal);
        Assert.Contains(root.GetProperty("relations").EnumerateArray(), r => r.GetString()!.StartsWith("R_∞ = ", StringComparison.Ordinal));
    }

    [Fact]
    public void Json_QSystemInitial_NPlusOne()
    {
        // Q_{n+1}Q_{n-1} = Q_n^2 - 1, Q_0 = 1, Q_1 = 2: Q_n = n + 1 (Kirillov–Reshetikhin; common knowledge).
        var (exit, stdout, _) = Run("tau", "Q_{n+1} Q_{n-1} = Q_n^2 - 1", "--initial", "1,2", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.Equal("τ_n = n + 1", root.GetProperty("tau").GetString());
        Assert.Equal("x_n = τ_n".Replace("x", "Q", StringComparison.Ordinal), root.GetProperty("substitution").GetString());
        Assert.True(root.GetProperty("verified").GetBoolean());
    }

    [Fact]
    public void Text_SomosReduction_FindsBilinear()
    {
        // x_{n+1} x_n² x_{n-1} = a x_n + b ⇔ Somos-4 via x_n = τ_{n+1}τ_{n-1}/τ_n² (Hone, Bull. LMS 37 (2005) 161).
        var (exit, stdout, _) = Run("tau", "x_{n+1} x_n^2 x_{n-1} = a x_n + b");
        Assert.Equal(0, exit);
        Assert.Contains("x_n = τ_{n+1} τ_{n-1} / τ_n^2", stdout, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("R_n = 1 + g R_n (R_{n-1} + R_{n+1})", "--parameter", "h", "--boundary", "R_0=0")]
    [InlineData("R_n = 1 + g R_n (R_{n-1} + R_{n+1})", "--boundary", "R_0=0")]
    [InlineData("Q_{n+1} Q_{n-1} = Q_n^2 - 1", "--initial", "1,2,3")]
    [InlineData("Q_{n+1} Q_{n-1} = Q_n^2 - 1", "--initial", "1,x")]
    [InlineData("Q_{n+1} Q_{n-1} = = Q_n^2 - 1")]
    public void BadInput_Exit2_OneLine(params string[] rest)
    {
        var (exit, _, stderr) = Run(["tau", .. rest]);
        Assert.Equal(2, exit);
        Assert.Single(stderr.Trim().Split('\n'));
    }
}
