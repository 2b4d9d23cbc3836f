using BenchmarkDotNet.Attributes;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;
using Integrable.Univariate;

namespace Integrable.Benchmarks;

/// <summary>Gcd over Z/pZ, p = 2^31 − 1, of random coprime inputs (degrees n and n − 1): plain Euclid
/// against half-GCD, to place UnivariateThresholds.HalfGcd; plus Newton against long division.</summary>
[MemoryDiagnoser]
public class UnivariateGcdBenchmarks
{
    private PolyModContext _ctx = null!;
    private ulong[] _a = [], _b = [], _c = [];

    /// <summary>Degree of the larger input.</summary>
    [Params(100, 300, 1000, 5000)]
    public int Degree { get; set; }

    /// <summary>Builds random operands.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var f = new PrimeField(2147483647);
        _ctx = PolyModContext.For(f);
        _a = UnivariateWorkloadSupport.Random(f, Degree, 3).ToArray();
        _b = UnivariateWorkloadSupport.Random(f, Degree - 1, 4).ToArray();
        _c = UnivariateWorkloadSupport.Random(f, 2 * Degree, 5).ToArray();
    }

    /// <summary>Plain Euclid (in place).</summary>
    [Benchmark(Baseline = true)]
    public ulong[] Euclid() => PolyMod.GcdEuclid(_ctx, _a, _b);

    /// <summary>Half-GCD reductions.</summary>
    [Benchmark]
    public ulong[] HalfGcd()
    {
        int saved = UnivariateThresholds.HalfGcd;
        UnivariateThresholds.HalfGcd = 8;
        try { return PolyMod.Gcd(_ctx, _a, _b); }
        finally { UnivariateThresholds.HalfGcd = saved; }
    }

    /// <summary>Long division of a degree-2n polynomial by a degree-n one.</summary>
    [Benchmark]
    public (ulong[], ulong[]) LongDivision() => PolyMod.DivRemBasic(_ctx.Mod, _c, _a);

    /// <summary>Newton division of the same.</summary>
    [Benchmark]
    public (ulong[], ulong[]) NewtonDivision() => PolyMod.DivRemNewton(_ctx, _c, _a);

    /// <summary>The public gcd (dispatching).</summary>
    [Benchmark]
    public PolynomialModP PublicGcd() =>
        PolynomialModP.Gcd(PolynomialModP.FromCoefficients(_ctx.Field, _a), PolynomialModP.FromCoefficients(_ctx.Field, _b));
}
