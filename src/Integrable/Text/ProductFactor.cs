namespace Integrable.Text;

/// <summary>One factor of a <see cref="ProductExpression"/>: the expression and whether it divides.</summary>
/// <param name="Value">The factor.</param>
/// <param name="IsDivisor">True for a factor written after <c>/</c>.</param>
public readonly record struct ProductFactor(Expression Value, bool IsDivisor = false);
