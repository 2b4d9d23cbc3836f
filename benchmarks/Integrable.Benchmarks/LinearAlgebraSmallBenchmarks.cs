using BenchmarkDotNet.Attributes;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

/// <summary>The two exact methods over Q side by side on small n × (n+1) matrices (the data behind the
/// dispatcher thresholds in RationalElimination; the LAsmall workload prints a wider table).
/// Run: dotnet run -c Release --project benchmarks/Integrable.Benchmarks -- --filter '*LinearAlgebraSmall*'</summary>
[MemoryDiagnoser]
public class LinearAlgebraSmallBenchmarks
{
    private Rational[] _small = [];

    /// <summary>Number of rows n (the matrix is n × (n+1)).</summary>
    [Params(4, 8, 12, 24)]
    public int Size { get; set; }

    /// <summary>Builds the input: entries in [−100, 100], so the reduced form has one free column.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var rng = new Random(Size);
        _small = new Rational[Size * (Size + 1)];
        for (int e = 0; e < _small.Length; e++) _small[e] = rng.Next(-100, 101);
    }

    /// <summary>Fraction-free (Bareiss) elimination.</summary>
    [Benchmark(Baseline = true)]
    public int FractionFree() => RationalElimination.Echelon(_small, Size, Size + 1, new EliminationOptions { Method = EliminationMethod.FractionFree }).Rank;

    /// <summary>Multimodular elimination with its exact check.</summary>
    [Benchmark]
    public int Multimodular() => RationalElimination.Echelon(_small, Size, Size + 1, new EliminationOptions { Method = EliminationMethod.Multimodular }).Rank;
}
