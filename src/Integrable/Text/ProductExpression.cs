namespace Integrable.Text;

/// <summary>A product of at least two factors, each multiplied or divided, evaluated left to right:
/// <c>a/b*c</c> has the factors (a, ÷b, c) and means (a/b)·c.</summary>
/// <remarks>The first factor is never a divisor (<c>1/x</c> is the factors (1, ÷x)). Juxtaposition
/// (<c>2 x</c>) and explicit <c>*</c> give the same node. A bracketed product inside a product stays a nested node.</remarks>
/// <example><code>
/// var e = new ProductExpression([new(new NumberExpression(1)), new(new NumberExpression(2), IsDivisor: true), new(new SymbolExpression("z"))]);
/// // prints as 1/2*z
/// </code></example>
public sealed record ProductExpression : Expression
{
    private readonly ProductFactor[] _factors;
    private readonly IReadOnlyList<ProductFactor> _view;

    /// <summary>Creates a product.</summary>
    /// <param name="factors">At least two factors; the first is not a divisor.</param>
    /// <param name="span">Where it was read from.</param>
    /// <exception cref="ArgumentException">Fewer than two factors, a dividing first factor, a null factor, or a tree deeper than <see cref="Expression.MaxDepth"/>.</exception>
    public ProductExpression(IEnumerable<ProductFactor> factors, SourceSpan span = default)
        : this(span, Validate([.. factors ?? throw new ArgumentNullException(nameof(factors))])) { }

    private ProductExpression(SourceSpan span, ProductFactor[] factors) : base(span, DepthAbove(factors, f => f.Value))
    {
        _factors = factors;
        _view = Array.AsReadOnly(factors);
    }

    /// <summary>Creates a product from an array the caller gives away (the parser), after validation.</summary>
    internal static ProductExpression FromOwned(ProductFactor[] factors, SourceSpan span) => new(span, Validate(factors));

    /// <summary>The factors in written order.</summary>
    public IReadOnlyList<ProductFactor> Factors => _view;

    /// <inheritdoc/>
    internal override int BindingLevel => 2;

    /// <summary>Structural equality (spans ignored).</summary>
    /// <param name="other">The other product.</param>
    /// <returns>True when the factors and their roles are equal, in order.</returns>
    public bool Equals(ProductExpression? other) => other is not null && base.Equals(other) && _factors.AsSpan().SequenceEqual(other._factors);

    /// <summary>A hash of the factors.</summary>
    /// <returns>The hash code.</returns>
    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(base.GetHashCode());
        foreach (var f in _factors) h.Add(f);
        return h.ToHashCode();
    }

    private static ProductFactor[] Validate(ProductFactor[] factors)
    {
        if (factors.Length < 2) throw new ArgumentException("A product needs at least two factors.", nameof(factors));
        if (factors[0].IsDivisor) throw new ArgumentException("The first factor of a product cannot be a divisor; write 1/x as (1, ÷x).", nameof(factors));
        foreach (var f in factors)
            if (f.Value is null) throw new ArgumentException("A product factor is null.", nameof(factors));
        return factors;
    }
}
