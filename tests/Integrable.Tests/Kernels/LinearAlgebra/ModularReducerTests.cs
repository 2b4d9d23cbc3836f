using System.Numerics;
using Integrable.Kernels.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Tests.Kernels.LinearAlgebra;

public class ModularReducerTests
{
    public static TheoryData<ulong> Moduli => new() { 2, 3, 101, 2147483629UL, 2147483647UL /* 2^31 − 1 */, 4294967291UL, 4294967311UL, 2305843009213693951UL, Primes.Large(0), Primes.Large(3) };

    [Theory]
    [MemberData(nameof(Moduli))]
    public void Dot_RandomLengths_MatchesBigInteger(ulong p)
    {
        var r = new ModularReducer(new PrimeField(p));
        var rng = new Random((int)(p % 10007));
        foreach (int n in new[] { 0, 1, 2, 3, 15, 16, 17, 31, 32, 33, 100, 257 })
        {
            var a = new ulong[n];
            var b = new ulong[n];
            for (int i = 0; i < n; i++)
            {
                // Include the extreme residue p − 1 often: the accumulator bounds are tightest there.
                a[i] = rng.Next(3) == 0 ? p - 1 : (ulong)rng.NextInt64() % p;
                b[i] = rng.Next(3) == 0 ? p - 1 : (ulong)rng.NextInt64() % p;
            }
            BigInteger expected = 0;
            for (int i = 0; i < n; i++) expected += (BigInteger)a[i] * b[i];
            Assert.Equal((ulong)(expected % p), r.Dot(a, b));
        }
    }

    [Theory]
    [MemberData(nameof(Moduli))]
    public void Reductions_MatchBigInteger(ulong p)
    {
        var r = new ModularReducer(new PrimeField(p));
        var rng = new Random(5);
        for (int t = 0; t < 2000; t++)
        {
            ulong hi = t < 5 ? ulong.MaxValue - (ulong)t : (ulong)rng.NextInt64() * 3;
            ulong lo = (ulong)rng.NextInt64() * 5;
            Assert.Equal(lo % p, r.Reduce64(lo));
            Assert.Equal(hi % p, r.Reduce64(hi));
            Assert.Equal((ulong)((((BigInteger)hi << 64) + lo) % p), r.Reduce128(hi, lo));
            long s = rng.NextInt64(long.MinValue, long.MaxValue);
            Assert.Equal((ulong)((((BigInteger)s % p) + p) % p), r.FromSigned(s));
        }
        Assert.Equal((ulong)(((BigInteger)long.MinValue % p + p) % p), r.FromSigned(long.MinValue));
    }

    [Theory]
    [MemberData(nameof(Moduli))]
    public void FromWords_MatchesBigIntegerRemainder(ulong p)
    {
        var r = new ModularReducer(new PrimeField(p));
        var rng = new Random(6);
        foreach (int bits in new[] { 1, 63, 64, 65, 200, 1000, 5000 })
        {
            var bytes = new byte[bits / 8 + 1];
            rng.NextBytes(bytes);
            bytes[^1] &= 0x7F;
            var v = new BigInteger(bytes);
            foreach (var x in new[] { v, -v })
            {
                var words = new ulong[WordArithmetic.WordCount(x)];
                WordArithmetic.WriteMagnitude(x, words);
                Assert.Equal(x, WordArithmetic.ToBigInteger(words, x.Sign < 0));
                var expected = ((x % p) + p) % p;
                Assert.Equal((ulong)expected, r.FromWords(words, x.Sign < 0));
            }
        }
    }

    [Theory]
    [MemberData(nameof(Moduli))]
    public void Dot_AllMaximalResidues_LongVectors(ulong p)
    {
        // Every product is (p − 1)², the worst case for the accumulators of both kernels.
        var r = new ModularReducer(new PrimeField(p));
        foreach (int n in new[] { 31, 32, 33, 63, 64, 65, 1000, 4099 })
        {
            var a = Enumerable.Repeat(p - 1, n).ToArray();
            var expected = (ulong)((BigInteger)(p - 1) * (p - 1) * n % p);
            Assert.Equal(expected, r.Dot(a, a));
            if (System.Runtime.Intrinsics.X86.Avx512F.IsSupported && n >= 32) Assert.Equal(expected, r.DotAvx512(a, a));
        }
    }

    [Theory]
    [MemberData(nameof(Moduli))]
    public void Inverse_TimesValue_IsOne(ulong p)
    {
        var r = new ModularReducer(new PrimeField(p));
        var rng = new Random(9);
        for (int t = 0; t < 2000; t++)
        {
            ulong a = t < 3 ? (ulong)t + 1 : (ulong)rng.NextInt64() % p;
            if (a % p == 0) continue;
            a %= p;
            Assert.Equal(1UL, r.Multiply(a, r.Inverse(a)));
        }
        if (p > 2) Assert.Equal(1UL, r.Multiply(p - 1, r.Inverse(p - 1)));
        Assert.Throws<DivideByZeroException>(() => r.Inverse(0));
    }
}
