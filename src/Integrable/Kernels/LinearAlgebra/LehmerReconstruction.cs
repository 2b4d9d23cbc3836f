using System.Numerics;
using System.Runtime.CompilerServices;
using Integrable.Numbers;

namespace Integrable.Kernels.LinearAlgebra;

/// <summary>Rational reconstruction with Lehmer's acceleration of the half-extended Euclidean algorithm:
/// runs of quotients are found from the leading 62 bits of the two remainders in 128-bit arithmetic
/// (Knuth, TAOCP vol. 2, §4.5.2, Algorithm L, with Collins' test that both bracketing quotients agree),
/// and applied to the big remainders and cofactors as one 2×2 matrix, so a modulus of b bits needs
/// about b/30 big-integer matrix steps instead of about b/2 divisions. The quotient sequence is the
/// exact Euclidean one, so the result is the same as <see cref="RationalReconstruction.TryReconstruct(BigInteger, BigInteger, BigInteger, BigInteger, out Rational)"/>.</summary>
internal static class LehmerReconstruction
{
    /// <summary>Finds n/d with n ≡ a·d (mod m), |n| ≤ <paramref name="numeratorBound"/>, 0 &lt; d ≤
    /// <paramref name="denominatorBound"/>, gcd(d, m) = 1.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static bool TryReconstruct(BigInteger a, BigInteger m, BigInteger numeratorBound, BigInteger denominatorBound, out Rational result)
    {
        result = default;
        if (m < 2) return false;
        a %= m;
        if (a.Sign < 0) a += m;
        BigInteger r0 = m, r1 = a, t0 = BigInteger.Zero, t1 = BigInteger.One;
        long boundBits = numeratorBound.IsZero ? 0 : numeratorBound.GetBitLength();
        while (r1 > numeratorBound)
        {
            long bits0 = r0.GetBitLength(), bits1 = r1.GetBitLength();
            // A Lehmer run lowers the remainders by at most about 62 bits, so with this margin it cannot
            // jump past the first remainder below the bound; the last steps are done one by one.
            if (bits0 > 64 && bits1 > boundBits + 130 && bits0 - bits1 < 32)
            {
                int shift = (int)(bits0 - 62);
                Int128 x = (Int128)(long)(r0 >> shift), y = (Int128)(long)(r1 >> shift);
                Int128 aa = 1, bb = 0, cc = 0, dd = 1;
                while (true)
                {
                    Int128 den1 = y + cc, den2 = y + dd;
                    if (den1 <= 0 || den2 <= 0) break;
                    Int128 num1 = x + aa, num2 = x + bb;
                    if (num1 < 0 || num2 < 0) break;
                    Int128 q = num1 / den1;
                    if (q != num2 / den2) break;
                    (aa, cc) = (cc, aa - q * cc);
                    (bb, dd) = (dd, bb - q * dd);
                    (x, y) = (y, x - q * y);
                }
                if (bb != 0)
                {
                    BigInteger A = (BigInteger)aa, B = (BigInteger)bb, C = (BigInteger)cc, D = (BigInteger)dd;
                    (r0, r1) = (A * r0 + B * r1, C * r0 + D * r1);
                    (t0, t1) = (A * t0 + B * t1, C * t0 + D * t1);
                    continue;
                }
            }
            var quotient = BigInteger.DivRem(r0, r1, out var rem);
            (r0, r1) = (r1, rem);
            (t0, t1) = (t1, t0 - quotient * t1);
        }
        if (t1.IsZero || BigInteger.Abs(t1) > denominatorBound) return false;
        if (!BigInteger.GreatestCommonDivisor(t1, m).IsOne) return false;
        result = new Rational(t1.Sign < 0 ? -r1 : r1, BigInteger.Abs(t1));
        return true;
    }
}
