using System.Runtime.CompilerServices;
namespace Integrable.Kernels.Univariate;

internal static partial class PolyMod
{
    /// <summary>a + b, trimmed.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Add(in ModulusReducer mod, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        if (a.Length < b.Length) { var t = a; a = b; b = t; }
        var r = NewArray(a.Length);
        for (int i = 0; i < b.Length; i++) r[i] = mod.Add(a[i], b[i]);
        a[b.Length..].CopyTo(r.AsSpan(b.Length));
        return a.Length == b.Length ? Trim(r) : r;
    }

    /// <summary>a − b, trimmed.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Subtract(in ModulusReducer mod, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        int n = Math.Max(a.Length, b.Length), m = Math.Min(a.Length, b.Length);
        var r = NewArray(n);
        for (int i = 0; i < m; i++) r[i] = mod.Sub(a[i], b[i]);
        if (a.Length > m) a[m..].CopyTo(r.AsSpan(m));
        else for (int i = m; i < n; i++) r[i] = mod.Neg(b[i]);
        return a.Length == b.Length ? Trim(r) : r;
    }

    /// <summary>−a.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Negate(in ModulusReducer mod, ReadOnlySpan<ulong> a)
    {
        var r = NewArray(a.Length);
        for (int i = 0; i < a.Length; i++) r[i] = mod.Neg(a[i]);
        return r;
    }

    /// <summary>c·a for a residue c, trimmed.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Scale(in ModulusReducer mod, ReadOnlySpan<ulong> a, ulong c)
    {
        if (c == 0) return [];
        var r = NewArray(a.Length);
        ScaleInto(mod, a, c, r);
        return r;
    }

    /// <summary>dst ← c·a.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void ScaleInto(in ModulusReducer mod, ReadOnlySpan<ulong> a, ulong c, Span<ulong> dst)
    {
        if (c == 1) { a.CopyTo(dst); return; }
        for (int i = 0; i < a.Length; i++) dst[i] = mod.Mul(a[i], c);
    }

    /// <summary>a·x^k.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] ShiftLeft(ReadOnlySpan<ulong> a, int k)
    {
        if (a.IsEmpty) return [];
        var r = new ulong[a.Length + k];
        a.CopyTo(r.AsSpan(k));
        return r;
    }

    /// <summary>a div x^k (drops the k lowest coefficients).</summary>
    public static ReadOnlySpan<ulong> ShiftRight(ReadOnlySpan<ulong> a, int k) => k >= a.Length ? [] : a[k..];

    /// <summary>Horner evaluation a(x).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong Evaluate(in ModulusReducer mod, ReadOnlySpan<ulong> a, ulong x)
    {
        ulong r = 0;
        for (int i = a.Length - 1; i >= 0; i--) r = mod.Add(mod.Mul(r, x), a[i]);
        return r;
    }

    /// <summary>The formal derivative, trimmed (coefficients i·a_i reduced mod p).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Derivative(in ModulusReducer mod, ReadOnlySpan<ulong> a)
    {
        if (a.Length <= 1) return [];
        var r = NewArray(a.Length - 1);
        for (int i = 1; i < a.Length; i++) r[i - 1] = mod.Mul(a[i], mod.Reduce64((ulong)i));
        return Trim(r);
    }

    /// <summary>The monic associate a / lc(a) (a non-zero).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] MakeMonic(in ModulusReducer mod, ulong[] a)
    {
        ulong lc = a[^1];
        return lc == 1 ? a : Scale(mod, a, mod.Inverse(lc));
    }

    /// <summary>Reversal x^(n−1)·a(1/x) of the first n coefficients (a shorter than n is padded).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Reverse(ReadOnlySpan<ulong> a, int n)
    {
        var r = new ulong[n];
        int m = Math.Min(n, a.Length);
        for (int i = 0; i < m; i++) r[n - 1 - i] = a[i];
        return r;
    }
}
