using System.Diagnostics;
using System.Globalization;
using System.Numerics;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Recursions;

namespace Integrable.Benchmarks;

/// <summary>Workload W2 (as the FLINT reference script w2_somos4): Somos-4,
/// x_{n+4} = (x_{n+3} x_{n+1} + x_{n+2}^2)/x_n, from the symbols x_0..x_3 as exact Laurent polynomials, through the
/// library's compiled recurrence over <see cref="LaurentPolynomialRing"/>. Usage: <c>-- W2 N [BUDGET_SECONDS]</c>.
/// Prints <c>n=N terms=&lt;terms of x_N&gt; seconds=&lt;cumulative wall time to compute x_4..x_N&gt; cpu=&lt;process CPU time&gt;
/// coeffsum=&lt;x_N at all ones&gt;</c>; <c>-- W2 N breakdown</c> times products, sum and division separately (the last four steps one by one on stderr);
/// with a budget, one line per step (like the reference) and, last, the largest n within the budget.</summary>
public sealed class W2Workload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "W2";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        int nmax = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 16;
        if (args.Length > 1 && args[1] == "breakdown") return Breakdown(nmax);
        double budget = args.Length > 1 ? double.Parse(args[1], CultureInfo.InvariantCulture) : double.PositiveInfinity;
        bool verbose = args.Length > 1;
        Iterate(Math.Min(nmax, 14), double.PositiveInfinity, false);   // warm-up (JIT), not timed
        return Iterate(nmax, budget, verbose);
    }

    private static string Iterate(int nmax, double budget, bool verbose)
    {
        var ring = new LaurentPolynomialRing("x_0", "x_1", "x_2", "x_3");
        var somos = Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2");
        var x = new List<LaurentPolynomial> { ring.Variable(0), ring.Variable(1), ring.Variable(2), ring.Variable(3) };
        double elapsed = 0, reachedSeconds = 0, cpu = 0, reachedCpu = 0;
        int reached = 3;
        for (int n = 4; n <= nmax; n++)
        {
            var window = x.GetRange(n - 4, 4);
            var c0 = ProcessCpu();
            long t0 = Stopwatch.GetTimestamp();
            var next = somos.Iterate(ring, window, 1)[4];
            elapsed += Stopwatch.GetElapsedTime(t0).TotalSeconds;
            cpu += ProcessCpu() - c0;
            x.Add(next);
            if (verbose) Console.WriteLine(FormattableString.Invariant($"n={n} terms={next.TermCount} seconds={elapsed:0.0000} cpu={cpu:0.0000} coeffsum={CoefficientSum(next)}"));
            if (elapsed > budget) break;
            reached = n;
            reachedSeconds = elapsed;
            reachedCpu = cpu;
        }
        var last = x[reached];
        return $"{(verbose ? "summary " : "")}n={reached} terms={last.TermCount} seconds={reachedSeconds.ToString("0.0000", CultureInfo.InvariantCulture)} cpu={reachedCpu.ToString("0.0000", CultureInfo.InvariantCulture)} coeffsum={CoefficientSum(last)}";
    }

    /// <summary>The same iteration with the operations timed separately: the two products, the sum and the exact
    /// division (<c>-- W2 N breakdown</c>).</summary>
    private static string Breakdown(int nmax)
    {
        var ring = new LaurentPolynomialRing("x_0", "x_1", "x_2", "x_3");
        var x = new List<LaurentPolynomial> { ring.Variable(0), ring.Variable(1), ring.Variable(2), ring.Variable(3) };
        double mul = 0, add = 0, div = 0;
        for (int n = 4; n <= nmax; n++)
        {
            long t0 = Stopwatch.GetTimestamp();
            var p1 = x[n - 1] * x[n - 3];
            var p2 = x[n - 2] * x[n - 2];
            long t1 = Stopwatch.GetTimestamp();
            var num = p1 + p2;
            long t2 = Stopwatch.GetTimestamp();
            if (!num.TryDivideExact(x[n - 4], out var q)) throw new InvalidOperationException($"x_{n} is not a Laurent polynomial");
            long t3 = Stopwatch.GetTimestamp();
            mul += Stopwatch.GetElapsedTime(t0, t1).TotalSeconds;
            add += Stopwatch.GetElapsedTime(t1, t2).TotalSeconds;
            div += Stopwatch.GetElapsedTime(t2, t3).TotalSeconds;
            x.Add(q);
            if (n > nmax - 4)
                Console.Error.WriteLine(FormattableString.Invariant(
                    $"  n={n} multiply={Stopwatch.GetElapsedTime(t0, t1).TotalSeconds:0.000} add={Stopwatch.GetElapsedTime(t1, t2).TotalSeconds:0.000} divide={Stopwatch.GetElapsedTime(t2, t3).TotalSeconds:0.000}"));
        }
        string F(double v) => v.ToString("0.0000", CultureInfo.InvariantCulture);
        return $"n={nmax} terms={x[nmax].TermCount} multiply={F(mul)} add={F(add)} divide={F(div)} total={F(mul + add + div)}";
    }

    /// <summary>User plus system CPU time of the process so far, in seconds (all threads, the garbage collector's included).</summary>
    internal static double ProcessCpu()
    {
        using var p = Process.GetCurrentProcess();
        return p.TotalProcessorTime.TotalSeconds;
    }

    /// <summary>The value at all variables 1, as an integer.</summary>
    internal static BigInteger CoefficientSum(LaurentPolynomial p)
    {
        var s = Rational.Zero;
        foreach (var c in p.Coefficients) s += c;
        return s.Numerator;
    }
}
