using Integrable.Polynomials;

namespace Integrable.Solutions;

/// <summary>The conditions under which τ_n = Σ c_i n^{d_i} λ^{e_i n} solves an equation for τ: the coefficients of the
/// independent monomials (λ^n)^a n^b in left − right, each a polynomial in the c_i, λ and the parameters that must vanish
/// (the dispersion relation and the constraints on the c_i).</summary>
public sealed class ExponentialTauRelations
{
    internal ExponentialTauRelations(IReadOnlyList<ExponentialTerm> terms, IReadOnlyList<string> coefficientNames, string lambda,
        IReadOnlyList<LaurentPolynomial> relations, string tau, string verification)
    {
        Terms = terms;
        CoefficientNames = coefficientNames;
        Lambda = lambda;
        Relations = relations;
        Tau = tau;
        Verification = verification;
    }

    /// <summary>The terms of the ansatz.</summary>
    public IReadOnlyList<ExponentialTerm> Terms { get; }

    /// <summary>The names of the coefficients c_i (variables of the relations).</summary>
    public IReadOnlyList<string> CoefficientNames { get; }

    /// <summary>The name of λ in the relations.</summary>
    public string Lambda { get; }

    /// <summary>The relations (polynomials that must vanish), without duplicates; empty when the ansatz solves the
    /// equation for all values of the constants.</summary>
    public IReadOnlyList<LaurentPolynomial> Relations { get; }

    /// <summary>The ansatz as text, e.g. <c>τ_n = c0 λ^n + c1 λ^(-n)</c>.</summary>
    public string Tau { get; }

    /// <summary>How the relations were checked.</summary>
    public string Verification { get; }

    /// <summary>The relations as text, each "… = 0".</summary>
    public IReadOnlyList<string> RelationTexts => Relations.Select(r => r + " = 0").ToList();

    /// <inheritdoc/>
    public override string ToString() => $"{Tau}: {string.Join("; ", RelationTexts)}";
}
