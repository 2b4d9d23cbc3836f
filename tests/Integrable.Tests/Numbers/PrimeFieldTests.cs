using System.Numerics;
using CsCheck;
using Integrable.Numbers;

namespace Integrable.Tests.Numbers;

public class PrimeFieldTests
{
    public static TheoryData<ulong> Moduli => new()
    {
        2, 3, 5, 101, 65537, 2147483647UL /* 2^31 - 1 */, 4294967291UL /* largest prime < 2^32 */,
        1000000007UL, 2305843009213693951UL /* 2^61 - 1, a Mersenne prime */, Primes.Large(0), Primes.Large(3),
    };

    [Theory]
    [MemberData(nameof(Moduli))]
    public void Multiply_RandomResidues_MatchesBigIntegerReference(ulong p)
    {
        var f = new PrimeField(p);
        Gen.Select(Gen.ULong, Gen.ULong).Sample((a, b) =>
        {
            a %= p; b %= p;
            ulong expected = (ulong)(new BigInteger(a) * b % p);
            return f.Multiply(a, b) == expected;
        }, iter: 20000);
        // Edge residues: 0, 1, p-1 squared.
        Assert.Equal(1UL % p, f.Multiply(p - 1, p - 1));
        Assert.Equal(0UL, f.Multiply(0, p - 1));
    }

    [Theory]
    [MemberData(nameof(Moduli))]
    public void AddSubtractInverse_RandomResidues_FieldLaws(ulong p)
    {
        var f = new PrimeField(p);
        Gen.Select(Gen.ULong, Gen.ULong).Sample((a, b) =>
        {
            a %= p; b %= p;
            bool ok = f.Subtract(f.Add(a, b), b) == a && f.Add(a, f.Negate(a)) == 0;
            if (a != 0) ok &= f.Multiply(a, f.Inverse(a)) == 1;
            return ok;
        }, iter: 5000);
    }

    [Fact]
    public void FromRational_MatchesDivision()
    {
        var f = new PrimeField(101);
        Assert.Equal(f.Divide(f.FromInteger(-3), 7), f.FromRational(new Rational(-3, 7)));
        Assert.Throws<DivideByZeroException>(() => f.FromRational(new Rational(1, 202)));
        Assert.False(f.CanReduce(new Rational(1, 202)));
    }

    [Fact]
    public void Constructor_Composite_Throws()
    {
        Assert.Throws<ArgumentException>(() => new PrimeField(91));
        Assert.Throws<ArgumentOutOfRangeException>(() => new PrimeField(1));
        Assert.Throws<ArgumentOutOfRangeException>(() => new PrimeField(1UL << 62));
    }

    [Fact]
    public void Pow_FermatLittleTheorem()
    {
        // Fermat's little theorem: a^(p-1) = 1 for a != 0 (common knowledge).
        var f = new PrimeField(Primes.Large(1));
        Assert.Equal(1UL, f.Pow(123456789, (long)f.Modulus - 1));
        Assert.Equal(f.Inverse(5), f.Pow(5, -1));
    }

    [Fact]
    public void IsPrime_AgreesWithTrialDivision()
    {
        for (ulong n = 0; n < 5000; n++)
        {
            bool trial = n >= 2;
            for (ulong d = 2; d * d <= n && trial; d++) if (n % d == 0) trial = false;
            Assert.Equal(trial, Primes.IsPrime(n));
        }
        // Strong pseudoprime to bases 2..37 does not exist below 3.3e24; check known Carmichael numbers.
        Assert.False(Primes.IsPrime(561));
        Assert.False(Primes.IsPrime(3215031751UL)); // strong pseudoprime to bases 2,3,5,7 (Pomerance–Selfridge–Wagstaff 1980)
        Assert.True(Primes.IsPrime(18446744073709551557UL)); // largest prime below 2^64 (from memory)
    }

    [Fact]
    public void Large_DescendingPrimesBelowLimit()
    {
        Assert.True(Primes.Large(0) < PrimeField.ModulusLimit);
        Assert.True(Primes.Large(0) > Primes.Large(1));
        Assert.True(Primes.IsPrime(Primes.Large(5)));
    }
}
