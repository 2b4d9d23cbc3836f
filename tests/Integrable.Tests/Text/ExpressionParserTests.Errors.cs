using Integrable.Text;

namespace Integrable.Tests.Text;

public class ExpressionParserErrorTests
{
    // (input, expected position, expected length, a fragment of the reason)
    public static TheoryData<string, int, int, string> MalformedExpressions => new()
    {
        { "", 0, 0, "empty input" },
        { "   ", 3, 0, "empty input" },
        { "x +", 3, 0, "unexpected end of input" },
        { "x*", 2, 0, "unexpected end of input" },
        { "x^", 2, 0, "unexpected end of input" },
        { "-", 1, 0, "unexpected end of input" },
        { "x + )", 4, 1, "unexpected ')'" },
        { "()", 1, 1, "unexpected ')'" },
        { "*x", 0, 1, "unexpected '*'" },
        { "x ^ ^ 2", 4, 1, "unexpected '^'" },
        { "x ** 2", 3, 1, "write powers with '^'" },
        { "(x + 1", 0, 1, "unclosed '('" },
        { "((x)", 0, 1, "unclosed '('" },
        { "x + 1)", 5, 1, "unmatched ')'" },
        { "x y)", 3, 1, "unmatched ')'" },
        { "x_{n+1", 2, 1, "unclosed '{'" },
        { "x_{n+1}}", 7, 1, "unmatched '}'" },
        { "x_{}", 3, 1, "unexpected '}'" },
        { "T_{a,}", 5, 1, "unexpected '}'" },
        { "x_{n)", 4, 1, "unexpected ')'" },
        { "(x}", 2, 1, "unexpected '}'" },
        { "x_", 2, 0, "expected a subscript directly after '_'" },
        { "x_ n", 2, 0, "expected a subscript directly after '_'" },
        { "x _n", 2, 1, "unexpected '_'" },
        { "_n", 0, 1, "unexpected '_'" },
        { "x_(n)", 2, 1, "expected a subscript after '_'" },
        { "x_1.5", 2, 3, "a subscript without braces must be a name or an integer" },
        { "x_n_m", 3, 1, "cannot carry its own subscript" },
        { "x_{n}_m", 5, 1, "cannot carry its own subscript" },
        { "x^y", 2, 1, "contains the symbol 'y'" },
        { "x^(2 y_n)", 5, 3, "contains the symbol 'y_n'" },
        { "x^2.5", 2, 3, "the exponent 5/2 is not an integer" },
        { "x^(1/2)", 2, 5, "the exponent 1/2 is not an integer" },
        { "x^2^-1", 2, 4, "the exponent 1/2 is not an integer" },
        { "x^(1/0)", 5, 1, "division by zero in the exponent" },
        { "x^(0^-1)", 2, 6, "division by zero in the exponent" },
        { "x^1000001", 2, 7, "beyond the limit of ±1000000" },
        { "x^-1000001", 2, 8, "beyond the limit of ±1000000" },
        { "x^(9^9^9)", 5, 3, "beyond the limit" },
        { "x^(2^1000 - 2^1000)", 3, 6, "too large" },
        { "2 3", 2, 1, "missing operator between two numbers" },
        { "x^2 3", 4, 1, "missing operator between two numbers" },
        { "x_1 2", 4, 1, "missing operator between two numbers" },
        { "x = 1", 2, 1, "unexpected '='" },
        { "x, y", 1, 1, "unexpected ','" },
        { "x + é", 4, 1, "unexpected character 'é' (U+00E9)" },
        { "x \u2212 1", 2, 1, "use '-'" },
        { "2 \u00D7 x", 2, 1, "use '*'" },
        { "x\u00B2", 1, 1, "write powers with '^'" },
        { "x + \U0001F600", 4, 2, "U+1F600" },
        { "x\0", 1, 1, "U+0000" },
        { "[x]", 0, 1, "use round brackets" },
        { "2.", 1, 1, "a decimal point must be followed by a digit" },
        { ".5", 0, 1, "a decimal number must start with a digit" },
        { "1.2.3", 3, 1, "unexpected '.'" },
        { "x $ y", 2, 1, "unexpected character '$'" },
        { "(x + (y)", 0, 1, "unclosed '('" },
        { "x + 1 + * 2", 8, 1, "unexpected '*'" },
    };

    [Theory]
    [MemberData(nameof(MalformedExpressions))]
    public void Parse_MalformedInput_ThrowsWithExactPosition(string input, int position, int length, string reason)
    {
        var ex = Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse(input));
        Assert.Equal(input, ex.Input);
        Assert.Equal(position, ex.Position);
        Assert.Equal(length, ex.Length);
        Assert.Contains(reason, ex.Reason);
        Assert.IsAssignableFrom<FormatException>(ex);
    }

    public static TheoryData<string, int, string> MalformedEquations => new()
    {
        { "x + 1", 5, "expected '='" },
        { "x = y = z", 6, "an equation has exactly one '='" },
        { "= x", 0, "unexpected '='" },
        { "x =", 3, "unexpected end of input" },
        { "x = )", 4, "unexpected ')'" },
        { "x = y)", 5, "unmatched ')'" },
        { "", 0, "empty input" },
    };

    [Theory]
    [MemberData(nameof(MalformedEquations))]
    public void ParseEquation_MalformedInput_ThrowsWithExactPosition(string input, int position, string reason)
    {
        var ex = Assert.Throws<ExpressionParseException>(() => ExpressionParser.ParseEquation(input));
        Assert.Equal(position, ex.Position);
        Assert.Contains(reason, ex.Reason);
    }

    [Theory]
    [InlineData("x,", 2)]
    [InlineData(",x", 0)]
    [InlineData("x,,y", 2)]
    [InlineData("x = 1", 2)]
    public void ParseList_MalformedInput_ThrowsWithExactPosition(string input, int position)
    {
        var ex = Assert.Throws<ExpressionParseException>(() => ExpressionParser.ParseList(input));
        Assert.Equal(position, ex.Position);
    }

    [Fact]
    public void ParseEquationList_MissingEqualsInSecondItem_PointsAtIt()
    {
        var ex = Assert.Throws<ExpressionParseException>(() => ExpressionParser.ParseEquationList("x = 1, y"));
        Assert.Equal(8, ex.Position);
        Assert.Contains("expected '='", ex.Reason);
    }

    [Fact]
    public void Parse_LoneSurrogate_IsABadCharacter()
    {
        // Kept out of the theory table: test-case serialization would replace the lone surrogate by U+FFFD.
        var ex = Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse("x + \uD800 y"));
        Assert.Equal(4, ex.Position);
        Assert.Equal(1, ex.Length);
        Assert.Contains("U+D800", ex.Reason);
    }

    [Fact]
    public void Message_ShowsInputAndCaretUnderTheOffendingToken()
    {
        var ex = Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse("x_n + )"));
        Assert.Equal("unexpected ')' at position 6\n  x_n + )\n        ^", ex.Message);
        var atEnd = Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse("x +"));
        Assert.Equal("unexpected end of input at position 3\n  x +\n     ^", atEnd.Message);
        var wide = Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse("x^2.5 + 1"));
        Assert.EndsWith("\n  x^2.5 + 1\n    ^^^", wide.Message);
    }

    [Fact]
    public void Message_LongInput_ShowsAWindowAroundTheError()
    {
        string input = string.Concat(Enumerable.Repeat("x + ", 100)) + ")" + string.Concat(Enumerable.Repeat(" + x", 100));
        var ex = Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse(input));
        Assert.Equal(400, ex.Position);
        var lines = ex.Message.Split('\n');
        Assert.Equal(3, lines.Length);
        Assert.True(lines[1].Length < 100, lines[1]);
        Assert.Equal(')', lines[1][lines[2].IndexOf('^')]);
    }

    [Fact]
    public void Message_TabsAndLineBreaks_KeepTheCaretAligned()
    {
        var ex = Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse("x\t+\n)"));
        var lines = ex.Message.Split('\n');
        Assert.Equal(')', lines[1][lines[2].IndexOf('^')]);
    }

    [Fact]
    public void Parse_HundredThousandNestedBrackets_GivesTheDepthError()
    {
        const int n = 100_000;
        var ex = Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse(new string('(', n) + "x" + new string(')', n)));
        Assert.Equal(ExpressionParser.MaxNestingDepth + 1, ex.Position);
        Assert.Contains($"nested deeper than {ExpressionParser.MaxNestingDepth} levels", ex.Reason);
    }

    [Fact]
    public void Parse_OtherDeepShapes_GiveTheDepthError()
    {
        const int n = 100_000;
        int limit = ExpressionParser.MaxNestingDepth;
        Assert.Equal(limit + 1, Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse(new string('-', n) + "x")).Position);
        Assert.Equal(2 * (limit + 1), Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse(string.Concat(Enumerable.Repeat("2^", n)) + "2")).Position);
        Assert.Equal(3 * (limit + 1), Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse(string.Concat(Enumerable.Repeat("x_{", n)))).Position);
        Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse(ExpressionParserTests.NestedSubscripts(limit + 1)));
        Assert.Throws<ExpressionParseException>(() => ExpressionParser.Parse(new string('(', n)));
    }

    [Fact]
    public void Parse_LongFlatInput_IsNotLimited()
    {
        var sum = Assert.IsType<SumExpression>(ExpressionParser.Parse(string.Concat(Enumerable.Repeat("x/y + ", 20_000)) + "1"));
        Assert.Equal(20_001, sum.Terms.Count);
        Assert.Equal(3, sum.Depth);
    }

    [Fact]
    public void Parse_Null_ThrowsArgumentNull()
    {
        Assert.Throws<ArgumentNullException>(() => ExpressionParser.Parse(null!));
        Assert.Throws<ArgumentNullException>(() => ExpressionParser.ParseEquation(null!));
    }
}
