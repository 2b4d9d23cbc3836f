using System.Diagnostics;
using System.Globalization;
using Integrable.Kernels.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

/// <summary>Modular dot products, scalar kernel against the AVX-512 kernel (usage: LAdot [LENGTH]);
/// process CPU nanoseconds per term.</summary>
internal sealed class LinearAlgebraDotWorkload : IWorkload
{
    public string Name => "LAdot";

    public string Run(string[] args)
    {
        int n = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 140;
        var r = new ModularReducer(new PrimeField(Primes.Large(0)));
        var rng = new Random(1);
        var a = Enumerable.Range(0, n).Select(_ => (ulong)rng.NextInt64() % r.P).ToArray();
        var b = Enumerable.Range(0, n).Select(_ => (ulong)rng.NextInt64() % r.P).ToArray();
        var pr = Process.GetCurrentProcess();
        double Cpu() { pr.Refresh(); return pr.TotalProcessorTime.TotalMilliseconds; }
        int reps = 20_000_000 / n;
        ulong sink = 0;
        double Measure(Func<ulong> f)
        {
            for (int i = 0; i < 1000; i++) sink += f();
            double c0 = Cpu();
            for (int i = 0; i < reps; i++) sink += f();
            return (Cpu() - c0) * 1e6 / reps / n;
        }
        var sb = new System.Text.StringBuilder();
        for (int round = 0; round < 2; round++)
        {
            double scalar = Measure(() => r.DotScalar(a, b));
            double avx = System.Runtime.Intrinsics.X86.Avx512F.IsSupported && n >= 8 ? Measure(() => r.DotAvx512(a, b)) : double.NaN;
            sb.Append(string.Create(CultureInfo.InvariantCulture, $"n={n}: scalar {scalar:F3} ns/term, AVX-512 {avx:F3} ns/term; "));
        }
        return sb.Append(sink % 2).ToString();
    }
}
