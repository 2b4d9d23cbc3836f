using System.Diagnostics;
using System.Globalization;
using Integrable.Numbers;
using Integrable.Univariate;

namespace Integrable.Benchmarks;

/// <summary>Shared argument parsing and inputs for the univariate workloads.</summary>
internal static class UnivariateWorkloadSupport
{
    /// <summary>Parses <c>DEGREE [PRIME|large] [REPS]</c>; the default prime is 2^31 − 1.</summary>
    public static (int Degree, PrimeField Field, int Reps) Parse(string[] args, int defaultDegree)
    {
        int degree = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : defaultDegree;
        ulong p = 2147483647;
        if (args.Length > 1) p = args[1] == "large" ? Primes.Large(0) : ulong.Parse(args[1], CultureInfo.InvariantCulture);
        int reps = args.Length > 2 ? int.Parse(args[2], CultureInfo.InvariantCulture) : 5;
        return (degree, new PrimeField(p), reps);
    }

    /// <summary>A reproducible random polynomial of exactly the given degree.</summary>
    public static PolynomialModP Random(PrimeField f, int degree, int seed)
    {
        var rng = new Random(seed);
        var c = new ulong[degree + 1];
        for (int i = 0; i <= degree; i++) c[i] = (ulong)rng.NextInt64(0, (long)Math.Min(f.Modulus, long.MaxValue)) % f.Modulus;
        if (c[degree] == 0) c[degree] = 1;
        return PolynomialModP.FromCoefficients(f, c);
    }

    /// <summary>Median wall time and the mean process CPU time per repetition, after a warm-up of at
    /// least one call and up to 50 calls or half a second (so that tiered compilation has settled).</summary>
    public static (double Wall, double Cpu) Measure(int reps, Action action)
    {
        var warm = Stopwatch.StartNew();
        for (int i = 0; i < 50 && (i == 0 || warm.Elapsed.TotalSeconds < 0.5); i++) action();
        var cpu0 = Process.GetCurrentProcess().TotalProcessorTime;
        double wall = Timing.Median(reps, action, warmup: false);
        double cpu = (Process.GetCurrentProcess().TotalProcessorTime - cpu0).TotalSeconds / reps;
        return (wall, cpu);
    }
}
