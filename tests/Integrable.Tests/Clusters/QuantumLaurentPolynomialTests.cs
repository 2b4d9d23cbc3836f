using Integrable.Algebra;
using Integrable.Clusters;

namespace Integrable.Tests.Clusters;

public class QuantumLaurentPolynomialTests
{
    private static readonly QuantumTorus Torus = new(new[,] { { 0, 1, -2 }, { -1, 0, 3 }, { 2, -3, 0 } });

    [Fact]
    public void Multiply_Generators_QuasiCommute()
    {
        // X_i X_j = q^{λ_ij} X_j X_i with q = t^2 (BZ 2005, Section 2).
        for (int i = 1; i <= 3; i++)
            for (int j = 1; j <= 3; j++)
                Assert.Equal(Torus.Generator(i) * Torus.Generator(j), Torus.Power(2 * Torus[i, j]) * Torus.Generator(j) * Torus.Generator(i));
        // X^a X^b = t^{Λ(a,b)} X^{a+b}: Λ((1,0,0),(0,1,0)) = 1.
        Assert.Equal(Torus.Power(1) * Torus.Monomial([1, 1, 0]), Torus.Generator(1) * Torus.Generator(2));
    }

    [Fact]
    public void Multiply_IsAssociativeAndDistributive()
    {
        var a = Torus.Generator(1) + Torus.Power(3) * Torus.Monomial([0, -1, 2]);
        var b = Torus.Monomial([2, 1, -1]) - Torus.Power(-1) * Torus.Generator(3);
        var c = Torus.Generator(2) + Torus.One;
        Assert.Equal((a * b) * c, a * (b * c));
        Assert.Equal(a * (b + c), a * b + a * c);
        Assert.Equal(Torus.Zero, a - a);
        Assert.Equal(a * a * a, a.Pow(3));
    }

    [Fact]
    public void TryDivide_ExactProducts_RecoverFactors()
    {
        var a = Torus.Generator(1) + Torus.Power(3) * Torus.Monomial([0, -1, 2]) + Torus.One;
        var b = Torus.Monomial([2, 1, -1]) + Torus.Power(-1) * Torus.Generator(3);
        Assert.True((a * b).TryDivideLeft(a, out var q1));
        Assert.Equal(b, q1);
        Assert.True((a * b).TryDivideRight(b, out var q2));
        Assert.Equal(a, q2);
        Assert.False((a * b + Torus.One).TryDivideLeft(a, out _));
        Assert.False(a.TryDivideLeft(Torus.Zero, out _));
    }

    [Fact]
    public void Bar_NormalisedMonomialsAreFixed_ProductsAreReversed()
    {
        // The bar involution is an anti-automorphism fixing X^a (BZ 2005, Section 6).
        var a = Torus.Generator(1) + Torus.Power(2) * Torus.Generator(2);
        var b = Torus.Generator(3) + Torus.One;
        Assert.Equal(Torus.Monomial([1, -2, 3]), Torus.Monomial([1, -2, 3]).Bar());
        Assert.Equal((a * b).Bar(), b.Bar() * a.Bar());
    }

    [Fact]
    public void Construction_BadInput_Throws()
    {
        var e = Assert.Throws<ArgumentException>(() => new QuantumTorus(new[,] { { 0, 1 }, { 1, 0 } }));
        Assert.Contains("(1,2)", e.Message);
        Assert.Throws<ArgumentException>(() => new QuantumTorus(new int[2, 3]));
        Assert.Throws<ArgumentException>(() => Torus.Monomial([1, 2]));
        Assert.Throws<ArgumentOutOfRangeException>(() => Torus.Generator(4));
        var other = new QuantumTorus(new[,] { { 0, 1 }, { -1, 0 } });
        Assert.Throws<IncompatibleRingException>(() => Torus.One + other.One);
    }

    [Fact]
    public void ToString_ShowsCoefficientsAndMonomials()
    {
        var p = (Torus.Power(1) + Torus.Power(-1)) * Torus.Monomial([-1, 1, 0]) - Torus.Generator(3);
        // Terms in decreasing lexicographic order of exponents.
        Assert.Equal("-x3 + (t + t^-1)*x1^-1*x2", p.ToString());
        Assert.Equal("0", Torus.Zero.ToString());
    }
}
