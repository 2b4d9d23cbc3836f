using System.Diagnostics;
using System.Numerics;
using Integrable.Kernels.LinearAlgebra;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

internal sealed class ScratchWorkload : IWorkload
{
    public string Name => "scratch";
    static ulong[] W(BigInteger v) { var w = new ulong[WordArithmetic.WordCount(v)]; WordArithmetic.WriteMagnitude(v, w); return w; }
    public string Run(string[] args)
    {
        var (rows, cols, data) = W5Workload.Read(args[0]);
        var sb = new System.Text.StringBuilder();
        for (int rep = 0; rep < 3; rep++)
        {
        var sw = Stopwatch.StartNew();
        double tW = 0, tDiv = 0, tGcd = 0, tMul = 0, tDen=0; int nDiv = 0, nFail = 0;
        for (int i = 0; i < rows; i++)
        {
            var row = data.AsSpan(i * cols, cols).ToArray();
            sw.Restart();
            var dens = row.Select(x => x.Denominator).ToArray();
            tDen += sw.Elapsed.TotalMilliseconds; sw.Restart();
            var order = Enumerable.Range(0, cols).OrderByDescending(j => dens[j].GetBitLength()).ToArray();
            var dw = dens.Select(W).ToArray();
            var nw = row.Select(x => W(x.Numerator)).ToArray();
            tW += sw.Elapsed.TotalMilliseconds;
            ulong[]? l = null;
            foreach (var j in order)
            {
                if (dens[j].IsOne) continue;
                if (l is null) { l = dw[j]; continue; }
                sw.Restart(); var q = WordArithmetic.TryDivideExact(l, dw[j]); tDiv += sw.Elapsed.TotalMilliseconds; nDiv++;
                if (q is null) { nFail++; sw.Restart(); var lb = WordArithmetic.ToBigInteger(l, false); var g = BigInteger.GreatestCommonDivisor(lb, dens[j]); l = W(lb / g * dens[j]); tGcd += sw.Elapsed.TotalMilliseconds; }
            }
            foreach (var j in order)
            {
                sw.Restart(); var q = WordArithmetic.TryDivideExact(l!, dw[j]); tDiv += sw.Elapsed.TotalMilliseconds;
                sw.Restart(); var b = WordArithmetic.Multiply(nw[j], q!); tMul += sw.Elapsed.TotalMilliseconds;
            }
        }
        sb.AppendLine($"den {tDen:F1} words {tW:F1}ms div {tDiv:F1}ms ({nDiv}, fail {nFail}) gcd {tGcd:F1}ms mul {tMul:F1}ms");
        }
        return sb.ToString();
    }
}
