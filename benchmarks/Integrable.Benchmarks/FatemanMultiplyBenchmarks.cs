using BenchmarkDotNet.Attributes;
using Integrable.Kernels;
using Integrable.Polynomials;

namespace Integrable.Benchmarks;

/// <summary>BenchmarkDotNet: f·(f+1) with f = (1+x+y+z+t)^k, by the dispatcher and by each
/// multiplication kernel forced.</summary>
[MemoryDiagnoser]
public class FatemanMultiplyBenchmarks
{
    private LaurentPolynomial _f = null!, _g = null!;

    /// <summary>The power k.</summary>
    [Params(10, 15, 20)]
    public int K { get; set; }

    /// <summary>Builds the operands.</summary>
    [GlobalSetup]
    public void Setup() => (_f, _g) = Fateman.Operands(K);

    /// <summary>Multiplication as dispatched (dense for these operands).</summary>
    /// <returns>The product.</returns>
    [Benchmark(Baseline = true)]
    public LaurentPolynomial Multiply() => _f * _g;

    /// <summary>Johnson's heap kernel, forced.</summary>
    /// <returns>The product.</returns>
    [Benchmark]
    public LaurentPolynomial MultiplyHeap()
    {
        PolynomialMultiply.Force = MultiplyAlgorithm.Heap;
        try { return _f * _g; }
        finally { PolynomialMultiply.Force = MultiplyAlgorithm.Auto; }
    }

    /// <summary>Dense kernel with unaligned power-of-two windows, forced.</summary>
    /// <returns>The product.</returns>
    [Benchmark]
    public LaurentPolynomial MultiplyDenseUnaligned()
    {
        PolynomialMultiply.Force = MultiplyAlgorithm.Dense;
        PolynomialMultiply.ForceDenseShift = 10;
        try { return _f * _g; }
        finally { PolynomialMultiply.Force = MultiplyAlgorithm.Auto; PolynomialMultiply.ForceDenseShift = 0; }
    }
}
