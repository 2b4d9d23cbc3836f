using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Univariate;

namespace Integrable.Analyses;

/// <summary>N(t)/D(t) over Z/pZ, not necessarily reduced: inside one step of a rule the fractions are
/// combined without any gcd, and the step's result is reduced once (as the reference computations do:
/// num, den, g = gcd(num, den)).</summary>
internal sealed record LineFraction(PolynomialModP Numerator, PolynomialModP Denominator);

/// <summary>The line domain of the degree-growth analysis over (Z/pZ)(t), with fast products and
/// half-gcd from <see cref="PolynomialModP"/>: ring operations build unreduced fractions, and
/// <see cref="Reduce"/> cancels the gcd once per new term.</summary>
internal sealed class UnreducedLineField(PrimeField field) : ILineField<LineFraction>
{
    private readonly PolynomialModP _one = PolynomialModP.One(field);

    public PrimeField Field { get; } = field;
    public LineFraction Zero => new(PolynomialModP.Zero(Field), _one);
    public LineFraction One => new(_one, _one);
    public LineFraction FromInteger(long value) => Residue(Field.FromInteger(value));
    public LineFraction FromRational(Rational value) => Residue(Field.FromRational(value));
    public LineFraction Residue(ulong c) => new(PolynomialModP.FromCoefficients(Field, [c]), _one);
    public LineFraction Line(ulong a, ulong b) => new(PolynomialModP.FromCoefficients(Field, [a, b]), _one);

    public (int Numerator, int Denominator) Degrees(LineFraction value) => (value.Numerator.Degree, value.Denominator.Degree);

    public LineFraction Reduce(LineFraction value)
    {
        var (n, d) = (value.Numerator, value.Denominator);
        if (n.IsZero) return Zero;
        if (!d.IsConstant)
        {
            var g = PolynomialModP.Gcd(n, d);
            if (!g.IsConstant) { n = n.DivideExact(g); d = d.DivideExact(g); }
        }
        ulong lc = d.LeadingCoefficient;
        if (lc != 1)
        {
            ulong inv = Field.Inverse(lc);
            n = n.Scale(inv);
            d = d.Scale(inv);
        }
        return new LineFraction(n, d);
    }

    public LineFraction Add(LineFraction a, LineFraction b)
    {
        if (ReferenceEquals(a.Denominator, b.Denominator) || (a.Denominator.IsOne && b.Denominator.IsOne))
            return new(a.Numerator + b.Numerator, a.Denominator);
        if (b.Denominator.IsOne) return new(a.Numerator + b.Numerator * a.Denominator, a.Denominator);
        if (a.Denominator.IsOne) return new(a.Numerator * b.Denominator + b.Numerator, b.Denominator);
        return new(a.Numerator * b.Denominator + b.Numerator * a.Denominator, a.Denominator * b.Denominator);
    }

    public LineFraction Subtract(LineFraction a, LineFraction b) => Add(a, Negate(b));
    public LineFraction Negate(LineFraction a) => new(-a.Numerator, a.Denominator);
    public bool IsZero(LineFraction a) => a.Numerator.IsZero;
    public bool AreEqual(LineFraction a, LineFraction b) => a.Numerator * b.Denominator == b.Numerator * a.Denominator;

    public LineFraction Multiply(LineFraction a, LineFraction b)
    {
        if (ReferenceEquals(a, b)) return new(a.Numerator.Square(), a.Denominator.IsOne ? a.Denominator : a.Denominator.Square());
        var n = a.Numerator * b.Numerator;
        var d = a.Denominator.IsOne ? b.Denominator : b.Denominator.IsOne ? a.Denominator : a.Denominator * b.Denominator;
        return new(n, d);
    }

    public bool TryDivide(LineFraction a, LineFraction b, out LineFraction quotient)
    {
        quotient = Zero;
        if (b.Numerator.IsZero) return false;
        if (a.Numerator.IsOne && a.Denominator.IsOne) { quotient = new(b.Denominator, b.Numerator); return true; }
        var n = b.Denominator.IsOne ? a.Numerator : a.Numerator * b.Denominator;
        var d = a.Denominator.IsOne ? b.Numerator : a.Denominator * b.Numerator;
        quotient = new(n, d);
        return true;
    }

    public override string ToString() => $"Z/{Field.Modulus}Z(t)";
}
