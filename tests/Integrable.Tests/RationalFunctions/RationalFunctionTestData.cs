using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Tests.Gcd;

namespace Integrable.Tests.RationalFunctions;

internal static class RationalFunctionTestData
{
    /// <summary>A random rational function biased to edge cases.</summary>
    public static RationalFunction Random(Random rng, RationalFunctionField field)
    {
        var ring = field.PolynomialRing;
        switch (rng.Next(10))
        {
            case 0: return field.Zero;
            case 1: return field.Constant(new Rational(rng.Next(-5, 6), rng.Next(1, 4)));
            case 2: return field.FromPolynomial(GcdTestData.Random(rng, ring, 1, 2, minExp: -2));
        }
        int bits = rng.Next(4) == 0 ? 70 : 5;
        var num = GcdTestData.Random(rng, ring, 1 + rng.Next(3), 2, bits, minExp: rng.Next(3) == 0 ? -1 : 0);
        var den = GcdTestData.Random(rng, ring, 1 + rng.Next(3), 2, bits);
        if (rng.Next(3) == 0)
        {
            // a shared factor that must cancel
            var common = GcdTestData.Random(rng, ring, 2, 1, 3);
            num *= common;
            den *= common;
        }
        if (rng.Next(4) == 0) num *= new Rational(1, 1 + rng.Next(6));
        return field.Create(num, den);
    }
}
