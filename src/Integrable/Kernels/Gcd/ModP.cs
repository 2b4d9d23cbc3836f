using System.Numerics;
using System.Runtime.CompilerServices;
using Integrable.Numbers;

namespace Integrable.Kernels.Gcd;

/// <summary>Arithmetic modulo a word prime p &lt; 2^62 as a small value type, so that the modulus and
/// its Barrett constant live in registers inside the hot loops of the modular gcd.</summary>
/// <remarks>Same Barrett reduction as <see cref="PrimeField"/>: one 64×64→128-bit product for the
/// operands, one for the quotient estimate and at most two corrections.</remarks>
internal readonly struct ModP
{
    public readonly ulong P;
    private readonly ulong _barrett;
    private readonly int _k;

    public ModP(ulong p)
    {
        P = p;
        _k = 64 - BitOperations.LeadingZeroCount(p);
        _barrett = (ulong)((UInt128.One << (2 * _k)) / p);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Mul(ulong a, ulong b)
    {
        ulong hi = Math.BigMul(a, b, out ulong lo);
        return Reduce(hi, lo);
    }

    /// <summary>x mod p for x = hi·2^64 + lo &lt; p·2^64 (so also for any x &lt; p²).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Reduce(ulong hi, ulong lo)
    {
        int k = _k;
        ulong q1 = (hi << (65 - k)) | (lo >> (k - 1));
        ulong q2hi = Math.BigMul(q1, _barrett, out ulong q2lo);
        ulong q3 = (q2hi << (63 - k)) | (q2lo >> (k + 1));
        ulong r = lo - q3 * P;
        while (r >= P) r -= P;
        return r;
    }

    /// <summary>Shoup's precomputation for multiplying many values by the same w &lt; p: ⌊w·2^64/p⌋.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong ShoupFactor(ulong w) => (ulong)(((UInt128)w << 64) / P);

    /// <summary>x·w mod p for x &lt; p with <paramref name="wShoup"/> = <see cref="ShoupFactor"/>(w): one high
    /// and two low products, no 128-bit reduction.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong MulShoup(ulong x, ulong w, ulong wShoup)
    {
        ulong q = Math.BigMul(x, wShoup, out _);
        ulong r = x * w - q * P;
        return r >= P ? r - P : r;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Add(ulong a, ulong b)
    {
        ulong s = a + b;
        return s >= P ? s - P : s;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Sub(ulong a, ulong b) => a >= b ? a - b : a + P - b;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Neg(ulong a) => a == 0 ? 0 : P - a;

    /// <summary>Inverse of a non-zero residue.</summary>
    public ulong Inv(ulong a)
    {
        if (a == 0) throw new DivideByZeroException($"zero has no inverse modulo {P}");
        return IntegerMath.InverseMod(a, P);
    }

    public ulong Pow(ulong a, long e)
    {
        ulong r = 1, b = a;
        while (e > 0)
        {
            if ((e & 1) != 0) r = Mul(r, b);
            b = Mul(b, b);
            e >>= 1;
        }
        return r;
    }

    /// <summary>The residue of a signed word.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong FromLong(long v)
    {
        if (v >= 0) return (ulong)v < P ? (ulong)v : (ulong)v % P;
        ulong m = IntegerMath.UnsignedAbs(v) % P;
        return m == 0 ? 0 : P - m;
    }

    /// <summary>The residue of an integer-valued rational.</summary>
    public ulong FromInteger(in Rational r)
    {
        if (r.TryGetSmall(out long n, out _)) return FromLong(n);
        return FromBig(r.Numerator);
    }

    /// <summary>The residue of a big integer, by Horner over its 64-bit limbs (no allocation).</summary>
    public ulong FromBig(BigInteger x)
    {
        int bytes = x.GetByteCount(isUnsigned: false);
        Span<byte> buf = bytes <= 512 ? stackalloc byte[(bytes + 7) & ~7] : new byte[(bytes + 7) & ~7];
        var abs = BigInteger.Abs(x);
        buf.Clear();
        abs.TryWriteBytes(buf, out _, isUnsigned: true, isBigEndian: false);
        var limbs = System.Runtime.InteropServices.MemoryMarshal.Cast<byte, ulong>(buf);
        ulong t64 = (ulong)(((UInt128)1 << 64) % P);
        ulong r = 0;
        for (int i = limbs.Length - 1; i >= 0; i--) r = Add(Mul(r, t64), limbs[i] % P);
        return x.Sign < 0 ? Neg(r) : r;
    }

    /// <summary>The symmetric representative in (−p/2, p/2].</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public long Symmetric(ulong a) => a > P / 2 ? (long)a - (long)P : (long)a;
}
