using System.Numerics;
using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Tests.Text;

/// <summary>The integers Z: division only when exact, rationals only when integral.</summary>
internal sealed class IntegerRing : IRing<BigInteger>
{
    public static IntegerRing Instance { get; } = new();
    public BigInteger Zero => BigInteger.Zero;
    public BigInteger One => BigInteger.One;
    public BigInteger FromInteger(long value) => value;
    public BigInteger FromRational(Rational value) =>
        value.IsInteger ? value.Numerator : throw new DivideByZeroException($"{value} is not an integer.");
    public BigInteger Add(BigInteger a, BigInteger b) => a + b;
    public BigInteger Subtract(BigInteger a, BigInteger b) => a - b;
    public BigInteger Multiply(BigInteger a, BigInteger b) => a * b;
    public BigInteger Negate(BigInteger a) => -a;
    public bool IsZero(BigInteger a) => a.IsZero;
    public bool AreEqual(BigInteger a, BigInteger b) => a == b;
    public bool TryDivide(BigInteger a, BigInteger b, out BigInteger quotient)
    {
        quotient = default;
        if (b.IsZero) return false;
        var q = BigInteger.DivRem(a, b, out var r);
        if (!r.IsZero) return false;
        quotient = q;
        return true;
    }
}

/// <summary>Z/pZ for a word-size prime p that counts its multiplications (to check repeated squaring).</summary>
internal sealed class CountingPrimeField(long p) : IRing<long>
{
    public int Multiplications { get; private set; }
    public long Zero => 0;
    public long One => 1;
    public long FromInteger(long value) => ((value % p) + p) % p;
    public long FromRational(Rational value)
    {
        long n = (long)(value.Numerator % p), d = (long)(value.Denominator % p);
        if (d == 0) throw new DivideByZeroException("Denominator divisible by p.");
        return Mul(FromInteger(n), Inverse(d));
    }
    public long Add(long a, long b) => (a + b) % p;
    public long Subtract(long a, long b) => (a - b + p) % p;
    public long Multiply(long a, long b)
    {
        Multiplications++;
        return Mul(a, b);
    }
    public long Negate(long a) => (p - a) % p;
    public bool IsZero(long a) => a == 0;
    public bool AreEqual(long a, long b) => a == b;
    public bool TryDivide(long a, long b, out long quotient)
    {
        quotient = 0;
        if (b == 0) return false;
        quotient = Mul(a, Inverse(b));
        return true;
    }
    private long Mul(long a, long b) => (long)((Int128)a * b % p);
    private long Inverse(long a) => (long)BigInteger.ModPow(a, p - 2, p); // Fermat: a^(p-2) = a^-1 mod prime p
}
