using System.Diagnostics;
using Integrable.Kernels.LinearAlgebra;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

internal sealed class ZzScratch : IWorkload
{
    public string Name => "zz";
    public string Run(string[] args)
    {
        var (rows, cols, data) = W5Matrices.Random(300, 280, 5);
        var sb = new System.Text.StringBuilder();
        var t = new double[6];
        for (int i = 0; i < 6; i++) t[i] = 1e9;
        var cpu = Process.GetCurrentProcess();
        for (int rep = 0; rep < 30; rep++)
        {
            var sw = Stopwatch.StartNew();
            var b = IntegerRows.FromRational(data, rows, cols);
            t[0] = Math.Min(t[0], sw.Elapsed.TotalMilliseconds); sw.Restart();
            RationalElimination.GuaranteedPrimeCount(b);
            t[1] = Math.Min(t[1], sw.Elapsed.TotalMilliseconds); sw.Restart();
            var red = new ModularReducer(new PrimeField(Primes.Large(0)));
            var img = new ulong[rows * cols];
            b.ReduceColumnMajor(red, img);
            t[2] = Math.Min(t[2], sw.Elapsed.TotalMilliseconds); sw.Restart();
            var ech = ModularEchelon.Compute(img, rows, cols, red);
            t[3] = Math.Min(t[3], sw.Elapsed.TotalMilliseconds); sw.Restart();
            var e = ech.ReducedFreeEntries(ech.FreeColumns());
            t[4] = Math.Min(t[4], sw.Elapsed.TotalMilliseconds); sw.Restart();
            RationalElimination.Echelon(data, rows, cols, EliminationOptions.Default);
            t[5] = Math.Min(t[5], sw.Elapsed.TotalMilliseconds);
        }
        return $"min ms: clear {t[0]:F2} bound {t[1]:F2} reduce {t[2]:F2} echelon {t[3]:F2} rref {t[4]:F2} full {t[5]:F2}";
    }
}
