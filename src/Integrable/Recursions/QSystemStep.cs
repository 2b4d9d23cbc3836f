namespace Integrable.Recursions;

/// <summary>One mutation of the cluster realisation of a Q-system (<see cref="QSystemCluster"/>): the
/// mutation in direction <paramref name="Direction"/> replaces Q_{a,n−2} by Q_{a,n}, a = <paramref name="Node"/>,
/// n = <paramref name="Index"/>.</summary>
/// <param name="Direction">The 1-based mutation direction (the seed position that holds Q_{a,n−2}).</param>
/// <param name="Node">The node a, 1 ≤ a ≤ r.</param>
/// <param name="Index">The index n ≥ 2 of the new cluster variable Q_{a,n}.</param>
public readonly record struct QSystemStep(int Direction, int Node, int Index);
