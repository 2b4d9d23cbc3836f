using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Text;

namespace Integrable.Tests.Text;

public class ExpressionParserTests
{
    // Symbol values used by the precedence table; chosen distinct so that a wrong grouping changes the value.
    private static readonly Dictionary<string, Rational> Values = new()
    {
        ["x"] = 3, ["y"] = 5, ["z"] = 7, ["g"] = new Rational(11, 2), ["R"] = -4,
        ["a"] = new Rational(2, 3), ["b"] = -13, ["n"] = 19,
        ["x_n"] = 2, ["x_{n+1}"] = 13, ["x_{n-1}"] = 17, ["T_{a+1,n}"] = 23, ["T_{a-1,n}"] = 29, ["T_{a,n-1}"] = 31,
        ["α"] = 37, ["β"] = 41, ["x1"] = 43, ["y2"] = 47, ["ab"] = 53, ["f"] = 59, ["e5"] = 61,
    };

    private static readonly Rational X = 3, Y = 5, Z = 7, G = new(11, 2), R = -4;

    // Each expected value is computed with Rational arithmetic following the documented precedence rules.
    public static TheoryData<string, Rational> PrecedenceCases => new()
    {
        { "1 + 2*3", 7 },
        { "2^3^2", 512 },
        { "(2^3)^2", 64 },
        { "-x^2", -(X * X) },
        { "(-x)^2", X * X },
        { "-2^2", -4 },
        { "x^-1", 1 / X },
        { "x^(-2)", 1 / (X * X) },
        { "x^-1^2", 1 / X },
        { "x^(1+1)", X * X },
        { "x^(4/2)", X * X },
        { "x^2.0", X * X },
        { "2^-2", new Rational(1, 4) },
        { "x^0", 1 },
        { "0^0", 1 },
        { "2 x y^3", 2 * X * Y * Y * Y },
        { "2x", 2 * X },
        { "2x^2", 2 * X * X },
        { "x^2y", X * X * Y },
        { "1/2 x", X / 2 },
        { "1/2x", X / 2 },
        { "(1/2)x", X / 2 },
        { "2/3 x^2", new Rational(2, 3) * X * X },
        { "x/y z", X / Y * Z },
        { "x/y/z", X / Y / Z },
        { "x/(y z)", X / (Y * Z) },
        { "10/5/2", 1 },
        { "x - y - z", X - Y - Z },
        { "x - (y - z)", X - (Y - Z) },
        { "x - y + z", X - Y + Z },
        { "2 -x", 2 - X },
        { "x*-y", -(X * Y) },
        { "x/-y", -(X / Y) },
        { "-x y", -(X * Y) },
        { "- -x", X },
        { "+x", X },
        { "x + +y", X + Y },
        { "x + -y", X - Y },
        { "x - -y", X + Y },
        { "g R (R + 1)", G * R * (R + 1) },
        { "(x+1)(x-1)", (X + 1) * (X - 1) },
        { "(x)(y)(z)", X * Y * Z },
        { "2(x)", 2 * X },
        { "x (y + z)^2 / 4", X * (Y + Z) * (Y + Z) / 4 },
        { "x_n x_{n-1}", 2 * 17 },
        { "x_{n+1} x_{n-1} - x_n^2", 13 * 17 - 4 },
        { "x_{ n + 1 }x_{n}", 13 * 2 },
        { "T_{a+1,n} T_{a-1,n} + T_{a, n-1}", 23 * 29 + 31 },
        { "3*x^2*y^-1 - 1/2*z + 1", 3 * X * X / Y - Z / 2 + 1 },
        { "2.5x", new Rational(5, 2) * X },
        { "0.125", new Rational(1, 8) },
        { "007", 7 },
        { "123456789012345678901234567890 / 10", Rational.Parse("12345678901234567890123456789") },
        { "α β^2", 37 * 41 * 41 },
        { "x1 y2", 43 * 47 },
        { "ab x", 53 * X },
        { "a b", new Rational(2, 3) * -13 },
        { "n", 19 },
        { "f(x + 1)", 59 * (X + 1) },
        { "2e5", 2 * 61 },
        { "x 2", X * 2 },
        { "(x + 1)2", (X + 1) * 2 },
        { "x\t+\ny", X + Y },
    };

    [Theory]
    [MemberData(nameof(PrecedenceCases))]
    public void Parse_PrecedenceAndJuxtaposition_EvaluatesAsDocumented(string text, Rational expected)
    {
        var value = ExpressionEvaluator.Evaluate(ExpressionParser.Parse(text), RationalField.Instance, Values);
        Assert.Equal(expected, value);
    }

    [Fact]
    public void Parse_SubscriptForms_GiveTheSameCanonicalSymbol()
    {
        var a = Assert.IsType<SymbolExpression>(ExpressionParser.Parse("x_n"));
        var b = Assert.IsType<SymbolExpression>(ExpressionParser.Parse("x_{n}"));
        var c = Assert.IsType<SymbolExpression>(ExpressionParser.Parse("x_{ n }"));
        Assert.Equal("x_n", a.Name);
        Assert.Equal(a, b);
        Assert.Equal(a, c);
        Assert.Equal(a.GetHashCode(), b.GetHashCode());
        Assert.Equal("x", a.BaseName);
        Assert.Equal("n", Assert.IsType<SymbolExpression>(Assert.Single(a.Subscripts)).Name);
        Assert.Equal("x_1", Assert.IsType<SymbolExpression>(ExpressionParser.Parse("x_{1}")).Name);
        Assert.Equal("x_12", Assert.IsType<SymbolExpression>(ExpressionParser.Parse("x_12")).Name);
        Assert.Equal("x_nm", Assert.IsType<SymbolExpression>(ExpressionParser.Parse("x_nm")).Name);
        Assert.Equal("x_{n*m}", Assert.IsType<SymbolExpression>(ExpressionParser.Parse("x_{n m}")).Name);
        Assert.Equal("x_{a_1}", Assert.IsType<SymbolExpression>(ExpressionParser.Parse("x_{a_1}")).Name);
        Assert.Equal("x_{-1}", Assert.IsType<SymbolExpression>(ExpressionParser.Parse("x_{-1}")).Name);
        Assert.Equal("x_{1.5}", Assert.IsType<SymbolExpression>(ExpressionParser.Parse("x_{1.5}")).Name);
    }

    [Fact]
    public void Parse_StructuredSubscripts_KeepTheirExpressions()
    {
        var s = Assert.IsType<SymbolExpression>(ExpressionParser.Parse("T_{ a + 1 , n - 1 }"));
        Assert.Equal("T_{a+1,n-1}", s.Name);
        Assert.Equal("T", s.BaseName);
        Assert.Equal(2, s.Subscripts.Count);
        var first = Assert.IsType<SumExpression>(s.Subscripts[0]);
        Assert.Equal("a", Assert.IsType<SymbolExpression>(first.Terms[0].Value).Name);
        Assert.False(first.Terms[1].IsSubtracted);
        Assert.Equal(Rational.One, Assert.IsType<NumberExpression>(first.Terms[1].Value).Value);
        var second = Assert.IsType<SumExpression>(s.Subscripts[1]);
        Assert.True(second.Terms[1].IsSubtracted);
        Assert.Equal("x_{n+1}", Assert.IsType<SymbolExpression>(ExpressionParser.Parse("x_{n+1}")).Name);
        Assert.NotEqual(ExpressionParser.Parse("x_{n+1}"), ExpressionParser.Parse("x_{1+n}"));
    }

    [Fact]
    public void Parse_Juxtaposition_SharesTheLevelOfDivision()
    {
        var p = Assert.IsType<ProductExpression>(ExpressionParser.Parse("1/2 x"));
        Assert.Equal(new[] { false, true, false }, p.Factors.Select(f => f.IsDivisor));
        Assert.Equal(ExpressionParser.Parse("1/2*x"), p);
        Assert.Equal(ExpressionParser.Parse("2*x*y"), ExpressionParser.Parse("2x y"));
    }

    [Fact]
    public void Parse_PowerNode_KeepsExponentTextAndValue()
    {
        var p = Assert.IsType<PowerExpression>(ExpressionParser.Parse("x^(1+1)"));
        Assert.Equal(2, p.ExponentValue);
        Assert.IsType<SumExpression>(p.Exponent);
        Assert.Equal(-1, Assert.IsType<PowerExpression>(ExpressionParser.Parse("x^-1")).ExponentValue);
        var nested = Assert.IsType<PowerExpression>(ExpressionParser.Parse("2^3^2"));
        Assert.Equal(9, nested.ExponentValue);
        Assert.Equal(PowerExpression.MaxExponent, Assert.IsType<PowerExpression>(ExpressionParser.Parse("x^1000000")).ExponentValue);
    }

    [Fact]
    public void Parse_Equality_IgnoresSpacingButKeepsBracketNesting()
    {
        Assert.Equal(ExpressionParser.Parse("x+1"), ExpressionParser.Parse("  x + 1 "));
        Assert.Equal(ExpressionParser.Parse("x+1").GetHashCode(), ExpressionParser.Parse("  x + 1 ").GetHashCode());
        Assert.Equal(ExpressionParser.Parse("x"), ExpressionParser.Parse("((x))"));
        Assert.NotEqual(ExpressionParser.Parse("a+(b+c)"), ExpressionParser.Parse("a+b+c"));
        Assert.NotEqual(ExpressionParser.Parse("x - y"), ExpressionParser.Parse("x + -y"));
        Assert.NotEqual(ExpressionParser.Parse("2"), ExpressionParser.Parse("x"));
    }

    [Fact]
    public void Parse_Spans_PointIntoTheInputAndIncludeBrackets()
    {
        const string text = "x_{n+1} + 1/(y - y)";
        var sum = Assert.IsType<SumExpression>(ExpressionParser.Parse(text));
        Assert.Equal(new SourceSpan(text, 0, text.Length), sum.Span);
        Assert.Equal("x_{n+1}", sum.Terms[0].Value.Span.Text);
        var quotient = Assert.IsType<ProductExpression>(sum.Terms[1].Value);
        Assert.Equal("1/(y - y)", quotient.Span.Text);
        Assert.Equal("(y - y)", quotient.Factors[1].Value.Span.Text);
        Assert.Equal(12, quotient.Factors[1].Value.Span.Start);
        var neg = Assert.IsType<NegationExpression>(ExpressionParser.Parse(" -x^2"));
        Assert.Equal("-x^2", neg.Span.Text);
        Assert.Equal("x^2", neg.Operand.Span.Text);
    }

    [Fact]
    public void ParseEquation_SplitsAtTheEqualsSign()
    {
        var eq = ExpressionParser.ParseEquation("x_{n+1} x_{n-1} = x_n^2 + 1");
        Assert.Equal(ExpressionParser.Parse("x_{n+1}*x_{n-1}"), eq.Left);
        Assert.Equal(ExpressionParser.Parse("x_n^2 + 1"), eq.Right);
        Assert.Equal("x_{n+1}*x_{n-1} = x_n^2 + 1", eq.ToString());
        Assert.Equal(eq, ExpressionParser.ParseEquation(eq.ToString()));
    }

    [Fact]
    public void ParseList_SplitsAtTopLevelCommasOnly()
    {
        var items = ExpressionParser.ParseList("x_n, T_{a,n} + 1, 2");
        Assert.Equal(3, items.Count);
        Assert.Equal("T_{a,n} + 1", items[1].ToString());
        Assert.Single(ExpressionParser.ParseList("T_{a,n}"));
        var eqs = ExpressionParser.ParseEquationList("x_{n+1} = y_n, y_{n+1} = x_n + T_{a,n}");
        Assert.Equal(2, eqs.Count);
        Assert.Equal("x_n + T_{a,n}", eqs[1].Right.ToString());
    }

    [Fact]
    public void Parse_LaurentPolynomialPrintStyle_ReadsBack()
    {
        // The explicit-'*' style used by the polynomial printer, variable names verbatim.
        var e = ExpressionParser.Parse("-3*x_{n+1}^2*T_{a,n-1}^-1 - 1/2*z + 1");
        var values = new Dictionary<string, Rational> { ["x_{n+1}"] = 2, ["T_{a,n-1}"] = 3, ["z"] = 5 };
        Assert.Equal(new Rational(-3 * 4, 3) - new Rational(5, 2) + 1, ExpressionEvaluator.Evaluate(e, RationalField.Instance, values));
        Assert.Equal(new[] { "x_{n+1}", "T_{a,n-1}", "z" }, ExpressionEvaluator.Symbols(e).Select(s => s.Name));
    }

    [Fact]
    public void Parse_HugeInteger_IsExact()
    {
        string digits = string.Concat(Enumerable.Repeat("9876543210", 50));
        var n = Assert.IsType<NumberExpression>(ExpressionParser.Parse(digits));
        Assert.Equal(digits, n.Value.ToString());
        var d = Assert.IsType<NumberExpression>(ExpressionParser.Parse("0." + digits));
        Assert.Equal(Rational.Parse("0." + digits), d.Value);
    }

    [Fact]
    public void Parse_DeepestAllowedNesting_Parses()
    {
        int limit = ExpressionParser.MaxNestingDepth;
        var parens = new string('(', limit) + "x" + new string(')', limit);
        Assert.Equal(ExpressionParser.Parse("x"), ExpressionParser.Parse(parens));
        Assert.IsType<NegationExpression>(ExpressionParser.Parse(new string('-', limit) + "x"));
        // Four tree levels per nesting level (power, symbol, sum, product): the tree stays within Expression.MaxDepth.
        var e = ExpressionParser.Parse(NestedSubscripts(limit));
        Assert.True(e.Depth > 3 * limit && e.Depth <= Expression.MaxDepth, $"depth {e.Depth}");
        Assert.Equal(e, ExpressionParser.Parse(e.ToString()));
    }

    /// <summary>x_{1+2x_{1+2…y…}^2}^2 with <paramref name="levels"/> brace levels.</summary>
    internal static string NestedSubscripts(int levels)
    {
        var sb = new System.Text.StringBuilder();
        for (int i = 0; i < levels; i++) sb.Append("x_{1+2");
        sb.Append('y');
        for (int i = 0; i < levels; i++) sb.Append("}^2");
        return sb.ToString();
    }
}
