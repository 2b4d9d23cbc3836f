using CsCheck;
using Integrable.Algebra;
using Integrable.Clusters;
using Integrable.Numbers;

namespace Integrable.Tests.Clusters;

public class SeedTests
{
    private static readonly RationalField Q = RationalField.Instance;

    private static Seed<Rational> RationalSeed(ExchangeMatrix b, params long[] values) =>
        new(Q, b, values.Select(v => new Rational(v)));

    // Rank 2 with b = c = 1 (type A_2). The exchange relations x_{n+1} x_{n−1} = x_n + 1 give a sequence of
    // period 5 (Lyness 1942; Fomin–Zelevinsky, Cluster algebras I, 2002, §2 — from memory:
    // x_3 = (x_2 + 1)/x_1, x_4 = (x_1 + x_2 + 1)/(x_1 x_2), x_5 = (x_1 + 1)/x_2, x_6 = x_1, x_7 = x_2).
    [Fact]
    public void Mutate_RankTwoTypeA_HasPeriodFive()
    {
        var b = ExchangeMatrix.Parse("[[0,1],[-1,0]]");
        var x1 = new Rational(2, 3);
        var x2 = new Rational(-5, 7);
        var s = new Seed<Rational>(Q, b, [x1, x2]);
        var five = s.Mutate(1, 2, 1, 2, 1);
        // After five mutations the cluster is (x_2, x_1) and the matrix is −B, i.e. B relabelled.
        Assert.Equal(x2, five[1]);
        Assert.Equal(x1, five[2]);
        Assert.Equal(s, five.Permute([2, 1]));
        Assert.Equal(s, s.Mutate(1, 2, 1, 2, 1, 2, 1, 2, 1, 2));
        // Intermediate values against the closed forms.
        Assert.Equal((x2 + 1) / x1, s.Mutate(1)[1]);
        Assert.Equal((x1 + x2 + 1) / (x1 * x2), s.Mutate(1, 2)[2]);
        Assert.Equal((x1 + 1) / x2, s.Mutate(1, 2, 1)[1]);
        Assert.NotEqual(s, s.Mutate(1, 2, 1, 2));
    }

    [Fact]
    public void Mutate_Twice_IsIdentityOnSeeds()
    {
        var f = new PrimeField(Primes.Large(0));
        Gen.Select(ClusterGenerators.Matrix, Gen.ULong[1, f.Modulus - 1].Array[10]).Sample((b, values) =>
        {
            var s = new Seed<ulong>(f, b, values.Take(b.RowCount));
            return Enumerable.Range(1, b.MutableCount).All(k => s.Mutate(k).Mutate(k).Equals(s));
        }, iter: 300);
    }

    // Markov numbers (OEIS A002559): the mutations of the Markov quiver with initial values (1, 1, 1)
    // give c' = (a² + b²)/c = 3ab − c, so every seed is a Markov triple a² + b² + c² = 3abc, and every
    // Markov number appears (Markov 1879/1880; from memory).
    [Fact]
    public void Mutate_MarkovQuiverFromOnes_GivesMarkovNumbers()
    {
        var markovNumbersUpTo233 = new long[] { 1, 2, 5, 13, 29, 34, 89, 169, 194, 233 };   // A002559
        var start = RationalSeed(ExchangeMatrix.Markov, 1, 1, 1);
        var values = new HashSet<Rational>();
        var level = new List<(Seed<Rational> Seed, int Last)> { (start, 0) };
        for (int depth = 0; depth < 8; depth++)
        {
            var next = new List<(Seed<Rational>, int)>();
            foreach (var (s, last) in level)
            {
                var (a, b, c) = (s[1], s[2], s[3]);
                Assert.Equal(3 * a * b * c, a * a + b * b + c * c);
                foreach (var v in s.Cluster) values.Add(v);
                for (int k = 1; k <= 3; k++)
                    if (k != last) next.Add((s.Mutate(k), k));
            }
            level = next;
        }
        Assert.Equal(markovNumbersUpTo233.Select(v => new Rational(v)), values.Where(v => v <= 233).Order());
    }

    [Fact]
    public void Mutate_FrozenVariables_EnterTheExchangeAndStayFixed()
    {
        // A_2 with principal coefficients y_1 = x_3, y_2 = x_4: x_1' = (x_3 + x_2)/x_1.
        var b = ExchangeMatrix.Parse("[[0,1],[-1,0],[1,0],[0,1]]");
        var s = RationalSeed(b, 2, 3, 5, 7);
        var t = s.Mutate(1);
        Assert.Equal(new Rational(5 + 3, 2), t[1]);
        Assert.Equal<Rational>(s.Frozen, t.Frozen);
        Assert.Equal(b.Mutate(1), t.Matrix);
        Assert.Equal(2, t.FrozenCount);
    }

    [Fact]
    public void Mutate_ZeroVariable_ThrowsNamingDirectionAndStep()
    {
        var f = new PrimeField(101);
        var b = ExchangeMatrix.FiniteType("A3");
        // x_2 = 0: the second step divides by it.
        var s = new Seed<ulong>(f, b, [3UL, 0UL, 4UL]);
        var e = Assert.Throws<ExchangeDivisionException>(() => s.Mutate(1, 2));
        Assert.Equal(2, e.Direction);
        Assert.Equal(2, e.Step);
        Assert.Equal(2, Assert.Throws<ExchangeDivisionException>(() => s.Mutate(2)).Direction);
    }

    [Fact]
    public void Constructor_BadInput_Throws()
    {
        var b = ExchangeMatrix.FiniteType("A2");
        Assert.Throws<ArgumentException>(() => RationalSeed(b, 1, 2, 3));
        Assert.Throws<ArgumentNullException>(() => new Seed<Rational>(null!, b, []));
        Assert.Throws<ArgumentNullException>(() => new Seed<Rational>(Q, null!, []));
        Assert.Throws<ArgumentNullException>(() => new Seed<Rational>(Q, b, null!));
        var s = RationalSeed(b, 1, 2);
        Assert.Throws<ArgumentOutOfRangeException>(() => s.Mutate(3));
        Assert.Contains("step 2", Assert.Throws<ArgumentOutOfRangeException>(() => s.Mutate(1, 0)).Message);
        Assert.Throws<ArgumentOutOfRangeException>(() => s[0]);
        Assert.Throws<ArgumentOutOfRangeException>(() => s[3]);
        Assert.Throws<ArgumentException>(() => s.Permute([1, 1]));
        Assert.Throws<ArgumentNullException>(() => s.Permute(null!));
        Assert.Throws<ArgumentNullException>(() => s.Mutate((IEnumerable<int>)null!));
    }

    [Fact]
    public void ToString_ShowsVariablesAndMatrix()
    {
        var s = RationalSeed(ExchangeMatrix.Parse("[[0,1],[-1,0],[1,0]]"), 2, 3, 5);
        Assert.Equal("(2, 3 | 5; [[0,1],[-1,0],[1,0]])", s.ToString());
    }
}
