using System.Numerics;
using System.Runtime.CompilerServices;
using Integrable.Numbers;

namespace Integrable.Series;

/// <summary>A prime p = c·2^32 + 1 in (2^61, 2^62) with the tables for number-theoretic transforms
/// (NTT) of power-of-two length modulo p.</summary>
/// <remarks>
/// Transforms use Shoup's precomputed-quotient multiplication by the roots of unity and lazy reduction
/// (values kept in [0, 4p) ⊂ [0, 2^64)): forward transform by decimation in frequency (natural order in,
/// bit-reversed order out), inverse by decimation in time (bit-reversed in, natural out), so no
/// permutation pass is needed for convolutions. The prime list is deterministic (descending c), so
/// results are reproducible. Instances are immutable once their tables are published; tables grow on
/// demand under a lock.
/// </remarks>
internal sealed class NttPrime
{
    /// <summary>Largest supported transform length is 2^MaxLog.</summary>
    public const int MaxLog = 32;

    private static readonly List<NttPrime> Supply = new();
    private static readonly Lock SupplyLock = new();

    public readonly ulong P;
    public readonly PrimeField Field;
    private readonly ulong _root;      // primitive 2^MaxLog-th root of unity
    private readonly Lock _tableLock = new();
    private volatile Tables? _tables;

    private sealed class Tables(int log, ulong[] w, ulong[] ws, ulong[] iw, ulong[] iws)
    {
        public readonly int Log = log;
        public readonly ulong[] W = w, WShoup = ws, IW = iw, IWShoup = iws;
    }

    private NttPrime(ulong p)
    {
        P = p;
        Field = new PrimeField(p);
        ulong c = (p - 1) >> MaxLog;
        for (ulong g = 3; ; g++)
        {
            ulong w = Field.Pow(g, (long)c);
            if (Field.Pow(w, 1L << (MaxLog - 1)) == p - 1) { _root = w; break; }
        }
    }

    /// <summary>The <paramref name="index"/>-th prime of the supply (index 0 is the largest).</summary>
    public static NttPrime Get(int index)
    {
        lock (SupplyLock)
        {
            while (Supply.Count <= index)
            {
                ulong c = Supply.Count == 0 ? (PrimeField.ModulusLimit - 1) >> MaxLog : (Supply[^1].P - 1) >> MaxLog;
                while (true)
                {
                    c--;
                    ulong p = (c << MaxLog) + 1;
                    if (p < (1UL << 61)) throw new InvalidOperationException("NTT prime supply exhausted");
                    if (Primes.IsPrime(p)) { Supply.Add(new NttPrime(p)); break; }
                }
            }
            return Supply[index];
        }
    }

    private Tables GetTables(int log)
    {
        var t = _tables;
        if (t is not null && t.Log >= log) return t;
        lock (_tableLock)
        {
            t = _tables;
            if (t is not null && t.Log >= log) return t;
            int n = 1 << log;
            var w = new ulong[n]; var ws = new ulong[n]; var iw = new ulong[n]; var iws = new ulong[n];
            // W[len + j] = ω_{2len}^j for len = 1, 2, 4, …, n/2.
            for (int len = 1; len < n; len <<= 1)
            {
                int lg = BitOperations.Log2((uint)len) + 1;               // 2len = 2^lg
                ulong wl = Field.Pow(_root, 1L << (MaxLog - lg));        // primitive 2len-th root
                ulong iwl = Field.Inverse(wl);
                ulong a = 1, b = 1;
                for (int j = 0; j < len; j++)
                {
                    w[len + j] = a; ws[len + j] = ShoupOf(a);
                    iw[len + j] = b; iws[len + j] = ShoupOf(b);
                    a = Field.Multiply(a, wl); b = Field.Multiply(b, iwl);
                }
            }
            t = new Tables(log, w, ws, iw, iws);
            _tables = t;
            return t;
        }
    }

    /// <summary>⌊w·2^64 / p⌋, the Shoup companion of a constant multiplier w &lt; p.</summary>
    public ulong ShoupOf(ulong w) => (ulong)(((UInt128)w << 64) / P);

    /// <summary>x·w mod p up to one extra p: result in [0, 2p) for any x &lt; 2^64.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ulong MulShoupLazy(ulong x, ulong w, ulong wShoup, ulong p)
    {
        ulong q = Math.BigMul(x, wShoup, out _);
        return x * w - q * p;
    }

    /// <summary>x·w mod p, fully reduced.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ulong MulShoup(ulong x, ulong w, ulong wShoup, ulong p)
    {
        ulong r = MulShoupLazy(x, w, wShoup, p);
        return r >= p ? r - p : r;
    }

    /// <summary>In-place forward transform of length 2^log; input in [0, 2p), output in [0, 2p) in bit-reversed order.</summary>
    public void Forward(Span<ulong> a, int log)
    {
        var t = GetTables(log);
        ulong p = P, p2 = 2 * p;
        int n = 1 << log;
        a = a[..n];
        for (int len = n >> 1; len >= 4; len >>= 1)
        {
            var wl = new ReadOnlySpan<ulong>(t.W, len, len);
            var wsl = new ReadOnlySpan<ulong>(t.WShoup, len, len);
            for (int start = 0; start < n; start += 2 * len)
            {
                var lo = a.Slice(start, len);
                var hi = a.Slice(start + len, len);
                for (int j = 0; j < lo.Length; j++)
                {
                    ulong u = lo[j], v = hi[j];
                    ulong s = u + v;
                    lo[j] = s >= p2 ? s - p2 : s;
                    hi[j] = MulShoupLazy(u - v + p2, wl[j], wsl[j], p);
                }
            }
        }
        if (n >= 4)
        {
            ulong w1 = t.W[3], w1s = t.WShoup[3];    // ω_4 (W[2] = 1)
            for (int s0 = 0; s0 + 3 < a.Length; s0 += 4)
            {
                ulong u0 = a[s0], u1 = a[s0 + 1], v0 = a[s0 + 2], v1 = a[s0 + 3];
                ulong x0 = u0 + v0; if (x0 >= p2) x0 -= p2;
                ulong x1 = u1 + v1; if (x1 >= p2) x1 -= p2;
                ulong y0 = u0 - v0 + p2; if (y0 >= p2) y0 -= p2;
                ulong y1 = MulShoupLazy(u1 - v1 + p2, w1, w1s, p);
                // len = 1 stage on (x0, x1) and (y0, y1); ω_2^0 = 1.
                ulong s = x0 + x1; a[s0] = s >= p2 ? s - p2 : s;
                ulong d = x0 - x1 + p2; a[s0 + 1] = d >= p2 ? d - p2 : d;
                s = y0 + y1; a[s0 + 2] = s >= p2 ? s - p2 : s;
                d = y0 - y1 + p2; a[s0 + 3] = d >= p2 ? d - p2 : d;
            }
        }
        else if (n == 2)
        {
            ulong u = a[0], v = a[1];
            ulong s = u + v; a[0] = s >= p2 ? s - p2 : s;
            ulong d = u - v + p2; a[1] = d >= p2 ? d - p2 : d;
        }
    }

    /// <summary>In-place inverse transform of length 2^log including the factor 1/n; input in [0, 2p) bit-reversed,
    /// output fully reduced in natural order.</summary>
    public void Inverse(Span<ulong> a, int log)
    {
        var t = GetTables(log);
        ulong p = P, p2 = 2 * p;
        int n = 1 << log;
        a = a[..n];
        if (n >= 4)
        {
            ulong w1 = t.IW[3], w1s = t.IWShoup[3];
            for (int s0 = 0; s0 + 3 < a.Length; s0 += 4)
            {
                ulong a0 = a[s0], a1 = a[s0 + 1], a2 = a[s0 + 2], a3 = a[s0 + 3];
                if (a0 >= p2) a0 -= p2;
                if (a1 >= p2) a1 -= p2;
                if (a2 >= p2) a2 -= p2;
                if (a3 >= p2) a3 -= p2;
                // len = 1: (a0, a1) and (a2, a3), outputs in [0, 2p) after one correction.
                ulong x0 = a0 + a1; if (x0 >= p2) x0 -= p2;
                ulong x1 = a0 - a1 + p2; if (x1 >= p2) x1 -= p2;
                ulong y0 = a2 + a3; if (y0 >= p2) y0 -= p2;
                ulong y1 = a2 - a3 + p2; if (y1 >= p2) y1 -= p2;
                // len = 2 with twiddles 1 and ω_4^{-1}; outputs in [0, 4p).
                a[s0] = x0 + y0;
                a[s0 + 2] = x0 - y0 + p2;
                ulong v = MulShoupLazy(y1, w1, w1s, p);
                a[s0 + 1] = x1 + v;
                a[s0 + 3] = x1 - v + p2;
            }
        }
        else if (n == 2)
        {
            ulong u = a[0], v = a[1];
            if (u >= p2) u -= p2;
            if (v >= p2) v -= p2;
            a[0] = u + v;
            a[1] = u - v + p2;
        }
        for (int len = 4; len < n; len <<= 1)
        {
            var wl = new ReadOnlySpan<ulong>(t.IW, len, len);
            var wsl = new ReadOnlySpan<ulong>(t.IWShoup, len, len);
            for (int start = 0; start < n; start += 2 * len)
            {
                var lo = a.Slice(start, len);
                var hi = a.Slice(start + len, len);
                for (int j = 0; j < lo.Length; j++)
                {
                    ulong u = lo[j];
                    if (u >= p2) u -= p2;
                    ulong v = MulShoupLazy(hi[j], wl[j], wsl[j], p);
                    lo[j] = u + v;
                    hi[j] = u - v + p2;
                }
            }
        }
        ulong ninv = Field.Inverse((ulong)n % p), ninvS = ShoupOf(ninv);
        for (int i = 0; i < a.Length; i++) a[i] = MulShoup(a[i], ninv, ninvS, p);
    }

    /// <summary>Pointwise product a[i] ← a[i]·b[i] mod p, inputs in [0, 2p), output in [0, p).</summary>
    public void PointwiseMultiply(Span<ulong> a, ReadOnlySpan<ulong> b)
    {
        ulong p = P;
        var f = Field;
        for (int i = 0; i < a.Length; i++)
        {
            ulong x = a[i], y = b[i];
            if (x >= p) x -= p;
            if (y >= p) y -= p;
            a[i] = f.Multiply(x, y);
        }
    }

    /// <summary>Pointwise square a[i] ← a[i]² mod p.</summary>
    public void PointwiseSquare(Span<ulong> a)
    {
        ulong p = P;
        var f = Field;
        for (int i = 0; i < a.Length; i++)
        {
            ulong x = a[i];
            if (x >= p) x -= p;
            a[i] = f.Multiply(x, x);
        }
    }

    /// <summary>Truncated product of two residue vectors (entries in [0, p)) by transforms: the first
    /// <paramref name="result"/>.Length coefficients of a·b.</summary>
    public void Multiply(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, Span<ulong> result, bool square)
    {
        int full = a.Length + b.Length - 1;
        int log = full <= 1 ? 0 : BitOperations.Log2((uint)(full - 1)) + 1;
        var fa = new ulong[1 << log];
        Multiply(a, b, result, square, fa, square ? fa : new ulong[1 << log]);
    }

    /// <summary>As <see cref="Multiply(ReadOnlySpan{ulong}, ReadOnlySpan{ulong}, Span{ulong}, bool)"/> with caller-supplied
    /// scratch arrays of the transform length 2^⌈log₂(a.Length + b.Length − 1)⌉ (the same array twice when squaring).</summary>
    public void Multiply(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, Span<ulong> result, bool square, ulong[] fa, ulong[] fb)
    {
        int n = fa.Length;
        int log = BitOperations.Log2((uint)n);
        a.CopyTo(fa);
        fa.AsSpan(a.Length).Clear();
        Forward(fa, log);
        if (square)
        {
            PointwiseSquare(fa);
        }
        else
        {
            b.CopyTo(fb);
            fb.AsSpan(b.Length).Clear();
            Forward(fb, log);
            PointwiseMultiply(fa, fb);
        }
        Inverse(fa, log);
        int m = Math.Min(result.Length, n);
        fa.AsSpan(0, m).CopyTo(result);
        result[m..].Clear();
    }
}
