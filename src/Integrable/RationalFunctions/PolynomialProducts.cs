using Integrable.Kernels.Gcd;
using Integrable.Polynomials;

namespace Integrable.RationalFunctions;

/// <summary>Products and powers of the numerators and denominators. Rational-function iterates grow
/// coefficients past a machine word quickly, where the shared product kernel falls back to big
/// integers; these helpers split coefficients into word limbs instead (see <c>SplitMultiply</c>).</summary>
internal static class PolynomialProducts
{
    public static LaurentPolynomial Multiply(LaurentPolynomial a, LaurentPolynomial b)
    {
        if (a.IsZero || b.IsZero) return a.Ring.Zero;
        if (a.IsMonomial || b.IsMonomial) return a * b;
        SplitMultiply.Multiply(a.CoeffArray, a.ExpArray, b.CoeffArray, b.ExpArray, a.Ring.VariableCount, out var c, out var e);
        return new LaurentPolynomial(a.Ring, c, e);
    }

    public static LaurentPolynomial Pow(LaurentPolynomial a, int k)
    {
        if (k <= 1 || a.IsMonomial || a.IsZero) return a.Pow(k);
        LaurentPolynomial result = a.Ring.One, square = a;
        bool first = true;
        while (true)
        {
            if ((k & 1) != 0) { result = first ? square : Multiply(result, square); first = false; }
            k >>= 1;
            if (k == 0) return result;
            square = Multiply(square, square);
        }
    }
}
