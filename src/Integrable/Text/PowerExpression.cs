using Integrable.Numbers;

namespace Integrable.Text;

/// <summary>An integer power <c>base^exponent</c>, where the exponent is a constant expression with an integer
/// value: <c>x^2</c>, <c>x^-1</c>, <c>y^(-2)</c>, <c>z^(1+1)</c>.</summary>
/// <remarks>The exponent expression is kept as written; its value is <see cref="ExponentValue"/>, at most
/// <see cref="MaxExponent"/> in absolute value. <c>^</c> is right-associative: <c>2^3^2</c> is 2^(3^2).</remarks>
/// <example><code>
/// var p = new PowerExpression(new SymbolExpression("x"), -2);   // prints as x^-2
/// </code></example>
public sealed record PowerExpression : Expression
{
    /// <summary>The largest allowed absolute value of an exponent.</summary>
    public const int MaxExponent = 1_000_000;

    /// <summary>Creates <paramref name="base"/>^<paramref name="exponent"/>.</summary>
    /// <param name="base">The base.</param>
    /// <param name="exponent">A constant expression whose value is an integer of absolute value at most <see cref="MaxExponent"/>.</param>
    /// <param name="span">Where it was read from.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">The exponent contains a symbol, is not an integer or is too large, or the tree is deeper than <see cref="Expression.MaxDepth"/>.</exception>
    public PowerExpression(Expression @base, Expression exponent, SourceSpan span = default)
        : this(span, @base ?? throw new ArgumentNullException(nameof(@base)), exponent, ValueOf(exponent)) { }

    /// <summary>Creates <paramref name="base"/>^<paramref name="exponent"/> with an integer exponent
    /// (written <c>x^3</c> or <c>x^-3</c>).</summary>
    /// <param name="base">The base.</param>
    /// <param name="exponent">The exponent, at most <see cref="MaxExponent"/> in absolute value.</param>
    /// <exception cref="ArgumentNullException"><paramref name="base"/> is null.</exception>
    /// <exception cref="ArgumentException">The exponent is too large, or the tree is deeper than <see cref="Expression.MaxDepth"/>.</exception>
    public PowerExpression(Expression @base, int exponent) : this(@base, IntegerLiteral(exponent)) { }

    private PowerExpression(SourceSpan span, Expression @base, Expression exponent, int value)
        : base(span, 1 + Math.Max(@base.Depth, exponent.Depth))
    {
        Base = @base;
        Exponent = exponent;
        ExponentValue = value;
    }

    /// <summary>Creates a power whose exponent value the parser has already read.</summary>
    internal static PowerExpression FromChecked(Expression @base, Expression exponent, int value, SourceSpan span) => new(span, @base, exponent, value);

    /// <summary>The base.</summary>
    public Expression Base { get; }

    /// <summary>The exponent as written.</summary>
    public Expression Exponent { get; }

    /// <summary>The integer value of <see cref="Exponent"/>.</summary>
    public int ExponentValue { get; }

    /// <inheritdoc/>
    internal override int BindingLevel => 4;

    /// <summary>Structural equality (spans ignored).</summary>
    /// <param name="other">The other power.</param>
    /// <returns>True when bases and exponent expressions are equal.</returns>
    public bool Equals(PowerExpression? other) =>
        other is not null && base.Equals(other) && Base.Equals(other.Base) && Exponent.Equals(other.Exponent);

    /// <summary>A hash of base and exponent.</summary>
    /// <returns>The hash code.</returns>
    public override int GetHashCode() => HashCode.Combine(base.GetHashCode(), Base, Exponent);

    private static int ValueOf(Expression exponent)
    {
        ArgumentNullException.ThrowIfNull(exponent);
        if (!ExponentEvaluator.TryEvaluate(exponent, out int value, out var failure))
            throw new ArgumentException($"Invalid exponent '{exponent}': {failure.Reason}.", nameof(exponent));
        return value;
    }

    private static Expression IntegerLiteral(int exponent)
    {
        if (exponent is > MaxExponent or < -MaxExponent)
            throw new ArgumentException($"The exponent {exponent} is beyond the limit of ±{MaxExponent}.", nameof(exponent));
        var magnitude = new NumberExpression(Math.Abs(exponent));
        return exponent < 0 ? new NegationExpression(magnitude) : magnitude;
    }
}
