using System.Numerics;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Text;

namespace Integrable.Tests.Text;

public class ExpressionEvaluatorTests
{
    private static Rational EvalQ(string text, params (string Name, Rational Value)[] values) =>
        ExpressionEvaluator.Evaluate(ExpressionParser.Parse(text), RationalField.Instance, values.ToDictionary(v => v.Name, v => v.Value));

    [Fact]
    public void Evaluate_DivisionByZero_PointsAtTheDivisor()
    {
        const string text = "x + 1/(x - x)";
        var ex = Assert.Throws<ExpressionEvaluationException>(() => EvalQ(text, ("x", 3)));
        Assert.Equal("division by zero", ex.Reason);
        Assert.Equal(6, ex.Span.Start);
        Assert.Equal(7, ex.Span.Length);
        Assert.Equal("(x - x)", ex.Span.Text);
        Assert.Equal("division by zero at position 6\n  x + 1/(x - x)\n        ^^^^^^^", ex.Message);
    }

    [Fact]
    public void Evaluate_UnknownSymbol_PointsAtTheSymbol()
    {
        var ex = Assert.Throws<ExpressionEvaluationException>(() => EvalQ("x + 2 y_{n+1}", ("x", 3)));
        Assert.Equal("y_{n+1}", Assert.IsType<SymbolExpression>(ex.Expression).Name);
        Assert.Equal(6, ex.Span.Start);
        Assert.Equal(7, ex.Span.Length);
        Assert.Contains("'y_{n+1}' has no value", ex.Reason);
        Assert.IsType<KeyNotFoundException>(ex.InnerException);
    }

    [Fact]
    public void Evaluate_ZeroToANegativePower_PointsAtThePower()
    {
        var ex = Assert.Throws<ExpressionEvaluationException>(() => EvalQ("1 + x^-2", ("x", 0)));
        Assert.Equal("x^-2", ex.Span.Text);
        Assert.Contains("division by zero", ex.Reason);
    }

    [Fact]
    public void Evaluate_InexactDivisionInIntegers_PointsAtTheDivisor()
    {
        var e = ExpressionParser.Parse("(x^2 + 1)/2 + 7/x");
        var values = new Dictionary<string, BigInteger> { ["x"] = 3 };
        Assert.Equal(new BigInteger((7 * 7 + 1) / 2 + 7 / 7), ExpressionEvaluator.Evaluate(e, IntegerRing.Instance, new Dictionary<string, BigInteger> { ["x"] = 7 }));
        var ex = Assert.Throws<ExpressionEvaluationException>(() => ExpressionEvaluator.Evaluate(e, IntegerRing.Instance, values));
        Assert.Equal("the division is not exact in this ring", ex.Reason);
        Assert.Equal("x", ex.Span.Text);
        Assert.Equal(16, ex.Span.Start);
        var inverse = Assert.Throws<ExpressionEvaluationException>(() => ExpressionEvaluator.Evaluate(ExpressionParser.Parse("x^-1"), IntegerRing.Instance, values));
        Assert.Contains("not invertible", inverse.Reason);
    }

    [Fact]
    public void Evaluate_NumberOutsideTheRing_PointsAtTheNumber()
    {
        var ex = Assert.Throws<ExpressionEvaluationException>(() =>
            ExpressionEvaluator.Evaluate(ExpressionParser.Parse("x + 0.5"), IntegerRing.Instance, new Dictionary<string, BigInteger> { ["x"] = 1 }));
        Assert.Equal("0.5", ex.Span.Text);
        Assert.Contains("1/2 does not exist in this ring", ex.Reason);
        Assert.IsType<DivideByZeroException>(ex.InnerException);
    }

    [Fact]
    public void Evaluate_TreeBuiltInCode_NamesTheSubExpressionInTheMessage()
    {
        var e = new ProductExpression([new(new SymbolExpression("x")), new(new NumberExpression(0), IsDivisor: true)]);
        var ex = Assert.Throws<ExpressionEvaluationException>(() =>
            ExpressionEvaluator.Evaluate(e, RationalField.Instance, new Dictionary<string, Rational> { ["x"] = 1 }));
        Assert.False(ex.Span.HasSource);
        Assert.Equal("division by zero in '0'", ex.Message);
    }

    [Fact]
    public void Evaluate_ResolverExceptionsOtherThanKeyNotFound_PassThrough()
    {
        var e = ExpressionParser.Parse("x + 1");
        Assert.Throws<InvalidOperationException>(() =>
            ExpressionEvaluator.Evaluate<Rational>(e, RationalField.Instance, _ => throw new InvalidOperationException("resolver failed")));
    }

    [Fact]
    public void Evaluate_ResolverSeesTheParsedSymbol()
    {
        var e = ExpressionParser.Parse("T_{a+1,n} - T_{a,n-1}");
        var seen = new List<string>();
        var value = ExpressionEvaluator.Evaluate(e, RationalField.Instance, s =>
        {
            seen.Add(s.Name);
            return s.Subscripts.Count; // both have two subscripts
        });
        Assert.Equal(Rational.Zero, value);
        Assert.Equal(new[] { "T_{a+1,n}", "T_{a,n-1}" }, seen);
    }

    [Fact]
    public void Evaluate_Powers_MatchRepeatedMultiplication()
    {
        var x = new Rational(-3, 7);
        for (int k = -12; k <= 40; k++)
        {
            var expected = Rational.One;
            for (int i = 0; i < Math.Abs(k); i++) expected *= x + 1;
            if (k < 0) expected = 1 / expected;
            Assert.Equal(expected, EvalQ($"(x + 1)^{k}", ("x", x)));
        }
    }

    [Fact]
    public void Evaluate_LargePower_UsesRepeatedSquaring()
    {
        // 2^(p-1) = 1 mod p for the prime p = 1000003 (Fermat's little theorem); 1000002 > MaxExponent, so use
        // 2^1000000 = 2^-2 = 1/4 mod p instead, computed with about 2·log2(10^6) ≈ 40 multiplications.
        const long p = 1_000_003;
        var ring = new CountingPrimeField(p);
        long value = ExpressionEvaluator.Evaluate(ExpressionParser.Parse("x^1000000"), ring, _ => 2L);
        Assert.Equal(ring.FromRational(new Rational(1, 4)), value);
        Assert.InRange(ring.Multiplications, 1, 40);
        Assert.Equal((long)BigInteger.ModPow(2, 1_000_000, p), value);
    }

    [Fact]
    public void Evaluate_DictionaryOverload_UsesCanonicalNames()
    {
        Assert.Equal(new Rational(7), EvalQ("x_{ n } + x_{n + 1}", ("x_n", 3), ("x_{n+1}", 4)));
    }

    [Fact]
    public void Symbols_AreDistinctInOrderOfFirstAppearance()
    {
        var e = ExpressionParser.Parse("y x + x_n y + z^2 + x_{n} + T_{a,n}/x");
        Assert.Equal(new[] { "y", "x", "x_n", "z", "T_{a,n}" }, ExpressionEvaluator.Symbols(e).Select(s => s.Name));
        Assert.Empty(ExpressionEvaluator.Symbols(ExpressionParser.Parse("2^3 + 1")));
    }
}
