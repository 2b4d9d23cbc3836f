namespace Integrable.Polynomials;

/// <summary>Monomial orders used by <see cref="LaurentPolynomial.DivRem"/> to pick leading terms.</summary>
/// <remarks>All three compare exponent vectors with variable 0 (the ring's first variable) treated
/// as the largest variable. On non-negative exponent vectors they are well-orders compatible with
/// multiplication, which makes division with remainder terminate.</remarks>
public enum MonomialOrder
{
    /// <summary>Lexicographic: compare the exponent of variable 0, then of variable 1, and so on
    /// (x &gt; y &gt; z: x &gt; y^5).</summary>
    Lex,

    /// <summary>Graded lexicographic: compare total degree first, break ties lexicographically.</summary>
    GradedLex,

    /// <summary>Graded reverse lexicographic: compare total degree first; on a tie, the vector whose
    /// last differing exponent (scanning from the last variable) is smaller is the larger monomial
    /// (x·z &lt; y² in x &gt; y &gt; z).</summary>
    GradedReverseLex,
}
