using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Analyses;

/// <summary>Univariate rational functions over Z/pZ in a parameter t, reduced to lowest terms, as the
/// domain in which degree growth is measured along a line x_i = a_i + b_i t.</summary>
internal interface ILineField<T> : IRing<T>
{
    PrimeField Field { get; }

    /// <summary>a + b·t.</summary>
    T Line(ulong a, ulong b);

    /// <summary>The constant c.</summary>
    T Residue(ulong c);

    /// <summary>The value in lowest terms (called once per new term; ring operations may leave fractions unreduced).</summary>
    T Reduce(T value);

    /// <summary>Degrees of the numerator and denominator of a reduced value (numerator −1 for zero).</summary>
    (int Numerator, int Denominator) Degrees(T value);
}
