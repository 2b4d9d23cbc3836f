using System.Text.Json;
using Integrable.Polynomials;

namespace Integrable.Tests.Cli;

public class MutateCommandTests
{
    private static (int, string, string) Run(params string[] a) => CommandLineAppTests.Run(a);

    [Fact]
    public void Json_A2_VariablesMatrixAndValues()
    {
        // Type A_2 after μ_1, μ_2, μ_1: cluster ((x_1 + 1)/x_2, (x_1 + x_2 + 1)/(x_1 x_2)) and matrix -B
        // (Fomin–Zelevinsky, Cluster algebras I, 2002, Example 2.5); at x_1 = x_2 = 1 the values are 2 and 3.
        var (exit, stdout, stderr) = Run("mutate", "--matrix", "[[0,1],[-1,0]]", "--sequence", "1,2,1", "--initial", "1,1", "--json");
        Assert.Equal(0, exit);
        Assert.Equal("", stderr);
        var root = JsonDocument.Parse(stdout).RootElement;
        var ring = new LaurentPolynomialRing("x_1", "x_2");
        var variables = root.GetProperty("variables").EnumerateArray().Select(v => LaurentPolynomial.Parse(ring, v.GetString()!)).ToArray();
        Assert.Equal([LaurentPolynomial.Parse(ring, "(x_1 + 1)/x_2"), LaurentPolynomial.Parse(ring, "(x_1 + x_2 + 1)/(x_1 x_2)")], variables);
        var matrix = root.GetProperty("matrix").EnumerateArray().Select(r => r.EnumerateArray().Select(e => e.GetInt32()).ToArray()).ToArray();
        Assert.Equal([[0, -1], [1, 0]], matrix);
        Assert.Equal(["2", "3"], root.GetProperty("values").EnumerateArray().Select(v => v.GetString()!).ToArray());
    }

    [Fact]
    public void Json_NoInitial_NoValuesField_FrozenRowsKept()
    {
        var (exit, stdout, _) = Run("mutate", "--matrix", "[[0,1],[-1,0],[1,0]]", "--sequence", "1", "--json");
        Assert.Equal(0, exit);
        var root = JsonDocument.Parse(stdout).RootElement;
        Assert.False(root.TryGetProperty("values", out _));
        var ring = new LaurentPolynomialRing("x_1", "x_2", "y_1");
        Assert.Equal(LaurentPolynomial.Parse(ring, "(x_2 + y_1)/x_1"), LaurentPolynomial.Parse(ring, root.GetProperty("variables")[0].GetString()!));
        Assert.Equal(3, root.GetProperty("matrix").GetArrayLength());
        Assert.Equal(-1, root.GetProperty("matrix")[2][0].GetInt32());
    }

    [Fact]
    public void NamedType_Text_PentagonReturns()
    {
        // μ_1 μ_2 μ_1 μ_2 μ_1 on A_2 swaps the two initial variables (period 5; Fomin–Zelevinsky 2002).
        var (exit, stdout, _) = Run("mutate", "--type", "A2", "--sequence", "1 2 1 2 1", "--initial", "2,7");
        Assert.Equal(0, exit);
        Assert.Contains("position 1: x_2    = 7", stdout);
        Assert.Contains("position 2: x_1    = 2", stdout);
        Assert.Contains("matrix: [[0,-1],[1,0]]", stdout);
    }

    [Fact]
    public void ZeroDivision_ExitCode1()
    {
        var (exit, stdout, stderr) = Run("mutate", "--type", "A2", "--sequence", "1", "--initial", "0,1");
        Assert.Equal(1, exit);
        Assert.Equal("", stdout);
        Assert.Contains("direction 1", stderr);
    }

    [Theory]
    [InlineData("mutate", "--sequence", "1")]
    [InlineData("mutate", "--matrix", "[[0,1],[-1,0]]")]
    [InlineData("mutate", "--matrix", "[[0,1],[-1,0]]", "--type", "A2", "--sequence", "1")]
    [InlineData("mutate", "--matrix", "[[0,1],[1,0]]", "--sequence", "1")]
    [InlineData("mutate", "--matrix", "[[0,1],[-1,0]", "--sequence", "1")]
    [InlineData("mutate", "--matrix", "[[0,1],\n[-1,0]]]", "--sequence", "1")]
    [InlineData("mutate", "--type", "Q7", "--sequence", "1")]
    [InlineData("mutate", "--type", "A2", "--sequence", "3")]
    [InlineData("mutate", "--type", "A2", "--sequence", "0")]
    [InlineData("mutate", "--type", "A2", "--sequence", "1,,2")]
    [InlineData("mutate", "--type", "A2", "--sequence", "1", "--initial", "1")]
    [InlineData("mutate", "--type", "A2", "--sequence", "1", "--initial", "1,x")]
    [InlineData("mutate", "--type", "A2", "--sequence", "1", "extra")]
    public void BadInput_ExitCode2_OneLine_NoStdout(params string[] args)
    {
        var (exit, stdout, stderr) = Run(args);
        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
        Assert.StartsWith("integrable: ", stderr);
    }
}
