using System.Diagnostics;
using System.Globalization;
using Integrable.Polynomials;
using Integrable.Recursions;

namespace Integrable.Benchmarks;

/// <summary>Workload W4b (as the FLINT reference script w4_tsystem/octahedron3d_flint): the octahedron recurrence
/// f(i,j,k+1) f(i,j,k-1) = f(i+1,j,k) f(i-1,j,k) + f(i,j+1,k) f(i,j-1,k) on the points with i + j + k ≡ N (mod 2),
/// with the symbols f(i,j,0) (|i|+|j| ≤ N−2) and f(i,j,1) (|i|+|j| ≤ N−1) (the light cone of f(0,0,N)), through
/// <see cref="OctahedronRecurrence"/> over <see cref="LaurentPolynomialRing"/>. Usage: <c>-- W4b N</c>. Prints
/// <c>n=N terms=&lt;terms of f(0,0,N)&gt; seconds=&lt;wall time&gt; coeffsum=&lt;value at all ones&gt;</c>
/// (2^{N(N−1)/2} terms, all coefficients 1).</summary>
public sealed class W4bWorkload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "W4b";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        int n = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 5;
        if (n < 2) throw new ArgumentOutOfRangeException(nameof(args), n, "N must be at least 2");
        Compute(Math.Min(n, 4));   // warm-up (JIT), not timed
        var (value, seconds, cpu, symbols) = Compute(n);
        return $"n={n} terms={value.TermCount} seconds={seconds.ToString("0.0000", CultureInfo.InvariantCulture)} cpu={cpu.ToString("0.0000", CultureInfo.InvariantCulture)} coeffsum={W2Workload.CoefficientSum(value)} nvars={symbols}";
    }

    private static (LaurentPolynomial Value, double Seconds, double Cpu, int Symbols) Compute(int n)
    {
        // Variable order of the reference: layer 0 then layer 1, each scanned by i then j.
        var index = new Dictionary<(int, int), int>();
        var names = new List<string>();
        for (int layer = 0; layer <= 1; layer++)
            for (int i = -n; i <= n; i++)
                for (int j = -n; j <= n; j++)
                    if (Math.Abs(i) + Math.Abs(j) <= n - 2 + layer && ((i + j + layer - n) & 1) == 0)
                    {
                        index[(i, j)] = names.Count;
                        names.Add($"f_{{{i},{j},{layer}}}");
                    }
        var ring = new LaurentPolynomialRing([.. names]);
        var symbols = Enumerable.Range(0, names.Count).Select(ring.Variable).ToArray();
        LaurentPolynomial Initial(int i, int j) => symbols[index[(i, j)]];
        var c0 = W2Workload.ProcessCpu();
        long t0 = Stopwatch.GetTimestamp();
        var value = OctahedronRecurrence.Evaluate(ring, SteppedSurface.Flat(n & 1), Initial, 0, 0, n);
        double seconds = Stopwatch.GetElapsedTime(t0).TotalSeconds;
        return (value, seconds, W2Workload.ProcessCpu() - c0, names.Count);
    }
}
