using System.Diagnostics;
using System.Globalization;

namespace Integrable.Benchmarks;

/// <summary>A named workload runnable once from the command line (`-- NAME ARGS`), printing one line
/// of result figures in the same key=value form as the reference scripts in ../shared/anchors.</summary>
public interface IWorkload
{
    /// <summary>Name used on the command line, e.g. "W1".</summary>
    string Name { get; }

    /// <summary>Runs the workload and returns the result line, e.g. "terms=46376 seconds=0.012".</summary>
    string Run(string[] args);
}

/// <summary>Timing helpers shared by the workloads.</summary>
public static class Timing
{
    /// <summary>Runs <paramref name="action"/> <paramref name="reps"/> times after one warm-up and returns the median wall time in seconds.</summary>
    public static double Median(int reps, Action action, bool warmup = true)
    {
        if (warmup) action();
        var times = new double[reps];
        for (int i = 0; i < reps; i++)
        {
            var sw = Stopwatch.StartNew();
            action();
            times[i] = sw.Elapsed.TotalSeconds;
        }
        Array.Sort(times);
        return times[reps / 2];
    }

    /// <summary>Formats seconds the way the anchor scripts do.</summary>
    public static string Seconds(double s) => s.ToString("0.000000", CultureInfo.InvariantCulture);
}
