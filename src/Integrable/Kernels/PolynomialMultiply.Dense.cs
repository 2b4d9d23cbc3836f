using System.Runtime.InteropServices;
using System.Runtime.CompilerServices;

namespace Integrable.Kernels;

internal static partial class PolynomialMultiply
{
    /// <summary>Dense (Kronecker / array) multiplication on mixed-radix indices.</summary>
    /// <remarks>
    /// <para>Each term's shifted exponent vector is encoded as one integer index in the radices of
    /// the product's degree box, so the index of a product term is the sum of the indices of its
    /// factors (no carries between digits, since each digit of the sum stays below its radix).
    /// Descending lex order of exponents is descending index order.</para>
    /// <para>The index space is cut into windows of <paramref name="window"/> indices; terms are
    /// grouped by window (high part h = index / window). All pairs of groups (ga, gb) with
    /// h_a + h_b = H add their products into a small buffer, windows are processed in descending H and
    /// each finished window is scanned in descending order (only over the range that was touched), so
    /// only that buffer is written in the inner loop and it stays in cache; the full box is never
    /// allocated. When <paramref name="aligned"/> is set, the window is the product of the radices of
    /// the trailing variables, low parts never carry (la + lb &lt; window) and the buffer holds one
    /// window. Otherwise low sums may spill into the next window: the buffer holds windows H and
    /// H + 1, and window H + 1 is final once all pairs of sum H are done.</para>
    /// </remarks>
    /// <returns>Number of output terms written to <paramref name="oi"/> (indices, descending) and
    /// <paramref name="oc"/> (accumulators).</returns>
    /// <para>Squares: when <paramref name="doubledA"/> is given (2·A's coefficients, B = A), only group
    /// pairs with h_a ≥ h_b are visited; a pair with h_a &gt; h_b stands for itself and its mirror (which
    /// touches the same cells) with the doubled coefficients, and a diagonal pair is done in full. That is
    /// about half the multiply-adds; every partial sum is still a partial sum of the full product.</para>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static int MultiplyDense<TOps, TC, TAcc>(
        ReadOnlySpan<long> ia, ReadOnlySpan<TC> ca, ReadOnlySpan<long> ib, ReadOnlySpan<TC> cb, long window, bool aligned,
        ref long[] oi, ref TAcc[] oc, TC[]? doubledA = null)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int L = checked((int)window);
        int na = ia.Length, nb = ib.Length;

        CountGroups(ia, L, out var aStart, out var aHigh, out var la);
        CountGroups(ib, L, out var bStart, out var bHigh, out var lb);
        int ga = aHigh.Length, gb = bHigh.Length;
        long minHB = bHigh[gb - 1], maxHB = bHigh[0];
        var lbBytes = Pool.Rent<nint>(nb);
        for (int j = 0; j < nb; j++) lbBytes[j] = (nint)lb[j] * Unsafe.SizeOf<TAcc>();
        ref TC caRef = ref MemoryMarshal.GetReference(ca);
        ref TC cbRef = ref MemoryMarshal.GetReference(cb);
        int bufLength = aligned ? L : 2 * L;
        var buf = Pool.RentCleared<TAcc>(bufLength);
        long hMax = aHigh[0] + bHigh[0], hMin = aHigh[ga - 1] + bHigh[gb - 1];
        int count = 0;
        // Touched ranges [lo, hi] of the two halves (empty when lo > hi).
        int upLo = int.MaxValue, upHi = -1;
        int gLo = 0, gHi = 0; // A groups whose partner high part lies in [minHB, maxHB]
        for (long H = hMax; H >= hMin - (aligned ? 0 : 1); H--)
        {
            KernelCancellation.Poll();
            int lowLo = int.MaxValue, lowHi = -1;
            while (gLo < ga && aHigh[gLo] > H - minHB) gLo++;
            while (gHi < ga && aHigh[gHi] >= H - maxHB) gHi++;
            // Along the A groups of the window, the partner high part H − h_a increases, so the
            // matching B groups (sorted by decreasing high part) are found by one backward walk.
            int bg = gHi > gLo ? LastAtLeast(bHigh, H - aHigh[gLo]) : -1;
            for (int g = gLo; g < gHi && bg >= 0; g++)
            {
                long target = H - aHigh[g];
                while (bg >= 0 && bHigh[bg] < target) bg--;
                if (bg < 0) break;
                if (bHigh[bg] != target) continue;
                if (doubledA is not null && g > bg) continue;   // the mirror of a pair already done
                int b0 = bStart[bg], b1 = bStart[bg + 1];
                int a0 = aStart[g], a1 = aStart[g + 1];
                // Lows are descending inside a group: first + first is the largest cell, last + last the smallest.
                int top = la[a0] + lb[b0], bottom = la[a1 - 1] + lb[b1 - 1];
                if (top > lowHi) lowHi = top;
                if (bottom < lowLo) lowLo = bottom;
                ref TC aCoefficients = ref doubledA is not null && g < bg ? ref doubledA[a0] : ref Unsafe.Add(ref caRef, a0);
                TOps.MulAddBlock(ref buf[0], ref aCoefficients, ref la[a0], a1 - a0, ref Unsafe.Add(ref cbRef, b0), ref lbBytes[b0], b1 - b0);
            }
            if (aligned)
            {
                if (lowHi >= 0) Emit<TOps, TC, TAcc>(buf, lowLo, lowHi, H * (long)L, ref oi, ref oc, ref count);
                continue;
            }
            // Unaligned: cells [L, 2L) are window H + 1, now final.
            if (lowHi >= L) { upHi = Math.Max(upHi, lowHi); upLo = Math.Min(upLo, Math.Max(lowLo, L)); }
            if (upHi >= L) Emit<TOps, TC, TAcc>(buf, upLo, upHi, H * (long)L, ref oi, ref oc, ref count);
            upLo = int.MaxValue; upHi = -1;
            if (lowHi >= 0 && lowLo < L)
            {
                int from = lowLo, to = Math.Min(lowHi, L - 1);
                Array.Copy(buf, from, buf, from + L, to - from + 1);
                Array.Clear(buf, from, to - from + 1);
                upLo = from + L; upHi = to + L;
            }
        }
        Pool.Return(buf);
        Pool.Return(la);
        Pool.Return(lb);
        Pool.Return(lbBytes);
        return count;
    }

    /// <summary>Appends the non-zero cells buf[hi..lo] (descending) with index base + cell, and clears them.</summary>
    private static void Emit<TOps, TC, TAcc>(TAcc[] buf, int lo, int hi, long baseIndex, ref long[] oi, ref TAcc[] oc, ref int count)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        for (int k = hi; k >= lo; k--)
        {
            if (TOps.IsZero(in buf[k])) continue;
            if (count == oc.Length || count == oi.Length)
            {
                Pool.Grow(ref oi, count, count + 1);
                Pool.Grow(ref oc, count, count + 1);
            }
            oi[count] = baseIndex + k;
            oc[count] = buf[k];
            count++;
            buf[k] = default!;
        }
    }

    /// <summary>Largest index g with high[g] ≥ <paramref name="target"/> in a descending array, or −1.</summary>
    private static int LastAtLeast(long[] high, long target)
    {
        int lo = 0, hi = high.Length - 1, best = -1;
        while (lo <= hi)
        {
            int mid = (lo + hi) >>> 1;
            if (high[mid] >= target) { best = mid; lo = mid + 1; } else hi = mid - 1;
        }
        return best;
    }

    private static void CountGroups(ReadOnlySpan<long> idx, int window, out int[] start, out long[] high, out int[] low)
    {
        int n = idx.Length, groups = 0;
        low = Pool.Rent<int>(n);
        var hs = Pool.Rent<long>(n);
        long prev = long.MinValue;
        for (int i = 0; i < n; i++)
        {
            long h = Math.DivRem(idx[i], window, out long r);
            hs[i] = h;
            low[i] = (int)r;
            if (h != prev) { groups++; prev = h; }
        }
        start = new int[groups + 1];
        high = new long[groups];
        int g = -1;
        prev = long.MinValue;
        for (int i = 0; i < n; i++)
        {
            if (hs[i] != prev) { g++; start[g] = i; high[g] = hs[i]; prev = hs[i]; }
        }
        start[groups] = n;
        Pool.Return(hs);
    }

    /// <summary>2·c for every coefficient, or false when some doubled value would not fit the coefficient
    /// type (then the square is computed as a product).</summary>
    internal static bool TryDouble<TC>(TC[] c, out TC[] doubled)
    {
        doubled = new TC[c.Length];
        if (c is long[] words && doubled is long[] w2)
        {
            for (int i = 0; i < words.Length; i++)
            {
                long x = words[i];
                if (x > long.MaxValue / 2 || x < long.MinValue / 2) return false;
                w2[i] = 2 * x;
            }
            return true;
        }
        if (c is Magnitude192[] mags && doubled is Magnitude192[] m2)
        {
            for (int i = 0; i < mags.Length; i++)
            {
                var m = mags[i];
                if ((m.L2 >> 61) != 0) return false;   // stay below 2^190, inside the multi-limb bound
                m2[i] = new Magnitude192 { L2 = (m.L2 << 1) | (m.L1 >> 63), L1 = (m.L1 << 1) | (m.L0 >> 63), L0 = m.L0 << 1, Negative = m.Negative };
            }
            return true;
        }
        if (c is Magnitude256[] mags4 && doubled is Magnitude256[] m4)
        {
            for (int i = 0; i < mags4.Length; i++)
            {
                var m = mags4[i];
                if ((m.L3 >> 61) != 0) return false;   // stay below 2^254, inside the four-limb bound
                m4[i] = new Magnitude256
                {
                    L3 = (m.L3 << 1) | (m.L2 >> 63), L2 = (m.L2 << 1) | (m.L1 >> 63), L1 = (m.L1 << 1) | (m.L0 >> 63), L0 = m.L0 << 1,
                    Negative = m.Negative,
                };
            }
            return true;
        }
        if (c is System.Numerics.BigInteger[] bigs && doubled is System.Numerics.BigInteger[] b2)
        {
            for (int i = 0; i < bigs.Length; i++) b2[i] = bigs[i] << 1;
            return true;
        }
        return false;
    }
}
