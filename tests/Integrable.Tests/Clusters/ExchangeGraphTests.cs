using System.Numerics;
using Integrable.Algebra;
using Integrable.Clusters;
using Integrable.Numbers;

namespace Integrable.Tests.Clusters;

public class ExchangeGraphTests
{
    private static BigInteger Binomial(int n, int k) => IntegerMath.Binomial(n, k);

    // Counts of cluster variables and clusters of the finite types: Fomin–Zelevinsky, Cluster algebras II
    // (Invent. Math. 2003): cluster variables ↔ almost positive roots (Thm. 1.9), so their number is
    // |Φ₊| + n; the number of clusters is the generalised Catalan number Π (h + e_i + 1)/(e_i + 1)
    // (Prop. 3.9; Fomin–Zelevinsky, Y-systems and generalized associahedra, 2003). Closed forms:
    // A_n: n(n+3)/2 and Catalan(n+1); B_n, C_n: n(n+1) and binomial(2n, n); D_n: n² and
    // (3n−2)/n·binomial(2n−2, n−1).
    public static TheoryData<string, long, long> ClassicalTypes()
    {
        var data = new TheoryData<string, long, long>();
        for (int n = 1; n <= 6; n++)
            data.Add($"A{n}", n * (n + 3) / 2, (long)(Binomial(2 * n + 2, n + 1) / (n + 2)));
        for (int n = 2; n <= 5; n++)
        {
            data.Add($"B{n}", n * (n + 1), (long)Binomial(2 * n, n));
            data.Add($"C{n}", n * (n + 1), (long)Binomial(2 * n, n));
        }
        for (int n = 4; n <= 6; n++)
            data.Add($"D{n}", n * n, (long)((3 * n - 2) * Binomial(2 * n - 2, n - 1) / n));
        return data;
    }

    [Theory]
    [MemberData(nameof(ClassicalTypes))]
    public void Explore_ClassicalFiniteType_MatchesFominZelevinskyCounts(string type, long variables, long clusters)
    {
        var report = ExchangeGraph.Explore(ExchangeMatrix.FiniteType(type));
        Assert.True(report.Complete);
        Assert.Equal(variables, report.ClusterVariableCount);
        Assert.Equal(clusters, report.SeedCount);
    }

    // Exceptional types. Numbers of positive roots and exponents (from memory; Bourbaki, Lie groups
    // and Lie algebras, Ch. VI, Planches): E6 36, (1,4,5,7,8,11); E7 63, (1,5,7,9,11,13,17);
    // E8 120, (1,7,11,13,17,19,23,29); F4 24, (1,5,7,11); G2 6, (1,5). Cluster variables |Φ₊| + n and
    // clusters Π (h + e_i + 1)/(e_i + 1) with h the largest exponent + 1 (Fomin–Zelevinsky, Cluster
    // algebras II, 2003, Prop. 3.9). The resulting numbers agree with the table there (from memory):
    // E6 42/833, E7 70/4160, E8 128/25080, F4 28/105, G2 8/8.
    [Theory]
    [InlineData("E6", 36, new[] { 1, 4, 5, 7, 8, 11 }, 42, 833)]
    [InlineData("E7", 63, new[] { 1, 5, 7, 9, 11, 13, 17 }, 70, 4160)]
    [InlineData("E8", 120, new[] { 1, 7, 11, 13, 17, 19, 23, 29 }, 128, 25080)]
    [InlineData("F4", 24, new[] { 1, 5, 7, 11 }, 28, 105)]
    [InlineData("G2", 6, new[] { 1, 5 }, 8, 8)]
    public void Explore_ExceptionalType_MatchesRootSystemCounts(string type, int positiveRoots, int[] exponents, int variables, int clusters)
    {
        int h = exponents[^1] + 1;
        Rational catalan = Rational.One;
        foreach (int e in exponents) catalan *= new Rational(h + e + 1, e + 1);
        Assert.Equal(new Rational(clusters), catalan);
        Assert.Equal(variables, positiveRoots + exponents.Length);

        var report = ExchangeGraph.Explore(ExchangeMatrix.FiniteType(type));
        Assert.True(report.Complete);
        Assert.Equal(variables, report.ClusterVariableCount);
        Assert.Equal(clusters, report.SeedCount);
    }

    // The exchange graph of a finite-type cluster algebra does not depend on the coefficients
    // (Fomin–Zelevinsky, Cluster algebras II, 2003, Thm. 1.13; from memory): principal coefficients
    // (an identity block of frozen rows) leave the counts unchanged.
    [Theory]
    [InlineData("A3", 9, 14)]
    [InlineData("B3", 12, 20)]
    [InlineData("G2", 8, 8)]
    public void Explore_PrincipalCoefficients_SameCounts(string type, int variables, int clusters)
    {
        var b = ExchangeMatrix.FiniteType(type);
        int n = b.MutableCount;
        var rows = new int[2 * n * n];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++)
            {
                rows[i * n + j] = b[i + 1, j + 1];
                rows[(n + i) * n + j] = i == j ? 1 : 0;
            }
        var report = ExchangeGraph.Explore(ExchangeMatrix.FromRows(n, n, rows));
        Assert.Equal((variables, clusters, true), (report.ClusterVariableCount, report.SeedCount, report.Complete));
    }

    [Fact]
    public void Explore_SeedLimit_ReportsIncomplete()
    {
        var a3 = ExchangeMatrix.FiniteType("A3");
        var cut = ExchangeGraph.Explore(a3, new ExplorationOptions { MaxSeeds = 5 });
        Assert.False(cut.Complete);
        Assert.Equal(5, cut.SeedCount);
        // A limit equal to the true number of clusters (Catalan(4) = 14) is not a cut.
        var exact = ExchangeGraph.Explore(a3, new ExplorationOptions { MaxSeeds = 14 });
        Assert.True(exact.Complete);
        Assert.Equal(14, exact.SeedCount);
    }

    // The Kronecker quiver (affine Ã_1) and the Markov quiver have infinite exchange graphs: a line and a
    // 3-regular tree (from memory), so bounded breadth-first search grows the depth as expected.
    [Fact]
    public void Explore_InfiniteTypes_AreCutAtTheLimit()
    {
        var line = ExchangeGraph.Explore(ExchangeMatrix.Kronecker, new ExplorationOptions { MaxSeeds = 41 });
        Assert.False(line.Complete);
        Assert.Equal(41, line.SeedCount);
        Assert.Equal(42, line.ClusterVariableCount);
        Assert.Equal(20, line.Depth);
        var tree = ExchangeGraph.Explore(ExchangeMatrix.Markov, new ExplorationOptions { MaxSeeds = 1 + 3 + 6 + 12 });
        Assert.Equal(3, tree.Depth);
        Assert.Equal(3 + 3 + 6 + 12, tree.ClusterVariableCount);
        Assert.False(tree.Complete);
    }

    [Fact]
    public void Explore_Cancelled_Throws()
    {
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.Throws<OperationCanceledException>(() => ExchangeGraph.Explore(ExchangeMatrix.FiniteType("A4"), cancellation: cts.Token));
    }

    private sealed class Recorder : IProgress<ExplorationProgress>
    {
        public List<ExplorationProgress> Reports { get; } = new();

        public void Report(ExplorationProgress value) => Reports.Add(value);
    }

    [Fact]
    public void Explore_ReportsProgressAtPowersOfTwoAndAtTheEnd()
    {
        var recorder = new Recorder();
        var report = ExchangeGraph.Explore(ExchangeMatrix.FiniteType("A8"), progress: recorder);
        Assert.Equal(4862, report.SeedCount);   // Catalan(9); 8·11/2 = 44 cluster variables
        Assert.Equal(4, recorder.Reports.Count);
        Assert.Equal(new[] { 1024, 2048, 4096 }, recorder.Reports.Take(3).Select(r => r.Seeds));
        var last = recorder.Reports[^1];
        Assert.Equal((4862, 44, 0), (last.Seeds, last.ClusterVariables, last.Pending));
        Assert.Equal(report.Depth, last.Depth);
    }

    [Fact]
    public void Explore_OtherRandomSeed_SameCounts()
    {
        var report = ExchangeGraph.Explore(ExchangeMatrix.FiniteType("D5"), new ExplorationOptions { RandomSeed = 12345 });
        Assert.Equal((25, 182), (report.ClusterVariableCount, report.SeedCount));   // D_5: n² and (3n−2)/n·C(2n−2, n−1)
        Assert.Contains("modulo", report.Identification);
    }

    [Fact]
    public void ExploreExact_RationalPoint_FindsTheLynessValues()
    {
        // A_2 at (x_1, x_2) = (3, 5): the five cluster variables x_1, x_2, (x_2 + 1)/x_1, (x_1 + x_2 + 1)/(x_1 x_2),
        // (x_1 + 1)/x_2 (Fomin–Zelevinsky, Cluster algebras I, 2002, §2; from memory) are 3, 5, 2, 3/5, 4/5.
        var seed = new Seed<Rational>(RationalField.Instance, ExchangeMatrix.FiniteType("A2"), [new Rational(3), new Rational(5)]);
        var result = ExchangeGraph.Explore(seed);
        Assert.Equal((5, 5, true), (result.Report.SeedCount, result.Report.ClusterVariableCount, result.Report.Complete));
        var expected = new[] { new Rational(3), new Rational(5), new Rational(2), new Rational(3, 5), new Rational(4, 5) };
        Assert.Equal(expected.Order(), result.ClusterVariables.Order());
    }

    [Theory]
    [InlineData("A4", 14, 42)]
    [InlineData("B3", 12, 20)]
    [InlineData("G2", 8, 8)]
    [InlineData("F4", 28, 105)]
    public void ExploreExact_GenericRationalPoint_AgreesWithFingerprints(string type, int variables, int clusters)
    {
        var b = ExchangeMatrix.FiniteType(type);
        var point = new[] { new Rational(2, 3), new Rational(5, 7), new Rational(-11, 13), new Rational(17, 19) }[..b.MutableCount];
        var result = ExchangeGraph.Explore(new Seed<Rational>(RationalField.Instance, b, point));
        Assert.Equal((variables, clusters, true), (result.Report.ClusterVariableCount, result.Report.SeedCount, result.Report.Complete));
        Assert.Equal(result.Report.ClusterVariableCount, result.ClusterVariables.Length);
        var fingerprints = ExchangeGraph.Explore(b);
        Assert.Equal((fingerprints.SeedCount, fingerprints.ClusterVariableCount), (result.Report.SeedCount, result.Report.ClusterVariableCount));
    }

    [Fact]
    public void Explore_BadInput_Throws()
    {
        Assert.Throws<ArgumentNullException>(() => ExchangeGraph.Explore((ExchangeMatrix)null!));
        Assert.Throws<ArgumentNullException>(() => ExchangeGraph.Explore((Seed<Rational>)null!));
        Assert.Throws<ArgumentOutOfRangeException>(() => ExchangeGraph.Explore(ExchangeMatrix.Markov, new ExplorationOptions { MaxSeeds = 0 }));
        // Equal initial cluster variables cannot be told apart by value.
        var ones = new Seed<Rational>(RationalField.Instance, ExchangeMatrix.Markov, [Rational.One, Rational.One, Rational.One]);
        Assert.Throws<ArgumentException>(() => ExchangeGraph.Explore(ones));
        // At (x_1, x_2) = (1, 2) in type A_2, μ_1 gives x_1' = (1 + x_2)/x_1 = 3 and then μ_2 gives
        // (1 + 3)/2 = 2, the value of the variable it replaces: values cannot identify variables there,
        // which is reported rather than miscounted.
        var degenerate = new Seed<Rational>(RationalField.Instance, ExchangeMatrix.FiniteType("A2"), [Rational.One, new Rational(2)]);
        Assert.Throws<ArgumentException>(() => ExchangeGraph.Explore(degenerate));
        // A zero value makes an exchange division fail.
        var f = new PrimeField(101);
        var zero = new Seed<ulong>(f, ExchangeMatrix.FiniteType("A3"), [0UL, 1UL, 2UL]);
        var e = Assert.Throws<ExchangeDivisionException>(() => ExchangeGraph.Explore(zero));
        Assert.Equal(1, e.Direction);
        Assert.Equal(1, e.Step);
    }
}
