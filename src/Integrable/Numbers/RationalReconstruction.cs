using System.Numerics;

namespace Integrable.Numbers;

/// <summary>Rational reconstruction: recovering n/d from its residue modulo m by the half-extended
/// Euclidean algorithm (Wang 1981; Collins–Encarnación 1995).</summary>
/// <remarks>With the default bounds |n|, d ≤ √(m/2) the answer is unique when it exists. A caller that
/// needs certainty checks the reconstructed value against an independent image (another prime) or
/// verifies the final result exactly, as every modular algorithm of the library does.</remarks>
public static class RationalReconstruction
{
    /// <summary>Finds n/d with n ≡ a·d (mod m), |n| ≤ N and 0 &lt; d ≤ D where N = D = ⌊√(m/2)⌋.</summary>
    /// <param name="a">The residue, in [0, m).</param>
    /// <param name="m">The modulus (product of the primes used), at least 2.</param>
    /// <param name="result">The rational number when the call succeeds.</param>
    /// <returns>False when no fraction within the bounds exists.</returns>
    public static bool TryReconstruct(BigInteger a, BigInteger m, out Rational result)
    {
        var bound = Sqrt(m / 2);
        return TryReconstruct(a, m, bound, bound, out result);
    }

    /// <summary>Finds n/d with n ≡ a·d (mod m), |n| ≤ <paramref name="numeratorBound"/> and
    /// 0 &lt; d ≤ <paramref name="denominatorBound"/>, gcd(d, m) = 1.</summary>
    /// <param name="a">The residue.</param>
    /// <param name="m">The modulus.</param>
    /// <param name="numeratorBound">Bound N on |n|.</param>
    /// <param name="denominatorBound">Bound D on d.</param>
    /// <param name="result">The rational number when the call succeeds.</param>
    /// <returns>False when no fraction within the bounds exists.</returns>
    public static bool TryReconstruct(BigInteger a, BigInteger m, BigInteger numeratorBound, BigInteger denominatorBound, out Rational result)
    {
        result = default;
        if (m < 2) return false;
        a %= m;
        if (a.Sign < 0) a += m;
        BigInteger r0 = m, r1 = a, t0 = 0, t1 = 1;
        while (r1 > numeratorBound)
        {
            var q = BigInteger.DivRem(r0, r1, out var rem);
            (r0, r1) = (r1, rem);
            (t0, t1) = (t1, t0 - q * t1);
        }
        if (t1.IsZero || BigInteger.Abs(t1) > denominatorBound) return false;
        if (!BigInteger.GreatestCommonDivisor(t1, m).IsOne) return false;
        result = new Rational(t1.Sign < 0 ? -r1 : r1, BigInteger.Abs(t1));
        return true;
    }

    /// <summary>Integer square root ⌊√n⌋ by Newton's method.</summary>
    /// <param name="n">A non-negative integer.</param>
    /// <returns>⌊√n⌋.</returns>
    public static BigInteger Sqrt(BigInteger n)
    {
        if (n.Sign < 0) throw new ArgumentOutOfRangeException(nameof(n), "negative");
        if (n < 2) return n;
        var x = BigInteger.One << (int)((n.GetBitLength() + 1) / 2);
        while (true)
        {
            var y = (x + n / x) >> 1;
            if (y >= x) return x;
            x = y;
        }
    }
}
