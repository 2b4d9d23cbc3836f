namespace Integrable.Recursions;

/// <summary>One mutation of the cluster realisation of a T-system (<see cref="TSystemCluster"/>): the mutation
/// in direction <paramref name="Direction"/> replaces T_{a,j,k−2} by T_{a,j,k}, with a = <paramref name="Node"/>,
/// j = <paramref name="Site"/>, k = <paramref name="Time"/>.</summary>
/// <param name="Direction">The 1-based mutation direction (the seed position of the vertex (a, j)).</param>
/// <param name="Node">The node a, 1 ≤ a ≤ r.</param>
/// <param name="Site">The spectral index j, 0 ≤ j &lt; P (taken modulo the period P).</param>
/// <param name="Time">The time index k ≥ 2 of the new cluster variable.</param>
public readonly record struct TSystemStep(int Direction, int Node, int Site, int Time);
