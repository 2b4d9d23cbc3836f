using System.Runtime.CompilerServices;
using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Kernels;

/// <summary>Outcome of an exact-division kernel.</summary>
internal enum DivideStatus
{
    /// <summary>The divisor divides the dividend; the quotient is complete and exact.</summary>
    Exact,
    /// <summary>The divisor does not divide the dividend (a definite answer).</summary>
    NotDivisible,
    /// <summary>A quotient coefficient is too large for the chosen representation; retry wider.</summary>
    TooLarge,
}

/// <summary>Exact division of sparse polynomials by the heap method (Monagan and Pearce, "Sparse
/// polynomial division using a heap", J. Symbolic Comput. 46, 2011).</summary>
/// <remarks>
/// <para>Inputs are polynomials with non-negative packed exponents (guard bit in every field) and
/// integer coefficients, the divisor primitive, both sorted in descending lex order (a monomial
/// order, so the division terminates). The heap holds one entry per quotient term i: the next
/// product q_i·d_j still to be subtracted. At each step the largest exponent among the heap and the
/// next dividend term gives the leading term of the current remainder; it must be divisible by the
/// divisor's leading term (guard-bit test after subtracting packed words), must lie in the
/// quotient's degree box (guard-bit test against the packed maxima) and its coefficient must be an
/// integer multiple of the divisor's leading coefficient (Gauss's lemma: the quotient of an integer
/// polynomial by a primitive one, when it exists, has integer coefficients). Any failure proves that
/// the divisor does not divide. On success the remainder is zero by construction, so the quotient is
/// verified exactly.</para>
/// </remarks>
internal static class PolynomialDivide
{
    /// <summary>Single-word exact division. Returns the status and, when exact, the quotient terms.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static DivideStatus DivideHeap1<TOps, TC, TAcc>(
        ReadOnlySpan<ulong> ep, ReadOnlySpan<TC> cp, ReadOnlySpan<ulong> ed, ReadOnlySpan<TC> cd,
        ulong guard, ulong qMax, TC limit, out ulong[] qe, out TC[] qc, out int qCount)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int np = ep.Length, nd = ed.Length;
        int cap = Math.Max(16, Math.Min(np, 1 << 16));
        qe = new ulong[cap];
        qc = new TC[cap];
        qCount = 0;
        var hexp = new ulong[cap + 1];
        var hhead = new int[cap + 1];
        var nj = new int[cap];
        var next = new int[cap];
        var store = new int[cap];
        int hlen = 1, pi = 0;
        ulong d0 = ed[0];
        TC lc = cd[0];

        while (hlen > 1 || pi < np)
        {
            ulong exp;
            if (hlen == 1) exp = ep[pi];
            else if (pi < np && ep[pi] > hexp[1]) exp = ep[pi];
            else exp = hexp[1];

            TAcc acc;
            if (pi < np && ep[pi] == exp) { TOps.Set(out acc, cp[pi]); pi++; }
            else TOps.Set(out acc, default!);

            int sp = 0;
            while (hlen > 1 && hexp[1] == exp)
            {
                int r = hhead[1];
                hlen--;
                if (hlen > 1)
                {
                    ulong le = hexp[hlen]; int lh = hhead[hlen];
                    int hole = 1, c = 2;
                    while (c < hlen)
                    {
                        if (c + 1 < hlen && hexp[c + 1] > hexp[c]) c++;
                        if (hexp[c] <= le) break;
                        hexp[hole] = hexp[c]; hhead[hole] = hhead[c];
                        hole = c; c = 2 * c;
                    }
                    hexp[hole] = le; hhead[hole] = lh;
                }
                for (; r >= 0; r = next[r])
                {
                    TOps.MulSub(ref acc, qc[r], cd[nj[r]]);
                    store[sp++] = r;
                }
            }
            while (sp > 0)
            {
                int i = store[--sp];
                int j = nj[i] + 1;
                if (j < nd)
                {
                    nj[i] = j;
                    Insert(hexp, hhead, next, ref hlen, i, qe[i] + ed[j]);
                }
            }

            if (TOps.IsZero(in acc)) continue;

            // New quotient term: exp / d0 must be a monomial inside the quotient's box.
            ulong t = exp - d0;
            if ((t & guard) != 0 || exp < d0 || ((qMax - t) & guard) != 0 || t > qMax) return DivideStatus.NotDivisible;
            int st = TOps.TryDivideExact(in acc, lc, limit, out TC q);
            if (st != 0) return st == 1 ? DivideStatus.NotDivisible : DivideStatus.TooLarge;
            if (qCount == qe.Length)
            {
                int size = qe.Length * 2;
                Array.Resize(ref qe, size);
                Array.Resize(ref qc, size);
                Array.Resize(ref hexp, size + 1);
                Array.Resize(ref hhead, size + 1);
                Array.Resize(ref nj, size);
                Array.Resize(ref next, size);
                Array.Resize(ref store, size);
            }
            int row = qCount++;
            qe[row] = t;
            qc[row] = q;
            if (nd > 1)
            {
                nj[row] = 1;
                Insert(hexp, hhead, next, ref hlen, row, t + ed[1]);
            }
        }
        return DivideStatus.Exact;
    }

    private static void Insert(ulong[] hexp, int[] hhead, int[] next, ref int hlen, int row, ulong e)
    {
        int pos = hlen, j = pos;
        while (j > 1)
        {
            int p = j >> 1;
            ulong pe = hexp[p];
            if (pe == e) { next[row] = hhead[p]; hhead[p] = row; return; }
            if (pe < e) j = p; else break;
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

    /// <summary>Multi-word exact division (<paramref name="words"/> words per exponent, word 0 most
    /// significant; fields never straddle words, so words are subtracted independently).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static DivideStatus DivideHeapN<TOps, TC, TAcc>(
        ReadOnlySpan<ulong> ep, ReadOnlySpan<TC> cp, ReadOnlySpan<ulong> ed, ReadOnlySpan<TC> cd, int words,
        ReadOnlySpan<ulong> guard, ReadOnlySpan<ulong> qMax, TC limit, out ulong[] qe, out TC[] qc, out int qCount)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int N = words, np = cp.Length, nd = cd.Length;
        int cap = Math.Max(16, Math.Min(np, 1 << 16));
        qe = new ulong[cap * N];
        qc = new TC[cap];
        qCount = 0;
        var rowExp = new ulong[cap * N];
        var hhead = new int[cap + 1];
        var nj = new int[cap];
        var next = new int[cap];
        var store = new int[cap];
        var exp = new ulong[N];
        var t = new ulong[N];
        int hlen = 1, pi = 0;
        TC lc = cd[0];

        while (hlen > 1 || pi < np)
        {
            if (hlen == 1) ep.Slice(pi * N, N).CopyTo(exp);
            else
            {
                var top = rowExp.AsSpan(hhead[1] * N, N);
                if (pi < np && PolynomialMultiply.CompareN(ep.Slice(pi * N, N), top) > 0) ep.Slice(pi * N, N).CopyTo(exp);
                else top.CopyTo(exp);
            }

            TAcc acc;
            if (pi < np && ep.Slice(pi * N, N).SequenceEqual(exp)) { TOps.Set(out acc, cp[pi]); pi++; }
            else TOps.Set(out acc, default!);

            int sp = 0;
            while (hlen > 1 && rowExp.AsSpan(hhead[1] * N, N).SequenceEqual(exp))
            {
                int r = hhead[1];
                hlen--;
                if (hlen > 1)
                {
                    int lh = hhead[hlen];
                    var le = rowExp.AsSpan(lh * N, N);
                    int hole = 1, c = 2;
                    while (c < hlen)
                    {
                        if (c + 1 < hlen && PolynomialMultiply.CompareN(rowExp.AsSpan(hhead[c + 1] * N, N), rowExp.AsSpan(hhead[c] * N, N)) > 0) c++;
                        if (PolynomialMultiply.CompareN(rowExp.AsSpan(hhead[c] * N, N), le) <= 0) break;
                        hhead[hole] = hhead[c];
                        hole = c; c = 2 * c;
                    }
                    hhead[hole] = lh;
                }
                for (; r >= 0; r = next[r])
                {
                    TOps.MulSub(ref acc, qc[r], cd[nj[r]]);
                    store[sp++] = r;
                }
            }
            while (sp > 0)
            {
                int i = store[--sp];
                int j = nj[i] + 1;
                if (j < nd)
                {
                    nj[i] = j;
                    var re = rowExp.AsSpan(i * N, N);
                    var qi = qe.AsSpan(i * N, N);
                    var dj = ed.Slice(j * N, N);
                    for (int w = 0; w < N; w++) re[w] = qi[w] + dj[w];
                    InsertN(rowExp, N, hhead, next, ref hlen, i);
                }
            }

            if (TOps.IsZero(in acc)) continue;

            for (int w = 0; w < N; w++)
            {
                ulong x = exp[w], d = ed[w];
                t[w] = x - d;
                if (((x - d) & guard[w]) != 0 || x < d || ((qMax[w] - t[w]) & guard[w]) != 0 || t[w] > qMax[w])
                    return DivideStatus.NotDivisible;
            }
            int st = TOps.TryDivideExact(in acc, lc, limit, out TC q);
            if (st != 0) return st == 1 ? DivideStatus.NotDivisible : DivideStatus.TooLarge;
            if (qCount == qc.Length)
            {
                int size = qc.Length * 2;
                Array.Resize(ref qe, size * N);
                Array.Resize(ref qc, size);
                Array.Resize(ref rowExp, size * N);
                Array.Resize(ref hhead, size + 1);
                Array.Resize(ref nj, size);
                Array.Resize(ref next, size);
                Array.Resize(ref store, size);
            }
            int row = qCount++;
            t.CopyTo(qe.AsSpan(row * N, N));
            qc[row] = q;
            if (nd > 1)
            {
                nj[row] = 1;
                var re = rowExp.AsSpan(row * N, N);
                var d1 = ed.Slice(N, N);
                for (int w = 0; w < N; w++) re[w] = t[w] + d1[w];
                InsertN(rowExp, N, hhead, next, ref hlen, row);
            }
        }
        return DivideStatus.Exact;
    }

    private static void InsertN(ulong[] rowExp, int N, int[] hhead, int[] next, ref int hlen, int row)
    {
        var e = rowExp.AsSpan(row * N, N);
        int pos = hlen, j = pos;
        while (j > 1)
        {
            int p = j >> 1;
            int c = PolynomialMultiply.CompareN(rowExp.AsSpan(hhead[p] * N, N), e);
            if (c == 0) { next[row] = hhead[p]; hhead[p] = row; return; }
            if (c < 0) j = p; else break;
        }
        hlen++;
        int k = pos;
        while (k > j)
        {
            int p = k >> 1;
            hhead[k] = hhead[p];
            k = p;
        }
        hhead[j] = row;
        next[row] = -1;
    }

    /// <summary>Divides A by B exactly in the Laurent ring (A, B canonical and non-empty; B not a
    /// monomial). Both are first divided by their monomial content (per-variable minimum exponents),
    /// which makes them polynomials not divisible by any variable; then A/B is a Laurent polynomial
    /// iff B₀ divides A₀ as polynomials, and the quotient is x^(minA − minB)·A₀/B₀.</summary>
    /// <returns>True with the quotient when B divides A; false otherwise.</returns>
    public static bool TryDivide(ReadOnlySpan<Rational> ca, ReadOnlySpan<int> ea, ReadOnlySpan<Rational> cb, ReadOnlySpan<int> eb,
        int n, out Rational[] coeffs, out int[] exps)
    {
        coeffs = [];
        exps = [];
        ProductShape.MinMax(ea, n, out var minA, out var maxA);
        ProductShape.MinMax(eb, n, out var minB, out var maxB);
        var qRange = new long[n];
        var offset = new long[n];
        for (int v = 0; v < n; v++)
        {
            long ra = (long)maxA[v] - minA[v], rb = (long)maxB[v] - minB[v];
            if (rb > ra) return false;
            qRange[v] = ra - rb;
            offset[v] = (long)minA[v] - minB[v];
            if (offset[v] < int.MinValue || offset[v] + qRange[v] > int.MaxValue) return false;
        }
        // Leading and trailing terms of A₀ must be those of B₀ times those of the quotient.
        if (!ShiftedDivides(ea[..n], minA, eb[..n], minB, qRange) ||
            !ShiftedDivides(ea[^n..], minA, eb[^n..], minB, qRange))
            return false;
        if (ca.Length < cb.Length) return false;

        var maxValue = new long[n];
        for (int v = 0; v < n; v++) maxValue[v] = (long)maxA[v] - minA[v];
        var layout = ExponentLayout.Create(maxValue, guard: true);
        int N = layout.Words;
        var pa = new ulong[ca.Length * N];
        var pb = new ulong[cb.Length * N];
        layout.Pack(ea, n, minA, pa);
        layout.Pack(eb, n, minB, pb);
        var qMaxPacked = new ulong[N];
        {
            var tmp = new int[n];
            for (int v = 0; v < n; v++) tmp[v] = (int)qRange[v];
            layout.Pack(tmp, n, new int[n], qMaxPacked);
        }

        DivideStatus status;
        ulong[] qe;
        int qCount;
        Rational scale;
        Rational[] result;
        if (CoefficientForm.TryWords(ca, out var wa, out long da) && CoefficientForm.TryWords(cb, out var wb, out long db))
        {
            // B = c·B''/db with B'' primitive; A = A'/da; A/B = db/(da·c) · A'/B''.
            ulong g = 0;
            foreach (var x in wb) g = IntegerMath.Gcd(g, IntegerMath.UnsignedAbs(x));
            long c = wb[0] < 0 ? -(long)g : (long)g;
            if (c != 1) for (int i = 0; i < wb.Length; i++) wb[i] /= c;
            int bitsB = CoefficientBounds.MaxBits(wb) + CoefficientBounds.Bits((ulong)wb.Length);
            Int128 lim = (Int128.One << 125) >> bitsB;
            long limit = lim > long.MaxValue ? long.MaxValue : (long)lim;
            long[] qw;
            status = N == 1
                ? DivideHeap1<Word128Ops, long, Int128>(pa, wa, pb, wb, layout.GuardMask[0], qMaxPacked[0], limit, out qe, out qw, out qCount)
                : DivideHeapN<Word128Ops, long, Int128>(pa, wa, pb, wb, N, layout.GuardMask, qMaxPacked, limit, out qe, out qw, out qCount);
            if (status == DivideStatus.NotDivisible) return false;
            if (status == DivideStatus.Exact)
            {
                scale = new Rational(db) / (new Rational(da) * new Rational(c));
                result = new Rational[qCount];
                for (int i = 0; i < qCount; i++) result[i] = scale.IsOne ? new Rational(qw[i]) : new Rational(qw[i]) * scale;
                Finish(layout, qe, qCount, n, offset, result, out coeffs, out exps);
                return true;
            }
        }
        CoefficientForm.ToBig(ca, out var ba, out var bda);
        CoefficientForm.ToBig(cb, out var bb, out var bdb);
        var bg = BigInteger.Zero;
        foreach (var x in bb) bg = BigInteger.GreatestCommonDivisor(bg, x);
        if (bb[0].Sign < 0) bg = -bg;
        if (!bg.IsOne) for (int i = 0; i < bb.Length; i++) bb[i] /= bg;
        BigInteger[] qb;
        status = N == 1
            ? DivideHeap1<BigOps, BigInteger, BigInteger>(pa, ba, pb, bb, layout.GuardMask[0], qMaxPacked[0], BigInteger.Zero, out qe, out qb, out qCount)
            : DivideHeapN<BigOps, BigInteger, BigInteger>(pa, ba, pb, bb, N, layout.GuardMask, qMaxPacked, BigInteger.Zero, out qe, out qb, out qCount);
        if (status != DivideStatus.Exact) return false;
        scale = new Rational(bdb, bda * bg);
        result = new Rational[qCount];
        for (int i = 0; i < qCount; i++) result[i] = new Rational(qb[i]) * scale;
        Finish(layout, qe, qCount, n, offset, result, out coeffs, out exps);
        return true;
    }

    private static void Finish(ExponentLayout layout, ulong[] qe, int qCount, int n, long[] offset, Rational[] result,
        out Rational[] coeffs, out int[] exps)
    {
        exps = new int[qCount * n];
        layout.Unpack(qe, qCount, n, offset, exps);
        coeffs = result;
    }

    private static bool ShiftedDivides(ReadOnlySpan<int> a, int[] minA, ReadOnlySpan<int> b, int[] minB, long[] qRange)
    {
        for (int v = 0; v < a.Length; v++)
        {
            long d = ((long)a[v] - minA[v]) - ((long)b[v] - minB[v]);
            if (d < 0 || d > qRange[v]) return false;
        }
        return true;
    }
}
