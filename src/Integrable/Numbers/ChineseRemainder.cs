using System.Numerics;

namespace Integrable.Numbers;

/// <summary>Chinese remaindering: combining residues modulo coprime moduli into one residue modulo the
/// product, incrementally (Garner's step).</summary>
/// <example><code>
/// var (r, m) = ChineseRemainder.Combine(2, 3, 3, 5);   // r = 8, m = 15
/// </code></example>
public static class ChineseRemainder
{
    /// <summary>The unique r mod m1·m2 with r ≡ r1 (mod m1) and r ≡ r2 (mod m2).</summary>
    /// <param name="r1">Residue modulo <paramref name="m1"/>, in [0, m1).</param>
    /// <param name="m1">First modulus (any positive integer).</param>
    /// <param name="r2">Residue modulo <paramref name="m2"/>, in [0, m2).</param>
    /// <param name="m2">Second modulus, a word coprime to <paramref name="m1"/>.</param>
    /// <returns>The combined residue in [0, m1·m2) and the product modulus.</returns>
    /// <exception cref="ArithmeticException">The moduli are not coprime.</exception>
    public static (BigInteger Residue, BigInteger Modulus) Combine(BigInteger r1, BigInteger m1, ulong r2, ulong m2)
    {
        if (m1.Sign <= 0) throw new ArgumentOutOfRangeException(nameof(m1), "modulus must be positive");
        if (m2 < 2) throw new ArgumentOutOfRangeException(nameof(m2), "modulus must be at least 2");
        ulong m1ModM2 = (ulong)(m1 % m2);
        ulong inv = IntegerMath.InverseMod(m1ModM2, m2);
        ulong r1ModM2 = (ulong)(r1 % m2);
        // t = (r2 - r1) * m1^{-1} mod m2; r = r1 + m1 * t.
        ulong diff = r2 >= r1ModM2 ? r2 - r1ModM2 : r2 + (m2 - r1ModM2);
        ulong t = (ulong)((UInt128)diff * inv % m2);
        return (r1 + m1 * t, m1 * m2);
    }

    /// <summary>The symmetric representative of <paramref name="residue"/> modulo <paramref name="modulus"/>, in (−m/2, m/2].</summary>
    /// <param name="residue">A residue in [0, m).</param>
    /// <param name="modulus">The modulus.</param>
    /// <returns>The signed representative.</returns>
    public static BigInteger Symmetric(BigInteger residue, BigInteger modulus) =>
        residue * 2 > modulus ? residue - modulus : residue;
}
