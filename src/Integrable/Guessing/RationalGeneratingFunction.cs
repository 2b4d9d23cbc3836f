using Integrable.Series;

namespace Integrable.Guessing;

/// <summary>A rational generating function P(x)/Q(x) with Q(0) = 1, as two exact polynomials.</summary>
/// <typeparam name="T">The coefficient type.</typeparam>
/// <example><code>
/// var f = PadeApproximation.RationalFunction(fibonacciSeries).Value;   // x/(1 − x − x²)
/// var s = f.Expand(20);
/// </code></example>
public sealed class RationalGeneratingFunction<T>
{
    internal RationalGeneratingFunction(PowerSeries<T> numerator, PowerSeries<T> denominator)
    {
        Numerator = numerator;
        Denominator = denominator;
    }

    /// <summary>The numerator P (exact polynomial).</summary>
    public PowerSeries<T> Numerator { get; }

    /// <summary>The denominator Q (exact polynomial, Q(0) = 1).</summary>
    public PowerSeries<T> Denominator { get; }

    /// <summary>The power series P/Q + O(x^precision).</summary>
    /// <param name="precision">The precision, non-negative.</param>
    /// <returns>The expansion.</returns>
    public PowerSeries<T> Expand(int precision) => PowerSeries<T>.Divide(Numerator, Denominator, precision);

    /// <summary>Text such as <c>(x)/(1 - x - x^2)</c>.</summary>
    /// <returns>The function as text.</returns>
    public override string ToString() => $"({Numerator})/({Denominator})";
}
