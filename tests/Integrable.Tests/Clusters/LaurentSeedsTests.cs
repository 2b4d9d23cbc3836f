using Integrable.Clusters;
using Integrable.Polynomials;

namespace Integrable.Tests.Clusters;

public class LaurentSeedsTests
{
    [Fact]
    public void Initial_A2_FiveClusterVariables()
    {
        // Type A_2: the five cluster variables x_1, x_2, (x_2 + 1)/x_1, (x_1 + x_2 + 1)/(x_1 x_2), (x_1 + 1)/x_2, and
        // period 5 up to swapping the two positions (Fomin–Zelevinsky, Cluster algebras I, 2002, Example 2.5).
        var seed = LaurentSeeds.Initial(ExchangeMatrix.Parse("[[0,1],[-1,0]]"));
        var ring = (LaurentPolynomialRing)seed.Ring;
        Assert.Equal(["x_1", "x_2"], ring.Variables);
        LaurentPolynomial P(string text) => LaurentPolynomial.Parse(ring, text);
        var s1 = seed.Mutate(1);
        Assert.Equal(P("(x_2 + 1)/x_1"), s1[1]);
        var s2 = s1.Mutate(2);
        Assert.Equal(P("(x_1 + x_2 + 1)/(x_1 x_2)"), s2[2]);
        var s3 = s2.Mutate(1);
        Assert.Equal(P("(x_1 + 1)/x_2"), s3[1]);
        var s5 = s3.Mutate(2, 1);
        Assert.Equal([seed[2], seed[1]], s5.Cluster.ToArray());
    }

    [Fact]
    public void Initial_FrozenRows_NamedY()
    {
        var seed = LaurentSeeds.Initial(ExchangeMatrix.Parse("[[0,1],[-1,0],[1,0]]"));
        Assert.Equal(["x_1", "x_2", "y_1"], ((LaurentPolynomialRing)seed.Ring).Variables);
        var ring = (LaurentPolynomialRing)seed.Ring;
        // x_1 x_1' = y_1 + x_2: b_31 = 1 puts y_1 in the first monomial, b_21 = -1 puts x_2 in the second.
        Assert.Equal(LaurentPolynomial.Parse(ring, "(x_2 + y_1)/x_1"), seed.Mutate(1)[1]);
        var named = LaurentSeeds.Initial(ExchangeMatrix.Parse("[[0,1],[-1,0],[1,0]]"), "u", "c");
        Assert.Equal(["u_1", "u_2", "c_1"], ((LaurentPolynomialRing)named.Ring).Variables);
    }

    // Counts of cluster variables (almost positive roots, |Φ+| + n) and clusters (generalised Catalan numbers):
    // Fomin–Zelevinsky, Y-systems and generalized associahedra (2003), and Cluster algebras II (2003).
    [Theory]
    [InlineData("A1", 2, 2)]
    [InlineData("A3", 9, 14)]
    [InlineData("A4", 14, 42)]
    [InlineData("B3", 12, 20)]
    [InlineData("C3", 12, 20)]
    [InlineData("D4", 16, 50)]
    [InlineData("G2", 8, 8)]
    [InlineData("F4", 28, 105)]
    [InlineData("E6", 42, 833)]
    public void ExploreExact_LaurentSeed_FiniteTypeCounts(string type, int variables, int clusters)
    {
        // Exact identification: every cluster variable is a canonical Laurent polynomial, found by exact division.
        var seed = LaurentSeeds.Initial(ExchangeMatrix.FiniteType(type));
        var result = ExchangeGraph.Explore(seed);
        Assert.True(result.Report.Complete);
        Assert.Equal(variables, result.Report.ClusterVariableCount);
        Assert.Equal(clusters, result.Report.SeedCount);
        Assert.Equal(variables, result.ClusterVariables.Length);
        // Positivity (Lee–Schiffler 2015 for skew-symmetric; Gross–Hacking–Keel–Kontsevich 2018 in general).
        Assert.All(result.ClusterVariables, v => Assert.All(v.Coefficients.ToArray(), c => Assert.True(c.Sign > 0)));
        // Agreement with the fingerprint search.
        var fingerprints = ExchangeGraph.Explore(ExchangeMatrix.FiniteType(type));
        Assert.Equal((fingerprints.SeedCount, fingerprints.ClusterVariableCount), (result.Report.SeedCount, result.Report.ClusterVariableCount));
    }

    [Fact]
    public void BadInput_TypedErrors()
    {
        var b = ExchangeMatrix.Parse("[[0,1],[-1,0],[1,0]]");
        Assert.Throws<ArgumentException>(() => LaurentSeeds.Initial(b, "x", "x"));
        Assert.Throws<ArgumentException>(() => LaurentSeeds.Initial(b, "", "y"));
        Assert.Throws<ArgumentException>(() => LaurentSeeds.Initial(b, ["a", "b"]));
        Assert.Throws<ArgumentException>(() => LaurentSeeds.Initial(b, ["a", "b", "a"]));
        Assert.Throws<ArgumentNullException>(() => LaurentSeeds.Initial(null!));
    }
}
