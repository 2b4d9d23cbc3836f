using System.Numerics;
using Integrable.Kernels.Univariate;

namespace Integrable.Univariate;

public sealed partial class PolynomialModP
{
    /// <summary>this^<paramref name="exponent"/> mod <paramref name="modulus"/> by square and multiply.</summary>
    /// <param name="exponent">A non-negative exponent (may exceed 64 bits).</param>
    /// <param name="modulus">A polynomial of degree ≥ 1 over the same field.</param>
    /// <returns>The remainder of this^exponent modulo <paramref name="modulus"/>.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="modulus"/> is zero.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="exponent"/> is negative.</exception>
    public PolynomialModP PowMod(BigInteger exponent, PolynomialModP modulus)
    {
        var ctx = Common(this, modulus);
        if (modulus.IsZero) throw new DivideByZeroException("reduction modulo the zero polynomial");
        if (modulus.Degree == 0) return Zero(ctx.Field);
        return new(ctx, PolyMod.PowMod(ctx, _c, exponent, modulus._c));
    }

    /// <summary>The distinct roots in Z/pZ, in increasing order.</summary>
    /// <returns>The roots (each once, whatever its multiplicity).</returns>
    /// <remarks>gcd(f, x^p − x) isolates the product of the linear factors; Cantor–Zassenhaus splitting
    /// with (x + δ)^((p−1)/2) − 1 (fixed-seed δ, so results are reproducible) separates them.</remarks>
    /// <exception cref="InvalidOperationException">The polynomial is zero.</exception>
    public ulong[] Roots()
    {
        if (IsZero) throw new InvalidOperationException("every element is a root of the zero polynomial");
        return PolyMod.Roots(Context, _c);
    }
}
