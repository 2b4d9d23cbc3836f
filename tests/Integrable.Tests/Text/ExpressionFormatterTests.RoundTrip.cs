using CsCheck;
using Integrable.Numbers;
using Integrable.Text;

namespace Integrable.Tests.Text;

public class ExpressionFormatterRoundTripTests
{
    private static readonly Gen<Expression> Number = Gen.Frequency(
        (4, Gen.Int[0, 20].Select(i => (Expression)new NumberExpression(i))),
        (1, Gen.Long[0, long.MaxValue].Select(i => (Expression)new NumberExpression(new Rational(i) * i + 1))),
        (1, Gen.Select(Gen.Int[0, 999], Gen.Int[1, 4]).Select((m, k) => (Expression)new NumberExpression(new Rational(m, (int)Math.Pow(10, k))))),
        (1, Gen.Int[0, 99].Select(m => (Expression)new NumberExpression(new Rational(m, 8)))));

    private static readonly Gen<Expression> PlainSymbol = Gen.OneOf("x", "y", "z", "g", "R", "α", "β2", "ab", "T")
        .Select(name => (Expression)new SymbolExpression(name));

    /// <summary>Constant integer exponents, written in the ways the parser accepts.</summary>
    private static readonly Gen<Expression> Exponent = Gen.Frequency(
        (4, Gen.Int[0, 6].Select(k => (Expression)new NumberExpression(k))),
        (3, Gen.Int[1, 6].Select(k => (Expression)new NegationExpression(new NumberExpression(k)))),
        (1, Gen.Select(Gen.Int[0, 3], Gen.Int[0, 3], Gen.Bool).Select((a, b, sub) =>
            (Expression)new SumExpression([new(new NumberExpression(a)), new(new NumberExpression(b), sub)]))),
        (1, Gen.Select(Gen.Int[0, 3], Gen.Int[0, 2]).Select((a, b) =>
            (Expression)new ProductExpression([new(new NumberExpression(a)), new(new NumberExpression(b))]))),
        (1, Gen.Int[0, 2].Select(k => (Expression)new PowerExpression(new NumberExpression(2), new NumberExpression(k)))));

    private static readonly Gen<Expression> Trees = Gen.Recursive<Expression>((depth, self) =>
    {
        var leaf = Gen.Frequency((2, Number), (3, PlainSymbol));
        if (depth >= 5) return leaf;
        var subscripted = Gen.Select(Gen.OneOf("x", "T", "u"), self.List[1, 3])
            .Select((name, subs) => (Expression)new SymbolExpression(name, subs));
        var negation = self.Select(e => (Expression)new NegationExpression(e));
        var sum = Gen.Select(self, Gen.Select(self, Gen.Bool).Select((e, s) => new SumTerm(e, s)).List[1, 3])
            .Select((first, rest) => (Expression)new SumExpression([new SumTerm(first), .. rest]));
        var product = Gen.Select(self, Gen.Select(self, Gen.Bool).Select((e, d) => new ProductFactor(e, d)).List[1, 3])
            .Select((first, rest) => (Expression)new ProductExpression([new ProductFactor(first), .. rest]));
        var power = Gen.Select(self, Exponent).Select((b, k) => (Expression)new PowerExpression(b, k));
        return Gen.Frequency((4, leaf), (1, subscripted), (1, negation), (2, sum), (2, product), (2, power));
    });

    [Fact]
    public void ToText_RandomTrees_ParseBackToAnEqualTree()
    {
        Trees.Sample(e =>
        {
            string text = ExpressionFormatter.ToText(e);
            var back = ExpressionParser.Parse(text);
            Assert.Equal(e, back);
            Assert.Equal(e.GetHashCode(), back.GetHashCode());
            Assert.Equal(text, ExpressionFormatter.ToText(back));
        }, iter: 4000);
    }

    [Fact]
    public void Parse_RandomStrings_OnlyEverThrowTheTypedException()
    {
        // Characters of the grammar, whitespace, and a few that must be rejected.
        const string alphabet = "xyn_{}()+-*/^,=.0123456789 \tα é\u2212\uD83D\uDE00[$";
        Gen.Char[alphabet].Array[0, 30].Select(cs => new string(cs)).Sample(AssertParsesOrFailsCleanly, iter: 5000);
    }

    [Fact]
    public void Parse_MutatedCanonicalText_OnlyEverThrowsTheTypedException()
    {
        Gen.Select(Trees, Gen.Int[0, 1000], Gen.Char["(){}_^*/+-=,. 2x"]).Select((e, at, c) =>
        {
            var text = ExpressionFormatter.ToText(e);
            int i = at % (text.Length + 1);
            return at % 2 == 0 ? text.Insert(i, c.ToString()) : text.Remove(Math.Min(i, text.Length - 1), 1);
        }).Sample(AssertParsesOrFailsCleanly, iter: 1500);
    }

    private static void AssertParsesOrFailsCleanly(string text)
    {
        Expression e;
        try { e = ExpressionParser.Parse(text); }
        catch (ExpressionParseException ex)
        {
            Assert.InRange(ex.Position, 0, text.Length);
            Assert.InRange(ex.Position + ex.Length, ex.Position, text.Length);
            Assert.Contains(ex.Reason, ex.Message);
            return;
        }
        Assert.Equal(e, ExpressionParser.Parse(ExpressionFormatter.ToText(e)));
    }
}
