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

/// <summary>Operands of the Fateman benchmark.</summary>
public static class Fateman
{
    /// <summary>f = (1+x+y+z+t)^k and f + 1 in Q[x, y, z, t].</summary>
    /// <param name="k">The power.</param>
    /// <returns>The two factors.</returns>
    public static (LaurentPolynomial F, LaurentPolynomial G) Operands(int k)
    {
        var ring = new LaurentPolynomialRing("x", "y", "z", "t");
        var s = ring.One + ring.Variable(0) + ring.Variable(1) + ring.Variable(2) + ring.Variable(3);
        var f = s.Pow(k);
        return (f, f + 1);
    }
}
