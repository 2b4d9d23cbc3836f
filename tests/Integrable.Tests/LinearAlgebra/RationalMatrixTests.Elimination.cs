using System.Numerics;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Tests.LinearAlgebra;

public partial class RationalMatrixTests
{
    /// <summary>Random matrices of many shapes: square, tall, wide, rank-deficient, zero, 1×1, single
    /// rows and columns, rational entries and entries past 64 bits.</summary>
    public static IEnumerable<(string Name, RationalMatrix Matrix)> Family(int seed)
    {
        var rng = new Random(seed);
        yield return ("square 6x6", ReferenceLinearAlgebra.RandomInteger(rng, 6, 6, 9));
        yield return ("square 9x9", ReferenceLinearAlgebra.RandomInteger(rng, 9, 9, 1000));
        yield return ("tall 11x5", ReferenceLinearAlgebra.RandomInteger(rng, 11, 5, 20));
        yield return ("wide 4x12", ReferenceLinearAlgebra.RandomInteger(rng, 4, 12, 20));
        yield return ("rank 3 of 8x7", ReferenceLinearAlgebra.RandomOfRank(rng, 8, 7, 3, 5));
        yield return ("rank 5 of 7x10", ReferenceLinearAlgebra.RandomOfRank(rng, 7, 10, 5, 4));
        yield return ("rank 1 of 6x6", ReferenceLinearAlgebra.RandomOfRank(rng, 6, 6, 1, 7));
        yield return ("zero 3x4", RationalMatrix.Zero(3, 4));
        yield return ("zero 7x7", RationalMatrix.Zero(7, 7));
        yield return ("1x1", ReferenceLinearAlgebra.RandomInteger(rng, 1, 1, 50));
        yield return ("1x1 zero", RationalMatrix.Zero(1, 1));
        yield return ("row 1x6", ReferenceLinearAlgebra.RandomInteger(rng, 1, 6, 9));
        yield return ("column 6x1", ReferenceLinearAlgebra.RandomInteger(rng, 6, 1, 9));
        yield return ("rational 6x8", ReferenceLinearAlgebra.RandomRational(rng, 6, 8, 30));
        yield return ("rational rank 4 of 9x9", ReferenceLinearAlgebra.RandomOfRank(rng, 9, 4, 4, 5) * ReferenceLinearAlgebra.RandomRational(rng, 4, 9, 7));
        yield return ("huge 6x6", ReferenceLinearAlgebra.RandomHuge(rng, 6, 6, 100));
        yield return ("huge 5x8", ReferenceLinearAlgebra.RandomHuge(rng, 5, 8, 200));
        yield return ("huge rank 3 of 7x7", ReferenceLinearAlgebra.RandomHuge(rng, 7, 3, 80) * ReferenceLinearAlgebra.RandomHuge(rng, 3, 7, 80));
        yield return ("huge rational", ReferenceLinearAlgebra.RandomHuge(rng, 6, 7, 90) * RationalMatrix.Diagonal(Enumerable.Range(1, 7).Select(k => new Rational(1, 3 * k + 1)).ToArray()));
        yield return ("duplicate columns 8x8", RationalMatrix.Create(8, 8, (i, j) => (i + 1) * (j % 3 + 2) + (i * i) % 5));
    }

    public static TheoryData<int> Methods => new() { (int)EliminationMethod.Auto, (int)EliminationMethod.Multimodular, (int)EliminationMethod.FractionFree };

    private static RowEchelonForm<RationalMatrix> Rref(RationalMatrix a, EliminationMethod method, EliminationDiagnostics? diag = null) =>
        RationalMatrix.BuildEchelonForm(RationalElimination.Echelon(a.AsSpan(), a.RowCount, a.ColumnCount,
            new EliminationOptions { Method = method, Diagnostics = diag }));

    [Theory]
    [MemberData(nameof(Methods))]
    public void ReducedRowEchelonForm_RandomMatrices_MatchesNaiveGaussJordan(int method)
    {
        for (int seed = 1; seed <= 3; seed++)
        {
            foreach (var (name, a) in Family(seed))
            {
                var (rref, pivots) = ReferenceLinearAlgebra.GaussJordan(a);
                var ours = Rref(a, (EliminationMethod)method);
                Assert.True(pivots.SequenceEqual(ours.PivotColumns.ToArray()), $"{name} (seed {seed}): pivots differ for {a}");
                Assert.True(RationalMatrix.FromArray(rref) == ours.Matrix, $"{name} (seed {seed}): rref differs for {a}");
                Assert.Equal(pivots.Count, ours.Rank);
            }
        }
    }

    [Fact]
    public void Rank_PublicApi_MatchesNaiveGaussJordan()
    {
        foreach (var (name, a) in Family(17))
        {
            var (_, pivots) = ReferenceLinearAlgebra.GaussJordan(a);
            Assert.True(pivots.Count == a.Rank(), $"{name}: rank");
            Assert.True(pivots.Count == a.Transpose().Rank(), $"{name}: rank of the transpose");
        }
    }

    [Fact]
    public void Nullspace_RandomMatrices_AnnihilatedAndOfDimensionColsMinusRank()
    {
        foreach (var (name, a) in Family(5))
        {
            var k = a.Nullspace();
            int rank = ReferenceLinearAlgebra.GaussJordan(a).Pivots.Count;
            Assert.True(a.ColumnCount - rank == k.RowCount, $"{name}: nullity");
            Assert.Equal(a.ColumnCount, k.ColumnCount);
            for (int q = 0; q < k.RowCount; q++)
                Assert.True(a.Multiply(k.Row(q)).All(x => x.IsZero), $"{name}: A·v ≠ 0 for basis vector {q}");
            // Independence and normal form: identity on the free columns.
            var form = a.ReducedRowEchelonForm();
            for (int q = 0; q < k.RowCount; q++)
                for (int t = 0; t < form.FreeColumns.Length; t++)
                    Assert.Equal(q == t ? Rational.One : Rational.Zero, k[q, form.FreeColumns[t]]);
            Assert.True(a * k.Transpose() == RationalMatrix.Zero(a.RowCount, k.RowCount), name);
        }
    }

    [Fact]
    public void Nullspace_Example_CanonicalBasisFromRref()
    {
        // x + 2y + 3z = 0 and 2x + 4y + 7z = 0: rref [[1, 2, 0], [0, 0, 1]], kernel spanned by (-2, 1, 0).
        var a = RationalMatrix.FromRows([[1, 2, 3], [2, 4, 7]]);
        Assert.Equal(RationalMatrix.FromRows([[-2, 1, 0]]), a.Nullspace());
        var rref = a.ReducedRowEchelonForm();
        Assert.Equal(RationalMatrix.FromRows([[1, 2, 0], [0, 0, 1]]), rref.Matrix);
        Assert.Equal(new[] { 0, 2 }, rref.PivotColumns.ToArray());
        Assert.Equal(new[] { 1 }, rref.FreeColumns.ToArray());
    }

    [Fact]
    public void Nullspace_FullColumnRank_HasNoRows()
    {
        var a = RationalMatrix.FromRows([[1, 2], [3, 4], [5, 7]]);
        var k = a.Nullspace();
        Assert.Equal(0, k.RowCount);
        Assert.Equal(2, k.ColumnCount);
    }

    [Fact]
    public void Nullspace_Empty_Shapes()
    {
        Assert.Equal(3, RationalMatrix.Zero(0, 3).Nullspace().RowCount);
        Assert.Equal(RationalMatrix.Identity(3), RationalMatrix.Zero(0, 3).Nullspace());
        Assert.Equal(0, RationalMatrix.Zero(4, 0).Nullspace().RowCount);
    }

    [Fact]
    public void Determinant_SmallRandom_MatchesLeibniz()
    {
        var rng = new Random(7);
        for (int n = 0; n <= 6; n++)
        {
            for (int t = 0; t < 4; t++)
            {
                var a = t % 2 == 0 ? ReferenceLinearAlgebra.RandomInteger(rng, n, n, 20) : ReferenceLinearAlgebra.RandomRational(rng, n, n, 9);
                if (t == 3 && n >= 2) a = ReferenceLinearAlgebra.RandomOfRank(rng, n, n, n - 1, 5);
                var expected = ReferenceLinearAlgebra.Leibniz(a);
                Assert.True(expected == a.Determinant(), $"n={n}: {a}");
                Assert.True(expected == a.Determinant(new EliminationOptions { Method = EliminationMethod.Multimodular }), $"multimodular n={n}: {a}");
                Assert.True(expected == a.Determinant(new EliminationOptions { Method = EliminationMethod.FractionFree }), $"fraction-free n={n}: {a}");
            }
        }
    }

    [Theory]
    [InlineData(5)]
    [InlineData(12)]
    [InlineData(20)]
    public void Determinant_Vandermonde_ProductOfDifferences(int n)
    {
        // det [x_i^j] = Π_{i<j} (x_j − x_i) (common knowledge: the Vandermonde determinant).
        var rng = new Random(n);
        var xs = new List<Rational>();
        while (xs.Count < n)
        {
            var x = new Rational(rng.NextInt64(-1000, 1000), rng.NextInt64(1, 50));
            if (!xs.Contains(x)) xs.Add(x);
        }
        var v = RationalMatrix.Create(n, n, (i, j) => xs[i].Pow(j));
        Rational expected = 1;
        for (int i = 0; i < n; i++)
            for (int j = i + 1; j < n; j++) expected *= xs[j] - xs[i];
        Assert.Equal(expected, v.Determinant());
        Assert.Equal(expected, v.Determinant(new EliminationOptions { Method = EliminationMethod.Multimodular }));
        Assert.Equal(expected, v.Determinant(new EliminationOptions { Method = EliminationMethod.FractionFree }));
    }

    private static RationalMatrix Hilbert(int n) => RationalMatrix.Create(n, n, (i, j) => new Rational(1, i + j + 1));

    [Fact]
    public void Determinant_Hilbert_ReciprocalIsA005249()
    {
        // 1/det(H_n) for n = 1..4 is 1, 12, 2160, 6048000 (OEIS A005249).
        long[] oeis = [1, 12, 2160, 6048000];
        for (int n = 1; n <= 4; n++) Assert.Equal(new Rational(1, oeis[n - 1]), Hilbert(n).Determinant());
        // For larger n: det H_n = c_n^4 / c_{2n} with c_n = Π_{i=1}^{n-1} i! (common knowledge; M.-D. Choi,
        // "Tricks or treats with the Hilbert matrix", Amer. Math. Monthly 90 (1983)).
        for (int n = 1; n <= 16; n++)
        {
            var expected = new Rational(BigInteger.Pow(SuperFactorial(n), 4), SuperFactorial(2 * n));
            Assert.Equal(expected, Hilbert(n).Determinant());
        }
    }

    private static BigInteger SuperFactorial(int n)
    {
        BigInteger c = 1, f = 1;
        for (int i = 1; i < n; i++) { f *= i; c *= f; }
        return c;
    }

    [Fact]
    public void Inverse_Random_ProductIsIdentity()
    {
        var rng = new Random(11);
        foreach (var n in new[] { 1, 2, 3, 5, 8, 13 })
        {
            var a = n % 2 == 0 ? ReferenceLinearAlgebra.RandomInteger(rng, n, n, 50) : ReferenceLinearAlgebra.RandomRational(rng, n, n, 20);
            if (a.Determinant().IsZero) continue;
            var inv = a.Inverse();
            Assert.Equal(RationalMatrix.Identity(n), a * inv);
            Assert.Equal(RationalMatrix.Identity(n), inv * a);
            Assert.True(a.TryInverse(out var inv2));
            Assert.Equal(inv, inv2);
            Assert.Equal(1 / a.Determinant(), inv.Determinant());
        }
    }

    [Fact]
    public void Inverse_Hilbert_HasIntegerEntries()
    {
        // The inverse of a Hilbert matrix has integer entries (common knowledge; Choi 1983).
        foreach (var n in new[] { 4, 9, 12 })
        {
            var h = Hilbert(n);
            var inv = h.Inverse();
            Assert.All(inv.AsSpan().ToArray(), x => Assert.True(x.IsInteger));
            Assert.Equal(RationalMatrix.Identity(n), h * inv);
        }
    }

    [Fact]
    public void Inverse_Singular_ThrowsTypedException()
    {
        var a = RationalMatrix.FromRows([[1, 2, 3], [4, 5, 6], [7, 8, 9]]);
        var ex = Assert.Throws<SingularMatrixException>(() => a.Inverse());
        Assert.Equal(2, ex.Rank);
        Assert.Equal(3, ex.Size);
        Assert.False(a.TryInverse(out var none));
        Assert.Null(none);
        Assert.Throws<DimensionMismatchException>(() => RationalMatrix.Zero(2, 3).Inverse());
        Assert.Throws<SingularMatrixException>(() => RationalMatrix.Zero(12, 12).Inverse());
        Assert.Equal(RationalMatrix.Zero(0, 0), RationalMatrix.Zero(0, 0).Inverse());
    }

    [Fact]
    public void Solve_ConsistentRandom_SatisfiesSystem()
    {
        var rng = new Random(23);
        foreach (var (name, a) in Family(9))
        {
            var x0 = Enumerable.Range(0, a.ColumnCount).Select(_ => new Rational(rng.Next(-9, 10), rng.Next(1, 5))).ToArray();
            var b = a.Multiply(x0);
            var s = a.Solve(b);
            Assert.True(s.IsConsistent, name);
            Assert.True(a.Multiply(s.Particular).SequenceEqual(b), $"{name}: A·x ≠ b");
            Assert.Equal(a.Nullspace(), s.Kernel);
            Assert.Equal(s.Kernel.RowCount == 0 ? LinearSystemStatus.Unique : LinearSystemStatus.Underdetermined, s.Status);
            // Free variables of the particular solution are zero.
            foreach (var f in a.ReducedRowEchelonForm().FreeColumns) Assert.True(s.Particular[f].IsZero, name);
        }
    }

    [Fact]
    public void Solve_Inconsistent_ReportsIt()
    {
        var a = RationalMatrix.FromRows([[1, 1], [2, 2], [0, 1]]);
        var s = a.Solve([1, 3, 0]);
        Assert.Equal(LinearSystemStatus.Inconsistent, s.Status);
        Assert.False(s.IsConsistent);
        try { _ = s.Particular; Assert.Fail("Particular of an inconsistent system must throw"); }
        catch (InvalidOperationException) { }
        Assert.Equal(0, s.Kernel.RowCount);
        // A larger inconsistent system through the multimodular path.
        var rng = new Random(3);
        var big = ReferenceLinearAlgebra.RandomOfRank(rng, 12, 10, 6, 9);
        var rhs = Enumerable.Range(0, 12).Select(i => (Rational)(i == 0 ? 1 : 0)).ToArray();
        var naive = ReferenceLinearAlgebra.GaussJordan(big.Augment(RationalMatrix.FromRowMajor(12, 1, rhs)));
        var sol = big.Solve(rhs);
        Assert.Equal(naive.Pivots.Contains(10), !sol.IsConsistent);
        Assert.Equal(4, sol.Kernel.RowCount);
    }

    [Fact]
    public void Solve_Unique_Example()
    {
        var s = RationalMatrix.FromRows([[1, 1], [1, -1]]).Solve([3, 1]);
        Assert.Equal(LinearSystemStatus.Unique, s.Status);
        Assert.Equal(new Rational[] { 2, 1 }, s.Particular.ToArray());
        Assert.Throws<DimensionMismatchException>(() => RationalMatrix.Identity(2).Solve([1]));
    }
}
