using System.Runtime.CompilerServices;
namespace Integrable.Kernels.Gcd;

/// <summary>Dense univariate polynomials over Z/pZ as coefficient arrays, lowest degree first, with no
/// leading zero (the zero polynomial is the empty array). Small and internal: just what the modular
/// gcd needs for its univariate images (Euclid's algorithm, exact division, products).</summary>
internal static class DenseModP
{
    public static readonly ulong[] One = [1];

    /// <summary>Degree (−1 for zero) of a trimmed array.</summary>
    public static int Degree(ReadOnlySpan<ulong> a) => a.Length - 1;

    /// <summary>Length of <paramref name="a"/> without its leading zeros.</summary>
    public static int TrimmedLength(ReadOnlySpan<ulong> a)
    {
        int n = a.Length;
        while (n > 0 && a[n - 1] == 0) n--;
        return n;
    }

    /// <summary>A trimmed copy (or the array itself when already trimmed).</summary>
    public static ulong[] Trim(ulong[] a)
    {
        int n = TrimmedLength(a);
        return n == a.Length ? a : a.AsSpan(0, n).ToArray();
    }

    /// <summary>Horner evaluation.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong Evaluate(ReadOnlySpan<ulong> a, ulong x, in ModP f)
    {
        ulong r = 0;
        for (int i = a.Length - 1; i >= 0; i--) r = f.Add(f.Mul(r, x), a[i]);
        return r;
    }

    /// <summary>The product.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Multiply(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, in ModP f)
    {
        if (a.Length == 0 || b.Length == 0) return [];
        if (a.Length == 1 && a[0] == 1) return b.ToArray();
        if (b.Length == 1 && b[0] == 1) return a.ToArray();
        var r = new ulong[a.Length + b.Length - 1];
        for (int i = 0; i < a.Length; i++)
        {
            ulong ai = a[i];
            if (ai == 0) continue;
            for (int j = 0; j < b.Length; j++) r[i + j] = f.Add(r[i + j], f.Mul(ai, b[j]));
        }
        return r;
    }

    /// <summary>s·a (new array; zero when s = 0).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Scale(ReadOnlySpan<ulong> a, ulong s, in ModP f)
    {
        if (s == 0) return [];
        var r = new ulong[a.Length];
        for (int i = 0; i < a.Length; i++) r[i] = f.Mul(a[i], s);
        return r;
    }

    /// <summary>Scales <paramref name="a"/> in place so that it is monic; returns the old leading coefficient.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong MakeMonic(Span<ulong> a, in ModP f)
    {
        ulong lc = a[^1];
        if (lc == 1) return 1;
        ulong inv = f.Inv(lc);
        for (int i = 0; i < a.Length; i++) a[i] = f.Mul(a[i], inv);
        return lc;
    }

    /// <summary>Reduces r[0..len) modulo the monic-or-not divisor d in place; returns the new length.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int RemainderInPlace(Span<ulong> r, int len, ReadOnlySpan<ulong> d, in ModP f)
    {
        int ld = d.Length;
        ulong inv = f.Inv(d[ld - 1]);
        for (int i = len - 1; i >= ld - 1; i--)
        {
            ulong c = r[i];
            if (c == 0) continue;
            // subtract (p − q)·d, i.e. add q′·d with q′ = −q, using Shoup's multiplier for the fixed q′
            ulong q = f.Neg(f.Mul(c, inv));
            ulong qs = f.ShoupFactor(q);
            int off = i - (ld - 1);
            var row = r.Slice(off, ld - 1);
            for (int j = 0; j < row.Length; j++) row[j] = f.Add(row[j], f.MulShoup(d[j], q, qs));
            r[i] = 0;
        }
        int n = Math.Min(len, ld - 1);
        while (n > 0 && r[n - 1] == 0) n--;
        return n;
    }

    /// <summary>The monic gcd (Euclid); gcd(0, 0) = 0.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Gcd(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, in ModP f)
    {
        if (a.Length == 0) return MonicCopy(b, f);
        if (b.Length == 0) return MonicCopy(a, f);
        if (a.Length == 1 || b.Length == 1) return One;
        ulong[] r0, r1;
        if (a.Length >= b.Length) { r0 = a.ToArray(); r1 = b.ToArray(); }
        else { r0 = b.ToArray(); r1 = a.ToArray(); }
        int l0 = r0.Length, l1 = r1.Length;
        while (l1 > 0)
        {
            l0 = RemainderInPlace(r0, l0, r1.AsSpan(0, l1), f);
            (r0, r1) = (r1, r0);
            (l0, l1) = (l1, l0);
            if (l1 == 1) return One;
        }
        var g = r0.AsSpan(0, l0).ToArray();
        MakeMonic(g, f);
        return g;
    }

    private static ulong[] MonicCopy(ReadOnlySpan<ulong> a, in ModP f)
    {
        if (a.Length == 0) return [];
        var g = a.ToArray();
        MakeMonic(g, f);
        return g;
    }

    /// <summary>Exact division: q with q·d = a, or false when d does not divide a.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static bool TryDivide(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> d, in ModP f, out ulong[] q)
    {
        if (d.Length == 0) throw new DivideByZeroException("division by the zero polynomial mod p");
        if (a.Length == 0) { q = []; return true; }
        if (d.Length == 1)
        {
            q = d[0] == 1 ? a.ToArray() : Scale(a, f.Inv(d[0]), f);
            return true;
        }
        if (a.Length < d.Length) { q = []; return false; }
        var r = a.ToArray();
        int ld = d.Length;
        q = new ulong[a.Length - ld + 1];
        ulong inv = f.Inv(d[ld - 1]);
        for (int i = a.Length - 1; i >= ld - 1; i--)
        {
            ulong c = r[i];
            if (c == 0) continue;
            ulong qc = f.Mul(c, inv);
            int off = i - (ld - 1);
            q[off] = qc;
            ulong nq = f.Neg(qc), nqs = f.ShoupFactor(nq);
            for (int j = 0; j < ld - 1; j++) r[off + j] = f.Add(r[off + j], f.MulShoup(d[j], nq, nqs));
        }
        for (int i = 0; i < ld - 1; i++)
            if (r[i] != 0) return false;
        return true;
    }

    /// <summary>Exact division that must succeed (the caller knows d divides a).</summary>
    public static ulong[] DivideExact(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> d, in ModP f)
    {
        if (!TryDivide(a, d, f, out var q)) throw new InvalidOperationException("internal error: inexact division mod p");
        return q;
    }
}
