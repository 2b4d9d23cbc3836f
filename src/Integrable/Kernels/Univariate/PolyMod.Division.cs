using System.Runtime.CompilerServices;
namespace Integrable.Kernels.Univariate;

internal static partial class PolyMod
{
    /// <summary>Quotient and remainder of a by b (b non-zero, trimmed): a = q·b + r, deg r &lt; deg b.
    /// Long division with delayed reduction for short quotients or divisors; Newton iteration for the
    /// reciprocal of the reversed divisor when both reach <see cref="UnivariateThresholds.NewtonDivision"/>
    /// and their product reaches <see cref="UnivariateThresholds.NewtonDivisionWork"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static (ulong[] Quotient, ulong[] Remainder) DivRem(PolyModContext ctx, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        ulong[]? cache = null;
        return DivRem(ctx, a, b, ref cache);
    }

    /// <summary>As <see cref="DivRem(PolyModContext, ReadOnlySpan{ulong}, ReadOnlySpan{ulong})"/>, reusing (and
    /// extending) a cached power-series inverse of the reversed divisor between calls with the same divisor.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static (ulong[] Quotient, ulong[] Remainder) DivRem(PolyModContext ctx, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, ref ulong[]? reciprocal)
    {
        if (b.IsEmpty) throw new DivideByZeroException("polynomial division by zero");
        if (a.Length < b.Length) return ([], a.ToArray());
        int la = a.Length, lb = b.Length, lq = la - lb + 1;
        if (lq < UnivariateThresholds.NewtonDivision || lb < UnivariateThresholds.NewtonDivision ||
            (long)lq * lb < UnivariateThresholds.NewtonDivisionWork)
            return DivRemBasic(ctx.Mod, a, b);
        if (reciprocal is null || reciprocal.Length < lq)
        {
            // rev(b) mod x^n: the top n coefficients of b, reversed.
            int n = Math.Min(lb, lq);
            var revB = Reverse(b[(lb - n)..], n);
            reciprocal = InverseSeries(ctx, revB, lq, reciprocal);
        }
        var q = QuotientFromInverse(ctx, a, lb, reciprocal);
        var r = RemainderWrapped(ctx, a, b, q);
        return (q, r);
    }

    /// <summary>Long division, column by column: quotient coefficient k is
    /// (a[k + lb − 1] − Σ_j q[k + j]·b[lb − 1 − j]) / lc(b), summed in 128 bits and reduced once; the
    /// remainder is the low part of a − q·b, also with delayed reduction.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static (ulong[] Quotient, ulong[] Remainder) DivRemBasic(in ModulusReducer mod, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        int la = a.Length, lb = b.Length, lq = la - lb + 1;
        if (lq <= 0) return ([], a.ToArray());
        ulong inv = mod.Inverse(b[lb - 1]);
        var q = NewArray(lq);
        ulong p = mod.P;
        for (int k = lq - 1; k >= 0; k--)
        {
            // Σ_{j=1}^{min(lb−1, lq−1−k)} q[k+j]·b[lb−1−j], subtracted from a[k+lb−1].
            int jmax = Math.Min(lb - 1, lq - 1 - k);
            ulong hi = 0, lo = 0;
            int cnt = 0, lim = mod.DelayedTerms;
            for (int j = 1; j <= jmax; j++)
            {
                ulong ph = Math.BigMul(q[k + j], b[lb - 1 - j], out ulong pl);
                lo += pl;
                hi += ph + (lo < pl ? 1UL : 0UL);
                if (++cnt == lim) { lo = mod.Reduce128(hi, lo); hi = 0; cnt = 1; }
            }
            ulong s = jmax == 0 ? 0 : mod.Reduce128(hi, lo);
            q[k] = mod.Mul(mod.Sub(a[k + lb - 1], s), inv);
        }
        var r = RemainderFromQuotient(mod, a, b, q);
        return (Trim(q), r);
    }

    /// <summary>The remainder a − q·b, known to have fewer than lb − 1 + 1 coefficients: only the low
    /// lb − 1 coefficients are computed.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static ulong[] RemainderFromQuotient(in ModulusReducer mod, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, ReadOnlySpan<ulong> q)
    {
        int lb = b.Length, lq = q.Length;
        var r = NewArray(lb - 1);
        for (int i = 0; i < lb - 1; i++)
        {
            int j0 = Math.Max(0, i - lb + 1), j1 = Math.Min(i, lq - 1);
            ulong hi = 0, lo = 0;
            int cnt = 0, lim = mod.DelayedTerms;
            for (int j = j0; j <= j1; j++)
            {
                ulong ph = Math.BigMul(q[j], b[i - j], out ulong pl);
                lo += pl;
                hi += ph + (lo < pl ? 1UL : 0UL);
                if (++cnt == lim) { lo = mod.Reduce128(hi, lo); hi = 0; cnt = 1; }
            }
            ulong ai = i < a.Length ? a[i] : 0;
            r[i] = mod.Sub(ai, mod.Reduce128(hi, lo));
        }
        return Trim(r);
    }

    /// <summary>Division by Newton iteration: rev(q) = rev(a)·rev(b)⁻¹ mod x^lq, then
    /// r = a − q·b computed modulo x^L − 1 for a power of two L ≥ lb − 1 (the remainder has fewer than
    /// lb − 1 coefficients, so the wrapped product gives it exactly).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static (ulong[] Quotient, ulong[] Remainder) DivRemNewton(PolyModContext ctx, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        int lb = b.Length, lq = a.Length - lb + 1;
        int n = Math.Min(lb, lq);
        var inv = InverseSeries(ctx, Reverse(b[(lb - n)..], n), lq);
        var q = QuotientFromInverse(ctx, a, lb, inv);
        return (q, RemainderWrapped(ctx, a, b, q));
    }

    /// <summary>The quotient of a by a divisor with lb coefficients, given the power-series inverse of the
    /// reversed divisor to precision ≥ la − lb + 1.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] QuotientFromInverse(PolyModContext ctx, ReadOnlySpan<ulong> a, int lb, ReadOnlySpan<ulong> revInverse)
    {
        int la = a.Length, lq = la - lb + 1;
        if (lq <= 0) return [];
        var revA = Reverse(a[(lb - 1)..], lq);        // top lq coefficients of a, reversed
        var revQ = MultiplyLow(ctx, revA, revInverse[..Math.Min(revInverse.Length, lq)], lq);
        return Trim(Reverse(revQ, lq));
    }

    /// <summary>a − q·b where the result is known to have degree &lt; deg b.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] RemainderWrapped(PolyModContext ctx, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, ReadOnlySpan<ulong> q)
    {
        int lb = b.Length;
        if (lb <= 1) return [];
        if (q.IsEmpty) return Trim(a[..Math.Min(a.Length, lb - 1)].ToArray());
        int len = NttMultiplier.TransformLength(lb - 1);
        var mod = ctx.Mod;
        var r = NewArray(lb - 1);
        if (!TransformPays(ctx, Math.Max(q.Length, lb), Math.Min(q.Length, lb), len))
        {
            if (len <= NttMultiplier.MaxLength) return RemainderFromQuotient(ctx.Mod, a, b, q);
            var full = Multiply(ctx, q, b);                        // beyond the largest transform: chunked product
            for (int i = 0; i < lb - 1; i++) r[i] = mod.Sub(i < a.Length ? a[i] : 0, i < full.Length ? full[i] : 0);
            return Trim(r);
        }
        var qb = NewArray(len);
        ctx.Ntt.MultiplyCyclic(q, b, len, qb);
        // Fold a mod x^len − 1 as well; the difference is r (deg r < lb − 1 ≤ len).
        for (int i = 0; i < lb - 1; i++)
        {
            ulong s = 0;
            for (int j = i; j < a.Length; j += len) s = mod.Add(s, a[j]);
            r[i] = mod.Sub(s, qb[i]);
        }
        // The wrapped coefficients lb − 1 … len − 1 must cancel; they are not needed for r.
        return Trim(r);
    }

    /// <summary>The power series f⁻¹ mod x^n (f[0] ≠ 0) by Newton iteration g ← g − g·(f·g − 1), doubling
    /// the precision; with transforms the product f·g is taken cyclically at length 2k, where its
    /// wrapped part does not reach the needed coefficients k … 2k − 1.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] InverseSeries(PolyModContext ctx, ReadOnlySpan<ulong> f, int n, ulong[]? start = null)
    {
        var mod = ctx.Mod;
        if (f.IsEmpty || f[0] == 0) throw new DivideByZeroException("power series with zero constant term is not invertible");
        var ladder = new List<int>();
        int k = n;
        int have = start?.Length ?? 0;   // a known inverse to precision `have` (extended, not recomputed)
        while (k > 32 && k > have) { ladder.Add(k); k = (k + 1) / 2; }
        var g = have >= k ? start![..k] : InverseSeriesBasic(mod, f, k);
        for (int step = ladder.Count - 1; step >= 0; step--)
        {
            int k2 = ladder[step];
            g = NewtonStep(ctx, f, g, k, k2);
            k = k2;
        }
        return g;
    }

    /// <summary>One Newton step from precision k to precision k2 ≤ 2k.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static ulong[] NewtonStep(PolyModContext ctx, ReadOnlySpan<ulong> f, ulong[] g, int k, int k2)
    {
        var mod = ctx.Mod;
        var fk2 = f[..Math.Min(f.Length, k2)];
        var gk = g.AsSpan(0, Math.Min(g.Length, k));
        ulong[] e;   // coefficients k … k2 − 1 of f·g
        int len = NttMultiplier.TransformLength(k2);
        if (TransformPays(ctx, fk2.Length, gk.Length, len))
        {
            var fg = NewArray(len);
            ctx.Ntt.MultiplyCyclic(fk2, gk, len, fg);   // wrap lands below k2 + k − 1 − len < k
            e = fg.AsSpan(k, k2 - k).ToArray();
        }
        else
        {
            var fg = Multiply(ctx, fk2, gk);
            e = new ulong[k2 - k];
            for (int i = k; i < k2 && i < fg.Length; i++) e[i - k] = fg[i];
        }
        // g_new[k … k2) = −(g·e) mod x^(k2 − k)
        var ge = MultiplyLow(ctx, gk, e, k2 - k);
        var r = new ulong[k2];
        gk.CopyTo(r);
        for (int i = 0; i < ge.Length; i++) r[k + i] = mod.Neg(ge[i]);
        return r;
    }

    /// <summary>f⁻¹ mod x^n by the quadratic recurrence (small n).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static ulong[] InverseSeriesBasic(in ModulusReducer mod, ReadOnlySpan<ulong> f, int n)
    {
        var g = new ulong[n];
        ulong inv = mod.Inverse(f[0]);
        g[0] = inv;
        for (int i = 1; i < n; i++)
        {
            ulong hi = 0, lo = 0;
            int cnt = 0, lim = mod.DelayedTerms;
            int jmax = Math.Min(i, f.Length - 1);
            for (int j = 1; j <= jmax; j++)
            {
                ulong ph = Math.BigMul(f[j], g[i - j], out ulong pl);
                lo += pl;
                hi += ph + (lo < pl ? 1UL : 0UL);
                if (++cnt == lim) { lo = mod.Reduce128(hi, lo); hi = 0; cnt = 1; }
            }
            g[i] = mod.Neg(mod.Mul(mod.Reduce128(hi, lo), inv));
        }
        return g;
    }
}
