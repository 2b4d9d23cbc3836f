using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Tests.Series;

public class LaurentSeriesRingTests
{
    [Fact]
    public void TryDivide_ExactNonMonomial_UsesRelativePrecision()
    {
        var ring = new LaurentSeriesRing(6);
        var e = LaurentSeries.Epsilon;
        Assert.True(ring.TryDivide(ring.One, ring.Add(ring.One, e), out var q));   // 1/(1 + ε)
        Assert.Equal(6, q.RelativePrecision);
        Assert.Equal(new Rational(-1), q[5]);
        Assert.True(ring.TryDivide(ring.One, e, out var r));
        Assert.True(r.IsExact);
        Assert.False(ring.TryDivide(ring.One, LaurentSeries.O(3), out _));
        Assert.Equal(new LaurentSeriesRing(6), ring);
    }
}
