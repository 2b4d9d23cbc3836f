using System.Globalization;
using Integrable.Numbers;
using Integrable.Recursions;
using Integrable.Solutions;

namespace Integrable.Benchmarks;

/// <summary>Workload "W7": the boundary-value recursion R_n = 1 + g R_n (R_{n−1} + R_n + R_{n+1}), R_0 = 0,
/// R_n → R (the fixed point R = 1 + 3gR²), solved as power series in g to order N by the window Newton solver.
/// Prints the order, the window, the number of digits of the last coefficient of R_1, the median wall time and
/// the median process CPU time of 3 runs (after a warm-up).</summary>
/// <remarks>Run: <c>dotnet run -c Release --project benchmarks/Integrable.Benchmarks -- W7 200</c>.</remarks>
public sealed class W7Workload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "W7";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        int n = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 200;
        int reps = args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 3;
        var rec = Recurrence.Parse("R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})");
        SeriesSolution? sol = null;
        var cpu = new List<double>();
        var process = System.Diagnostics.Process.GetCurrentProcess();
        double seconds = Timing.Median(reps, () =>
        {
            process.Refresh();
            var before = process.TotalProcessorTime;
            sol = SeriesSolver.SolveBoundaryValue(rec, "g", 0, [Rational.Zero], new SeriesOptions { Order = n });
            process.Refresh();
            cpu.Add((process.TotalProcessorTime - before).TotalSeconds);
        }, warmup: n <= 400);
        cpu.Sort();
        var last = sol![1][n];
        int digits = System.Numerics.BigInteger.Abs(last.Numerator).ToString(CultureInfo.InvariantCulture).Length;
        return $"order={n} window={sol.Window} digits={digits} seconds={Timing.Seconds(seconds)} cpu={Timing.Seconds(cpu[cpu.Count / 2])}";
    }
}
