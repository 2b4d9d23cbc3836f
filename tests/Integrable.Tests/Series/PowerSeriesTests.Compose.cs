using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Tests.Series;

[Collection("Series thresholds")]
public class ComposeVariantTests
{
    [Fact]
    public void Compose_BabyStepGiantStep_MatchesHorner()
    {
        var rng = new Random(21);
        var zp = PowerSeriesRing.Modular(new PrimeField(1_000_003));
        for (int trial = 0; trial < 6; trial++)
        {
            int n = rng.Next(3, 60);
            var f = zp.FromFunction(_ => (ulong)rng.Next(0, 1_000_003), n);
            var g = zp.FromFunction(k => k == 0 ? 0UL : (ulong)rng.Next(0, 1_000_003), n);
            int saved = PowerSeries<ulong>.ComposeBabyStepThreshold;
            try
            {
                PowerSeries<ulong>.ComposeBabyStepThreshold = int.MaxValue;
                var horner = f.Compose(g);
                PowerSeries<ulong>.ComposeBabyStepThreshold = 1;
                Assert.Equal(horner, f.Compose(g));
                var exact = zp.Polynomial(f.Coefficients[..Math.Min(5, f.Coefficients.Length)]).Compose(zp.Polynomial([0UL, 3UL, 1UL]));
                PowerSeries<ulong>.ComposeBabyStepThreshold = int.MaxValue;
                Assert.Equal(zp.Polynomial(f.Coefficients[..Math.Min(5, f.Coefficients.Length)]).Compose(zp.Polynomial([0UL, 3UL, 1UL])), exact);
                Assert.True(exact.IsExact);
            }
            finally { PowerSeries<ulong>.ComposeBabyStepThreshold = saved; }
        }
    }
}
