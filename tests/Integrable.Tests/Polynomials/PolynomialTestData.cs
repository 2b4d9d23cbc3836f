using System.Numerics;
using Fractions;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Polynomials;

/// <summary>Random Laurent polynomials biased to edge cases, and an independent naive reference
/// (dictionary of exponent vectors → <see cref="Fraction"/>, the Fractions package's big rational).</summary>
internal static class PolynomialTestData
{
    /// <summary>Options for <see cref="Random(System.Random, LaurentPolynomialRing, Shape)"/>.</summary>
    internal sealed record Shape(int MaxTerms = 8, int MinExp = -3, int MaxExp = 3, int CoefficientKind = -1, int ActiveVariables = -1);

    public static Rational RandomCoefficient(Random rng, int kind = -1)
    {
        if (kind < 0) kind = rng.Next(12);
        Rational r = kind switch
        {
            0 => 1,
            1 => -1,
            2 => new Rational(long.MaxValue - rng.Next(4)),          // near the word limit
            3 => new Rational(BigInteger.Pow(2, 63 + rng.Next(80)) + rng.Next(100)), // past 64 bits
            4 => new Rational(rng.Next(-9, 10), rng.Next(1, 12)),   // small fractions
            5 => new Rational(rng.NextInt64(1L << 31, 1L << 33)),   // 32-bit boundary
            6 => new Rational(rng.NextInt64(-(1L << 62), 1L << 62), rng.NextInt64(1, 1L << 62)), // large fractions
            7 => new Rational(long.MinValue) + rng.Next(2),
            _ => new Rational(rng.Next(-50, 51)),
        };
        if (r.IsZero) r = 7;
        return rng.Next(2) == 0 ? r : -r;
    }

    public static LaurentPolynomial Random(Random rng, LaurentPolynomialRing ring, Shape? shape = null)
    {
        shape ??= new Shape();
        int n = ring.VariableCount;
        int active = shape.ActiveVariables < 0 ? n : Math.Min(n, shape.ActiveVariables);
        var vars = Enumerable.Range(0, n).OrderBy(_ => rng.Next()).Take(active).ToArray();
        int kind = rng.Next(10);
        if (kind == 0) return ring.Zero;
        if (kind == 1) return ring.Constant(RandomCoefficient(rng, shape.CoefficientKind));
        int terms = kind == 2 ? 1 : 1 + rng.Next(shape.MaxTerms);
        var b = ring.CreateBuilder();
        var e = new int[n];
        for (int t = 0; t < terms; t++)
        {
            Array.Clear(e);
            foreach (var v in vars) e[v] = rng.Next(shape.MinExp, shape.MaxExp + 1);
            b.Add(RandomCoefficient(rng, shape.CoefficientKind), e);
        }
        return b.ToPolynomial();
    }

    // ---- naive reference ----

    public static Dictionary<string, Fraction> ToNaive(LaurentPolynomial p)
    {
        var d = new Dictionary<string, Fraction>();
        foreach (var t in p.Terms)
            d[Key(t.Exponents)] = new Fraction(t.Coefficient.Numerator, t.Coefficient.Denominator);
        return d;
    }

    public static Dictionary<string, Fraction> NaiveMultiply(LaurentPolynomial a, LaurentPolynomial b)
    {
        var d = new Dictionary<string, Fraction>();
        int n = a.Ring.VariableCount;
        var e = new int[n];
        foreach (var s in a.Terms)
            foreach (var t in b.Terms)
            {
                for (int v = 0; v < n; v++) e[v] = s.Exponents[v] + t.Exponents[v];
                var k = Key(e);
                var c = new Fraction(s.Coefficient.Numerator, s.Coefficient.Denominator) * new Fraction(t.Coefficient.Numerator, t.Coefficient.Denominator);
                d[k] = d.TryGetValue(k, out var old) ? old + c : c;
            }
        foreach (var k in d.Where(kv => kv.Value.IsZero).Select(kv => kv.Key).ToList()) d.Remove(k);
        return d;
    }

    public static void AssertSameAsNaive(Dictionary<string, Fraction> expected, LaurentPolynomial actual, string context)
    {
        Assert.True(actual.IsCanonical(), $"not canonical: {context}");
        var got = ToNaive(actual);
        Assert.True(expected.Count == got.Count, $"term count {got.Count}, expected {expected.Count}: {context}");
        foreach (var (k, v) in expected)
        {
            Assert.True(got.TryGetValue(k, out var g), $"missing term {k}: {context}");
            Assert.True(g.Equals(v), $"coefficient of {k}: {g} vs {v}: {context}");
        }
    }

    public static string Key(ReadOnlySpan<int> e)
    {
        var sb = new System.Text.StringBuilder();
        foreach (var x in e) sb.Append(x).Append(',');
        return sb.ToString();
    }
}
