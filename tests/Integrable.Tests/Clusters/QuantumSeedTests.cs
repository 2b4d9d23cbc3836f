using Integrable.Clusters;
using Integrable.Polynomials;

namespace Integrable.Tests.Clusters;

public class QuantumSeedTests
{
    private static readonly ExchangeMatrix A2 = ExchangeMatrix.Parse("[[0,1],[-1,0]]");
    private static readonly int[,] A2Lambda = { { 0, 1 }, { -1, 0 } };

    [Fact]
    public void CheckCompatible_A2AndKronecker_GiveDiagonal()
    {
        // B^T Λ for B = [[0,b],[-b,0]], Λ = [[0,1],[-1,0]] is b·I (by hand; condition of
        // Berenstein–Zelevinsky, Quantum cluster algebras, 2005, Def. 3.1).
        Assert.Equal([1L, 1L], QuantumSeed.CheckCompatible(A2, A2Lambda).ToArray());
        Assert.Equal([2L, 2L], QuantumSeed.CheckCompatible(ExchangeMatrix.Kronecker, A2Lambda).ToArray());
    }

    [Fact]
    public void CheckCompatible_BadLambda_NamesEntry()
    {
        // Λ = -[[0,1],[-1,0]] gives D = -I: not positive.
        var neg = Assert.Throws<CompatibilityException>(() => QuantumSeed.CheckCompatible(A2, new[,] { { 0, -1 }, { 1, 0 } }));
        Assert.Equal((1, 1, -1L), (neg.Row, neg.Column, neg.Value));
        var skew = Assert.Throws<CompatibilityException>(() => QuantumSeed.CheckCompatible(A2, new[,] { { 0, 1 }, { 2, 0 } }));
        Assert.Equal((1, 2), (skew.Row, skew.Column));
        Assert.Throws<CompatibilityException>(() => QuantumSeed.CheckCompatible(A2, new int[3, 3]));
        // A3 with principal coefficients but a Λ that is off by one entry in the frozen block.
        var (b, lambda) = QuantumSeed.PrincipalCoefficients(ExchangeMatrix.FiniteType("A3"));
        lambda[3, 4] += 1;
        lambda[4, 3] -= 1;
        var off = Assert.Throws<CompatibilityException>(() => QuantumSeed.Initial(b, lambda));
        Assert.NotEqual(0, off.Value);
    }

    [Fact]
    public void Mutate_A2_FirstStepIsTheQuantumExchangeRelation()
    {
        // Y1' = X^(-1,0) + X^(-1,1) (BZ 2005, mutation rule (4.23) with b_21 = -1).
        var s = QuantumSeed.Initial(A2, A2Lambda).Mutate(1);
        var t = s.Torus;
        Assert.Equal(t.Monomial([-1, 0]) + t.Monomial([-1, 1]), s.Variables[0]);
        Assert.Equal("x1^-1*x2 + x1^-1", s.Variables[0].ToString());
        // Λ' = E^T Λ E with E = [[-1,0],[1,1]]: by hand [[0,-1],[1,0]].
        Assert.Equal(new[,] { { 0, -1 }, { 1, 0 } }, s.LambdaArray());
    }

    [Fact]
    public void Mutate_A2_HasPeriodFiveUpToPermutation()
    {
        // Classical A2 has period 5 with the two variables swapped (Fomin–Zelevinsky, Cluster algebras I,
        // 2002); the quantum A2 seed does the same (from memory, BZ 2005).
        var s0 = QuantumSeed.Initial(A2, A2Lambda);
        var s5 = s0.Mutate(1, 2, 1, 2, 1);
        Assert.Equal(s0.Variables[1], s5.Variables[0]);
        Assert.Equal(s0.Variables[0], s5.Variables[1]);
        Assert.NotEqual(s0.Variables[0], s0.Mutate(1, 2, 1, 2).Variables[0]);
    }

    [Theory]
    [InlineData("A2", new[] { 1, 2, 1, 2, 1 })]
    [InlineData("Kronecker", new[] { 1, 2, 1, 2, 1, 2 })]
    [InlineData("A3", new[] { 1, 2, 3, 1, 2, 1 })]
    public void Mutate_Sequences_SatisfyQuantumClusterLaws(string name, int[] sequence)
    {
        ExchangeMatrix b;
        int[,] lambda;
        if (name == "A2") (b, lambda) = (A2, A2Lambda);
        else if (name == "Kronecker") (b, lambda) = (ExchangeMatrix.Kronecker, A2Lambda);
        else (b, lambda) = QuantumSeed.PrincipalCoefficients(ExchangeMatrix.FiniteType("A3"));
        var s = QuantumSeed.Initial(b, lambda);
        var ring = new LaurentPolynomialRing([.. Enumerable.Range(1, b.RowCount).Select(i => "x" + i)]);
        var classical = new Seed<LaurentPolynomial>(ring, b, Enumerable.Range(0, b.RowCount).Select(ring.Variable));
        foreach (int k in sequence)
        {
            s = s.Mutate(k);
            classical = classical.Mutate(k);
            var y = s.Variables;
            for (int i = 0; i < y.Length; i++)
            {
                // Quantum Laurent phenomenon (BZ 2005, Cor. 5.2): the mutation succeeded, so y[i] is in the torus.
                // Bar invariance of cluster variables (BZ 2005, Prop. 6.2; from memory).
                Assert.Equal(y[i], y[i].Bar());
                // Positivity (Davison, "Positivity for quantum cluster algebras", Ann. Math. 2018).
                Assert.True(y[i].HasNonNegativeCoefficients, $"{y[i]}");
                // Quasi-commutation Y_i Y_j = q^{λ'_ij} Y_j Y_i = t^{2λ'_ij} Y_j Y_i (BZ 2005, Section 4; from memory).
                for (int j = 0; j < y.Length; j++)
                    Assert.Equal(y[i] * y[j], s.Torus.Power(2 * s.Lambda(i + 1, j + 1)) * y[j] * y[i]);
            }
            // q = 1 gives the classical cluster variables (BZ 2005: the quasi-classical limit).
            Assert.Equal(classical.Variables.ToArray(), s.AtClassicalLimit(ring).ToArray());
            Assert.Equal(classical.Matrix, s.Matrix);
        }
    }

    [Fact]
    public void Mutate_BadDirection_Throws()
    {
        var s = QuantumSeed.Initial(A2, A2Lambda);
        Assert.Throws<ArgumentOutOfRangeException>(() => s.Mutate(3));
        Assert.Throws<ArgumentOutOfRangeException>(() => s.Mutate(1, 0));
        Assert.Throws<ArgumentException>(() => s.Monomial([1, -1]));
        Assert.Throws<ArgumentException>(() => QuantumSeed.PrincipalCoefficients(QuantumSeed.PrincipalCoefficients(A2).Matrix));
    }
}
