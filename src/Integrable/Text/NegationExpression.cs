namespace Integrable.Text;

/// <summary>Unary minus: <c>-x</c>, <c>-3</c>, <c>-(a + b)</c>.</summary>
/// <example><code>
/// var e = new NegationExpression(new SymbolExpression("x"));   // prints as -x
/// </code></example>
public sealed record NegationExpression : Expression
{
    /// <summary>Creates −<paramref name="operand"/>.</summary>
    /// <param name="operand">The negated expression.</param>
    /// <param name="span">Where it was read from.</param>
    /// <exception cref="ArgumentNullException"><paramref name="operand"/> is null.</exception>
    /// <exception cref="ArgumentException">The tree would be deeper than <see cref="Expression.MaxDepth"/>.</exception>
    public NegationExpression(Expression operand, SourceSpan span = default)
        : base(span, 1 + (operand ?? throw new ArgumentNullException(nameof(operand))).Depth)
        => Operand = operand;

    /// <summary>The negated expression.</summary>
    public Expression Operand { get; }

    /// <inheritdoc/>
    internal override int BindingLevel => 3;

    /// <summary>Structural equality (spans ignored).</summary>
    /// <param name="other">The other negation.</param>
    /// <returns>True when the operands are equal.</returns>
    public bool Equals(NegationExpression? other) => other is not null && base.Equals(other) && Operand.Equals(other.Operand);

    /// <summary>A hash of the operand.</summary>
    /// <returns>The hash code.</returns>
    public override int GetHashCode() => HashCode.Combine(base.GetHashCode(), Operand);
}
