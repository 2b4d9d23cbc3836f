using System.Numerics;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Polynomials;

public sealed class LaurentPolynomialTests
{
    private static readonly LaurentPolynomialRing R = new("x", "y", "z");
    private static LaurentPolynomial X => R.Variable(0);
    private static LaurentPolynomial Y => R.Variable(1);
    private static LaurentPolynomial Z => R.Variable(2);

    [Fact]
    public void CanonicalOrder_IsDescendingLexOnSignedExponents()
    {
        var p = 1 + Z + X.Pow(-1) + Y * Y + X * Y.Pow(-3);
        Assert.True(p.IsCanonical());
        Assert.Equal("x*y^-3 + y^2 + z + 1 + x^-1", p.ToString());
        Assert.Equal([1, -3, 0], p.ExponentsOf(0).ToArray());
        Assert.Equal(new Rational(1), p.LeadingCoefficient);
        // Translation invariance: multiplying by a monomial keeps the term order.
        var shifted = p * (X.Pow(-5) * Z.Pow(7));
        for (int t = 0; t < p.TermCount; t++)
            for (int v = 0; v < 3; v++)
                Assert.Equal(p.ExponentsOf(t)[v] + (v == 0 ? -5 : v == 2 ? 7 : 0), shifted.ExponentsOf(t)[v]);
    }

    [Fact]
    public void Predicates_AndAccessors()
    {
        Assert.True(R.Zero.IsZero);
        Assert.False(X.IsConstant);
        Assert.True((X - X).IsZero);
        Assert.True((X * X.Pow(-1)).IsOne);
        var p = 3 * X.Pow(2) * Y.Pow(-1) - new Rational(1, 2) * Z + 1;
        Assert.Equal(3, p.TermCount);
        Assert.Equal(new Rational(3), p.Coefficient([2, -1, 0]));
        Assert.Equal(new Rational(-1, 2), p.Coefficient([0, 0, 1]));
        Assert.Equal(Rational.One, p.Coefficient([0, 0, 0]));
        Assert.Equal(Rational.Zero, p.Coefficient([1, 1, 1]));
        int count = 0;
        foreach (var t in p.Terms) { Assert.Equal(p.Coefficients[count], t.Coefficient); count++; }
        Assert.Equal(3, count);
        Assert.Equal(new Rational(-1, 2), p.Term(1).Coefficient);
        Assert.Throws<ArgumentOutOfRangeException>(() => p.Term(3));
        Assert.Throws<InvalidOperationException>(() => p.ToConstant());
        Assert.Throws<InvalidOperationException>(() => R.Zero.LeadingCoefficient);
    }

    [Fact]
    public void ScalarOperators_OnBothSides()
    {
        var h = new Rational(1, 2);
        Assert.Equal(X + R.Constant(h), X + h);
        Assert.Equal(X + R.Constant(h), h + X);
        Assert.Equal(X - R.Constant(h), X - h);
        Assert.Equal(R.Constant(h) - X, h - X);
        Assert.Equal(R.Constant(h) * X, X * h);
        Assert.Equal(R.Constant(h) * X, h * X);
        Assert.True((X * 0).IsZero);
        Assert.Equal(-X, X * -1);
        Assert.Equal(X * X - Y, LaurentPolynomial.Subtract(LaurentPolynomial.Multiply(X, X), Y));
        Assert.Equal(LaurentPolynomial.Negate(X), LaurentPolynomial.Add(-X - X, X));
    }

    [Fact]
    public void Degrees_AndExponentBounds()
    {
        var p = X.Pow(3) * Y.Pow(-2) + Y.Pow(5) * Z.Pow(-1) - X.Pow(-4);
        Assert.Equal(4, p.TotalDegree);
        Assert.Equal(-4, p.LowTotalDegree);
        Assert.Equal(3, p.Degree("x"));
        Assert.Equal(3, p.MaxExponent("x"));
        Assert.Equal(-4, p.MinExponent("x"));
        Assert.Equal(-2, p.MinExponent(1));
        Assert.Equal(5, p.MaxExponent(1));
        Assert.Equal(-1, p.MinExponent("z"));
        Assert.False(p.IsPolynomial);
        Assert.True((X + Y).IsPolynomial);
        Assert.Throws<InvalidOperationException>(() => R.Zero.TotalDegree);
        Assert.Throws<InvalidOperationException>(() => R.Zero.MaxExponent(0));
        Assert.Throws<ArgumentException>(() => p.Degree("w"));
    }

    [Fact]
    public void Derivative_FollowsPowerRuleForAllExponents()
    {
        var p = X.Pow(3) * Y.Pow(-2) + 7 * Y - X.Pow(-4) * Z + 5;
        Assert.Equal(3 * X.Pow(2) * Y.Pow(-2) + 4 * X.Pow(-5) * Z, p.Derivative("x"));
        Assert.Equal(-2 * X.Pow(3) * Y.Pow(-3) + 7, p.Derivative(1));
        Assert.Equal(-X.Pow(-4), p.Derivative("z"));
        Assert.True(R.Constant(9).Derivative(0).IsZero);
        // Product rule on random inputs.
        var rng = new Random(5);
        for (int i = 0; i < 50; i++)
        {
            var a = PolynomialTestData.Random(rng, R);
            var b = PolynomialTestData.Random(rng, R);
            Assert.Equal(a.Derivative(0) * b + a * b.Derivative(0), (a * b).Derivative(0));
            Assert.True(a.Derivative(2).IsCanonical());
        }
    }

    [Fact]
    public void Content_AndPrimitivePart_FollowSignConvention()
    {
        var p = new Rational(-6, 5) * X + new Rational(9, 10) * Y.Pow(-1);
        Assert.Equal(new Rational(-3, 10), p.Content);
        var pp = p.PrimitivePart;
        Assert.Equal(4 * X - 3 * Y.Pow(-1), pp);
        Assert.Equal(p, p.Content * pp);
        Assert.Equal(Rational.Zero, R.Zero.Content);
        Assert.True(R.Zero.PrimitivePart.IsZero);
        Assert.Equal(new Rational(7, 2), R.Constant(new Rational(7, 2)).Content);
        var big = new Rational(BigInteger.Pow(2, 100)) * (X + 2);
        Assert.Equal(new Rational(BigInteger.Pow(2, 100)), big.Content);
        var rng = new Random(8);
        for (int i = 0; i < 80; i++)
        {
            var a = PolynomialTestData.Random(rng, R);
            if (a.IsZero) continue;
            var prim = a.PrimitivePart;
            Assert.True(prim.LeadingCoefficient.Sign > 0);
            BigInteger g = 0;
            foreach (var c in prim.Coefficients) { Assert.True(c.IsInteger); g = BigInteger.GreatestCommonDivisor(g, c.Numerator); }
            Assert.Equal(BigInteger.One, g);
            Assert.Equal(a, a.Content * prim);
        }
    }

    [Fact]
    public void Evaluate_AtRationalPoints()
    {
        var p = 3 * X.Pow(2) * Y.Pow(-1) - new Rational(1, 2) * Z + 1;
        Assert.Equal(new Rational(3 * 4, 5) - new Rational(7, 2) + 1, p.Evaluate([2, 5, 7]));
        Assert.Throws<NotInvertibleException>(() => p.Evaluate([2, 0, 7]));
        Assert.Equal(new Rational(-1, 2) * 7 + 1, (p - 3 * X.Pow(2) * Y.Pow(-1)).Evaluate([2, 0, 7]));
        Assert.Throws<ArgumentException>(() => p.Evaluate([1, 2]));
        Assert.Equal(Rational.Zero, R.Zero.Evaluate([1, 2, 3]));
        // Agreement with term-by-term evaluation on random inputs.
        var rng = new Random(9);
        for (int i = 0; i < 60; i++)
        {
            var a = PolynomialTestData.Random(rng, R);
            Rational[] pt = [new Rational(rng.Next(1, 9), rng.Next(1, 9)), -rng.Next(1, 5), new Rational(rng.Next(1, 7), 3)];
            Rational expected = 0;
            foreach (var t in a.Terms)
            {
                Rational term = t.Coefficient;
                for (int v = 0; v < 3; v++) term *= pt[v].Pow(t.Exponents[v]);
                expected += term;
            }
            Assert.Equal(expected, a.Evaluate(pt));
        }
    }

    /// <summary>A tiny test ring of doubles to check the generic evaluation path.</summary>
    private sealed class DoubleRing : IRing<double>
    {
        public double Zero => 0;
        public double One => 1;
        public double FromInteger(long value) => value;
        public double FromRational(Rational value) => (double)value.Numerator / (double)value.Denominator;
        public double Add(double a, double b) => a + b;
        public double Subtract(double a, double b) => a - b;
        public double Multiply(double a, double b) => a * b;
        public double Negate(double a) => -a;
        public bool IsZero(double a) => a == 0;
        public bool AreEqual(double a, double b) => a == b;
        public bool TryDivide(double a, double b, out double q) { q = b == 0 ? 0 : a / b; return b != 0; }
    }

    [Fact]
    public void Evaluate_InGenericRings()
    {
        var p = 3 * X.Pow(2) * Y.Pow(-1) - new Rational(1, 2) * Z + 1;
        Assert.Equal(3.0 * 4 / 5 - 3.5 + 1, p.Evaluate(new DoubleRing(), [2.0, 5.0, 7.0]), 12);
        Assert.Throws<NotInvertibleException>(() => p.Evaluate(new DoubleRing(), [2.0, 0.0, 7.0]));
        // Polynomials as values: evaluating at the variables themselves is the identity.
        Assert.Equal(p, p.Evaluate<LaurentPolynomial>(R, [X, Y, Z]));
    }

    [Fact]
    public void Substitute_SingleAndSimultaneous()
    {
        var p = X * X * Y.Pow(-1) + Y;
        // y → x + 1 is not a unit: y^-1 cannot be substituted.
        Assert.Throws<NotInvertibleException>(() => p.Substitute("y", X + 1));
        Assert.Equal(X * X * Z.Pow(-2) * new Rational(1, 3) + 3 * Z * Z, p.Substitute("y", 3 * Z * Z));
        Assert.Equal((Y + 1).Pow(2) * Y.Pow(-1) + Y, p.Substitute(0, Y + 1));
        // Simultaneous: x → y, y → x swaps.
        var swapped = p.Substitute(new Dictionary<string, LaurentPolynomial> { ["x"] = Y, ["y"] = X });
        Assert.Equal(Y * Y * X.Pow(-1) + X, swapped);
        // Values from another ring extend the result ring.
        var other = new LaurentPolynomialRing("t");
        var s = p.Substitute("x", other.Variable(0) + 2);
        Assert.Equal(new LaurentPolynomialRing("x", "y", "z", "t"), s.Ring);
        var t = s.Ring.Variable("t");
        Assert.Equal((t + 2).Pow(2) * s.Ring.Variable("y").Pow(-1) + s.Ring.Variable("y"), s);
        Assert.Throws<ArgumentException>(() => p.Substitute("w", X));
    }

    [Fact]
    public void ToString_PrintsParsableText_AndRoundTrips()
    {
        Assert.Equal("0", R.Zero.ToString());
        Assert.Equal("1", R.One.ToString());
        Assert.Equal("-1/2", R.Constant(new Rational(-1, 2)).ToString());
        Assert.Equal("3*x^2*y^-1 - 1/2*z + 1", (3 * X.Pow(2) * Y.Pow(-1) - new Rational(1, 2) * Z + 1).ToString());
        Assert.Equal("-x*y*z - 2", (-X * Y * Z - 2).ToString());
        var odd = new LaurentPolynomialRing("x_{n+1}", "T_{a+1,n}", "g");
        var q = odd.Variable(0).Pow(-2) * odd.Variable(1) - 3 * odd.Variable(2) + new Rational(5, 7);
        Assert.Equal("-3*g + 5/7 + x_{n+1}^-2*T_{a+1,n}", q.ToString());
        Assert.Equal(q, TestPolynomialReader.Read(odd, q.ToString()));
        var rng = new Random(12);
        for (int i = 0; i < 100; i++)
        {
            var a = PolynomialTestData.Random(rng, R);
            Assert.Equal(a, TestPolynomialReader.Read(R, a.ToString()));
        }
    }

    [Fact]
    public void ToLatex_UsesFractionsAndBracedExponents()
    {
        Assert.Equal("3 x^{2} y^{-1} - \\frac{1}{2} z + 1", (3 * X.Pow(2) * Y.Pow(-1) - new Rational(1, 2) * Z + 1).ToLatex());
        var odd = new LaurentPolynomialRing("x_{n+1}");
        Assert.Equal("-{x_{n+1}}^{2} + x_{n+1}", (odd.Variable(0) - odd.Variable(0).Pow(2)).ToLatex());
        Assert.Equal("0", R.Zero.ToLatex());
    }

    [Fact]
    public void Equality_AndHash_AreStructural()
    {
        var a = (X + Y) * (X - Y);
        var b = X * X - Y * Y;
        Assert.Equal(a, b);
        Assert.True(a == b);
        Assert.False(a != b);
        Assert.Equal(a.GetHashCode(), b.GetHashCode());
        Assert.NotEqual(a, b + 1);
        Assert.False(a.Equals(null));
        Assert.False(a.Equals((object)"x"));
        var other = new LaurentPolynomialRing("x", "y", "w");
        Assert.NotEqual(other.Variable(0), X); // different rings
    }
}
