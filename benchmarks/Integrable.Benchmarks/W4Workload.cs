using System.Diagnostics;
using System.Globalization;
using Integrable.Polynomials;
using Integrable.Recursions;

namespace Integrable.Benchmarks;

/// <summary>Workload W4 (as the FLINT reference script w4_tsystem/tsystem_flint): the two-index T-system
/// T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n} (A_∞, no boundary) from the 4N − 4 symbols T_{a,0}
/// (|a| ≤ N−2) and T_{a,1} (|a| ≤ N−1), through <see cref="TSystem.EvaluateReduced{T}"/> over
/// <see cref="LaurentPolynomialRing"/>. Usage: <c>-- W4 N</c> prints <c>n=N terms=&lt;terms of T_{0,N}&gt;
/// seconds=&lt;wall time for T_{0,N} from scratch&gt; cpu=&lt;process CPU time&gt; coeffsum=&lt;value at all ones&gt;</c>;
/// <c>-- W4 N breakdown</c> runs layer by layer and times products, sums and divisions separately
/// (<c>-- W4 N breakdown quotient-heap</c> or <c>divisor-heap</c> pins the heap division variant).</summary>
public sealed class W4Workload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "W4";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        int n = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 5;
        if (n < 2) throw new ArgumentOutOfRangeException(nameof(args), n, "N must be at least 2");
        if (args.Length > 1 && args[1] == "breakdown")
        {
            // Optional third argument pins the heap division variant: "quotient-heap" or "divisor-heap".
            if (args.Length > 2) Integrable.Kernels.PolynomialDivide.ForceDivisorHeap = args[2] switch
            {
                "quotient-heap" => false,
                "divisor-heap" => true,
                _ => throw new ArgumentException($"unknown division variant '{args[2]}' (quotient-heap or divisor-heap)", nameof(args)),
            };
            return Breakdown(n);
        }
        Compute(Math.Min(n, 4));   // warm-up (JIT), not timed
        var (value, seconds, cpu) = Compute(n);
        return $"n={n} terms={value.TermCount} seconds={seconds.ToString("0.0000", CultureInfo.InvariantCulture)} cpu={cpu.ToString("0.0000", CultureInfo.InvariantCulture)} coeffsum={W2Workload.CoefficientSum(value)}";
    }

    private static LaurentPolynomialRing Ring(int n)
    {
        var names = new List<string>();
        for (int a = -(n - 2); a <= n - 2; a++) names.Add($"u_{{{a}}}");
        for (int a = -(n - 1); a <= n - 1; a++) names.Add($"v_{{{a}}}");
        return new LaurentPolynomialRing([.. names]);
    }

    /// <summary>Layer by layer as the reference program, with the squares and products, the sums and the exact
    /// divisions timed separately (<c>-- W4 N breakdown</c>; divideCpu is the process CPU time of the divisions).</summary>
    private static string Breakdown(int n)
    {
        var ring = Ring(n);
        var prev = new LaurentPolynomial[2 * n + 1];
        var cur = new LaurentPolynomial[2 * n + 1];
        for (int a = -(n - 2); a <= n - 2; a++) prev[a + n] = ring.Variable(a + n - 2);
        for (int a = -(n - 1); a <= n - 1; a++) cur[a + n] = ring.Variable(2 * n - 3 + a + n - 1);
        double mul = 0, add = 0, div = 0, divCpu = 0;
        for (int m = 1; m < n; m++)
        {
            var next = new LaurentPolynomial[2 * n + 1];
            for (int a = -(n - m - 1); a <= n - m - 1; a++)
            {
                long t0 = Stopwatch.GetTimestamp();
                var p1 = cur[a + n] * cur[a + n];
                var p2 = cur[a + 1 + n] * cur[a - 1 + n];
                long t1 = Stopwatch.GetTimestamp();
                var num = p1 + p2;
                long t2 = Stopwatch.GetTimestamp();
                double c2 = W2Workload.ProcessCpu();
                if (!num.TryDivideExact(prev[a + n], out var q)) throw new InvalidOperationException("division is not exact");
                long t3 = Stopwatch.GetTimestamp();
                divCpu += W2Workload.ProcessCpu() - c2;
                mul += Stopwatch.GetElapsedTime(t0, t1).TotalSeconds;
                add += Stopwatch.GetElapsedTime(t1, t2).TotalSeconds;
                div += Stopwatch.GetElapsedTime(t2, t3).TotalSeconds;
                next[a + n] = q;
            }
            prev = cur;
            cur = next;
        }
        string F(double v) => v.ToString("0.0000", CultureInfo.InvariantCulture);
        return $"n={n} terms={cur[n].TermCount} multiply={F(mul)} add={F(add)} divide={F(div)} total={F(mul + add + div)} divideCpu={F(divCpu)}";
    }

    private static (LaurentPolynomial Value, double Seconds, double Cpu) Compute(int n)
    {
        // Variable order of the reference: u_a = T_{a,0} for a = -(N-2)..N-2, then v_a = T_{a,1} for a = -(N-1)..N-1.
        var ring = Ring(n);
        var u = Enumerable.Range(0, 2 * n - 3).Select(ring.Variable).ToArray();
        var v = Enumerable.Range(2 * n - 3, 2 * n - 1).Select(ring.Variable).ToArray();
        LaurentPolynomial Initial(int a, int k) => k == 0 ? u[a + n - 2] : v[a + n - 1];
        var c0 = W2Workload.ProcessCpu();
        long t0 = Stopwatch.GetTimestamp();
        var value = TSystem.Unbounded.EvaluateReduced(ring, 0, n, Initial);
        double seconds = Stopwatch.GetElapsedTime(t0).TotalSeconds;
        return (value, seconds, W2Workload.ProcessCpu() - c0);
    }
}
