using System.Numerics;
using System.Runtime.InteropServices;

namespace Integrable.Series;

/// <summary>Multi-modular product of integer polynomials: reduce modulo several NTT primes, multiply
/// each image by transforms, and recover every coefficient by Chinese remaindering (Garner's mixed-radix
/// form) with the symmetric representative.</summary>
/// <remarks>
/// The number of primes is chosen per output coefficient from a rigorous bound
/// |c_k| ≤ (number of terms) · max_{i+j=k} |a_i|·|b_j|, where the maximum is bounded blockwise (a max-plus
/// convolution of block maxima of the bit lengths, about 64 blocks per operand). Each prime exceeds
/// 2^61, so K primes determine any integer of absolute value below 2^(61K−1). Coefficients whose bound
/// needs fewer primes are reconstructed from a prefix of the primes, so data whose sizes grow along the
/// series (Catalan-like) costs about a third of the uniform worst case in the remaindering step.
/// </remarks>
internal static class MultiModular
{
    private const int BitsPerPrime = 61;

    /// <summary>Truncated product: the first min(n, la+lb−1) coefficients of a·b, exactly.</summary>
    public static BigInteger[] Multiply(IntegerVector a, IntegerVector b, int n, bool square)
    {
        int la = a.Length, lb = b.Length;
        if (la == 0 || lb == 0 || n <= 0) return [];
        int m = Math.Min(n, la + lb - 1);
        var counts = PrimeCounts(a, b, m, out int kMax);
        var result = new BigInteger[m];
        if (kMax == 0) return result;
        // One image per prime (kept per prime so no array reaches the large-object heap), then one
        // reconstruction per coefficient from the prefix of primes its bound needs.
        var images = new ulong[kMax][];
        var ra = new ulong[Math.Min(la, m)];
        var rb = square ? ra : new ulong[Math.Min(lb, m)];
        int full = ra.Length + rb.Length - 1;
        int log = full <= 1 ? 0 : BitOperations.Log2((uint)(full - 1)) + 1;
        var fa = new ulong[1 << log];
        var fb = square ? fa : new ulong[1 << log];
        for (int j = 0; j < kMax; j++)
        {
            var prime = NttPrime.Get(j);
            ReduceTruncated(a, prime, ra);
            if (!square) ReduceTruncated(b, prime, rb);
            images[j] = new ulong[m];
            prime.Multiply(ra, rb, images[j], square, fa, fb);
        }
        var basis = CrtBasis.Get(kMax);
        var scratch = new ulong[kMax + 2];
        var digits = new ulong[kMax];
        var residues = new ulong[kMax];
        for (int k = 0; k < m; k++)
        {
            int c = counts[k];
            for (int j = 0; j < c; j++) residues[j] = images[j][k];
            result[k] = basis.Reconstruct(residues.AsSpan(0, c), digits, scratch);
        }
        return result;
    }

    private static void ReduceTruncated(IntegerVector v, NttPrime prime, ulong[] dest)
    {
        if (dest.Length == v.Length) { v.Reduce(prime, dest); return; }
        var full = new ulong[v.Length];
        v.Reduce(prime, full);
        full.AsSpan(0, dest.Length).CopyTo(dest);
    }

    /// <summary>Number of primes needed for each output coefficient.</summary>
    private static int[] PrimeCounts(IntegerVector a, IntegerVector b, int m, out int kMax)
    {
        int la = Math.Min(a.Length, m), lb = Math.Min(b.Length, m);
        int block = Math.Max(1, (Math.Max(la, lb) + 63) / 64);
        int na = (la + block - 1) / block, nb = (lb + block - 1) / block;
        var ma = BlockMax(a.Bits, la, block, na);
        var mb = BlockMax(b.Bits, lb, block, nb);
        var s = new int[na + nb - 1];
        Array.Fill(s, -1);
        for (int i = 0; i < na; i++)
        {
            if (ma[i] < 0) continue;
            for (int j = 0; j < nb; j++)
                if (mb[j] >= 0) s[i + j] = Math.Max(s[i + j], ma[i] + mb[j]);
        }
        var counts = new int[m];
        kMax = 0;
        for (int k = 0; k < m; k++)
        {
            int hi = Math.Min(k / block, s.Length - 1);
            int lo = Math.Max(0, (k + 2 + block - 1) / block - 2);
            int best = -1;
            for (int t = lo; t <= hi; t++) best = Math.Max(best, s[t]);
            if (best < 0) { counts[k] = 0; continue; }
            int terms = Math.Min(k + 1, Math.Min(la, lb));
            int bits = best + (terms <= 1 ? 0 : 32 - BitOperations.LeadingZeroCount((uint)(terms - 1))) + 1; // + sign
            int c = (bits + BitsPerPrime - 1) / BitsPerPrime;
            counts[k] = c;
            kMax = Math.Max(kMax, c);
        }
        return counts;
    }

    private static int[] BlockMax(int[] bits, int len, int block, int nblocks)
    {
        var r = new int[nblocks];
        Array.Fill(r, -1);
        for (int i = 0; i < len; i++)
            if (bits[i] > 0) r[i / block] = Math.Max(r[i / block], bits[i]);
        return r;
    }
}

/// <summary>Precomputed constants for Garner's algorithm over the first K NTT primes.</summary>
internal sealed class CrtBasis
{
    private static volatile CrtBasis? _cached;
    private static readonly Lock CacheLock = new();

    private readonly int _k;
    private readonly ulong[] _p;
    private readonly ulong[][] _prefixMod;         // [i][j] = p_0…p_{j−1} mod p_i (j < i)
    private readonly ulong[] _t64, _t128;          // 2^64, 2^128 mod p_i
    private readonly Numbers.PrimeField[] _fields;
    private readonly ulong[] _inv, _invShoup;      // (p_0…p_{i−1})^{-1} mod p_i
    private readonly ulong[][] _prefixLimbs;       // [c] = limbs of p_0…p_{c−1}

    private CrtBasis(int k)
    {
        _k = k;
        _p = new ulong[k];
        var primes = new NttPrime[k];
        for (int i = 0; i < k; i++) { primes[i] = NttPrime.Get(i); _p[i] = primes[i].P; }
        _prefixMod = new ulong[k][];
        _inv = new ulong[k]; _invShoup = new ulong[k];
        _t64 = new ulong[k]; _t128 = new ulong[k];
        _fields = new Numbers.PrimeField[k];
        for (int i = 0; i < k; i++)
        {
            var f = primes[i].Field;
            _fields[i] = f;
            _t64[i] = (ulong)((UInt128.One << 64) % _p[i]);
            _t128[i] = f.Multiply(_t64[i], _t64[i]);
            _prefixMod[i] = new ulong[i];
            ulong prefix = 1 % _p[i];
            for (int j = 0; j < i; j++)
            {
                _prefixMod[i][j] = prefix;                  // p_0…p_{j−1} mod p_i
                prefix = f.Multiply(prefix, _p[j] % _p[i]);
            }
            _inv[i] = i == 0 ? 1 : f.Inverse(prefix);
            _invShoup[i] = primes[i].ShoupOf(_inv[i]);
        }
        _prefixLimbs = new ulong[k + 1][];
        _prefixLimbs[0] = [1];
        for (int c = 1; c <= k; c++)
        {
            var prev = _prefixLimbs[c - 1];
            var next = new ulong[prev.Length + 1];
            ulong carry = 0;
            for (int t = 0; t < prev.Length; t++)
            {
                ulong hi = Math.BigMul(prev[t], _p[c - 1], out ulong lo);
                lo += carry;
                if (lo < carry) hi++;
                next[t] = lo;
                carry = hi;
            }
            next[prev.Length] = carry;
            _prefixLimbs[c] = next;
        }
    }

    /// <summary>A basis for at least <paramref name="k"/> primes (cached, grown on demand).</summary>
    public static CrtBasis Get(int k)
    {
        var c = _cached;
        if (c is not null && c._k >= k) return c;
        lock (CacheLock)
        {
            c = _cached;
            if (c is not null && c._k >= k) return c;
            c = new CrtBasis(Math.Max(k, c is null ? 0 : c._k * 2));
            _cached = c;
            return c;
        }
    }

    /// <summary>The integer x with |x| &lt; (p_0…p_{c−1})/2 and x ≡ r_i (mod p_i) for i &lt; c = residues.Length.</summary>
    public BigInteger Reconstruct(ReadOnlySpan<ulong> residues, ulong[] v, ulong[] limbs)
    {
        int c = residues.Length;
        if (c == 0) return BigInteger.Zero;
        v[0] = residues[0];
        for (int i = 1; i < c; i++)
        {
            // s = Σ_{j<i} v_j·(p_0…p_{j−1}) mod p_i, accumulated in 192 bits and reduced once.
            ulong pi = _p[i];
            var pm = _prefixMod[i];
            ulong lo = 0, mid = 0, top = 0;
            for (int j = 0; j < i; j++)
            {
                ulong hi = Math.BigMul(v[j], pm[j], out ulong plo);
                lo += plo;
                hi += lo < plo ? 1UL : 0UL;
                mid += hi;
                if (mid < hi) top++;
            }
            ulong s = IntegerVector.Combine(lo, mid, top, _fields[i], _t64[i], _t128[i]);
            ulong d = residues[i] >= s ? residues[i] - s : residues[i] + pi - s;
            v[i] = NttPrime.MulShoup(d, _inv[i], _invShoup[i], pi);
        }
        // x = v_0 + p_0 (v_1 + p_1 (v_2 + …)), evaluated from the top in limbs.
        int len = 1;
        limbs[0] = v[c - 1];
        for (int i = c - 2; i >= 0; i--)
        {
            ulong carry = v[i], p = _p[i];
            for (int t = 0; t < len; t++)
            {
                ulong hi = Math.BigMul(limbs[t], p, out ulong lo);
                lo += carry;
                if (lo < carry) hi++;
                limbs[t] = lo;
                carry = hi;
            }
            if (carry != 0) limbs[len++] = carry;
        }
        while (len > 0 && limbs[len - 1] == 0) len--;
        if (len == 0) return BigInteger.Zero;
        // Symmetric representative: if M − x < x the value is −(M − x).
        var m = _prefixLimbs[c];
        var y = new ulong[m.Length];
        ulong borrow = 0;
        for (int t = 0; t < m.Length; t++)
        {
            ulong xt = t < len ? limbs[t] : 0;
            ulong d = m[t] - xt;
            ulong b1 = m[t] < xt ? 1UL : 0UL;
            ulong d2 = d - borrow;
            ulong b2 = d < borrow ? 1UL : 0UL;
            y[t] = d2;
            borrow = b1 | b2;
        }
        int ylen = y.Length;
        while (ylen > 0 && y[ylen - 1] == 0) ylen--;
        bool negative = Compare(y.AsSpan(0, ylen), limbs.AsSpan(0, len)) < 0;
        var mag = negative ? y.AsSpan(0, ylen) : limbs.AsSpan(0, len);
        var value = new BigInteger(MemoryMarshal.AsBytes(mag), isUnsigned: true, isBigEndian: false);
        return negative ? -value : value;
    }

    private static int Compare(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        if (a.Length != b.Length) return a.Length.CompareTo(b.Length);
        for (int t = a.Length - 1; t >= 0; t--)
            if (a[t] != b[t]) return a[t].CompareTo(b[t]);
        return 0;
    }
}
