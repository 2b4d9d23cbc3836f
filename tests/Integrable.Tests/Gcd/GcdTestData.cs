using System.Numerics;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Gcd;

/// <summary>Random polynomials for the gcd tests and the normalisation the gcd must produce.</summary>
internal static class GcdTestData
{
    /// <summary>A random polynomial with about <paramref name="terms"/> terms, exponents in
    /// [<paramref name="minExp"/>, <paramref name="maxExp"/>] on every variable, coefficients of
    /// <paramref name="bits"/> bits (sign random).</summary>
    public static LaurentPolynomial Random(Random rng, LaurentPolynomialRing ring, int terms, int maxExp, int bits = 6, int minExp = 0)
    {
        int n = ring.VariableCount;
        var b = ring.CreateBuilder();
        var e = new int[n];
        for (int t = 0; t < terms; t++)
        {
            for (int v = 0; v < n; v++) e[v] = rng.Next(minExp, maxExp + 1);
            b.Add(RandomInteger(rng, bits), e);
        }
        var p = b.ToPolynomial();
        return p.IsZero ? ring.One : p;
    }

    /// <summary>A dense random polynomial of total degree ≤ <paramref name="degree"/>.</summary>
    public static LaurentPolynomial Dense(Random rng, LaurentPolynomialRing ring, int degree, int bits = 6)
    {
        int n = ring.VariableCount;
        var b = ring.CreateBuilder();
        var e = new int[n];
        void Fill(int v, int left)
        {
            if (v == n) { b.Add(RandomInteger(rng, bits), e); return; }
            for (int k = 0; k <= left; k++) { e[v] = k; Fill(v + 1, left - k); }
            e[v] = 0;
        }
        Fill(0, degree);
        return b.ToPolynomial();
    }

    public static Rational RandomInteger(Random rng, int bits)
    {
        BigInteger x = BigInteger.Zero;
        for (int i = 0; i < bits; i += 30) x = (x << 30) + rng.Next(1 << 30);
        x >>= (30 - bits % 30) % 30;
        if (x.IsZero) x = 1;
        return new Rational(rng.Next(2) == 0 ? x : -x);
    }

    /// <summary>The normalised associate of p: primitive, positive leading coefficient, no monomial factor.</summary>
    public static LaurentPolynomial Normalised(LaurentPolynomial p)
    {
        if (p.IsZero) return p;
        var min = new int[p.Ring.VariableCount];
        for (int v = 0; v < min.Length; v++) min[v] = -p.MinExponent(v);
        return (p * p.Ring.Monomial(1, min)).PrimitivePart;
    }
}
