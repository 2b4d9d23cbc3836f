using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

internal sealed class ZzScratch : IWorkload
{
    public string Name => "zz";
    public string Run(string[] args)
    {
        var rng = new Random(1);
        int m = int.Parse(args[0]), n = int.Parse(args[1]); long bound = 1L << 40;
        var a = Enumerable.Range(0, m * n).Select(_ => (Rational)rng.NextInt64(-bound, bound)).ToArray();
        var d = new EliminationDiagnostics();
        RationalElimination.Echelon(a, m, n, new EliminationOptions { Method = EliminationMethod.Multimodular, Diagnostics = d, PrimeLimit = int.Parse(args[2]) });
        return d.ToString();
    }
}
