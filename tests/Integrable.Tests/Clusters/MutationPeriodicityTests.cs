using Integrable.Algebra;
using Integrable.Clusters;
using Integrable.Numbers;

namespace Integrable.Tests.Clusters;

public class MutationPeriodicityTests
{
    private static readonly RationalField Q = RationalField.Instance;

    // The Somos-4 quiver (Fordy–Marsh, Cluster mutation-periodic quivers and associated Laurent sequences,
    // J. Algebraic Combin. 2011, §1 / Example of period 1).
    private static readonly ExchangeMatrix Somos4 = ExchangeMatrix.Parse("[[0,-1,2,-1],[1,0,-3,2],[-2,3,0,-1],[1,-2,1,0]]");

    // The Somos-5 quiver (Fordy–Marsh 2011, from memory).
    private static readonly ExchangeMatrix Somos5 =
        ExchangeMatrix.Parse("[[0,-1,1,1,-1],[1,0,-2,0,1],[-1,2,0,-2,1],[-1,0,2,0,-1],[1,-1,-1,1,0]]");

    private static Rational[] Ones(int n) => Enumerable.Repeat(Rational.One, n).ToArray();

    [Fact]
    public void Somos4_HasPeriodOneAndTheSomosRecurrence()
    {
        Assert.Equal(1, MutationPeriodicity.FindShiftPeriod(Somos4));
        var rec = MutationPeriodicity.FindRecurrence(Somos4)!;
        Assert.Equal(4, rec.Order);
        Assert.Equal(1, rec.Period);
        var r = Assert.Single(rec.Relations);
        Assert.Equal(4, r.DivisorLag);
        // x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2: lags 1 and 3 in one monomial, lag 2 squared in the
        // other; lag vectors cover lags 1..Order + Period − 1 = 4 (lag 4 is the divisor).
        Assert.Equal(new[] { 1, 0, 1, 0 }, r.PlusExponents);
        Assert.Equal(new[] { 0, 2, 0, 0 }, r.MinusExponents);
        Assert.Equal("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2", rec.ToString());
        Assert.Equal(new[] { 2, 3, 4, 1 }, rec.Permutation);
        Assert.Equal(new[] { 1 }, rec.Directions);
    }

    // Somos-4 from 1, 1, 1, 1: OEIS A006720.
    [Fact]
    public void Somos4_Iterate_GivesOeisA006720()
    {
        var rec = MutationPeriodicity.FindRecurrence(Somos4)!;
        long[] a006720 = [1, 1, 1, 1, 2, 3, 7, 23, 59, 314, 1529, 8209, 83313, 620297, 7869898, 126742987, 1687054711];
        var terms = rec.Iterate(Q, Ones(4), [], a006720.Length);
        Assert.Equal(a006720.Select(v => new Rational(v)), terms);
    }

    // Somos-5 from 1, …, 1: OEIS A006721; relation x_{n+5} x_n = x_{n+4} x_{n+1} + x_{n+3} x_{n+2}.
    [Fact]
    public void Somos5_HasPeriodOneAndGivesOeisA006721()
    {
        var rec = MutationPeriodicity.FindRecurrence(Somos5)!;
        Assert.Equal(1, rec.Period);
        Assert.Equal("x_{n+5} x_n = x_{n+4} x_{n+1} + x_{n+3} x_{n+2}", rec.ToString());
        long[] a006721 = [1, 1, 1, 1, 1, 2, 3, 5, 11, 37, 83, 274, 1217, 6161, 22833, 165713];
        Assert.Equal(a006721.Select(v => new Rational(v)), rec.Iterate(Q, Ones(5), [], a006721.Length));
    }

    // The recurrence's terms are the cluster variables met along the periodic mutation sequence, with the
    // seed relabelled by σ⁻¹ after each period (which restores the matrix).
    [Theory]
    [InlineData("[[0,-1,2,-1],[1,0,-3,2],[-2,3,0,-1],[1,-2,1,0]]", "1")]
    [InlineData("[[0,2,-2],[-2,0,2],[2,-2,0]]", "1 2")]
    [InlineData("[[0,-1,1,1,-1],[1,0,-2,0,1],[-1,2,0,-2,1],[-1,0,2,0,-1],[1,-1,-1,1,0]]", "1")]
    [InlineData("[[0,1],[-1,0]]", "1")]
    [InlineData("[[0,2],[-2,0],[1,-1]]", "1")]
    public void Recurrence_AgreesWithSeedMutations(string matrixText, string directionsText)
    {
        var b = ExchangeMatrix.Parse(matrixText);
        var dirs = MutationSequence.Parse(directionsText);
        Assert.True(MutationPeriodicity.TryGetRecurrence(b, dirs, out var rec));
        var f = new PrimeField(Primes.Large(5));
        var rnd = new Random(7);
        var values = Enumerable.Range(0, b.RowCount).Select(_ => (ulong)rnd.NextInt64(1, (long)f.Modulus)).ToArray();
        var seed = new Seed<ulong>(f, b, values);
        int n = b.MutableCount;
        var inverse = new int[n];
        for (int i = 0; i < n; i++) inverse[rec.Permutation[i] - 1] = i + 1;
        var fromSeeds = new List<ulong>(seed.Cluster);
        for (int period = 0; period < 6; period++)
        {
            foreach (int k in dirs)
            {
                seed = seed.Mutate(k);
                fromSeeds.Add(seed[k]);
            }
            seed = seed.Permute(inverse);
            Assert.Equal(b, seed.Matrix);
        }
        var terms = rec.Iterate(f, values[..n], values[n..], fromSeeds.Count);
        Assert.Equal(fromSeeds, terms);
    }

    [Fact]
    public void Markov_HasShiftPeriodTwo()
    {
        Assert.Equal(2, MutationPeriodicity.FindShiftPeriod(ExchangeMatrix.Markov));
        var rec = MutationPeriodicity.FindRecurrence(ExchangeMatrix.Markov)!;
        // Both steps are x_{n+3} x_n = x_{n+1}^2 + x_{n+2}^2 (the two monomials may come in either order).
        Assert.All(rec.Relations, r => Assert.Contains(r.ToString(),
            new[] { "x_{n+3} x_n = x_{n+2}^2 + x_{n+1}^2", "x_{n+3} x_n = x_{n+1}^2 + x_{n+2}^2" }));
        // 1, 1, 1, 2, 5, 29, 433: Markov numbers (OEIS A002559) along one branch.
        Assert.Equal(new long[] { 1, 1, 1, 2, 5, 29, 433 }.Select(v => new Rational(v)), rec.Iterate(Q, Ones(3), [], 7));
        Assert.StartsWith("step 1 of 2", rec.ToString());
    }

    // Kronecker quiver: x_{n+2} x_n = x_{n+1}^2 + 1; from 1, 1 the odd-indexed Fibonacci numbers (OEIS A001519).
    [Fact]
    public void Kronecker_GivesOddFibonacci()
    {
        var rec = MutationPeriodicity.FindRecurrence(ExchangeMatrix.Kronecker)!;
        Assert.Equal("x_{n+2} x_n = 1 + x_{n+1}^2", rec.ToString());
        Assert.Equal(new long[] { 1, 1, 2, 5, 13, 34, 89, 233 }.Select(v => new Rational(v)), rec.Iterate(Q, Ones(2), [], 8));
    }

    // Rank-2 type A: x_{n+2} x_n = x_{n+1} + 1 (Lyness), period 5 from generic values.
    [Fact]
    public void A2_GivesLynessRecurrenceOfPeriodFive()
    {
        var rec = MutationPeriodicity.FindRecurrence(ExchangeMatrix.Parse("[[0,1],[-1,0]]"))!;
        Assert.Equal("x_{n+2} x_n = 1 + x_{n+1}", rec.ToString());
        var terms = rec.Iterate(Q, [new Rational(3, 7), new Rational(-11, 2)], [], 12);
        for (int i = 0; i + 5 < terms.Length; i++) Assert.Equal(terms[i], terms[i + 5]);
        Assert.NotEqual(terms[0], terms[1]);
    }

    [Fact]
    public void Coefficients_AppearAsFrozenVariables()
    {
        var b = ExchangeMatrix.Parse("[[0,2],[-2,0],[1,-1]]");
        var rec = MutationPeriodicity.FindRecurrence(b)!;
        // b_21 = −2, b_31 = 1: x_3 x_1 = y_1 + x_2^2.
        Assert.Equal("x_{n+2} x_n = y_1 + x_{n+1}^2", rec.ToString());
        // Principal coefficients break the periodicity of A_2.
        Assert.Null(MutationPeriodicity.FindRecurrence(ExchangeMatrix.Parse("[[0,1],[-1,0],[1,0],[0,1]]")));
        Assert.Equal(1, rec.FrozenCount);
    }

    [Fact]
    public void NotPeriodic_ReturnsNullOrFalse()
    {
        // D_4 with the bipartite orientation has a source at 1 joined to 2, so μ_1 makes 1 a sink; the
        // cyclic shifts never restore the matrix.
        var d4 = ExchangeMatrix.FiniteType("D4");
        Assert.Null(MutationPeriodicity.FindShiftPeriod(d4));
        Assert.False(MutationPeriodicity.TryGetRecurrence(Somos4, [2], out var none));
        Assert.Null(none);
        // μ_1 μ_1 returns the matrix but not the shifted cluster: x_1 is back, not replaced.
        Assert.False(MutationPeriodicity.TryGetRecurrence(Somos4, [1, 1], out _));
        Assert.NotNull(MutationPeriodicity.FindPermutation(Somos4, [1, 1]));
    }

    [Fact]
    public void FindPermutation_Somos4AfterOneMutation_IsTheShift()
    {
        var sigma = MutationPeriodicity.FindPermutation(Somos4, [1]);
        Assert.Equal(new[] { 2, 3, 4, 1 }, sigma);
        Assert.Null(MutationPeriodicity.FindPermutation(ExchangeMatrix.FiniteType("A3"), [2]));
    }

    [Fact]
    public void BadInput_Throws()
    {
        Assert.Throws<ArgumentException>(() => MutationPeriodicity.TryGetRecurrence(Somos4, [], out _));
        Assert.Throws<ArgumentOutOfRangeException>(() => MutationPeriodicity.TryGetRecurrence(Somos4, [1, 5], out _));
        Assert.Throws<ArgumentOutOfRangeException>(() => MutationPeriodicity.FindPermutation(Somos4, [0]));
        Assert.Throws<ArgumentNullException>(() => MutationPeriodicity.FindRecurrence(null!));
        Assert.Throws<ArgumentNullException>(() => MutationPeriodicity.TryGetRecurrence(Somos4, null!, out _));
        var rec = MutationPeriodicity.FindRecurrence(Somos4)!;
        Assert.Throws<ArgumentException>(() => rec.Iterate(Q, Ones(3), [], 10));
        Assert.Throws<ArgumentException>(() => rec.Iterate(Q, Ones(4), Ones(1), 10));
        Assert.Throws<ArgumentOutOfRangeException>(() => rec.Iterate(Q, Ones(4), [], 3));
        Assert.Throws<ArgumentNullException>(() => rec.Iterate(null!, Ones(4), [], 5));
        Assert.Throws<ArgumentNullException>(() => rec.Iterate(Q, null!, [], 5));
        Assert.Throws<ArgumentNullException>(() => rec.Iterate(Q, Ones(4), null!, 5));
        Assert.Throws<ArgumentNullException>(() => MutationPeriodicity.FindPermutation(null!, [1]));
        // A zero term makes a later division fail; the error names the term.
        var e = Assert.Throws<ExchangeDivisionException>(() => rec.Iterate(Q, [Rational.Zero, Rational.One, Rational.One, Rational.One], [], 6));
        Assert.Equal(5, e.Step);
    }
}
