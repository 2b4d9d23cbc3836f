using System.Globalization;
using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Benchmarks;

/// <summary>Workload "Series": solves the Catalan equation C = 1 + x·C² over Q to order N by Newton
/// iteration (derivative supplied: ∂F/∂C = 2xC) and prints the order, the number of decimal digits of
/// the last coefficient C_{N−1}, the median wall time and the median process CPU time (the CPU figure
/// is steadier on a shared machine; it includes the garbage collector's threads).</summary>
/// <remarks>Run: <c>dotnet run -c Release --project benchmarks/Integrable.Benchmarks -- Series 2000</c>.
/// A second argument "dual" uses the dual-number derivative instead of the supplied one.</remarks>
public sealed class SeriesWorkload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "Series";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        int n = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 2000;
        bool dual = args.Length > 1 && args[1] == "dual";
        var ring = PowerSeriesRing.Rationals;
        var x = ring.X;
        PowerSeries<Rational>? c = null;
        var cpu = new List<double>();
        var process = System.Diagnostics.Process.GetCurrentProcess();
        double seconds = Timing.Median(5, () =>
        {
            process.Refresh();
            var before = process.TotalProcessorTime;
            c = dual
                ? SeriesEquations.SolveNewton(ring, y => 1 + x * (y * y), n)
                : SeriesEquations.SolveNewton(ring, y => 1 + x * (y * y), n, derivative: y => 2 * x * y);
            process.Refresh();
            cpu.Add((process.TotalProcessorTime - before).TotalSeconds);
        });
        cpu.Sort();
        var last = c![n - 1].Numerator;
        int digits = System.Numerics.BigInteger.Abs(last).ToString(CultureInfo.InvariantCulture).Length;
        return $"order={n} coefficient={digits} seconds={Timing.Seconds(seconds)} cpu={Timing.Seconds(cpu[cpu.Count / 2])}";
    }
}
