using BenchmarkDotNet.Attributes;
using Integrable.Clusters;

namespace Integrable.Benchmarks;

/// <summary>Exchange-graph exploration of finite types by fingerprints (E8: 25080 seeds, 128 cluster
/// variables).</summary>
[MemoryDiagnoser]
public class ClusterExplorationBenchmarks
{
    private ExchangeMatrix _matrix = null!;

    /// <summary>The finite type explored.</summary>
    [Params("E6", "E8")]
    public string Type { get; set; } = "E8";

    /// <summary>Builds the exchange matrix.</summary>
    [GlobalSetup]
    public void Setup() => _matrix = ExchangeMatrix.FiniteType(Type);

    /// <summary>Explores the whole exchange graph; returns the number of seeds.</summary>
    [Benchmark]
    public int Explore() => ExchangeGraph.Explore(_matrix).SeedCount;
}
