using System.Numerics;
using Integrable.Kernels;
using Integrable.Numbers;
using Integrable.Polynomials;
using Xunit;
using static Integrable.Tests.Kernels.SparseReference;

namespace Integrable.Tests.Kernels;

/// <summary>Exact division by Kronecker substitution into Z[t] (<c>PolynomialDivide.TryDivideKronecker</c>)
/// against naive products and the classical division kernels (common practice: differential testing).</summary>
public class PolynomialDivideKroneckerTests
{
    private static T Forced<T>(Func<T> f)
    {
        PolynomialDivide.ForceKronecker = true;
        try { return f(); }
        finally { PolynomialDivide.ForceKronecker = false; }
    }

    public static TheoryData<int, int, int> Shapes => new() { { 1, 1, 20 }, { 2, 2, 90 }, { 3, 2, 250 }, { 4, 3, 140 }, { 5, 1, 400 } };

    /// <summary>A·B / B with divisors that are not primitive (content 6, or a negative leading coefficient): the
    /// quotient must be A exactly, in canonical order, and equal to the classical kernel's; A·B + (monomial)
    /// and A·B + B·(a term outside A's box) must be reported non-divisible by both.</summary>
    [Theory]
    [MemberData(nameof(Shapes))]
    public void TryDivideExact_Forced_MatchesClassicalDivision(int seed, int vars, int maxBits)
    {
        var rng = new Random(seed);
        var ring = new LaurentPolynomialRing([.. Enumerable.Range(0, vars).Select(i => $"x{i}")]);
        int before = PolynomialDivide.KroneckerDivisions, cases = 0;
        for (int it = 0; it < 10; it++)
        {
            int range = vars == 1 ? 40 : vars == 2 ? 10 : 5;
            var a = RandomPolynomial(rng, vars, rng.Next(1, 40), -range / 2, range, maxBits);
            var b = RandomPolynomial(rng, vars, rng.Next(2, 25), -range / 2, range, maxBits);
            if (a.Count == 0 || b.Count < 2) continue;
            cases++;
            var pa = Build(ring, a);
            var pb = Build(ring, b, it % 3 == 0 ? 6 : it % 3 == 1 ? -1 : 1);
            var product = Build(ring, NaiveProduct(a, b), it % 3 == 0 ? 6 : it % 3 == 1 ? -1 : 1);
            var q = Forced(() => product.TryDivideExact(pb, out var x) ? x : null);
            Assert.NotNull(q);
            Assert.True(q.IsCanonical());
            Assert.Equal(pa, q);
            var stray = product + ring.Monomial(Rational.One, [.. Enumerable.Range(0, vars).Select(_ => rng.Next(-range, range))]);
            bool classical = stray.TryDivideExact(pb, out var qc);
            Assert.Equal(classical, Forced(() => stray.TryDivideExact(pb, out var qk) && qk == qc));
        }
        Assert.True(PolynomialDivide.KroneckerDivisions - before >= cases, "the Kronecker division ran");
    }

    [Fact]
    public void TryDivideExact_Forced_RationalQuotientOverContent()
    {
        // (x + 1)·(2x + 4) / (4x + 8) = (x + 1)/2: a rational quotient of integer polynomials.
        var ring = new LaurentPolynomialRing("x");
        var x = ring.Variable(0);
        var dividend = (x + ring.One) * (2 * x + 4 * ring.One);
        var divisor = 4 * x + 8 * ring.One;
        Assert.True(Forced(() => dividend.TryDivideExact(divisor, out var q) ? q == (x + ring.One) * new Rational(1, 2) : false));
    }

    /// <summary>The automatic choice takes the Kronecker division for wide dense divisions: Somos-4 from x_0..x_3 has
    /// coefficients past 126 bits from about the 30th term, and its iterates are Laurent polynomials whose values at
    /// ones are OEIS A006720 (1, 1, 1, 1, 2, 3, 7, 23, 59, 314, …; the 15th term 7869898 from the OEIS entry, the 34th
    /// through the integer recurrence).</summary>
    [Fact]
    public void SomosIterates_WideSteps_UseKroneckerDivision()
    {
        var ring = new LaurentPolynomialRing("x_0", "x_1", "x_2", "x_3");
        var x = new List<LaurentPolynomial> { ring.Variable(0), ring.Variable(1), ring.Variable(2), ring.Variable(3) };
        var ones = new List<BigInteger> { 1, 1, 1, 1 };
        int before = PolynomialDivide.KroneckerDivisions;
        for (int n = 4; n <= 33; n++)
        {
            Assert.True((x[n - 1] * x[n - 3] + x[n - 2] * x[n - 2]).TryDivideExact(x[n - 4], out var next));
            x.Add(next);
            ones.Add((ones[n - 1] * ones[n - 3] + ones[n - 2] * ones[n - 2]) / ones[n - 4]);
        }
        Assert.True(PolynomialDivide.KroneckerDivisions > before, "wide Somos divisions ran by Kronecker substitution");
        var sum = Rational.Zero;
        foreach (var c in x[33].Coefficients) sum += c;
        Assert.Equal(new Rational(ones[33]), sum);
        Assert.Equal(new Rational(7869898), x[14].Coefficients.ToArray().Aggregate(Rational.Zero, (s, c) => s + c));
    }

    private static BigInteger[] Dense(Random rng, int length, int maxBits)
    {
        var d = new BigInteger[length];
        for (int i = 0; i < length; i++) d[i] = rng.Next(4) == 0 ? BigInteger.Zero : RandomInteger(rng, maxBits);
        d[^1] = RandomInteger(rng, maxBits);
        return d;
    }

    private static BigInteger[] Times(BigInteger[] a, BigInteger[] b)
    {
        var r = new BigInteger[a.Length + b.Length - 1];
        for (int i = 0; i < a.Length; i++)
            for (int j = 0; j < b.Length; j++) r[i + j] += a[i] * b[j];
        return r;
    }

    private static int Bits(BigInteger[] a) => a.Max(x => (int)BigInteger.Abs(x).GetBitLength());

    /// <summary>Univariate quotients by Newton inversion modulo the transform primes: exact products are divided back
    /// to the factor, and the answer is counted; a perturbed dividend, a quotient larger than the guessed size (the
    /// margin made negative) and a leading coefficient divisible by the first prime are left undecided, never answered
    /// wrongly; the division with verification then decides them (common practice: checks against schoolbook products).</summary>
    [Fact]
    public void KroneckerQuotient_DividesBackOrLeavesUndecided()
    {
        var rng = new Random(11);
        for (int it = 0; it < 12; it++)
        {
            var q = Dense(rng, rng.Next(1, 300), 200);
            var b = Dense(rng, rng.Next(2, 120), 150);
            var a = Times(q, b);
            int before = KroneckerQuotient.Answered;
            Assert.True(KroneckerQuotient.TryDivide(a, b, Bits(a), Bits(b), out var got));
            Assert.Equal(q, got);
            Assert.Equal(before + 1, KroneckerQuotient.Answered);
            var perturbed = (BigInteger[])a.Clone();
            perturbed[rng.Next(perturbed.Length - 1)] += 1;
            Assert.False(KroneckerQuotient.TryDivide(perturbed, b, Bits(perturbed), Bits(b), out _));
            Assert.False(Integrable.Kernels.Univariate.IntegerPoly.TryDivideExact(perturbed, b, out _));
        }
        // The guess too small: the reconstruction is wrong and the check refuses it.
        var q2 = Dense(rng, 50, 300);
        var b2 = Dense(rng, 10, 20);
        var a2 = Times(q2, b2);
        int saved = KroneckerQuotient.GuessMarginBits;
        KroneckerQuotient.GuessMarginBits = -Bits(a2) + 40;
        try { Assert.False(KroneckerQuotient.TryDivide(a2, b2, Bits(a2), Bits(b2), out _)); }
        finally { KroneckerQuotient.GuessMarginBits = saved; }
        // The first transform prime divides lc(b): undecided.
        var b3 = Dense(rng, 10, 40);
        b3[^1] = KroneckerProduct.TransformPrimes[0].Q;
        Assert.False(KroneckerQuotient.TryDivide(Times(q2, b3), b3, Bits(Times(q2, b3)), Bits(b3), out _));
    }

    [Fact]
    public void TryDivideExact_Forced_GuessTooSmall_FallsBackToVerifiedDivision()
    {
        var rng = new Random(12);
        var ring = new LaurentPolynomialRing("x", "y");
        var a = RandomPolynomial(rng, 2, 30, -4, 8, 300);
        var b = RandomPolynomial(rng, 2, 12, -4, 8, 30);
        var pa = Build(ring, a);
        var pb = Build(ring, b);
        var product = Build(ring, NaiveProduct(a, b));
        int saved = KroneckerQuotient.GuessMarginBits;
        KroneckerQuotient.GuessMarginBits = -250;
        try { Assert.Equal(pa, Forced(() => product.TryDivideExact(pb, out var q) ? q : null)); }
        finally { KroneckerQuotient.GuessMarginBits = saved; }
    }
}
