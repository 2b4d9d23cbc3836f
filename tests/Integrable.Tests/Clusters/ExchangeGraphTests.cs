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
}
