using System.Buffers;
using System.Runtime.CompilerServices;

namespace Integrable.Kernels.Univariate;

/// <summary>Dense polynomial kernels over Z/pZ on spans of residues (index = exponent). Arrays returned
/// by the array-level helpers are trimmed: no leading zero coefficients, the zero polynomial is empty.</summary>
internal static partial class PolyMod
{
    /// <summary>Length without leading zeros.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static int TrimmedLength(ReadOnlySpan<ulong> a)
    {
        int n = a.Length;
        while (n > 0 && a[n - 1] == 0) n--;
        return n;
    }

    /// <summary>The trimmed array itself, or a trimmed copy.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Trim(ulong[] a)
    {
        int n = TrimmedLength(a);
        return n == a.Length ? a : a.AsSpan(0, n).ToArray();
    }

    /// <summary>An array that need not be zeroed (every entry is written by the caller).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static ulong[] NewArray(int n) => n == 0 ? [] : GC.AllocateUninitializedArray<ulong>(n);

    // ---------------------------------------------------------------- products

    /// <summary>The product a·b as a trimmed array.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Multiply(PolyModContext ctx, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        if (a.IsEmpty || b.IsEmpty) return [];
        var r = NewArray(a.Length + b.Length - 1);
        Multiply(ctx, a, b, r);
        return Trim(r);
    }

    /// <summary>dst ← a·b, dst.Length = la + lb − 1 (both non-empty).</summary>
    /// <remarks>Dispatch: schoolbook when the shorter operand is below <see cref="UnivariateThresholds.Ntt"/>
    /// coefficients; otherwise transforms when their estimated cost k·L·log₂L (k transform primes,
    /// L the transform length) is below that of the classical product, la·lb scaled by the Karatsuba saving
    /// (Karatsuba/lb)^0.415 once the shorter operand reaches <see cref="UnivariateThresholds.Karatsuba"/>.
    /// The constants come from timing all three on a 2-core AMD EPYC (UnivariateMultiplyBenchmarks).</remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void Multiply(PolyModContext ctx, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, Span<ulong> dst)
    {
        if (a.Length < b.Length) { var t = a; a = b; b = t; }
        int la = a.Length, lb = b.Length;
        if (lb >= 64) KernelCancellation.Poll();
        if (lb < UnivariateThresholds.Ntt)
        {
            if (lb < UnivariateThresholds.Karatsuba) MultiplySchoolbook(ctx.Mod, a, b, dst);
            else MultiplyKaratsuba(ctx.Mod, a, b, dst);
            return;
        }
        bool kara = lb >= UnivariateThresholds.Karatsuba;
        int len = NttMultiplier.TransformLength(la + lb - 1);
        if (len > NttMultiplier.MaxLength || TransformPays(ctx, la, lb, len)) ctx.Ntt.Multiply(a, b, dst);   // (chunked beyond the largest transform)
        else if (kara) MultiplyKaratsuba(ctx.Mod, a, b, dst);
        else MultiplySchoolbook(ctx.Mod, a, b, dst);
    }

    /// <summary>The cost model of <see cref="Multiply(PolyModContext, ReadOnlySpan{ulong}, ReadOnlySpan{ulong}, Span{ulong})"/>:
    /// true when transforms of length <paramref name="len"/> beat the classical product of lengths la ≥ lb.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static bool TransformPays(PolyModContext ctx, int la, int lb, int len)
    {
        if (lb < UnivariateThresholds.Ntt || len > NttMultiplier.MaxLength) return false;
        double transformCost = UnivariateThresholds.TransformCostFactor * ctx.Ntt.PrimesFor(lb) * len * System.Numerics.BitOperations.Log2((uint)len);
        bool kara = lb >= UnivariateThresholds.Karatsuba;
        double classicalCost = (double)la * lb * (kara ? Math.Pow((double)UnivariateThresholds.Karatsuba / lb, 0.415) : 1.0);
        return transformCost < classicalCost;
    }

    /// <summary>dst ← a·b by the quadratic method with delayed (128-bit) reduction: one reduction per
    /// output coefficient.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void MultiplySchoolbook(in ModulusReducer mod, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, Span<ulong> dst)
    {
        int la = a.Length, lb = b.Length, n = la + lb - 1;
        for (int k = 0; k < n; k++)
        {
            if ((k & 1023) == 1023) KernelCancellation.Poll();
            int i0 = Math.Max(0, k - lb + 1), i1 = Math.Min(k, la - 1);
            ulong hi = 0, lo = 0;
            int cnt = 0, lim = mod.DelayedTerms;
            for (int i = i0; i <= i1; i++)
            {
                ulong ph = Math.BigMul(a[i], b[k - i], out ulong pl);
                lo += pl;
                hi += ph + (lo < pl ? 1UL : 0UL);
                if (++cnt == lim) { lo = mod.Reduce128(hi, lo); hi = 0; cnt = 1; }
            }
            dst[k] = mod.Reduce128(hi, lo);
        }
    }

    /// <summary>dst ← a·b by Karatsuba's method (a at least as long as b); an unbalanced product is cut
    /// into blocks of b's length.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void MultiplyKaratsuba(in ModulusReducer mod, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, Span<ulong> dst)
    {
        int la = a.Length, lb = b.Length;
        int scratchLen = 4 * lb + 64;
        ulong[] scratch = ArrayPool<ulong>.Shared.Rent(scratchLen + 2 * lb - 1);
        try
        {
            if (la == lb) { KaratsubaEqual(mod, a, b, dst, scratch.AsSpan(0, scratchLen)); return; }
            dst.Clear();
            var block = scratch.AsSpan(scratchLen, 2 * lb - 1);
            for (int i = 0; i < la; i += lb)
            {
                int len = Math.Min(lb, la - i);
                ReadOnlySpan<ulong> ai = a.Slice(i, len);
                Span<ulong> blk = block[..(len + lb - 1)];
                if (len == lb) KaratsubaEqual(mod, ai, b, blk, scratch.AsSpan(0, scratchLen));
                else if (len < UnivariateThresholds.Karatsuba) MultiplySchoolbook(mod, b, ai, blk);
                else MultiplyKaratsuba(mod, b, ai, blk);
                var d = dst.Slice(i, blk.Length);
                for (int j = 0; j < blk.Length; j++) d[j] = mod.Add(d[j], blk[j]);
            }
        }
        finally { ArrayPool<ulong>.Shared.Return(scratch); }
    }

    /// <summary>Karatsuba on two operands of equal length n; dst has length 2n − 1; scratch ≥ 4n + 64.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void KaratsubaEqual(in ModulusReducer mod, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, Span<ulong> dst, Span<ulong> scratch)
    {
        int n = a.Length;
        if (n < UnivariateThresholds.Karatsuba || n < 4)
        {
            MultiplySchoolbook(mod, a, b, dst);
            return;
        }
        int m = n / 2, h = n - m;                 // low part length m, high part length h ≥ m
        var a0 = a[..m]; var a1 = a[m..];
        var b0 = b[..m]; var b1 = b[m..];
        // z0 = a0·b0 → dst[0, 2m−1); z2 = a1·b1 → dst[2m, 2n−1); dst[2m−1] = 0.
        KaratsubaEqual(mod, a0, b0, dst[..(2 * m - 1)], scratch);
        dst[2 * m - 1] = 0;
        KaratsubaEqual(mod, a1, b1, dst[(2 * m)..], scratch);
        // z1 = (a0 + a1)(b0 + b1) − z0 − z2, added at offset m.
        var s = scratch[..h];
        var t = scratch.Slice(h, h);
        var z1 = scratch.Slice(2 * h, 2 * h - 1);
        var rest = scratch[(4 * h - 1)..];
        for (int i = 0; i < m; i++) { s[i] = mod.Add(a0[i], a1[i]); t[i] = mod.Add(b0[i], b1[i]); }
        for (int i = m; i < h; i++) { s[i] = a1[i]; t[i] = b1[i]; }
        KaratsubaEqual(mod, s, t, z1, rest);
        var z0 = dst[..(2 * m - 1)];
        var z2 = dst.Slice(2 * m, 2 * h - 1);
        for (int i = 0; i < z0.Length; i++) z1[i] = mod.Sub(z1[i], z0[i]);
        for (int i = 0; i < z2.Length; i++) z1[i] = mod.Sub(z1[i], z2[i]);
        var mid = dst.Slice(m, 2 * h - 1);
        for (int i = 0; i < mid.Length; i++) mid[i] = mod.Add(mid[i], z1[i]);
    }

    /// <summary>The square a² as a trimmed array.</summary>
    public static ulong[] Square(PolyModContext ctx, ReadOnlySpan<ulong> a) => Multiply(ctx, a, a);

    /// <summary>dst ← (a·b) mod x^n, as a trimmed array of length ≤ n.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] MultiplyLow(PolyModContext ctx, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, int n)
    {
        a = a[..Math.Min(a.Length, n)];
        b = b[..Math.Min(b.Length, n)];
        a = a[..TrimmedLength(a)];
        b = b[..TrimmedLength(b)];
        if (a.IsEmpty || b.IsEmpty) return [];
        int full = a.Length + b.Length - 1;
        if (full <= n) return Multiply(ctx, a, b);
        var t = NewArray(full);
        Multiply(ctx, a, b, t);
        return Trim(t.AsSpan(0, n).ToArray());
    }
}
