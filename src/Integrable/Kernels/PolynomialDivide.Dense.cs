using System.Runtime.CompilerServices;

namespace Integrable.Kernels;

internal static partial class PolynomialDivide
{
    /// <summary>Exact division on mixed-radix indices with windows aligned to the trailing variables
    /// (the dense counterpart of <see cref="DivideHeap1"/>; same index encoding as
    /// <see cref="PolynomialMultiply.MultiplyDense"/>).</summary>
    /// <remarks>
    /// <para>Windows H are processed in descending order. The quotient terms of window
    /// H − h(d₀) (h(d₀) = window of the divisor's leading term) are produced inside window H; every
    /// other quotient window that meets H is already complete. So for each window: (1) the dividend's
    /// terms are loaded into a buffer, (2) the products of every complete quotient group with every
    /// divisor group except the leading one are subtracted block-wise, (3) the cells are scanned in
    /// descending order: each non-zero cell is the leading term of the current remainder, gives the
    /// quotient term (cell − d₀)/lc(d), and that term times the leading divisor group is subtracted.
    /// A cell whose quotient would not be a monomial of the quotient's degree box, or whose coefficient
    /// is not an exact multiple of lc(d), proves that the divisor does not divide. At the end every
    /// window is zero and the lowest terms match, so P − Q·D = 0 exactly.</para>
    /// <para>Accumulators start from the dividend's coefficients (given already in accumulator form).
    /// Every partial sum is bounded by max|P| + (Σ|q|)·max|D|; the running Σ|q| is checked against
    /// <paramref name="qSumLimit"/> and <see cref="DivideStatus.TooLarge"/> asks the caller for a
    /// wider accumulator; <see cref="DivideStatus.QuotientTooLarge"/> (a quotient coefficient outside
    /// the coefficient type) sends it to big integers.</para>
    /// </remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static DivideStatus DivideDense<TOps, TC, TAcc>(
        ReadOnlySpan<long> ip, ReadOnlySpan<TAcc> cp, ReadOnlySpan<long> id, ReadOnlySpan<TC> cd,
        long window, long[] radix, long[] qRange, TC limit, double qSumLimit, Func<TC, double> magnitude,
        out long[] qi, out TC[] qc, out int qCount)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int L = checked((int)window);
        int nv = radix.Length;
        qi = new long[Math.Max(16, ip.Length / 2)];
        qc = new TC[qi.Length];
        qCount = 0;

        SplitIndices(id, L, out var dStart, out var dHigh, out var ld);
        int gd = dHigh.Length;
        long hd0 = dHigh[0];
        int ld0 = ld[0];
        TC lc = cd[0];
        var cdArr = cd.ToArray();
        // Digits of the divisor's leading index, for the quotient-box test.
        var d0Digits = Digits(id[0], radix);

        long hPmax = ip[0] / L, hPmin = ip[^1] / L;
        long hQmax = hPmax - hd0, hQmin = hPmin - dHigh[gd - 1];
        hQmin = Math.Max(hQmin, 0);
        if (hQmax < hQmin) return DivideStatus.NotDivisible;
        // Quotient groups by high part: start offset in qi/qc and length.
        var qGroupStart = new int[hQmax - hQmin + 1];
        var qGroupLen = new int[qGroupStart.Length];
        var ql = new int[qi.Length];

        var buf = new TAcc[L];
        var cellDigits = new long[nv];
        double qSum = 0;
        int pp = 0;
        for (long H = hPmax; H >= hPmin; H--)
        {
            KernelCancellation.Poll();
            int top = -1, bottom = int.MaxValue;
            // (1) dividend terms of this window
            while (pp < ip.Length && ip[pp] / L == H)
            {
                int cell = (int)(ip[pp] - H * L);
                buf[cell] = cp[pp];
                if (cell > top) top = cell;
                if (cell < bottom) bottom = cell;
                pp++;
            }
            // (2) complete quotient groups times the non-leading divisor groups
            for (int g = 1; g < gd; g++)
            {
                long hq = H - dHigh[g];
                if (hq < hQmin || hq > hQmax) continue;
                int len = qGroupLen[hq - hQmin];
                if (len == 0) continue;
                int q0 = qGroupStart[hq - hQmin];
                int d0 = dStart[g], d1 = dStart[g + 1];
                int hiCell = ql[q0] + ld[d0], loCell = ql[q0 + len - 1] + ld[d1 - 1];
                if (hiCell > top) top = hiCell;
                if (loCell < bottom) bottom = loCell;
                TOps.MulSubBlock(ref buf[0], ref qc[q0], ref ql[q0], len, ref cdArr[d0], ref ld[d0], d1 - d0);
            }
            if (top < 0) continue;
            // (3) produce the quotient group H − h(d₀) cell by cell, descending
            long hqStar = H - hd0;
            int groupStart = qCount;
            int lead0 = dStart[0], lead1 = dStart[1];
            for (int k = top; k >= bottom; k--)
            {
                if (TOps.IsZero(in buf[k])) continue;
                int lq = k - ld0;
                if (lq < 0 || hqStar < 0 || hqStar > hQmax) return DivideStatus.NotDivisible;
                long qIndex = hqStar * L + lq;
                // Quotient monomial test: digit-wise (cell − d₀) must lie in [0, qRange].
                long x = H * L + k;
                for (int v = nv - 1; v >= 0; v--)
                {
                    long digit = x % radix[v];
                    x /= radix[v];
                    long qd = digit - d0Digits[v];
                    if (qd < 0 || qd > qRange[v]) return DivideStatus.NotDivisible;
                }
                var status = QuotientCoefficient<TOps, TC, TAcc>(in buf[k], lc, limit, magnitude, ref qSum, qSumLimit, out TC q);
                if (status != DivideStatus.Exact) return status;
                buf[k] = default!;
                if (qCount == qi.Length)
                {
                    int size = qi.Length * 2;
                    Array.Resize(ref qi, size);
                    Array.Resize(ref qc, size);
                    Array.Resize(ref ql, size);
                }
                qi[qCount] = qIndex;
                qc[qCount] = q;
                ql[qCount] = lq;
                qCount++;
                if (lead1 - lead0 > 1)
                {
                    TOps.MulSubBlock(ref buf[0], ref qc[qCount - 1], ref ql[qCount - 1], 1, ref cdArr[lead0 + 1], ref ld[lead0 + 1], lead1 - lead0 - 1);
                    int low = lq + ld[lead1 - 1];
                    if (low < bottom) bottom = low;
                }
            }
            if (qCount > groupStart)
            {
                qGroupStart[hqStar - hQmin] = groupStart;
                qGroupLen[hqStar - hQmin] = qCount - groupStart;
            }
        }
        // Windows at and above the dividend's lowest window are zero; the product's lowest term must
        // be the dividend's lowest term, otherwise Q·D has terms below every term of P.
        if (qCount == 0 || qi[qCount - 1] + id[^1] != ip[^1]) return DivideStatus.NotDivisible;
        return DivideStatus.Exact;
    }

    private static long[] Digits(long index, long[] radix)
    {
        var d = new long[radix.Length];
        for (int v = radix.Length - 1; v >= 0; v--)
        {
            d[v] = index % radix[v];
            index /= radix[v];
        }
        return d;
    }

    private static void SplitIndices(ReadOnlySpan<long> idx, int window, out int[] start, out long[] high, out int[] low)
    {
        int n = idx.Length, groups = 0;
        low = new int[n];
        long prev = long.MinValue;
        for (int i = 0; i < n; i++)
        {
            long h = idx[i] / window;
            low[i] = (int)(idx[i] - h * window);
            if (h != prev) { groups++; prev = h; }
        }
        start = new int[groups + 1];
        high = new long[groups];
        int g = -1;
        prev = long.MinValue;
        for (int i = 0; i < n; i++)
        {
            long h = idx[i] / window;
            if (h != prev) { g++; start[g] = i; high[g] = h; prev = h; }
        }
        start[groups] = n;
    }
}
