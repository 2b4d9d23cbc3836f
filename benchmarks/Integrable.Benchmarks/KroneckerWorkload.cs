using System.Globalization;
using System.Numerics;
using Integrable.Kernels;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Benchmarks;

/// <summary>The wide dense product and division paths against the classical dense kernels on one shape:
/// A = (random dense polynomial in two variables with degree ≤ D per variable and coefficients of BITS bits),
/// B likewise; times A·B with the classical dense method, by Kronecker substitution with transforms, and as
/// dispatched (Auto), then (A·B)/B classically and by Kronecker substitution. Usage: <c>-- Kron D BITS</c>.
/// Prints <c>classical=… kronecker=… auto=… divide_classical=… divide_kronecker=…</c> (medians of 3, seconds).</summary>
public sealed class KroneckerWorkload : IWorkload
{
    /// <inheritdoc/>
    public string Name => "Kron";

    /// <inheritdoc/>
    public string Run(string[] args)
    {
        int degree = args.Length > 0 ? int.Parse(args[0], CultureInfo.InvariantCulture) : 100;
        int bits = args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 180;
        var rng = new Random(7);
        var ring = new LaurentPolynomialRing("x", "y");
        LaurentPolynomial Dense()
        {
            var b = ring.CreateBuilder();
            for (int i = 0; i <= degree; i++)
                for (int j = 0; j <= degree; j++)
                {
                    var bytes = new byte[bits / 8 + 2];
                    rng.NextBytes(bytes);
                    bytes[^1] = 0;
                    var c = (new BigInteger(bytes) & ((BigInteger.One << bits) - 1)) + 1;
                    b.Add(new Rational(rng.Next(2) == 0 ? c : -c), [i, j]);
                }
            return b.ToPolynomial();
        }
        var a = Dense();
        var d = Dense();
        LaurentPolynomial product = a * d;
        double classical = Timing.Median(3, () =>
        {
            PolynomialMultiply.Force = MultiplyAlgorithm.Dense;
            try { product = a * d; } finally { PolynomialMultiply.Force = MultiplyAlgorithm.Auto; }
        });
        double kronecker = Timing.Median(3, () =>
        {
            KroneckerProduct.Force = true;
            try { _ = a * d; } finally { KroneckerProduct.Force = null; }
        });
        double auto = Timing.Median(3, () => _ = a * d);
        double divideClassical = Timing.Median(3, () =>
        {
            PolynomialDivide.ForceDense = true;
            try { if (!product.TryDivideExact(d, out _)) throw new InvalidOperationException("not divisible"); }
            finally { PolynomialDivide.ForceDense = null; }
        });
        double divideKronecker = Timing.Median(3, () =>
        {
            PolynomialDivide.ForceKronecker = true;
            try { if (!product.TryDivideExact(d, out _)) throw new InvalidOperationException("not divisible"); }
            finally { PolynomialDivide.ForceKronecker = false; }
        });
        string F(double v) => v.ToString("0.0000", CultureInfo.InvariantCulture);
        return $"degree={degree} bits={bits} terms={a.TermCount}x{d.TermCount} classical={F(classical)} kronecker={F(kronecker)} auto={F(auto)} divide_classical={F(divideClassical)} divide_kronecker={F(divideKronecker)}";
    }
}
