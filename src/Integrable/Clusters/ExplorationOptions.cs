namespace Integrable.Clusters;

/// <summary>Limits and parameters of an exchange-graph exploration (<see cref="ExchangeGraph"/>).</summary>
public sealed record ExplorationOptions
{
    /// <summary>The default options: at most 200 000 seeds, random seed 2003.</summary>
    public static ExplorationOptions Default { get; } = new();

    /// <summary>The largest number of seeds to record; when one more would be needed the search stops
    /// and reports <see cref="ExchangeGraphReport.Complete"/> = false. Must be at least 1.</summary>
    public int MaxSeeds { get; init; } = 200_000;

    /// <summary>Seed of the pseudo-random generator that picks the evaluation points of the fingerprints
    /// (the same value gives the same points, so runs are reproducible).</summary>
    public int RandomSeed { get; init; } = 2003;
}
