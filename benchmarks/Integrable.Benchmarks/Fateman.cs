using Integrable.Polynomials;

namespace Integrable.Benchmarks;

/// <summary>Operands of Fateman's multiplication benchmark (R. Fateman, "Comparing the speed of
/// programs for sparse polynomial multiplication", ACM SIGSAM Bulletin 37(1), 2003).</summary>
public static class Fateman
{
    /// <summary>f = (1+x+y+z+t)^k and f + 1 in Q[x, y, z, t].</summary>
    /// <param name="k">The power.</param>
    /// <returns>The two factors.</returns>
    public static (LaurentPolynomial F, LaurentPolynomial G) Operands(int k)
    {
        var ring = new LaurentPolynomialRing("x", "y", "z", "t");
        var s = ring.One + ring.Variable(0) + ring.Variable(1) + ring.Variable(2) + ring.Variable(3);
        var f = s.Pow(k);
        return (f, f + 1);
    }
}
