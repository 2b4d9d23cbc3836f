using CsCheck;
using Integrable.Clusters;

namespace Integrable.Tests.Clusters;

public class QuiverTests
{
    [Fact]
    public void Markov_FromArrows_MatchesMatrix()
    {
        var q = new Quiver(3, 0, [new Arrow(1, 2, 2), new Arrow(2, 3, 2), new Arrow(3, 1, 2)]);
        Assert.Equal(ExchangeMatrix.Markov, q.ToMatrix());
        Assert.Equal(q, Quiver.FromMatrix(ExchangeMatrix.Markov));
        Assert.Equal("quiver(3 mutable, 0 frozen: 1->2 x2, 2->3 x2, 3->1 x2)", q.ToString());
        Assert.Equal(2, q.ArrowCount(1, 2));
        Assert.Equal(0, q.ArrowCount(2, 1));
    }

    [Fact]
    public void Constructor_OppositeArrows_Cancel()
    {
        var q = new Quiver(2, 1, [new Arrow(1, 2, 3), new Arrow(2, 1), new Arrow(3, 1), new Arrow(1, 2)]);
        Assert.Equal<Arrow>([new Arrow(1, 2, 3), new Arrow(3, 1)], q.Arrows);
        Assert.Equal(ExchangeMatrix.Parse("[[0,3],[-3,0],[1,0]]"), q.ToMatrix());
        Assert.True(q.IsFrozen(3));
        Assert.False(q.IsFrozen(2));
    }

    [Fact]
    public void RoundTrip_RandomSkewSymmetricMatrices()
    {
        ClusterGenerators.SkewSymmetric.Sample(b =>
        {
            var q = Quiver.FromMatrix(b);
            return q.ToMatrix() == b && new Quiver(q.MutableCount, q.FrozenCount, q.Arrows) == q;
        }, iter: 300);
    }

    // Quiver mutation (add i→j for each path i→k→j, reverse arrows at k, cancel 2-cycles) agrees with
    // matrix mutation (Fomin–Zelevinsky, Cluster algebras I, 2002, §4; common practice).
    [Fact]
    public void Mutate_AgreesWithMatrixMutation()
    {
        Gen.Select(ClusterGenerators.SkewSymmetric, Gen.Int[0, 100].Array[1, 5]).Sample((b, ks) =>
        {
            var dirs = ks.Select(k => k % b.MutableCount + 1).ToArray();
            try
            {
                return Quiver.FromMatrix(b).Mutate(dirs).ToMatrix() == b.Mutate(dirs);
            }
            catch (OverflowException)
            {
                return true;
            }
        }, iter: 300);
    }

    [Fact]
    public void Mutate_A3Path_CreatesTriangle()
    {
        // 1→2→3, mutate at 2: arrow 1→3 appears, 2's arrows reverse: 2→1, 3→2, 1→3.
        var q = new Quiver(3, 0, [new Arrow(1, 2), new Arrow(2, 3)]).Mutate(2);
        Assert.Equal<Arrow>([new Arrow(1, 3), new Arrow(2, 1), new Arrow(3, 2)], q.Arrows);
    }

    [Fact]
    public void FromMatrix_NotSkewSymmetric_Throws()
    {
        Assert.Throws<ArgumentException>(() => Quiver.FromMatrix(ExchangeMatrix.FiniteType("B2")));
        Assert.Throws<ArgumentNullException>(() => Quiver.FromMatrix(null!));
    }

    [Fact]
    public void Constructor_BadArrows_Throw()
    {
        Assert.Throws<ArgumentException>(() => new Quiver(2, 0, [new Arrow(1, 1)]));
        Assert.Throws<ArgumentException>(() => new Quiver(2, 0, [new Arrow(1, 3)]));
        Assert.Throws<ArgumentException>(() => new Quiver(2, 0, [new Arrow(0, 1)]));
        Assert.Throws<ArgumentException>(() => new Quiver(1, 2, [new Arrow(2, 3)]));
        Assert.Throws<ArgumentException>(() => new Quiver(2, 0, [new Arrow(1, 2, 0)]));
        Assert.Throws<ArgumentException>(() => new Quiver(0, 0, []));
        Assert.Throws<ArgumentException>(() => new Quiver(1, -1, []));
        Assert.Throws<ArgumentNullException>(() => new Quiver(1, 0, null!));
        // Parallel bundles adding up beyond 32 bits are rejected.
        Assert.Throws<ArgumentException>(() => new Quiver(2, 0, [new Arrow(1, 2, int.MaxValue), new Arrow(1, 2, 1)]));
    }

    [Fact]
    public void Mutate_FrozenOrOutOfRangeVertex_Throws()
    {
        var q = new Quiver(2, 1, [new Arrow(1, 2), new Arrow(3, 1)]);
        Assert.Throws<ArgumentOutOfRangeException>(() => q.Mutate(3));
        Assert.Throws<ArgumentOutOfRangeException>(() => q.Mutate(0));
        Assert.Contains("step 2", Assert.Throws<ArgumentOutOfRangeException>(() => q.Mutate(1, 3)).Message);
        Assert.Throws<ArgumentOutOfRangeException>(() => q.IsFrozen(4));
        Assert.Throws<ArgumentOutOfRangeException>(() => q.ArrowCount(1, 4));
    }
}
