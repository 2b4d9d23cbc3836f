using System.Collections.Immutable;
using Integrable.RationalFunctions;

namespace Integrable.Integrals;

/// <summary>A first integral I of a map: I(φ(x)) = I(x); for a map with period-P coefficients, one function per
/// phase with I_{j+1}(φ_j(x)) = I_j(x).</summary>
public sealed class FirstIntegral
{
    internal FirstIntegral(ImmutableArray<RationalFunction> phases, IntegralKind kind, string verification, int dimension)
    {
        foreach (var p in phases)
            Degree = Math.Max(Degree, Math.Max(StateDegree(p.Numerator, dimension), StateDegree(p.Denominator, dimension)));
        Phases = phases;
        Kind = kind;
        Verification = verification;
    }

    /// <summary>The integral at phase 0 (states x_n, … with n ≡ 0 mod P; the integral itself for autonomous maps).</summary>
    public RationalFunction Value => Phases[0];

    /// <summary>The integral at each phase (one element for autonomous maps).</summary>
    public ImmutableArray<RationalFunction> Phases { get; }

    /// <summary>Polynomial or rational.</summary>
    public IntegralKind Kind { get; }

    /// <summary>Total degree in the state variables (the larger of numerator and denominator, over the phases).</summary>
    public int Degree { get; }

    internal static int StateDegree(Polynomials.LaurentPolynomial poly, int dimension)
    {
        int best = 0;
        foreach (var t in poly.Terms)
        {
            int s = 0;
            for (int i = 0; i < dimension; i++) s += t.Exponents[i];
            best = Math.Max(best, s);
        }
        return best;
    }

    /// <summary>How the integral was proved (an exact identity).</summary>
    public string Verification { get; }

    /// <summary>The integral in the library's text syntax (phases separated by <c>; </c>).</summary>
    /// <returns>The text.</returns>
    public override string ToString() => string.Join("; ", Phases.Select(p => p.ToString()));

    /// <summary>The integral as LaTeX (phases separated by commas).</summary>
    /// <returns>LaTeX markup.</returns>
    public string ToLatex() => string.Join(",\\quad ", Phases.Select(p => p.ToLatex()));
}
