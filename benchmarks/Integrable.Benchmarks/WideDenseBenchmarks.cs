using BenchmarkDotNet.Attributes;
using Integrable.Kernels;
using Integrable.Polynomials;

namespace Integrable.Benchmarks;

/// <summary>BenchmarkDotNet: the wide-coefficient paths on Somos-4 Laurent iterates (x_0..x_3 as variables):
/// x_{n−1}·x_{n−3} and the exact division of the next numerator by x_{n−4}, as dispatched (projection onto the
/// supports' affine hull, then Kronecker substitution with transforms), without the projection, and with the
/// four-limb multi-limb path alone.</summary>
[MemoryDiagnoser]
public class WideDenseBenchmarks
{
    private LaurentPolynomial _a = null!, _b = null!, _numerator = null!, _divisor = null!;

    /// <summary>The index n of the step (coefficients of about 4.5·n bits).</summary>
    [Params(30, 36)]
    public int N { get; set; }

    /// <summary>Iterates Somos-4 up to x_{N−1}.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var ring = new LaurentPolynomialRing("x_0", "x_1", "x_2", "x_3");
        var x = new List<LaurentPolynomial> { ring.Variable(0), ring.Variable(1), ring.Variable(2), ring.Variable(3) };
        for (int n = 4; n < N; n++)
        {
            if (!(x[n - 1] * x[n - 3] + x[n - 2] * x[n - 2]).TryDivideExact(x[n - 4], out var next))
                throw new InvalidOperationException("not a Laurent polynomial");
            x.Add(next);
        }
        _a = x[N - 1];
        _b = x[N - 3];
        _numerator = x[N - 1] * x[N - 3] + x[N - 2] * x[N - 2];
        _divisor = x[N - 4];
    }

    /// <summary>The product as dispatched.</summary>
    /// <returns>The product.</returns>
    [Benchmark(Baseline = true)]
    public LaurentPolynomial Multiply() => _a * _b;

    /// <summary>The product without the hull projection (sparse heap in four variables).</summary>
    /// <returns>The product.</returns>
    [Benchmark]
    public LaurentPolynomial MultiplyUnprojected()
    {
        PolynomialMultiply.NoProjection = true;
        try { return _a * _b; }
        finally { PolynomialMultiply.NoProjection = false; }
    }

    /// <summary>The projected product by the classical dense method with multi-limb coefficients.</summary>
    /// <returns>The product.</returns>
    [Benchmark]
    public LaurentPolynomial MultiplyClassicalDense()
    {
        KroneckerProduct.Force = false;
        try { return _a * _b; }
        finally { KroneckerProduct.Force = null; }
    }

    /// <summary>The exact division as dispatched.</summary>
    /// <returns>The quotient.</returns>
    [Benchmark]
    public LaurentPolynomial Divide() => _numerator.TryDivideExact(_divisor, out var q) ? q : throw new InvalidOperationException();

    /// <summary>The projected exact division by the classical dense kernel (the Kronecker division's box limit set to zero
    /// for the call; benchmarks run on one thread).</summary>
    /// <returns>The quotient.</returns>
    [Benchmark]
    public LaurentPolynomial DivideClassicalDense()
    {
        long saved = PolynomialDivide.KroneckerMaxBox;
        PolynomialDivide.KroneckerMaxBox = 0;
        try { return _numerator.TryDivideExact(_divisor, out var q) ? q : throw new InvalidOperationException(); }
        finally { PolynomialDivide.KroneckerMaxBox = saved; }
    }
}
