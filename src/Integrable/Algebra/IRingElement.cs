using System.Numerics;

namespace Integrable.Algebra;

/// <summary>An element of a commutative ring with the usual operators; the ring itself (variables,
/// modulus, precision) may be carried by the element.</summary>
/// <typeparam name="TSelf">The element type.</typeparam>
public interface IRingElement<TSelf> :
    IAdditionOperators<TSelf, TSelf, TSelf>,
    ISubtractionOperators<TSelf, TSelf, TSelf>,
    IMultiplyOperators<TSelf, TSelf, TSelf>,
    IUnaryNegationOperators<TSelf, TSelf>,
    IEqualityOperators<TSelf, TSelf, bool>,
    IEquatable<TSelf>
    where TSelf : IRingElement<TSelf>
{
    /// <summary>True for the additive identity.</summary>
    bool IsZero { get; }

    /// <summary>True for the multiplicative identity.</summary>
    bool IsOne { get; }
}
