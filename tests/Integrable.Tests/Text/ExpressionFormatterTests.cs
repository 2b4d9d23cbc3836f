using Integrable.Numbers;
using Integrable.Text;

namespace Integrable.Tests.Text;

public class ExpressionFormatterTests
{
    public static TheoryData<string, string> CanonicalTexts => new()
    {
        { "2x y^3 - 1/2 z", "2*x*y^3 - 1/2*z" },
        { "3*x^2*y^-1 - 1/2*z + 1", "3*x^2*y^-1 - 1/2*z + 1" },
        { "-x^2", "-x^2" },
        { "(-x)^2", "(-x)^2" },
        { "-(a b)", "-(a*b)" },
        { "-a b", "-a*b" },
        { "-(a + b)", "-(a + b)" },
        { "a + (b + c)", "a + (b + c)" },
        { "(a + b) + c", "(a + b) + c" },
        { "a - (b - c)", "a - (b - c)" },
        { "a - b c", "a - b*c" },
        { "a*(b*c)", "a*(b*c)" },
        { "(a*b)*c", "(a*b)*c" },
        { "a/(b c)", "a/(b*c)" },
        { "a/b/c", "a/b/c" },
        { "a/(b/c)", "a/(b/c)" },
        { "x^(1+1)", "x^(1 + 1)" },
        { "x^(2*3)", "x^(2*3)" },
        { "x^-1", "x^-1" },
        { "x^(-2)", "x^-2" },
        { "x^-(2)", "x^-2" },
        { "2^3^2", "2^3^2" },
        { "(2^3)^2", "(2^3)^2" },
        { "(x y)^2", "(x*y)^2" },
        { "(x + 1)^2", "(x + 1)^2" },
        { "x_{ n + 1 }", "x_{n+1}" },
        { "x_{n - 1}", "x_{n-1}" },
        { "T_{a+1, n}", "T_{a+1,n}" },
        { "T_{2 a, -n}", "T_{2*a,-n}" },
        { "x_{n}", "x_n" },
        { "x_{ 3 }", "x_3" },
        { "2.50", "2.5" },
        { "0.0625", "0.0625" },
        { "007", "7" },
        { "x + -y", "x + -y" },
        { "x - -y", "x - -y" },
        { "--x", "--x" },
        { "+x", "x" },
        { "(x+1)(x-1)", "(x + 1)*(x - 1)" },
        { "g R (R + 1)", "g*R*(R + 1)" },
        { "x_n x_{n-1}", "x_n*x_{n-1}" },
        { "1/2 x", "1/2*x" },
        { "α β", "α*β" },
        { "((x))", "x" },
        { "x*-y", "x*-y" },
        { "x/-y", "x/-y" },
        { "-2^-2", "-2^-2" },
    };

    [Theory]
    [MemberData(nameof(CanonicalTexts))]
    public void ToText_HandCases_AreCanonicalAndParseBack(string input, string expected)
    {
        var e = ExpressionParser.Parse(input);
        string text = ExpressionFormatter.ToText(e);
        Assert.Equal(expected, text);
        Assert.Equal(e, ExpressionParser.Parse(text));
        Assert.Equal(text, e.ToString());
    }

    [Fact]
    public void ToText_NodesBuiltInCode_ParseBack()
    {
        var x = new SymbolExpression("x");
        var n = new SymbolExpression("n");
        var shifted = new SymbolExpression("x", [new SumExpression([new(n), new(new NumberExpression(1))])]);
        Assert.Equal("x_{n+1}", shifted.Name);
        var e = new SumExpression(
        [
            new(new ProductExpression([new(new NumberExpression(3)), new(new PowerExpression(x, 2)), new(new PowerExpression(shifted, -1))])),
            new(new ProductExpression([new(new NumberExpression(1)), new(new NumberExpression(2), IsDivisor: true), new(new SymbolExpression("z"))]), IsSubtracted: true),
            new(new NumberExpression(new Rational(1, 8))),
        ]);
        Assert.Equal("3*x^2*x_{n+1}^-1 - 1/2*z + 0.125", e.ToString());
        Assert.Equal(e, ExpressionParser.Parse(e.ToString()));
    }

    public static TheoryData<string, string> LatexCases => new()
    {
        { "x_{n+1}^2/(x_n + 1)", @"\frac{x_{n+1}^{2}}{x_{n} + 1}" },
        { "3*x^2*y^-1 - 1/2*z + 1", @"3\,x^{2}\,y^{-1} - \frac{1}{2}\,z + 1" },
        { "2*3", @"2\cdot 3" },
        { "(x+1)^2", @"\left(x + 1\right)^{2}" },
        { "alpha x_n", @"\alpha\,x_{n}" },
        { "α^2 + Ω", @"\alpha^{2} + \Omega" },
        { "-(a b)", @"-\left(a\,b\right)" },
        { "a/b/c", @"\frac{a}{b\,c}" },
        { "x/2", @"\frac{1}{2}\,x" },
        { "3x/4", @"\frac{3}{4}\,x" },
        { "1/(x+1)", @"\frac{1}{x + 1}" },
        { "(x+1)/2", @"\frac{1}{2}\,\left(x + 1\right)" },
        { "(x+1)(x-1)", @"\left(x + 1\right)\,\left(x - 1\right)" },
        { "a (-b)", @"a\,\left(-b\right)" },
        { "ab + x1", @"\mathit{ab} + \mathit{x1}" },
        { "αβ", @"\mathit{\alpha \beta}" },
        { "T_{a+1,n}", @"T_{a+1,n}" },
        { "2^3^2", @"2^{3^{2}}" },
        { "(x^2)^3", @"\left(x^{2}\right)^{3}" },
        { "0.5 x", @"0.5\,x" },
        { "(-x)/2", @"\frac{1}{2}\,\left(-x\right)" },
        { "x/2 (-y)", @"\frac{1}{2}\,x\,\left(-y\right)" },
        { "-x/y", @"\frac{-x}{y}" },
        { "x 2", @"x\cdot 2" },
    };

    [Theory]
    [MemberData(nameof(LatexCases))]
    public void ToLatex_HandCases(string input, string expected) =>
        Assert.Equal(expected, ExpressionFormatter.ToLatex(ExpressionParser.Parse(input)));

    [Fact]
    public void ToLatex_Equation()
    {
        var eq = ExpressionParser.ParseEquation("x_{n+1} x_{n-1} = x_n^2 + 1");
        Assert.Equal(@"x_{n+1}\,x_{n-1} = x_{n}^{2} + 1", ExpressionFormatter.ToLatex(eq));
    }
}
