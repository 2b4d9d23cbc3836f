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
    /// <para>The index space is cut into windows of L = 2^<paramref name="chunkShift"/> indices.
    /// Terms are grouped by window (high part h = index >> shift). All pairs of groups (ga, gb) with
    /// h_a + h_b = H add their products into a buffer of 2L accumulators that covers windows H and
    /// H + 1; windows are processed in descending H, so when H is done the window H + 1 is final and
    /// is emitted in descending order. Only that small buffer is written in the inner loop, so it
    /// stays in the first-level cache; the full box is never allocated.</para>
    /// </remarks>
    /// <returns>Number of output terms written to <paramref name="oi"/> (indices, descending) and
    /// <paramref name="oc"/> (accumulators).</returns>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static int MultiplyDense<TOps, TC, TAcc>(
        ReadOnlySpan<long> ia, ReadOnlySpan<TC> ca, ReadOnlySpan<long> ib, ReadOnlySpan<TC> cb, int chunkShift,
        ref long[] oi, ref TAcc[] oc)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int L = 1 << chunkShift;
        long lowMask = L - 1;
        int na = ia.Length, nb = ib.Length;

        // Groups of A: start offsets and high parts (descending).
        CountGroups(ia, chunkShift, out var aStart, out var aHigh);
        CountGroups(ib, chunkShift, out var bStart, out var bHigh);
        int ga = aHigh.Length, gb = bHigh.Length;
        long minHB = bHigh[gb - 1], maxHB = bHigh[0];
        var bLookup = new int[checked((int)(maxHB - minHB + 1))];
        Array.Fill(bLookup, -1);
        for (int g = 0; g < gb; g++) bLookup[bHigh[g] - minHB] = g;

        var la = new int[na];
        for (int i = 0; i < na; i++) la[i] = (int)(ia[i] & lowMask);
        var lb = new int[nb];
        for (int i = 0; i < nb; i++) lb[i] = (int)(ib[i] & lowMask);
        var cbArr = cb.ToArray();

        var buf = new TAcc[2 * L];
        long hMax = aHigh[0] + bHigh[0], hMin = aHigh[ga - 1] + bHigh[gb - 1];
        int count = 0;
        bool carried = false;
        int gLo = 0, gHi = 0; // window of A groups with hb in range: aHigh in [H - maxHB, H - minHB]
        for (long H = hMax; H >= hMin - 1; H--)
        {
            bool upperDirty = carried, lowerDirty = false;
            // A groups are in descending aHigh; advance gLo past groups with aHigh > H - minHB.
            while (gLo < ga && aHigh[gLo] > H - minHB) gLo++;
            while (gHi < ga && aHigh[gHi] >= H - maxHB) gHi++;
            for (int g = gLo; g < gHi; g++)
            {
                int bg = bLookup[H - aHigh[g] - minHB];
                if (bg < 0) continue;
                lowerDirty = upperDirty = true;
                int b0 = bStart[bg], b1 = bStart[bg + 1];
                ref TC cb0 = ref cbArr[b0];
                ref int lb0 = ref lb[b0];
                int len = b1 - b0;
                for (int i = aStart[g], iEnd = aStart[g + 1]; i < iEnd; i++)
                    TOps.MulAddRow(ref buf[la[i]], ca[i], ref cb0, ref lb0, len);
            }
            if (upperDirty)
            {
                long baseIndex = H * L;
                for (int k = 2 * L - 1; k >= L; k--)
                {
                    if (TOps.IsZero(in buf[k])) continue;
                    if (count == oc.Length) Grow(ref oi, ref oc, count + 1);
                    oi[count] = baseIndex + k;
                    oc[count] = buf[k];
                    count++;
                    buf[k] = default!;
                }
            }
            if (lowerDirty)
            {
                Array.Copy(buf, 0, buf, L, L);
                Array.Clear(buf, 0, L);
            }
            carried = lowerDirty;
        }
        return count;
    }

    private static void CountGroups(ReadOnlySpan<long> idx, int shift, out int[] start, out long[] high)
    {
        int groups = 0;
        long prev = long.MinValue;
        foreach (var x in idx)
        {
            long h = x >> shift;
            if (h != prev) { groups++; prev = h; }
        }
        start = new int[groups + 1];
        high = new long[groups];
        int g = -1;
        prev = long.MinValue;
        for (int i = 0; i < idx.Length; i++)
        {
            long h = idx[i] >> shift;
            if (h != prev) { g++; start[g] = i; high[g] = h; prev = h; }
        }
        start[groups] = idx.Length;
    }
}
