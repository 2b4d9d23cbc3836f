using System.Runtime.CompilerServices;
namespace Integrable.Kernels.Univariate;

internal static partial class PolyMod
{
    /// <summary>In place r0 ← r0 mod r1; the quotient goes to q[0 … l0 − l1]. Returns the trimmed length of
    /// the remainder. The quotient is found top-down, then every remainder coefficient
    /// r0[i] + Σ_k (p − q[k])·r1[i − k] is accumulated exactly and reduced once (in one word when
    /// (lq + 1)·p² &lt; 2^64, the usual case of a degree-one quotient and p &lt; 2^31).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int RemainderInPlace(in ModulusReducer mod, Span<ulong> r0, int l0, ReadOnlySpan<ulong> r1, int l1, Span<ulong> q)
    {
        ulong inv = mod.Inverse(r1[l1 - 1]);
        int lq = l0 - l1 + 1;
        for (int k = lq - 1; k >= 0; k--)
        {
            // q[k] = (r0[k + l1 − 1] − Σ_{j ≥ 1} q[k + j]·r1[l1 − 1 − j]) / lc(r1)
            ulong t = r0[k + l1 - 1];
            int jmax = Math.Min(lq - 1 - k, l1 - 1);
            for (int j = 1; j <= jmax; j++) t = mod.Sub(t, mod.Mul(q[k + j], r1[l1 - 1 - j]));
            q[k] = mod.Mul(t, inv);
        }
        SubtractProductLow(mod, r0, q[..lq], r1[..l1], l1 - 1);
        r0[(l1 - 1)..l0].Clear();
        return TrimmedLength(r0[..(l1 - 1)]);
    }

    /// <summary>dst[i] ← dst[i] − Σ_k q[k]·src[i − k] for i &lt; n (src shorter than i − k contributes 0).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void SubtractProductLow(in ModulusReducer mod, Span<ulong> dst, ReadOnlySpan<ulong> q, ReadOnlySpan<ulong> src, int n)
    {
        int lq = q.Length, ls = src.Length;
        ulong p = mod.P;
        Span<ulong> nq = lq <= 64 ? stackalloc ulong[lq] : new ulong[lq];
        for (int k = 0; k < lq; k++) nq[k] = q[k] == 0 ? 0 : p - q[k];
        bool oneWord = p < (1UL << 31) && lq <= 3;                       // (lq + 1)·p² < 2^64
        if (oneWord && lq == 2)
        {
            ulong n0 = nq[0], n1 = nq[1];
            int i = 0;
            if (n > 0 && ls > 0) { dst[0] = mod.Reduce64(dst[0] + n0 * src[0]); i = 1; }
            int both = Math.Min(n, ls);
            for (; i < both; i++) dst[i] = mod.Reduce64(dst[i] + n0 * src[i] + n1 * src[i - 1]);
            for (; i < n && i - 1 < ls; i++) dst[i] = mod.Reduce64(dst[i] + n1 * src[i - 1]);
            return;
        }
        if (!oneWord && lq <= 4)
        {
            // Large p with a short quotient: Shoup products by the fixed factor p − q[k] with the
            // precomputed quotient ⌊(p − q[k])·2^64/p⌋ (one high and two low multiplications per term)
            // beat a 128-bit sum whose final reduction needs three reductions once the high word is set.
            for (int k = 0; k < lq; k++)
            {
                ulong w = nq[k];
                if (w == 0) continue;
                ulong wq = (ulong)(((UInt128)w << 64) / p);
                int iEnd = Math.Min(n, ls + k);
                for (int i = k; i < iEnd; i++)
                {
                    ulong x = src[i - k];
                    ulong r = x * w - Math.BigMul(x, wq, out _) * p;     // x·w mod p, in [0, 2p)
                    r -= p;
                    r += p & (ulong)((long)r >> 63);
                    dst[i] = mod.Add(dst[i], r);
                }
            }
            return;
        }
        for (int i = 0; i < n; i++)
        {
            int k0 = Math.Max(0, i - ls + 1), k1 = Math.Min(i, lq - 1);
            if (k0 > k1) continue;
            if (oneWord)
            {
                ulong acc = dst[i];
                for (int k = k0; k <= k1; k++) acc += nq[k] * src[i - k];
                dst[i] = mod.Reduce64(acc);
                continue;
            }
            ulong hi = 0, lo = dst[i];
            int cnt = 1, lim = mod.DelayedTerms;
            for (int k = k0; k <= k1; k++)
            {
                ulong ph = Math.BigMul(nq[k], src[i - k], out ulong pl);
                lo += pl;
                hi += ph + (lo < pl ? 1UL : 0UL);
                if (++cnt == lim) { lo = mod.Reduce128(hi, lo); hi = 0; cnt = 1; }
            }
            dst[i] = mod.Reduce128(hi, lo);
        }
    }

    /// <summary>In place m0 ← m0 − q·m1 for matrix rows (lengths tracked); returns the new trimmed length of m0.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int SubtractProductInPlace(in ModulusReducer mod, Span<ulong> m0, int l0, ReadOnlySpan<ulong> q, int lq, ReadOnlySpan<ulong> m1, int l1)
    {
        if (l1 == 0 || lq == 0) return l0;
        int n = Math.Max(l0, lq + l1 - 1);
        for (int i = l0; i < n; i++) m0[i] = 0;
        SubtractProductLow(mod, m0, q[..lq], m1[..l1], n);
        return TrimmedLength(m0[..n]);
    }

    /// <summary>Euclidean steps in place, with the transition matrix when requested, until the second
    /// remainder has degree &lt; m (m = 0: to the end). Buffers are allocated once; no allocation per step.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static (PolyMatrix? M, ulong[] C, ulong[] D) EuclidSteps(in ModulusReducer mod, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, int m, bool needMatrix)
    {
        int la = a.Length, lb = b.Length;
        var r0 = a.ToArray();
        var r1 = new ulong[Math.Max(la, 1)];
        b.CopyTo(r1);
        var q = new ulong[la];
        int cap = la + 1;
        ulong[]? m00 = null, m01 = null, m10 = null, m11 = null;
        int l00 = 1, l01 = 0, l10 = 0, l11 = 1;
        if (needMatrix)
        {
            m00 = new ulong[cap]; m01 = new ulong[cap]; m10 = new ulong[cap]; m11 = new ulong[cap];
            m00[0] = 1; m11[0] = 1;
        }
        int polls = 0;
        while (lb > 0 && lb - 1 >= m)
        {
            if ((++polls & 63) == 0) KernelCancellation.Poll();
            int lq = la - lb + 1;
            int lr = RemainderInPlace(mod, r0, la, r1, lb, q);
            // (r0, r1) ← (r1, r0 mod r1)
            (r0, r1) = (r1, r0);
            la = lb;
            lb = lr;
            if (needMatrix)
            {
                // Row 1 ← row 0 − q·row 1, then swap rows.
                l00 = SubtractProductInPlace(mod, m00!, l00, q, lq, m10!, l10);
                l01 = SubtractProductInPlace(mod, m01!, l01, q, lq, m11!, l11);
                (m00, m10) = (m10, m00);
                (m01, m11) = (m11, m01);
                (l00, l10) = (l10, l00);
                (l01, l11) = (l11, l01);
            }
        }
        var mat = needMatrix ? new PolyMatrix(m00![..l00], m01![..l01], m10![..l10], m11![..l11]) : null;
        return (mat, r0[..la], r1[..lb]);
    }
}
