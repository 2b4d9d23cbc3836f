namespace Integrable.Clusters;

/// <summary>Progress of an exchange-graph exploration, reported through <see cref="IProgress{T}"/>.</summary>
/// <param name="Seeds">Seeds (up to relabelling) recorded so far.</param>
/// <param name="ClusterVariables">Distinct cluster variables recorded so far.</param>
/// <param name="Pending">Recorded seeds whose neighbours are not yet examined.</param>
/// <param name="Depth">Largest mutation distance from the initial seed recorded so far.</param>
public readonly record struct ExplorationProgress(int Seeds, int ClusterVariables, int Pending, int Depth);
