using Integrable.Numbers;
using Integrable.Univariate;
using static Integrable.Tests.Univariate.UnivariateTestSupport;

namespace Integrable.Tests.Univariate;

[Collection(ThresholdCollection.Name)]
public class PolynomialModPDivisionTests
{
    private static readonly (int, int)[] Shapes =
    [
        (0, 0), (5, 0), (3, 5), (10, 1), (10, 9), (64, 31), (300, 150), (700, 20), (600, 450), (1000, 999), (2500, 1200),
    ];

    private static void CheckDivRem(ulong p, int seed)
    {
        var f = new PrimeField(p);
        var rng = new Random(seed);
        foreach (var (da, db) in Shapes)
        {
            var a = RandomPoly(rng, f, da);
            var b = RandomPoly(rng, f, db);
            var (q, r) = PolynomialModP.DivRem(a, b);
            Assert.Equal(a, q * b + r);
            Assert.True(r.Degree < b.Degree);
            Assert.Equal(Math.Max(da - db, -1), q.Degree);
            // Exact division of a product.
            Assert.True((a * b).TryDivideExact(b, out var back));
            Assert.Equal(a, back);
            if (db > 0) Assert.False((a * b + PolynomialModP.One(f)).TryDivideExact(b, out _));
        }
    }

    [Theory]
    [MemberData(nameof(ModuliData), MemberType = typeof(UnivariateTestSupport))]
    public void DivRem_DefaultDispatch_Identity(ulong p) => CheckDivRem(p, 21);

    [Theory]
    [MemberData(nameof(ModuliData), MemberType = typeof(UnivariateTestSupport))]
    public void DivRem_NewtonForcedLow_Identity(ulong p)
    {
        using var _ = new ThresholdScope(newton: 2, ntt: 1, transformCostFactor: 0);
        CheckDivRem(p, 22);
    }

    [Fact]
    public void DivRem_NewtonAndLongDivision_Agree()
    {
        var f = new PrimeField(2147483647);
        var rng = new Random(23);
        var a = RandomPoly(rng, f, 3000);
        var b = RandomPoly(rng, f, 1100);
        (PolynomialModP, PolynomialModP) slow, fast;
        using (new ThresholdScope(newton: int.MaxValue)) slow = PolynomialModP.DivRem(a, b);
        using (new ThresholdScope(newton: 2)) fast = PolynomialModP.DivRem(a, b);
        Assert.Equal(slow, fast);
    }

    [Fact]
    public void DivRem_SameDivisorRepeatedly_ReusesAndExtendsTheReciprocal()
    {
        // The divisor caches the inverse of its reversal; later divisions with longer quotients extend it.
        var f = new PrimeField(2147483647);
        var rng = new Random(24);
        var b = RandomPoly(rng, f, 500);
        foreach (int da in new[] { 1300, 900, 2600, 1000, 3100 })
        {
            var a = RandomPoly(rng, f, da);
            var (q, r) = PolynomialModP.DivRem(a, b);
            Assert.Equal(a, q * b + r);
            Assert.True(r.Degree < b.Degree);
            Assert.Equal(a, (a * b).DivideExact(b));
        }
    }

    [Fact]
    public void Divide_ByZero_Throws()
    {
        var f = new PrimeField(101);
        var a = PolynomialModP.X(f);
        Assert.Throws<DivideByZeroException>(() => PolynomialModP.DivRem(a, PolynomialModP.Zero(f)));
        Assert.Throws<DivideByZeroException>(() => a % PolynomialModP.Zero(f));
        Assert.Throws<ArithmeticException>(() => a.DivideExact(a + 1));
    }
}
