using Integrable.Algebra;
using Integrable.Clusters;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Recursions;

namespace Integrable.Tests.Recursions;

public class QSystemClusterTests
{
    private static readonly RationalField Q = RationalField.Instance;

    public static TheoryData<string> FiniteTypes() =>
        ["A1", "A2", "A4", "B2", "B3", "C2", "C4", "D4", "D5", "E6", "E7", "E8", "F4", "G2"];

    [Theory]
    [MemberData(nameof(FiniteTypes))]
    public void ToCluster_EveryFiniteType_VerifiedPeriodicRealisation(string type)
    {
        // The constructor checks one period relation by relation; here: the shape, the block form
        // [[Cᵀ - C, -Cᵀ], [C, 0]] and the period length Σ_a 2·max(d)/d_a.
        var q = QSystem.FromType(type, QSystemConvention.Cluster);
        var cluster = q.ToCluster();
        int r = q.Rank;
        Assert.Equal(2 * r, cluster.Matrix.MutableCount);
        for (int a = 1; a <= r; a++)
            for (int b = 1; b <= r; b++)
            {
                Assert.Equal(q.CartanEntry(b, a) - q.CartanEntry(a, b), cluster.Matrix[a, b]);
                Assert.Equal(-q.CartanEntry(b, a), cluster.Matrix[a, r + b]);
                Assert.Equal(q.CartanEntry(a, b), cluster.Matrix[r + a, b]);
                Assert.Equal(0, cluster.Matrix[r + a, r + b]);
            }
        Assert.Equal(Enumerable.Range(1, r).Sum(cluster.Shift), cluster.Period.Length);
        Assert.Equal(cluster.Matrix, cluster.Matrix.Mutate(cluster.Period.Select(s => s.Direction)));
    }

    [Fact]
    public void ToCluster_A3_IsTheKedemMatrix()
    {
        // Kedem (2008): for a simply-laced type the exchange matrix is [[0, -C], [C, 0]].
        var cluster = QSystem.FromType("A3", QSystemConvention.Cluster).ToCluster();
        Assert.Equal(ExchangeMatrix.Parse(
            "[[0,0,0,-2,1,0],[0,0,0,1,-2,1],[0,0,0,0,1,-2],[2,-1,0,0,0,0],[-1,2,-1,0,0,0],[0,-1,2,0,0,0]]"), cluster.Matrix);
        Assert.Equal([(1, 0), (2, 0), (3, 0), (1, 1), (2, 1), (3, 1)], cluster.InitialCluster.ToArray());
        Assert.Equal([new QSystemStep(1, 1, 2), new QSystemStep(2, 2, 2), new QSystemStep(3, 3, 2)], cluster.Steps().Take(3).ToArray());
    }

    [Theory]
    [MemberData(nameof(FiniteTypes))]
    public void Mutations_ReproduceTheQSystem_OverQ(string type)
    {
        var q = QSystem.FromType(type, QSystemConvention.Cluster);
        var cluster = q.ToCluster();
        var random = new Random(7 + type.GetHashCode(StringComparison.Ordinal) % 100);
        var level0 = Enumerable.Range(0, q.Rank).Select(_ => new Rational(random.Next(1, 9), random.Next(1, 5))).ToList();
        var level1 = Enumerable.Range(0, q.Rank).Select(_ => new Rational(random.Next(1, 9), random.Next(1, 5))).ToList();
        var direct = q.Solve(Q, level0, level1);
        var seed = cluster.InitialSeed(Q, level0, level1);
        foreach (var step in cluster.Steps().Take(3 * cluster.Period.Length))
        {
            seed = seed.Mutate(step.Direction);
            Assert.Equal(direct[step.Node, step.Index], seed[step.Direction]);
        }
    }

    [Theory]
    [InlineData("A2", 6)]
    [InlineData("B2", 5)]
    [InlineData("C3", 3)]
    [InlineData("G2", 4)]
    public void Mutations_ReproduceTheQSystem_LaurentPolynomials(string type, int levels)
    {
        var q = QSystem.FromType(type, QSystemConvention.Cluster);
        var direct = q.SolveSymbolically();
        var ring = (LaurentPolynomialRing)direct.Ring;
        var level0 = direct.Level(0);
        var level1 = direct.Level(1);
        var cluster = q.ToCluster();
        for (int a = 1; a <= q.Rank; a++)
            Assert.Equal(direct[a, levels], cluster.Evaluate(ring, level0, level1, a, levels));
        Assert.Equal(level1[0], cluster.Evaluate(ring, level0, level1, 1, 1));
    }

    [Fact]
    public void BadInput_TypedErrors()
    {
        var cluster = QSystem.FromType("A2", QSystemConvention.Cluster).ToCluster();
        Assert.Throws<ArgumentException>(() => cluster.InitialSeed(Q, [Rational.One], [Rational.One, Rational.One]));
        Assert.Throws<ArgumentOutOfRangeException>(() => cluster.Evaluate(Q, [Rational.One, Rational.One], [Rational.One, Rational.One], 3, 2));
        Assert.Throws<ArgumentOutOfRangeException>(() => cluster.Shift(0));
        Assert.Throws<ExchangeDivisionException>(() => cluster.Evaluate(Q, [Rational.Zero, Rational.One], [Rational.One, Rational.One], 1, 2));
    }
}
