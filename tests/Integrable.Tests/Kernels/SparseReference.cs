using System.Numerics;
using Integrable.Numbers;
using Integrable.Polynomials;
using Xunit;

namespace Integrable.Tests.Kernels;

/// <summary>The slow obvious reference of the kernel tests: Laurent polynomials as dictionaries from exponent
/// keys ("2,-1,0") to big-integer coefficients, multiplied term by term.</summary>
internal static class SparseReference
{
    public static int[] Key(string k) => [.. k.Split(',').Select(int.Parse)];

    /// <summary>Drops zero coefficients.</summary>
    public static Dictionary<string, BigInteger> Normalise(Dictionary<string, BigInteger> d)
    {
        foreach (var k in d.Where(kv => kv.Value.IsZero).Select(kv => kv.Key).ToList()) d.Remove(k);
        return d;
    }

    public static Dictionary<string, BigInteger> NaiveProduct(Dictionary<string, BigInteger> a, Dictionary<string, BigInteger> b)
    {
        var r = new Dictionary<string, BigInteger>();
        foreach (var (ka, ca) in a)
            foreach (var (kb, cb) in b)
            {
                string k = string.Join(",", Key(ka).Zip(Key(kb), (x, y) => x + y));
                r[k] = r.GetValueOrDefault(k) + ca * cb;
            }
        return Normalise(r);
    }

    public static LaurentPolynomial Build(LaurentPolynomialRing ring, Dictionary<string, BigInteger> terms, BigInteger? scale = null)
    {
        var b = ring.CreateBuilder();
        foreach (var (k, c) in terms) b.Add(new Rational(c * (scale ?? BigInteger.One)), Key(k));
        return b.ToPolynomial();
    }

    public static Dictionary<string, BigInteger> Read(LaurentPolynomial p)
    {
        var d = new Dictionary<string, BigInteger>();
        foreach (var t in p.Terms) d[string.Join(",", t.Exponents.ToArray())] = t.Coefficient.Numerator;
        return d;
    }

    /// <summary>Asserts canonical order and the same terms as the reference.</summary>
    public static void AssertSame(Dictionary<string, BigInteger> expected, LaurentPolynomial actual)
    {
        Assert.True(actual.IsCanonical(), "canonical (descending lex) order");
        var got = Read(actual);
        Assert.Equal(expected.Count, got.Count);
        foreach (var (k, c) in expected) Assert.Equal(c, got.GetValueOrDefault(k));
    }

    /// <summary>A random integer of 1 to <paramref name="maxBits"/> bits (uniform bit length), either sign.</summary>
    public static BigInteger RandomInteger(Random rng, int maxBits)
    {
        int bits = rng.Next(1, maxBits + 1);
        var bytes = new byte[bits / 8 + 2];
        rng.NextBytes(bytes);
        bytes[^1] = 0;
        var v = (new BigInteger(bytes) & ((BigInteger.One << bits) - 1)) | (BigInteger.One << (bits - 1));
        return rng.Next(2) == 0 ? -v : v;
    }

    /// <summary>A random polynomial: up to <paramref name="terms"/> terms with exponents in [low, high) and
    /// coefficients of up to <paramref name="maxBits"/> bits.</summary>
    public static Dictionary<string, BigInteger> RandomPolynomial(Random rng, int vars, int terms, int low, int high, int maxBits)
    {
        var d = new Dictionary<string, BigInteger>();
        for (int t = 0; t < terms; t++)
        {
            string k = string.Join(",", Enumerable.Range(0, vars).Select(_ => rng.Next(low, high)));
            d[k] = d.GetValueOrDefault(k) + RandomInteger(rng, maxBits);
        }
        return Normalise(d);
    }
}
