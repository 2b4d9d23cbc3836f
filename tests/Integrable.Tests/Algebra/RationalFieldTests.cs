using System.Numerics;
using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Tests.Algebra;

/// <summary>The ring-law suite on Q, with values biased to 0, ±1, word boundaries and big values.</summary>
public sealed class RationalFieldTests : RingLaws<Rational>
{
    protected override IRing<Rational> Ring => RationalField.Instance;

    protected override int Iterations => 400;

    protected override Rational Generate(Random rng) => RandomRational(rng);

    internal static Rational RandomRational(Random rng)
    {
        switch (rng.Next(10))
        {
            case 0: return Rational.Zero;
            case 1: return rng.Next(2) == 0 ? Rational.One : Rational.NegativeOne;
            case 2: return new Rational(long.MaxValue - rng.Next(3)) * (rng.Next(2) == 0 ? 1 : -1);
            case 3: return new Rational(BigInteger.Pow(2, 64 + rng.Next(70)) + rng.Next(1000), 1 + rng.Next(7));
            case 4: return new Rational(rng.NextInt64(-1L << 40, 1L << 40), rng.NextInt64(1, 1L << 40));
            case 5: return new Rational(long.MinValue) + rng.Next(3);
            default: return new Rational(rng.Next(-20, 21), rng.Next(1, 9));
        }
    }

    [Fact]
    public void TryDivide_ByZero_ReturnsFalse()
    {
        Assert.False(RationalField.Instance.TryDivide(Rational.One, Rational.Zero, out _));
        Assert.True(RationalField.Instance.TryDivide(new Rational(3), new Rational(6), out var q));
        Assert.Equal(new Rational(1, 2), q);
    }
}
