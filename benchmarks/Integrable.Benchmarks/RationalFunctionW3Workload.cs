using System.Diagnostics;
using System.Globalization;
using System.Text;
using Integrable.Polynomials;
using Integrable.RationalFunctions;

namespace Integrable.Benchmarks;

/// <summary>Workload "W3biv": the Hietarinta–Viallet map x_{n+1} = x_n + 1/x_n² − x_{n−1} from
/// x_0 = x0, x_1 = x1 with exact bivariate rational-function iterates (the anchors' W3 "biv" mode).
/// <c>-- W3biv N [field|generic] [qrt]</c>: <c>field</c> (default) iterates with
/// <see cref="RationalFunction"/> arithmetic (Henrici sums, so the gcds involve only the old
/// denominators); <c>generic</c> repeats the anchors' step exactly: num = P³Q′ + Q³Q′ − P′P²Q,
/// den = P²QQ′, g = gcd(num, den), P = num/g, Q = den/g. <c>qrt</c> runs the integrable control map
/// x_{n+1} = 1/x_n + 1/x_n² − x_{n−1}. Prints one line per step n = 2..N with
/// <c>degnum= degden= termsnum= termsden= seconds=</c> (cumulative wall time) and the CPU time.</summary>
public sealed class RationalFunctionW3Workload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "W3biv";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        int nmax = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 7;
        bool generic = args.Contains("generic");
        bool qrt = args.Contains("qrt");
        var field = new RationalFunctionField("x0", "x1");
        var ring = field.PolynomialRing;
        var sb = new StringBuilder();
        var proc = Process.GetCurrentProcess();
        var cpu0 = proc.TotalProcessorTime;
        var sw = Stopwatch.StartNew();
        RationalFunction prev = field.Variable(0), cur = field.Variable(1);
        LaurentPolynomial p0 = ring.Variable(0), q0 = ring.One, p1 = ring.Variable(1), q1 = ring.One;
        for (int n = 2; n <= nmax; n++)
        {
            LaurentPolynomial num, den;
            if (!generic)
            {
                var next = qrt ? cur.Inverse() + cur.Pow(-2) - prev : cur + cur.Pow(-2) - prev;
                (prev, cur) = (cur, next);
                num = cur.Numerator;
                den = cur.Denominator;
            }
            else
            {
                var q2 = q1 * q1;
                var p2 = p1 * p1;
                var a = q2 * q1 + (qrt ? q2 * p1 : p2 * p1);
                var numerator = a * q0 - p0 * p2 * q1;
                var denominator = p2 * q1 * q0;
                var (_, pn, qn) = numerator.GcdWithCofactors(denominator, MonomialFactor.Keep);
                if (qn.LeadingCoefficient.Sign < 0) { pn = -pn; qn = -qn; }
                (p0, q0, p1, q1) = (p1, q1, pn, qn);
                num = pn;
                den = qn;
            }
            double cpu = (Process.GetCurrentProcess().TotalProcessorTime - cpu0).TotalSeconds;
            sb.Append(CultureInfo.InvariantCulture, $"n={n} degnum={num.TotalDegree} degden={den.TotalDegree} termsnum={num.TermCount} termsden={den.TermCount} seconds={Timing.Seconds(sw.Elapsed.TotalSeconds)} cpu={Timing.Seconds(cpu)}");
            if (n < nmax) sb.AppendLine();
        }
        return sb.ToString();
    }
}
