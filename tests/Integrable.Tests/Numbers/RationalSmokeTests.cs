using Integrable.Numbers;

namespace Integrable.Tests.Numbers;

public class RationalSmokeTests
{
    [Fact]
    public void Construct_NegativeDenominator_IsCanonical()
    {
        var r = new Rational(6, -4);
        Assert.Equal("-3/2", r.ToString());
        Assert.Equal(new Rational(13, 4), r * r + 1);
    }
}
