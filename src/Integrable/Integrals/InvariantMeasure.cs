using Integrable.RationalFunctions;

namespace Integrable.Integrals;

/// <summary>A preserved measure dx₁⋯dx_k / P(x) of a map: P(φ(x)) = ±J(x)·P(x), J the Jacobian determinant
/// (sign −: the map reverses the orientation of the measure).</summary>
/// <param name="Density">The density 1/P.</param>
/// <param name="OrientationReversing">True when P(φ(x)) = −J(x)·P(x).</param>
public sealed record InvariantMeasure(RationalFunction Density, bool OrientationReversing)
{
    /// <summary><c>density 1/P</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Density + (OrientationReversing ? "  (orientation reversing)" : "");
}
