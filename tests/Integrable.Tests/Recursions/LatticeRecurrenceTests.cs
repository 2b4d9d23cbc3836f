using System.Numerics;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Recursions;

namespace Integrable.Tests.Recursions;

public class LatticeRecurrenceTests
{
    private const string TSystem = "T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n}";

    [Fact]
    public void Parse_TSystem_ReadsIndicesAndStencil()
    {
        var t = LatticeRecurrence.Parse(TSystem);
        Assert.Equal("T", t.Unknown);
        Assert.Equal("a", t.SpaceIndex);
        Assert.Equal("n", t.TimeIndex);
        Assert.Equal(2, t.Order);
        Assert.Equal(4, t.Stencil.Length);
    }

    [Theory]
    [InlineData(2, 2)]
    [InlineData(3, 8)]
    [InlineData(4, 64)]
    [InlineData(5, 1024)]
    [InlineData(6, 32768)]
    public void TSystem_AllOnes_CountsAztecDiamondTilings(int n, long expected)
    {
        // With every initial value 1, T_{0,N} = 2^{N(N-1)/2}, the number of domino tilings of the Aztec
        // diamond of order N-1 (Elkies–Kuperberg–Larsen–Propp 1992).
        var t = LatticeRecurrence.Parse(TSystem);
        Assert.Equal(new Rational(expected), t.Evaluate(RationalField.Instance, 0, n, (_, _) => Rational.One));
    }

    [Fact]
    public void TypeA1_WithBoundaryOnes_OddFibonacci()
    {
        // A_1: T_{n+1} T_{n-1} = T_n^2 + 1 with T_0 = T_1 = 1 gives 1, 1, 2, 5, 13, 34, 89 (F_{2n-1}, OEIS A001519).
        var t = LatticeRecurrence.Parse(TSystem);
        long[] expected = [1, 1, 2, 5, 13, 34, 89];
        for (int n = 0; n < expected.Length; n++)
            Assert.Equal(new Rational(expected[n]), t.Evaluate(RationalField.Instance, 1, n, (_, _) => Rational.One,
                boundary: (_, _) => Rational.One, spaceMin: 1, spaceMax: 1));
    }

    [Fact]
    public void MinusSignConvention_A1_GivesNPlusOne()
    {
        // Q_{n+1} Q_{n-1} = Q_n^2 - 1 with Q_0 = 1, Q_1 = 2 gives Q_n = n + 1 (A_1 Kirillov–Reshetikhin dimensions; common knowledge).
        var t = LatticeRecurrence.Parse("Q_{a,n+1} Q_{a,n-1} = Q_{a,n}^2 - Q_{a+1,n} Q_{a-1,n}");
        for (int n = 0; n < 10; n++)
            Assert.Equal(new Rational(n + 1), t.Evaluate(RationalField.Instance, 1, n, (_, m) => new Rational(m + 1),
                boundary: (_, _) => Rational.One, spaceMin: 1, spaceMax: 1));
    }

    [Fact]
    public void Octahedron_AllOnes_PowersOfTwo()
    {
        // f(0,0,k+1) above the flat surface with initial values 1 counts Aztec diamond tilings: 2^{k(k+1)/2}.
        for (int k = 1; k <= 6; k++)
        {
            var v = OctahedronRecurrence.Evaluate(RationalField.Instance, SteppedSurface.Flat((k + 1) % 2), (_, _) => Rational.One, 0, 0, k + 1);
            Assert.Equal(new Rational(BigInteger.Pow(2, k * (k + 1) / 2)), v);
        }
    }

    [Fact]
    public void Octahedron_BadPoints_TypedErrors()
    {
        var flat = SteppedSurface.Flat(0);
        Assert.Throws<ArgumentException>(() => OctahedronRecurrence.Evaluate(RationalField.Instance, flat, (_, _) => Rational.One, 0, 0, 1));
        var broken = new SteppedSurface((i, j) => i == 1 && j == 0 ? 3 : ((i + j) & 1));
        Assert.Throws<ArgumentException>(() => OctahedronRecurrence.Evaluate(RationalField.Instance, broken, (_, _) => Rational.One, 0, 0, 2));
    }

    [Theory]
    [InlineData("T_{a,n+1} = T_{a,n} + S_{a,n}", "several lattice unknowns")]
    [InlineData("T_{a,n+1} + T_{a+1,n+1} = T_{a,n}", "highest time shift")]
    [InlineData("T_{a,n} = T_{a+1,n}", "one time shift")]
    [InlineData("x_{n+1} = x_n", "two indices")]
    public void BadEquations_TypedErrors(string text, string fragment)
    {
        var e = Assert.Throws<EquationException>(() => LatticeRecurrence.Parse(text));
        Assert.Contains(fragment, e.Reason);
    }
}
