using System.Diagnostics;
using System.Globalization;
using Integrable.Integrals;
using Integrable.Recursions;

namespace Integrable.Benchmarks;

/// <summary>W6: all polynomial first integrals of degree ≤ d of a second-order map with one parameter — our own
/// symmetric map x_{n+1} + x_{n-1} = (k x_n + 1)/(x_n² + 1), whose integrals up to degree d are the powers of
/// x²y² + x² + y² − k xy − x − y (proved by the search itself).
/// usage: W6 D [REPS]  prints integrals=… independent=… complete=… seconds=median cpu=median CPU seconds.</summary>
public sealed class W6Workload : IWorkload
{
    /// <summary>The map of the workload.</summary>
    public const string Equation = "x_{n+1} + x_{n-1} = (k x_n + 1)/(x_n^2 + 1)";

    /// <inheritdoc/>
    public string Name => "W6";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        if (args.Length < 1 || !int.TryParse(args[0], CultureInfo.InvariantCulture, out int degree) || degree < 1)
            return "usage: W6 DEGREE [REPS]";
        int reps = args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 5;
        var recurrence = Recurrence.Parse(Equation);
        var options = IntegralOptions.Default with { Degree = degree };
        IntegralsReport? report = null;
        var cpuTimes = new List<double>();
        var process = Process.GetCurrentProcess();
        double wall = Timing.Median(reps, () =>
        {
            process.Refresh();
            var before = process.TotalProcessorTime;
            report = FirstIntegrals.Find(recurrence, options);
            process.Refresh();
            cpuTimes.Add((process.TotalProcessorTime - before).TotalSeconds);
        });
        // The first entry is the warm-up run.
        var cpu = cpuTimes.Skip(1).Order().ToArray();
        return string.Create(CultureInfo.InvariantCulture,
            $"degree={degree} integrals={report!.PolynomialIntegrals.Length} independent={report.Independent} complete={report.IsComplete.ToString().ToLowerInvariant()} seconds={Timing.Seconds(wall)} cpu={Timing.Seconds(cpu[reps / 2])}");
    }
}
