using System.Diagnostics;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

/// <summary>Temporary kernel probe.</summary>
public sealed class UniProbeWorkload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "UniProbe";

    static ulong[] Rand(Random rng, int deg, ulong p) { var a = new ulong[deg + 1]; for (int i = 0; i <= deg; i++) a[i] = (ulong)rng.NextInt64((long)p); if (a[deg] == 0) a[deg] = 1; return a; }

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        int deg = args.Length > 0 ? int.Parse(args[0]) : 1000;
        ulong p = args.Length > 1 ? ulong.Parse(args[1]) : 2147483647;
        var ctx = PolyModContext.For(new PrimeField(p));
        var rng = new Random(1);
        if (args.Length > 2 && args[2] == "thresholds")
        {
            var sb = new System.Text.StringBuilder();
            foreach (int n in new[] { 8, 12, 16, 24, 32, 48, 64, 96, 128, 192, 256, 384, 512, 768, 1024 })
            {
                foreach (int m in new[] { n, n / 4 + 1 })
                {
                    var x = Rand(rng, n - 1, p); var y = Rand(rng, m - 1, p);
                    var dst = new ulong[n + m - 1];
                    int reps = Math.Max(3, 20_000_000 / (n * m + 1000));
                    double Cpu(Action act) { act(); var c0 = Process.GetCurrentProcess().TotalProcessorTime; for (int r = 0; r < reps; r++) act(); return (Process.GetCurrentProcess().TotalProcessorTime - c0).TotalSeconds / reps * 1e6; }
                    double ts = Cpu(() => PolyMod.MultiplySchoolbook(ctx.Mod, x, y, dst));
                    double tk = Cpu(() => PolyMod.MultiplyKaratsuba(ctx.Mod, x, y, dst));
                    double tn = Cpu(() => ctx.Ntt.Multiply(x, y, dst));
                    sb.AppendLine($"n={n} m={m} school={ts:F1}us kara={tk:F1}us ntt={tn:F1}us");
                }
            }
            return sb.ToString();
        }
        if (args.Length > 2 && args[2] == "matvec")
        {
            var M = new PolyMatrix(Rand(rng, deg / 4, p), Rand(rng, deg / 4, p), Rand(rng, deg / 4, p), Rand(rng, deg / 4, p));
            var x = Rand(rng, deg / 2, p); var y = Rand(rng, deg / 2, p);
            double tmv = Timing.Median(5, () => PolyMod.MatVec(ctx, M, x, y));
            var cpuA = Process.GetCurrentProcess().TotalProcessorTime;
            for (int rr = 0; rr < 5; rr++) PolyMod.MatVec(ctx, M, x, y);
            double cpuMv = (Process.GetCurrentProcess().TotalProcessorTime - cpuA).TotalSeconds / 5;
            cpuA = Process.GetCurrentProcess().TotalProcessorTime;
            int lenq = NttMultiplier.TransformLength(deg / 4 + deg / 2);
            for (int rr = 0; rr < 5; rr++) { using var tq = ctx.Ntt.Transform(x, lenq, 3); }
            double cpuT = (Process.GetCurrentProcess().TotalProcessorTime - cpuA).TotalSeconds / 5;
            cpuA = Process.GetCurrentProcess().TotalProcessorTime;
            var tq2 = ctx.Ntt.Transform(x, lenq, 3);
            var outc = new ulong[lenq];
            for (int rr = 0; rr < 5; rr++) { ctx.Ntt.Garner(tq2, outc); }
            double cpuG = (Process.GetCurrentProcess().TotalProcessorTime - cpuA).TotalSeconds / 5;
            Console.WriteLine($"cpu matvec={cpuMv:F4} transform3(L={lenq})={cpuT:F4} garner={cpuG:F4}");
            double tmm = Timing.Median(5, () => PolyMod.MatMul(ctx, M, M));
            var c = new ulong[deg + 1];
            double tm = Timing.Median(5, () => ctx.Ntt.Multiply(x, y, c));
            int len = NttMultiplier.TransformLength(deg);
            double tt = Timing.Median(5, () => { using var t = ctx.Ntt.Transform(x, len, 3); });
            double ti = Timing.Median(5, () => { using var t = ctx.Ntt.Transform(x, len, 3); t.InverseTo(c); });
            var pr = new NttPrime(998244353, 3); pr.EnsureTables(System.Numerics.BitOperations.Log2((uint)len));
            var arr = new uint[len];
            double tf1 = Timing.Median(5, () => pr.Forward(arr));
            double ti1 = Timing.Median(5, () => pr.Inverse(arr));
            var tr = ctx.Ntt.Transform(x, len, 3);
            double tgar = Timing.Median(5, () => ctx.Ntt.Garner(tr, c));
            return $"garner={tgar:F5} fwd1={tf1:F5} inv1={ti1:F5} degree={deg} matvec={tmv:F5} matmul={tmm:F5} mul={tm:F5} transform3={tt:F5} fwd+inv3={ti:F5}";
        }
        if (args.Length > 2 && args[2] == "coprime")
        {
            var w1 = Rand(rng, 3000, p); var w2 = Rand(rng, 2999, p);
            PolyMod.Gcd(ctx, w1, w2); PolyMod.Gcd(ctx, w1, w2);
            var x = Rand(rng, deg, p); var y = Rand(rng, deg - 1, p);
            Array.Clear(Prof.T); Array.Clear(Prof.C); var sw0 = Stopwatch.StartNew();
            var cpu0 = Process.GetCurrentProcess().TotalProcessorTime;
            var g0 = PolyMod.Gcd(ctx, x, y);
            double t0 = sw0.Elapsed.TotalSeconds;
            double cpuG = (Process.GetCurrentProcess().TotalProcessorTime - cpu0).TotalSeconds;
            string e0 = "";
            if (deg <= 30000) { sw0.Restart(); var ge0 = PolyMod.GcdEuclid(ctx, x, y); e0 = $" euclid={sw0.Elapsed.TotalSeconds:F4} eq={g0.AsSpan().SequenceEqual(ge0)}"; }
            var c = new ulong[2 * deg + 1];
            ctx.Ntt.Multiply(x, x, c);
            double tm = Timing.Median(3, () => ctx.Ntt.Multiply(x, y, c));
            var cpu1 = Process.GetCurrentProcess().TotalProcessorTime;
            for (int rep = 0; rep < 5; rep++) ctx.Ntt.Multiply(x, y, c);
            double cpuM = (Process.GetCurrentProcess().TotalProcessorTime - cpu1).TotalSeconds / 5;
            return Prof.Report() + $" cpugcd={cpuG:F3} cpumul={cpuM:F4} cpuratio={cpuG / cpuM:F1} degree={deg} gcd={t0:F4} gdeg={g0.Length - 1} mul={tm:F4} ratio={t0 / tm:F1}{e0}";
        }
        var f = Rand(rng, deg / 2, p);
        var a = PolyMod.Multiply(ctx, f, Rand(rng, deg - deg / 2, p));
        var b = PolyMod.Multiply(ctx, f, Rand(rng, deg - deg / 2 - 1, p));
        var sw = Stopwatch.StartNew();
        var g = PolyMod.Gcd(ctx, a, b);
        double tg = sw.Elapsed.TotalSeconds;
        string extra = "";
        if (deg <= 20000)
        {
            sw.Restart();
            var ge = PolyMod.GcdEuclid(ctx, a, b);
            extra = $" euclid={sw.Elapsed.TotalSeconds:F4} eq={g.AsSpan().SequenceEqual(ge)}";
        }
        var fm = PolyMod.MakeMonic(ctx.Mod, f);
        sw.Restart();
        var (q, r) = PolyMod.DivRem(ctx, a, f);
        double td = sw.Elapsed.TotalSeconds;
        var (q2, r2) = PolyMod.DivRemBasic(ctx.Mod, a, f);
        sw.Restart();
        var (G, S, T) = PolyMod.ExtendedGcd(ctx, a, b);
        double tx = sw.Elapsed.TotalSeconds;
        var chk = PolyMod.Add(ctx.Mod, PolyMod.Multiply(ctx, S, a), PolyMod.Multiply(ctx, T, b));
        return $"degree={deg} gcd={tg:F4} gdeg={g.Length - 1} g==f:{g.AsSpan().SequenceEqual(fm)}{extra} divrem={td:F4} r0={r.Length == 0} qeq={q.AsSpan().SequenceEqual(q2)} xgcd={tx:F4} bez={chk.AsSpan().SequenceEqual(G)} Geq={G.AsSpan().SequenceEqual(g)}";
    }
}
