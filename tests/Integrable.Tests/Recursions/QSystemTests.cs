using System.Numerics;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Recursions;

namespace Integrable.Tests.Recursions;

public class QSystemTests
{
    private static readonly RationalField Q = RationalField.Instance;

    private static BigInteger Binomial(int n, int k)
    {
        if (k < 0 || k > n) return 0;
        BigInteger b = 1;
        for (int i = 1; i <= k; i++) b = b * (n - k + i) / i;
        return b;
    }

    /// <summary>Dimension of the GL_N representation with a rectangular diagram of a rows and m columns, by the
    /// hook-content formula Π_cells (N + c)/h (Stanley, Enumerative Combinatorics 2, 1999, Cor. 7.21.4).</summary>
    private static Rational HookContent(int n, int rows, int columns)
    {
        var v = Rational.One;
        for (int i = 0; i < rows; i++)
            for (int j = 0; j < columns; j++)
            {
                int content = j - i, hook = (columns - j - 1) + (rows - i - 1) + 1;
                v *= new Rational(n + content, hook);
            }
        return v;
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(5)]
    public void KirillovReshetikhin_TypeA_RectangularDimensionsByHookContent(int r)
    {
        // Type A_r: W^(a)_m is the GL_{r+1} representation of the a×m rectangle (Kirillov–Reshetikhin 1987);
        // Q_{a,1} = C(r+1, a).
        var q = QSystem.FromType('A', r);
        Assert.Equal(Enumerable.Range(1, r).Select(a => Binomial(r + 1, a)), q.FundamentalKirillovReshetikhinDimensions().ToArray());
        var dims = q.KirillovReshetikhinDimensions();
        for (int a = 1; a <= r; a++)
            for (int m = 0; m <= 7; m++)
                Assert.Equal(HookContent(r + 1, a, m), dims[a, m]);
    }

    [Fact]
    public void KirillovReshetikhin_B2_SmallValues()
    {
        // so(5): W^(1)_2 = V(2ω_1) (traceless symmetric 5×5, 14) and W^(2)_2 = V(2ω_2) ⊕ V(0) = 10 + 1
        // (Chari, On the fermionic formula and the Kirillov–Reshetikhin conjecture, 2001).
        var q = QSystem.FromType("B2");
        Assert.Equal(-1, q.CartanEntry(1, 2));
        Assert.Equal(-2, q.CartanEntry(2, 1));
        var s = q.Solve(Q, [Rational.One, Rational.One], [new Rational(5), new Rational(4)]);
        Assert.Equal(new Rational(14), s[1, 2]);
        Assert.Equal(new Rational(11), s[2, 2]);
        Assert.Equal(new Rational(30), s[1, 3]);   // V(3ω_1): harmonic cubics in 5 variables, 35 - 5
        Assert.Equal(new Rational(24), s[2, 3]);   // V(3ω_2) ⊕ V(ω_2) = Sym^3 C^4 ⊕ C^4 = 20 + 4
    }

    [Theory]
    [InlineData("B3", 7)]
    [InlineData("D4", 8)]
    [InlineData("D5", 10)]
    public void KirillovReshetikhin_VectorNode_HarmonicPolynomials(string type, int dimension)
    {
        // For B_r and D_r, W^(1)_m = V(mω_1), the harmonic polynomials of degree m in N = 2r+1 or 2r variables:
        // C(m+N-1, N-1) - C(m+N-3, N-1) (Chari 2001; dimension common knowledge). This couples node 1 to every
        // other node through the Q-system, so it checks the index convention of the short/long factors too.
        var dims = QSystem.FromType(type).KirillovReshetikhinDimensions();
        for (int m = 0; m <= 7; m++)
            Assert.Equal(new Rational(Binomial(m + dimension - 1, dimension - 1) - Binomial(m + dimension - 3, dimension - 1)), dims[1, m]);
    }

    [Fact]
    public void KirillovReshetikhin_C3_FirstNode_SumOfSymmetricPowers()
    {
        // C_r: W^(1)_m = V(mω_1) ⊕ V((m-2)ω_1) ⊕ … (remove horizontal dominoes; Chari 2001), V(kω_1) = Sym^k C^{2r}.
        var dims = QSystem.FromType("C3").KirillovReshetikhinDimensions();
        for (int m = 0; m <= 7; m++)
        {
            BigInteger sum = 0;
            for (int k = m; k >= 0; k -= 2) sum += Binomial(k + 5, 5);
            Assert.Equal(new Rational(sum), dims[1, m]);
        }
    }

    [Theory]
    [InlineData("B4")]
    [InlineData("C4")]
    [InlineData("D6")]
    [InlineData("G2")]
    public void KirillovReshetikhin_OtherTypes_PositiveIntegers(string type)
    {
        // Dimensions are positive integers; wrong level-one data makes the solution leave Z or turn negative
        // within a few steps (checked by hand for G2 with 7, 14 and 8, 15).
        var q = QSystem.FromType(type);
        var dims = q.KirillovReshetikhinDimensions();
        for (int a = 1; a <= q.Rank; a++)
            for (int m = 0; m <= 12; m++)
                Assert.True(dims[a, m].IsInteger && dims[a, m].Sign > 0, $"Q_{a},{m} = {dims[a, m]}");
    }

    [Fact]
    public void KirillovReshetikhin_ExceptionalEF_NotTabulated()
    {
        Assert.Throws<NotSupportedException>(() => QSystem.FromType("E8").FundamentalKirillovReshetikhinDimensions());
        var permutedA3 = new[,] { { 2, -1, -1 }, { -1, 2, 0 }, { -1, 0, 2 } };   // A_3 with the middle node first
        var q = QSystem.FromCartanMatrix(permutedA3);
        Assert.Null(q.TypeName);
        Assert.Throws<NotSupportedException>(() => q.KirillovReshetikhinDimensions());
    }

    [Fact]
    public void ProductTerms_FollowTheFloorFormula()
    {
        var b2 = QSystem.FromType("B2");
        Assert.Equal([(2, 6)], b2.ProductTerms(1, 3).ToArray());               // long node: Q_{2,2n}
        Assert.Equal([(1, 1), (1, 2)], b2.ProductTerms(2, 3).ToArray());       // short node: Q_{1,⌊n/2⌋} Q_{1,⌊(n+1)/2⌋}
        var g2 = QSystem.FromType("G2");                             // α_1 short
        Assert.Equal([(2, 1), (2, 1), (2, 2)], g2.ProductTerms(1, 4).ToArray());
        Assert.Equal([(1, 12)], g2.ProductTerms(2, 4).ToArray());
        Assert.Equal([(1, 5), (3, 5)], QSystem.FromType("A3").ProductTerms(2, 5).ToArray());
        Assert.Equal("Q_{2,n+1} Q_{2,n-1} = Q_{2,n}^2 - Q_{1,⌊n/2⌋} Q_{1,⌊(n+1)/2⌋}", b2.Relation(2));
        Assert.Equal("Q_{1,n+1} Q_{1,n-1} = Q_{1,n}^2 + Q_{2,2n}", b2.WithConvention(QSystemConvention.Cluster).Relation(1));
        Assert.Equal("Q_{1,n+1} Q_{1,n-1} = Q_{1,n}^2 - 1", QSystem.FromType("A1").ToString());
    }

    [Fact]
    public void Symmetrizer_AndTypeDetection()
    {
        Assert.Equal([2, 1], QSystem.FromType("B2").Symmetrizer.ToArray());
        Assert.Equal([1, 1, 2], QSystem.FromType("C3").Symmetrizer.ToArray());
        Assert.Equal([1, 3], QSystem.FromType("G2").Symmetrizer.ToArray());
        Assert.Equal("C2", QSystem.FromCartanMatrix(new[,] { { 2, -2 }, { -1, 2 } }).TypeName);
        Assert.Equal("B2", QSystem.FromType("b_2").TypeName);
    }

    [Theory]
    [InlineData("A2", 6)]
    [InlineData("B2", 6)]
    [InlineData("G2", 6)]
    public void Cluster_SymbolicData_LaurentWithPositiveCoefficients(string type, int levels)
    {
        // Kedem, Q-systems as cluster algebras (2008), and Di Francesco–Kedem, Q-systems as cluster algebras II
        // (2009): in the plus convention every Q_{a,n} is a Laurent polynomial in Q_{b,0}, Q_{b,1} with
        // non-negative coefficients. Each value is also checked against its relation by multiplication only.
        var q = QSystem.FromType(type, QSystemConvention.Cluster);
        var s = q.SolveSymbolically();
        var ring = (LaurentPolynomialRing)s.Ring;
        for (int n = 2; n <= levels; n++)
            for (int a = 1; a <= q.Rank; a++)
            {
                var v = s[a, n];
                Assert.All(v.Coefficients.ToArray(), c => Assert.True(c.Sign > 0));
                var product = q.ProductTerms(a, n - 1).Aggregate(ring.One, (p, t) => p * s[t.Node, t.Index]);
                Assert.Equal(s[a, n - 1] * s[a, n - 1] + product, v * s[a, n - 2]);
            }
    }

    [Fact]
    public void Cluster_A1_IsTheKroneckerSequence()
    {
        // Q_{n+1} Q_{n-1} = Q_n^2 + 1 from 1, 1: 1, 1, 2, 5, 13, 34, 89 (odd Fibonacci numbers, OEIS A001519).
        var s = QSystem.FromType("A1", QSystemConvention.Cluster).Solve(Q, [Rational.One], [Rational.One]);
        long[] expected = [1, 1, 2, 5, 13, 34, 89, 233];
        for (int n = 0; n < expected.Length; n++) Assert.Equal(new Rational(expected[n]), s[1, n]);
    }

    [Fact]
    public void KirillovReshetikhin_SymbolicData_LaurentWithMixedSigns()
    {
        // Q_2 = (Q_1^2 - 1)/Q_0 and Q_3 = (Q_1^4 - 2 Q_1^2 + 1 - Q_0^2)/(Q_0^2 Q_1) for A_1 (direct computation).
        var s = QSystem.FromType("A1").SolveSymbolically();
        var ring = (LaurentPolynomialRing)s.Ring;
        var expected = LaurentPolynomial.Parse(ring, "(Q_{1,1}^4 - 2 Q_{1,1}^2 + 1 - Q_{1,0}^2)/(Q_{1,0}^2 Q_{1,1})");
        Assert.Equal(expected, s[1, 3]);
        var a2 = QSystem.FromType("A2").SolveSymbolically();
        Assert.Contains(a2[1, 4].Coefficients.ToArray(), c => c.Sign < 0);
    }

    [Fact]
    public void Level_ReturnsAllNodes_AndValuesAreMemoised()
    {
        var s = QSystem.FromType("A3").KirillovReshetikhinDimensions();
        Assert.Equal([new Rational(20), new Rational(50), new Rational(20)], s.Level(3).ToArray());
        Assert.Same(s.System, s.System);
        var results = new Rational[8];
        Parallel.For(0, 8, i => results[i] = s[2, 9 + i % 2]);
        Assert.Equal(HookContent(4, 2, 9), results[0]);
        Assert.Equal(HookContent(4, 2, 10), results[1]);
    }

    [Fact]
    public void SingularStep_NamesTheTerm()
    {
        var s = QSystem.FromType("A1").Solve(Q, [Rational.Zero], [new Rational(3)]);
        var e = Assert.Throws<SingularStepException>(() => s[1, 2]);
        Assert.Equal("Q_{1,2}", e.Term);
    }

    [Fact]
    public void BadInput_TypedErrors()
    {
        Assert.Throws<ArgumentException>(() => QSystem.FromCartanMatrix(new[,] { { 2, -2 }, { -2, 2 } }));   // affine A_1^(1)
        Assert.Throws<ArgumentException>(() => QSystem.FromCartanMatrix(new[,] { { 2, -1 }, { 0, 2 } }));
        Assert.Throws<ArgumentException>(() => QSystem.FromCartanMatrix(new[,] { { 1, -1 }, { -1, 2 } }));
        Assert.Throws<ArgumentException>(() => QSystem.FromCartanMatrix(new[,] { { 2, -1, -1 }, { -1, 2, -1 }, { -1, -1, 2 } }));   // affine A_2^(1)
        Assert.Throws<ArgumentException>(() => QSystem.FromCartanMatrix(new int[2, 3]));
        Assert.Throws<ArgumentException>(() => QSystem.FromType("H3"));
        Assert.Throws<ArgumentException>(() => QSystem.FromType("A"));
        Assert.Throws<ArgumentOutOfRangeException>(() => QSystem.FromType("E9"));
        var q = QSystem.FromType("A2");
        Assert.Throws<ArgumentException>(() => q.Solve(Q, [Rational.One], [Rational.One, Rational.One]));
        Assert.Throws<ArgumentOutOfRangeException>(() => q.KirillovReshetikhinDimensions()[3, 1]);
        Assert.Throws<ArgumentOutOfRangeException>(() => q.KirillovReshetikhinDimensions()[1, -1]);
        Assert.Throws<ArgumentOutOfRangeException>(() => q.CartanEntry(0, 1));
        Assert.Throws<InvalidOperationException>(() => q.ToCluster());
    }
}
