using Integrable.Integrals;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Recursions;
using Integrable.Text;

namespace Integrable.Tests.Integrals;

public class FirstIntegralsTests
{
    private static IntegralsReport Find(string equation, int degree, bool rational = false) =>
        FirstIntegrals.Find(Recurrence.Parse(equation), IntegralOptions.Default with { Degree = degree, Rational = rational });

    private static RationalFunction In(IntegralMap map, string text) => map.Field.Parse(text);

    /// <summary>True when f is an integral of the map (exact check).</summary>
    private static bool Preserved(IntegralMap map, RationalFunction f) => (f.Compose(map.Substitution(0)) - f).IsZero;

    /// <summary>True when the two functions are functionally dependent: their gradients are proportional as
    /// rational functions (the 2×2 minors vanish identically).</summary>
    private static bool Dependent(IntegralMap map, RationalFunction a, RationalFunction b)
    {
        var ga = map.StateVariables.Select(a.Derivative).ToArray();
        var gb = map.StateVariables.Select(b.Derivative).ToArray();
        for (int i = 0; i < ga.Length; i++)
            for (int j = i + 1; j < ga.Length; j++)
                if (!(ga[i] * gb[j] - ga[j] * gb[i]).IsZero) return false;
        return true;
    }

    [Fact]
    public void Find_McMillanMap_RecoversBiquadraticIntegralWithParameter()
    {
        // McMillan, "A problem in the stability of periodic systems" (1971): x_{n+1} + x_{n-1} = 2μ x_n/(1 − x_n²)
        // preserves the biquadratic x²y² − x² − y² + 2μxy (sign convention checked here by the exact identity;
        // it is the symmetric QRT form with α = 1, γ = −1, δ = 2μ).
        var r = Find("x_{n+1} + x_{n-1} = 2 μ x_n/(1 - x_n^2)", 4);
        Assert.True(r.IsComplete);
        var i = Assert.Single(r.PolynomialIntegrals);
        var expected = In(r.Map, "x_n^2 x_{n+1}^2 - x_n^2 - x_{n+1}^2 + 2 μ x_n x_{n+1}");
        Assert.True(i.Value == expected || i.Value == -expected, i.ToString());
        Assert.Equal(1, r.Independent);
        Assert.True(r.HasExpectedIntegrals);
        Assert.Equal(0, r.RejectedCandidates);
    }

    [Fact]
    public void Find_AutonomousDiscretePainleveI_CubicIntegral()
    {
        // Grammaticos, Ramani, Papageorgiou, "Do integrable mappings have the Painlevé property?", PRL 67 (1991):
        // autonomous d-PI x_{n+1} + x_n + x_{n-1} = a + b/x_n has the integral xy(x + y) − a xy − b(x + y).
        var r = Find("x_{n+1} + x_n + x_{n-1} = a + b/x_n", 3);
        Assert.True(r.IsComplete);
        var i = Assert.Single(r.PolynomialIntegrals);
        Assert.Equal(In(r.Map, "x_n^2 x_{n+1} + x_n x_{n+1}^2 - a x_n x_{n+1} - b x_n - b x_{n+1}"), i.Value);
    }
}
