using BenchmarkDotNet.Attributes;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;
using Integrable.Univariate;

namespace Integrable.Benchmarks;

/// <summary>The three multiplication kernels over Z/pZ (schoolbook with delayed reduction, Karatsuba,
/// transforms over 30-bit primes with Garner) at equal operand lengths, for p = 2^31 − 1 (three
/// transform primes) and p ≈ 2^62 (five); used to place the crossovers in UnivariateThresholds.</summary>
[MemoryDiagnoser]
public class UnivariateMultiplyBenchmarks
{
    private PolyModContext _ctx = null!;
    private ulong[] _a = [], _b = [], _dst = [];

    /// <summary>Operand length (degree + 1).</summary>
    [Params(16, 48, 128, 512, 4096)]
    public int Length { get; set; }

    /// <summary>The modulus.</summary>
    [Params(2147483647UL, 4611686018427387847UL)]
    public ulong Modulus { get; set; }

    /// <summary>Builds random operands.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var f = new PrimeField(Modulus);
        _ctx = PolyModContext.For(f);
        _a = UnivariateWorkloadSupport.Random(f, Length - 1, 1).ToArray();
        _b = UnivariateWorkloadSupport.Random(f, Length - 1, 2).ToArray();
        _dst = new ulong[2 * Length - 1];
    }

    /// <summary>Quadratic product.</summary>
    [Benchmark(Baseline = true)]
    public void Schoolbook() => PolyMod.MultiplySchoolbook(_ctx.Mod, _a, _b, _dst);

    /// <summary>Karatsuba.</summary>
    [Benchmark]
    public void Karatsuba() => PolyMod.MultiplyKaratsuba(_ctx.Mod, _a, _b, _dst);

    /// <summary>Number-theoretic transforms.</summary>
    [Benchmark]
    public void Transform() => _ctx.Ntt.Multiply(_a, _b, _dst);

    /// <summary>The public dispatching product.</summary>
    [Benchmark]
    public PolynomialModP Dispatch() =>
        PolynomialModP.FromCoefficients(_ctx.Field, _a) * PolynomialModP.FromCoefficients(_ctx.Field, _b);
}
