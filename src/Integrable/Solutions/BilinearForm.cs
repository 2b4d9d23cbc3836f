using Integrable.Polynomials;

namespace Integrable.Solutions;

/// <summary>A bilinear (Hirota-type) equation B(τ) = 0 into which a tau substitution turns a recursion: after the
/// substitution, left − right of the recursion equals (a monomial in the τ's) × B / (the cleared denominator).</summary>
/// <param name="Ansatz">The substitution.</param>
/// <param name="Polynomial">B, a polynomial in the shifted τ's (internal variable names TAUp{s}/TAUm{s}), the constant
/// C and the parameters.</param>
/// <param name="IsHomogeneous">True when every term of B has degree exactly 2 in the τ's (Hirota form); false when
/// some terms are free of τ (bilinear with inhomogeneous terms).</param>
/// <param name="Text">B = 0 written with τ_{n+s}.</param>
/// <param name="Verification">How the identity was checked.</param>
public sealed record BilinearForm(TauAnsatz Ansatz, LaurentPolynomial Polynomial, bool IsHomogeneous, string Text, string Verification);
