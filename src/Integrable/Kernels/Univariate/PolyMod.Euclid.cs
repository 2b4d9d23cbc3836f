using System.Runtime.CompilerServices;
namespace Integrable.Kernels.Univariate;

internal static partial class PolyMod
{
    /// <summary>In place r0 ← r0 mod r1 (row-oriented long division, suited to the short quotients of a
    /// remainder sequence); the quotient goes to q[0 … l0 − l1]. Returns the trimmed length of the remainder.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int RemainderInPlace(in ModulusReducer mod, Span<ulong> r0, int l0, ReadOnlySpan<ulong> r1, int l1, Span<ulong> q)
    {
        ulong inv = mod.Inverse(r1[l1 - 1]);
        for (int k = l0 - l1; k >= 0; k--)
        {
            ulong c = mod.Mul(r0[k + l1 - 1], inv);
            q[k] = c;
            r0[k + l1 - 1] = 0;
            if (c == 0) continue;
            ulong nc = mod.Neg(c);
            var dst = r0.Slice(k, l1 - 1);
            for (int j = 0; j < dst.Length; j++) dst[j] = mod.Add(dst[j], mod.Mul(nc, r1[j]));
        }
        return TrimmedLength(r0[..(l1 - 1)]);
    }

    /// <summary>In place m0 ← m0 − q·m1 for matrix rows (lengths tracked); returns the new trimmed length of m0.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int SubtractProductInPlace(in ModulusReducer mod, Span<ulong> m0, int l0, ReadOnlySpan<ulong> q, int lq, ReadOnlySpan<ulong> m1, int l1)
    {
        if (l1 == 0 || lq == 0) return l0;
        int n = Math.Max(l0, lq + l1 - 1);
        for (int i = l0; i < n; i++) m0[i] = 0;
        for (int i = 0; i < lq; i++)
        {
            ulong nc = mod.Neg(q[i]);
            if (nc == 0) continue;
            var dst = m0.Slice(i, l1);
            for (int j = 0; j < l1; j++) dst[j] = mod.Add(dst[j], mod.Mul(nc, m1[j]));
        }
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
        while (lb > 0 && lb - 1 >= m)
        {
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
