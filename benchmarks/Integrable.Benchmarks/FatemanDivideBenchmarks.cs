using BenchmarkDotNet.Attributes;
using Integrable.Kernels;
using Integrable.Polynomials;

namespace Integrable.Benchmarks;

/// <summary>BenchmarkDotNet: exact division of f·(f+1) by f = (1+x+y+z+t)^k, by the dispatcher
/// and by each division kernel forced.</summary>
[MemoryDiagnoser]
public class FatemanDivideBenchmarks
{
    private LaurentPolynomial _f = null!, _p = null!;

    /// <summary>The power k.</summary>
    [Params(10, 15, 20)]
    public int K { get; set; }

    /// <summary>Builds the operands.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var (f, g) = Fateman.Operands(K);
        _f = f;
        _p = f * g;
    }

    /// <summary>Exact division as dispatched (dense for these operands).</summary>
    /// <returns>The quotient.</returns>
    [Benchmark(Baseline = true)]
    public LaurentPolynomial Divide() => _p.TryDivideExact(_f, out var q) ? q : throw new InvalidOperationException("not exact");

    /// <summary>Heap division, forced.</summary>
    /// <returns>The quotient.</returns>
    [Benchmark]
    public LaurentPolynomial DivideHeap()
    {
        PolynomialDivide.ForceDense = false;
        try { return _p.TryDivideExact(_f, out var q) ? q : throw new InvalidOperationException("not exact"); }
        finally { PolynomialDivide.ForceDense = null; }
    }
}
