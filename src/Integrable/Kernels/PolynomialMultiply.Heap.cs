using System.Runtime.CompilerServices;

namespace Integrable.Kernels;

internal static partial class PolynomialMultiply
{
    /// <summary>Johnson's heap multiplication on single-word packed exponents, with chaining of equal
    /// exponents in the heap and delayed insertion of (i, j) until (i−1, j) has been consumed
    /// (Monagan and Pearce, "Parallel sparse polynomial multiplication using heaps", ISSAC 2009).</summary>
    /// <remarks>Terms of both inputs are sorted by descending packed exponent; so is the output.
    /// <paramref name="ea"/> should be the shorter input: the heap never holds more than one entry
    /// per term of it. Returns the number of output terms written to <paramref name="oe"/> /
    /// <paramref name="oc"/> (grown as needed).</remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static int MultiplyHeap1<TOps, TC, TAcc>(
        ReadOnlySpan<ulong> ea, ReadOnlySpan<TC> ca, ReadOnlySpan<ulong> eb, ReadOnlySpan<TC> cb,
        ref ulong[] oe, ref TAcc[] oc)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int n = ea.Length, m = eb.Length;
        var hexp = new ulong[n + 1];
        var hhead = new int[n + 1];
        var nj = new int[n];
        var next = new int[n];
        var hind = new int[n];
        var store = new int[2 * n];
        for (int i = 1; i < n; i++) hind[i] = 1;

        // hind[i] = 2·(next column to insert for row i) + (1 if row i is not in the heap).
        int hlen = 1, nextLoc = int.MaxValue, count = 0;
        nj[0] = 0; next[0] = -1;
        hexp[1] = ea[0] + eb[0]; hhead[1] = 0; hlen = 2;
        hind[0] = 2;

        while (hlen > 1)
        {
            ulong exp = hexp[1];
            TOps.Set(out TAcc acc, default!);
            int sp = 0;
            do
            {
                int r = hhead[1];
                // pop the root
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
                    int j = nj[r];
                    hind[r] |= 1;
                    store[sp++] = r; store[sp++] = j;
                    TOps.MulAdd(ref acc, ca[r], cb[j]);
                }
            } while (hlen > 1 && hexp[1] == exp);

            while (sp > 0)
            {
                int j = store[--sp], i = store[--sp];
                if (i + 1 < n && hind[i + 1] == 2 * j + 1)
                {
                    nj[i + 1] = j;
                    Insert1(hexp, hhead, next, ref hlen, ref nextLoc, i + 1, ea[i + 1] + eb[j]);
                    hind[i + 1] = 2 * (j + 1);
                }
                if (j + 1 < m && (hind[i] & 1) == 1 && (i == 0 || hind[i - 1] >= 2 * (j + 2) + 1))
                {
                    nj[i] = j + 1;
                    Insert1(hexp, hhead, next, ref hlen, ref nextLoc, i, ea[i] + eb[j + 1]);
                    hind[i] = 2 * (j + 2);
                }
            }

            if (!TOps.IsZero(in acc))
            {
                if (count == oe.Length) Grow(ref oe, ref oc, count + 1);
                oe[count] = exp;
                oc[count] = acc;
                count++;
            }
        }
        return count;
    }

    /// <summary>Inserts row <paramref name="row"/> with exponent <paramref name="e"/>, chaining it to
    /// an existing node with the same exponent when one is found on the way to the root.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Insert1(ulong[] hexp, int[] hhead, int[] next, ref int hlen, ref int nextLoc, int row, ulong e)
    {
        if (hlen > 1 && hexp[1] == e) { next[row] = hhead[1]; hhead[1] = row; return; }
        if (nextLoc < hlen && hexp[nextLoc] == e) { next[row] = hhead[nextLoc]; hhead[nextLoc] = row; return; }
        int pos = hlen, j = pos;
        while (j > 1)
        {
            int p = j >> 1;
            ulong pe = hexp[p];
            if (pe == e) { next[row] = hhead[p]; hhead[p] = row; nextLoc = p; return; }
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

    /// <summary>Johnson's heap multiplication on multi-word packed exponents (<paramref name="words"/>
    /// words per term, word 0 most significant). Same algorithm as <see cref="MultiplyHeap1"/>; each
    /// row's current exponent is kept in a row buffer and the heap holds row indices.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static int MultiplyHeapN<TOps, TC, TAcc>(
        ReadOnlySpan<ulong> ea, ReadOnlySpan<TC> ca, ReadOnlySpan<ulong> eb, ReadOnlySpan<TC> cb, int words,
        ref ulong[] oe, ref TAcc[] oc)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int n = ca.Length, m = cb.Length, N = words;
        var rowExp = new ulong[n * N];
        var hhead = new int[n + 1];
        var nj = new int[n];
        var next = new int[n];
        var hind = new int[n];
        var store = new int[2 * n];
        var cur = new ulong[N];
        for (int i = 1; i < n; i++) hind[i] = 1;

        int hlen = 1, count = 0;
        nj[0] = 0; next[0] = -1;
        AddN(ea.Slice(0, N), eb.Slice(0, N), rowExp.AsSpan(0, N));
        hhead[1] = 0; hlen = 2;
        hind[0] = 2;

        while (hlen > 1)
        {
            rowExp.AsSpan(hhead[1] * N, N).CopyTo(cur);
            TOps.Set(out TAcc acc, default!);
            int sp = 0;
            do
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
                        if (c + 1 < hlen && CompareN(rowExp.AsSpan(hhead[c + 1] * N, N), rowExp.AsSpan(hhead[c] * N, N)) > 0) c++;
                        if (CompareN(rowExp.AsSpan(hhead[c] * N, N), le) <= 0) break;
                        hhead[hole] = hhead[c];
                        hole = c; c = 2 * c;
                    }
                    hhead[hole] = lh;
                }
                for (; r >= 0; r = next[r])
                {
                    int j = nj[r];
                    hind[r] |= 1;
                    store[sp++] = r; store[sp++] = j;
                    TOps.MulAdd(ref acc, ca[r], cb[j]);
                }
            } while (hlen > 1 && CompareN(rowExp.AsSpan(hhead[1] * N, N), cur) == 0);

            while (sp > 0)
            {
                int j = store[--sp], i = store[--sp];
                if (i + 1 < n && hind[i + 1] == 2 * j + 1)
                {
                    nj[i + 1] = j;
                    AddN(ea.Slice((i + 1) * N, N), eb.Slice(j * N, N), rowExp.AsSpan((i + 1) * N, N));
                    InsertN(rowExp, N, hhead, next, ref hlen, i + 1);
                    hind[i + 1] = 2 * (j + 1);
                }
                if (j + 1 < m && (hind[i] & 1) == 1 && (i == 0 || hind[i - 1] >= 2 * (j + 2) + 1))
                {
                    nj[i] = j + 1;
                    AddN(ea.Slice(i * N, N), eb.Slice((j + 1) * N, N), rowExp.AsSpan(i * N, N));
                    InsertN(rowExp, N, hhead, next, ref hlen, i);
                    hind[i] = 2 * (j + 2);
                }
            }

            if (!TOps.IsZero(in acc))
            {
                if ((count + 1) * N > oe.Length || count == oc.Length) GrowN(ref oe, ref oc, count + 1, N);
                cur.CopyTo(oe.AsSpan(count * N, N));
                oc[count] = acc;
                count++;
            }
        }
        return count;
    }

    private static void InsertN(ulong[] rowExp, int N, int[] hhead, int[] next, ref int hlen, int row)
    {
        var e = rowExp.AsSpan(row * N, N);
        if (hlen > 1 && CompareN(rowExp.AsSpan(hhead[1] * N, N), e) == 0) { next[row] = hhead[1]; hhead[1] = row; return; }
        int pos = hlen, j = pos;
        while (j > 1)
        {
            int p = j >> 1;
            int c = CompareN(rowExp.AsSpan(hhead[p] * N, N), e);
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

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static int CompareN(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        for (int w = 0; w < a.Length; w++)
            if (a[w] != b[w]) return a[w] > b[w] ? 1 : -1;
        return 0;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void AddN(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, Span<ulong> r)
    {
        for (int w = 0; w < r.Length; w++) r[w] = a[w] + b[w];
    }

    private static void Grow<TE, TAcc>(ref TE[] oe, ref TAcc[] oc, int needed)
    {
        int size = Math.Max(needed, Math.Max(16, oc.Length * 2));
        Array.Resize(ref oe, size);
        Array.Resize(ref oc, size);
    }

    private static void GrowN<TAcc>(ref ulong[] oe, ref TAcc[] oc, int needed, int words)
    {
        int size = Math.Max(needed, Math.Max(16, oc.Length * 2));
        Array.Resize(ref oe, size * words);
        Array.Resize(ref oc, size);
    }
}
