using Integrable.Numbers;
using Integrable.Univariate;

namespace Integrable.Analyses;

/// <summary>The field (Z/pZ)(t) of <see cref="RationalFunctionModP"/> values as the line domain of the
/// degree-growth analysis: fast products and half-gcd from the univariate kernels, with the shortcuts a
/// compiled rule needs (a square is a power, so no gcd; 1/b is an inverse, so no gcd).</summary>
internal sealed class ModularLineField(PrimeField field) : ILineField<RationalFunctionModP>
{
    public PrimeField Field { get; } = field;
    public RationalFunctionModP Zero { get; } = RationalFunctionModP.Zero(field);
    public RationalFunctionModP One { get; } = RationalFunctionModP.One(field);

    public RationalFunctionModP FromInteger(long value) => RationalFunctionModP.Constant(Field, value);
    public RationalFunctionModP FromRational(Rational value) => Residue(Field.FromRational(value));

    public RationalFunctionModP Residue(ulong c) =>
        RationalFunctionModP.FromPolynomial(PolynomialModP.FromCoefficients(Field, [c]));

    public RationalFunctionModP Line(ulong a, ulong b) =>
        RationalFunctionModP.FromPolynomial(PolynomialModP.FromCoefficients(Field, [a, b]));

    public (int Numerator, int Denominator) Degrees(RationalFunctionModP value) => (value.NumeratorDegree, value.DenominatorDegree);

    public RationalFunctionModP Add(RationalFunctionModP a, RationalFunctionModP b) => a + b;
    public RationalFunctionModP Subtract(RationalFunctionModP a, RationalFunctionModP b) => a - b;
    public RationalFunctionModP Negate(RationalFunctionModP a) => -a;
    public bool IsZero(RationalFunctionModP a) => a.IsZero;
    public bool AreEqual(RationalFunctionModP a, RationalFunctionModP b) => a == b;

    public RationalFunctionModP Multiply(RationalFunctionModP a, RationalFunctionModP b) =>
        ReferenceEquals(a, b) ? a.Pow(2) : a * b;

    public bool TryDivide(RationalFunctionModP a, RationalFunctionModP b, out RationalFunctionModP quotient)
    {
        quotient = Zero;
        if (b.IsZero) return false;
        quotient = a.IsOne ? b.Inverse() : a / b;
        return true;
    }

    public override string ToString() => $"Z/{Field.Modulus}Z(t)";
}
