using System.Numerics;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;
using Integrable.Univariate;
using static Integrable.Tests.Univariate.UnivariateTestSupport;

namespace Integrable.Tests.Univariate;

[Collection(ThresholdCollection.Name)]
public class PolynomialModPGcdTests
{
    private static void CheckGcdLaws(ulong p, int seed, int maxDegree)
    {
        var f = new PrimeField(p);
        var rng = new Random(seed);
        for (int t = 0; t < 6; t++)
        {
            var common = RandomMonic(rng, f, rng.Next(0, maxDegree / 2));
            var g = RandomPoly(rng, f, rng.Next(0, maxDegree / 2));
            var h = RandomPoly(rng, f, rng.Next(0, maxDegree / 2));
            var a = common * g;
            var b = common * h;
            var d = PolynomialModP.Gcd(a, b);
            Assert.True(d.IsMonic);
            Assert.True(a.TryDivideExact(d, out var ca));
            Assert.True(b.TryDivideExact(d, out var cb));
            Assert.True(PolynomialModP.Gcd(ca, cb).IsOne);                   // cofactors coprime
            Assert.True(d.TryDivideExact(common, out _));                    // common factor divides the gcd
            Assert.Equal(PolynomialModP.Gcd(g, h) * common, d);             // gcd(f·g, f·h) = f·gcd(g, h), f monic
            var (e, s, u) = PolynomialModP.ExtendedGcd(a, b);
            Assert.Equal(d, e);
            Assert.Equal(e, s * a + u * b);
            if (a.Degree > d.Degree && b.Degree > d.Degree)
            {
                Assert.True(s.Degree < b.Degree - d.Degree);
                Assert.True(u.Degree < a.Degree - d.Degree);
            }
        }
    }

    [Theory]
    [MemberData(nameof(ModuliData), MemberType = typeof(UnivariateTestSupport))]
    public void Gcd_Laws_DefaultThresholds(ulong p) => CheckGcdLaws(p, 31, 120);

    [Theory]
    [MemberData(nameof(ModuliData), MemberType = typeof(UnivariateTestSupport))]
    public void Gcd_Laws_HalfGcdForcedLow(ulong p)
    {
        using var _ = new ThresholdScope(halfGcd: 4, halfGcdBase: 4, ntt: 1, transformCostFactor: 0, matrixTransform: 1, newton: 8);
        CheckGcdLaws(p, 32, 160);
    }

    [Fact]
    public void Gcd_CoprimeFactors_GivesTheCommonMonicFactor()
    {
        var f = new PrimeField(2147483647);
        var rng = new Random(33);
        for (int t = 0; t < 5; t++)
        {
            var common = RandomMonic(rng, f, 30 + t);
            var g = RandomPoly(rng, f, 50);
            var h = RandomPoly(rng, f, 61);
            if (!PolynomialModP.Gcd(g, h).IsOne) continue;   // random g, h are coprime with probability 1 − 1/p
            Assert.Equal(common, PolynomialModP.Gcd(common * g, common * h));
        }
    }

    [Fact]
    public void HalfGcd_MatchesEuclid_DegreeFewThousand()
    {
        var f = new PrimeField(2147483647);
        var ctx = PolyModContext.For(f);
        var rng = new Random(34);
        for (int t = 0; t < 3; t++)
        {
            int dc = new[] { 0, 700, 1900 }[t];
            var common = RandomMonic(rng, f, dc);
            var a = common * RandomPoly(rng, f, 3000 - dc);
            var b = common * RandomPoly(rng, f, 2600 - dc);
            var fast = PolyMod.Gcd(ctx, a.ToArray(), b.ToArray());
            var slow = PolyMod.GcdEuclid(ctx, a.ToArray(), b.ToArray());
            Assert.Equal(slow, fast);
            Assert.Equal(common.ToArray(), fast);
        }
    }

    [Fact]
    public void Operations_BeyondTheLargestTransform_UseChunkedProducts()
    {
        // With the largest transform lowered to 256 the products, Newton divisions and half-GCD matrix
        // products of degree-800 inputs all take the chunked paths; results must not change.
        var f = new PrimeField(2147483647);
        var rng = new Random(39);
        var common = RandomMonic(rng, f, 250);
        var a = common * RandomPoly(rng, f, 550);
        var b = common * RandomPoly(rng, f, 420);
        var expectedProduct = ReferenceProduct(a.Coefficients, b.Coefficients, f.Modulus);
        var (q0, r0) = PolynomialModP.DivRem(a, b);
        using var _ = new ThresholdScope(maxTransform: 256);
        Assert.Equal(expectedProduct, (a * b).ToArray());
        var (q, r) = PolynomialModP.DivRem(a, b);
        Assert.Equal(q0, q);
        Assert.Equal(r0, r);
        Assert.Equal(common, PolynomialModP.Gcd(a, b));
    }

    [Fact]
    public void HalfGcd_ReducedPairStraddlesHalfDegree_AndMatrixMapsInputs()
    {
        var f = new PrimeField(998244353);
        var ctx = PolyModContext.For(f);
        var rng = new Random(35);
        foreach (int n in new[] { 9, 64, 257, 1500 })
        {
            var a = RandomPoly(rng, f, n).ToArray();
            var b = RandomPoly(rng, f, n - 1 - rng.Next(0, 3)).ToArray();
            var (m, c, d) = PolyMod.HalfGcd(ctx, a, b, needMatrix: true);
            int half = (n + 1) / 2;
            Assert.True(c.Length - 1 >= half && d.Length - 1 < half);
            var (x, y) = PolyMod.MatVec(ctx, m!, a, b);
            Assert.Equal(c, x);
            Assert.Equal(d, y);
            // (c, d) is a consecutive pair of the Euclidean remainder sequence of (a, b).
            var (r0, r1) = (a, b);
            while (r1.Length > c.Length) (r0, r1) = (r1, PolyMod.DivRemBasic(ctx.Mod, r0, r1).Remainder);
            Assert.Equal(MakeMonicArr(ctx, r1), MakeMonicArr(ctx, c));
        }
    }

    [Theory]
    [InlineData(60, 5000)]
    [InlineData(300, 2000)]
    [InlineData(1000, 1100)]
    public void MatVec_ChunkedTransforms_MatchDirectProducts(int entryLength, int vectorLength)
    {
        // Short matrix entries against long vectors: the transform path may cut the vectors into chunks.
        var f = new PrimeField(2147483647);
        var ctx = PolyModContext.For(f);
        var rng = new Random(38);
        var m = new PolyMatrix(RandomPoly(rng, f, entryLength - 1).ToArray(), RandomPoly(rng, f, entryLength - 3).ToArray(),
            RandomPoly(rng, f, entryLength - 2).ToArray(), RandomPoly(rng, f, entryLength - 1).ToArray());
        var x = RandomPoly(rng, f, vectorLength - 1);
        var y = RandomPoly(rng, f, vectorLength - 7);
        var (u, v) = PolyMod.MatVec(ctx, m, x.ToArray(), y.ToArray());
        PolynomialModP P(ulong[] c) => PolynomialModP.FromCoefficients(f, c);
        Assert.Equal(P(m.M00) * x + P(m.M01) * y, P(u));
        Assert.Equal(P(m.M10) * x + P(m.M11) * y, P(v));
    }

    private static ulong[] MakeMonicArr(PolyModContext ctx, ulong[] a) => PolyMod.MakeMonic(ctx.Mod, a);

    [Fact]
    public void ExtendedGcd_ZeroInputs()
    {
        var f = new PrimeField(101);
        var z = PolynomialModP.Zero(f);
        var a = PolynomialModP.FromCoefficients(f, 3, 2);
        var (g, s, t) = PolynomialModP.ExtendedGcd(a, z);
        Assert.Equal(a.MakeMonic(), g);
        Assert.Equal(g, s * a + t * z);
        (g, s, t) = PolynomialModP.ExtendedGcd(z, z);
        Assert.True(g.IsZero && s.IsZero && t.IsZero);
        Assert.True(PolynomialModP.Gcd(z, z).IsZero);
    }

    [Fact]
    public void Resultant_MatchesSylvesterDeterminant_SmallInputs()
    {
        // res(a, b) = det Syl(a, b) (the definition; common knowledge, e.g. von zur Gathen and Gerhard,
        // Modern Computer Algebra, 3rd ed. 2013, §6.3); the reference determinant is plain elimination.
        var rng = new Random(36);
        foreach (ulong p in new ulong[] { 3, 101, 2147483647, Primes.Large(2) })
        {
            var f = new PrimeField(p);
            for (int t = 0; t < 12; t++)
            {
                var a = RandomPoly(rng, f, rng.Next(1, 9));
                var b = RandomPoly(rng, f, rng.Next(1, 9));
                var sa = a.Coefficients.ToArray().Select(c => (BigInteger)c).ToArray();
                var sb = b.Coefficients.ToArray().Select(c => (BigInteger)c).ToArray();
                ulong expected = DeterminantModP(Sylvester(sa, sb), p);
                Assert.Equal(expected, PolynomialModP.Resultant(a, b));
            }
        }
        var g = new PrimeField(101);
        Assert.Equal(0UL, PolynomialModP.Resultant(PolynomialModP.Zero(g), PolynomialModP.X(g)));
        Assert.Equal(g.Pow(7, 3), PolynomialModP.Resultant(PolynomialModP.Constant(g, 7), PolynomialModP.X(g).Pow(3) + 1));
    }

    [Fact]
    public void Resultant_SplitPolynomial_IsLeadingPowerTimesProductOfValues()
    {
        // For f = c·Π (x − αᵢ): res(f, g) = c^deg g · Π g(αᵢ) (common knowledge, e.g. Lang, Algebra, IV §8).
        var f = new PrimeField(2147483647);
        var rng = new Random(37);
        for (int t = 0; t < 5; t++)
        {
            var roots = Enumerable.Range(0, 25 + t).Select(_ => rng.NextResidue(f.Modulus)).ToArray();
            ulong c = 1 + rng.NextResidue(f.Modulus - 1);
            var a = PolynomialModP.FromRoots(f, roots).Scale(c);
            var b = RandomPoly(rng, f, 40 + t);
            ulong expected = f.Pow(c, b.Degree);
            foreach (var r in roots) expected = f.Multiply(expected, b.Evaluate(r));
            Assert.Equal(expected, PolynomialModP.Resultant(a, b));
        }
    }

    [Fact]
    public void Discriminant_VanishesExactlyOnRepeatedRoots()
    {
        var f = new PrimeField(1000003);
        var x = PolynomialModP.X(f);
        Assert.Equal(0UL, ((x - 3) * (x - 3) * (x + 1)).Discriminant());
        // disc(x² + b x + c) = b² − 4c (common knowledge).
        var q = x * x + 5 * x + 7;
        Assert.Equal(f.FromInteger(25 - 28), q.Discriminant());
    }
}
