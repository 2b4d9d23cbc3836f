using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Tests.Series;

public class ModularPowerSeriesTests
{
    [Fact]
    public void Factories_UnreducedResidue_Throw()
    {
        var zp = PowerSeriesRing.Modular(new PrimeField(101));
        Assert.Throws<ArgumentOutOfRangeException>(() => zp.Series([1UL, 101UL], 5));
        Assert.Throws<ArgumentOutOfRangeException>(() => zp.Constant(500UL));
        Assert.Throws<ArgumentOutOfRangeException>(() => zp.X * 101UL);
        Assert.Equal(zp.X * 100UL, -zp.X);
        Assert.Equal("100*x + O(x^3)", (-zp.X + zp.O(3)).ToString());
    }

    [Fact]
    public void Sqrt_CharacteristicTwo_Throws()
    {
        var z2 = PowerSeriesRing.Modular(new PrimeField(2));
        Assert.Throws<ArithmeticException>(() => (1 + z2.X + z2.O(4)).Sqrt());
    }
}
