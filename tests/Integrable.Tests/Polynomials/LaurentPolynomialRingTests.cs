using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Polynomials;

public sealed class LaurentPolynomialRingTests
{
    [Fact]
    public void Constructor_InvalidNames_Throw()
    {
        Assert.Throws<ArgumentException>(() => new LaurentPolynomialRing());
        Assert.Throws<ArgumentException>(() => new LaurentPolynomialRing("x", ""));
        Assert.Throws<ArgumentException>(() => new LaurentPolynomialRing("x", "y", "x"));
        Assert.Throws<ArgumentNullException>(() => new LaurentPolynomialRing("x", null!));
        Assert.Throws<ArgumentNullException>(() => new LaurentPolynomialRing(null!));
    }

    [Fact]
    public void Equality_ComparesOrderedNames()
    {
        var a = new LaurentPolynomialRing("x", "x_{n+1}", "T_{a+1,n}");
        var b = new LaurentPolynomialRing("x", "x_{n+1}", "T_{a+1,n}");
        var c = new LaurentPolynomialRing("x_{n+1}", "x", "T_{a+1,n}");
        Assert.Equal(a, b);
        Assert.True(a == b);
        Assert.Equal(a.GetHashCode(), b.GetHashCode());
        Assert.NotEqual(a, c);
        // Elements of equal rings mix; elements of different rings do not.
        Assert.Equal(a.Variable(0) + a.Variable(1), b.Variable(0) + a.Variable(1));
        Assert.Throws<IncompatibleRingException>(() => a.Variable(0) + c.Variable(0));
        Assert.Throws<IncompatibleRingException>(() => a.Variable(0) * c.Variable(0));
        Assert.Throws<IncompatibleRingException>(() => a.Add(c.One, a.One));
    }

    [Fact]
    public void Lookup_ByNameAndIndex()
    {
        var r = new LaurentPolynomialRing("g", "x_{n+1}");
        Assert.Equal(1, r.IndexOf("x_{n+1}"));
        Assert.Equal(-1, r.IndexOf("y"));
        Assert.Equal(2, r.VariableCount);
        Assert.Equal(["g", "x_{n+1}"], r.Variables);
        Assert.Equal(r.Variable(1), r.Variable("x_{n+1}"));
        Assert.Throws<ArgumentException>(() => r.Variable("y"));
        Assert.Throws<ArgumentOutOfRangeException>(() => r.Variable(2));
        Assert.Equal("Q[g^±1, x_{n+1}^±1]", r.ToString());
    }

    [Fact]
    public void Factories_ProduceCanonicalElements()
    {
        var r = new LaurentPolynomialRing("x", "y");
        Assert.True(r.Zero.IsZero && r.Zero.IsConstant && !r.Zero.IsMonomial);
        Assert.True(r.One.IsOne && r.One.IsConstant && r.One.IsMonomial);
        Assert.True(r.Constant(0).IsZero);
        Assert.Equal(new Rational(3, 2), r.Constant(new Rational(3, 2)).ToConstant());
        var m = r.Monomial(-4, [2, -3]);
        Assert.True(m.IsMonomial && !m.IsConstant);
        Assert.Equal("-4*x^2*y^-3", m.ToString());
        Assert.True(r.Monomial(0, [1, 1]).IsZero);
        Assert.Throws<ArgumentException>(() => r.Monomial(1, [1]));
        var p = r.FromTerms([1, 2, -1, 5], [0, 1, 1, 0, 0, 1, -1, 4]);
        Assert.Equal("2*x + 5*x^-1*y^4", p.ToString()); // y and -y cancel
        Assert.Throws<ArgumentException>(() => r.FromTerms([1], [0]));
    }

    [Fact]
    public void Unify_AndEmbed_MoveElementsBetweenRings()
    {
        var xy = new LaurentPolynomialRing("x", "y");
        var yz = new LaurentPolynomialRing("y", "z");
        var u = xy.Unify(yz);
        Assert.Equal(new LaurentPolynomialRing("x", "y", "z"), u);
        Assert.Same(xy, xy.Unify(new LaurentPolynomialRing("y")));
        var p = yz.Variable("y").Pow(2) * yz.Variable("z").Pow(-1) + yz.Variable("z");
        var q = u.Embed(p);
        Assert.Equal(u, q.Ring);
        Assert.True(q.IsCanonical());
        Assert.Equal(u.Variable("y").Pow(2) * u.Variable("z").Pow(-1) + u.Variable("z"), q);
        // Reordering variables re-sorts the terms.
        var zy = new LaurentPolynomialRing("z", "y");
        var back = zy.Embed(p);
        Assert.True(back.IsCanonical());
        Assert.Equal("z + z^-1*y^2", back.ToString());
        Assert.Throws<IncompatibleRingException>(() => xy.Embed(p));
        Assert.Equal(u.Variable(0) + u.Variable(1), u.Embed(xy.Variable(0) + xy.Variable(1)));
    }

    [Fact]
    public void Builder_CombinesTermsInAnyOrder()
    {
        var r = new LaurentPolynomialRing("x", "y");
        var b = r.CreateBuilder();
        b.Add(1, [0, 0]).Add(2, [1, -1]).Add(-1, [0, 0]).Add(new Rational(1, 3), [1, -1]).Add(0, [5, 5]);
        Assert.Equal(4, b.Count); // the zero term is ignored
        var p = b.ToPolynomial();
        Assert.Equal("7/3*x*y^-1", p.ToString());
        b.Add(r.Variable(0));
        Assert.Equal("x + 7/3*x*y^-1", b.ToPolynomial().ToString());
        b.Clear();
        Assert.True(b.ToPolynomial().IsZero);
        Assert.Throws<IncompatibleRingException>(() => b.Add(new LaurentPolynomialRing("z").One));
    }
}
