using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Tests.Numbers;

public class ChineseRemainderTests
{
    [Fact]
    public void Combine_SmallExample()
    {
        // x = 2 mod 3, x = 3 mod 5 -> x = 8 mod 15 (Sunzi's classic style example, common knowledge).
        var (r, m) = ChineseRemainder.Combine(2, 3, 3, 5);
        Assert.Equal(new BigInteger(8), r);
        Assert.Equal(new BigInteger(15), m);
    }

    [Fact]
    public void Combine_ManyLargePrimes_RecoversBigInteger()
    {
        var x = BigInteger.Parse("-123456789012345678901234567890123456789");
        BigInteger r = 0, m = 1;
        for (int i = 0; i < 4; i++)
        {
            ulong p = Primes.Large(i);
            ulong xi = (ulong)(((x % p) + p) % p);
            (r, m) = ChineseRemainder.Combine(r, m, xi, p);
        }
        Assert.Equal(x, ChineseRemainder.Symmetric(r, m));
    }

    [Fact]
    public void RationalReconstruction_RecoversFraction()
    {
        var q = new Rational(BigInteger.Parse("-98765432123"), BigInteger.Parse("1234567891"));
        BigInteger r = 0, m = 1;
        for (int i = 0; i < 2; i++)
        {
            var f = new PrimeField(Primes.Large(i));
            (r, m) = ChineseRemainder.Combine(r, m, f.FromRational(q), f.Modulus);
        }
        Assert.True(RationalReconstruction.TryReconstruct(r, m, out var back));
        Assert.Equal(q, back);
    }

    [Fact]
    public void RationalReconstruction_TooFewPrimes_FailsOrDiffers()
    {
        // A fraction whose size exceeds sqrt(m/2) cannot be recovered from one prime.
        var q = new Rational(BigInteger.Pow(10, 30) + 7, BigInteger.Pow(10, 29) + 3);
        var f = new PrimeField(Primes.Large(0));
        bool ok = RationalReconstruction.TryReconstruct(f.FromRational(q), f.Modulus, out var back);
        Assert.True(!ok || back != q);
    }

    [Fact]
    public void Sqrt_Exact()
    {
        Assert.Equal(new BigInteger(31622), RationalReconstruction.Sqrt(1_000_000_000));
        var big = BigInteger.Pow(12345678901, 3);
        var s = RationalReconstruction.Sqrt(big);
        Assert.True(s * s <= big && (s + 1) * (s + 1) > big);
    }
}
