using System.Numerics;
using Integrable.Algebra;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Tests.LinearAlgebra;

public class ModularMatrixTests
{
    public static TheoryData<ulong> Moduli => new() { 2, 3, 7, 101, 65537, 2147483647UL, 4294967311UL, 2305843009213693951UL, Primes.Large(0), Primes.Large(7) };

    private static ModularMatrix Random(PrimeField f, Random rng, int rows, int cols, double zeroFraction = 0.2) =>
        ModularMatrix.Create(f, rows, cols, (_, _) => rng.NextDouble() < zeroFraction ? 0 : rng.NextInt64(long.MinValue, long.MaxValue));

    private static IEnumerable<ModularMatrix> Family(PrimeField f, int seed)
    {
        var rng = new Random(seed);
        yield return Random(f, rng, 6, 6);
        yield return Random(f, rng, 9, 4);
        yield return Random(f, rng, 4, 11);
        yield return Random(f, rng, 1, 1);
        yield return ModularMatrix.Zero(f, 3, 5);
        yield return Random(f, rng, 7, 3) * Random(f, rng, 3, 8);   // rank ≤ 3
        yield return Random(f, rng, 20, 19, 0.6);
        yield return Random(f, rng, 40, 37);                           // longer dot products (folding)
    }

    [Theory]
    [MemberData(nameof(Moduli))]
    public void ReducedRowEchelonForm_Random_MatchesNaiveGaussJordan(ulong p)
    {
        var f = new PrimeField(p);
        foreach (var a in Family(f, (int)(p % 1000)))
        {
            var (rref, pivots) = ReferenceLinearAlgebra.GaussJordan(a);
            var ours = a.ReducedRowEchelonForm();
            Assert.Equal(pivots.ToArray(), ours.PivotColumns.ToArray());
            var expected = ModularMatrix.Create(f, a.RowCount, a.ColumnCount, (i, j) => (long)rref[i, j]);
            Assert.Equal(expected, ours.Matrix);
            Assert.Equal(pivots.Count, a.Rank());
        }
    }

    [Theory]
    [MemberData(nameof(Moduli))]
    public void Nullspace_Solve_Inverse_Determinant_AreConsistent(ulong p)
    {
        var f = new PrimeField(p);
        var rng = new Random(3);
        foreach (var a in Family(f, 77))
        {
            var k = a.Nullspace();
            Assert.Equal(a.ColumnCount - a.Rank(), k.RowCount);
            if (k.RowCount > 0) Assert.True((a * k.Transpose()).IsZero);
            var x0 = Enumerable.Range(0, a.ColumnCount).Select(_ => (ulong)rng.NextInt64(0, (long)Math.Min(p, long.MaxValue))).ToArray();
            var b = a.Multiply(x0);
            var s = a.Solve(b);
            Assert.True(s.IsConsistent);
            Assert.Equal(b, a.Multiply(s.Particular));
            Assert.Equal(k, s.Kernel);
            if (a.IsSquare)
            {
                ulong det = a.Determinant();
                Assert.Equal(det != 0, a.TryInverse(out var inv));
                if (inv is not null)
                {
                    Assert.Equal(ModularMatrix.Identity(f, a.RowCount), a * inv);
                    Assert.Equal(ModularMatrix.Identity(f, a.RowCount), inv * a);
                    Assert.Equal(f.Inverse(det), inv.Determinant());
                }
                else Assert.Throws<SingularMatrixException>(() => a.Inverse());
            }
        }
    }

    [Theory]
    [InlineData(0UL)]
    [InlineData(101UL)]
    [InlineData(7UL)]
    public void AgreesWithRationalVersionsReducedModP(ulong pOverride)
    {
        ulong p = pOverride == 0 ? Primes.Large(5) : pOverride;
        var f = new PrimeField(p);
        foreach (var (name, a) in RationalMatrixTests.Family(4))
        {
            if (a.AsSpan().ToArray().Any(x => !f.CanReduce(x))) continue;
            var am = a.ToModular(f);
            // Determinants commute with reduction.
            if (a.IsSquare) Assert.True(f.FromRational(a.Determinant()) == am.Determinant(), name);
            // The rank can only drop mod p; for the large prime it does not on these matrices.
            Assert.True(am.Rank() <= a.Rank(), name);
            if (pOverride == 0)
            {
                Assert.True(a.Rank() == am.Rank(), name);
                Assert.True(a.ReducedRowEchelonForm().Matrix.ToModular(f) == am.ReducedRowEchelonForm().Matrix, name);
                Assert.True(a.Nullspace().ToModular(f) == am.Nullspace(), name);
                if (a.IsSquare && a.TryInverse(out var inv)) Assert.True(inv.ToModular(f) == am.Inverse(), name);
            }
        }
    }

    [Fact]
    public void Determinant_KnownSmall()
    {
        var f = new PrimeField(101);
        Assert.Equal(f.FromInteger(-2), ModularMatrix.FromRows(f, [1, 2], [3, 4]).Determinant());
        // A row swap is needed: [[0, 1], [1, 0]] has determinant −1.
        Assert.Equal(100UL, ModularMatrix.FromRows(f, [0, 1], [1, 0]).Determinant());
        Assert.Equal(1UL, ModularMatrix.Zero(f, 0, 0).Determinant());
        Assert.Throws<DimensionMismatchException>(() => ModularMatrix.Zero(f, 2, 3).Determinant());
    }

    [Fact]
    public void Solve_Inconsistent_ModP()
    {
        var f = new PrimeField(5);
        var a = ModularMatrix.FromRows(f, [1, 2], [2, 4]);
        var s = a.Solve([1, 1]);
        Assert.Equal(LinearSystemStatus.Inconsistent, s.Status);
        Assert.Equal(1, s.Kernel.RowCount);
        Assert.Throws<ArgumentOutOfRangeException>(() => a.Solve([5, 0]));
    }

    [Fact]
    public void Arithmetic_Text_Builder_AndMixing()
    {
        var f = new PrimeField(7);
        var g = new PrimeField(11);
        var a = ModularMatrix.FromRows(f, [1, 2], [3, 4]);
        var b = ModularMatrix.FromRows(f, [6, 6], [0, 1]);
        Assert.Equal(ModularMatrix.FromRows(f, [0, 1], [3, 5]), a + b);
        Assert.Equal(ModularMatrix.FromRows(f, [2, 3], [3, 3]), a - b);
        Assert.Equal(ModularMatrix.FromRows(f, [6, 5], [4, 3]), -a);
        Assert.Equal(ModularMatrix.FromRows(f, [6, 1], [4, 1]), a * b);
        Assert.Equal(ModularMatrix.FromRows(f, [3, 6], [2, 5]), 3UL * a);
        Assert.Equal(a * 3UL, 3UL * a);
        Assert.Equal(ModularMatrix.FromRows(f, [1, 3], [2, 4]), a.Transpose());
        Assert.Equal(new ulong[] { 5, 4 }, a.Multiply([1, 2]));
        Assert.Throws<IncompatibleRingException>(() => a + ModularMatrix.Zero(g, 2, 2));
        Assert.Throws<IncompatibleRingException>(() => a * ModularMatrix.Zero(g, 2, 2));
        Assert.Throws<DimensionMismatchException>(() => a * ModularMatrix.Zero(f, 3, 1));
        Assert.Throws<ArgumentOutOfRangeException>(() => 7UL * a);
        Assert.NotEqual(a, ModularMatrix.FromRows(g, [1, 2], [3, 4]));
        Assert.Equal("[[1, 2], [3, 4]] (mod 7)", a.ToString());
        foreach (var m in new[] { a, ModularMatrix.Zero(g, 0, 3), ModularMatrix.Zero(g, 0, 0), ModularMatrix.Identity(new PrimeField(Primes.Large(0)), 3) })
            Assert.Equal(m, ModularMatrix.Parse(m.ToString()));
        Assert.Equal(ModularMatrix.FromRows(f, [6, 0]), ModularMatrix.Parse("[[-1, 14]] (mod 7)"));
        Assert.Throws<ArgumentException>(() => ModularMatrix.Parse("[[1]] (mod 8)"));
        Assert.Throws<FormatException>(() => ModularMatrix.Parse("[[1]]"));
        Assert.Throws<FormatException>(() => ModularMatrix.Parse("[[1/2]] (mod 7)"));
        var builder = new ModularMatrixBuilder(f, 2, 2);
        builder[0, 1] = 3;
        Assert.Equal(ModularMatrix.FromRows(f, [0, 3], [0, 0]), builder.ToImmutable());
        Assert.Throws<ArgumentOutOfRangeException>(() => builder[0, 0] = 7);
        Assert.Throws<ArgumentOutOfRangeException>(() => ModularMatrix.FromRowMajor(f, 1, 1, [7]));
        Assert.Equal(a.GetHashCode(), ModularMatrix.Parse(a.ToString()).GetHashCode());
    }
}
