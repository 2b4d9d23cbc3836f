using System.Numerics;
using Integrable.Kernels;
using Integrable.Numbers;
using Integrable.Polynomials;
using Xunit;
using static Integrable.Tests.Kernels.SparseReference;

namespace Integrable.Tests.Kernels;

/// <summary>The affine hull of graded supports (<see cref="SupportHull"/>) and the products and exact
/// divisions that run on its pivot coordinates, against naive big-integer products and the unprojected
/// kernels (common practice: differential testing against a slow obvious reference).</summary>
public class SupportHullTests
{
    private static int[] Flatten(params int[][] terms) => [.. terms.SelectMany(t => t)];

    [Fact]
    public void TryFind_HomogeneousSupport_HasRankOneLessAndLiftsBack()
    {
        // Degree-3 monomials in three variables, descending lex: one grading (total degree).
        int[] e = Flatten([3, 0, 0], [2, 1, 0], [1, 0, 2], [0, 3, 0], [0, 1, 2], [0, 0, 3]);
        var hull = SupportHull.TryFind(e, Flatten([1, 1, 0], [0, 0, 2]), 3);
        Assert.NotNull(hull);
        Assert.Equal(2, hull.Rank);
        Assert.Equal([0, 1], hull.Pivots.ToArray());
        var projected = hull.Project(e);
        Assert.True(hull.TryLift(projected, [3, 0, 0], out var lifted));
        Assert.Equal(e, lifted);
    }

    [Fact]
    public void TryFind_SomosIterates_HaveRankTwo()
    {
        // Somos-4 iterates in x_0..x_3 are homogeneous of degree 1, and x_n has weight n under x_k ↦ μ^k x_k
        // (both scalings map solutions of x_{n+4}x_n = x_{n+3}x_{n+1} + x_{n+2}² to solutions; common
        // practice), so all their supports lie in translates of one plane: rank exactly 2 once they are large.
        var ring = new LaurentPolynomialRing("x_0", "x_1", "x_2", "x_3");
        var x = Integrable.Recursions.Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2")
            .Iterate(ring, [ring.Variable(0), ring.Variable(1), ring.Variable(2), ring.Variable(3)], 8);
        var hull = SupportHull.TryFind(Support(x[11]), Support(x[9]), 4);
        Assert.NotNull(hull);
        Assert.Equal(2, hull.Rank);
        var projected = hull.Project(Support(x[11]));
        var origin = Support(x[11])[..4].Select(v => (long)v).ToArray();
        Assert.True(hull.TryLift(projected, origin, out var lifted));
        Assert.Equal(Support(x[11]), lifted);
    }

    [Fact]
    public void TryFind_FullDimensionalSupport_IsNull()
    {
        Assert.Null(SupportHull.TryFind(Flatten([1, 0, 0], [0, 1, 0], [0, 0, 1]), Flatten([0, 0, 0], [2, 2, 2]), 3));
        Assert.Null(SupportHull.TryFind(Flatten([1], [0]), Flatten([0]), 1));
    }

    [Fact]
    public void TryLift_FractionalEchelonForm_RejectsNonIntegralPoints()
    {
        // V spanned by (2, 1, 0) and (0, 0, 1): echelon form (1, 1/2, 0), (0, 0, 1), so x_1 = x_0/2 on V.
        var hull = SupportHull.TryFind(Flatten([2, 1, 5], [0, 0, 0], [0, 0, -3]), Flatten([4, 2, 1]), 3);
        Assert.NotNull(hull);
        Assert.Equal([0, 2], hull.Pivots.ToArray());
        Assert.True(hull.TryLift([4, 7], [0, 0, 0], out var e));
        Assert.Equal([4, 2, 7], e);
        Assert.False(hull.TryLift([3, 7], [0, 0, 0], out _));
    }

    /// <summary>A random polynomial whose support lies in base + span(directions) (so it is graded for every
    /// form orthogonal to them), with 0–2 limb coefficients.</summary>
    private static Dictionary<string, BigInteger> Graded(Random rng, int[] basePoint, int[][] directions, int terms, int span, bool wide)
    {
        var d = new Dictionary<string, BigInteger>();
        int n = basePoint.Length;
        for (int t = 0; t < terms; t++)
        {
            var e = (int[])basePoint.Clone();
            foreach (var dir in directions)
            {
                int c = rng.Next(0, span);
                for (int v = 0; v < n; v++) e[v] += c * dir[v];
            }
            var coefficient = new BigInteger(rng.Next(-9, 10));
            if (wide) coefficient = coefficient * BigInteger.Pow(3, rng.Next(0, 90)) + rng.Next(-5, 6);
            string key = string.Join(",", e);
            d[key] = d.GetValueOrDefault(key) + coefficient;
        }
        return Normalise(d);
    }

    private static int[] Support(LaurentPolynomial p)
    {
        var e = new List<int>();
        foreach (var t in p.Terms) e.AddRange(t.Exponents.ToArray());
        return [.. e];
    }

    public static TheoryData<int, bool> Cases => new() { { 1, false }, { 2, false }, { 3, true }, { 4, true } };

    /// <summary>Products, squares and exact quotients of polynomials graded along random directions in four
    /// or five variables (two independent directions, so the degree box is mostly empty): the
    /// projected kernels must run and agree with the naive product and with the unprojected kernels; a
    /// perturbed dividend must be reported non-divisible.</summary>
    [Theory]
    [MemberData(nameof(Cases))]
    public void ProjectedMultiplyAndDivide_GradedOperands_MatchNaiveAndUnprojected(int seed, bool wide)
    {
        var rng = new Random(seed);
        int n = 4 + seed % 2;
        var ring = new LaurentPolynomialRing([.. Enumerable.Range(0, n).Select(i => $"x{i}")]);
        int before = SupportHull.Applied, checkedCases = 0;
        for (int it = 0; it < 12; it++)
        {
            int r = 2;
            var dirs = new int[r][];
            for (int i = 0; i < r; i++) dirs[i] = [.. Enumerable.Range(0, n).Select(_ => rng.Next(-3, 4))];
            int[] Base() => [.. Enumerable.Range(0, n).Select(_ => rng.Next(-20, 21))];
            var a = Graded(rng, Base(), dirs, rng.Next(80, 160), 12, wide);
            var b = Graded(rng, Base(), dirs, rng.Next(60, 110), 10, wide);
            if (a.Count < 16 || b.Count < 16) continue;
            checkedCases++;
            var pa = Build(ring, a);
            var pb = Build(ring, b);
            var product = pa * pb;
            AssertSame(NaiveProduct(a, b), product);
            AssertSame(NaiveProduct(b, b), pb * pb);
            Assert.True(product.TryDivideExact(pb, out var q), $"seed {seed} iteration {it}: exact product reported non-divisible");
            AssertSame(a, q);
            var stray = product + ring.Monomial(Rational.One, [.. Enumerable.Range(0, n).Select(_ => rng.Next(-5, 6))]);
            bool divides = stray.TryDivideExact(pb, out var q2);
            PolynomialMultiply.NoProjection = true;
            try
            {
                Assert.Equal(product, pa * pb);
                Assert.Equal(divides, stray.TryDivideExact(pb, out var q3));
                if (divides) Assert.Equal(q3, q2);
            }
            finally { PolynomialMultiply.NoProjection = false; }
        }
        // Each case has a product, a square and an exact division that qualify unless the random directions make
        // the box dense already or the projection too sparse (the perturbed dividend is not graded).
        Assert.True(checkedCases >= 10 && SupportHull.Applied - before >= 2 * checkedCases,
            $"{checkedCases} cases, projected kernels ran {SupportHull.Applied - before} times");
    }
}
