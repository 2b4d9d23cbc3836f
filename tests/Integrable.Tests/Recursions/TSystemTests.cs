using System.Numerics;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Recursions;

namespace Integrable.Tests.Recursions;

public class TSystemTests
{
    private static readonly RationalField Q = RationalField.Instance;

    [Theory]
    [InlineData(1, 6)]
    [InlineData(2, 5)]
    [InlineData(3, 4)]
    public void TypeA_SiteIndependentData_ReducesToTheQSystem(int r, int maxTime)
    {
        // With T_{a,j,0} = Q_{a,0} and T_{a,j,1} = Q_{a,1} for every j, the two j-neighbours are equal to
        // T_{a,j,k} and the T-system becomes the A_r Q-system in the cluster convention
        // (Di Francesco–Kedem, Positivity of the T-system cluster algebra, 2009).
        var q = QSystem.FromType('A', r, QSystemConvention.Cluster).SolveSymbolically();
        var t = TSystem.TypeA(r);
        for (int a = 1; a <= r; a++)
            for (int k = 0; k <= maxTime; k++)
            {
                int j = (a + k) % 2;   // any j with a + j + k even
                Assert.Equal(q[a, k], t.Evaluate(q.Ring, a, j + 2, k, (b, _, time) => q[b, time]));
            }
    }

    [Fact]
    public void TypeA_Reduced_IsTheQSystem()
    {
        var q = QSystem.FromType('A', 3, QSystemConvention.Cluster).SolveSymbolically();
        var t = TSystem.TypeA(3);
        for (int a = 1; a <= 3; a++)
            Assert.Equal(q[a, 5], t.EvaluateReduced(q.Ring, a, 5, (b, n) => q[b, n]));
    }

    [Fact]
    public void TypeA_SiteIndependentData_EqualsTheReducedRecurrence()
    {
        // Data independent of j (equivalently of period 2, as a + j + k is even): T_{a,j±1,k} coincide, so
        // T_{a,j,k} is the two-index recurrence from T_{a,0}, T_{a,1}.
        var ring = new LaurentPolynomialRing("u1", "u2", "u3", "v1", "v2", "v3");
        LaurentPolynomial Data(int a, int k) => ring.Variable((k == 0 ? 0 : 3) + a - 1);
        var t = TSystem.TypeA(3);
        for (int a = 1; a <= 3; a++)
        {
            int k = 4, j = a % 2;
            Assert.Equal(t.EvaluateReduced(ring, a, k, Data), t.Evaluate(ring, a, j, k, (b, _, time) => Data(b, time)));
        }
    }

    [Theory]
    [InlineData(1, 2)]
    [InlineData(2, 8)]
    [InlineData(3, 64)]
    [InlineData(4, 1024)]
    public void Octahedron_SymbolicData_AztecDiamondTerms(int k, int terms)
    {
        // k layers above the two initial layers, f is a Laurent polynomial with 2^{k(k+1)/2} terms, all with
        // coefficient 1: one per domino tiling of the Aztec diamond of order k (Elkies–Kuperberg–Larsen–Propp,
        // Alternating-sign matrices and domino tilings, 1992; Speyer, Perfect matchings and the octahedron
        // recurrence, 2007). Checked through the A_∞ T-system and directly on the flat stepped surface.
        Assert.Equal(terms, (int)BigInteger.Pow(2, k * (k + 1) / 2));
        var names = new Dictionary<(int, int), int>();
        for (int i = -k - 1; i <= k + 1; i++)
            for (int j = -k - 1; j <= k + 1; j++)
                if (Math.Abs(i) + Math.Abs(j) <= k) names[(i, j)] = names.Count;
        var ring = new LaurentPolynomialRing([.. names.Keys.Select(p => $"t_{{{p.Item1},{p.Item2}}}")]);
        LaurentPolynomial Initial(int i, int j) => ring.Variable(names[(i, j)]);
        var viaT = TSystem.Unbounded.Evaluate(ring, 0, (k + 1) % 2, k + 1, (a, j, _) => Initial(a, j - (k + 1) % 2));
        Assert.Equal(terms, viaT.TermCount);
        Assert.All(viaT.Coefficients.ToArray(), c => Assert.True(c.IsOne));
        var direct = OctahedronRecurrence.Evaluate(ring, SteppedSurface.Flat((k + 1) % 2), Initial, 0, 0, k + 1);
        Assert.Equal(viaT, direct);
    }

    [Theory]
    [InlineData(2, 2)]
    [InlineData(3, 7)]
    [InlineData(4, 41)]
    [InlineData(5, 395)]
    public void Unbounded_Reduced_SymbolicTermCounts(int n, int terms)
    {
        // The two-index T-system from 4N - 4 symbols T_{a,0} (|a| <= N-2), T_{a,1} (|a| <= N-1): T_{0,N} has
        // 2, 7, 41, 395 terms for N = 2..5 and value 2^{N(N-1)/2} at all symbols 1 (independent computation
        // with FLINT 2.9 fmpz_mpoly by the project's reference scripts, workload W4; Aztec diamond count:
        // Elkies–Kuperberg–Larsen–Propp 1992).
        var names = new List<string>();
        for (int a = -(n - 2); a <= n - 2; a++) names.Add($"u_{{{a}}}");
        for (int a = -(n - 1); a <= n - 1; a++) names.Add($"v_{{{a}}}");
        var ring = new LaurentPolynomialRing([.. names]);
        var v = TSystem.Unbounded.EvaluateReduced(ring, 0, n, (a, k) => ring.Variable(k == 0 ? $"u_{{{a}}}" : $"v_{{{a}}}"));
        Assert.Equal(terms, v.TermCount);
        Assert.Equal(new Rational(BigInteger.Pow(2, n * (n - 1) / 2)), v.Evaluate(Enumerable.Repeat(Rational.One, names.Count).ToArray()));
    }

    [Fact]
    public void TypeA1_AllOnes_IsTheSomosLikeSequence()
    {
        // A_1: T_{1,j,k+1} T_{1,j,k-1} = T_{1,j+1,k} T_{1,j-1,k} + 1; with all initial values 1 and data
        // independent of j this is Q_{k+1} Q_{k-1} = Q_k^2 + 1: 1, 1, 2, 5, 13, 34 (OEIS A001519).
        var t = TSystem.TypeA(1);
        long[] expected = [1, 1, 2, 5, 13, 34];
        for (int k = 0; k < expected.Length; k++)
            Assert.Equal(new Rational(expected[k]), t.Evaluate(Q, 1, (1 + k) % 2, k, (_, _, _) => Rational.One));
    }

    [Fact]
    public void BadInput_TypedErrors()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => TSystem.TypeA(0));
        var t = TSystem.TypeA(2);
        Assert.Throws<ArgumentException>(() => t.Evaluate(Q, 3, 1, 2, (_, _, _) => Rational.One));
        Assert.Throws<ArgumentException>(() => t.Evaluate(Q, 1, 0, 2, (_, _, _) => Rational.One));   // 1 + 0 + 2 odd
        Assert.Throws<ArgumentException>(() => t.Evaluate(Q, 1, 1, -2, (_, _, _) => Rational.One));
        Assert.Throws<ArgumentException>(() => t.EvaluateReduced(Q, 0, 2, (_, _) => Rational.One));
        Assert.Throws<InvalidOperationException>(() => TSystem.Unbounded.ToCluster(4));
        Assert.Throws<ArgumentOutOfRangeException>(() => t.ToCluster(3));
        Assert.Throws<ArgumentOutOfRangeException>(() => t.ToCluster(0));
        var e = Assert.Throws<SingularStepException>(() => t.Evaluate(Q, 1, 1, 2, (a, j, k) => k == 0 ? Rational.Zero : Rational.One));
        Assert.Contains("f(1,1,0)", e.Reason);
        Assert.Contains("A_2", t.ToString());
        Assert.Contains("A_∞", TSystem.Unbounded.ToString());
    }
}
