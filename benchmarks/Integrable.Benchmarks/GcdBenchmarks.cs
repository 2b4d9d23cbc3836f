using BenchmarkDotNet.Attributes;
using Integrable.Kernels.Gcd;
using Integrable.Polynomials;

namespace Integrable.Benchmarks;

/// <summary>BenchmarkDotNet suite for the multivariate gcd: the dense four-variable workload with each
/// algorithm forced (Brown with cofactors, Brown gcd only, Zippel), a sparse gcd in nine variables
/// (Zippel's case), and a coprime pair (settled by the degree bounds alone).</summary>
/// <remarks>Run: <c>dotnet run -c Release --project benchmarks/Integrable.Benchmarks -- --filter '*GcdBenchmarks*'</c>.</remarks>
[MemoryDiagnoser]
public class GcdBenchmarks
{
    private LaurentPolynomial _a = null!, _b = null!, _sparseA = null!, _sparseB = null!, _coprimeA = null!, _coprimeB = null!;

    /// <summary>Builds the inputs.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var (f, g, h) = GcdOperands.Create();
        _a = f * g;
        _b = f * h;
        _coprimeA = g;
        _coprimeB = h;
        var ring = new LaurentPolynomialRing(Enumerable.Range(0, 9).Select(i => $"v_{i}").ToArray());
        var rng = new Random(3);
        LaurentPolynomial Sparse(int terms)
        {
            var bld = ring.CreateBuilder();
            var e = new int[9];
            for (int t = 0; t < terms; t++)
            {
                for (int v = 0; v < 9; v++) e[v] = rng.Next(0, 4);
                bld.Add(rng.Next(1, 100), e);
            }
            return bld.ToPolynomial();
        }
        var sf = Sparse(12);
        var sg = Sparse(10);
        _sparseA = sf * sg;
        _sparseB = sf * (sg + 1);
    }

    /// <summary>Resets the forced algorithm.</summary>
    [IterationCleanup]
    public void Cleanup() => GcdHooks.ForceAlgorithm = null;

    /// <summary>gcd(f·g, f·h), dispatcher's choice.</summary>
    /// <returns>The gcd.</returns>
    [Benchmark(Baseline = true)]
    public LaurentPolynomial DenseAuto() => _a.Gcd(_b);

    /// <summary>gcd(f·g, f·h), Brown interpolating the gcd only.</summary>
    /// <returns>The gcd.</returns>
    [Benchmark]
    public LaurentPolynomial DenseBrownGcdOnly()
    {
        GcdHooks.ForceAlgorithm = GcdAlgorithm.BrownGcdOnly;
        return _a.Gcd(_b);
    }

    /// <summary>gcd(f·g, f·h), Zippel.</summary>
    /// <returns>The gcd.</returns>
    [Benchmark]
    public LaurentPolynomial DenseZippel()
    {
        GcdHooks.ForceAlgorithm = GcdAlgorithm.Zippel;
        return _a.Gcd(_b);
    }

    /// <summary>A 12-term gcd of products in nine variables.</summary>
    /// <returns>The gcd.</returns>
    [Benchmark]
    public LaurentPolynomial SparseNineVariables() => _sparseA.Gcd(_sparseB);

    /// <summary>Two coprime dense polynomials (495 terms each).</summary>
    /// <returns>The gcd (1).</returns>
    [Benchmark]
    public LaurentPolynomial Coprime() => _coprimeA.Gcd(_coprimeB);
}
