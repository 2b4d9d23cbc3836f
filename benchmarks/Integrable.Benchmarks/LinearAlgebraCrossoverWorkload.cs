using System.Diagnostics;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

/// <summary>Crossover between fraction-free and multimodular elimination on small random matrices
/// (usage: LAsmall); prints the best time of each method per shape.</summary>
internal sealed class LinearAlgebraCrossoverWorkload : IWorkload
{
    public string Name => "LAsmall";

    public string Run(string[] args)
    {
        var sb = new System.Text.StringBuilder();
        var rng = new Random(1);
        foreach (long bound in new long[] { 100, 1L << 40 })
            foreach (var (m, n) in new[] { (2, 2), (2, 5), (3, 3), (3, 4), (4, 4), (4, 5), (4, 8), (5, 5), (5, 6), (6, 6), (6, 7), (7, 8), (8, 8), (8, 9), (10, 11), (12, 12), (12, 13), (16, 16), (16, 17), (24, 25), (32, 33) })
            {
                var mats = Enumerable.Range(0, 20).Select(_ => Enumerable.Range(0, m * n).Select(_ => (Rational)rng.NextInt64(-bound, bound)).ToArray()).ToArray();
                double Time(EliminationMethod method)
                {
                    double best = 1e9;
                    for (int rep = 0; rep < 9; rep++)
                    {
                        var sw = Stopwatch.StartNew();
                        foreach (var a in mats) RationalElimination.Echelon(a, m, n, new EliminationOptions { Method = method });
                        best = Math.Min(best, sw.Elapsed.TotalMilliseconds / mats.Length * 1000);
                    }
                    return best;
                }
                Time(EliminationMethod.FractionFree); Time(EliminationMethod.Multimodular);   // warm-up
                double ff = Time(EliminationMethod.FractionFree), mm = Time(EliminationMethod.Multimodular);
                sb.AppendLine($"entries<{bound} {m}x{n}: fraction-free {ff:F1} us  multimodular {mm:F1} us");
            }
        foreach (long bound in new long[] { 100, 1L << 40 })
            foreach (int n in new[] { 4, 6, 8, 10, 12, 16, 24, 32 })
            {
                var mats = Enumerable.Range(0, 10).Select(_ => RationalMatrix.Create(n, n, (_, _) => rng.NextInt64(-bound, bound))).ToArray();
                double Time(EliminationMethod method)
                {
                    double best = 1e9;
                    for (int rep = 0; rep < 7; rep++)
                    {
                        var sw = Stopwatch.StartNew();
                        foreach (var a in mats) a.Determinant(new EliminationOptions { Method = method });
                        best = Math.Min(best, sw.Elapsed.TotalMilliseconds / mats.Length * 1000);
                    }
                    return best;
                }
                Time(EliminationMethod.FractionFree); Time(EliminationMethod.Multimodular);
                double ff = Time(EliminationMethod.FractionFree), mm = Time(EliminationMethod.Multimodular);
                sb.AppendLine($"determinant entries<{bound} {n}x{n}: fraction-free {ff:F1} us  multimodular {mm:F1} us");
            }
        return sb.ToString();
    }
}
