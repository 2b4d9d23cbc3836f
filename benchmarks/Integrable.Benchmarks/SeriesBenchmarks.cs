using BenchmarkDotNet.Attributes;
using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Benchmarks;

/// <summary>BenchmarkDotNet suite for the series kernels: the Catalan equation by Newton iteration over Q,
/// a multi-modular product over Q, a three-prime product over Z/pZ and the exponential over Z/pZ.</summary>
/// <remarks>Run: <c>dotnet run -c Release --project benchmarks/Integrable.Benchmarks -- --filter '*SeriesBenchmarks*'</c>.</remarks>
[MemoryDiagnoser]
public class SeriesBenchmarks
{
    private PowerSeries<Rational> _catalanHalf = null!;
    private PowerSeries<ulong> _modular = null!;
    private PowerSeriesRing<Rational> _q = null!;
    private PowerSeriesRing<ulong> _zp = null!;

    /// <summary>Series order.</summary>
    [Params(500, 2000)]
    public int N { get; set; }

    /// <summary>Builds the inputs.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _q = PowerSeriesRing.Rationals;
        _zp = PowerSeriesRing.Modular(new PrimeField(Primes.Large(7)));
        var x = _q.X;
        var c = SeriesEquations.SolveNewton(_q, y => 1 + x * (y * y), N);
        _catalanHalf = _q.Series(c.Coefficients[..(N / 2)], N);
        var rng = new Random(1);
        var m = new ulong[N * 8];
        for (int i = 1; i < m.Length; i++) m[i] = (ulong)rng.NextInt64() % _zp.Characteristic;
        _modular = _zp.Series(m, m.Length);
    }

    /// <summary>C = 1 + x·C² to order N over Q (Newton, derivative supplied).</summary>
    /// <returns>The series.</returns>
    [Benchmark]
    public PowerSeries<Rational> CatalanNewton()
    {
        var x = _q.X;
        return SeriesEquations.SolveNewton(_q, y => 1 + x * (y * y), N, derivative: y => 2 * x * y);
    }

    /// <summary>Square of the first N/2 Catalan numbers (integers of up to N bits), truncated to N.</summary>
    /// <returns>The product.</returns>
    [Benchmark]
    public PowerSeries<Rational> RationalSquare() => _catalanHalf * _catalanHalf;

    /// <summary>Product of two random series of length 8N over Z/pZ with p ≈ 2^62.</summary>
    /// <returns>The product.</returns>
    [Benchmark]
    public PowerSeries<ulong> ModularProduct() => _modular * (_modular + 1);

    /// <summary>exp of a random series of length 8N over Z/pZ.</summary>
    /// <returns>The exponential.</returns>
    [Benchmark]
    public PowerSeries<ulong> ModularExp() => _modular.Exp();
}
