using BenchmarkDotNet.Attributes;
using Integrable.Kernels.LinearAlgebra;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

/// <summary>Exact linear algebra: the W5 nullspaces over Q, elimination modulo a word-size prime, and
/// the two exact methods side by side on small matrices (the data behind the dispatcher thresholds in
/// RationalElimination). Run: dotnet run -c Release --project benchmarks/Integrable.Benchmarks -- --filter '*LinearAlgebra*'</summary>
[MemoryDiagnoser]
public class LinearAlgebraBenchmarks
{
    private Rational[] _random = [];
    private Rational[] _orbit40 = [];
    private ulong[] _randomModP = [];
    private ModularReducer _reducer;
    private Rational[] _small = [];

    /// <summary>Side of the small square matrices for the method comparison.</summary>
    [Params(4, 6, 8, 12)]
    public int SmallSize { get; set; }

    /// <summary>Builds the inputs.</summary>
    [GlobalSetup]
    public void Setup()
    {
        (_, _, _random) = W5Matrices.Random(300, 280, 5);
        (_, _, _orbit40) = W5Matrices.Orbit(40, 6);
        _reducer = new ModularReducer(new PrimeField(Primes.Large(0)));
        var b = IntegerRows.FromRational(_random, 300, 280);
        _randomModP = new ulong[300 * 280];
        b.ReduceColumnMajor(_reducer, _randomModP);
        var rng = new Random(SmallSize);
        // Rank-deficient by one, with a free column: the case where the reduced form has fractions.
        _small = new Rational[SmallSize * (SmallSize + 1)];
        for (int e = 0; e < _small.Length; e++) _small[e] = rng.Next(-100, 101);
    }

    /// <summary>W5 random 300×280 nullspace (verified).</summary>
    [Benchmark]
    public int NullspaceRandom300x280() => RationalElimination.Echelon(_random, 300, 280, EliminationOptions.Default).FreeColumns.Length;

    /// <summary>W5 orbit M = 40, D = 6 nullspace (verified).</summary>
    [Benchmark]
    public int NullspaceOrbit40() => RationalElimination.Echelon(_orbit40, 40, 28, EliminationOptions.Default).FreeColumns.Length;

    /// <summary>Left-looking elimination of the random matrix modulo one 62-bit prime.</summary>
    [Benchmark]
    public int EchelonModP300x280() { using var e = ModularEchelon.Compute(_randomModP, 300, 280, _reducer); return e.Rank; }

    /// <summary>Small n × (n+1) matrix, fraction-free.</summary>
    [Benchmark]
    public int SmallFractionFree() => RationalElimination.Echelon(_small, SmallSize, SmallSize + 1, new EliminationOptions { Method = EliminationMethod.FractionFree }).Rank;

    /// <summary>Small n × (n+1) matrix, multimodular.</summary>
    [Benchmark]
    public int SmallMultimodular() => RationalElimination.Echelon(_small, SmallSize, SmallSize + 1, new EliminationOptions { Method = EliminationMethod.Multimodular }).Rank;
}
