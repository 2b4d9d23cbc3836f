using Integrable.Numbers;
using Integrable.Text;

namespace Integrable.Tests.Text;

/// <summary>The node constructors enforce the invariants that make every tree printable and parseable.</summary>
public class ExpressionTests
{
    private static readonly SymbolExpression X = new("x");

    [Fact]
    public void NumberExpression_RejectsNegativeAndNonDecimalValues()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new NumberExpression(-1));
        Assert.Throws<ArgumentOutOfRangeException>(() => new NumberExpression(new Rational(1, 3)));
        Assert.Equal("0.05", new NumberExpression(new Rational(1, 20)).ToString());
    }

    [Fact]
    public void SymbolExpression_RejectsBadNames()
    {
        Assert.Throws<ArgumentException>(() => new SymbolExpression("2x"));
        Assert.Throws<ArgumentException>(() => new SymbolExpression("x_n"));
        Assert.Throws<ArgumentException>(() => new SymbolExpression(""));
        Assert.Throws<ArgumentException>(() => new SymbolExpression("é"));
        Assert.Throws<ArgumentNullException>(() => new SymbolExpression(null!));
        Assert.Equal("β2", new SymbolExpression("β2").Name);
    }

    [Fact]
    public void SumAndProduct_RequireTwoOperandsAndAPlainFirstOne()
    {
        Assert.Throws<ArgumentException>(() => new SumExpression([new(X)]));
        Assert.Throws<ArgumentException>(() => new SumExpression([new(X, IsSubtracted: true), new(X)]));
        Assert.Throws<ArgumentException>(() => new ProductExpression([new(X)]));
        Assert.Throws<ArgumentException>(() => new ProductExpression([new(X, IsDivisor: true), new(X)]));
        Assert.Throws<ArgumentException>(() => new ProductExpression([new(X), new(null!)]));
    }

    [Fact]
    public void PowerExpression_RequiresAConstantIntegerExponentWithinTheLimit()
    {
        Assert.Throws<ArgumentException>(() => new PowerExpression(X, X));
        Assert.Throws<ArgumentException>(() => new PowerExpression(X, new NumberExpression(new Rational(1, 2))));
        Assert.Throws<ArgumentException>(() => new PowerExpression(X, PowerExpression.MaxExponent + 1));
        Assert.Equal(-PowerExpression.MaxExponent, new PowerExpression(X, -PowerExpression.MaxExponent).ExponentValue);
        Assert.Equal("x^-3", new PowerExpression(X, -3).ToString());
    }

    [Fact]
    public void Expression_DeeperThanTheLimit_IsRejected()
    {
        Expression e = X;
        for (int i = 1; i < Expression.MaxDepth; i++) e = new NegationExpression(e);
        Assert.Equal(Expression.MaxDepth, e.Depth);
        Assert.Throws<ArgumentException>(() => new NegationExpression(e));
    }

    [Fact]
    public void Lists_AreReadOnlyCopies()
    {
        var terms = new List<SumTerm> { new(X), new(X) };
        var sum = new SumExpression(terms);
        terms[1] = new SumTerm(new NumberExpression(1));
        Assert.Equal("x + x", sum.ToString());
        Assert.False(sum.Terms is SumTerm[]);
        Assert.Throws<NotSupportedException>(() => ((IList<SumTerm>)sum.Terms)[0] = new SumTerm(X));
    }
}
