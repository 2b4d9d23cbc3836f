using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Analyses;

/// <summary>A quotient N/D of Laurent polynomials, not reduced (no multivariate gcd is taken); D is 1
/// or a non-monomial (monomial denominators are units and are absorbed into N).</summary>
internal readonly record struct LaurentFraction(LaurentPolynomial Numerator, LaurentPolynomial Denominator)
{
    public bool IsLaurent => Denominator.IsOne;
}

/// <summary>The field of fractions of a Laurent polynomial ring, in the unreduced representation of
/// <see cref="LaurentFraction"/>. Used when a straight-line program's intermediate division is not
/// exact, to decide whether the final value is nevertheless a Laurent polynomial (it is exactly when D
/// divides N, whatever representative N/D is used) and to produce the witness otherwise.</summary>
internal sealed class LaurentFractionRing(LaurentPolynomialRing ring, BudgetClock clock) : IRing<LaurentFraction>
{
    public LaurentPolynomialRing Ring { get; } = ring;

    public LaurentFraction Zero => new(Ring.Zero, Ring.One);
    public LaurentFraction One => new(Ring.One, Ring.One);
    public LaurentFraction FromInteger(long value) => new(Ring.FromInteger(value), Ring.One);
    public LaurentFraction FromRational(Rational value) => new(Ring.FromRational(value), Ring.One);
    public LaurentFraction FromPolynomial(LaurentPolynomial p) => new(p, Ring.One);

    public LaurentFraction Add(LaurentFraction a, LaurentFraction b)
    {
        clock.Check();
        if (a.Denominator == b.Denominator) return Normalize(a.Numerator + b.Numerator, a.Denominator);
        if (b.Denominator.IsOne) return Normalize(a.Numerator + b.Numerator * a.Denominator, a.Denominator);
        if (a.Denominator.IsOne) return Normalize(a.Numerator * b.Denominator + b.Numerator, b.Denominator);
        return Normalize(a.Numerator * b.Denominator + b.Numerator * a.Denominator, a.Denominator * b.Denominator);
    }

    public LaurentFraction Subtract(LaurentFraction a, LaurentFraction b) => Add(a, Negate(b));
    public LaurentFraction Negate(LaurentFraction a) => new(-a.Numerator, a.Denominator);
    public bool IsZero(LaurentFraction a) => a.Numerator.IsZero;
    public bool AreEqual(LaurentFraction a, LaurentFraction b) => (a.Numerator * b.Denominator) == (b.Numerator * a.Denominator);

    public LaurentFraction Multiply(LaurentFraction a, LaurentFraction b)
    {
        clock.Check();
        return Normalize(a.Numerator * b.Numerator, a.Denominator * b.Denominator);
    }

    public bool TryDivide(LaurentFraction a, LaurentFraction b, out LaurentFraction quotient)
    {
        clock.Check();
        quotient = Zero;
        if (b.Numerator.IsZero) return false;
        quotient = Normalize(a.Numerator * b.Denominator, a.Denominator * b.Numerator);
        return true;
    }

    /// <summary>Absorbs a monomial denominator; divides out the denominator when it divides exactly.</summary>
    public LaurentFraction Normalize(LaurentPolynomial n, LaurentPolynomial d)
    {
        clock.CheckTerms(n.TermCount);
        clock.CheckTerms(d.TermCount);
        if (n.IsZero) return Zero;
        // A monomial divisor always divides (it is a unit); otherwise exactness is decided by the kernel.
        if (n.TryDivideExact(d, out var q)) return new LaurentFraction(q, Ring.One);
        return new LaurentFraction(n, d);
    }

    public override string ToString() => $"Frac({Ring})";
}
