namespace Integrable.Solutions;

/// <summary>Which kind of problem a series solution solves.</summary>
public enum SeriesProblemKind
{
    /// <summary>Initial values x_s, …, x_{s+k−1} given; later terms follow by iterating the recursion.</summary>
    InitialValue,
    /// <summary>Values at the low end given and x_n tending to the fixed point of the autonomous equation as n → ∞.</summary>
    BoundaryValue,
}
