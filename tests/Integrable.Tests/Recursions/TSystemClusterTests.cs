using Integrable.Algebra;
using Integrable.Clusters;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Recursions;

namespace Integrable.Tests.Recursions;

public class TSystemClusterTests
{
    [Theory]
    [InlineData(1, 4, 6)]
    [InlineData(2, 4, 5)]
    [InlineData(3, 6, 4)]
    [InlineData(2, 2, 5)]
    public void Mutations_ReproduceTheTSystem_WithPeriodicSymbolicData(int r, int period, int maxTime)
    {
        // The T-system as a cluster algebra (Di Francesco–Kedem, Positivity of the T-system cluster algebra,
        // 2009): mutation values equal the octahedron recurrence with the same (periodic) initial data.
        var cluster = TSystem.TypeA(r).ToCluster(period);
        var ring = new LaurentPolynomialRing([.. cluster.InitialCluster.Select(l => $"t_{{{l.Node},{l.Site}}}")]);
        LaurentPolynomial Initial(int a, int j, int k) => ring.Variable(cluster.Position(a, j) - 1);
        var seed = cluster.InitialSeed(ring, Initial);
        var t = TSystem.TypeA(r);
        foreach (var step in cluster.Steps().TakeWhile(s => s.Time <= maxTime))
        {
            seed = seed.Mutate(step.Direction);
            var direct = t.Evaluate(ring, step.Node, step.Site, step.Time, (a, j, k) => Initial(a, j, k));
            Assert.Equal(direct, seed[step.Direction]);
            Assert.All(direct.Coefficients.ToArray(), c => Assert.True(c.Sign > 0));
        }
    }

    [Fact]
    public void PeriodTwo_IsTheQSystemQuiverUpToSign()
    {
        // With P = 2 the quiver is the A_r Q-system quiver [[0, -C], [C, 0]] (Kedem 2008) with both levels
        // interleaved and all arrows reversed.
        var t = TSystem.TypeA(3).ToCluster(2);
        var q = QSystem.FromType("A3", QSystemConvention.Cluster).ToCluster();
        int[] qPosition = new int[7];
        for (int a = 1; a <= 3; a++)
            for (int j = 0; j < 2; j++)
                qPosition[t.Position(a, j)] = ((a + j) % 2 == 0 ? 0 : 3) + a;
        for (int u = 1; u <= 6; u++)
            for (int v = 1; v <= 6; v++)
                Assert.Equal(-q.Matrix[qPosition[u], qPosition[v]], t.Matrix[u, v]);
        var values = t.Evaluate(RationalField.Instance, (_, _, _) => Rational.One, 2, 0, 6);
        var direct = QSystem.FromType("A3", QSystemConvention.Cluster)
            .Solve(RationalField.Instance, [1, 1, 1], [1, 1, 1])[2, 6];
        Assert.Equal(direct, values);
    }

    [Fact]
    public void Positions_AndBadInput()
    {
        var c = TSystem.TypeA(2).ToCluster(4);
        Assert.Equal(8, c.Matrix.MutableCount);
        Assert.Equal(5, c.Position(2, 0));
        Assert.Equal(8, c.Position(2, -1));
        Assert.Equal((2, 3, 1), c.InitialCluster[7]);
        Assert.Throws<ArgumentOutOfRangeException>(() => c.Position(3, 0));
        Assert.Throws<ArgumentException>(() => c.Evaluate(RationalField.Instance, (_, _, _) => Rational.One, 1, 0, 2));
        Assert.Throws<ExchangeDivisionException>(() => c.Evaluate(RationalField.Instance, (a, j, k) => k == 0 ? Rational.Zero : Rational.One, 1, 1, 2));
    }
}
