using Integrable.Numbers;

namespace Integrable.Kernels;

/// <summary>Multivariate division with remainder by one divisor under a monomial order (the
/// division algorithm of Cox, Little and O'Shea, "Ideals, Varieties, and Algorithms", §2.3), run with
/// a heap of pending products q_i·d_j like the exact-division kernel, on unpacked exponents and
/// rational coefficients. Inputs must have non-negative exponents.</summary>
internal static class PolynomialDivRem
{
    /// <summary>Order codes: 0 lex, 1 graded lex, 2 graded reverse lex.</summary>
    public static int Compare(ReadOnlySpan<int> a, ReadOnlySpan<int> b, int order)
    {
        if (order != 0)
        {
            long da = 0, db = 0;
            for (int v = 0; v < a.Length; v++) { da += a[v]; db += b[v]; }
            if (da != db) return da > db ? 1 : -1;
            if (order == 2)
            {
                for (int v = a.Length - 1; v >= 0; v--)
                    if (a[v] != b[v]) return a[v] < b[v] ? 1 : -1;
                return 0;
            }
        }
        for (int v = 0; v < a.Length; v++)
            if (a[v] != b[v]) return a[v] > b[v] ? 1 : -1;
        return 0;
    }

    /// <summary>Divides P by D (D non-zero) under <paramref name="order"/>; outputs terms in
    /// arbitrary order (the caller canonicalizes).</summary>
    public static void DivRem(ReadOnlySpan<Rational> cp, ReadOnlySpan<int> ep, ReadOnlySpan<Rational> cd, ReadOnlySpan<int> ed,
        int n, int order, out List<Rational> qc, out List<int> qe, out List<Rational> rc, out List<int> re)
    {
        var p = SortBy(cp, ep, n, order, out var pe);
        var d = SortBy(cd, ed, n, order, out var de);
        int np = p.Length, nd = d.Length;
        qc = []; qe = []; rc = []; re = [];
        var rowExp = new List<int>();
        var nj = new List<int>();
        var heap = new List<int> { -1 }; // 1-based heap of quotient rows (one pending product each)
        var exp = new int[n];
        int pi = 0;
        Rational lc = d[0];
        var d0 = de.AsSpan(0, n);
        while (heap.Count > 1 || pi < np)
        {
            if (heap.Count == 1) pe.AsSpan(pi * n, n).CopyTo(exp);
            else
            {
                var top = RowSpan(rowExp, heap[1], n);
                if (pi < np && Compare(pe.AsSpan(pi * n, n), top, order) > 0) pe.AsSpan(pi * n, n).CopyTo(exp);
                else top.CopyTo(exp);
            }
            Rational acc = Rational.Zero;
            if (pi < np && pe.AsSpan(pi * n, n).SequenceEqual(exp)) { acc = p[pi]; pi++; }
            while (heap.Count > 1 && RowSpan(rowExp, heap[1], n).SequenceEqual(exp))
            {
                int r = Pop(heap, rowExp, n, order);
                acc -= qc[r] * d[nj[r]];
                int j = nj[r] + 1;
                if (j < nd)
                {
                    nj[r] = j;
                    SetRow(rowExp, r, n, qe, de, j);
                    Push(heap, rowExp, n, order, r);
                }
            }
            if (acc.IsZero) continue;
            bool divisible = true;
            for (int v = 0; v < n; v++) if (exp[v] < d0[v]) { divisible = false; break; }
            if (!divisible)
            {
                rc.Add(acc);
                re.AddRange(exp);
                continue;
            }
            int row = qc.Count;
            qc.Add(acc / lc);
            for (int v = 0; v < n; v++) qe.Add(exp[v] - d0[v]);
            nj.Add(1);
            for (int v = 0; v < n; v++) rowExp.Add(0);
            if (nd > 1)
            {
                SetRow(rowExp, row, n, qe, de, 1);
                Push(heap, rowExp, n, order, row);
            }
        }
    }

    private static Span<int> RowSpan(List<int> rowExp, int row, int n) =>
        System.Runtime.InteropServices.CollectionsMarshal.AsSpan(rowExp).Slice(row * n, n);

    private static void SetRow(List<int> rowExp, int row, int n, List<int> qe, int[] de, int j)
    {
        var r = RowSpan(rowExp, row, n);
        var q = System.Runtime.InteropServices.CollectionsMarshal.AsSpan(qe).Slice(row * n, n);
        for (int v = 0; v < n; v++) r[v] = q[v] + de[j * n + v];
    }

    private static void Push(List<int> heap, List<int> rowExp, int n, int order, int row)
    {
        heap.Add(row);
        int i = heap.Count - 1;
        while (i > 1 && Compare(RowSpan(rowExp, heap[i >> 1], n), RowSpan(rowExp, row, n), order) < 0)
        {
            heap[i] = heap[i >> 1];
            i >>= 1;
        }
        heap[i] = row;
    }

    private static int Pop(List<int> heap, List<int> rowExp, int n, int order)
    {
        int top = heap[1];
        int last = heap[^1];
        heap.RemoveAt(heap.Count - 1);
        int len = heap.Count;
        if (len > 1)
        {
            int i = 1;
            while (true)
            {
                int c = 2 * i;
                if (c >= len) break;
                if (c + 1 < len && Compare(RowSpan(rowExp, heap[c + 1], n), RowSpan(rowExp, heap[c], n), order) > 0) c++;
                if (Compare(RowSpan(rowExp, heap[c], n), RowSpan(rowExp, last, n), order) <= 0) break;
                heap[i] = heap[c];
                i = c;
            }
            heap[i] = last;
        }
        return top;
    }

    private static Rational[] SortBy(ReadOnlySpan<Rational> c, ReadOnlySpan<int> e, int n, int order, out int[] sortedExps)
    {
        int count = c.Length;
        var idx = new int[count];
        for (int i = 0; i < count; i++) idx[i] = i;
        var ex = e.ToArray();
        Array.Sort(idx, (a, b) => Compare(ex.AsSpan(b * n, n), ex.AsSpan(a * n, n), order));
        var outC = new Rational[count];
        sortedExps = new int[count * n];
        for (int i = 0; i < count; i++)
        {
            outC[i] = c[idx[i]];
            ex.AsSpan(idx[i] * n, n).CopyTo(sortedExps.AsSpan(i * n, n));
        }
        return outC;
    }
}
