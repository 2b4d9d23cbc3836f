using Integrable.Numbers;
using Integrable.Recursions;
using Integrable.Text;

namespace Integrable.Tests.Recursions;

public class QrtMapTests
{
    // Rows index x^2, x, 1 and columns y^2, y, 1: entry (i, j) is the coefficient of x^{2-i} y^{2-j}.
    // Lyness numerator (x+1)(y+1)(x+y+a) = x^2 y + x y^2 + x^2 + y^2 + (a+2) x y + (a+1)(x + y) + a (expanded by hand).
    private const string LynessA0 = "[[0, 1, 1], [1, a + 2, a + 1], [1, a + 1, a]]";
    private const string LynessA1 = "[[0, 0, 0], [0, 1, 0], [0, 0, 0]]";

    [Fact]
    public void Symmetric_LynessMatrices_GiveLynessMapAndInvariant()
    {
        // x_{n+1} = (a + x_n)/x_{n-1} has the invariant (x+1)(y+1)(x+y+a)/(xy)
        // (Lyness 1942; Kocic–Ladas, Global behavior of nonlinear difference equations, 1993).
        var qrt = QrtMap.Symmetric(LynessA0, LynessA1);
        Assert.True(qrt.IsSymmetric);
        Assert.Equal(RationalMap.Parse("(x, y) -> (y, (y + a)/x)"), qrt.Map);
        Assert.Equal(qrt.Map.Field.Parse("(x + 1)(y + 1)(x + y + a)/(x y)"), qrt.Invariant);
        Assert.True(qrt.Map.IsInvariant(qrt.Invariant));
        // dx dy/(x y) is preserved with ratio +1 (by hand, see RationalMapTests).
        Assert.True(qrt.DensityRatio.IsOne);
        Assert.Equal(qrt.Map.Field.Parse("1/(x y)"), qrt.Density);
        Assert.Contains("K ∘ φ = K", qrt.Verification);
    }

    [Fact]
    public void Symmetric_LynessAtOne_HasPeriodFive()
    {
        // a = 1: period 5 (Lyness 1942).
        var qrt = QrtMap.Symmetric("[[0,1,1],[1,3,2],[1,2,1]]", LynessA1);
        Assert.True(qrt.Map.Power(5).IsIdentity);
        Assert.False(qrt.Map.Power(3).IsIdentity);
    }

    [Fact]
    public void Symmetric_McMillanMatrices_GiveMcMillanMap()
    {
        // McMillan's map x_{n+1} + x_{n-1} = 2 m x_n/(1 + x_n^2) with invariant
        // x^2 y^2 + x^2 + y^2 - 2 m x y (E. M. McMillan, "A problem in the stability of periodic systems", 1971;
        // common knowledge as the additive special case A1 = e33 of QRT).
        var qrt = QrtMap.Symmetric("[[1, 0, 1], [0, -2 m, 0], [1, 0, 0]]", "[[0,0,0],[0,0,0],[0,0,1]]");
        Assert.Equal(RationalMap.Parse("(x, y) -> (y, -x + 2 m y/(1 + y^2))"), qrt.Map);
        Assert.Equal(qrt.Map.Field.Parse("x^2 y^2 + x^2 + y^2 - 2 m x y"), qrt.Invariant);
        // The density 1 (A1 = e33): area preserving, J = det [[0, 1], [-1, g'(y)]] = 1 for (y, -x + g(y)) (by hand).
        Assert.True(qrt.DensityRatio.IsOne);
    }

    [Fact]
    public void Symmetric_InverseIsVerified()
    {
        var qrt = QrtMap.Symmetric("[[1, 2, 0], [2, 1, 3], [0, 3, 1]]", "[[0, 1, 1], [1, 0, 2], [1, 2, 5]]");
        var inv = qrt.Map.Invert();
        Assert.Equal(InversionMethod.Linear, inv.Method);
        Assert.True(inv.Inverse.IsInvariant(qrt.Invariant));
        var ratio = qrt.DensityRatio;
        Assert.True(ratio.IsOne || (-ratio).IsOne);
    }

    [Fact]
    public void Asymmetric_WithSymmetricMatrices_IsSquareOfSymmetricMap()
    {
        // With symmetric matrices, the composition of the two switches equals the symmetric map applied
        // twice (by hand from the definitions of the switches; QRT 1989).
        string a0 = "[[1, 2, 0], [2, 1, 3], [0, 3, 1]]", a1 = "[[0, 1, 1], [1, 0, 2], [1, 2, 5]]";
        var sym = QrtMap.Symmetric(a0, a1);
        var asym = QrtMap.Asymmetric(a0, a1);
        Assert.False(asym.IsSymmetric);
        Assert.Equal(sym.Map.Power(2), asym.Map);
    }

    [Fact]
    public void Asymmetric_GeneralMatrices_InvariantHoldsOnRationalOrbit()
    {
        var qrt = QrtMap.Asymmetric("[[1, 0, 2], [3, 1, 0], [0, 1, 1]]", "[[0, 0, 1], [1, 2, 0], [1, 0, 0]]");
        Assert.True(qrt.Map.IsInvariant(qrt.Invariant));
        var orbit = qrt.Map.Orbit(Integrable.Algebra.RationalField.Instance, [new Rational(1), new Rational(2)], 4);
        var k0 = qrt.Invariant.Evaluate(orbit[0]);
        foreach (var p in orbit) Assert.Equal(k0, qrt.Invariant.Evaluate(p));
        var ratio = qrt.DensityRatio;
        Assert.True(ratio.IsOne || (-ratio).IsOne);
    }

    [Fact]
    public void Symmetric_NonSymmetricMatrix_NamesEntry()
    {
        var e = Assert.Throws<ArgumentException>(() => QrtMap.Symmetric("[[0,1,2],[1,0,0],[0,0,1]]", LynessA1));
        Assert.Contains("(1,3)", e.Message);
    }

    [Fact]
    public void Create_DegenerateOrMalformed_Throws()
    {
        Assert.Throws<ArgumentException>(() => QrtMap.Symmetric(LynessA1, LynessA1));
        var p = Assert.Throws<ExpressionParseException>(() => QrtMap.Symmetric("[[0,1],[1,0]]", LynessA1));
        Assert.Contains("3 rows", p.Reason);
        Assert.Throws<ExpressionParseException>(() => QrtMap.Symmetric("[[0,1,1],[1,0],[1,0,0]]", LynessA1));
        Assert.Throws<ArgumentException>(() => QrtMap.Symmetric("[[x,0,0],[0,0,0],[0,0,1]]", LynessA1));
    }
}
