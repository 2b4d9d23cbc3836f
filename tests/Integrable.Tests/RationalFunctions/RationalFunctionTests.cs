using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Text;

namespace Integrable.Tests.RationalFunctions;

public sealed class RationalFunctionTests
{
    private static readonly RationalFunctionField F = new("x", "y");
    private static RationalFunction X => F.Variable("x");
    private static RationalFunction Y => F.Variable("y");

    [Fact]
    public void Arithmetic_KnownIdentities_Hold()
    {
        Assert.Equal(F.Parse("(x + y)/(x y)"), 1 / X + 1 / Y);
        Assert.Equal(F.Parse("2/(x^2 - 1)"), 1 / (X - 1) - 1 / (X + 1));
        Assert.Equal(F.One, (X / Y) * (Y / X));
        Assert.Equal(F.Parse("x^2/(y + 1)^2"), ((Y + 1) / X).Pow(-2));
        Assert.Equal(F.Parse("y"), (X * Y + Y) / (X + 1));
    }

    [Fact]
    public void Henrici_SharedDenominatorFactor_CancelsCompletely()
    {
        // 1/(x(x+1)) + 1/(x+1) = (1 + x)/(x(x+1)) = 1/x: both gcd steps of the sum are exercised.
        Assert.Equal(F.Parse("1/x"), 1 / (X * (X + 1)) + 1 / (X + 1));
        var a = F.Parse("(y + 1)/((x - y)^2 (x + 2))");
        var b = F.Parse("(x - 2 y - 1)/((x - y)^2 (x + 2))");
        Assert.Equal(F.Parse("1/((x - y)(x + 2))"), a + b);
    }

    [Fact]
    public void Inverse_AndPow_AreConsistent()
    {
        var rng = new Random(3);
        for (int i = 0; i < 30; i++)
        {
            var r = RationalFunctionTestData.Random(rng, F);
            if (r.IsZero) continue;
            Assert.Equal(F.One, r * r.Inverse());
            Assert.Equal(r.Pow(3) * r.Pow(-2), r);
            Assert.True(r.Pow(-3).IsCanonical());
        }
    }

    [Fact]
    public void Evaluate_AtRationalPoint_AndAtPole()
    {
        var r = F.Parse("(x^2 + 1)/(x - 2 y)");
        Assert.Equal(new Rational(-4), r.Evaluate([new Rational(2), new Rational(13, 8)])); // 5/(2 − 13/4)
        var ex = Assert.Throws<PoleException>(() => r.Evaluate([new Rational(2), new Rational(1)]));
        Assert.Contains("x = 2", ex.Message);
        Assert.Throws<PoleException>(() => F.Parse("x/y").Evaluate([Rational.Zero, Rational.Zero]));
    }

    [Fact]
    public void Evaluate_ModP_ReducesOrReportsTheDenominator()
    {
        var p = new PrimeField(101);
        var r = F.Parse("(x^2 + 1)/(x - 2 y)") * new Rational(1, 3);
        ulong v = r.Evaluate(p, [5UL, 7UL]);
        Assert.Equal(p.Divide(p.FromInteger(26), p.Multiply(3, p.FromInteger(5 - 14))), v);
        Assert.Throws<PoleException>(() => r.Evaluate(p, [4UL, 2UL]));
        var bad = F.Parse("x/(101 y + 1)") * new Rational(1, 101);
        Assert.Throws<PoleException>(() => bad.Evaluate(p, [1UL, 1UL]));
    }

    [Fact]
    public void Substitute_Composition_MatchesPointwiseEvaluation()
    {
        var r = F.Parse("(x^2 - y)/(x y + 3)");
        var sx = F.Parse("(y + 1)/x");
        var sy = F.Parse("x - 1/y");
        var c = r.Compose(sx, sy);
        Rational[] pt = [new Rational(3, 2), new Rational(-5, 7)];
        Rational[] image = [sx.Evaluate(pt), sy.Evaluate(pt)];
        Assert.Equal(r.Evaluate(image), c.Evaluate(pt));
        Assert.True(c.IsCanonical());
    }

    [Fact]
    public void Substitute_DenominatorVanishing_Throws()
    {
        var r = F.Parse("1/(x - y)");
        Assert.Throws<PoleException>(() => r.Substitute("x", Y));
    }

    [Fact]
    public void Derivative_ProductAndQuotientRules_Hold()
    {
        var rng = new Random(8);
        for (int i = 0; i < 15; i++)
        {
            var f = RationalFunctionTestData.Random(rng, F);
            var g = RationalFunctionTestData.Random(rng, F);
            Assert.Equal(f.Derivative("x") * g + f * g.Derivative("x"), (f * g).Derivative("x"));
        }
        Assert.Equal(F.Parse("-1/x^2"), (1 / X).Derivative("x"));
        Assert.Equal(F.Zero, (1 / X).Derivative("y"));
    }

    [Fact]
    public void Degrees_TotalAndPerVariable()
    {
        var r = F.Parse("(x^3 y + 1)/(x y^2 - 2)");
        Assert.Equal(4, r.NumeratorDegree());
        Assert.Equal(3, r.DenominatorDegree());
        Assert.Equal(3, r.NumeratorDegree("x"));
        Assert.Equal(2, r.DenominatorDegree("y"));
        Assert.Equal(4, r.Degree());
        Assert.Throws<InvalidOperationException>(() => F.Zero.NumeratorDegree());
    }

    [Fact]
    public void ToString_ParsesBack()
    {
        var rng = new Random(21);
        for (int i = 0; i < 40; i++)
        {
            var r = RationalFunctionTestData.Random(rng, F);
            Assert.Equal(r, F.Parse(r.ToString()));
        }
        Assert.Equal("(x + 1)/(x*y - 2)", F.Parse("(x+1)/(x y - 2)").ToString());
        Assert.Equal("-3*x/y^2", F.Parse("-3x/y^2").ToString());
    }

    [Fact]
    public void ToLatex_UsesFrac()
    {
        Assert.Equal("\\frac{x + 1}{y^{2}}", F.Parse("(x + 1)/y^2").ToLatex());
        Assert.Equal("x + 1", F.Parse("x + 1").ToLatex());
    }

    [Fact]
    public void Parse_Errors_AreTyped()
    {
        Assert.Throws<ExpressionEvaluationException>(() => F.Parse("x + z"));
        Assert.Throws<ExpressionEvaluationException>(() => F.Parse("1/(x - x)"));
        Assert.Throws<ExpressionParseException>(() => F.Parse("x +"));
    }
}
