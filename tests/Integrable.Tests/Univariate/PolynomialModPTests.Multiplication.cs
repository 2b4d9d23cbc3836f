using Integrable.Kernels.Univariate;
using Integrable.Numbers;
using Integrable.Univariate;
using static Integrable.Tests.Univariate.UnivariateTestSupport;

namespace Integrable.Tests.Univariate;

/// <summary>Differential tests of every multiplication variant against an exact quadratic reference
/// (the FLINT-style check of algorithm variants with thresholds forced low).</summary>
[Collection(ThresholdCollection.Name)]
public class PolynomialModPMultiplicationTests
{
    private static readonly (int, int)[] Shapes =
    [
        (0, 0), (0, 5), (1, 1), (3, 17), (15, 16), (31, 31), (32, 33), (40, 7), (63, 64), (100, 3), (127, 129),
        (200, 200), (255, 256), (300, 41), (511, 513),
    ];

    private static void CheckAll(ulong p, int seed)
    {
        var f = new PrimeField(p);
        var rng = new Random(seed);
        foreach (var (da, db) in Shapes)
        {
            var a = RandomPoly(rng, f, da);
            var b = RandomPoly(rng, f, db);
            var expected = ReferenceProduct(a.Coefficients, b.Coefficients, p);
            Assert.Equal(expected, (a * b).ToArray());
            Assert.Equal(expected, (b * a).ToArray());
        }
        // Squares (the transform path shares one transform).
        var s = RandomPoly(rng, f, 300);
        Assert.Equal(ReferenceProduct(s.Coefficients, s.Coefficients, p), s.Square().ToArray());
    }

    [Theory]
    [MemberData(nameof(ModuliData), MemberType = typeof(UnivariateTestSupport))]
    public void Multiply_DefaultDispatch_MatchesReference(ulong p) => CheckAll(p, 1);

    [Theory]
    [MemberData(nameof(ModuliData), MemberType = typeof(UnivariateTestSupport))]
    public void Multiply_SchoolbookOnly_MatchesReference(ulong p)
    {
        using var _ = new ThresholdScope(karatsuba: int.MaxValue, ntt: int.MaxValue);
        CheckAll(p, 2);
    }

    [Theory]
    [MemberData(nameof(ModuliData), MemberType = typeof(UnivariateTestSupport))]
    public void Multiply_KaratsubaForcedLow_MatchesReference(ulong p)
    {
        using var _ = new ThresholdScope(karatsuba: 4, ntt: int.MaxValue);
        CheckAll(p, 3);
    }

    [Theory]
    [MemberData(nameof(ModuliData), MemberType = typeof(UnivariateTestSupport))]
    public void Multiply_TransformForAllSizes_MatchesReference(ulong p)
    {
        using var _ = new ThresholdScope(karatsuba: 1, ntt: 1, transformCostFactor: 0);
        CheckAll(p, 4);
    }

    [Theory]
    [MemberData(nameof(ModuliData), MemberType = typeof(UnivariateTestSupport))]
    public void Multiply_Avx2TransformPath_MatchesReference(ulong p)
    {
        using var _ = new ThresholdScope(karatsuba: 1, ntt: 1, transformCostFactor: 0, vector512: false);
        CheckAll(p, 8);
    }

    [Theory]
    [MemberData(nameof(ModuliData), MemberType = typeof(UnivariateTestSupport))]
    public void Multiply_ScalarTransformPath_MatchesReference(ulong p)
    {
        using var _ = new ThresholdScope(karatsuba: 1, ntt: 1, transformCostFactor: 0, vector: false);
        CheckAll(p, 5);
    }

    [Fact]
    public void Multiply_LargeDegree_MatchesEvaluationAtRandomPoints()
    {
        // deg 40000 products: check (a·b)(x) = a(x)·b(x) at several points (a product is determined by
        // enough evaluations; a wrong coefficient would be detected with probability ≥ 1 − deg/p per point).
        foreach (ulong p in new ulong[] { 2147483647, Primes.Large(0) })
        {
            var f = new PrimeField(p);
            var rng = new Random(6);
            var a = RandomPoly(rng, f, 40000);
            var b = RandomPoly(rng, f, 25000);
            var c = a * b;
            Assert.Equal(65000, c.Degree);
            for (int i = 0; i < 5; i++)
            {
                ulong x = rng.NextResidue(p);
                Assert.Equal(f.Multiply(a.Evaluate(x), b.Evaluate(x)), c.Evaluate(x));
            }
        }
    }

    [Fact]
    public void MultiplyCyclic_FoldsTheFullProduct()
    {
        var f = new PrimeField(2147483647);
        var ctx = PolyModContext.For(f);
        var rng = new Random(7);
        var a = RandomPoly(rng, f, 700).ToArray();
        var b = RandomPoly(rng, f, 500).ToArray();
        var full = ReferenceProduct(a, b, f.Modulus);
        const int len = 512;
        var expected = new ulong[len];
        for (int i = 0; i < full.Length; i++) expected[i % len] = f.Add(expected[i % len], full[i]);
        var got = new ulong[len];
        ctx.Ntt.MultiplyCyclic(a, b, len, got);
        Assert.Equal(expected, got);
    }

    [Fact]
    public void Multiply_FieldsDiffer_Throws()
    {
        var a = PolynomialModP.X(new PrimeField(101));
        var b = PolynomialModP.X(new PrimeField(103));
        Assert.Throws<Integrable.Algebra.IncompatibleRingException>(() => a * b);
        Assert.Throws<Integrable.Algebra.IncompatibleRingException>(() => a + b);
    }
}
