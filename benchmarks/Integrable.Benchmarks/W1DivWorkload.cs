using System.Globalization;
using Integrable.Polynomials;

namespace Integrable.Benchmarks;

/// <summary>Workload W1div: exact division of p = f·(f+1) by f = (1+x+y+z+t)^k; checks that the
/// quotient equals f + 1 and prints <c>terms=&lt;terms of quotient&gt; seconds=&lt;median&gt;</c>.</summary>
public sealed class W1DivWorkload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "W1div";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        int k = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 10;
        var (f, g) = Fateman.Operands(k);
        var p = f * g;
        LaurentPolynomial q = f;
        bool ok = true;
        double seconds = W1Workload.CleanHeapMedian(3, () => ok &= p.TryDivideExact(f, out q));
        if (!ok || q != g) throw new InvalidOperationException("W1div: quotient differs from f + 1.");
        return $"terms={q.TermCount} seconds={Timing.Seconds(seconds)}";
    }
}
