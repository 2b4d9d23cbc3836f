using System.Diagnostics;
using System.Globalization;
using Integrable.Numbers;
using Integrable.Univariate;

namespace Integrable.Benchmarks;

/// <summary>W3 degree growth on a line over F_p, p = 2^31 − 1 (see ../shared/anchors/w3_hv/hv_flint.c, mode
/// "line"): x_{n+1} = A·x_n + 1/x_n² + B/x_n − x_{n−1} as univariate rational functions in t, with
/// x_0 = a + b·t, x_1 = c + d·t. The step is the same generic one as in the reference:
/// num = A·P³Q′ + Q³Q′ + B·P·Q²Q′ − P′P²Q, den = P²QQ′, g = gcd(num, den), P ← num/g, Q ← den/g, Q monic.</summary>
public abstract class W3WorkloadBase : IWorkload
{
    /// <summary>p = 2^31 − 1 as in the reference.</summary>
    public const ulong Prime = 2147483647;

    /// <inheritdoc/>
    public abstract string Name { get; }

    /// <summary>True for Hietarinta–Viallet (A = 1, B = 0), false for the QRT control (A = 0, B = 1).</summary>
    protected abstract bool Hietarinta { get; }

    /// <summary>Default number of steps.</summary>
    protected abstract int DefaultN { get; }

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        int nmax = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : DefaultN;
        int reps = args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 1;
        bool quiet = args.Contains("quiet");
        bool rf = args.Contains("rf");
        var times = new double[reps];
        int deg = 0;
        for (int r = 0; r < reps; r++)
            (deg, times[r]) = rf ? IterateRationalFunctions(nmax, verbose: r == 0 && !quiet) : Iterate(nmax, verbose: r == 0 && !quiet);
        if (!quiet || reps > 1) Console.WriteLine("  per-repetition seconds: " + string.Join(" ", times.Select(t => t.ToString("F3", CultureInfo.InvariantCulture))));
        Array.Sort(times);
        return $"map={(Hietarinta ? "hv" : "qrt")}{(rf ? " arithmetic=RationalFunctionModP" : "")} N={nmax} degnum={deg} seconds={Timing.Seconds(times[reps / 2])} reps={reps}";
    }

    /// <summary>The same map written with <see cref="RationalFunctionModP"/> field operations (the library's
    /// own cancellation strategy instead of the reference's single generic gcd); option <c>rf</c>.</summary>
    public (int Degree, double Seconds) IterateRationalFunctions(int nmax, bool verbose)
    {
        var f = new PrimeField(Prime);
        var x0 = RationalFunctionModP.FromPolynomial(PolynomialModP.FromCoefficients(f, 123456789, 987654321));
        var x1 = RationalFunctionModP.FromPolynomial(PolynomialModP.FromCoefficients(f, 192837465, 564738291));
        var sw = Stopwatch.StartNew();
        for (int n = 1; n < nmax; n++)
        {
            var next = Hietarinta ? x1 + x1.Pow(-2) - x0 : x1.Inverse() + x1.Pow(-2) - x0;
            (x0, x1) = (x1, next);
            if (verbose)
                Console.WriteLine($"  n={n + 1} degnum={x1.NumeratorDegree} degden={x1.DenominatorDegree} seconds={Timing.Seconds(sw.Elapsed.TotalSeconds)}");
        }
        return (x1.NumeratorDegree, sw.Elapsed.TotalSeconds);
    }

    /// <summary>Runs the iteration to x_N; returns the numerator degree of x_N and the cumulative seconds.</summary>
    public (int Degree, double Seconds) Iterate(int nmax, bool verbose)
    {
        var f = new PrimeField(Prime);
        var p0 = PolynomialModP.FromCoefficients(f, 123456789, 987654321);
        var p1 = PolynomialModP.FromCoefficients(f, 192837465, 564738291);
        var q0 = PolynomialModP.One(f);
        var q1 = PolynomialModP.One(f);
        bool a = Hietarinta, b = !Hietarinta;
        var cpu0 = Process.GetCurrentProcess().TotalProcessorTime;
        var sw = Stopwatch.StartNew();
        double tMul = 0, tGcd = 0, tDiv = 0;
        for (int n = 1; n < nmax; n++)
        {
            double s0 = sw.Elapsed.TotalSeconds;
            var t1 = q1.Square();
            var num = t1 * q1;
            if (b) num += t1 * p1;
            t1 = p1.Square();
            if (a) num += t1 * p1;
            num *= q0;
            var den = t1 * q1;
            num -= den * p0;
            den *= q0;
            double s1 = sw.Elapsed.TotalSeconds;
            var g = PolynomialModP.Gcd(num, den);
            double s2 = sw.Elapsed.TotalSeconds;
            var p2 = num.DivideExact(g);
            var q2 = den.DivideExact(g);
            ulong inv = f.Inverse(q2.LeadingCoefficient);
            p2 = p2.Scale(inv);
            q2 = q2.Scale(inv);
            (p0, q0, p1, q1) = (p1, q1, p2, q2);
            double s3 = sw.Elapsed.TotalSeconds;
            tMul += s1 - s0; tGcd += s2 - s1; tDiv += s3 - s2;
            if (verbose)
                Console.WriteLine($"  n={n + 1} degnum={p1.Degree} degden={q1.Degree} seconds={Timing.Seconds(s3)} cpu={(Process.GetCurrentProcess().TotalProcessorTime - cpu0).TotalSeconds:F3} (products {tMul:F3}, gcd {tGcd:F3}, divisions {tDiv:F3})");
        }
        if (verbose)
            Console.WriteLine($"  gc: gen0={GC.CollectionCount(0)} gen1={GC.CollectionCount(1)} gen2={GC.CollectionCount(2)} pause={GC.GetTotalPauseDuration().TotalSeconds:F3}s allocated={GC.GetTotalAllocatedBytes() / 1e9:F1}GB");
        return (p1.Degree, sw.Elapsed.TotalSeconds);
    }
}
