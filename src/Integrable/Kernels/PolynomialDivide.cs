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
    /// <summary>A partial sum could exceed the chosen accumulator; retry with a wider accumulator.</summary>
    TooLarge,
    /// <summary>A quotient coefficient does not fit the coefficient type (a word): every word-coefficient
    /// accumulator would stop at the same term, so the caller goes straight to big integers.</summary>
    QuotientTooLarge,
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
/// <para>When the quotient is much larger than the divisor (#d² ≤ #p), <see cref="DivideHeap1"/> and
/// <see cref="DivideHeapN"/> hand over to the divisor heap of the same paper (one entry per divisor
/// term; PolynomialDivide.DivisorHeap.cs), whose heap stays small and cache-resident.</para>
/// </remarks>
internal static partial class PolynomialDivide
{
    /// <summary>Single-word exact division. Returns the status and, when exact, the quotient terms.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static DivideStatus DivideHeap1<TOps, TC, TAcc>(
        ReadOnlySpan<ulong> ep, ReadOnlySpan<TAcc> cp, ReadOnlySpan<ulong> ed, ReadOnlySpan<TC> cd,
        ulong guard, ulong qMax, TC limit, double qSumLimit, Func<TC, double> magnitude, out ulong[] qe, out TC[] qc, out int qCount)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int np = ep.Length, nd = ed.Length;
        if (UseDivisorHeap(np, nd))
            return DivideDivisorHeap1<TOps, TC, TAcc>(ep, cp, ed, cd, guard, qMax, limit, qSumLimit, magnitude, out qe, out qc, out qCount);
        double qSum = 0;
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

        int polls = 0;
        while (hlen > 1 || pi < np)
        {
            if ((++polls & 1023) == 0) KernelCancellation.Poll();
            ulong exp;
            if (hlen == 1) exp = ep[pi];
            else if (pi < np && ep[pi] > hexp[1]) exp = ep[pi];
            else exp = hexp[1];

            TAcc acc;
            if (pi < np && ep[pi] == exp) { acc = cp[pi]; pi++; }
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
            var status = QuotientCoefficient<TOps, TC, TAcc>(in acc, lc, limit, magnitude, ref qSum, qSumLimit, out TC q);
            if (status != DivideStatus.Exact) return status;
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

    /// <summary>The coefficient of a new quotient term, acc / lc, shared by every division loop.</summary>
    /// <returns><see cref="DivideStatus.Exact"/> to go on; otherwise the status that ends the division:
    /// not an exact integer quotient (not divisible), too large for the coefficient type, or a Σ|q| past
    /// the accumulator's limit.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static DivideStatus QuotientCoefficient<TOps, TC, TAcc>(in TAcc acc, TC lc, TC limit, Func<TC, double> magnitude,
        ref double qSum, double qSumLimit, out TC q)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int st = TOps.TryDivideExact(in acc, lc, limit, out q);
        if (st == 1) return DivideStatus.NotDivisible;
        qSum += magnitude(q);
        if (st == 2) return DivideStatus.QuotientTooLarge;
        return qSum > qSumLimit ? DivideStatus.TooLarge : DivideStatus.Exact;
    }

    /// <summary>The row-buffer loops' next remainder term: its exponent (the larger of the next dividend term and
    /// the heap's root) into <paramref name="exp"/>, and the accumulator started from the dividend's coefficient there
    /// (zero when the dividend has no such term; <paramref name="pi"/> then stays).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static TAcc NextTermN<TOps, TC, TAcc>(ReadOnlySpan<ulong> ep, ReadOnlySpan<TAcc> cp, ref int pi,
        ulong[] rowExp, int[] hhead, int hlen, Span<ulong> exp)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int N = exp.Length, np = cp.Length;
        if (hlen == 1) ep.Slice(pi * N, N).CopyTo(exp);
        else
        {
            var top = rowExp.AsSpan(hhead[1] * N, N);
            if (pi < np && PolynomialMultiply.CompareN(ep.Slice(pi * N, N), top) > 0) ep.Slice(pi * N, N).CopyTo(exp);
            else top.CopyTo(exp);
        }
        TAcc acc;
        if (pi < np && ep.Slice(pi * N, N).SequenceEqual(exp)) { acc = cp[pi]; pi++; }
        else TOps.Set(out acc, default!);
        return acc;
    }

    /// <summary>Multi-word <see cref="Key1.TryWord"/>: t = exp − d0 word by word, false unless t is a
    /// monomial inside the quotient's box.</summary>
    private static bool TryQuotientExponentN(ReadOnlySpan<ulong> exp, ReadOnlySpan<ulong> d0, ReadOnlySpan<ulong> guard,
        ReadOnlySpan<ulong> qMax, Span<ulong> t)
    {
        for (int w = 0; w < t.Length; w++)
            if (!Key1.TryWord(exp[w], d0[w], guard[w], qMax[w], out t[w])) return false;
        return true;
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
        ReadOnlySpan<ulong> ep, ReadOnlySpan<TAcc> cp, ReadOnlySpan<ulong> ed, ReadOnlySpan<TC> cd, int words,
        ReadOnlySpan<ulong> guard, ReadOnlySpan<ulong> qMax, TC limit, double qSumLimit, Func<TC, double> magnitude, out ulong[] qe, out TC[] qc, out int qCount)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int N = words, np = cp.Length, nd = cd.Length;
        if (UseDivisorHeap(np, nd))
            return words switch
            {
                2 => DivideDivisorHeapK<TOps, TC, TAcc, Key2>(ep, cp, ed, cd, guard, qMax, limit, qSumLimit, magnitude, out qe, out qc, out qCount),
                3 => DivideDivisorHeapK<TOps, TC, TAcc, Key3>(ep, cp, ed, cd, guard, qMax, limit, qSumLimit, magnitude, out qe, out qc, out qCount),
                4 => DivideDivisorHeapK<TOps, TC, TAcc, Key4>(ep, cp, ed, cd, guard, qMax, limit, qSumLimit, magnitude, out qe, out qc, out qCount),
                _ => DivideDivisorHeapN<TOps, TC, TAcc>(ep, cp, ed, cd, words, guard, qMax, limit, qSumLimit, magnitude, out qe, out qc, out qCount),
            };
        double qSum = 0;
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

            if (!TryQuotientExponentN(exp, ed[..N], guard, qMax, t)) return DivideStatus.NotDivisible;
            var status = QuotientCoefficient<TOps, TC, TAcc>(in acc, lc, limit, magnitude, ref qSum, qSumLimit, out TC q);
            if (status != DivideStatus.Exact) return status;
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

    /// <summary>Forces the dense (true) or heap (false) division on the current thread; null dispatches.</summary>
    [ThreadStatic] internal static bool? ForceDense;

    /// <summary>Dense division is chosen only when the dividend's degree box has at most this many
    /// cells per dividend term (the scan of each window costs one cell visit).</summary>
    internal static double DenseBoxPerTerm = 64;

    /// <summary>Divides A by B exactly in the Laurent ring (A, B canonical and non-empty; B not a
    /// monomial). Both are first divided by their monomial content (per-variable minimum exponents),
    /// which makes them polynomials not divisible by any variable; then A/B is a Laurent polynomial
    /// iff B₀ divides A₀ as polynomials, and the quotient is x^(minA − minB)·A₀/B₀.</summary>
    /// <remarks>Dispatch: a sparse box of graded operands is first projected onto the pivot coordinates
    /// of the supports' affine hull (<see cref="SupportHull"/>); a dense dividend with coefficients of two
    /// words or more goes to Kronecker substitution (<see cref="TryDivideKronecker"/>). Otherwise the
    /// divisor is made primitive with word coefficients and the dividend put in 128-bit form when
    /// possible; then dense division (<see cref="DivideDense"/>) when the dividend's degree box has aligned
    /// windows and at most <see cref="DenseBoxPerTerm"/> cells per dividend term, else heap division; with
    /// 64-, then 128-, then 192-bit accumulators (each attempt stops with <see cref="DivideStatus.TooLarge"/>
    /// as soon as its bound could be exceeded), then three- and four-limb coefficients, and big integers
    /// beyond.</remarks>
    /// <returns>True with the quotient when B divides A; false otherwise.</returns>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static bool TryDivide(ReadOnlySpan<Rational> ca, int[] ea, ReadOnlySpan<Rational> cb, int[] eb,
        int n, out Rational[] coeffs, out int[] exps) =>
        TryDivide(ca, ea, cb, eb, n, project: !PolynomialMultiply.NoProjection && ForceDense is null, out coeffs, out exps);

    private static bool TryDivide(ReadOnlySpan<Rational> ca, int[] ea, ReadOnlySpan<Rational> cb, int[] eb,
        int n, bool project, out Rational[] coeffs, out int[] exps)
    {
        coeffs = [];
        exps = [];
        ProductShape.MinMax(ea, n, out var minA, out var maxA);
        ProductShape.MinMax(eb, n, out var minB, out var maxB);
        var qRange = new long[n];
        var offset = new long[n];
        var radix = new long[n];
        long box = 1;
        for (int v = 0; v < n; v++)
        {
            long ra = (long)maxA[v] - minA[v], rb = (long)maxB[v] - minB[v];
            if (rb > ra) return false;
            qRange[v] = ra - rb;
            offset[v] = (long)minA[v] - minB[v];
            if (offset[v] < int.MinValue || offset[v] + qRange[v] > int.MaxValue) return false;
            radix[v] = ra + 1;
            box = box > long.MaxValue / radix[v] ? long.MaxValue : box * radix[v];
        }
        // Leading and trailing terms of A₀ must be those of B₀ times those of the quotient.
        if (!ShiftedDivides(ea[..n], minA, eb[..n], minB, qRange) ||
            !ShiftedDivides(ea[^n..], minA, eb[^n..], minB, qRange))
            return false;

        // The hull costs up to (#A + #B)·n² word operations: tried only when that is small against the division.
        if (project && n >= 2 && cb.Length >= 2 && (box > PolynomialMultiply.DenseMaxBox || box > DenseBoxPerTerm * ca.Length) &&
            ((double)ca.Length + cb.Length) * n * n <= (double)ca.Length * cb.Length &&
            TryDivideProjected(ca, ea, cb, eb, n, out bool divides, out coeffs, out exps))
            return divides;

        if (TryDivideKronecker(ca, ea, cb, eb, n, minA, minB, qRange, radix, box, out bool kroneckerDivides, out coeffs, out exps))
            return kroneckerDivides;

        var ctx = new DivisionInput(ca, ea, cb, eb, n, minA, minB, qRange, offset, radix, box);
        // The dividend stays in words when it fits (widened to 128 bits only if a wider accumulator runs).
        if (CoefficientForm.TryWords(cb, out var wb, out long db) && CoefficientForm.TryWide(ca, out var pWords, out var pw, out var dp))
        {
            Int128[] Wide() => pw ??= Array.ConvertAll(pWords!, static x => (Int128)x);
            // B = c·B''/db with B'' primitive; A = A'/dp; A/B = db/(dp·c) · A'/B''.
            ulong g = 0;
            foreach (var x in wb) g = IntegerMath.Gcd(g, IntegerMath.UnsignedAbs(x));
            long c = wb[0] < 0 ? -(long)g : (long)g;
            if (c != 1) for (int i = 0; i < wb.Length; i++) wb[i] /= c;
            var scale = new Rational(db) / (new Rational(dp) * new Rational(c));
            double maxP = 0, maxD = 0, l1P = 0, l1D = 0;
            if (pWords is not null) foreach (var x in pWords) { double m = Math.Abs((double)x); maxP = Math.Max(maxP, m); l1P += m; }
            else foreach (var x in pw!) { double m = Math.Abs((double)x); maxP = Math.Max(maxP, m); l1P += m; }
            foreach (var x in wb) { double m = Math.Abs((double)x); maxD = Math.Max(maxD, m); l1D += m; }
            // ‖Q‖₁ ≥ ‖P‖₁/‖D‖₁, so an accumulator whose Σ|q| limit is below that cannot succeed.
            double qL1Lower = l1P / l1D * 0.99;
            // Partial sums are bounded by max|P| + Σ|q|·max|D|; the factor 1/2 absorbs rounding.
            double Limit(int bits) => (Math.ScaleB(1.0, bits) - maxP) / maxD / 2;
            Func<long, double> mag = static q => Math.Abs((double)q);
            DivideStatus status = DivideStatus.TooLarge;
            long[]? qw = null;
            if (maxP < Math.ScaleB(1.0, 62) && qL1Lower <= Limit(62))
            {
                var p64 = pWords;
                if (p64 is null)
                {
                    p64 = new long[pw!.Length];
                    for (int i = 0; i < pw.Length; i++) p64[i] = (long)pw[i];
                }
                status = ctx.Run<Word64Ops, long, long>(p64, wb, long.MaxValue, Limit(62), mag, out qw, out var qe64);
                if (status == DivideStatus.Exact) return ctx.Finish(qw!, qe64, scale, out coeffs, out exps);
            }
            if (status == DivideStatus.TooLarge && qL1Lower <= Limit(126))
            {
                status = ctx.Run<Word128Ops, long, Int128>(Wide(), wb, long.MaxValue, Limit(126), mag, out qw, out var qe128);
                if (status == DivideStatus.Exact) return ctx.Finish(qw!, qe128, scale, out coeffs, out exps);
            }
            if (status == DivideStatus.TooLarge)
            {
                var p128 = Wide();
                var p192 = new Int192[p128.Length];
                for (int i = 0; i < p128.Length; i++)
                {
                    Int128 x = p128[i];
                    p192[i].Lo = (ulong)x;
                    p192[i].Mid = (ulong)(x >> 64);
                    p192[i].Hi = x < 0 ? -1 : 0;
                }
                status = ctx.Run<Word192Ops, long, Int192>(p192, wb, long.MaxValue, Limit(190), mag, out qw, out var qe192);
                if (status == DivideStatus.Exact) return ctx.Finish(qw!, qe192, scale, out coeffs, out exps);
            }
            if (status == DivideStatus.NotDivisible) return false;
        }
        CoefficientForm.ToBig(ca, out var ba, out var bda);
        CoefficientForm.ToBig(cb, out var bb, out var bdb);
        var bg = BigInteger.Zero;
        foreach (var x in bb) bg = BigInteger.GreatestCommonDivisor(bg, x);
        if (bb[0].Sign < 0) bg = -bg;
        if (!bg.IsOne) for (int i = 0; i < bb.Length; i++) bb[i] /= bg;
        if (!PolynomialMultiply.ForceBig)
        {
            // Multi-limb paths: three limbs (divisor and quotient up to 191 bits, dividend up to 446), then
            // four (255 and 573 bits). The first is skipped when max|P|/‖D‖₁, a lower bound for max|Q|,
            // already needs more than three limbs.
            var status = DivideStatus.TooLarge;
            if (!PolynomialMultiply.ForceFourLimbs && QuotientBitsLowerBound(ba, bb) <= Magnitude192.MaxBits)
                status = TryDivideMultiLimb<Wide448Ops, Magnitude192, Int448>(ctx, ba, bb, bda, bdb, bg, out coeffs, out exps);
            if (status is DivideStatus.TooLarge or DivideStatus.QuotientTooLarge)
                status = TryDivideMultiLimb<Wide576Ops, Magnitude256, Int576>(ctx, ba, bb, bda, bdb, bg, out coeffs, out exps);
            if (status == DivideStatus.Exact) return true;
            if (status == DivideStatus.NotDivisible) return false;
        }
        var bigStatus = ctx.Run<BigOps, BigInteger, BigInteger>(ba, bb, BigInteger.Zero, double.PositiveInfinity, static _ => 0, out var qb, out var qeb);
        if (bigStatus != DivideStatus.Exact) return false;
        var bigScale = new Rational(bdb, bda * bg);
        var result = new Rational[qb!.Length];
        for (int i = 0; i < result.Length; i++) result[i] = new Rational(qb[i]) * bigScale;
        return ctx.Finish(result, qeb, out coeffs, out exps);
    }

    /// <summary>Division on the pivot coordinates of the supports' affine hull (<see cref="SupportHull"/>) when
    /// the operands are graded and the projected dividend is dense enough for the dense method; false when
    /// that does not apply (then <paramref name="divides"/> is meaningless).</summary>
    private static bool TryDivideProjected(ReadOnlySpan<Rational> ca, int[] ea, ReadOnlySpan<Rational> cb, int[] eb, int n,
        out bool divides, out Rational[] coeffs, out int[] exps)
    {
        divides = false;
        coeffs = [];
        exps = [];
        if (SupportHull.TryFind(ea, eb, n) is not { } hull) return false;
        var pa = hull.Project(ea);
        int r = hull.Rank;
        ProductShape.MinMax(pa, r, out var min, out var max);
        double box = 1;
        for (int v = 0; v < r; v++) box *= (double)max[v] - min[v] + 1;
        if (box > PolynomialMultiply.DenseMaxBox || box > DenseBoxPerTerm * ca.Length) return false;
        SupportHull.Applied++;
        divides = TryDivide(ca, pa, cb, hull.Project(eb), r, project: false, out coeffs, out var pq);
        if (!divides) return true;
        // The quotient's support lies in a0 − b0 + V; a lift that is not integral means no Laurent quotient.
        var origin = new long[n];
        for (int v = 0; v < n; v++) origin[v] = (long)ea[v] - eb[v];
        divides = hull.TryLift(pq, origin, out exps);
        if (!divides) coeffs = [];
        return true;
    }

    /// <summary>Exact division on a multi-limb path: <see cref="DivideStatus.Exact"/> with the quotient,
    /// <see cref="DivideStatus.NotDivisible"/>, or <see cref="DivideStatus.TooLarge"/> /
    /// <see cref="DivideStatus.QuotientTooLarge"/> when the operands or the quotient do not fit
    /// <typeparamref name="TM"/> and <typeparamref name="TAcc"/>. The divisor <paramref name="bb"/> is
    /// primitive; A/B = bdb/(bda·bg)·ba/bb.</summary>
    private static DivideStatus TryDivideMultiLimb<TOps, TM, TAcc>(DivisionInput ctx, BigInteger[] ba, BigInteger[] bb,
        in BigInteger bda, in BigInteger bdb, in BigInteger bg, out Rational[] coeffs, out int[] exps)
        where TOps : ICoefficientOps<TM, TAcc>
        where TM : struct, IMagnitude<TM>
        where TAcc : struct, IMultiLimbAccumulator<TAcc>
    {
        coeffs = [];
        exps = [];
        if (!CoefficientForm.TryMagnitudes<TM>(bb, out var mdiv)) return DivideStatus.TooLarge;
        var pAcc = new TAcc[ba.Length];
        for (int i = 0; i < ba.Length; i++)
            if (!TAcc.TryFrom(ba[i], out pAcc[i])) return DivideStatus.TooLarge;
        var status = ctx.Run<TOps, TM, TAcc>(pAcc, mdiv, default, double.PositiveInfinity, static _ => 0, out var qm, out var qem);
        if (status != DivideStatus.Exact) return status;
        var scale = new Rational(bdb, bda * bg);
        bool unit = scale == Rational.One;
        var quotient = new Rational[qm!.Length];
        for (int i = 0; i < quotient.Length; i++)
        {
            var value = qm[i].TryGetWord(out long w) ? new Rational(w) : new Rational(qm[i].ToBigInteger());
            quotient[i] = unit ? value : value * scale;
        }
        ctx.Finish(quotient, qem, out coeffs, out exps);
        return DivideStatus.Exact;
    }

    /// <summary>A lower bound for the bit length of the largest quotient coefficient when B divides A:
    /// every coefficient of A = Q·B is a sum of q·b over distinct terms of B, so max|Q| ≥ max|A|/‖B‖₁.</summary>
    private static int QuotientBitsLowerBound(BigInteger[] a, BigInteger[] b)
    {
        long maxA = 0;
        foreach (var x in a) maxA = Math.Max(maxA, x.GetBitLength());
        var l1 = BigInteger.Zero;
        foreach (var x in b) l1 += BigInteger.Abs(x);
        // |x| ≥ 2^(GetBitLength − 2) for every non-zero x of either sign; ‖B‖₁ < 2^bits(‖B‖₁).
        return (int)(maxA - 2 - l1.GetBitLength());
    }

    /// <summary>Shared data of one exact division: packing, index encoding and output conversion.</summary>
    private sealed class DivisionInput
    {
        private readonly int[] _ea, _eb, _minA, _minB;
        private readonly int _n;
        private readonly long[] _qRange, _offset, _radix;
        private readonly long _box;
        private ExponentLayout? _layout;
        private ulong[]? _pa, _pb, _qMaxPacked;
        private long[]? _ia, _ib;
        private long _window;
        private bool _dense;

        public DivisionInput(ReadOnlySpan<Rational> ca, int[] ea, ReadOnlySpan<Rational> cb, int[] eb, int n,
            int[] minA, int[] minB, long[] qRange, long[] offset, long[] radix, long box)
        {
            // Shared, not copied: the exponent arrays of canonical polynomials are immutable.
            _ea = ea; _eb = eb; _n = n; _minA = minA; _minB = minB;
            _qRange = qRange; _offset = offset; _radix = radix; _box = box;
            _dense = ForceDense ?? (box <= PolynomialMultiply.DenseMaxBox && box <= DenseBoxPerTerm * ca.Length && cb.Length >= 2);
            if (_dense)
            {
                // Aligned window: product of trailing radices within the buffer budget (16-byte cells).
                long cells = Math.Max(4, PolynomialMultiply.DenseBufferBytes / 16), suffix = 1;
                for (int v = n - 1; v >= 0 && suffix * radix[v] <= cells * 2; v--) suffix *= radix[v];
                if (suffix * 16 < cells && suffix != box && ForceDense != true) _dense = false;
                _window = suffix;
                if (box > PolynomialMultiply.DenseMaxBox) _dense = false;
            }
        }

        public DivideStatus Run<TOps, TC, TAcc>(TAcc[] p, TC[] d, TC limit, double qSumLimit, Func<TC, double> magnitude,
            out TC[]? q, out QuotientExponents qe)
            where TOps : ICoefficientOps<TC, TAcc>
        {
            DivideStatus status;
            int count;
            if (_dense)
            {
                if (_ia is null)
                {
                    var stride = PolynomialMultiply.Strides(_radix);
                    _ia = new long[_ea.Length / _n];
                    _ib = new long[_eb.Length / _n];
                    PolynomialMultiply.Index(_ea, _n, _minA, stride, _ia);
                    PolynomialMultiply.Index(_eb, _n, _minB, stride, _ib);
                }
                status = DivideDense<TOps, TC, TAcc>(_ia, p, _ib!, d, _window, _radix, _qRange, limit, qSumLimit, magnitude, out var qi, out var qc, out count);
                q = status == DivideStatus.Exact ? qc[..count] : null;
                qe = new QuotientExponents(qi, null, count);
                return status;
            }
            if (_layout is null)
            {
                var maxValue = new long[_n];
                for (int v = 0; v < _n; v++) maxValue[v] = _radix[v] - 1;
                _layout = ExponentLayout.Create(maxValue, guard: true);
                // Pack writes every word, so the (large) buffers need no zeroing.
                _pa = GC.AllocateUninitializedArray<ulong>(p.Length * _layout.Words);
                _pb = GC.AllocateUninitializedArray<ulong>(d.Length * _layout.Words);
                _layout.Pack(_ea, _n, _minA, _pa);
                _layout.Pack(_eb, _n, _minB, _pb);
                var tmp = new int[_n];
                for (int v = 0; v < _n; v++) tmp[v] = (int)_qRange[v];
                _qMaxPacked = new ulong[_layout.Words];
                _layout.Pack(tmp, _n, new int[_n], _qMaxPacked);
            }
            ulong[] packed;
            TC[] qcoef;
            status = _layout.Words == 1
                ? DivideHeap1<TOps, TC, TAcc>(_pa, p, _pb, d, _layout.GuardMask[0], _qMaxPacked![0], limit, qSumLimit, magnitude, out packed, out qcoef, out count)
                : DivideHeapN<TOps, TC, TAcc>(_pa, p, _pb, d, _layout.Words, _layout.GuardMask, _qMaxPacked, limit, qSumLimit, magnitude, out packed, out qcoef, out count);
            q = status == DivideStatus.Exact ? qcoef[..count] : null;
            qe = new QuotientExponents(null, packed, count);
            return status;
        }

        public bool Finish(long[] q, QuotientExponents qe, Rational scale, out Rational[] coeffs, out int[] exps)
        {
            var result = new Rational[q.Length];
            for (int i = 0; i < q.Length; i++) result[i] = scale.IsOne ? new Rational(q[i]) : new Rational(q[i]) * scale;
            return Finish(result, qe, out coeffs, out exps);
        }

        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public bool Finish(Rational[] result, QuotientExponents qe, out Rational[] coeffs, out int[] exps)
        {
            int count = qe.Count;
            exps = new int[count * _n];
            if (qe.Packed is not null) _layout!.Unpack(qe.Packed, count, _n, _offset, exps);
            else
            {
                for (int t = 0; t < count; t++)
                {
                    long x = qe.Indices![t];
                    for (int v = _n - 1; v >= 0; v--)
                    {
                        long digit = x % _radix[v];
                        x /= _radix[v];
                        exps[t * _n + v] = checked((int)(digit + _offset[v]));
                    }
                }
            }
            coeffs = result;
            return true;
        }
    }

    /// <summary>Quotient exponents as dense indices or packed words.</summary>
    private readonly record struct QuotientExponents(long[]? Indices, ulong[]? Packed, int Count);

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
