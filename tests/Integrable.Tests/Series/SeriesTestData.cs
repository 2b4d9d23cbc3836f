using System.Numerics;
using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Tests.Series;

/// <summary>Shared reference data and random generators for the series tests.</summary>
internal static class SeriesTestData
{
    /// <summary>Catalan numbers by the closed form C_n = binom(2n, n)/(n + 1) (OEIS A000108).</summary>
    public static BigInteger Catalan(int n) => IntegerMath.Binomial(2 * n, n) / (n + 1);

    /// <summary>Motzkin numbers by M_n = Σ_k binom(n, 2k) C_k (OEIS A001006, formula section).</summary>
    public static BigInteger Motzkin(int n)
    {
        BigInteger s = 0;
        for (int k = 0; 2 * k <= n; k++) s += IntegerMath.Binomial(n, 2 * k) * Catalan(k);
        return s;
    }

    public static Rational RandomRational(Random rng, int bits)
    {
        var num = RandomBig(rng, bits);
        if (rng.Next(2) == 0) num = -num;
        var den = RandomBig(rng, Math.Max(1, bits / 3)) + 1;
        return rng.Next(3) == 0 ? new Rational(num) : new Rational(num, den);
    }

    public static BigInteger RandomBig(Random rng, int bits)
    {
        var bytes = new byte[(bits + 7) / 8 + 1];
        rng.NextBytes(bytes);
        bytes[^1] = 0;
        var v = new BigInteger(bytes);
        return v >> (bytes.Length * 8 - 8 - bits);
    }

    public static PowerSeries<Rational> RandomSeries(Random rng, int precision, int bits, int valuation = 0)
    {
        var c = new Rational[precision];
        for (int k = valuation; k < precision; k++) c[k] = RandomRational(rng, bits);
        if (valuation < precision && c[valuation].IsZero) c[valuation] = 1;
        return PowerSeriesRing.Rationals.Series(c, precision);
    }
}
