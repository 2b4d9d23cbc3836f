using Integrable.Numbers;

namespace Integrable.Algebra;

/// <summary>Floating-point numbers (IEEE double) as a domain, for fast numeric orbits and plots. Not
/// exact: use it for pictures and estimates, never as evidence.</summary>
public sealed class DoubleField : IRing<double>
{
    /// <summary>The one instance.</summary>
    public static DoubleField Instance { get; } = new();

    private DoubleField() { }

    /// <inheritdoc/>
    public double Zero => 0.0;
    /// <inheritdoc/>
    public double One => 1.0;
    /// <inheritdoc/>
    public double FromInteger(long value) => value;
    /// <inheritdoc/>
    public double FromRational(Rational value) => value.ToDouble();
    /// <inheritdoc/>
    public double Add(double a, double b) => a + b;
    /// <inheritdoc/>
    public double Subtract(double a, double b) => a - b;
    /// <inheritdoc/>
    public double Multiply(double a, double b) => a * b;
    /// <inheritdoc/>
    public double Negate(double a) => -a;
    /// <inheritdoc/>
    public bool IsZero(double a) => a == 0.0;
    /// <inheritdoc/>
    public bool AreEqual(double a, double b) => a == b;
    /// <inheritdoc/>
    public bool TryDivide(double a, double b, out double quotient)
    {
        quotient = b == 0.0 ? double.NaN : a / b;
        return b != 0.0;
    }

    /// <inheritdoc/>
    public override string ToString() => "double";
}
