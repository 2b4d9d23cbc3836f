using System.Collections.Immutable;

namespace Integrable.Clusters;

/// <summary>The outcome of exploring the exchange graph from a seed with variables in a ring T: the
/// counts, and the distinct cluster variables found, in the order they were found.</summary>
/// <typeparam name="T">The ring element type.</typeparam>
/// <param name="Report">Counts and completeness.</param>
/// <param name="ClusterVariables">The distinct cluster variables (the initial cluster first).</param>
public sealed record ExchangeGraphExploration<T>(ExchangeGraphReport Report, ImmutableArray<T> ClusterVariables);
