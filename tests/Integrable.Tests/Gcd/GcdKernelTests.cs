using System.Numerics;
using Integrable.Kernels;
using Integrable.Kernels.Gcd;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Gcd;

/// <summary>The internal kernels of the modular gcd against slow obvious references.</summary>
public sealed class GcdKernelTests
{
    private static readonly LaurentPolynomialRing R = new("x", "y", "z");

    [Fact]
    public void DenseModP_GcdAndDivision_MatchConstruction()
    {
        var f = new ModP(Primes.Large(3));
        var rng = new Random(2);
        for (int i = 0; i < 50; i++)
        {
            var g = RandomDense(rng, f, rng.Next(0, 6));
            var a = DenseModP.Multiply(g, RandomDense(rng, f, rng.Next(0, 6)), f);
            var b = DenseModP.Multiply(g, RandomDense(rng, f, rng.Next(0, 6)), f);
            var d = DenseModP.Gcd(a, b, f);
            Assert.Equal(1UL, d[^1]);
            Assert.True(DenseModP.TryDivide(a, d, f, out var qa));
            Assert.Equal(a, DenseModP.Multiply(qa, d, f));
            Assert.True(DenseModP.TryDivide(b, d, f, out _));
            // d is a multiple of g: g divides d
            Assert.True(DenseModP.TryDivide(d, g, f, out _));
        }
        Assert.False(DenseModP.TryDivide([1, 0, 1], [1, 1], f, out _)); // x² + 1 by x + 1
    }

    private static ulong[] RandomDense(Random rng, in ModP f, int degree)
    {
        var a = new ulong[degree + 1];
        for (int i = 0; i <= degree; i++) a[i] = (ulong)rng.NextInt64(0, (long)Math.Min(f.P, 1000));
        a[degree] = 1 + (ulong)rng.Next(999);
        return a;
    }

    [Fact]
    public void ModP_FromBig_MatchesBigIntegerRemainder()
    {
        var f = new ModP(Primes.Large(5));
        var rng = new Random(6);
        for (int i = 0; i < 200; i++)
        {
            var x = new BigInteger(rng.NextInt64()) << rng.Next(0, 300);
            if (rng.Next(2) == 0) x = -x;
            var expected = BigInteger.Remainder(x, f.P);
            if (expected.Sign < 0) expected += f.P;
            Assert.Equal((ulong)expected, f.FromBig(x));
        }
    }

    [Fact]
    public void SplitMultiply_BigCoefficients_MatchesTheSharedKernel()
    {
        var rng = new Random(7);
        int saved = SplitMultiply.WordBits;
        double savedFactor = SplitMultiply.KroneckerCostFactor;
        try
        {
            foreach (var (wordBits, factor) in new[] { (62, 1e300), (17, 1e300), (62, 0.0), (17, 0.0) })
            {
                SplitMultiply.WordBits = wordBits;
                SplitMultiply.KroneckerCostFactor = factor; // 0: always the transform, 1e300: always limbs
                for (int i = 0; i < 10; i++)
                {
                    var a = GcdTestData.Random(rng, R, 8, 3, bits: rng.Next(20, 200), minExp: -2);
                    var b = GcdTestData.Random(rng, R, 8, 3, bits: rng.Next(20, 200)) * new Rational(1, 3);
                    SplitMultiply.Multiply(a.CoeffArray, a.ExpArray, b.CoeffArray, b.ExpArray, 3, out var c, out var e);
                    PolynomialMultiply.Multiply(a.CoeffArray, a.ExpArray, b.CoeffArray, b.ExpArray, 3, out var c2, out var e2);
                    Assert.Equal(c2, c);
                    Assert.Equal(e2, e);
                }
            }
        }
        finally
        {
            SplitMultiply.WordBits = saved;
            SplitMultiply.KroneckerCostFactor = savedFactor;
        }
    }

    [Fact]
    public void ModularDivision_ExactAndInexact_AgreeWithTheSharedKernel()
    {
        var rng = new Random(8);
        var ring = new LaurentPolynomialRing("x", "y");
        for (int i = 0; i < 12; i++)
        {
            var q = GcdTestData.Random(rng, ring, 10, 6, bits: 120);
            var d = GcdTestData.Random(rng, ring, 6, 4, bits: 90);
            var a = q * d;
            var A = ToInt(a);
            var D = ToInt(d);
            Assert.True(ModularDivision.Applies(A));
            Assert.True(ModularDivision.TryDivide(A, D, out var Q));
            Assert.Equal(ToLaurent(ring, Q) * ToLaurent(ring, D), ToLaurent(ring, A));
            var inexact = ToInt(a + ring.One);
            Assert.False(ModularDivision.TryDivide(inexact, D, out _));
        }
    }

    private static IntPoly ToInt(LaurentPolynomial p)
    {
        // integer polynomial with non-negative exponents (multiply by the common denominator, shift exponents)
        var s = PolynomialGcd.Split(p);
        return s.Primitive;
    }

    private static LaurentPolynomial ToLaurent(LaurentPolynomialRing ring, IntPoly p) => PolynomialGcd.ToLaurent(ring, p, null);

    [Fact]
    public void CrtAccumulator_Reconstruct_GivesTheSymmetricLift()
    {
        var rng = new Random(9);
        int n = 2;
        var values = new BigInteger[5];
        for (int i = 0; i < values.Length; i++)
            values[i] = (new BigInteger(rng.NextInt64()) << rng.Next(0, 150)) * (rng.Next(2) == 0 ? 1 : -1);
        var exps = new int[values.Length * n];
        for (int i = 0; i < values.Length; i++) { exps[i * n] = values.Length - i; exps[i * n + 1] = 0; }
        var acc = new CrtAccumulator(n);
        for (int k = 0; k < 5; k++)
        {
            var f = new ModP(Primes.Large(20 + k));
            var c = new ulong[values.Length];
            for (int i = 0; i < values.Length; i++) c[i] = f.FromBig(values[i]);
            acc.Add(new SparseModPoly(n, c, exps, values.Length), f);
        }
        var lift = acc.Reconstruct();
        Assert.Equal(values.Select(v => new Rational(v)).ToArray(), lift.Coeffs);
        Assert.True(acc.Log2MaxAbs() >= values.Max(v => BigInteger.Log(BigInteger.Abs(v), 2)) - 1e-9);
    }

    [Fact]
    public void DegreeBounds_AreUpperBoundsAndDetectCoprimality()
    {
        var rng = new Random(10);
        for (int i = 0; i < 10; i++)
        {
            var f = GcdTestData.Random(rng, R, 4, 2);
            var g = GcdTestData.Random(rng, R, 4, 2);
            var a = ToInt(f * g);
            var b = ToInt(f * (g + 1));
            var u = ModularGcd.DegreeBounds(a, b, a.Degrees(), b.Degrees(), new GcdRandom(3));
            var nf = GcdTestData.Normalised(f);
            for (int v = 0; v < 3; v++) Assert.True(u[v] >= (nf.IsConstant ? 0 : nf.MaxExponent(v)));
            var uc = ModularGcd.DegreeBounds(ToInt(g), ToInt(g + 1), ToInt(g).Degrees(), ToInt(g + 1).Degrees(), new GcdRandom(4));
            Assert.All(uc, x => Assert.Equal(0, x));
        }
    }
}
