using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Tests.Series;

public class LaurentSeriesTests
{
    private static readonly LaurentSeries E = LaurentSeries.Epsilon;

    private static LaurentSeries C(Rational c) => LaurentSeries.Constant(c);

    [Fact]
    public void Product_PoleTimesGeometric_IsOne()
    {
        // (ε^-2 + 1)·(ε² − ε⁴ + ε⁶ − …) = (ε^-2 + 1)·ε²/(1 + ε²) = 1 (geometric series, common knowledge).
        var a = E.Pow(-2) + 1;
        var coeffs = new Rational[10];
        for (int i = 0; i < 10; i++) coeffs[i] = i % 2 == 0 ? (i % 4 == 0 ? 1 : -1) : 0;
        var b = LaurentSeries.Create(coeffs, 2, 12);          // ε² − ε⁴ + … + O(ε^12)
        var p = a * b;
        Assert.Equal(LaurentSeries.One + LaurentSeries.O(10), p);
        Assert.Equal(10, p.RelativePrecision);
        Assert.Equal("ε^-2 + 1", a.ToString());
        Assert.Equal("ε^2 - ε^4 + ε^6 - ε^8 + ε^10 + O(ε^12)", b.ToString());
    }

    [Fact]
    public void Inverse_OfPoleSeries_HasPositiveValuation()
    {
        var a = E.Pow(-2) + 1 + LaurentSeries.O(8);     // relative precision 10
        var inv = a.Inverse();
        Assert.Equal(2, inv.Valuation);
        Assert.Equal(10, inv.RelativePrecision);
        Assert.Equal(LaurentSeries.One + LaurentSeries.O(10), a * inv);
        Assert.Equal(new Rational(-1), inv[4]);
        Assert.Throws<InvalidOperationException>(() => (E.Pow(-2) + 1).Inverse());
        Assert.Equal(inv, (E.Pow(-2) + 1).Inverse(10));
    }

    [Fact]
    public void Cancellation_ConsumesPrecision_AndLeadingTermIsKnown()
    {
        var x = C(1) + E + E * E / 2 + LaurentSeries.O(5);
        var d = x - 1;
        Assert.Equal(1, d.Valuation);
        Assert.Equal(Rational.One, d.LeadingCoefficient);
        Assert.Equal(E, d.LeadingTerm);
        var r = 1 / d;                                        // ε^-1 − 1/2 + O(ε^3)
        Assert.Equal(-1, r.Valuation);
        Assert.Equal(4, r.RelativePrecision);
        Assert.Equal(new Rational(-1, 2), r[0]);
        var z = x - x;
        Assert.False(z.HasLeadingTerm);
        Assert.Equal(5, z.AbsolutePrecision);
        Assert.Throws<InvalidOperationException>(() => z.LeadingCoefficient);
        Assert.Throws<DivideByZeroException>(() => 1 / z);
    }

    [Fact]
    public void Powers_AndDivision_AreConsistent()
    {
        var rng = new Random(4);
        for (int trial = 0; trial < 10; trial++)
        {
            int v = rng.Next(-4, 5);
            var c = new Rational[8];
            for (int i = 0; i < 8; i++) c[i] = new Rational(rng.Next(-9, 10), rng.Next(1, 4));
            c[0] = rng.Next(1, 5);
            var a = LaurentSeries.Create(c, v, v + 8);
            var b = a.Pow(3);
            Assert.Equal(3 * v, b.Valuation);
            Assert.True((b / a).AgreesWith(a * a));
            Assert.True((a.Pow(-2) * a.Pow(2)).AgreesWith(LaurentSeries.One));
        }
    }

    [Fact]
    public void SingularityConfinement_IntegrableMap_PatternZeroInfinityZero()
    {
        // The map x_{n+1} + x_{n−1} = a/x_n + 1/x_n² (Grammaticos, Ramani, Papageorgiou, "Do integrable
        // mappings have the Painlevé property?", Phys. Rev. Lett. 67 (1991) 1825): starting from a regular
        // x_{n−1} = u and x_n = ε, the singularity pattern is {0, ∞², 0} and x_{n+3} is finite again and
        // depends on u (the singularity is confined).
        Rational a = 3;
        LaurentSeries Step(LaurentSeries prev, LaurentSeries cur) => a / cur + (cur * cur).Inverse() - prev;
        LaurentSeries[] Orbit(Rational u)
        {
            var x = new LaurentSeries[5];
            x[0] = C(u) + LaurentSeries.O(12);
            x[1] = E + LaurentSeries.O(12);
            for (int n = 2; n < 5; n++) x[n] = Step(x[n - 2], x[n - 1]);
            return x;
        }
        var o5 = Orbit(5);
        var o7 = Orbit(7);
        Assert.Equal(-2, o5[2].Valuation);                    // ∞²
        Assert.Equal(1, o5[3].Valuation);                     // 0 again, x ≈ −ε
        Assert.Equal(Rational.NegativeOne, o5[3].LeadingCoefficient);
        Assert.True(o5[4].Valuation >= 0 && o5[4].HasLeadingTerm);   // finite: confined
        Assert.True(o7[4].Valuation >= 0 && o7[4].HasLeadingTerm);
        Assert.NotEqual(o5[4][0], o7[4][0]);                  // x_{n+3} depends on u: the initial datum is not lost
        Assert.True(o5[4].RelativePrecision >= 4);
    }

    [Fact]
    public void Errors_AreTyped()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => LaurentSeries.Create([1], 3, 2));
        Assert.Throws<ArgumentOutOfRangeException>(() => (E + LaurentSeries.O(3))[3]);
        Assert.Throws<DivideByZeroException>(() => LaurentSeries.O(2).Inverse());
    }
}
