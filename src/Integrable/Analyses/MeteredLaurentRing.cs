using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Analyses;

/// <summary>The Laurent polynomial ring with a budget: every product, sum and quotient is checked
/// against the term limit, and the clock against the time limit and cancellation.</summary>
internal sealed class MeteredLaurentRing(LaurentPolynomialRing inner, BudgetClock clock) : IRing<LaurentPolynomial>
{
    public LaurentPolynomialRing Inner { get; } = inner;

    public LaurentPolynomial Zero => Inner.Zero;
    public LaurentPolynomial One => Inner.One;
    public LaurentPolynomial FromInteger(long value) => Inner.FromInteger(value);
    public LaurentPolynomial FromRational(Rational value) => Inner.FromRational(value);
    public LaurentPolynomial Add(LaurentPolynomial a, LaurentPolynomial b) => Checked(Inner.Add(a, b));
    public LaurentPolynomial Subtract(LaurentPolynomial a, LaurentPolynomial b) => Checked(Inner.Subtract(a, b));
    public LaurentPolynomial Negate(LaurentPolynomial a) => Inner.Negate(a);
    public bool IsZero(LaurentPolynomial a) => Inner.IsZero(a);
    public bool AreEqual(LaurentPolynomial a, LaurentPolynomial b) => Inner.AreEqual(a, b);

    public LaurentPolynomial Multiply(LaurentPolynomial a, LaurentPolynomial b)
    {
        clock.Check();
        // The product has at most |a|·|b| terms; refuse before computing when even that bound is far
        // beyond the limit would be wrong (cancellation), so check the result instead.
        return Checked(Inner.Multiply(a, b));
    }

    public bool TryDivide(LaurentPolynomial a, LaurentPolynomial b, out LaurentPolynomial quotient)
    {
        clock.Check();
        bool ok = Inner.TryDivide(a, b, out quotient);
        if (ok) clock.CheckTerms(quotient.TermCount);
        return ok;
    }

    private LaurentPolynomial Checked(LaurentPolynomial p)
    {
        clock.CheckTerms(p.TermCount);
        return p;
    }

    public override string ToString() => Inner.ToString();
}
