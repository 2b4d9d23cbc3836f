using System.Numerics;
using System.Runtime.CompilerServices;
using Integrable.Numbers;

namespace Integrable.Kernels.Univariate;

/// <summary>Inlined arithmetic modulo a word-size prime p &lt; 2^62 for the polynomial kernels: Barrett
/// reduction of products (x &lt; p²), of arbitrary 64-bit words and of arbitrary 128-bit sums (for
/// delayed reduction), copied into a struct so the hot loops keep the constants in registers.</summary>
internal readonly struct ModulusReducer
{
    public readonly ulong P;
    private readonly int _k;          // bit length of p
    private readonly ulong _barrett;  // floor(4^k / p), for x < p^2
    private readonly ulong _m64;      // floor((2^64 - 1) / p), for any 64-bit x
    private readonly ulong _r64;      // 2^64 mod p

    /// <summary>How many products (each ≤ (p − 1)²) a 128-bit accumulator can take before it must be
    /// folded with <see cref="Reduce128"/>: ⌊(2^128 − 1)/(p − 1)²⌋, capped at int.MaxValue (16 for p ≈ 2^62).</summary>
    public readonly int DelayedTerms;

    public ModulusReducer(ulong p)
    {
        if (p < 2 || p >= PrimeField.ModulusLimit)
            throw new ArgumentOutOfRangeException(nameof(p), p, "modulus must satisfy 2 <= p < 2^62");
        P = p;
        _k = 64 - BitOperations.LeadingZeroCount(p);
        _barrett = (ulong)((UInt128.One << (2 * _k)) / p);
        _m64 = ulong.MaxValue / p;
        _r64 = (ulong)(((UInt128)1 << 64) % p);
        var sq = (UInt128)(p - 1) * (p - 1);
        var terms = sq == 0 ? UInt128.MaxValue : UInt128.MaxValue / sq;
        DelayedTerms = terms > int.MaxValue ? int.MaxValue : (int)terms;
    }

    /// <summary>x mod p for x = hi·2^64 + lo &lt; p².</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Reduce(ulong hi, ulong lo)
    {
        int k = _k;
        ulong q1 = (hi << (65 - k)) | (lo >> (k - 1));
        ulong q2hi = Math.BigMul(q1, _barrett, out ulong q2lo);
        ulong q3 = (q2hi << (63 - k)) | (q2lo >> (k + 1));
        ulong r = lo - q3 * P;   // r < 3p
        r -= P;
        r += P & (ulong)((long)r >> 63);
        r -= P;
        return r + (P & (ulong)((long)r >> 63));
    }

    /// <summary>x mod p for any 64-bit x.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Reduce64(ulong x)
    {
        ulong q = Math.BigMul(x, _m64, out _);
        ulong r = x - q * P;     // r < 3p
        r -= P;
        r += P & (ulong)((long)r >> 63);
        r -= P;
        return r + (P & (ulong)((long)r >> 63));
    }

    /// <summary>x mod p for any 128-bit x = hi·2^64 + lo.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Reduce128(ulong hi, ulong lo)
    {
        if (hi == 0) return Reduce64(lo);
        ulong h = Reduce64(hi);
        ulong th = Math.BigMul(h, _r64, out ulong tl);
        return Add(Reduce(th, tl), Reduce64(lo));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Mul(ulong a, ulong b)
    {
        ulong hi = Math.BigMul(a, b, out ulong lo);
        return Reduce(hi, lo);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Add(ulong a, ulong b)
    {
        ulong s = a + b - P;
        return s + (P & (ulong)((long)s >> 63));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Sub(ulong a, ulong b)
    {
        ulong d = a - b;
        return d + (P & (ulong)((long)d >> 63));
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Neg(ulong a) => a == 0 ? 0 : P - a;

    /// <summary>a⁻¹ mod p; a must be non-zero mod p.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public ulong Inverse(ulong a)
    {
        a %= P;
        if (a == 0) throw new DivideByZeroException($"zero has no inverse modulo {P}");
        if (P <= uint.MaxValue)
        {
            // 32-bit divisions are several times cheaper than 64-bit ones.
            long t32 = 0, nt32 = 1;
            uint r32 = (uint)P, nr32 = (uint)a;
            while (nr32 != 0)
            {
                uint q = r32 / nr32;
                (r32, nr32) = (nr32, r32 - q * nr32);
                (t32, nt32) = (nt32, t32 - q * nt32);
            }
            if (r32 != 1) throw new ArithmeticException($"{a} is not invertible modulo {P}");
            return t32 < 0 ? (ulong)(t32 + (long)P) : (ulong)t32;
        }
        // Extended Euclid on signed words: |t| stays below p < 2^62.
        long t = 0, newT = 1;
        ulong r = P, newR = a;
        while (newR != 0)
        {
            ulong q = r / newR;
            (r, newR) = (newR, r - q * newR);
            (t, newT) = (newT, t - (long)q * newT);
        }
        if (r != 1) throw new ArithmeticException($"{a} is not invertible modulo {P}");
        return t < 0 ? (ulong)(t + (long)P) : (ulong)t;
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public ulong Pow(ulong a, ulong e)
    {
        ulong r = 1 % P, b = a % P;
        while (e > 0)
        {
            if ((e & 1) != 0) r = Mul(r, b);
            b = Mul(b, b);
            e >>= 1;
        }
        return r;
    }
}
