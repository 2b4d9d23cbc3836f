using System.Runtime.InteropServices;
using System.Runtime.CompilerServices;

namespace Integrable.Kernels;

internal static partial class PolynomialMultiply
{
    /// <summary>One heap slot: a packed exponent and the head of the chain of rows sharing it.</summary>
    private struct HeapEntry<TKey> where TKey : struct
    {
        public TKey Exp;
        public int Head;
    }

    /// <summary>Johnson's heap multiplication on single-word packed exponents
    /// (<see cref="MultiplyHeapK"/> with one word).</summary>
    internal static int MultiplyHeap1<TOps, TC, TAcc>(
        ReadOnlySpan<ulong> ea, ReadOnlySpan<TC> ca, ReadOnlySpan<ulong> eb, ReadOnlySpan<TC> cb,
        ref ulong[] oe, ref TAcc[] oc)
        where TOps : ICoefficientOps<TC, TAcc>
        => MultiplyHeapK<Key1, TOps, TC, TAcc>(ea, ca, eb, cb, ref oe, ref oc);

    /// <summary>Johnson's heap multiplication on two-word packed exponents (word 0 most significant;
    /// <see cref="MultiplyHeapK"/> with two words): same output layout as <see cref="MultiplyHeapN"/>.</summary>
    internal static int MultiplyHeap2<TOps, TC, TAcc>(
        ReadOnlySpan<ulong> ea, ReadOnlySpan<TC> ca, ReadOnlySpan<ulong> eb, ReadOnlySpan<TC> cb,
        ref ulong[] oe, ref TAcc[] oc)
        where TOps : ICoefficientOps<TC, TAcc>
        => MultiplyHeapK<Key2, TOps, TC, TAcc>(ea, ca, eb, cb, ref oe, ref oc);

    /// <summary>Johnson's heap multiplication on packed exponents of a fixed number of words held
    /// inline in the heap entries, with chaining of equal exponents in the heap and delayed insertion
    /// of (i, j) until (i−1, j) has been consumed (Monagan and Pearce, "Parallel sparse polynomial
    /// multiplication using heaps", ISSAC 2009).</summary>
    /// <remarks>Terms of both inputs are sorted by descending packed exponent; so is the output
    /// (<typeparamref name="TKey"/>.Words words per term). <paramref name="ca"/> should be the shorter
    /// input: the heap never holds more than one entry per term of it. Returns the number of output
    /// terms written to <paramref name="oe"/> / <paramref name="oc"/> (grown as needed).</remarks>
    internal static int MultiplyHeapK<TKey, TOps, TC, TAcc>(
        ReadOnlySpan<ulong> ea, ReadOnlySpan<TC> ca, ReadOnlySpan<ulong> eb, ReadOnlySpan<TC> cb,
        ref ulong[] oe, ref TAcc[] oc)
        where TKey : struct, IPackedKey<TKey>
        where TOps : ICoefficientOps<TC, TAcc>
        => HeapProduct<TKey, Product, TOps, TC, TAcc>(ea, ca, eb, cb, ref oe, ref oc);

    /// <summary>Squaring A·A by the heap on the upper triangle i ≤ j of the product table: the diagonal
    /// term a_i² once and a_i·a_j (i &lt; j) twice, so about half the heap operations of a product.
    /// Row i starts at column i; it waits for (i−1, i) exactly as a row of a product waits for the
    /// row above, so the delayed-insertion invariant of <see cref="MultiplyHeapK"/> carries over.
    /// The accumulated terms are those of the full product, so the same accumulator bound holds.
    /// With <paramref name="doubled"/> (2·A's coefficients) an off-diagonal product is one multiply-add
    /// a_i·(2a_j) instead of two, which matters for multi-limb coefficients.</summary>
    internal static int SquareHeapK<TKey, TOps, TC, TAcc>(ReadOnlySpan<ulong> ea, ReadOnlySpan<TC> ca, TC[]? doubled, ref ulong[] oe, ref TAcc[] oc)
        where TKey : struct, IPackedKey<TKey>
        where TOps : ICoefficientOps<TC, TAcc>
        => doubled is null
            ? HeapProduct<TKey, Square, TOps, TC, TAcc>(ea, ca, ea, ca, ref oe, ref oc)
            : HeapProduct<TKey, DoubledSquare, TOps, TC, TAcc>(ea, ca, ea, doubled, ref oe, ref oc);

    /// <summary>Squaring with packed exponents of any number of words: the triangle heap
    /// (<see cref="SquareHeapK"/>) for one to four words, the full product beyond.</summary>
    internal static int SquareHeap<TOps, TC, TAcc>(ReadOnlySpan<ulong> ea, TC[] ca, int words, ref ulong[] oe, ref TAcc[] oc)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        var doubled = words <= 4 && TryDouble(ca, out var twice) ? twice : null;
        return words switch
        {
            1 => SquareHeapK<Key1, TOps, TC, TAcc>(ea, ca, doubled, ref oe, ref oc),
            2 => SquareHeapK<Key2, TOps, TC, TAcc>(ea, ca, doubled, ref oe, ref oc),
            3 => SquareHeapK<Key3, TOps, TC, TAcc>(ea, ca, doubled, ref oe, ref oc),
            4 => SquareHeapK<Key4, TOps, TC, TAcc>(ea, ca, doubled, ref oe, ref oc),
            _ => MultiplyHeapN<TOps, TC, TAcc>(ea, ca, ea, ca, words, ref oe, ref oc),
        };
    }

    /// <summary>Heap product A·B of packed operands (<paramref name="words"/> words per term): the
    /// exponent is held inline in the heap entries for one to four words (<see cref="MultiplyHeapK"/>),
    /// in a row buffer beyond (<see cref="MultiplyHeapN"/>). The shorter operand indexes the heap rows.</summary>
    internal static int HeapMultiply<TOps, TC, TAcc>(ReadOnlySpan<ulong> ea, ReadOnlySpan<TC> ca, ReadOnlySpan<ulong> eb, ReadOnlySpan<TC> cb,
        int words, ref ulong[] oe, ref TAcc[] oc)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        if (cb.Length < ca.Length) return HeapMultiply<TOps, TC, TAcc>(eb, cb, ea, ca, words, ref oe, ref oc);
        return words switch
        {
            1 => MultiplyHeapK<Key1, TOps, TC, TAcc>(ea, ca, eb, cb, ref oe, ref oc),
            2 => MultiplyHeapK<Key2, TOps, TC, TAcc>(ea, ca, eb, cb, ref oe, ref oc),
            3 => MultiplyHeapK<Key3, TOps, TC, TAcc>(ea, ca, eb, cb, ref oe, ref oc),
            4 => MultiplyHeapK<Key4, TOps, TC, TAcc>(ea, ca, eb, cb, ref oe, ref oc),
            _ => MultiplyHeapN<TOps, TC, TAcc>(ea, ca, eb, cb, words, ref oe, ref oc),
        };
    }

    /// <summary>Compile-time choice between a product and a square in <see cref="HeapProduct"/>.</summary>
    private interface IHeapShape
    {
        static abstract bool IsSquare { get; }
        /// <summary>B holds 2·A's coefficients (off-diagonal products are a_i·b_j, the diagonal a_i·a_i).</summary>
        static abstract bool Doubled { get; }
    }
    private struct Product : IHeapShape { public static bool IsSquare => false; public static bool Doubled => false; }
    private struct Square : IHeapShape { public static bool IsSquare => true; public static bool Doubled => false; }
    private struct DoubledSquare : IHeapShape { public static bool IsSquare => true; public static bool Doubled => true; }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int HeapProduct<TKey, TShape, TOps, TC, TAcc>(
        ReadOnlySpan<ulong> ea, ReadOnlySpan<TC> ca, ReadOnlySpan<ulong> eb, ReadOnlySpan<TC> cb,
        ref ulong[] oe, ref TAcc[] oc)
        where TKey : struct, IPackedKey<TKey>
        where TShape : struct, IHeapShape
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int n = ca.Length, m = cb.Length, W = TKey.Words;
        var heapArr = new HeapEntry<TKey>[n + 1];
        var njArr = new int[n];
        var nextArr = new int[n];
        var hindArr = new int[n];
        var storeArr = new int[2 * n];
        ref HeapEntry<TKey> heap = ref MemoryMarshal.GetArrayDataReference(heapArr);
        ref int nj = ref MemoryMarshal.GetArrayDataReference(njArr);
        ref int next = ref MemoryMarshal.GetArrayDataReference(nextArr);
        ref int hind = ref MemoryMarshal.GetArrayDataReference(hindArr);
        ref int store = ref MemoryMarshal.GetArrayDataReference(storeArr);
        ref ulong pa = ref MemoryMarshal.GetReference(ea);
        ref ulong pb = ref MemoryMarshal.GetReference(eb);
        ref TC qa = ref MemoryMarshal.GetReference(ca);
        ref TC qb = ref MemoryMarshal.GetReference(cb);
        // A square's row i starts at column i (the triangle i ≤ j), a product's at column 0.
        for (int i = 1; i < n; i++) Unsafe.Add(ref hind, i) = TShape.IsSquare ? 2 * i + 1 : 1;

        // hind[i] = 2·(next column to insert for row i) + (1 if row i is not in the heap).
        int hlen = 2, nextLoc = int.MaxValue, count = 0;
        Unsafe.Add(ref heap, 1).Exp = TKey.Sum(ref pa, 0, ref pb, 0);
        Unsafe.Add(ref heap, 1).Head = 0;
        next = -1;
        nj = 0;
        hind = 2;

        int polls = 0;
        while (hlen > 1)
        {
            if ((++polls & 1023) == 0) KernelCancellation.Poll();
            TKey exp = Unsafe.Add(ref heap, 1).Exp;
            TOps.Set(out TAcc acc, default!);
            int sp = 0;
            do
            {
                int r = Unsafe.Add(ref heap, 1).Head;
                hlen--;
                if (hlen > 1) PopRoot(ref heap, hlen);
                do
                {
                    int j = Unsafe.Add(ref nj, r);
                    Unsafe.Add(ref hind, r) |= 1;
                    Unsafe.Add(ref store, sp) = r;
                    Unsafe.Add(ref store, sp + 1) = j;
                    sp += 2;
                    if (TShape.Doubled)
                        TOps.MulAdd(ref acc, Unsafe.Add(ref qa, r), r == j ? Unsafe.Add(ref qa, j) : Unsafe.Add(ref qb, j));
                    else
                    {
                        TOps.MulAdd(ref acc, Unsafe.Add(ref qa, r), Unsafe.Add(ref qb, j));
                        if (TShape.IsSquare && r != j) TOps.MulAdd(ref acc, Unsafe.Add(ref qa, r), Unsafe.Add(ref qb, j));
                    }
                    r = Unsafe.Add(ref next, r);
                } while (r >= 0);
            } while (hlen > 1 && TKey.Same(Unsafe.Add(ref heap, 1).Exp, exp));

            while (sp > 0)
            {
                sp -= 2;
                int i = Unsafe.Add(ref store, sp), j = Unsafe.Add(ref store, sp + 1);
                if (i + 1 < n && Unsafe.Add(ref hind, i + 1) == 2 * j + 1)
                {
                    Unsafe.Add(ref nj, i + 1) = j;
                    Insert(ref heap, ref next, ref hlen, ref nextLoc, i + 1, TKey.Sum(ref pa, i + 1, ref pb, j));
                    Unsafe.Add(ref hind, i + 1) = 2 * (j + 1);
                }
                if (j + 1 < m && (Unsafe.Add(ref hind, i) & 1) == 1 && (i == 0 || Unsafe.Add(ref hind, i - 1) >= 2 * (j + 2) + 1))
                {
                    Unsafe.Add(ref nj, i) = j + 1;
                    Insert(ref heap, ref next, ref hlen, ref nextLoc, i, TKey.Sum(ref pa, i, ref pb, j + 1));
                    Unsafe.Add(ref hind, i) = 2 * (j + 2);
                }
            }

            if (!TOps.IsZero(in acc))
            {
                if ((count + 1) * W > oe.Length || count == oc.Length) GrowN(ref oe, ref oc, count + 1, W);
                TKey.Store(ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(oe), count * W), exp);
                oc[count] = acc;
                count++;
            }
        }
        return count;
    }

    /// <summary>Removes the root of a heap whose last entry is at <paramref name="last"/>: the hole
    /// moves down to a leaf along the larger children (one comparison per level), then the last
    /// entry is sifted up from there; it is usually small, so that second phase is short.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void PopRoot<TKey>(ref HeapEntry<TKey> heap, int last) where TKey : struct, IPackedKey<TKey>
    {
        HeapEntry<TKey> x = Unsafe.Add(ref heap, last);
        int hole = 1, c = 2;
        while (c < last)
        {
            if (c + 1 < last && TKey.Greater(Unsafe.Add(ref heap, c + 1).Exp, Unsafe.Add(ref heap, c).Exp)) c++;
            Unsafe.Add(ref heap, hole) = Unsafe.Add(ref heap, c);
            hole = c;
            c <<= 1;
        }
        while (hole > 1)
        {
            int p = hole >> 1;
            if (!TKey.Greater(x.Exp, Unsafe.Add(ref heap, p).Exp)) break;
            Unsafe.Add(ref heap, hole) = Unsafe.Add(ref heap, p);
            hole = p;
        }
        Unsafe.Add(ref heap, hole) = x;
    }

    /// <summary>Inserts row <paramref name="row"/> with exponent <paramref name="e"/>, chaining it to
    /// an existing entry with the same exponent when one is found on the way to the root.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static void Insert<TKey>(ref HeapEntry<TKey> heap, ref int next, ref int hlen, ref int nextLoc, int row, TKey e)
        where TKey : struct, IPackedKey<TKey>
    {
        ref HeapEntry<TKey> top = ref Unsafe.Add(ref heap, 1);
        if (hlen > 1 && TKey.Same(top.Exp, e)) { Unsafe.Add(ref next, row) = top.Head; top.Head = row; return; }
        if (nextLoc < hlen)
        {
            ref HeapEntry<TKey> nl = ref Unsafe.Add(ref heap, nextLoc);
            if (TKey.Same(nl.Exp, e)) { Unsafe.Add(ref next, row) = nl.Head; nl.Head = row; return; }
        }
        int pos = hlen, j = pos;
        while (j > 1)
        {
            int p = j >> 1;
            ref HeapEntry<TKey> pe = ref Unsafe.Add(ref heap, p);
            if (TKey.Same(pe.Exp, e)) { Unsafe.Add(ref next, row) = pe.Head; pe.Head = row; nextLoc = p; return; }
            if (TKey.Greater(e, pe.Exp)) j = p; else break;
        }
        hlen++;
        int k = pos;
        while (k > j)
        {
            int p = k >> 1;
            Unsafe.Add(ref heap, k) = Unsafe.Add(ref heap, p);
            k = p;
        }
        ref HeapEntry<TKey> slot = ref Unsafe.Add(ref heap, j);
        slot.Exp = e;
        slot.Head = row;
        Unsafe.Add(ref next, row) = -1;
    }

    /// <summary>Johnson's heap multiplication on multi-word packed exponents (<paramref name="words"/>
    /// words per term, word 0 most significant). Same algorithm as <see cref="MultiplyHeapK"/>; each
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

        int polls = 0;
        while (hlen > 1)
        {
            if ((++polls & 1023) == 0) KernelCancellation.Poll();
            rowExp.AsSpan(hhead[1] * N, N).CopyTo(cur);
            TOps.Set(out TAcc acc, default!);
            int sp = 0;
            do
            {
                int r = hhead[1];
                hlen--;
                if (hlen > 1) PopRootN(rowExp, N, hhead, hlen);
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

    /// <summary>Removes the root of a heap of row indices (<paramref name="hhead"/>[1..]) ordered by the
    /// rows' exponents in <paramref name="rowExp"/> (<paramref name="N"/> words each), whose last entry is
    /// at <paramref name="last"/>: the last entry sifts down from the root.</summary>
    internal static void PopRootN(ulong[] rowExp, int N, int[] hhead, int last)
    {
        int lh = hhead[last];
        var le = rowExp.AsSpan(lh * N, N);
        int hole = 1, c = 2;
        while (c < last)
        {
            if (c + 1 < last && CompareN(rowExp.AsSpan(hhead[c + 1] * N, N), rowExp.AsSpan(hhead[c] * N, N)) > 0) c++;
            if (CompareN(rowExp.AsSpan(hhead[c] * N, N), le) <= 0) break;
            hhead[hole] = hhead[c];
            hole = c; c = 2 * c;
        }
        hhead[hole] = lh;
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

    private static void GrowN<TAcc>(ref ulong[] oe, ref TAcc[] oc, int needed, int words)
    {
        int count = needed - 1;
        Pool.Grow(ref oe, count * words, needed * words);
        Pool.Grow(ref oc, count, needed);
    }
}
