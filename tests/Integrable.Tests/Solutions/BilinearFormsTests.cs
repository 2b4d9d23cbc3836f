using Integrable.Recursions;
using Integrable.Solutions;

namespace Integrable.Tests.Solutions;

public class BilinearFormsTests
{
    [Fact]
    public void Search_Somos4_IsItsOwnTauForm()
    {
        // Somos-4 τ_{n+2} τ_{n-2} = τ_{n+1} τ_{n-1} + τ_n² is bilinear already (common knowledge).
        var form = BilinearForms.Search(Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2"));
        Assert.NotNull(form);
        Assert.Equal(TauAnsatz.Identity, form.Ansatz);
        Assert.True(form.IsHomogeneous);
        Assert.Equal(3, form.Polynomial.TermCount);
        Assert.Contains("τ_{n+4}", form.Text, StringComparison.Ordinal);
    }

    [Fact]
    public void Search_SomosReduction_FindsSomos4ThroughSecondDifference()
    {
        // x_n = τ_{n+1} τ_{n-1}/τ_n² turns x_{n+1} x_n² x_{n-1} = a x_n + b into the Somos-4 relation
        // τ_{n+2} τ_{n-2} = a τ_{n+1} τ_{n-1} + b τ_n² (A. N. W. Hone, "Elliptic curves and quadratic recurrence
        // sequences", Bull. London Math. Soc. 37 (2005) 161–171).
        var form = BilinearForms.Search(Recurrence.Parse("x_{n+1} x_n^2 x_{n-1} = a x_n + b"));
        Assert.NotNull(form);
        Assert.Equal(TauAnsatz.SecondDifference, form.Ansatz);
        Assert.True(form.IsHomogeneous);
        var ring = form.Polynomial.Ring;
        var t = (int s) => ring.Variable(s >= 0 ? $"TAUp{s}" : $"TAUm{-s}");
        var expected = t(2) * t(-2) - ring.Variable("a") * t(1) * t(-1) - ring.Variable("b") * t(0) * t(0);
        Assert.True(form.Polynomial == expected || form.Polynomial == -expected, form.Text);
    }

    [Fact]
    public void Search_Quadrangulations_NotBilinearInSmallFamily()
    {
        // The two-point recursion needs a first integral to become bilinear; the plain search must not claim a form
        // (Bouttier, Di Francesco, Guitter, Nucl. Phys. B 663 (2003) 535 solve it through its conserved quantity).
        Assert.Null(BilinearForms.Search(Recurrence.Parse("R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})")));
    }

    [Fact]
    public void TauAnsatz_ToText_GroupsRepeatedFactors()
    {
        Assert.Equal("x_n = τ_{n+1} τ_{n-1} / τ_n^2", TauAnsatz.SecondDifference.ToText());
        Assert.Equal("R_n = C τ_n τ_{n+3} / (τ_{n+1} τ_{n+2})", new TauAnsatz([0, 3], [1, 2], true).ToText("R"));
    }
}
