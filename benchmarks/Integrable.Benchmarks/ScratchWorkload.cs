using System.Diagnostics;
using Integrable.Kernels.LinearAlgebra;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

internal sealed class ScratchWorkload : IWorkload
{
    public string Name => "scratch";
    public string Run(string[] args)
    {
        var (rows, cols, data) = W5Workload.Read(args[0]);
        var sw = Stopwatch.StartNew();
        var sb = new System.Text.StringBuilder();
        for (int rep = 0; rep < 5; rep++)
        {
            sw.Restart();
            var b = IntegerRows.FromRational(data, rows, cols);
            double t1 = sw.Elapsed.TotalMilliseconds; sw.Restart();
            int g = RationalElimination.GuaranteedPrimeCount(b);
            double t2 = sw.Elapsed.TotalMilliseconds; sw.Restart();
            var red = new ModularReducer(new PrimeField(Primes.Large(0)));
            var img = new ulong[rows * cols];
            b.ReduceColumnMajor(red, img);
            double t3 = sw.Elapsed.TotalMilliseconds; sw.Restart();
            var ech = ModularEchelon.Compute(img, rows, cols, red);
            double t4 = sw.Elapsed.TotalMilliseconds; sw.Restart();
            var free = ech.FreeColumns();
            var e = ech.ReducedFreeEntries(free);
            double t5 = sw.Elapsed.TotalMilliseconds;
            sb.AppendLine($"clear {t1:F2} guaranteed({g}) {t2:F2} reduce {t3:F2} echelon {t4:F2} rref {t5:F2} rank {ech.Rank}");
        }
        return sb.ToString();
    }
}
