using System.Diagnostics;
using System.Globalization;
using Integrable.Analyses;
using Integrable.Recursions;

namespace Integrable.Benchmarks;

/// <summary>Workload "Growth": the full degree-growth analysis (two random lines over F_p with p ≈ 2^31,
/// generic compiled rule, one gcd per new term, generating-function fit, exact confirmation) on the
/// Hietarinta–Viallet map (<c>hv</c>), the QRT control map (<c>qrt</c>) or any equation, to x_N.
/// Prints <c>degnum=&lt;numerator degree of x_N&gt; seconds=&lt;time&gt;</c> beside the raw W3/W3qrt
/// workloads, so the analysis overhead can be read off (the analysis runs two lines, W3 one).</summary>
public sealed class GrowthWorkload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "Growth";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        string map = args.Length > 0 ? args[0] : "hv";
        int n = args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 14;
        string equation = map switch
        {
            "hv" => "x_{n+1} + x_{n-1} = x_n + 1/x_n^2",
            "qrt" => "x_{n+1} + x_{n-1} = 1/x_n + 1/x_n^2",
            _ => map,
        };
        var recurrence = Recurrence.Parse(equation);
        var options = new GrowthOptions { Budget = AnalysisBudget.Unlimited };
        var cpu0 = Process.GetCurrentProcess().TotalProcessorTime;
        var watch = Stopwatch.StartNew();
        var progress = new Progress(watch);
        var report = DegreeGrowth.Analyse(recurrence, n - recurrence.Order + 1, options, args.Contains("verbose") ? progress : null);
        double seconds = watch.Elapsed.TotalSeconds;
        double cpu = (Process.GetCurrentProcess().TotalProcessorTime - cpu0).TotalSeconds;
        return $"map={map} N={n} degnum={report.NumeratorDegrees[^1]} degden={report.DenominatorDegrees[^1]} class={report.Fit.ClassName} " +
               $"entropy={report.Fit.Entropy.ToString("G6", CultureInfo.InvariantCulture)} lines={report.Primes.Length} seconds={Timing.Seconds(seconds)} cpu={cpu:F3}";
    }

    private sealed class Progress(Stopwatch watch) : IProgress<AnalysisProgress>
    {
        public void Report(AnalysisProgress value) => Console.WriteLine($"  {value.Detail} seconds={Timing.Seconds(watch.Elapsed.TotalSeconds)}");
    }
}
