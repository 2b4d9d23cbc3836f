using System.Numerics;
using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Tests.Series;

/// <summary>The fast product kernels against their schoolbook references on random data (FLINT-style),
/// with thresholds forced low so the transform paths run on small inputs too.</summary>
[Collection("Series thresholds")]
public class SeriesKernelTests
{
    [Theory]
    [InlineData(1, 1, 5)]
    [InlineData(40, 40, 3)]
    [InlineData(33, 70, 700)]
    [InlineData(64, 64, 4000)]
    [InlineData(100, 3, 64)]
    public void RationalMultiply_Integers_MatchesSchoolbook(int la, int lb, int bits)
    {
        var rng = new Random(la * 1000 + lb + bits);
        var a = new Rational[la];
        var b = new Rational[lb];
        for (int i = 0; i < la; i++) a[i] = rng.Next(5) == 0 ? Rational.Zero : new Rational(Signed(rng, bits));
        for (int i = 0; i < lb; i++) b[i] = new Rational(Signed(rng, bits / 2 + 1));
        int saved = RationalSeriesKernel.SchoolbookThreshold;
        try
        {
            RationalSeriesKernel.SchoolbookThreshold = 1;
            foreach (int n in new[] { la + lb - 1, (la + lb) / 2, 1 })
            {
                var expected = RationalSeriesKernel.Schoolbook(a, b, Math.Min(n, la + lb - 1));
                Assert.Equal(expected, RationalSeriesKernel.Multiply(a, b, n));
            }
            var sq = RationalSeriesKernel.Schoolbook(a, a, 2 * la - 1);
            Assert.Equal(sq, RationalSeriesKernel.Multiply(a, a, 2 * la - 1, square: true));
        }
        finally { RationalSeriesKernel.SchoolbookThreshold = saved; }
    }

    [Fact]
    public void RationalMultiply_Fractions_MatchesSchoolbook()
    {
        var rng = new Random(2);
        var a = new Rational[50];
        var b = new Rational[45];
        for (int i = 0; i < a.Length; i++) a[i] = SeriesTestData.RandomRational(rng, 90);
        for (int i = 0; i < b.Length; i++) b[i] = new Rational(rng.Next(-5, 6), i + 1);
        int saved = RationalSeriesKernel.SchoolbookThreshold;
        try
        {
            RationalSeriesKernel.SchoolbookThreshold = 2;
            Assert.Equal(RationalSeriesKernel.Schoolbook(a, b, 70), RationalSeriesKernel.Multiply(a, b, 70));
        }
        finally { RationalSeriesKernel.SchoolbookThreshold = saved; }
    }

    [Theory]
    [InlineData(2UL)]
    [InlineData(101UL)]
    [InlineData(1_000_000_007UL)]
    [InlineData(2305843009213693951UL)] // 2^61 − 1
    public void ModularMultiply_MatchesSchoolbook(ulong p)
    {
        var f = new PrimeField(p);
        var rng = new Random((int)(p % 1000));
        foreach (var (la, lb) in new[] { (1, 1), (50, 50), (130, 77), (300, 5) })
        {
            var a = new ulong[la];
            var b = new ulong[lb];
            for (int i = 0; i < la; i++) a[i] = (ulong)rng.NextInt64() % p;
            for (int i = 0; i < lb; i++) b[i] = i % 3 == 0 ? p - 1 : (ulong)rng.NextInt64() % p;
            int saved = ModularSeriesKernel.SchoolbookThreshold;
            try
            {
                ModularSeriesKernel.SchoolbookThreshold = 1;
                int n = la + lb - 1;
                Assert.Equal(NaiveModular(f, a, b, n), ModularSeriesKernel.Multiply(f, a, b, n));
                Assert.Equal(NaiveModular(f, a, a, n / 2 + 1), ModularSeriesKernel.Multiply(f, a, a, n / 2 + 1, square: true));
                Assert.Equal(NaiveModular(f, a, b, n), ModularSeriesKernel.Schoolbook(f, a, b, n));
            }
            finally { ModularSeriesKernel.SchoolbookThreshold = saved; }
        }
    }

    private static ulong[] NaiveModular(PrimeField f, ulong[] a, ulong[] b, int n)
    {
        var r = new ulong[Math.Min(n, a.Length + b.Length - 1)];
        for (int k = 0; k < r.Length; k++)
        {
            BigInteger s = 0;
            for (int i = 0; i <= k; i++) if (i < a.Length && k - i < b.Length) s += (BigInteger)a[i] * b[k - i];
            r[k] = (ulong)(s % f.Modulus);
        }
        return r;
    }

    private static BigInteger Signed(Random rng, int bits)
    {
        var v = SeriesTestData.RandomBig(rng, bits);
        return rng.Next(2) == 0 ? v : -v;
    }
}
