namespace Integrable.Clusters;

/// <summary>The outcome of a breadth-first exploration of an exchange graph: seeds are counted up to
/// relabelling of the mutable directions (identified by their clusters), cluster variables are counted
/// once each, frozen variables are not counted.</summary>
/// <param name="SeedCount">Number of distinct seeds (vertices of the exchange graph) recorded.</param>
/// <param name="ClusterVariableCount">Number of distinct cluster variables in the recorded seeds.</param>
/// <param name="Complete">True when every neighbour of every recorded seed was examined, so the counts
/// are those of the whole exchange graph; false when <see cref="ExplorationOptions.MaxSeeds"/> stopped
/// the search.</param>
/// <param name="Depth">The largest mutation distance from the initial seed among recorded seeds.</param>
/// <param name="Identification">How cluster variables were identified, e.g. the primes of the fingerprints.</param>
public sealed record ExchangeGraphReport(int SeedCount, int ClusterVariableCount, bool Complete, int Depth, string Identification);
