using System.Globalization;
using Integrable.Clusters;

namespace Integrable.Benchmarks;

/// <summary>Workload "Explore": breadth-first exploration of the exchange graph of a named exchange
/// matrix (default E8). Usage: <c>-- Explore E8 [repetitions]</c>. Prints
/// <c>seeds=S variables=V seconds=MEDIAN</c>.</summary>
public sealed class ClusterExploreWorkload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "Explore";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        var matrix = ExchangeMatrix.Named(args.Length > 0 ? args[0] : "E8");
        int reps = args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 5;
        ExchangeGraphReport? report = null;
        double seconds = Timing.Median(reps, () => report = ExchangeGraph.Explore(matrix));
        if (!report!.Complete) throw new InvalidOperationException($"exploration of {args.FirstOrDefault() ?? "E8"} stopped at the seed limit");
        return $"seeds={report.SeedCount} variables={report.ClusterVariableCount} seconds={Timing.Seconds(seconds)}";
    }
}
