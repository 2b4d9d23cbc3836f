using Integrable.Numbers;

namespace Integrable.Text;

/// <summary>A numeric literal: a non-negative integer of any size or a finite decimal such as <c>2.5</c>.</summary>
/// <remarks>Negative numbers and fractions are not literals: <c>-3</c> is a <see cref="NegationExpression"/> and
/// <c>1/3</c> a <see cref="ProductExpression"/> with a divisor, exactly as they are written.</remarks>
/// <example><code>
/// var half = new NumberExpression(new Rational(1, 2));   // prints as 0.5
/// </code></example>
public sealed record NumberExpression : Expression
{
    /// <summary>Creates a literal.</summary>
    /// <param name="value">A non-negative rational whose denominator has no prime factor other than 2 and 5.</param>
    /// <param name="span">Where it was read from.</param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is negative or has no finite decimal form.</exception>
    public NumberExpression(Rational value, SourceSpan span = default) : base(span, 1)
    {
        if (value.Sign < 0)
            throw new ArgumentOutOfRangeException(nameof(value), "A number literal is never negative; negate it with NegationExpression.");
        if (!HasFiniteDecimal(value))
            throw new ArgumentOutOfRangeException(nameof(value), $"{value} has no finite decimal form; write it as a quotient.");
        Value = value;
    }

    /// <summary>The exact value.</summary>
    public Rational Value { get; }

    /// <inheritdoc/>
    internal override int BindingLevel => 5;

    /// <summary>Structural equality (spans ignored).</summary>
    /// <param name="other">The other literal.</param>
    /// <returns>True when the values are equal.</returns>
    public bool Equals(NumberExpression? other) => other is not null && base.Equals(other) && Value == other.Value;

    /// <summary>A hash of the value.</summary>
    /// <returns>The hash code.</returns>
    public override int GetHashCode() => HashCode.Combine(base.GetHashCode(), Value);

    private static bool HasFiniteDecimal(Rational value)
    {
        if (value.IsInteger) return true;
        var d = value.Denominator;
        while (d.IsEven) d >>= 1;
        while ((d % 5).IsZero) d /= 5;
        return d.IsOne;
    }
}
