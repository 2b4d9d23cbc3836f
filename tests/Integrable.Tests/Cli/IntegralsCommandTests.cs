using System.Text.Json;
using Integrable.Text;

namespace Integrable.Tests.Cli;

public class IntegralsCommandTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    [Fact]
    public void Json_McMillan_Contract()
    {
        // McMillan 1971: x_{n+1} + x_{n-1} = 2μx_n/(1 − x_n²) preserves x²y² − x² − y² + 2μxy.
        var (exit, stdout, _) = Run("integrals", "x_{n+1} + x_{n-1} = 2 m x_n/(1 - x_n^2)", "--degree", "4", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        var integrals = root.GetProperty("integrals").EnumerateArray().Select(e => e.GetString()!).ToArray();
        var text = Assert.Single(integrals);
        Assert.Equal(1, root.GetProperty("independent").GetInt32());
        Assert.True(root.GetProperty("verified").GetBoolean());
        Assert.True(root.GetProperty("complete").GetBoolean());
        // Written in the equation's own unknowns and parameters; parses back.
        var symbols = ExpressionEvaluator.Symbols(ExpressionParser.Parse(text)).Select(s => s.Name).ToHashSet();
        Assert.Equal(["m", "x_n", "x_{n+1}"], symbols.Order(StringComparer.Ordinal));
    }

    [Fact]
    public void Json_LynessRational_OneRationalIntegral()
    {
        // Lyness 1942; Kocic–Ladas 1993: (x+1)(y+1)(x+y+a)/(xy).
        var (exit, stdout, _) = Run("integrals", "x_{n+1} x_{n-1} = a + x_n", "--degree", "3", "--rational", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.Equal(1, root.GetProperty("integrals").GetArrayLength());
        Assert.Equal(1, root.GetProperty("rational").GetInt32());
        Assert.Contains("1/(x_n*x_{n+1})", root.GetProperty("measures").EnumerateArray().Select(e => e.GetString()));
    }

    [Fact]
    public void Json_Periodic_Phases()
    {
        // Asymmetric QRT (Quispel–Roberts–Thompson 1989), see FirstIntegralsTests.Find_AlternatingCoefficient_PairOfIntegrals.
        var (exit, stdout, _) = Run("integrals", "x_{n+1} + x_n + x_{n-1} = -b/x_n", "--degree", "3", "--periodic", "b=1,c", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.Equal(2, root.GetProperty("period").GetInt32());
        Assert.Equal(2, root.GetProperty("phases")[0].GetArrayLength());
    }

    [Fact]
    public void Text_AndLatex_Print()
    {
        var (exit, stdout, _) = Run("integrals", "x_{n+1} + x_n + x_{n-1} = a + b/x_n", "--degree", "3");
        Assert.Equal(0, exit);
        Assert.Contains("I = ", stdout);
        Assert.Contains("independent: 1", stdout);
        (exit, stdout, _) = Run("integrals", "x_{n+1} + x_n + x_{n-1} = a + b/x_n", "--degree", "3", "--latex");
        Assert.Equal(0, exit);
        Assert.Contains("\\begin{aligned}", stdout);
    }

    [Theory]
    [InlineData("x_{n+1} + x_{n-1} = ")]
    [InlineData("x_{n+1} + x_{n-1} = n/x_n")]
    [InlineData("x_{n+1} + x_{n-1} = 1/x_n", "--degree", "0")]
    [InlineData("x_{n+1} + x_{n-1} = 1/x_n", "--set", "q=1")]
    [InlineData("x_{n+1} + x_{n-1} = b/x_n", "--periodic", "b=1")]
    public void BadInput_Exit2(params string[] rest)
    {
        var (exit, _, stderr) = Run(["integrals", .. rest]);
        Assert.Equal(2, exit);
        Assert.Single(stderr.Trim().Split('\n'));
    }
}
