using BenchmarkDotNet.Attributes;
using Integrable.Analyses;
using Integrable.Recursions;

namespace Integrable.Benchmarks;

/// <summary>BenchmarkDotNet measurements of the integrability tests on small standard maps: degree growth
/// (Hietarinta–Viallet to x_10, the QRT control map to x_30), the Laurent check of Somos-4 to x_20, the
/// period of Todd's 8-cycle and the confinement test of discrete Painlevé I.</summary>
[MemoryDiagnoser]
public class GrowthBenchmarks
{
    private readonly Recurrence _hv = Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2");
    private readonly Recurrence _qrt = Recurrence.Parse("x_{n+1} + x_{n-1} = 1/x_n + 1/x_n^2");
    private readonly Recurrence _somos4 = Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2");
    private readonly Recurrence _todd = Recurrence.Parse("x_{n+3} x_n = 1 + x_{n+1} + x_{n+2}");
    private readonly Recurrence _dpi = Recurrence.Parse("x_{n+1} + x_n + x_{n-1} = (a n + b)/x_n + c");

    /// <summary>Degrees of Hietarinta–Viallet to x_10 (degree 8361) with the fit.</summary>
    [Benchmark]
    public double GrowthHietarintaViallet() => DegreeGrowth.Analyse(_hv, 9).Fit.Entropy;

    /// <summary>Degrees of the QRT control map to x_30.</summary>
    [Benchmark]
    public long GrowthQrt() => DegreeGrowth.Analyse(_qrt, 29).Degrees[^1];

    /// <summary>Laurent check of Somos-4 to x_20.</summary>
    [Benchmark]
    public int LaurentSomos4() => LaurentPhenomenon.Check(_somos4, 17).Steps[^1].TermCount;

    /// <summary>Period of Todd's recurrence (8), with the symbolic check.</summary>
    [Benchmark]
    public int? PeriodTodd() => Periodicity.Find(_todd, 30).Period;

    /// <summary>Singularity confinement of non-autonomous discrete Painlevé I.</summary>
    [Benchmark]
    public bool ConfineDiscretePainleveI() => SingularityConfinement.Test(_dpi).IsConfined;
}
