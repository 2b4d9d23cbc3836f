using System.Numerics;
using System.Runtime.InteropServices;
using Integrable.Numbers;

namespace Integrable.Series;

/// <summary>A vector of signed integers stored as flat little-endian 64-bit magnitude limbs plus signs,
/// the input format of the multi-modular product (<see cref="MultiModular"/>).</summary>
internal sealed class IntegerVector
{
    public readonly int Length;
    public readonly ulong[] Limbs;
    public readonly int[] Start;      // coefficient i occupies Limbs[Start[i] .. Start[i+1])
    public readonly bool[] Negative;
    public readonly int[] Bits;       // bit length of |value|
    public readonly int MaxLimbs;

    private IntegerVector(int length, ulong[] limbs, int[] start, bool[] negative, int[] bits)
    {
        Length = length; Limbs = limbs; Start = start; Negative = negative; Bits = bits;
        int m = 0;
        for (int i = 0; i < length; i++) m = Math.Max(m, start[i + 1] - start[i]);
        MaxLimbs = m;
    }

    /// <summary>Scales rationals to integers: returns A with A_i = D·a_i where D is the lcm of the denominators.</summary>
    public static IntegerVector FromRationals(ReadOnlySpan<Rational> a, out BigInteger denominator)
    {
        int n = a.Length;
        bool allSmallIntegers = true;
        for (int i = 0; i < n; i++)
        {
            if (!a[i].TryGetSmall(out _, out long d) || d != 1) { allSmallIntegers = false; break; }
        }
        denominator = BigInteger.One;
        if (allSmallIntegers)
        {
            var limbs = new ulong[n];
            var start = new int[n + 1];
            var neg = new bool[n];
            var bits = new int[n];
            int pos = 0;
            for (int i = 0; i < n; i++)
            {
                a[i].TryGetSmall(out long v, out _);
                start[i] = pos;
                if (v != 0)
                {
                    ulong mag = IntegerMath.UnsignedAbs(v);
                    limbs[pos++] = mag;
                    neg[i] = v < 0;
                    bits[i] = 64 - BitOperations.LeadingZeroCount(mag);
                }
            }
            start[n] = pos;
            return new IntegerVector(n, limbs, start, neg, bits);
        }
        // Common denominator, with a word fast path.
        long dSmall = 1;
        bool small = true;
        BigInteger dBig = BigInteger.One;
        for (int i = 0; i < n; i++)
        {
            if (a[i].IsInteger) continue;
            if (small && a[i].TryGetSmall(out _, out long d))
            {
                long g = (long)IntegerMath.Gcd((ulong)dSmall, (ulong)d);
                long q = d / g;
                long hi = Math.BigMul(dSmall, q, out long lo);
                if (hi == 0 && lo > 0) { dSmall = lo; continue; }
            }
            if (small) { dBig = dSmall; small = false; }
            var den = a[i].Denominator;
            dBig = dBig / BigInteger.GreatestCommonDivisor(dBig, den) * den;
        }
        denominator = small ? new BigInteger(dSmall) : dBig;
        var values = new BigInteger[n];
        for (int i = 0; i < n; i++)
        {
            var r = a[i];
            if (r.IsZero) continue;
            values[i] = r.IsInteger ? r.Numerator * denominator : r.Numerator * (denominator / r.Denominator);
        }
        return FromBigIntegers(values);
    }

    /// <summary>Builds the vector from big integers.</summary>
    public static IntegerVector FromBigIntegers(ReadOnlySpan<BigInteger> values)
    {
        int n = values.Length;
        var start = new int[n + 1];
        var neg = new bool[n];
        var bits = new int[n];
        int total = 0;
        for (int i = 0; i < n; i++)
        {
            var v = values[i];
            if (v.IsZero) continue;
            long bl = v.Sign < 0 ? (-v).GetBitLength() : v.GetBitLength();
            bits[i] = checked((int)bl);
            total += (bits[i] + 63) >> 6;
        }
        var limbs = new ulong[total];
        int pos = 0;
        for (int i = 0; i < n; i++)
        {
            start[i] = pos;
            var v = values[i];
            if (v.IsZero) continue;
            neg[i] = v.Sign < 0;
            int count = (bits[i] + 63) >> 6;
            var mag = neg[i] ? -v : v;
            var bytes = MemoryMarshal.AsBytes(limbs.AsSpan(pos, count));
            if (!mag.TryWriteBytes(bytes, out _, isUnsigned: true, isBigEndian: false))
                throw new InvalidOperationException("limb conversion failed");
            pos += count;
        }
        start[n] = pos;
        return new IntegerVector(n, limbs, start, neg, bits);
    }

    /// <summary>Builds the vector from residues in [0, p) viewed as non-negative integers.</summary>
    public static IntegerVector FromResidues(ReadOnlySpan<ulong> values)
    {
        int n = values.Length;
        var limbs = new ulong[n];
        var start = new int[n + 1];
        var bits = new int[n];
        int pos = 0;
        for (int i = 0; i < n; i++)
        {
            start[i] = pos;
            if (values[i] != 0)
            {
                limbs[pos++] = values[i];
                bits[i] = 64 - BitOperations.LeadingZeroCount(values[i]);
            }
        }
        start[n] = pos;
        return new IntegerVector(n, limbs, start, new bool[n], bits);
    }

    /// <summary>Writes the residues modulo <paramref name="prime"/> of all entries into <paramref name="dest"/>.</summary>
    public void Reduce(NttPrime prime, Span<ulong> dest)
    {
        ulong p = prime.P;
        var f = prime.Field;
        // R[t] = 2^(64t) mod p.
        var r = new ulong[MaxLimbs];
        ulong t64 = (ulong)((UInt128.One << 64) % p);
        ulong t128 = f.Multiply(t64, t64);
        if (MaxLimbs > 0) r[0] = 1;
        for (int t = 1; t < MaxLimbs; t++) r[t] = f.Multiply(r[t - 1], t64);
        var limbs = Limbs;
        for (int i = 0; i < Length; i++)
        {
            int s = Start[i], e = Start[i + 1];
            ulong v;
            if (e == s) v = 0;
            else if (e - s == 1) v = limbs[s] % p;
            else
            {
                ulong lo = 0, mid = 0, top = 0;
                for (int t = s; t < e; t++)
                {
                    ulong hi = Math.BigMul(limbs[t], r[t - s], out ulong plo);
                    lo += plo;
                    hi += lo < plo ? 1UL : 0UL;
                    mid += hi;
                    if (mid < hi) top++;
                }
                v = Combine(lo, mid, top, f, t64, t128);
            }
            dest[i] = Negative[i] && v != 0 ? p - v : v;
        }
    }

    /// <summary>(top·2^128 + mid·2^64 + lo) mod p.</summary>
    internal static ulong Combine(ulong lo, ulong mid, ulong top, PrimeField f, ulong t64, ulong t128)
    {
        ulong p = f.Modulus;
        ulong v = f.Add(f.Multiply(mid % p, t64), lo % p);
        if (top != 0) v = f.Add(v, f.Multiply(top % p, t128));
        return v;
    }
}
