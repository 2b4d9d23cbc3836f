using Integrable.Numbers;

namespace Integrable.Algebra;

/// <summary>A commutative ring given as a context object: the domain in which a computation runs
/// (Q, Z/pZ, Laurent polynomials in named variables, power series to a precision, …).</summary>
/// <typeparam name="T">The element type.</typeparam>
/// <remarks>Analyses are written once against this interface and run in any domain. Implementations
/// are immutable and safe to share between threads.</remarks>
public interface IRing<T>
{
    /// <summary>The additive identity.</summary>
    T Zero { get; }

    /// <summary>The multiplicative identity.</summary>
    T One { get; }

    /// <summary>The image of an integer.</summary>
    /// <param name="value">The integer.</param>
    /// <returns>value·1.</returns>
    T FromInteger(long value);

    /// <summary>The image of a rational number.</summary>
    /// <param name="value">The rational.</param>
    /// <returns>The element; for Z/pZ the denominator must be invertible.</returns>
    /// <exception cref="DivideByZeroException">The denominator has no inverse in this ring.</exception>
    T FromRational(Rational value);

    /// <summary>Sum.</summary>
    /// <param name="a">First summand.</param>
    /// <param name="b">Second summand.</param>
    /// <returns><paramref name="a"/> + <paramref name="b"/>.</returns>
    T Add(T a, T b);

    /// <summary>Difference.</summary>
    /// <param name="a">Minuend.</param>
    /// <param name="b">Subtrahend.</param>
    /// <returns><paramref name="a"/> − <paramref name="b"/>.</returns>
    T Subtract(T a, T b);

    /// <summary>Product.</summary>
    /// <param name="a">First factor.</param>
    /// <param name="b">Second factor.</param>
    /// <returns><paramref name="a"/>·<paramref name="b"/>.</returns>
    T Multiply(T a, T b);

    /// <summary>Additive inverse.</summary>
    /// <param name="a">The element.</param>
    /// <returns>−<paramref name="a"/>.</returns>
    T Negate(T a);

    /// <summary>Tests for zero.</summary>
    /// <param name="a">The element.</param>
    /// <returns>True when <paramref name="a"/> is zero.</returns>
    bool IsZero(T a);

    /// <summary>Exact equality of two elements.</summary>
    /// <param name="a">First element.</param>
    /// <param name="b">Second element.</param>
    /// <returns>True when equal.</returns>
    bool AreEqual(T a, T b);

    /// <summary>Exact division where it is defined in this ring (fields: any non-zero divisor;
    /// Laurent polynomials: exact divisors only).</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor.</param>
    /// <param name="quotient">The quotient q with q·b = a when the call succeeds.</param>
    /// <returns>False when <paramref name="b"/> does not divide <paramref name="a"/> in this ring.</returns>
    bool TryDivide(T a, T b, out T quotient);
}
