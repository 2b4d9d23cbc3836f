using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Tests.Series;

public class PowerSeriesTests
{
    private static readonly PowerSeriesRing<Rational> Q = PowerSeriesRing.Rationals;

    [Fact]
    public void Multiply_ValuationAwarePrecision_MatchesConvention()
    {
        var x = Q.X;
        var a = x + Q.O(5);
        Assert.Equal(Q.Monomial(1, 2) + Q.O(6), a * a);            // min(5 + 1, 5 + 1)
        Assert.Equal(Q.O(4), x * Q.O(3));
        var u = 1 + x + Q.O(5);
        Assert.Equal(5, (u * (2 + x + Q.O(7))).Precision);           // units: the smaller precision
        Assert.Equal(5, (u + (x + Q.O(9))).Precision);
        Assert.True((x * x).IsExact);
        Assert.Equal("1 + x + O(x^5)", u.ToString());
        Assert.Equal("O(x^4)", Q.O(4).ToString());
        Assert.Equal("1 - 1/2*x^3", (1 - x.Pow(3) / 2).ToString());
    }

    [Fact]
    public void Inverse_RandomSeries_ProductIsOne()
    {
        var rng = new Random(11);
        for (int trial = 0; trial < 20; trial++)
        {
            int n = rng.Next(1, 60);
            var f = SeriesTestData.RandomSeries(rng, n, rng.Next(1, 80));
            if (f.Coefficients.Length == 0 || f.Coefficients[0].IsZero) continue;
            var g = f.Inverse();
            Assert.Equal(n, g.Precision);
            Assert.Equal(Q.One + Q.O(n), f * g);
        }
    }

    [Fact]
    public void Divide_ByX_ShiftsAndKeepsPrecision()
    {
        var x = Q.X;
        var f = x + x * x + Q.O(6);
        Assert.Equal(1 + x + Q.O(5), f / x);
        Assert.Throws<ArgumentException>(() => (1 + x + Q.O(4)) / x);
        Assert.Throws<DivideByZeroException>(() => f / Q.O(3));
        Assert.Throws<InvalidOperationException>(() => Q.One / (1 - x));
        Assert.Equal(Q.FromFunction(_ => 1, 7), PowerSeries<Rational>.Divide(Q.One, 1 - x, 7));
    }

    [Fact]
    public void ExpOfLog_OnePlusX_IsOnePlusX()
    {
        // exp(log(1 + x)) = 1 + x (common knowledge).
        var f = 1 + Q.X + Q.O(40);
        Assert.Equal(f, f.Log().Exp());
        // log(1 + x) = Σ (−1)^{k+1} x^k / k (Mercator series, common knowledge).
        var log = f.Log();
        for (int k = 1; k < 40; k++) Assert.Equal(new Rational(k % 2 == 1 ? 1 : -1, k), log[k]);
    }

    [Fact]
    public void LogOfExp_X_IsX()
    {
        var x = Q.X + Q.O(50);
        var e = x.Exp();
        // exp(x) = Σ x^k / k! (common knowledge).
        Rational fact = 1;
        for (int k = 0; k < 50; k++) { if (k > 0) fact *= k; Assert.Equal(fact.Inverse(), e[k]); }
        Assert.Equal(x, e.Log());
    }

    [Fact]
    public void Sqrt_OneMinusFourX_GivesCatalan()
    {
        // C(x) = (1 − sqrt(1 − 4x)) / (2x) (common knowledge; OEIS A000108).
        const int n = 31;
        var s = (1 - 4 * Q.X + Q.O(n)).Sqrt();
        Assert.Equal(1 - 4 * Q.X + Q.O(n), s * s);
        var c = (1 - s) / (2 * Q.X);
        Assert.Equal(n - 1, c.Precision);
        for (int k = 0; k < n - 1; k++) Assert.Equal(new Rational(SeriesTestData.Catalan(k)), c[k]);
    }

    [Fact]
    public void Sqrt_EvenValuationAndErrors()
    {
        var x = Q.X;
        var f = (x * x * 9) * (1 + x + Q.O(10));
        var r = f.Sqrt();
        Assert.Equal(f, r * r);
        Assert.Equal(1, r.Valuation);
        Assert.Throws<ArgumentException>(() => (x + Q.O(5)).Sqrt());
        Assert.Throws<ArgumentException>(() => (2 + x + Q.O(5)).Sqrt());
        Assert.Throws<InvalidOperationException>(() => (1 + x).Sqrt());
    }

    [Fact]
    public void Compose_RandomSeries_IsAssociative()
    {
        var rng = new Random(5);
        for (int trial = 0; trial < 8; trial++)
        {
            int n = rng.Next(2, 25);
            var f = SeriesTestData.RandomSeries(rng, n, 20);
            var g = SeriesTestData.RandomSeries(rng, n, 20, valuation: 1);
            var h = SeriesTestData.RandomSeries(rng, n, 20, valuation: 1);
            var left = f.Compose(g).Compose(h);
            var right = f.Compose(g.Compose(h));
            Assert.True(left.AgreesWith(right));
            Assert.True(left.Precision >= n);
        }
    }

    [Fact]
    public void Compose_ExpWithLog_IsIdentity()
    {
        var x = Q.X + Q.O(20);
        var expm1 = x.Exp() - 1;
        var log1p = (1 + x).Log();
        Assert.Equal(x, expm1.Compose(log1p));
        Assert.Throws<ArgumentException>(() => x.Compose(1 + x));
    }

    [Fact]
    public void Pow_MatchesRepeatedProduct_AndNegative()
    {
        var rng = new Random(3);
        var f = SeriesTestData.RandomSeries(rng, 15, 10);
        var p = f;
        for (int k = 2; k <= 7; k++) { p *= f; Assert.Equal(p, f.Pow(k)); }
        Assert.Equal(f.Pow(3).Inverse(), f.Pow(-3));
        Assert.Equal(Q.One, f.Pow(0));
        Assert.Equal(Q.Monomial(1, 6) + Q.O(10), (Q.X + Q.O(5)).Pow(6)); // n + (k−1)v
    }

    [Fact]
    public void DerivativeIntegral_RoundTrip()
    {
        var rng = new Random(9);
        var f = SeriesTestData.RandomSeries(rng, 20, 30);
        var g = f.Integral();
        Assert.Equal(21, g.Precision);
        Assert.Equal(f, g.Derivative());
    }

    [Fact]
    public void Modular_AgreesWithRationalReducedModP()
    {
        var field = new PrimeField(1_000_003);
        var zp = PowerSeriesRing.Modular(field);
        var rng = new Random(17);
        for (int trial = 0; trial < 4; trial++)
        {
            int n = rng.Next(8, 24);
            var f = SeriesTestData.RandomSeries(rng, n, 12);
            var g = SeriesTestData.RandomSeries(rng, n, 12, valuation: 1);
            if (f[0].IsZero || !field.CanReduce(f[0])) continue;
            PowerSeries<ulong> R(PowerSeries<Rational> s) => PowerSeriesRing.Reduce(s, zp);
            Assert.Equal(R(f * g), R(f) * R(g));
            Assert.Equal(R(f.Inverse()), R(f).Inverse());
            Assert.Equal(R(g.Exp()), R(g).Exp());
            Assert.Equal(R((1 + g).Log()), R(1 + g).Log());
            Assert.Equal(R(f.Compose(g)), R(f).Compose(R(g)));
            var sq = f * f;
            Assert.Equal(R(sq), R(sq).Sqrt().Pow(2));
        }
    }

    [Fact]
    public void Modular_SmallCharacteristic_RefusesDivisionByP()
    {
        var zp = PowerSeriesRing.Modular(new PrimeField(7));
        var x = zp.X + zp.O(20);
        Assert.Throws<ArithmeticException>(() => x.Exp());
        Assert.Throws<ArithmeticException>(() => (1 + x).Log());
        var inv = (1 + x).Inverse();
        Assert.Equal(zp.One + zp.O(20), inv * (1 + x));
    }

    [Fact]
    public void MixingRings_Throws()
    {
        var zp = PowerSeriesRing.Modular(new PrimeField(101));
        var zq = PowerSeriesRing.Modular(new PrimeField(103));
        Assert.Throws<IncompatibleRingException>(() => zp.X + zq.X);
        Assert.Equal(zp, PowerSeriesRing.Modular(new PrimeField(101)));
    }

    [Fact]
    public void Indexer_BeyondPrecision_Throws()
    {
        var f = 1 + Q.X + Q.O(3);
        Assert.Equal(Rational.Zero, f[2]);
        Assert.Throws<ArgumentOutOfRangeException>(() => f[3]);
    }
}
