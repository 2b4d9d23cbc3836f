using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Analyses;

/// <summary>Upper bounds for the total degrees of the numerator and denominator of the unreduced
/// fraction N/D that a straight-line program builds (a/b + c/d = (ad + cb)/(bd), …), as doubles.</summary>
internal readonly record struct DegreeBound(double Numerator, double Denominator)
{
    public double Identity => Math.Max(Numerator, Denominator + 1);
}

/// <summary>The "ring" of <see cref="DegreeBound"/> values: evaluating a program here bounds the
/// degrees of what the same program computes in any field.</summary>
internal sealed class DegreeBoundRing : IRing<DegreeBound>
{
    public static DegreeBoundRing Instance { get; } = new();
    public static DegreeBound Variable => new(1, 0);
    public DegreeBound Zero => new(0, 0);
    public DegreeBound One => new(0, 0);
    public DegreeBound FromInteger(long value) => new(0, 0);
    public DegreeBound FromRational(Rational value) => new(0, 0);
    public DegreeBound Add(DegreeBound a, DegreeBound b) =>
        a.Denominator == 0 && b.Denominator == 0
            ? new(Math.Max(a.Numerator, b.Numerator), 0)
            : new(Math.Max(a.Numerator + b.Denominator, b.Numerator + a.Denominator), a.Denominator + b.Denominator);
    public DegreeBound Subtract(DegreeBound a, DegreeBound b) => Add(a, b);
    public DegreeBound Multiply(DegreeBound a, DegreeBound b) => new(a.Numerator + b.Numerator, a.Denominator + b.Denominator);
    public DegreeBound Negate(DegreeBound a) => a;
    public bool IsZero(DegreeBound a) => false;
    public bool AreEqual(DegreeBound a, DegreeBound b) => a == b;
    public bool TryDivide(DegreeBound a, DegreeBound b, out DegreeBound quotient)
    {
        quotient = new(a.Numerator + b.Denominator, a.Denominator + b.Numerator);
        return true;
    }
}
