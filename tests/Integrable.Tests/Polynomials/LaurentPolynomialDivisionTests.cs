using System.Numerics;
using Integrable.Kernels;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Polynomials;

public sealed class LaurentPolynomialDivisionTests
{
    private static readonly LaurentPolynomialRing R = new("x", "y", "z");

    private static T WithDivision<T>(bool? dense, Func<T> f)
    {
        var old = PolynomialDivide.ForceDense;
        PolynomialDivide.ForceDense = dense;
        try { return f(); }
        finally { PolynomialDivide.ForceDense = old; }
    }

    public static TheoryData<string> Algorithms => new() { "dense", "heap", "auto" };

    private static bool? Parse(string s) => s == "dense" ? true : s == "heap" ? false : null;

    [Theory]
    [MemberData(nameof(Algorithms))]
    public void TryDivideExact_QuotientBeyondWordWithWideDividend_FallsBackToBigIntegers(string algorithm)
    {
        // Divisor with word coefficients, dividend below 2^126, quotient with a 70-bit coefficient: the
        // word-coefficient attempt stops (QuotientTooLarge) and big integers finish the division.
        var ring = new LaurentPolynomialRing("x", "y");
        var big = new Rational(BigInteger.Pow(2, 70) + 12345);
        var q = ring.Variable("x") * ring.Variable("x") * big + ring.Variable("y") * new Rational(-7) + ring.One * big;
        var d = ring.Variable("x") * new Rational(3) + ring.Variable("y") * new Rational(5) + ring.One;
        var p = q * d;
        Assert.True(WithDivision(Parse(algorithm), () => p.TryDivideExact(d, out var got) && got == q));
        var p2 = p + ring.Variable("y");
        Assert.False(WithDivision(Parse(algorithm), () => p2.TryDivideExact(d, out _)));
    }

    [Theory]
    [MemberData(nameof(Algorithms))]
    public void TryDivideExact_EachAlgorithm_RecoversFactorOrFails(string algorithm)
    {
        var ring = new LaurentPolynomialRing("x", "y", "z");
        var rng = new Random(111);
        for (int i = 0; i < 150; i++)
        {
            var shape = new PolynomialTestData.Shape(MaxTerms: 15, MinExp: -4, MaxExp: 4, CoefficientKind: i % 3 == 0 ? i % 9 : -1);
            var q = PolynomialTestData.Random(rng, ring, shape);
            var d = PolynomialTestData.Random(rng, ring, shape with { MaxTerms = 6 });
            if (d.IsZero || d.IsMonomial) continue;
            var p = q * d;
            Assert.True(WithDivision(Parse(algorithm), () => p.TryDivideExact(d, out var got) && got == q), $"{algorithm} iteration {i}: ({p}) / ({d})");
            var r = PolynomialTestData.Random(rng, ring, new(MaxTerms: 2));
            var p2 = p + r;
            bool ok = WithDivision(Parse(algorithm), () => p2.TryDivideExact(d, out var got2) ? got2 * d == p2 : true);
            Assert.True(ok, $"{algorithm} iteration {i}: a claimed quotient must be exact");
            Assert.Equal(p2.TryDivideExact(d, out _), WithDivision(Parse(algorithm), () => p2.TryDivideExact(d, out _)));
            // Unrelated operands: any claimed quotient must be exact, and the algorithms agree.
            var u = PolynomialTestData.Random(rng, ring, shape);
            bool auto = u.TryDivideExact(d, out var qa);
            bool forced = WithDivision(Parse(algorithm), () => u.TryDivideExact(d, out var qf) && qf * d == u);
            Assert.Equal(auto, forced);
            if (auto) Assert.Equal(u, qa * d);
        }
    }

    [Theory]
    [MemberData(nameof(Algorithms))]
    public void TryDivideExact_AccumulatorEscalation_IsExact(string algorithm)
    {
        // Quotients whose coefficient sums exceed the 64-bit and then the 128-bit bounds, with a
        // dividend whose coefficients still fit in 128 bits, force the retries with wider accumulators.
        var ring = new LaurentPolynomialRing("x", "y");
        var x = ring.Variable(0);
        var y = ring.Variable(1);
        foreach (int bits in new[] { 20, 40, 60 })
        {
            var c = new Rational(BigInteger.Pow(2, bits) + 1);
            var q = (c * x + c * y + 1).Pow(3) * (x - y + 2);
            var d = (x + 3) * (y - 5) * (c * x * y + 1);
            var p = q * d;
            Assert.True(WithDivision(Parse(algorithm), () => p.TryDivideExact(d, out var got) && got == q), $"{algorithm} bits {bits}");
            Assert.False(WithDivision(Parse(algorithm), () => (p + x).TryDivideExact(d, out _)), $"{algorithm} bits {bits} non-divisor");
        }
    }

    [Fact]
    public void TryDivideExact_RandomProducts_RecoversFactor()
    {
        var rng = new Random(101);
        int checkedCount = 0;
        for (int i = 0; i < 300; i++)
        {
            var q = PolynomialTestData.Random(rng, R, new(MaxTerms: 12));
            var d = PolynomialTestData.Random(rng, R, new(MaxTerms: 8));
            if (d.IsZero) { Assert.False((q * d).TryDivideExact(d, out _)); continue; }
            var p = q * d;
            Assert.True(p.TryDivideExact(d, out var got), $"iteration {i}: ({p}) / ({d})");
            Assert.True(got.IsCanonical());
            Assert.Equal(q, got);
            Assert.Equal(p, got * d);
            checkedCount++;
        }
        Assert.True(checkedCount > 200);
    }

    [Fact]
    public void TryDivideExact_BigCoefficientsAndManyWords_RecoversFactor()
    {
        var ring = new LaurentPolynomialRing(Enumerable.Range(0, 85).Select(i => $"x{i}").ToArray());
        var rng = new Random(202);
        for (int i = 0; i < 40; i++)
        {
            var shape = new PolynomialTestData.Shape(MaxTerms: 10, MinExp: -5000, MaxExp: 5000, CoefficientKind: i % 9, ActiveVariables: 12);
            var q = PolynomialTestData.Random(rng, ring, shape);
            var d = PolynomialTestData.Random(rng, ring, shape);
            if (d.IsZero) continue;
            var p = q * d;
            Assert.True(p.TryDivideExact(d, out var got), $"iteration {i}");
            Assert.Equal(q, got);
        }
    }

    [Fact]
    public void TryDivideExact_QuotientCoefficientsPastWord_FallsBackExactly()
    {
        // (x - 1)·(x^20 + … + 1)·c with c = 2^70: the quotient coefficients exceed a word.
        var x = R.Variable(0);
        var c = new Rational(BigInteger.Pow(2, 70) + 3);
        var q = R.Zero;
        for (int k = 0; k <= 20; k++) q += c * x.Pow(k);
        var d = x - 1;
        Assert.True((q * d).TryDivideExact(d, out var got));
        Assert.Equal(q, got);
        // A quotient with coefficients growing as 3^k from a small-coefficient dividend.
        var geometric = R.Zero;
        for (int k = 0; k <= 60; k++) geometric += new Rational(BigInteger.Pow(3, k)) * x.Pow(60 - k);
        var div = x - 3;
        Assert.True((geometric * div).TryDivideExact(div, out var g2));
        Assert.Equal(geometric, g2);
    }

    [Fact]
    public void TryDivideExact_NonDivisors_ReturnFalseWithoutThrowing()
    {
        var rng = new Random(303);
        int failures = 0;
        for (int i = 0; i < 300; i++)
        {
            var a = PolynomialTestData.Random(rng, R, new(MaxTerms: 10));
            var b = PolynomialTestData.Random(rng, R, new(MaxTerms: 4));
            var r = PolynomialTestData.Random(rng, R, new(MaxTerms: 3));
            if (b.IsZero || b.IsMonomial) continue;
            var p = a * b + r;
            if (p.TryDivideExact(b, out var q))
                Assert.Equal(p, q * b); // a success must be a true quotient
            else
            {
                failures++;
                var w = p.DivideExact(b);
                Assert.False(w.IsExact);
                Assert.Equal(p, w.Quotient * b + w.Remainder); // the witness identity
            }
        }
        Assert.True(failures > 100);
        var x = R.Variable(0);
        var y = R.Variable(1);
        Assert.False((x + y).TryDivideExact(x - y, out _));
        Assert.False((x * x + 1).TryDivideExact(x + 1, out _));
        Assert.False(x.TryDivideExact(x + 1, out _));
        Assert.False((x + 1).TryDivideExact(R.Zero, out _));
        Assert.False((2 * x + 1).TryDivideExact(4 * x + 1, out _));
    }

    [Fact]
    public void TryDivideExact_LaurentUnitsAndMonomialContent_AreHandled()
    {
        var x = R.Variable(0);
        var y = R.Variable(1);
        var z = R.Variable(2);
        // Monomials are units: x^-3·y divides anything.
        var m = new Rational(-2, 7) * x.Pow(-3) * y;
        var p = x * x + y.Pow(-1) * z + 5;
        Assert.True(p.TryDivideExact(m, out var q));
        Assert.Equal(p, q * m);
        // Dividing by x·(1 + y) the same as dividing by 1 + y, up to x^-1.
        var d = x * (1 + y);
        var f = (x.Pow(-2) + z) * (1 + y);
        Assert.True(f.TryDivideExact(d, out var g));
        Assert.Equal((x.Pow(-2) + z) * x.Pow(-1), g);
        // Somos-4 style: (x y + z^2)/w ... an exact Laurent quotient with negative exponents.
        var somos = (x * z + y * y) * x.Pow(-1) * z.Pow(-2);
        Assert.True(somos.TryDivideExact(x * z + y * y, out var h));
        Assert.Equal(x.Pow(-1) * z.Pow(-2), h);
        Assert.True(R.Zero.TryDivideExact(d, out var zq) && zq.IsZero);
    }

    [Theory]
    [MemberData(nameof(Algorithms))]
    public void TryDivideExact_DividendWithFewerTermsThanDivisor_Succeeds(string algorithm)
    {
        // x³ + 1 = (x + 1)(x² − x + 1) and x^n − 1 = (x − 1)(x^(n−1) + … + 1): dividends can be
        // much shorter than divisors (worked by hand).
        var x = R.Variable(0);
        var y = R.Variable(1);
        Assert.True(WithDivision(Parse(algorithm), () => (x.Pow(3) + 1).TryDivideExact(x * x - x + 1, out var q) && q == x + 1));
        var geometric = R.Zero;
        for (int k = 0; k < 40; k++) geometric += x.Pow(k) * y.Pow(-k);
        var p = x.Pow(40) * y.Pow(-40) - 1;
        Assert.True(WithDivision(Parse(algorithm), () => p.TryDivideExact(geometric, out var q2) && q2 == x * y.Pow(-1) - 1));
        Assert.True(WithDivision(Parse(algorithm), () => p.TryDivideExact(x * y.Pow(-1) - 1, out var q3) && q3 == geometric));
    }

    [Fact]
    public void DivideExact_ZeroDivisor_Throws()
    {
        Assert.Throws<DivideByZeroException>(() => R.Variable(0).DivideExact(R.Zero));
        Assert.Throws<DivideByZeroException>(() => R.Variable(0).DivRem(R.Zero, MonomialOrder.Lex));
    }

    [Fact]
    public void DivRem_TextbookExample_Lex()
    {
        // Worked by hand: x²y + xy² + y² = (x + y)(xy − 1) + (x + y² + y) in lex with x > y.
        var r = new LaurentPolynomialRing("x", "y");
        var x = r.Variable(0);
        var y = r.Variable(1);
        var f = x * x * y + x * y * y + y * y;
        var (q, rem) = f.DivRem(x * y - 1, MonomialOrder.Lex);
        Assert.Equal(x + y, q);
        Assert.Equal(x + y * y + y, rem);
    }

    [Fact]
    public void DivRem_GradedOrders_PickDifferentLeadingTerms()
    {
        // Divisor y² + x: its leading term is x in lex (x > y) but y² in both graded orders.
        var r = new LaurentPolynomialRing("x", "y");
        var x = r.Variable(0);
        var y = r.Variable(1);
        // f = y³: in lex the leading term x of the divisor does not divide y³, so q = 0, r = y³;
        // in graded lex y² leads and y³ = y·(y² + x) − xy (worked by hand).
        var f = y * y * y;
        var lex = f.DivRem(y * y + x, MonomialOrder.Lex);
        Assert.True(lex.Quotient.IsZero);
        Assert.Equal(f, lex.Remainder);
        var grlex = f.DivRem(y * y + x, MonomialOrder.GradedLex);
        Assert.Equal(y, grlex.Quotient);
        Assert.Equal(-x * y, grlex.Remainder);
        // x·(x + y²) = x² + xy² exactly, in every order.
        Assert.True((x * y * y + x * x).DivRem(y * y + x, MonomialOrder.GradedLex).IsExact);
        // grevlex with x > y > z: xz < y² (worked by hand), so the divisor y² + xz leads with y².
        var rz = new LaurentPolynomialRing("x", "y", "z");
        var (X, Y, Z) = (rz.Variable(0), rz.Variable(1), rz.Variable(2));
        var dv = Y * Y + X * Z;
        var res = (Y * Y * Y).DivRem(dv, MonomialOrder.GradedReverseLex);
        Assert.Equal(Y, res.Quotient);
        Assert.Equal(-X * Y * Z, res.Remainder);
        var resLex = (Y * Y * Y).DivRem(dv, MonomialOrder.Lex);
        Assert.True(resLex.Quotient.IsZero);              // lex leading term xz does not divide y³
        Assert.Equal(Y * Y * Y, resLex.Remainder);
    }

    [Theory]
    [InlineData(MonomialOrder.Lex)]
    [InlineData(MonomialOrder.GradedLex)]
    [InlineData(MonomialOrder.GradedReverseLex)]
    public void DivRem_RandomInputs_SatisfyDivisionIdentity(MonomialOrder order)
    {
        var rng = new Random(404 + (int)order);
        for (int i = 0; i < 120; i++)
        {
            bool laurent = i % 3 == 0;
            var shape = new PolynomialTestData.Shape(MaxTerms: 8, MinExp: laurent ? -2 : 0, MaxExp: 3);
            var p = PolynomialTestData.Random(rng, R, shape);
            var d = PolynomialTestData.Random(rng, R, shape with { MaxTerms = 3 });
            if (d.IsZero) continue;
            var res = p.DivRem(d, order);
            Assert.True(res.Quotient.IsCanonical() && res.Remainder.IsCanonical());
            Assert.Equal(p, res.Quotient * d + res.Remainder);
            if (p.IsPolynomial && d.IsPolynomial)
            {
                // No remainder term is divisible by the leading term of d under the order.
                var lt = LeadingExponents(d, order);
                foreach (var t in res.Remainder.Terms)
                {
                    bool divisible = true;
                    for (int v = 0; v < 3; v++) if (t.Exponents[v] < lt[v]) divisible = false;
                    Assert.False(divisible, $"remainder term divisible by LT(d), iteration {i}");
                }
            }
        }
    }

    private static int[] LeadingExponents(LaurentPolynomial d, MonomialOrder order)
    {
        int[]? best = null;
        foreach (var t in d.Terms)
        {
            var e = t.Exponents.ToArray();
            if (best is null || global::Integrable.Kernels.PolynomialDivRem.Compare(e, best, (int)order) > 0) best = e;
        }
        return best!;
    }

    [Fact]
    public void RingTryDivide_MatchesTryDivideExact()
    {
        var x = R.Variable(0);
        Assert.True(R.TryDivide(x * x - 1, x + 1, out var q));
        Assert.Equal(x - 1, q);
        Assert.False(R.TryDivide(x * x + 1, x + 1, out _));
    }
}
