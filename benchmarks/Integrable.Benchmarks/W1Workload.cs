using System.Globalization;
using Integrable.Polynomials;

namespace Integrable.Benchmarks;

/// <summary>Workload W1 (Fateman's test): f = (1+x+y+z+t)^k, p = f·(f+1); times the multiplication
/// only (median of 3 after one warm-up) and prints <c>terms=&lt;terms of p&gt; seconds=&lt;median&gt;</c>.</summary>
public sealed class W1Workload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "W1";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        int k = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 10;
        var (f, g) = Fateman.Operands(k);
        LaurentPolynomial p = f;
        double seconds = CleanHeapMedian(3, () => p = f * g);
        return $"terms={p.TermCount} seconds={Timing.Seconds(seconds)}";
    }

    /// <summary>Median wall time of <paramref name="reps"/> runs after one warm-up; before each run
    /// the garbage of earlier runs is collected (outside the timed region), so every run starts from
    /// the same heap. Collections caused by the run's own allocations are timed.</summary>
    /// <param name="reps">Number of timed runs.</param>
    /// <param name="action">The work to time.</param>
    /// <returns>The median in seconds.</returns>
    public static double CleanHeapMedian(int reps, Action action)
    {
        action();
        var times = new double[reps];
        for (int i = 0; i < reps; i++)
        {
            GC.Collect();
            GC.WaitForPendingFinalizers();
            GC.Collect();
            var sw = System.Diagnostics.Stopwatch.StartNew();
            action();
            times[i] = sw.Elapsed.TotalSeconds;
        }
        Array.Sort(times);
        return times[reps / 2];
    }
}
