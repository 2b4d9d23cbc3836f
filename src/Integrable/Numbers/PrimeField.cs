using System.Numerics;
using System.Runtime.CompilerServices;
using Integrable.Algebra;

namespace Integrable.Numbers;

/// <summary>The finite field Z/pZ for a word-size prime p &lt; 2^62, as a ring context whose elements
/// are residues stored as <see cref="ulong"/> in [0, p).</summary>
/// <remarks>
/// Multiplication uses Barrett reduction with a precomputed reciprocal: one 64×64→128-bit product for
/// the operands, one for the quotient estimate and at most two corrections, with no 128-bit division.
/// Two fields are equal when their moduli are equal. Instances are immutable and thread-safe.
/// </remarks>
/// <example><code>
/// var f = new PrimeField(1_000_000_007);
/// ulong x = f.Multiply(f.FromInteger(-3), f.Inverse(7));   // −3/7 mod p
/// </code></example>
public sealed class PrimeField : IRing<ulong>, IEquatable<PrimeField>
{
    /// <summary>Largest modulus supported (exclusive): 2^62.</summary>
    public const ulong ModulusLimit = 1UL << 62;

    private readonly int _k;          // bit length of p
    private readonly ulong _barrett;  // floor(4^k / p)

    /// <summary>Creates Z/pZ for the prime <paramref name="modulus"/>.</summary>
    /// <param name="modulus">A prime with 2 ≤ p &lt; 2^62.</param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="modulus"/> is out of range.</exception>
    /// <exception cref="ArgumentException"><paramref name="modulus"/> is not prime.</exception>
    public PrimeField(ulong modulus)
    {
        if (modulus < 2 || modulus >= ModulusLimit)
            throw new ArgumentOutOfRangeException(nameof(modulus), modulus, "prime modulus must satisfy 2 <= p < 2^62");
        if (!Primes.IsPrime(modulus))
            throw new ArgumentException($"modulus {modulus} is not prime", nameof(modulus));
        Modulus = modulus;
        _k = 64 - BitOperations.LeadingZeroCount(modulus);
        _barrett = (ulong)((UInt128.One << (2 * _k)) / modulus);
    }

    /// <summary>The prime p.</summary>
    public ulong Modulus { get; }

    /// <inheritdoc/>
    public ulong Zero => 0;

    /// <inheritdoc/>
    public ulong One => 1 % Modulus;

    /// <summary>The residue of a signed integer.</summary>
    /// <param name="value">The integer.</param>
    /// <returns><paramref name="value"/> mod p in [0, p).</returns>
    public ulong FromInteger(long value)
    {
        long r = value % (long)Modulus;
        return (ulong)(r < 0 ? r + (long)Modulus : r);
    }

    /// <summary>The residue of a big integer.</summary>
    /// <param name="value">The integer.</param>
    /// <returns><paramref name="value"/> mod p in [0, p).</returns>
    public ulong FromBigInteger(BigInteger value)
    {
        var r = BigInteger.Remainder(value, Modulus);
        return (ulong)(r.Sign < 0 ? r + Modulus : r);
    }

    /// <summary>The image of a rational number a/b as a·b⁻¹ mod p.</summary>
    /// <param name="value">The rational.</param>
    /// <returns>The residue.</returns>
    /// <exception cref="DivideByZeroException">p divides the denominator.</exception>
    public ulong FromRational(Rational value)
    {
        if (value.TryGetSmall(out long n, out long d))
            return d == 1 ? FromInteger(n) : Multiply(FromInteger(n), Inverse(FromInteger(d)));
        return Multiply(FromBigInteger(value.Numerator), Inverse(FromBigInteger(value.Denominator)));
    }

    /// <summary>True when p does not divide the denominator of <paramref name="value"/>.</summary>
    /// <param name="value">The rational.</param>
    /// <returns>Whether <paramref name="value"/> has an image in Z/pZ.</returns>
    public bool CanReduce(Rational value) => FromBigInteger(value.Denominator) != 0;

    /// <inheritdoc/>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Add(ulong a, ulong b)
    {
        ulong s = a + b;
        return s >= Modulus ? s - Modulus : s;
    }

    /// <inheritdoc/>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Subtract(ulong a, ulong b) => a >= b ? a - b : a + Modulus - b;

    /// <inheritdoc/>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Negate(ulong a) => a == 0 ? 0 : Modulus - a;

    /// <inheritdoc/>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Multiply(ulong a, ulong b)
    {
        ulong hi = Math.BigMul(a, b, out ulong lo);
        return Reduce(hi, lo);
    }

    /// <summary>Reduces a 128-bit value x = hi·2^64 + lo &lt; p² modulo p (Barrett).</summary>
    /// <param name="hi">High word.</param>
    /// <param name="lo">Low word.</param>
    /// <returns>x mod p.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Reduce(ulong hi, ulong lo)
    {
        int k = _k;
        // q1 = x >> (k-1) fits in a word because x < p^2 < 2^(2k).
        ulong q1 = (hi << (65 - k)) | (lo >> (k - 1));
        ulong q2hi = Math.BigMul(q1, _barrett, out ulong q2lo);
        ulong q3 = (q2hi << (63 - k)) | (q2lo >> (k + 1));
        ulong r = lo - q3 * Modulus;
        while (r >= Modulus) r -= Modulus;
        return r;
    }

    /// <summary>a·b + c mod p.</summary>
    /// <param name="a">First factor.</param>
    /// <param name="b">Second factor.</param>
    /// <param name="c">Addend.</param>
    /// <returns>(a·b + c) mod p.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong MultiplyAdd(ulong a, ulong b, ulong c) => Add(Multiply(a, b), c);

    /// <summary>Multiplicative inverse.</summary>
    /// <param name="a">A non-zero residue.</param>
    /// <returns>a⁻¹ mod p.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="a"/> is zero mod p.</exception>
    public ulong Inverse(ulong a)
    {
        a %= Modulus;
        if (a == 0) throw new DivideByZeroException($"zero has no inverse modulo {Modulus}");
        return IntegerMath.InverseMod(a, Modulus);
    }

    /// <summary>a/b mod p.</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Non-zero divisor.</param>
    /// <returns>a·b⁻¹ mod p.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="b"/> is zero mod p.</exception>
    public ulong Divide(ulong a, ulong b) => Multiply(a, Inverse(b));

    /// <summary>Power by repeated squaring; negative exponents invert first.</summary>
    /// <param name="a">Base.</param>
    /// <param name="exponent">Exponent.</param>
    /// <returns>a^exponent mod p.</returns>
    /// <exception cref="DivideByZeroException">Zero to a negative power.</exception>
    public ulong Pow(ulong a, long exponent)
    {
        if (exponent < 0) { a = Inverse(a); exponent = -exponent; }
        ulong result = One, b = a % Modulus;
        while (exponent > 0)
        {
            if ((exponent & 1) != 0) result = Multiply(result, b);
            b = Multiply(b, b);
            exponent >>= 1;
        }
        return result;
    }

    /// <summary>The symmetric representative of a residue, in (−p/2, p/2].</summary>
    /// <param name="a">The residue.</param>
    /// <returns>The signed representative.</returns>
    public long Symmetric(ulong a) => a > Modulus / 2 ? (long)a - (long)Modulus : (long)a;

    /// <inheritdoc/>
    public bool IsZero(ulong a) => a == 0;

    /// <inheritdoc/>
    public bool AreEqual(ulong a, ulong b) => a == b;

    /// <inheritdoc/>
    public bool TryDivide(ulong a, ulong b, out ulong quotient)
    {
        if (b == 0) { quotient = 0; return false; }
        quotient = Divide(a, b);
        return true;
    }

    /// <summary>An element of this field with operators, for interactive use.</summary>
    /// <param name="value">Any integer; it is reduced.</param>
    /// <returns>The element.</returns>
    public ModularInteger Element(long value) => new(this, FromInteger(value));

    /// <inheritdoc/>
    public bool Equals(PrimeField? other) => other is not null && other.Modulus == Modulus;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as PrimeField);

    /// <inheritdoc/>
    public override int GetHashCode() => Modulus.GetHashCode();

    /// <summary>Text such as <c>Z/101Z</c>.</summary>
    /// <returns>The field's name.</returns>
    public override string ToString() => $"Z/{Modulus}Z";
}
