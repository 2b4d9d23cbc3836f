using System.Diagnostics;
using System.Globalization;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Benchmarks;

/// <summary>Workload "Gcd": gcd(f·g, f·h) for dense random f, g, h in Q[x, y, z, t] of total degree 8
/// with two-digit coefficients (fixed seed). Only the gcd is timed (median of 3 after one warm-up);
/// prints <c>terms=&lt;terms of the gcd&gt; seconds=&lt;median&gt; cpu=&lt;median CPU seconds&gt;</c>.
/// <c>-- Gcd --write DIR</c> writes the three polynomials for the reference programs in
/// <c>anchors/</c> (gcd4_input.txt, one polynomial per line, and gcd4_input.sing).</summary>
public sealed class GcdWorkload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "Gcd";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        var (f, g, h) = GcdOperands.Create();
        if (args.Length >= 2 && args[0] == "--write")
        {
            Directory.CreateDirectory(args[1]);
            File.WriteAllText(Path.Combine(args[1], "gcd4_input.txt"), $"{f}\n{g}\n{h}\n");
            File.WriteAllText(Path.Combine(args[1], "gcd4_input.sing"), $"poly f = {f};\npoly g = {g};\npoly h = {h};\n");
            return $"wrote {args[1]}";
        }
        var a = f * g;
        var b = f * h;
        LaurentPolynomial r = f;
        var cpu = new List<double>();
        double seconds = Timing.Median(3, () =>
        {
            var t0 = Process.GetCurrentProcess().TotalProcessorTime;
            r = a.Gcd(b);
            cpu.Add((Process.GetCurrentProcess().TotalProcessorTime - t0).TotalSeconds);
        });
        if (r != GcdCheck(f)) throw new InvalidOperationException("gcd(f·g, f·h) is not the normalised f");
        cpu.Sort();
        return $"terms={r.TermCount} seconds={Timing.Seconds(seconds)} cpu={Timing.Seconds(cpu[cpu.Count / 2])}";
    }

    private static LaurentPolynomial GcdCheck(LaurentPolynomial f) => f.PrimitivePart;
}

/// <summary>The operands of the Gcd workload.</summary>
public static class GcdOperands
{
    /// <summary>f, g, h: every monomial of total degree ≤ 8 in x, y, z, t with a coefficient ±(10…99),
    /// from <c>new Random(20240817)</c>, in the order x-exponent, y, z, t ascending.</summary>
    /// <returns>The three polynomials.</returns>
    public static (LaurentPolynomial F, LaurentPolynomial G, LaurentPolynomial H) Create()
    {
        var ring = new LaurentPolynomialRing("x", "y", "z", "t");
        var rng = new Random(20240817);
        return (Dense(ring, rng), Dense(ring, rng), Dense(ring, rng));
    }

    private static LaurentPolynomial Dense(LaurentPolynomialRing ring, Random rng)
    {
        var b = ring.CreateBuilder();
        for (int a = 0; a <= 8; a++)
            for (int c = 0; c <= 8 - a; c++)
                for (int d = 0; d <= 8 - a - c; d++)
                    for (int e = 0; e <= 8 - a - c - d; e++)
                    {
                        int v = rng.Next(10, 100);
                        b.Add(rng.Next(2) == 0 ? v : -v, [a, c, d, e]);
                    }
        return b.ToPolynomial();
    }
}
