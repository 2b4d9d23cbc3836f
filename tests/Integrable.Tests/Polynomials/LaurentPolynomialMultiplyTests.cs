using System.Numerics;
using Integrable.Kernels;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Polynomials;

/// <summary>Every multiplication variant (heap on one or several words, dense with small and large
/// windows, automatic dispatch) against a naive dictionary-of-terms reference with big rationals.</summary>
public sealed class LaurentPolynomialMultiplyTests
{
    private static LaurentPolynomial WithAlgorithm(MultiplyAlgorithm algorithm, int denseShift, Func<LaurentPolynomial> f)
    {
        var (oldA, oldS) = (PolynomialMultiply.Force, PolynomialMultiply.ForceDenseShift);
        PolynomialMultiply.Force = algorithm;
        PolynomialMultiply.ForceDenseShift = denseShift;
        try { return f(); }
        finally { PolynomialMultiply.Force = oldA; PolynomialMultiply.ForceDenseShift = oldS; }
    }

    public static TheoryData<string, int> Variants => new()
    {
        { "heap", 0 },
        { "dense", 0 },
        { "dense", 1 },   // windows of two cells: nearly every product crosses a window
        { "dense", 3 },
        { "auto", 0 },
    };

    private static MultiplyAlgorithm Parse(string s) => s switch
    {
        "heap" => MultiplyAlgorithm.Heap,
        "dense" => MultiplyAlgorithm.Dense,
        _ => MultiplyAlgorithm.Auto,
    };

    [Theory]
    [MemberData(nameof(Variants))]
    public void Multiply_RandomSmallRing_MatchesNaive(string algorithm, int shift)
    {
        var ring = new LaurentPolynomialRing("x", "y", "z");
        var rng = new Random(11 + shift);
        for (int i = 0; i < 80; i++)
        {
            var a = PolynomialTestData.Random(rng, ring, new(MaxTerms: 25));
            var b = PolynomialTestData.Random(rng, ring, new(MaxTerms: 25));
            var p = WithAlgorithm(Parse(algorithm), shift, () => a * b);
            PolynomialTestData.AssertSameAsNaive(PolynomialTestData.NaiveMultiply(a, b), p, $"{algorithm}/{shift} seed 11 iteration {i}: ({a})*({b})");
        }
    }

    [Theory]
    [MemberData(nameof(Variants))]
    public void Multiply_CoefficientClasses_MatchesNaive(string algorithm, int shift)
    {
        // Each coefficient class in turn, so that the 64-, 128-, 192-bit and big-integer accumulators
        // and the common-denominator path are all used.
        var ring = new LaurentPolynomialRing("a", "b");
        var rng = new Random(23 + shift);
        for (int kind = 0; kind < 9; kind++)
            for (int i = 0; i < 12; i++)
            {
                var a = PolynomialTestData.Random(rng, ring, new(MaxTerms: 30, CoefficientKind: kind));
                var b = PolynomialTestData.Random(rng, ring, new(MaxTerms: 30, CoefficientKind: kind));
                var p = WithAlgorithm(Parse(algorithm), shift, () => a * b);
                PolynomialTestData.AssertSameAsNaive(PolynomialTestData.NaiveMultiply(a, b), p, $"{algorithm}/{shift} kind {kind} iteration {i}");
            }
    }

    [Theory]
    [MemberData(nameof(Variants))]
    public void Multiply_ManyVariablesAndWideExponents_MatchesNaive(string algorithm, int shift)
    {
        // 85 variables with exponents up to ±2^20 force several packed words in the heap path.
        var names = Enumerable.Range(0, 85).Select(i => $"T_{{{i % 5},{i / 5}}}").ToArray();
        var ring = new LaurentPolynomialRing(names);
        var rng = new Random(37 + shift);
        for (int i = 0; i < 25; i++)
        {
            bool wide = i % 2 == 0;
            var shape = wide ? new PolynomialTestData.Shape(MaxTerms: 12, MinExp: -(1 << 20), MaxExp: 1 << 20, ActiveVariables: 10)
                             : new PolynomialTestData.Shape(MaxTerms: 12, MinExp: -2, MaxExp: 2, ActiveVariables: 40);
            var a = PolynomialTestData.Random(rng, ring, shape);
            var b = PolynomialTestData.Random(rng, ring, shape);
            var p = WithAlgorithm(Parse(algorithm), shift, () => a * b);
            PolynomialTestData.AssertSameAsNaive(PolynomialTestData.NaiveMultiply(a, b), p, $"{algorithm}/{shift} iteration {i}");
        }
    }

    [Theory]
    [MemberData(nameof(Variants))]
    public void Multiply_NonNegativeAndSignedWords_EveryAccumulatorMatchesNaive(string algorithm, int shift)
    {
        var ring = new LaurentPolynomialRing("u", "v");
        var rng = new Random(59 + shift);
        var seen = new HashSet<Accumulator>();
        foreach (int bits in new[] { 8, 30, 45, 62 })
            foreach (bool signed in new[] { false, true })
                for (int i = 0; i < 6; i++)
                {
                    LaurentPolynomial Make()
                    {
                        var b = ring.CreateBuilder();
                        int terms = 2 + rng.Next(40);
                        for (int t = 0; t < terms; t++)
                        {
                            long c = rng.NextInt64(1, 1L << bits) | (1L << (bits - 1));
                            if (signed && rng.Next(2) == 0) c = -c;
                            b.Add(c, [rng.Next(-4, 5), rng.Next(0, 9)]);
                        }
                        return b.ToPolynomial();
                    }
                    var a = Make();
                    var c2 = Make();
                    if (a.IsMonomial || c2.IsMonomial) continue;
                    CoefficientForm.TryWords(a.Coefficients, out var wa, out _);
                    CoefficientForm.TryWords(c2.Coefficients, out var wb, out _);
                    seen.Add(PolynomialMultiply.SelectAccumulator(wa, wb));
                    var p = WithAlgorithm(Parse(algorithm), shift, () => a * c2);
                    PolynomialTestData.AssertSameAsNaive(PolynomialTestData.NaiveMultiply(a, c2), p, $"{algorithm}/{shift} bits {bits} signed {signed} iteration {i}");
                }
        Assert.Equal(5, seen.Count); // Word64, Split96, Unsigned128, Word128 and Word192 were all used
    }

    [Fact]
    public void Multiply_Dispatcher_ChoosesDenseForFatemanAndHeapForSparse()
    {
        var ring = new LaurentPolynomialRing("x", "y", "z", "t");
        var f = (ring.One + ring.Variable(0) + ring.Variable(1) + ring.Variable(2) + ring.Variable(3)).Pow(6);
        var dense = new ProductShape(f.Exponents, f.Exponents, f.TermCount, f.TermCount, 4);
        Assert.Equal(MultiplyAlgorithm.Dense, PolynomialMultiply.Choose(in dense));
        var sparse = ring.Variable(0).Pow(1000) + ring.Variable(1).Pow(-1000) * ring.Variable(2) + 1;
        var s2 = sparse * sparse + ring.Variable(3).Pow(999);
        var shape = new ProductShape(s2.Exponents, sparse.Exponents, s2.TermCount, sparse.TermCount, 4);
        Assert.Equal(MultiplyAlgorithm.Heap, PolynomialMultiply.Choose(in shape));
    }

    [Fact]
    public void Multiply_WordBoundaryCoefficients_ExactInEveryAccumulator()
    {
        // (2^62 + 1)·(2^62 − 1) summed over terms: needs 126+ bits; compare with BigInteger arithmetic.
        var ring = new LaurentPolynomialRing("x");
        var x = ring.Variable(0);
        var big = new Rational((1L << 62) + 1);
        var a = big * x + big;
        var b = (big - 2) * x - big;
        foreach (var alg in new[] { MultiplyAlgorithm.Heap, MultiplyAlgorithm.Dense })
        {
            var p = WithAlgorithm(alg, 0, () => a * b);
            BigInteger B = (BigInteger.One << 62) + 1;
            Assert.Equal(new Rational(B * (B - 2)), p.Coefficient([2]));
            Assert.Equal(new Rational(B * (B - 2) - B * B), p.Coefficient([1]));
            Assert.Equal(new Rational(-B * B), p.Coefficient([0]));
        }
    }

    [Fact]
    public void Pow_FatemanOperand_HasBinomialTermCounts()
    {
        // Number of monomials of degree ≤ k in 4 variables is C(k+4, 4) (stars and bars; common
        // knowledge). So (1+x+y+z+t)^10 has C(14,4) = 1001 terms and f·(f+1) has C(24,4) = 10626.
        var ring = new LaurentPolynomialRing("x", "y", "z", "t");
        var f = (ring.One + ring.Variable(0) + ring.Variable(1) + ring.Variable(2) + ring.Variable(3)).Pow(10);
        Assert.Equal(1001, f.TermCount);
        var p = f * (f + 1);
        Assert.Equal(10626, p.TermCount);
        Assert.Equal((int)IntegerMath.Binomial(24, 4), p.TermCount);
        // Sum of coefficients: p(1,1,1,1) = 5^10·(5^10 + 1).
        var one = Enumerable.Repeat(Rational.One, 4).ToArray();
        var five10 = BigInteger.Pow(5, 10);
        Assert.Equal(new Rational(five10 * (five10 + 1)), p.Evaluate(one));
    }

    [Fact]
    public void Pow_Trinomial_HasMultinomialCoefficients()
    {
        // Multinomial theorem (common knowledge): the coefficient of x^a y^b z^c in (x+y+z)^n is
        // n!/(a! b! c!).
        var ring = new LaurentPolynomialRing("x", "y", "z");
        int n = 12;
        var p = (ring.Variable(0) + ring.Variable(1) + ring.Variable(2)).Pow(n);
        Assert.Equal(n * (n + 1) / 2 + n + 1, p.TermCount); // C(n+2, 2)
        static BigInteger F(int k) { BigInteger r = 1; for (int i = 2; i <= k; i++) r *= i; return r; }
        for (int a = 0; a <= n; a++)
            for (int b = 0; a + b <= n; b++)
            {
                int c = n - a - b;
                Assert.Equal(new Rational(F(n) / (F(a) * F(b) * F(c))), p.Coefficient([a, b, c]));
            }
    }

    [Fact]
    public void Pow_LaurentBinomial_MatchesRepeatedMultiplication()
    {
        var ring = new LaurentPolynomialRing("x", "y");
        var x = ring.Variable(0);
        var y = ring.Variable(1);
        var q = x.Pow(-1) + new Rational(2, 3) * y - x * y.Pow(-2);
        var r = ring.One;
        for (int k = 0; k <= 9; k++)
        {
            Assert.Equal(r, q.Pow(k));
            r *= q;
        }
        // (x+y)^-1 is not a Laurent polynomial.
        Assert.Throws<NotInvertibleException>(() => (x + y).Pow(-1));
        Assert.Equal(new Rational(9, 4) * x.Pow(-4) * y.Pow(6), (new Rational(2, 3) * x.Pow(2) * y.Pow(-3)).Pow(-2));
    }
}
