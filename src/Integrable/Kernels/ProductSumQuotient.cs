using System.Runtime.CompilerServices;
using Integrable.Numbers;

namespace Integrable.Kernels;

/// <summary>Outcome of the fused kernel <see cref="ProductSumQuotient.TryRun"/>.</summary>
internal enum FusedStatus
{
    /// <summary>The fused path does not apply to these operands (coefficients not small integers, a
    /// bound that a 64-bit accumulator cannot guarantee, a dense-shaped product, …): compute
    /// (A·B + C·D)/E step by step instead. Nothing is claimed about divisibility.</summary>
    NotApplicable,
    /// <summary>E divides A·B + C·D; the quotient is exact.</summary>
    Exact,
    /// <summary>E does not divide A·B + C·D (a definite answer).</summary>
    NotDivisible,
}

/// <summary>The exchange step (A·B + C·D)/E of Somos sequences, T-systems, the octahedron recurrence and
/// cluster mutations, fused into one pass over packed exponents.</summary>
/// <remarks>
/// <para>Computed step by step, the two products and their sum are materialised as canonical Laurent
/// polynomials (an unpacked exponent vector and a rational per term) only to be packed again by the
/// division, although they are usually far larger than the quotient: in the T-system the sum has 50
/// times as many terms. Here all five operands are packed once into one exponent layout, the two
/// heap products and their merge stay packed with 64-bit coefficients in pooled buffers (warm memory
/// from one step to the next), the heap division reads the merged terms directly, and only the
/// quotient is unpacked.</para>
/// <para>Layout: with m = min(min A + min B, min C + min D) and M the same with maxima (per
/// variable), the sum's exponents shifted by m lie in [0, M − m]; A is packed with offset m − min B
/// and B with offset min B (so packed products equal s − m), likewise C and D, and E with offset
/// min E. Every field has a guard bit for the division. If E divides the sum, each quotient exponent
/// q satisfies min S − min E ≤ q ≤ max S − max E, so q − (m − min E) lies in
/// [0, (M − m) − (max E − min E)], the box the division checks; nothing valid is rejected and the
/// division terminates on any input.</para>
/// <para>Applies when all coefficients are integers below 2^63, the coefficient bound of both
/// products and their sum is below 2^62, and both products would be computed by the heap method;
/// otherwise <see cref="FusedStatus.NotApplicable"/>. The division proves exactness as usual (zero
/// remainder with exact integer arithmetic and the Gauss-lemma integrality test).</para>
/// </remarks>
internal static class ProductSumQuotient
{
    /// <summary>Disables the fused path on the current thread (tests compare it with the step-by-step one).</summary>
    [ThreadStatic] internal static bool Disabled;

    /// <summary>Number of calls on the current thread that the fused path answered (tests check that it ran).</summary>
    [ThreadStatic] internal static int Answered;

    /// <summary>Computes (A·B + C·D)/E. Operands are canonical, non-empty, in <paramref name="n"/>
    /// variables; every one has at least two terms (constants and monomials go the cheap unfused way).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static FusedStatus TryRun(
        ReadOnlySpan<Rational> ca, int[] ea, ReadOnlySpan<Rational> cb, int[] eb,
        ReadOnlySpan<Rational> cc, int[] ec, ReadOnlySpan<Rational> cd, int[] ed,
        ReadOnlySpan<Rational> ce, int[] ee, int n, out Rational[] coeffs, out int[] exps)
    {
        coeffs = [];
        exps = [];
        if (Disabled) return FusedStatus.NotApplicable;
        if (!IntegerWords(ca, out var wa) || !IntegerWords(cb, out var wb) || !IntegerWords(cc, out var wc) ||
            !IntegerWords(cd, out var wd) || !CoefficientForm.TryWords(ce, out var we, out long de))
            return FusedStatus.NotApplicable;
        // |a·b + c·d| coefficient partial sums stay below 2^62 (room for the sum and the division's limit).
        if (Math.Max(CoefficientBounds.ProductSumBits(wa, wb), CoefficientBounds.ProductSumBits(wc, wd)) > 61)
            return FusedStatus.NotApplicable;
        ProductShape s1, s2;
        try
        {
            s1 = new ProductShape(ea, eb, ca.Length, cb.Length, n);
            s2 = new ProductShape(ec, ed, cc.Length, cd.Length, n);
        }
        catch (OverflowException) { return FusedStatus.NotApplicable; }
        if (PolynomialMultiply.Choose(in s1) != MultiplyAlgorithm.Heap || PolynomialMultiply.Choose(in s2) != MultiplyAlgorithm.Heap)
            return FusedStatus.NotApplicable;

        ProductShape.MinMax(ee, n, out var minE, out var maxE);
        var lo = new long[n];
        var range = new long[n];
        var qRange = new long[n];
        for (int v = 0; v < n; v++)
        {
            long lo1 = (long)s1.MinA[v] + s1.MinB[v], lo2 = (long)s2.MinA[v] + s2.MinB[v];
            long hi1 = lo1 + s1.Radix[v] - 1, hi2 = lo2 + s2.Radix[v] - 1;
            lo[v] = Math.Min(lo1, lo2);
            range[v] = Math.Max(hi1, hi2) - lo[v];
            qRange[v] = range[v] - ((long)maxE[v] - minE[v]);
        }
        var layout = ExponentLayout.Create(range, guard: true);
        int W = layout.Words;

        // Offsets: A and C so that packed products are exponents minus lo.
        if (!Offsets(lo, s1.MinB, out var offA) || !Offsets(lo, s2.MinB, out var offC)) return FusedStatus.NotApplicable;
        ulong[]? pa = null, pb = null, pc = null, pd = null, e1 = null, e2 = null, es = null;
        long[]? c1 = null, c2 = null, cs = null;
        try
        {
            int n1 = PackedProduct(layout, ea, wa, eb, wb, in s1, offA, lo, out pa, out pb, out e1, out c1);
            int n2 = PackedProduct(layout, ec, wc, ed, wd, in s2, offC, lo, out pc, out pd, out e2, out c2);
            int ns = Merge(e1, c1, n1, e2, c2, n2, W, out es, out cs, out long maxS);
            Answered++;
            if (ns == 0) { coeffs = []; exps = []; return FusedStatus.Exact; }
            for (int v = 0; v < n; v++) if (qRange[v] < 0) return FusedStatus.NotDivisible;

            // E = content·E'/de with E' primitive (leading coefficient positive); S/E = de/content · S/E'.
            ulong g = 0;
            foreach (var x in we) g = IntegerMath.Gcd(g, IntegerMath.UnsignedAbs(x));
            long content = we[0] < 0 ? -(long)g : (long)g;
            if (content != 1) for (int i = 0; i < we.Length; i++) we[i] /= content;
            double maxD = 0;
            foreach (var x in we) maxD = Math.Max(maxD, Math.Abs((double)x));
            var pe = new ulong[ce.Length * W];
            layout.Pack(ee, n, minE, pe);
            var qMax = new ulong[W];
            var qr = new int[n];
            for (int v = 0; v < n; v++) qr[v] = checked((int)qRange[v]);
            layout.Pack(qr, n, new int[n], qMax);
            // Partial sums are bounded by max|S| + Σ|q|·max|E'|; the factor 1/2 absorbs rounding.
            double qSumLimit = (Math.ScaleB(1.0, 62) - maxS) / maxD / 2;
            var p = cs.AsSpan(0, ns);
            DivideStatus status;
            ulong[] qe;
            long[] qc;
            int qCount;
            status = W == 1
                ? PolynomialDivide.DivideHeap1<Word64Ops, long, long>(es.AsSpan(0, ns), p, pe, we, layout.GuardMask[0], qMax[0],
                    long.MaxValue, qSumLimit, static q => Math.Abs((double)q), out qe, out qc, out qCount)
                : PolynomialDivide.DivideHeapN<Word64Ops, long, long>(es.AsSpan(0, ns * W), p, pe, we, W, layout.GuardMask, qMax,
                    long.MaxValue, qSumLimit, static q => Math.Abs((double)q), out qe, out qc, out qCount);
            if (status == DivideStatus.NotDivisible) return FusedStatus.NotDivisible;
            if (status != DivideStatus.Exact) { Answered--; return FusedStatus.NotApplicable; }

            var offQ = new long[n];
            for (int v = 0; v < n; v++) offQ[v] = lo[v] - minE[v];
            exps = new int[qCount * n];
            layout.Unpack(qe, qCount, n, offQ, exps);
            coeffs = new Rational[qCount];
            if (content == 1 && de == 1)
                for (int i = 0; i < qCount; i++) coeffs[i] = new Rational(qc[i]);
            else
            {
                var scale = new Rational(de, content);
                for (int i = 0; i < qCount; i++) coeffs[i] = new Rational(qc[i]) * scale;
            }
            return FusedStatus.Exact;
        }
        catch (OverflowException)
        {
            return FusedStatus.NotApplicable;
        }
        finally
        {
            ReturnAll(pa, pb, pc, pd, e1, e2, es);
            if (c1 is not null) Pool.Return(c1);
            if (c2 is not null) Pool.Return(c2);
            if (cs is not null) Pool.Return(cs);
        }
    }

    private static bool IntegerWords(ReadOnlySpan<Rational> c, out long[] words) =>
        CoefficientForm.TryWords(c, out words, out long d) && d == 1;

    private static bool Offsets(long[] lo, int[] minOther, out int[] offset)
    {
        offset = new int[lo.Length];
        for (int v = 0; v < lo.Length; v++)
        {
            long o = lo[v] - minOther[v];
            if (o < int.MinValue || o > int.MaxValue) return false;
            offset[v] = (int)o;
        }
        return true;
    }

    private static ulong[] Pack(ExponentLayout layout, int[] e, int n, int[] offset, int terms)
    {
        var packed = Pool.Rent<ulong>(terms * layout.Words);
        layout.Pack(e, n, offset, packed);
        return packed;
    }

    /// <summary>X·Y in the frame of the sum (packed exponents minus <paramref name="lo"/>) into pooled
    /// buffers, squaring when X and Y are the same polynomial; the packed operands are handed back so that
    /// the caller returns them to the pool. Returns the number of terms.</summary>
    private static int PackedProduct(ExponentLayout layout, int[] ex, long[] wx, int[] ey, long[] wy, in ProductShape shape,
        int[] offX, long[] lo, out ulong[] px, out ulong[]? py, out ulong[] oe, out long[] oc)
    {
        int n = shape.Nvars;
        if (ReferenceEquals(ex, ey))
        {
            px = Pack(layout, ex, n, shape.MinA, wx.Length);
            py = null;
            return Square(layout, px, wx, shape.MinA, lo, out oe, out oc);
        }
        px = Pack(layout, ex, n, offX, wx.Length);
        py = Pack(layout, ey, n, shape.MinB, wy.Length);
        return Product(px, wx, py, wy, layout.Words, out oe, out oc);
    }

    /// <summary>Heap product of packed operands into pooled buffers; returns the number of terms.</summary>
    private static int Product(ulong[] pa, long[] wa, ulong[] pb, long[] wb, int words, out ulong[] oe, out long[] oc)
    {
        int na = wa.Length, nb = wb.Length;
        int estimate = Math.Max(na, nb) * 2;
        oe = Pool.Rent<ulong>(estimate * words);
        oc = Pool.Rent<long>(estimate);
        return PolynomialMultiply.HeapMultiply<Word64Ops, long, long>(pa.AsSpan(0, na * words), wa, pb.AsSpan(0, nb * words), wb, words, ref oe, ref oc);
    }

    /// <summary>A·A by the heap on the triangle (<see cref="PolynomialMultiply.SquareHeap"/>), A packed with
    /// offset min A; the packed exponents of the square, 2a − 2 min A, are then moved to the frame of the
    /// sum by adding 2 min A − lo to every term (fields stay within the layout: 2a − lo ≤ M − m).</summary>
    private static int Square(ExponentLayout layout, ulong[] pa, long[] wa, int[] minA, long[] lo, out ulong[] oe, out long[] oc)
    {
        int na = wa.Length, W = layout.Words, nv = minA.Length;
        oe = Pool.Rent<ulong>(na * 2 * W);
        oc = Pool.Rent<long>(na * 2);
        int count = PolynomialMultiply.SquareHeap<Word64Ops, long, long>(pa.AsSpan(0, na * W), wa, W, ref oe, ref oc);
        var shift = new int[nv];
        for (int v = 0; v < nv; v++) shift[v] = checked((int)(2L * minA[v] - lo[v]));
        var delta = new ulong[W];
        layout.Pack(shift, nv, new int[nv], delta);
        for (int t = 0; t < count; t++)
            for (int w = 0; w < W; w++) oe[t * W + w] += delta[w];
        return count;
    }

    /// <summary>Merges two packed descending term lists, adding coefficients of equal exponents and
    /// dropping zeros; returns the number of terms and the largest coefficient magnitude.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int Merge(ulong[] e1, long[] c1, int n1, ulong[] e2, long[] c2, int n2, int words,
        out ulong[] es, out long[] cs, out long maxAbs)
    {
        es = Pool.Rent<ulong>((n1 + n2) * words);
        cs = Pool.Rent<long>(n1 + n2);
        int i = 0, j = 0, k = 0, polls = 0;
        long max = 0;
        if (words == 1)
        {
            while (i < n1 && j < n2)
            {
                ulong x = e1[i], y = e2[j];
                long c;
                if (x > y) { es[k] = x; c = c1[i++]; }
                else if (x < y) { es[k] = y; c = c2[j++]; }
                else { es[k] = x; c = c1[i++] + c2[j++]; if (c == 0) continue; }
                cs[k++] = c;
                long m = Math.Abs(c);
                if (m > max) max = m;
            }
            for (; i < n1; i++) { es[k] = e1[i]; max = Math.Max(max, Math.Abs(c1[i])); cs[k++] = c1[i]; }
            for (; j < n2; j++) { es[k] = e2[j]; max = Math.Max(max, Math.Abs(c2[j])); cs[k++] = c2[j]; }
            maxAbs = max;
            return k;
        }
        if (words == 2)
        {
            while (i < n1 && j < n2)
            {
                ulong xh = e1[2 * i], yh = e2[2 * j], xl = e1[2 * i + 1], yl = e2[2 * j + 1];
                long c;
                if (xh > yh || (xh == yh && xl > yl)) { es[2 * k] = xh; es[2 * k + 1] = xl; c = c1[i++]; }
                else if (xh != yh || xl != yl) { es[2 * k] = yh; es[2 * k + 1] = yl; c = c2[j++]; }
                else
                {
                    c = c1[i++] + c2[j++];
                    if (c == 0) continue;
                    es[2 * k] = xh; es[2 * k + 1] = xl;
                }
                cs[k++] = c;
                long m = Math.Abs(c);
                if (m > max) max = m;
            }
        }
        while (i < n1 && j < n2)
        {
            if ((++polls & 0xFFFF) == 0) KernelCancellation.Poll();
            int cmp = PolynomialMultiply.CompareN(e1.AsSpan(i * words, words), e2.AsSpan(j * words, words));
            long c;
            if (cmp > 0) { e1.AsSpan(i * words, words).CopyTo(es.AsSpan(k * words)); c = c1[i++]; }
            else if (cmp < 0) { e2.AsSpan(j * words, words).CopyTo(es.AsSpan(k * words)); c = c2[j++]; }
            else
            {
                c = c1[i] + c2[j];
                if (c != 0) e1.AsSpan(i * words, words).CopyTo(es.AsSpan(k * words));
                i++; j++;
                if (c == 0) continue;
            }
            cs[k++] = c;
            long m = Math.Abs(c);
            if (m > max) max = m;
        }
        for (; i < n1; i++) { e1.AsSpan(i * words, words).CopyTo(es.AsSpan(k * words)); max = Math.Max(max, Math.Abs(c1[i])); cs[k++] = c1[i]; }
        for (; j < n2; j++) { e2.AsSpan(j * words, words).CopyTo(es.AsSpan(k * words)); max = Math.Max(max, Math.Abs(c2[j])); cs[k++] = c2[j]; }
        maxAbs = max;
        return k;
    }

    private static void ReturnAll(params ulong[]?[] arrays)
    {
        foreach (var a in arrays) if (a is not null) Pool.Return(a);
    }
}
