namespace Integrable.Text;

/// <summary>One term of a <see cref="SumExpression"/>: the expression and whether it is subtracted.</summary>
/// <param name="Value">The term.</param>
/// <param name="IsSubtracted">True for a term written after a binary minus.</param>
public readonly record struct SumTerm(Expression Value, bool IsSubtracted = false);
