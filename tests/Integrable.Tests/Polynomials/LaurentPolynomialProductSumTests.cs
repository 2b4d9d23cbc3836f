using System.Numerics;
using CsCheck;
using Integrable.Kernels;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Recursions;
using Integrable.Tests.Hardening;
using Xunit;

namespace Integrable.Tests.Polynomials;

/// <summary>The fused exchange step (a·b + c·d)/e against the same computation done step by step
/// (differential testing: common practice), and the recursions that run through it against published
/// values.</summary>
public class LaurentPolynomialProductSumTests
{
    private static readonly Gen<BigInteger> Small = Gen.Int[-9, 9].Select(i => new BigInteger(i));

    /// <summary>Mostly small, with word-boundary and wide values (these send the step to the unfused path).</summary>
    private static readonly Gen<BigInteger> Wide = Gen.Frequency(
        (8, Small),
        (1, Gen.OneOf(new BigInteger(long.MaxValue), new BigInteger(long.MinValue) + 1, BigInteger.One << 40, BigInteger.One << 70)),
        (1, Gen.Long.Select(l => new BigInteger(l))));

    private static Gen<LaurentPolynomial> Poly(LaurentPolynomialRing ring, int minTerms, int maxTerms, int minExp, int maxExp) =>
        Gen.Int[0, 3].SelectMany(k => Gen.Select(k == 0 ? Wide : Small, Gen.Int[minExp, maxExp].Array[ring.VariableCount]).Array[minTerms, maxTerms]).Select(terms =>
        {
            var b = ring.CreateBuilder();
            foreach (var (c, e) in terms) b.Add(new Rational(c), e);
            return b.ToPolynomial();
        });

    private static (bool Ok, LaurentPolynomial Q) Unfused(LaurentPolynomial a, LaurentPolynomial b, LaurentPolynomial c, LaurentPolynomial d, LaurentPolynomial e)
    {
        ProductSumQuotient.Disabled = true;
        try { return (LaurentPolynomial.TryDivideProductSum(a, b, c, d, e, out var q), q); }
        finally { ProductSumQuotient.Disabled = false; }
    }

    /// <summary>Variable counts and exponent spreads that pack into one word (1–8 variables), two words
    /// (14–24 variables) and three or more (30–40 variables with wide exponents).</summary>
    public static TheoryData<int, int, int> Layouts => new() { { 1, 8, 1 }, { 14, 24, 1 }, { 30, 40, 20 } };

    [Theory]
    [MemberData(nameof(Layouts))]
    public void TryDivideProductSum_RandomExchanges_AgreeWithStepByStep(int minVars, int maxVars, int spread)
    {
        int answered = 0, divisible = 0, refused = 0;
        Gen.Int[minVars, maxVars].SelectMany(n => Gen.Const(new LaurentPolynomialRing([.. Enumerable.Range(0, n).Select(i => $"v{i}")])))
            .SelectMany(ring => Gen.Select(Gen.Const(ring), Poly(ring, 2, 9, -3 * spread, 4 * spread), Poly(ring, 2, 9, -2, 3 * spread),
                Poly(ring, 2, 7, -2 * spread, 3), Poly(ring, 2, 6, -1, 2), Gen.Int[0, 5]))
            .Sample((ring, u, b, w, e, shape) =>
            {
                if (u.TermCount < 2 || b.TermCount < 2 || w.TermCount < 2 || e.TermCount < 2) return;
                // shape 0–2: a divisible sum a·b + e·w with a = e·u (quotient u·b + w); 3: a square; 4–5: usually not divisible.
                var a = shape <= 2 ? e * u : u;
                var (pa, pb, pc, pd) = shape == 3 ? (a, a, e, w) : (a, b, e, w);
                int before = ProductSumQuotient.Answered;
                bool ok = LaurentPolynomial.TryDivideProductSum(pa, pb, pc, pd, e, out var q);
                answered += ProductSumQuotient.Answered - before;
                var (okRef, qRef) = Unfused(pa, pb, pc, pd, e);
                Assert.Equal(okRef, ok);
                if (ok)
                {
                    divisible++;
                    Assert.Equal(qRef, q);
                    Assert.Equal(pa * pb + pc * pd, q * e);
                }
                else refused++;
                if (shape <= 2) Assert.True(ok);
            }, iter: FuzzSettings.Iterations(300), threads: 1);
        // Both outcomes occur, and the fused kernel (not only the fallback) answered most of them.
        Assert.True(divisible > 40 && refused > 15, $"divisible {divisible}, refused {refused}");
        Assert.True(answered > 150, $"fused path answered {answered} calls");
    }

    [Fact]
    public void TryDivideProductSum_CancellingSum_IsZero()
    {
        var r = new LaurentPolynomialRing("x", "y");
        var x = r.Variable(0);
        var y = r.Variable(1);
        var a = x + y;
        var b = x - y.Pow(-1);
        Assert.True(LaurentPolynomial.TryDivideProductSum(a, b, -a, b, x + 1, out var q));
        Assert.True(q.IsZero);
    }

    [Fact]
    public void TryDivideProductSum_RationalCoefficientsAndMonomials_FallBackWithSameAnswer()
    {
        var r = new LaurentPolynomialRing("x", "y");
        var x = r.Variable(0);
        var y = r.Variable(1);
        var half = new Rational(1, 2);
        var e = half * x + y;
        // (x/2 + y)(x - y) + (x/2 + y)·y^-1 = (x/2 + y)(x - y + y^-1)
        Assert.True(LaurentPolynomial.TryDivideProductSum(e, x - y, e, y.Pow(-1), e, out var q));
        Assert.Equal(x - y + y.Pow(-1), q);
        Assert.False(LaurentPolynomial.TryDivideProductSum(x + 1, y + 1, x, y, x + y + 3, out _));
        Assert.False(LaurentPolynomial.TryDivideProductSum(x + 1, y + 1, x, y, r.Zero, out _));
    }

    [Fact]
    public void TryDivideProductSum_OtherRing_Throws()
    {
        var r = new LaurentPolynomialRing("x", "y");
        var s = new LaurentPolynomialRing("u");
        var x = r.Variable(0);
        Assert.Throws<Integrable.Algebra.IncompatibleRingException>(() => LaurentPolynomial.TryDivideProductSum(x, x, x, x, s.Variable(0), out _));
    }

    [Fact]
    public void Somos4Rule_FusedInLaurentRing_GivesOeisValuesAtOnes()
    {
        // Somos-4 x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2 from 1, 1, 1, 1: 1, 1, 1, 1, 2, 3, 7, 23, 59, 314,
        // 1529, 8209, 83313 (OEIS A006720). The Laurent iterates (through the fused step) evaluated at ones.
        long[] oeis = [1, 1, 1, 1, 2, 3, 7, 23, 59, 314, 1529, 8209, 83313];
        var rec = Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2");
        var ring = new LaurentPolynomialRing("a", "b", "c", "d");
        int before = ProductSumQuotient.Answered;
        var orbit = rec.Iterate(ring, [ring.Variable(0), ring.Variable(1), ring.Variable(2), ring.Variable(3)], oeis.Length - 4);
        Assert.True(ProductSumQuotient.Answered > before, "the Somos-4 rule should run through the fused step");
        for (int i = 0; i < oeis.Length; i++)
            Assert.Equal(new Rational(oeis[i]), orbit[i].Evaluate([Rational.One, Rational.One, Rational.One, Rational.One]));
    }
}
