namespace Integrable.Clusters;

/// <summary>A bundle of arrows of a <see cref="Quiver"/>: <see cref="Multiplicity"/> parallel arrows
/// from vertex <see cref="From"/> to vertex <see cref="To"/> (1-based vertex numbers).</summary>
/// <param name="From">The 1-based tail vertex.</param>
/// <param name="To">The 1-based head vertex.</param>
/// <param name="Multiplicity">The number of parallel arrows, at least 1.</param>
public readonly record struct Arrow(int From, int To, int Multiplicity = 1)
{
    /// <summary>Text such as <c>1->2</c> or <c>2->3 x2</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Multiplicity == 1 ? $"{From}->{To}" : $"{From}->{To} x{Multiplicity}";
}
