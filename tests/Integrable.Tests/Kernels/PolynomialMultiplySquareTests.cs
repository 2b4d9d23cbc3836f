using System.Numerics;
using Fractions;
using Integrable.Kernels;
using Integrable.Numbers;
using Integrable.Polynomials;
using Xunit;

namespace Integrable.Tests.Kernels;

/// <summary>Squares p·p (the same arrays on both sides) take the halved paths: the triangle heap and the
/// dense method over group pairs h_a ≥ h_b with doubled coefficients. Checked against a naive square with
/// <see cref="Fraction"/> coefficients and against the product with a copy of p (other arrays, the
/// ordinary paths) — differential testing, common practice.</summary>
public class PolynomialMultiplySquareTests
{
    public static TheoryData<string, int> Paths => new()
    {
        { nameof(MultiplyAlgorithm.Dense), 0 },   // aligned windows
        { nameof(MultiplyAlgorithm.Dense), 3 },   // tiny unaligned windows: carries between windows
        { nameof(MultiplyAlgorithm.Heap), 0 },
        { nameof(MultiplyAlgorithm.Auto), 0 },
    };

    /// <summary>Coefficient sizes: word accumulators, near the doubling limit of a word (2^62), the
    /// multi-limb path (up to 191 bits, doubled up to 2^190) and past it, rationals.</summary>
    private static Rational Coefficient(Random rng, int kind) => kind switch
    {
        0 => new Rational(rng.Next(-9, 10)),
        1 => new Rational(rng.NextInt64(0, 1L << 40)),
        2 => new Rational(rng.NextInt64(-(1L << 62), 1L << 62) * (rng.Next(2) == 0 ? 1 : 2)),
        3 => new Rational((new BigInteger(rng.NextInt64()) << rng.Next(60, 128)) + rng.NextInt64()),
        4 => new Rational((BigInteger.One << 189) + rng.NextInt64() * (rng.Next(2) == 0 ? 1 : -1)),
        5 => new Rational((BigInteger.One << 200) - rng.Next(1, 99)),
        _ => new Rational(rng.Next(-50, 51), rng.Next(1, 30)),
    };

    private static Dictionary<string, Fraction> NaiveSquare(LaurentPolynomial a)
    {
        var r = new Dictionary<string, Fraction>();
        foreach (var s in a.Terms)
            foreach (var t in a.Terms)
            {
                string key = string.Join(",", s.Exponents.ToArray().Zip(t.Exponents.ToArray(), (x, y) => x + y));
                var c = new Fraction(s.Coefficient.Numerator, s.Coefficient.Denominator) * new Fraction(t.Coefficient.Numerator, t.Coefficient.Denominator);
                r[key] = r.GetValueOrDefault(key, Fraction.Zero) + c;
            }
        foreach (var k in r.Where(kv => kv.Value.IsZero).Select(kv => kv.Key).ToList()) r.Remove(k);
        return r;
    }

    [Theory]
    [MemberData(nameof(Paths))]
    public void Square_SameArrays_MatchesNaiveSquareAndProductWithCopy(string algorithm, int windowShift)
    {
        var ring = new LaurentPolynomialRing("x", "y", "z");
        var rng = new Random(5100 + windowShift + algorithm.Length);
        for (int kind = 0; kind <= 6; kind++)
            for (int i = 0; i < 10; i++)
            {
                var builder = ring.CreateBuilder();
                int terms = rng.Next(17, 60);   // dense needs at least 16 terms per operand
                for (int t = 0; t < terms; t++)
                    builder.Add(Coefficient(rng, kind), [rng.Next(-3, 6), rng.Next(-2, 4), rng.Next(0, 7)]);
                var p = builder.ToPolynomial();
                var copyBuilder = ring.CreateBuilder();
                foreach (var t in p.Terms) copyBuilder.Add(t.Coefficient, t.Exponents.ToArray());
                var copy = copyBuilder.ToPolynomial();
                PolynomialMultiply.Force = Enum.Parse<MultiplyAlgorithm>(algorithm);
                PolynomialMultiply.ForceDenseShift = windowShift;
                LaurentPolynomial square, product;
                try
                {
                    square = p * p;
                    product = p * copy;
                }
                finally
                {
                    PolynomialMultiply.Force = MultiplyAlgorithm.Auto;
                    PolynomialMultiply.ForceDenseShift = 0;
                }
                Assert.Equal(product, square);
                var expected = NaiveSquare(p);
                Assert.Equal(expected.Count, square.TermCount);
                foreach (var t in square.Terms)
                {
                    var c = expected[string.Join(",", t.Exponents.ToArray())];
                    Assert.True(c == new Fraction(t.Coefficient.Numerator, t.Coefficient.Denominator), $"kind {kind} #{i}");
                }
            }
    }
}
