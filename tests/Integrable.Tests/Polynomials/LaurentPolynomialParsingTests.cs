using CsCheck;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Text;

namespace Integrable.Tests.Polynomials;

public class LaurentPolynomialParsingTests
{
    private static readonly LaurentPolynomialRing Ring = new("x", "y", "x_{n+1}", "T_{a+1,n}");

    [Fact]
    public void Parse_ExactQuotient_IsPolynomial()
    {
        var p = LaurentPolynomial.Parse(Ring, "(x^2 - y^2)/(x - y)");
        Assert.Equal(Ring.Variable("x") + Ring.Variable("y"), p);
        Assert.Equal(Ring.Variable("x").Pow(-2) * new Rational(1, 2), LaurentPolynomial.Parse(Ring, "1/2 x^-2"));
    }

    [Fact]
    public void ToString_ParsesBack_OnRandomPolynomials()
    {
        var term = Gen.Select(Gen.Int[-40, 40], Gen.Int[1, 9], Gen.Int[-3, 3].Array[4]);
        term.Array[0, 6].Sample(terms =>
        {
            var b = Ring.CreateBuilder();
            foreach (var (num, den, e) in terms) b.Add(new Rational(num, den), e);
            var p = b.ToPolynomial();
            Assert.Equal(p, LaurentPolynomial.Parse(Ring, p.ToString()));
        }, iter: 2000);
    }

    [Fact]
    public void Parse_UnknownVariableOrInexactDivision_TypedErrors()
    {
        var e = Assert.Throws<ExpressionEvaluationException>(() => LaurentPolynomial.Parse(Ring, "x + z"));
        Assert.Equal(4, e.Span.Start);
        Assert.Throws<ExpressionEvaluationException>(() => LaurentPolynomial.Parse(Ring, "1/(x + 1)"));
        Assert.Throws<ExpressionParseException>(() => LaurentPolynomial.Parse(Ring, "x +* y"));
    }
}
