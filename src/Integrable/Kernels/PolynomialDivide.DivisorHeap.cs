using System.Numerics;
using System.Runtime.CompilerServices;

namespace Integrable.Kernels;

/// <summary>The divisor-heap variant of heap division (Monagan and Pearce, "Sparse polynomial division
/// using a heap", J. Symbolic Comput. 46, 2011, section 3).</summary>
/// <remarks>
/// <para>The remainder is p − Σ_j d_j·q, read as #d − 1 sorted streams, one per divisor term j ≥ 1:
/// d_j·q_0, d_j·q_1, … (the stream of d_0 cancels the leading terms by construction). The heap holds
/// row j while its next quotient index i_j is below the number of quotient terms found so far; a row
/// that has caught up (i_j equal to that number) waits in a list, and when quotient term k is produced
/// every waiting row (all have i_j = k) is inserted with exponent q_k + d_j, which is smaller than the
/// current exponent q_k + d_0, so no product is met out of order. The heap never exceeds #d − 1 entries,
/// against #q for the quotient heap: the better choice when the quotient is much larger than the
/// divisor. Equal exponents are chained as in the quotient heap; divisibility, quotient box, exactness
/// and bound tests are the same.</para>
/// </remarks>
internal static partial class PolynomialDivide
{
    /// <summary>Forces the divisor heap (true) or the quotient heap (false) in
    /// <see cref="DivideHeap1"/> and <see cref="DivideHeapN"/> on the current thread (tests and
    /// benchmarks); null dispatches with <see cref="UseDivisorHeap"/>.</summary>
    [ThreadStatic] internal static bool? ForceDivisorHeap;

    /// <summary>The divisor heap is chosen when #d² ≤ #p: then #q ≥ #p/#d ≥ #d, so its heap is no
    /// larger than the quotient heap.</summary>
    internal static bool UseDivisorHeap(int np, int nd) => ForceDivisorHeap ?? (long)nd * nd <= np;

    /// <summary>Single-word exact division with one heap entry per divisor term (same contract as
    /// <see cref="DivideHeap1"/>).</summary>
    private static DivideStatus DivideDivisorHeap1<TOps, TC, TAcc>(
        ReadOnlySpan<ulong> ep, ReadOnlySpan<TAcc> cp, ReadOnlySpan<ulong> ed, ReadOnlySpan<TC> cd,
        ulong guard, ulong qMax, TC limit, double qSumLimit, Func<TC, double> magnitude, out ulong[] qe, out TC[] qc, out int qCount)
        where TOps : ICoefficientOps<TC, TAcc> =>
        DivideDivisorHeap<TOps, TC, TAcc, Key1>(ep, cp, ed, cd, new Key1(guard), new Key1(qMax), limit, qSumLimit, magnitude, out qe, out qc, out qCount);

    /// <summary>Exact division with one heap entry per divisor term and exponents of two to four words
    /// held by value (same contract as <see cref="DivideHeapN"/>).</summary>
    private static DivideStatus DivideDivisorHeapK<TOps, TC, TAcc, TKey>(
        ReadOnlySpan<ulong> ep, ReadOnlySpan<TAcc> cp, ReadOnlySpan<ulong> ed, ReadOnlySpan<TC> cd,
        ReadOnlySpan<ulong> guard, ReadOnlySpan<ulong> qMax, TC limit, double qSumLimit, Func<TC, double> magnitude, out ulong[] qe, out TC[] qc, out int qCount)
        where TOps : ICoefficientOps<TC, TAcc>
        where TKey : struct, IPackedKey<TKey> =>
        DivideDivisorHeap<TOps, TC, TAcc, TKey>(ep, cp, ed, cd, TKey.Load(guard, 0), TKey.Load(qMax, 0),
            limit, qSumLimit, magnitude, out qe, out qc, out qCount);

    /// <summary>The divisor heap on exponents held by value (see <see cref="IPackedKey{TSelf}"/>).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static DivideStatus DivideDivisorHeap<TOps, TC, TAcc, TKey>(
        ReadOnlySpan<ulong> ep, ReadOnlySpan<TAcc> cp, ReadOnlySpan<ulong> ed, ReadOnlySpan<TC> cd,
        TKey guard, TKey qMax, TC limit, double qSumLimit, Func<TC, double> magnitude, out ulong[] qe, out TC[] qc, out int qCount)
        where TOps : ICoefficientOps<TC, TAcc>
        where TKey : struct, IPackedKey<TKey>
    {
        int W = TKey.Words, np = cp.Length, nd = cd.Length;
        double qSum = 0;
        int cap = Math.Max(16, Math.Min(np, 1 << 16));
        qe = new ulong[cap * W];
        qc = new TC[cap];
        qCount = 0;
        var dk = new TKey[nd];
        for (int j = 0; j < nd; j++) dk[j] = TKey.Load(ed, j);
        var hexp = new TKey[nd + 1];
        var hhead = new int[nd + 1];
        var qi = new int[nd];      // row j: index of its next quotient term
        var next = new int[nd];
        var store = new int[nd];
        var waiting = new int[nd];
        int nw = 0;
        for (int j = nd - 1; j >= 1; j--) waiting[nw++] = j;   // every row waits for q_0; row 1 pops first
        int hlen = 1, pi = 0;
        TKey d0 = dk[0];
        TKey pe = pi < np ? TKey.Load(ep, 0) : default;
        TC lc = cd[0];

        int polls = 0;
        while (hlen > 1 || pi < np)
        {
            if ((++polls & 1023) == 0) KernelCancellation.Poll();
            TKey exp;
            if (hlen == 1) exp = pe;
            else if (pi < np && TKey.Greater(pe, hexp[1])) exp = pe;
            else exp = hexp[1];

            TAcc acc;
            if (pi < np && TKey.Same(pe, exp))
            {
                acc = cp[pi];
                if (++pi < np) pe = TKey.Load(ep, pi);
            }
            else TOps.Set(out acc, default!);

            int sp = 0;
            while (hlen > 1 && TKey.Same(hexp[1], exp))
            {
                int r = hhead[1];
                hlen--;
                if (hlen > 1)
                {
                    TKey le = hexp[hlen]; int lh = hhead[hlen];
                    int hole = 1, c = 2;
                    while (c < hlen)
                    {
                        if (c + 1 < hlen && TKey.Greater(hexp[c + 1], hexp[c])) c++;
                        if (!TKey.Greater(hexp[c], le)) break;
                        hexp[hole] = hexp[c]; hhead[hole] = hhead[c];
                        hole = c; c = 2 * c;
                    }
                    hexp[hole] = le; hhead[hole] = lh;
                }
                for (; r >= 0; r = next[r])
                {
                    TOps.MulSub(ref acc, qc[qi[r]], cd[r]);
                    store[sp++] = r;
                }
            }
            while (sp > 0)
            {
                int j = store[--sp];
                int i = qi[j] + 1;
                qi[j] = i;
                if (i < qCount) InsertKey(hexp, hhead, next, ref hlen, j, TKey.Add(TKey.Load(qe, i), dk[j]));
                else waiting[nw++] = j;
            }

            if (TOps.IsZero(in acc)) continue;

            // New quotient term: exp / d0 must be a monomial inside the quotient's box.
            if (!TKey.TryQuotientExponent(exp, d0, guard, qMax, out TKey t)) return DivideStatus.NotDivisible;
            var status = QuotientCoefficient<TOps, TC, TAcc>(in acc, lc, limit, magnitude, ref qSum, qSumLimit, out TC q);
            if (status != DivideStatus.Exact) return status;
            if (qCount == qc.Length)
            {
                int size = qc.Length * 2;
                Array.Resize(ref qe, size * W);
                Array.Resize(ref qc, size);
            }
            int row = qCount++;
            TKey.Store(ref qe[row * W], t);
            qc[row] = q;
            // Every waiting row has caught up with the new term: its stream resumes at d_j·q_row.
            while (nw > 0)
            {
                int j = waiting[--nw];
                InsertKey(hexp, hhead, next, ref hlen, j, TKey.Add(t, dk[j]));
            }
        }
        return DivideStatus.Exact;
    }

    /// <summary>Inserts row <paramref name="row"/> with exponent <paramref name="e"/>, chaining it to an
    /// equal exponent met on the way up.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void InsertKey<TKey>(TKey[] hexp, int[] hhead, int[] next, ref int hlen, int row, TKey e)
        where TKey : struct, IPackedKey<TKey>
    {
        int pos = hlen, j = pos;
        while (j > 1)
        {
            int p = j >> 1;
            TKey pe = hexp[p];
            if (TKey.Same(pe, e)) { next[row] = hhead[p]; hhead[p] = row; return; }
            if (TKey.Greater(e, pe)) j = p; else break;
        }
        hlen++;
        int k = pos;
        while (k > j)
        {
            int p = k >> 1;
            hexp[k] = hexp[p]; hhead[k] = hhead[p];
            k = p;
        }
        hexp[j] = e; hhead[j] = row;
        next[row] = -1;
    }

    /// <summary>Multi-word exact division with one heap entry per divisor term (same contract as
    /// <see cref="DivideHeapN"/>).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static DivideStatus DivideDivisorHeapN<TOps, TC, TAcc>(
        ReadOnlySpan<ulong> ep, ReadOnlySpan<TAcc> cp, ReadOnlySpan<ulong> ed, ReadOnlySpan<TC> cd, int words,
        ReadOnlySpan<ulong> guard, ReadOnlySpan<ulong> qMax, TC limit, double qSumLimit, Func<TC, double> magnitude, out ulong[] qe, out TC[] qc, out int qCount)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int N = words, np = cp.Length, nd = cd.Length;
        double qSum = 0;
        int cap = Math.Max(16, Math.Min(np, 1 << 16));
        qe = new ulong[cap * N];
        qc = new TC[cap];
        qCount = 0;
        var rowExp = new ulong[nd * N];
        var hhead = new int[nd + 1];
        var qi = new int[nd];
        var next = new int[nd];
        var store = new int[nd];
        var waiting = new int[nd];
        int nw = 0;
        for (int j = nd - 1; j >= 1; j--) waiting[nw++] = j;
        var exp = new ulong[N];
        var t = new ulong[N];
        int hlen = 1, pi = 0;
        TC lc = cd[0];

        int polls = 0;
        while (hlen > 1 || pi < np)
        {
            if ((++polls & 1023) == 0) KernelCancellation.Poll();
            var acc = NextTermN<TOps, TC, TAcc>(ep, cp, ref pi, rowExp, hhead, hlen, exp);

            int sp = 0;
            while (hlen > 1 && rowExp.AsSpan(hhead[1] * N, N).SequenceEqual(exp))
            {
                int r = hhead[1];
                hlen--;
                if (hlen > 1) PolynomialMultiply.PopRootN(rowExp, N, hhead, hlen);
                for (; r >= 0; r = next[r])
                {
                    TOps.MulSub(ref acc, qc[qi[r]], cd[r]);
                    store[sp++] = r;
                }
            }
            while (sp > 0)
            {
                int j = store[--sp];
                int i = qi[j] + 1;
                qi[j] = i;
                if (i < qCount)
                {
                    var re = rowExp.AsSpan(j * N, N);
                    var q = qe.AsSpan(i * N, N);
                    var dj = ed.Slice(j * N, N);
                    for (int w = 0; w < N; w++) re[w] = q[w] + dj[w];
                    InsertN(rowExp, N, hhead, next, ref hlen, j);
                }
                else waiting[nw++] = j;
            }

            if (TOps.IsZero(in acc)) continue;

            if (!TryQuotientExponentN(exp, ed[..N], guard, qMax, t)) return DivideStatus.NotDivisible;
            var status = QuotientCoefficient<TOps, TC, TAcc>(in acc, lc, limit, magnitude, ref qSum, qSumLimit, out TC qcoef);
            if (status != DivideStatus.Exact) return status;
            if (qCount == qc.Length)
            {
                int size = qc.Length * 2;
                Array.Resize(ref qe, size * N);
                Array.Resize(ref qc, size);
            }
            int row = qCount++;
            t.CopyTo(qe.AsSpan(row * N, N));
            qc[row] = qcoef;
            while (nw > 0)
            {
                int j = waiting[--nw];
                var re = rowExp.AsSpan(j * N, N);
                var dj = ed.Slice(j * N, N);
                for (int w = 0; w < N; w++) re[w] = t[w] + dj[w];
                InsertN(rowExp, N, hhead, next, ref hlen, j);
            }
        }
        return DivideStatus.Exact;
    }
}
