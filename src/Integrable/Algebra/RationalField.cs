using Integrable.Numbers;

namespace Integrable.Algebra;

/// <summary>The field Q of rational numbers as a ring context object.</summary>
public sealed class RationalField : IRing<Rational>
{
    /// <summary>The one instance.</summary>
    public static RationalField Instance { get; } = new();

    private RationalField() { }

    /// <inheritdoc/>
    public Rational Zero => Rational.Zero;
    /// <inheritdoc/>
    public Rational One => Rational.One;
    /// <inheritdoc/>
    public Rational FromInteger(long value) => value;
    /// <inheritdoc/>
    public Rational FromRational(Rational value) => value;
    /// <inheritdoc/>
    public Rational Add(Rational a, Rational b) => a + b;
    /// <inheritdoc/>
    public Rational Subtract(Rational a, Rational b) => a - b;
    /// <inheritdoc/>
    public Rational Multiply(Rational a, Rational b) => a * b;
    /// <inheritdoc/>
    public Rational Negate(Rational a) => -a;
    /// <inheritdoc/>
    public bool IsZero(Rational a) => a.IsZero;
    /// <inheritdoc/>
    public bool AreEqual(Rational a, Rational b) => a == b;
    /// <inheritdoc/>
    public bool TryDivide(Rational a, Rational b, out Rational quotient)
    {
        if (b.IsZero) { quotient = default; return false; }
        quotient = a / b;
        return true;
    }

    /// <inheritdoc/>
    public override string ToString() => "Q";
}
