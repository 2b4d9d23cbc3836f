using System.Numerics;
using System.Runtime.CompilerServices;

namespace Integrable.Numbers;

/// <summary>Integer helpers shared by the number types: greatest common divisors, modular inverses
/// and exact narrowing of wide integers.</summary>
public static class IntegerMath
{
    /// <summary>Greatest common divisor of two unsigned words by the binary (Stein) algorithm.</summary>
    /// <param name="a">First operand.</param>
    /// <param name="b">Second operand.</param>
    /// <returns>gcd(<paramref name="a"/>, <paramref name="b"/>); gcd(0, 0) = 0.</returns>
    /// <example><c>IntegerMath.Gcd(12UL, 18UL) == 6</c></example>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ulong Gcd(ulong a, ulong b)
    {
        if (a == 0) return b;
        if (b == 0) return a;
        int shift = BitOperations.TrailingZeroCount(a | b);
        a >>= BitOperations.TrailingZeroCount(a);
        do
        {
            b >>= BitOperations.TrailingZeroCount(b);
            if (a > b) (a, b) = (b, a);
            b -= a;
        } while (b != 0);
        return a << shift;
    }

    /// <summary>Greatest common divisor of the absolute values of two signed words.</summary>
    /// <param name="a">First operand.</param>
    /// <param name="b">Second operand.</param>
    /// <returns>gcd(|<paramref name="a"/>|, |<paramref name="b"/>|) as an unsigned word (it can be 2^63).</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ulong Gcd(long a, long b) => Gcd(UnsignedAbs(a), UnsignedAbs(b));

    /// <summary>Greatest common divisor of two big integers (non-negative result).</summary>
    /// <param name="a">First operand.</param>
    /// <param name="b">Second operand.</param>
    /// <returns>gcd(|<paramref name="a"/>|, |<paramref name="b"/>|).</returns>
    public static BigInteger Gcd(BigInteger a, BigInteger b) => BigInteger.GreatestCommonDivisor(a, b);

    /// <summary>Absolute value of a signed word as an unsigned word (exact also for <see cref="long.MinValue"/>).</summary>
    /// <param name="a">The value.</param>
    /// <returns>|<paramref name="a"/>|.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ulong UnsignedAbs(long a) => a < 0 ? (ulong)(-(a + 1)) + 1UL : (ulong)a;

    /// <summary>Narrows a 128-bit integer to a word when it fits in (<see cref="long.MinValue"/>, <see cref="long.MaxValue"/>].</summary>
    /// <param name="value">The wide value.</param>
    /// <param name="result">The value as a word when the call succeeds.</param>
    /// <returns>True when <paramref name="value"/> lies strictly above <see cref="long.MinValue"/> and at most <see cref="long.MaxValue"/>.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool TryNarrow(Int128 value, out long result)
    {
        result = (long)value;
        return result == value && result != long.MinValue;
    }

    /// <summary>Inverse of <paramref name="a"/> modulo <paramref name="m"/> by the extended Euclidean algorithm.</summary>
    /// <param name="a">The value to invert; any residue.</param>
    /// <param name="m">The modulus, at least 2.</param>
    /// <returns>The unique x in [0, m) with a·x ≡ 1 (mod m).</returns>
    /// <exception cref="ArithmeticException"><paramref name="a"/> is not invertible modulo <paramref name="m"/>.</exception>
    public static ulong InverseMod(ulong a, ulong m)
    {
        if (m < 2) throw new ArgumentOutOfRangeException(nameof(m), m, "modulus must be at least 2");
        Int128 t = 0, newT = 1;
        ulong r = m, newR = a % m;
        while (newR != 0)
        {
            ulong q = r / newR;
            (r, newR) = (newR, r - q * newR);
            (t, newT) = (newT, t - (Int128)q * newT);
        }
        if (r != 1) throw new ArithmeticException($"{a} is not invertible modulo {m}.");
        Int128 x = t % m;
        return (ulong)(x < 0 ? x + m : x);
    }

    /// <summary>Binomial coefficient C(<paramref name="n"/>, <paramref name="k"/>) as a big integer.</summary>
    /// <param name="n">Upper index, non-negative.</param>
    /// <param name="k">Lower index.</param>
    /// <returns>The binomial coefficient; 0 when <paramref name="k"/> is outside [0, n].</returns>
    public static BigInteger Binomial(int n, int k)
    {
        if (n < 0) throw new ArgumentOutOfRangeException(nameof(n), n, "must be non-negative");
        if (k < 0 || k > n) return BigInteger.Zero;
        k = Math.Min(k, n - k);
        BigInteger r = BigInteger.One;
        for (int i = 1; i <= k; i++) r = r * (n - k + i) / i;
        return r;
    }
}
