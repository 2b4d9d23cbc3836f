using System.Numerics;
using Integrable.Kernels;
using Integrable.Numbers;

namespace Integrable.Tests.Kernels;

public sealed class CoefficientFormTests
{
    [Fact]
    public void TryWide_WordRationals_TakesWordRouteWithCommonDenominator()
    {
        // 1/3, −5/6, 7 over the least common denominator 6: 2, −5, 42 (common knowledge).
        Rational[] c = [new(1, 3), new(-5, 6), new(7)];
        Assert.True(CoefficientForm.TryWide(c, out var words, out var wide, out var den));
        Assert.Null(wide);
        Assert.Equal([2L, -5L, 42L], words!);
        Assert.Equal(new BigInteger(6), den);
    }

    [Fact]
    public void TryWide_RandomInputs_BothRoutesMatchBigIntegerForm()
    {
        // Reference: CoefficientForm.ToBig (least common denominator and scaled numerators in big integers).
        var rng = new Random(77);
        for (int it = 0; it < 300; it++)
        {
            var c = new Rational[rng.Next(1, 8)];
            for (int i = 0; i < c.Length; i++)
            {
                BigInteger n = rng.Next(-1000, 1000);
                if (it % 3 == 1 && i == 0) n = (BigInteger.One << rng.Next(60, 125)) + rng.Next(9);
                if (it % 3 == 2 && i == 0) n = -(BigInteger.One << 62) - rng.Next(1, 5);
                c[i] = new Rational(n, rng.Next(1, 30));
            }
            CoefficientForm.ToBig(c, out var ints, out var bigDen);
            bool fits = ints.All(x => BigInteger.Abs(x) < BigInteger.One << 126);
            Assert.Equal(fits, CoefficientForm.TryWide(c, out var words, out var wide, out var den));
            if (!fits) continue;
            Assert.Equal(bigDen, den);
            Assert.True(words is null != wide is null);
            for (int i = 0; i < c.Length; i++)
                Assert.Equal(ints[i], words is not null ? new BigInteger(words[i]) : (BigInteger)wide![i]);
        }
    }

    [Fact]
    public void TryWide_BeyondOneHundredTwentySixBits_Fails()
    {
        Rational[] c = [new(BigInteger.One << 126), new(1)];
        Assert.False(CoefficientForm.TryWide(c, out _, out _, out _));
    }
}
