using BenchmarkDotNet.Attributes;
using Integrable.Kernels.LinearAlgebra;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

/// <summary>Exact linear algebra: the W5 nullspaces over Q and elimination modulo a word-size prime.
/// Run: dotnet run -c Release --project benchmarks/Integrable.Benchmarks -- --filter '*LinearAlgebraBenchmarks*'</summary>
[MemoryDiagnoser]
public class LinearAlgebraBenchmarks
{
    private Rational[] _random = [];
    private Rational[] _orbit40 = [];
    private ulong[] _randomModP = [];
    private ModularReducer _reducer;

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
}
