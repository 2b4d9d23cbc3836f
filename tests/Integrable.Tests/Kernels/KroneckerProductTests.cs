using System.Numerics;
using Integrable.Kernels;
using Integrable.Numbers;
using Integrable.Polynomials;
using Xunit;
using static Integrable.Tests.Kernels.SparseReference;

namespace Integrable.Tests.Kernels;

/// <summary>Dense products by Kronecker substitution and multi-modular transforms (<see cref="KroneckerProduct"/>)
/// against naive big-integer products and the classical kernels (common practice: differential testing against a
/// slow obvious reference).</summary>
public class KroneckerProductTests
{
    private static T Forced<T>(Func<T> f, bool on = true)
    {
        KroneckerProduct.Force = on;
        try { return f(); }
        finally { KroneckerProduct.Force = null; }
    }

    public static TheoryData<int, int, int> Shapes => new()
    {
        { 1, 1, 8 }, { 2, 1, 70 }, { 3, 2, 200 }, { 4, 2, 400 }, { 5, 3, 130 }, { 6, 1, 900 },
    };

    /// <summary>Products and squares in one to three variables with coefficients from 1 to 900 bits of both
    /// signs: the transform path must give the naive product term for term, in canonical order.</summary>
    [Theory]
    [MemberData(nameof(Shapes))]
    public void Multiply_Forced_MatchesNaiveProduct(int seed, int vars, int maxBits)
    {
        var rng = new Random(seed);
        var ring = new LaurentPolynomialRing([.. Enumerable.Range(0, vars).Select(i => $"x{i}")]);
        for (int it = 0; it < 8; it++)
        {
            int range = vars == 1 ? 60 : vars == 2 ? 14 : 6;
            var a = RandomPolynomial(rng, vars, rng.Next(1, 50), -range / 3, range, maxBits);
            var b = RandomPolynomial(rng, vars, rng.Next(1, 50), -range / 3, range, maxBits);
            if (a.Count == 0 || b.Count == 0) continue;
            var pa = Build(ring, a);
            var pb = Build(ring, b);
            AssertSame(NaiveProduct(a, b), Forced(() => pa * pb));
            AssertSame(NaiveProduct(a, a), Forced(() => pa * pa));
        }
    }

    [Fact]
    public void Multiply_Forced_CancellingCellsAreDropped()
    {
        // (x − y)(x + y) = x² − y²: the mixed cell cancels to zero and must not appear.
        var ring = new LaurentPolynomialRing("x", "y");
        BigInteger big = BigInteger.Pow(7, 120);
        var a = Build(ring, new() { ["1,0"] = big, ["0,1"] = -big });
        var b = Build(ring, new() { ["1,0"] = big, ["0,1"] = big });
        AssertSame(new() { ["2,0"] = big * big, ["0,2"] = -big * big }, Forced(() => a * b));
    }

    [Fact]
    public void Worth_WideDenseProducts_ChoosesTransformsOnlyWhenCheaper()
    {
        // Somos-4 step 39 after projection: 13998 × 11222 terms of 189 and 168 bits in a box of 141527 cells.
        Assert.True(KroneckerProduct.Worth(13998, 11222, 189, 168, 141527));
        // Small products stay classical; so do boxes beyond the primes' 2-adicity.
        Assert.False(KroneckerProduct.Worth(20, 20, 40, 40, 900));
        Assert.False(KroneckerProduct.Worth(100000, 100000, 200, 200, 1L << 24));
        // Beyond the primes' total size (about 1,400 bits per product coefficient) nothing is possible.
        Assert.Equal(0, KroneckerProduct.PrimesFor(5000));
    }

    /// <summary>Somos-4 iterates (OEIS A006720 at x_0..x_3 = 1, and Laurent polynomials verified by exact
    /// division): their products by transforms equal those of the classical kernels, step by step.</summary>
    [Fact]
    public void SomosIterates_TransformProducts_MatchClassicalKernels()
    {
        var ring = new LaurentPolynomialRing("x_0", "x_1", "x_2", "x_3");
        var x = new List<LaurentPolynomial> { ring.Variable(0), ring.Variable(1), ring.Variable(2), ring.Variable(3) };
        for (int n = 4; n <= 22; n++)
        {
            var p1 = Forced(() => x[n - 1] * x[n - 3], on: false);
            var sq = Forced(() => x[n - 2] * x[n - 2], on: false);
            Assert.Equal(p1, Forced(() => x[n - 1] * x[n - 3]));
            Assert.Equal(sq, Forced(() => x[n - 2] * x[n - 2]));
            Assert.True((p1 + sq).TryDivideExact(x[n - 4], out var next));
            x.Add(next);
        }
        // OEIS A006720: 1, 1, 1, 1, 2, 3, 7, 23, 59, 314, 1529, 8209, 83313, 620297, 7869898, ...
        var ones = x.Take(15).Select(p => p.Coefficients.ToArray().Aggregate(Rational.Zero, (s, c) => s + c)).ToArray();
        Assert.Equal(new Rational[] { 1, 1, 1, 1, 2, 3, 7, 23, 59, 314, 1529, 8209, 83313, 620297, 7869898 }, ones);
    }
}
