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
        double seconds = Timing.Median(3, () => p = f * g);
        return $"terms={p.TermCount} seconds={Timing.Seconds(seconds)}";
    }
}
