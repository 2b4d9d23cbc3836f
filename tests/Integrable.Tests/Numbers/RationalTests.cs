using System.Numerics;
using CsCheck;
using Fractions;
using Integrable.Numbers;

namespace Integrable.Tests.Numbers;

/// <summary>Rational arithmetic checked against an independent reference: the Fractions package
/// (a general-purpose BigInteger fraction type from NuGet) and plain BigInteger cross-multiplication.</summary>
public class RationalTests
{
    // Integers biased to the edges of the inline fast path: 0, ±1, around 2^31, 2^32, 2^62, 2^63 and just past.
    private static readonly Gen<BigInteger> EdgeInteger = Gen.OneOf(
        Gen.Long.Select(x => new BigInteger(x)),
        Gen.Int[-3, 3].Select(x => new BigInteger(x)),
        Gen.Int[-3, 3].Select(x => new BigInteger(long.MaxValue) + x),
        Gen.Int[-3, 3].Select(x => new BigInteger(long.MinValue) + x),
        Gen.Int[-3, 3].Select(x => new BigInteger(int.MaxValue) + x),
        Gen.Int[-3, 3].Select(x => (BigInteger.One << 62) + x),
        Gen.Select(Gen.Long, Gen.Long).Select((a, b) => new BigInteger(a) * b),
        Gen.Int[-1000, 1000].Select(x => new BigInteger(x)));

    private static readonly Gen<(BigInteger N, BigInteger D)> Fraction =
        Gen.Select(EdgeInteger, EdgeInteger.Where(d => !d.IsZero));

    private static Rational Make((BigInteger N, BigInteger D) f) => new(f.N, f.D);

    private static Fraction Ref((BigInteger N, BigInteger D) f) => new Fraction(f.N, f.D, true);

    private static void AssertSame(Fraction expected, Rational actual)
    {
        Assert.True(IsCanonical(actual), $"not canonical: {actual}");
        Assert.Equal(expected.Numerator, actual.Numerator);
        Assert.Equal(expected.Denominator, actual.Denominator);
    }

    /// <summary>Canonical form: gcd 1, positive denominator, inline exactly when both parts fit.</summary>
    internal static bool IsCanonical(Rational r)
    {
        var n = r.Numerator; var d = r.Denominator;
        bool fits = n > long.MinValue && n <= long.MaxValue && d <= long.MaxValue;
        return d.Sign > 0 && BigInteger.GreatestCommonDivisor(n, d).IsOne && fits == r.IsSmall;
    }

    [Fact]
    public void Arithmetic_EdgeBiasedInputs_MatchesFractionsPackage()
    {
        Gen.Select(Fraction, Fraction).Sample((a, b) =>
        {
            var x = Make(a); var y = Make(b);
            var fx = Ref(a); var fy = Ref(b);
            AssertSame(fx + fy, x + y);
            AssertSame(fx - fy, x - y);
            AssertSame(fx * fy, x * y);
            if (!y.IsZero) AssertSame(fx / fy, x / y);
            Assert.Equal(fx.CompareTo(fy), x.CompareTo(y));
            Assert.Equal(fx == fy, x == y);
        }, iter: 20000);
    }

    [Fact]
    public void Construction_MatchesCrossMultiplicationReference()
    {
        Fraction.Sample(f =>
        {
            var r = Make(f);
            Assert.True(IsCanonical(r));
            // r = N/D exactly: r.Numerator * D == N * r.Denominator.
            Assert.Equal(f.N * r.Denominator, r.Numerator * f.D);
        }, iter: 20000);
    }

    [Fact]
    public void FieldLaws_Hold()
    {
        Gen.Select(Fraction, Fraction, Fraction).Sample((a, b, c) =>
        {
            var x = Make(a); var y = Make(b); var z = Make(c);
            Assert.Equal((x + y) + z, x + (y + z));
            Assert.Equal((x * y) * z, x * (y * z));
            Assert.Equal(x * (y + z), x * y + x * z);
            Assert.Equal(x + y, y + x);
            Assert.Equal(x * y, y * x);
            Assert.Equal(Rational.Zero, x - x);
            if (!x.IsZero) Assert.Equal(Rational.One, x * x.Inverse());
            if (x == y) Assert.Equal(x.GetHashCode(), y.GetHashCode());
        }, iter: 5000);
    }

    [Fact]
    public void Equality_SameValueDifferentConstruction_EqualAndSameHash()
    {
        var a = new Rational(long.MaxValue, 2) * 2;
        var b = new Rational(new BigInteger(long.MaxValue));
        Assert.Equal(a, b);
        Assert.Equal(a.GetHashCode(), b.GetHashCode());
        Assert.True(a.IsSmall);
        var big = new Rational(long.MinValue);
        Assert.False(big.IsSmall);
        Assert.Equal(new BigInteger(long.MinValue), big.Numerator);
        Assert.Equal(-big, new Rational(BigInteger.Negate(long.MinValue)));
        Assert.Equal(default(Rational), Rational.Zero);
        Assert.Equal("0", default(Rational).ToString());
    }

    [Fact]
    public void ParseToString_RoundTrip()
    {
        Fraction.Sample(f =>
        {
            var r = Make(f);
            Assert.Equal(r, Rational.Parse(r.ToString()));
        }, iter: 5000);
        Assert.Equal(new Rational(-5, 4), Rational.Parse("-1.25"));
        Assert.Equal(new Rational(1, 3), Rational.Parse(" 2/6 "));
        Assert.Equal(new Rational(7), Rational.Parse("+7"));
    }

    [Theory]
    [InlineData("")]
    [InlineData("1/")]
    [InlineData("/2")]
    [InlineData("1.2.3")]
    [InlineData("abc")]
    [InlineData("--1")]
    [InlineData("1/2/3")]
    public void Parse_Malformed_ThrowsFormatException(string text)
    {
        Assert.Throws<FormatException>(() => Rational.Parse(text));
        Assert.False(Rational.TryParse(text, out _));
    }

    [Fact]
    public void Parse_ZeroDenominator_ThrowsDivideByZero()
    {
        Assert.Throws<DivideByZeroException>(() => Rational.Parse("3/0"));
        Assert.Throws<DivideByZeroException>(() => new Rational(1, 0));
        Assert.Throws<DivideByZeroException>(() => Rational.Zero.Inverse());
    }

    [Fact]
    public void Pow_MatchesRepeatedMultiplication()
    {
        var x = new Rational(-7, 3);
        Rational p = 1;
        for (int e = 0; e <= 40; e++)
        {
            Assert.Equal(p, x.Pow(e));
            Assert.Equal(p.Inverse(), x.Pow(-e));
            p *= x;
        }
    }

    [Fact]
    public void FloorCeilingTruncate()
    {
        Assert.Equal(new BigInteger(-3), Rational.Floor(new Rational(-5, 2)));
        Assert.Equal(new BigInteger(-2), Rational.Ceiling(new Rational(-5, 2)));
        Assert.Equal(new Rational(-2), Rational.Truncate(new Rational(-5, 2)));
        Assert.Equal(new BigInteger(2), Rational.Floor(new Rational(5, 2)));
        var big = new Rational(BigInteger.Pow(10, 30) + 1, 10);
        Assert.Equal(BigInteger.Pow(10, 29), Rational.Floor(big));
    }

    [Fact]
    public void ToDouble_CloseForHugeValues()
    {
        var r = new Rational(BigInteger.Pow(3, 400), BigInteger.Pow(2, 600));
        double expected = Math.Exp(400 * Math.Log(3) - 600 * Math.Log(2));
        Assert.InRange(r.ToDouble() / expected, 1 - 1e-12, 1 + 1e-12);
        Assert.Equal(0.1, Rational.FromDouble(0.1).ToDouble());
        Assert.Equal(new Rational(1, 4), Rational.FromDouble(0.25));
    }

    [Fact]
    public void GenericMath_SumThroughINumber()
    {
        static T Sum<T>(IEnumerable<T> xs) where T : INumber<T> { var s = T.Zero; foreach (var x in xs) s += x; return s; }
        // Harmonic number H_10 = 7381/2520 (OEIS A001008 / A002805).
        var h = Sum(Enumerable.Range(1, 10).Select(k => new Rational(1, k)));
        Assert.Equal(new Rational(7381, 2520), h);
        static T From<T, TOther>(TOther v) where T : INumber<T> where TOther : INumber<TOther> => T.CreateChecked(v);
        Assert.Equal(new Rational(3), From<Rational, int>(3));
        Assert.Equal(new Rational(1, 2), From<Rational, decimal>(0.5m));
    }

    [Fact]
    public void ToLatex_Fractions()
    {
        Assert.Equal("-\\frac{3}{4}", new Rational(-3, 4).ToLatex());
        Assert.Equal("5", new Rational(5).ToLatex());
    }
}
