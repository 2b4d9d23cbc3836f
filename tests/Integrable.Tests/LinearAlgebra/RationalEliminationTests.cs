using System.Numerics;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Tests.LinearAlgebra;

/// <summary>The multimodular method must detect and recover from wrong modular images: unlucky primes
/// (a pivot or a minor divisible by p), wrong rational reconstructions, an exhausted prime budget.</summary>
public class RationalEliminationTests
{
    private static readonly ulong P0 = Primes.Large(0);

    private static RowEchelonForm<RationalMatrix> Run(RationalMatrix a, EliminationOptions options) =>
        RationalMatrix.BuildEchelonForm(RationalElimination.Echelon(a.AsSpan(), a.RowCount, a.ColumnCount, options));

    private static void AssertMatchesReference(RationalMatrix a, RowEchelonForm<RationalMatrix> ours)
    {
        var (rref, pivots) = ReferenceLinearAlgebra.GaussJordan(a);
        Assert.Equal(pivots.ToArray(), ours.PivotColumns.ToArray());
        Assert.Equal(RationalMatrix.FromArray(rref), ours.Matrix);
    }

    [Fact]
    public void PivotColumnDivisibleByFirstPrime_IsDetectedAndRecovered()
    {
        // Column 0 is a multiple of the first prime of the default supply: mod that prime it is zero, so
        // the first image has its pivots in the wrong (later) columns.
        var rng = new Random(1);
        var a = RationalMatrix.Create(6, 7, (i, j) => j == 0 ? (Rational)(new BigInteger(P0) * rng.Next(1, 9)) : rng.Next(-9, 10));
        var diag = new EliminationDiagnostics();
        var ours = Run(a, new EliminationOptions { Method = EliminationMethod.Multimodular, Diagnostics = diag });
        AssertMatchesReference(a, ours);
        Assert.Equal(0, ours.PivotColumns[0]);
        Assert.True(diag.UnluckyPrimes >= 1, diag.ToString());
    }

    [Fact]
    public void RankDropModuloFirstPrime_IsDetectedAndRecovered()
    {
        // Row 4 = row 3 + P·e_0: det = ±P·(cofactor) ≠ 0 over Q but the rank drops mod P.
        var rng = new Random(2);
        var b = new RationalMatrixBuilder(5, 5);
        for (int i = 0; i < 4; i++) for (int j = 0; j < 5; j++) b[i, j] = rng.Next(-9, 10);
        for (int j = 0; j < 5; j++) b[4, j] = b[3, j] + (j == 0 ? (Rational)new BigInteger(P0) : 0);
        var a = b.ToImmutable();
        Assert.False(a.Determinant().IsZero);
        var diag = new EliminationDiagnostics();
        var ours = Run(a, new EliminationOptions { Method = EliminationMethod.Multimodular, Diagnostics = diag });
        Assert.Equal(5, ours.Rank);
        AssertMatchesReference(a, ours);
        Assert.True(diag.UnluckyPrimes >= 1 && diag.VerificationFailures >= 1, diag.ToString());
    }

    [Fact]
    public void WrongReconstruction_IsRejectedByTheExactCheck()
    {
        // Small injected primes: the first image reconstructs the free-column entries to 1 and 2, which
        // are wrong; the exact check must reject them and more primes must follow.
        ulong[] primes = [1009, 1013, 1019, 1021, 1031, 1033, 1039, 1049, 1051, 1061, 1063, 1069];
        BigInteger x = 1009 * 123456789L + 1, y = 1009 * 987654321L + 2;
        var a = RationalMatrix.FromRows([[1, 0, (Rational)x], [0, 1, (Rational)y]]);
        var diag = new EliminationDiagnostics();
        var ours = Run(a, new EliminationOptions { Method = EliminationMethod.Multimodular, PrimeSequence = i => primes[i], Diagnostics = diag });
        Assert.Equal(a, ours.Matrix);
        Assert.True(diag.VerificationFailures >= 1, diag.ToString());
        Assert.True(diag.PrimesUsed > 1, diag.ToString());
    }

    [Fact]
    public void SmallPrimes_RandomMatrices_StillExact()
    {
        // Primes near 2^20 are unlucky often and need many images; the results must stay exact.
        var primes = new List<ulong>();
        for (ulong q = 1UL << 20; primes.Count < 400; q--) if (Primes.IsPrime(q)) primes.Add(q);
        for (int seed = 1; seed <= 2; seed++)
        {
            foreach (var (name, a) in RationalMatrixTests.Family(seed))
            {
                var ours = Run(a, new EliminationOptions { Method = EliminationMethod.Multimodular, PrimeSequence = i => primes[i] });
                var (rref, pivots) = ReferenceLinearAlgebra.GaussJordan(a);
                Assert.True(pivots.SequenceEqual(ours.PivotColumns.ToArray()) && RationalMatrix.FromArray(rref) == ours.Matrix, name);
            }
        }
    }

    [Fact]
    public void TinyPrimes_ManyUnluckyImages_StillExact()
    {
        // With p = 2, 3, 5, 7, … almost every image is unlucky for a matrix with entries divisible by small numbers.
        var primes = new List<ulong>();
        for (ulong q = 2; primes.Count < 300; q++) if (Primes.IsPrime(q)) primes.Add(q);
        var a = RationalMatrix.FromRows([[6, 10, 15, 4], [30, 2, 3, 5], [14, 21, 35, 6], [12, 20, 30, 8]]);
        var diag = new EliminationDiagnostics();
        var ours = Run(a, new EliminationOptions { Method = EliminationMethod.Multimodular, PrimeSequence = i => primes[i], Diagnostics = diag });
        AssertMatchesReference(a, ours);
        Assert.True(diag.UnluckyPrimes >= 1, diag.ToString());
    }

    [Fact]
    public void PrimeBudgetExhausted_FallsBackToFractionFree()
    {
        var rng = new Random(3);
        var a = RationalMatrix.Create(5, 6, (i, j) => j == 0 ? (Rational)(new BigInteger(P0) * rng.Next(1, 9)) : rng.Next(-9, 10));
        var diag = new EliminationDiagnostics();
        var ours = Run(a, new EliminationOptions { Method = EliminationMethod.Multimodular, PrimeLimit = 1, Diagnostics = diag });
        AssertMatchesReference(a, ours);
        Assert.True(diag.FellBackToFractionFree, diag.ToString());
    }

    [Fact]
    public void DenominatorsDivisibleByThePrime_AreCleared()
    {
        var rng = new Random(4);
        var a = RationalMatrix.Create(6, 6, (i, j) => new Rational(rng.Next(-9, 10), (i + j) % 3 == 0 ? new BigInteger(P0) : rng.Next(1, 5)));
        AssertMatchesReference(a, Run(a, new EliminationOptions { Method = EliminationMethod.Multimodular }));
    }

    [Fact]
    public void Solve_And_Inverse_WithUnluckyFirstPrime_AreExact()
    {
        var rng = new Random(5);
        var b = new RationalMatrixBuilder(6, 6);
        for (int i = 0; i < 5; i++) for (int j = 0; j < 6; j++) b[i, j] = rng.Next(-9, 10);
        for (int j = 0; j < 6; j++) b[5, j] = b[4, j] + (j == 2 ? (Rational)new BigInteger(P0) : 0);
        var a = b.ToImmutable();
        var options = new EliminationOptions { Method = EliminationMethod.Multimodular };
        Assert.True(a.TryInverse(options, out var inv, out _));
        Assert.Equal(RationalMatrix.Identity(6), a * inv);
        Rational[] rhs = [1, 2, 3, 4, 5, 6];
        var s = a.Solve(rhs, options);
        Assert.Equal(LinearSystemStatus.Unique, s.Status);
        Assert.Equal(rhs, a.Multiply(s.Particular));
    }

    [Fact]
    public void Determinant_Multimodular_UnluckyPrimeAndSingular()
    {
        var rng = new Random(6);
        var b = new RationalMatrixBuilder(12, 12);
        for (int i = 0; i < 12; i++) for (int j = 0; j < 12; j++) b[i, j] = rng.Next(-9, 10);
        for (int j = 0; j < 12; j++) b[11, j] = b[10, j] + (j == 0 ? (Rational)new BigInteger(P0) : 0);
        var a = b.ToImmutable();
        var ff = a.Determinant(new EliminationOptions { Method = EliminationMethod.FractionFree });
        Assert.False(ff.IsZero);
        Assert.Equal(BigInteger.Zero, ff.Numerator % P0);
        Assert.Equal(ff, a.Determinant(new EliminationOptions { Method = EliminationMethod.Multimodular }));
        // Singular matrices with large entries: two zero images are followed by the verified rank.
        foreach (int rank in new[] { 11, 4 })
        {
            var singular = ReferenceLinearAlgebra.RandomOfRank(rng, 12, 12, rank, 1_000_000);
            Assert.Equal(Rational.Zero, singular.Determinant(new EliminationOptions { Method = EliminationMethod.Multimodular }));
        }
    }

    [Fact]
    public void CompositeFromPrimeSupply_ThrowsTypedException()
    {
        var a = ReferenceLinearAlgebra.RandomInteger(new Random(8), 7, 7, 9);
        var ex = Assert.Throws<InvalidOperationException>(() =>
            Run(a, new EliminationOptions { Method = EliminationMethod.Multimodular, PrimeSequence = _ => 1_000_000_000_000 }));
        Assert.Contains("1000000000000", ex.Message);
    }

    [Fact]
    public void CompareProfiles_OrdersByRankThenLexicographically()
    {
        Assert.Equal(1, RationalElimination.CompareProfiles([0, 1, 2], [0, 1]));
        Assert.Equal(-1, RationalElimination.CompareProfiles([0, 3], [0, 1, 2]));
        Assert.Equal(1, RationalElimination.CompareProfiles([0, 2], [1, 2]));
        Assert.Equal(-1, RationalElimination.CompareProfiles([0, 3], [0, 2]));
        Assert.Equal(0, RationalElimination.CompareProfiles([0, 3], [0, 3]));
    }

    [Fact]
    public void HugeEntries_OrbitLikeMatrix_NullspaceVerified()
    {
        // Rows: monomials x^i y^j (i + j ≤ 3) at points (x, y) of the curve y = x^2 + 1/3 with big
        // rational x: the curve equation times every monomial of degree ≤ 1 is in the kernel.
        var rng = new Random(9);
        var mons = new List<(int, int)>();
        for (int d = 0; d <= 3; d++) for (int i = d; i >= 0; i--) mons.Add((i, d - i));
        var rows = new List<Rational[]>();
        for (int k = 0; k < 14; k++)
        {
            var bytes = new byte[20]; rng.NextBytes(bytes); bytes[^1] &= 0x7F;
            var x = new Rational(new BigInteger(bytes) + 1, rng.Next(2, 1000));
            var y = x * x + new Rational(1, 3);
            rows.Add(mons.Select(m => x.Pow(m.Item1) * y.Pow(m.Item2)).ToArray());
        }
        var a = RationalMatrix.FromRows(rows.ToArray());
        var k2 = a.Nullspace();
        Assert.Equal(3, k2.RowCount);
        for (int q = 0; q < k2.RowCount; q++) Assert.All(a.Multiply(k2.Row(q)), v => Assert.True(v.IsZero));
        AssertMatchesReference(a, a.ReducedRowEchelonForm());
    }

    [Fact]
    public void LargeMatrix_HalfWordPrimes_UnluckyFirstPrimeRecovered()
    {
        // 64×70 is above the size where the half-word primes (below 2^31) are used; column 0 is a
        // multiple of the first of them, so the first image is unlucky.
        ulong h0 = Integrable.Kernels.LinearAlgebra.HalfWordPrimes.Get(0);
        Assert.True(h0 < (1UL << 31) && Primes.IsPrime(h0));
        Assert.Equal(h0, RationalElimination.PrimeSupply(EliminationOptions.Default, 64, 70)(0));
        Assert.Equal(P0, RationalElimination.PrimeSupply(EliminationOptions.Default, 8, 9)(0));
        // Rank 61 < 64 rows, so the kernel vectors are small and few primes are needed.
        var rng = new Random(12);
        var x = RationalMatrix.Create(64, 61, (i, j) => j == 0 ? (Rational)(new BigInteger(h0) * rng.Next(1, 9)) : rng.Next(-3, 4));
        var a = x.Augment(RationalMatrix.Create(64, 9, (i, j) => x[i, j + 1] + x[i, j + 2]));
        var diag = new EliminationDiagnostics();
        var ours = Run(a, new EliminationOptions { Method = EliminationMethod.Multimodular, Diagnostics = diag });
        Assert.Equal(61, ours.Rank);
        Assert.Equal(0, ours.PivotColumns[0]);
        var kernel = RationalMatrix.BuildKernel(RationalElimination.Echelon(a.AsSpan(), 64, 70, new EliminationOptions { Method = EliminationMethod.Multimodular }), 70);
        Assert.Equal(9, kernel.RowCount);
        Assert.True((a * kernel.Transpose()).IsZero);
        Assert.True(diag.UnluckyPrimes >= 1, diag.ToString());
    }
}
