using System.Runtime.CompilerServices;
using System.Numerics;
namespace Integrable.Kernels.Univariate;

internal static partial class PolyMod
{
    /// <summary>Monic gcd of a and b (trimmed); gcd(0, 0) = 0 (empty). Plain Euclid while the larger
    /// degree is below <see cref="UnivariateThresholds.HalfGcd"/>, half-GCD reductions above.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] Gcd(PolyModContext ctx, ulong[] a, ulong[] b)
    {
        if (a.Length < b.Length) (a, b) = (b, a);
        if (b.Length == 0) return a.Length == 0 ? [] : MakeMonic(ctx.Mod, a);
        if (a.Length == b.Length) (a, b) = (b, DivRem(ctx, a, b).Remainder);
        while (b.Length > 0)
        {
            if (a.Length - 1 < UnivariateThresholds.HalfGcd) return GcdEuclid(ctx, a, b);
            (_, a, b) = HalfGcd(ctx, a, b, needMatrix: false);
            if (b.Length == 0) break;
            (a, b) = (b, DivRem(ctx, a, b).Remainder);
        }
        return MakeMonic(ctx.Mod, a);
    }

    /// <summary>Monic gcd by the plain Euclidean algorithm.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong[] GcdEuclid(PolyModContext ctx, ulong[] a, ulong[] b)
    {
        if (a.Length < b.Length) (a, b) = (b, a);
        if (b.Length == 0) return a.Length == 0 ? [] : MakeMonic(ctx.Mod, a);
        var (_, c, _) = EuclidSteps(ctx.Mod, a, b, 0, needMatrix: false);
        return MakeMonic(ctx.Mod, c);
    }

    /// <summary>Monic gcd g with cofactors s, t such that s·a + t·b = g (Bézout). For a = b = 0 all
    /// three are zero; when exactly one input is zero the other is made monic.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static (ulong[] G, ulong[] S, ulong[] T) ExtendedGcd(PolyModContext ctx, ulong[] a, ulong[] b)
    {
        var mod = ctx.Mod;
        bool swapped = false;
        if (a.Length < b.Length) { (a, b) = (b, a); swapped = true; }
        if (a.Length == 0) return ([], [], []);
        var m = PolyMatrix.Identity();
        if (b.Length > 0 && a.Length == b.Length)
        {
            var (q, r) = DivRem(ctx, a, b);
            m.ApplyQuotient(ctx, q);
            (a, b) = (b, r);
        }
        while (b.Length > 0)
        {
            if (a.Length - 1 >= UnivariateThresholds.HalfGcd)
            {
                var (h, c, d) = HalfGcd(ctx, a, b, needMatrix: true);
                m = MatMul(ctx, h!, m);
                (a, b) = (c, d);
                if (b.Length == 0) break;
            }
            var (q, r) = DivRem(ctx, a, b);
            m.ApplyQuotient(ctx, q);
            (a, b) = (b, r);
        }
        ulong inv = mod.Inverse(a[^1]);
        var g = Scale(mod, a, inv);
        var s = Scale(mod, m.M00, inv);
        var t = Scale(mod, m.M01, inv);
        return swapped ? (g, t, s) : (g, s, t);
    }

    /// <summary>Half-GCD. For deg a = n &gt; deg b and m = ⌈n/2⌉, returns the transition matrix M of the
    /// Euclidean steps (when <paramref name="needMatrix"/>) and (c, d) = M·(a, b) with
    /// deg c ≥ m &gt; deg d: two consecutive remainders straddling degree n/2.</summary>
    /// <remarks>Recursive scheme (Knuth–Schönhage, as presented by Thull and Yap 1990 and in
    /// von zur Gathen–Gerhard ch. 11): the first half of the quotients is computed from the top halves
    /// a div x^m, b div x^m; one explicit division step follows; the second half is computed from the
    /// top parts of the new pair shifted by k = 2m − deg. The reduced pair is recombined from the
    /// recursive result on the top part plus the matrix applied to the dropped low part only.</remarks>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static (PolyMatrix? M, ulong[] C, ulong[] D) HalfGcd(PolyModContext ctx, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, bool needMatrix)
    {
        KernelCancellation.Poll();
        int n = a.Length - 1, m = (n + 1) / 2;
        if (b.Length - 1 < m) return (needMatrix ? PolyMatrix.Identity() : null, a.ToArray(), b.ToArray());
        if (n < UnivariateThresholds.HalfGcdBase || n < 8) return HalfGcdBase(ctx, a, b, m, needMatrix);

        var (r, a1, b1) = HalfGcd(ctx, a[m..], b[m..], needMatrix: true);
        var (x, y) = Recombine(ctx, r!, a1, b1, a[..m], b[..m], m, needMatrix, out var rTransforms);
        using var rT = rTransforms;
        if (y.Length - 1 < m) return (r, x, y);
        var (q, rem) = DivRem(ctx, x, y);
        r!.ApplyQuotient(ctx, q);
        (x, y) = (y, rem);
        if (y.Length - 1 < m) return (r, x, y);
        int k = 2 * m - (x.Length - 1);
        var (s, a2, b2) = HalfGcd(ctx, x.AsSpan(k), y.Length > k ? y.AsSpan(k) : [], needMatrix: true);
        var (c, d) = Recombine(ctx, s!, a2, b2, x.AsSpan(0, k), y.AsSpan(0, Math.Min(k, y.Length)), k, needMatrix, out var sTransforms);
        using var sT = sTransforms;
        if (!needMatrix) return (null, c, d);
        var mm = MatMulReusing(ctx, s!, r, sT, rT) ?? MatMul(ctx, s!, r);
        return (mm, c, d);
    }

    /// <summary>Transforms of the four entries of a matrix at one length, kept from a matrix–vector product.</summary>
    internal sealed class MatrixTransforms(NttMultiplier.Transformed t00, NttMultiplier.Transformed t01,
        NttMultiplier.Transformed t10, NttMultiplier.Transformed t11) : IDisposable
    {
        public readonly NttMultiplier.Transformed T00 = t00, T01 = t01, T10 = t10, T11 = t11;

        [MethodImpl(MethodImplOptions.AggressiveOptimization)]
        public void Dispose()
        {
            T00.Dispose(); T01.Dispose(); T10.Dispose(); T11.Dispose();
        }
    }

    /// <summary>S·R′ with R′ = [[0, 1], [1, −q]]·R, using the transforms of S and of R kept from the two
    /// matrix–vector products: prefixes of them are the transforms at the (shorter) product length
    /// (all of S, and R′'s first row, which is R's second row). Saves six forward transforms per half-GCD
    /// node. Returns null when the shapes do not allow it.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static PolyMatrix? MatMulReusing(PolyModContext ctx, PolyMatrix s, PolyMatrix r, MatrixTransforms? sT, MatrixTransforms? rT)
    {
        if (sT is null || rT is null) return null;
        int n = s.MaxLength + r.MaxLength - 1;
        int len = NttMultiplier.TransformLength(n);
        int kp = ctx.Ntt.PrimesFor(2L * Math.Min(s.MaxLength, r.MaxLength));
        if (len < 16 || len > sT.T00.Length || len > rT.T00.Length || kp > sT.T00.Primes || kp > rT.T00.Primes)
            return null;
        var ntt = ctx.Ntt;
        using var s00 = sT.T00.Prefix(len, kp);
        using var s01 = sT.T01.Prefix(len, kp);
        using var s10 = sT.T10.Prefix(len, kp);
        using var s11 = sT.T11.Prefix(len, kp);
        // R′ row 0 = old row 1.
        using var r00 = rT.T10.Prefix(len, kp);
        using var r01 = rT.T11.Prefix(len, kp);
        // R′'s second row (old row 0 − q·old row 1) is reduced mod p, which is not the integer
        // combination of the old transforms: it is transformed afresh.
        using var r10 = ntt.Transform(r.M10, len, kp);
        using var r11 = ntt.Transform(r.M11, len, kp);
        using var acc = ntt.Allocate(len, kp);
        ulong[] Entry(NttMultiplier.Transformed a1, NttMultiplier.Transformed b1, NttMultiplier.Transformed a2, NttMultiplier.Transformed b2)
        {
            var res = new ulong[n];
            acc.SetProduct(a1, b1);
            acc.AddProduct(a2, b2);
            acc.InverseTo(res);
            return Trim(res);
        }
        return new PolyMatrix(Entry(s00, r00, s01, r10), Entry(s00, r01, s01, r11), Entry(s10, r00, s11, r10), Entry(s10, r01, s11, r11));
    }

    /// <summary>(hiA·x^k + M00·loA + M01·loB, hiB·x^k + M10·loA + M11·loB).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static (ulong[], ulong[]) Recombine(PolyModContext ctx, PolyMatrix mat, ulong[] hiA, ulong[] hiB,
        ReadOnlySpan<ulong> loA, ReadOnlySpan<ulong> loB, int k, bool keep, out MatrixTransforms? transforms)
    {
        loA = loA[..TrimmedLength(loA)];
        loB = loB[..TrimmedLength(loB)];
        var (u, v) = MatVec(ctx, mat, loA, loB, keep, out transforms);
        return (AddShifted(ctx.Mod, u, hiA, k), AddShifted(ctx.Mod, v, hiB, k));
    }

    /// <summary>low + high·x^k, trimmed.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static ulong[] AddShifted(in ModulusReducer mod, ReadOnlySpan<ulong> low, ReadOnlySpan<ulong> high, int k)
    {
        if (high.IsEmpty) return low.ToArray();
        int n = Math.Max(low.Length, high.Length + k);
        var r = new ulong[n];
        low.CopyTo(r);
        for (int i = 0; i < high.Length; i++) r[i + k] = mod.Add(r[i + k], high[i]);
        return Trim(r);
    }

    /// <summary>Half-GCD base case: plain Euclidean steps with matrix tracking until deg b &lt; m.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static (PolyMatrix? M, ulong[] C, ulong[] D) HalfGcdBase(PolyModContext ctx, ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b, int m, bool needMatrix)
    {
        return EuclidSteps(ctx.Mod, a, b, m, needMatrix);
    }

    /// <summary>(M00·x + M01·y, M10·x + M11·y), sharing the transforms of all six operands when they are long.</summary>
    public static (ulong[], ulong[]) MatVec(PolyModContext ctx, PolyMatrix mat, ReadOnlySpan<ulong> x, ReadOnlySpan<ulong> y) =>
        MatVec(ctx, mat, x, y, false, out _);

    /// <summary>As MatVec; when <paramref name="keep"/> and transforms were used, also hands back the
    /// transforms of the matrix entries (the caller disposes them).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static (ulong[], ulong[]) MatVec(PolyModContext ctx, PolyMatrix mat, ReadOnlySpan<ulong> x, ReadOnlySpan<ulong> y,
        bool keep, out MatrixTransforms? transforms)
    {
        transforms = null;
        int small = Math.Min(Math.Min(MinNonEmpty(mat.M00, x), MinNonEmpty(mat.M01, y)), Math.Min(MinNonEmpty(mat.M10, x), MinNonEmpty(mat.M11, y)));
        if (small == int.MaxValue) return ([], []);
        if (small < UnivariateThresholds.MatrixTransform)
            return (Dot(ctx, mat.M00, x, mat.M01, y), Dot(ctx, mat.M10, x, mat.M11, y));
        var ntt = ctx.Ntt;
        var mod = ctx.Mod;
        int n0 = Math.Max(ProductLength(mat.M00, x), ProductLength(mat.M01, y));
        int n1 = Math.Max(ProductLength(mat.M10, x), ProductLength(mat.M11, y));
        int lenM = mat.MaxLength, lenV = Math.Max(x.Length, y.Length);
        // Transform length: the smallest power of two holding the whole product, or a smaller one with the
        // vector cut into chunks of L − lenM + 1 coefficients, whichever has the lower cost
        // (4 + 4c)·L·log L (4 matrix transforms, then per chunk 2 forward and 2 inverse).
        int full = NttMultiplier.TransformLength(lenM + lenV - 1);
        int len = full, chunk = lenV;
        double best = full <= NttMultiplier.MaxLength ? 8.0 * len * BitOperations.Log2((uint)len) : double.MaxValue;
        if (2 * lenM > NttMultiplier.MaxLength)
            return (Dot(ctx, mat.M00, x, mat.M01, y), Dot(ctx, mat.M10, x, mat.M11, y));   // beyond the transforms
        for (int cand = Math.Min(full / 2, NttMultiplier.MaxLength); cand >= 2 * lenM && cand >= 16; cand /= 2)
        {
            int ch = cand - lenM + 1, c = (lenV + ch - 1) / ch;
            double cost = (4.0 + 4.0 * c) * cand * BitOperations.Log2((uint)cand);
            if (cost < best) { best = cost; len = cand; chunk = ch; }
        }
        int kp = ntt.PrimesFor(2L * Math.Min(lenM, chunk));
        var mt = new MatrixTransforms(ntt.Transform(mat.M00, len, kp), ntt.Transform(mat.M01, len, kp),
            ntt.Transform(mat.M10, len, kp), ntt.Transform(mat.M11, len, kp));
        var (t00, t01, t10, t11) = (mt.T00, mt.T01, mt.T10, mt.T11);
        using var acc = ntt.Allocate(len, kp);
        var r0 = new ulong[n0];
        var r1 = new ulong[n1];
        ulong[]? tmp = chunk < lenV ? new ulong[len] : null;
        for (int off = 0; off < lenV; off += chunk)
        {
            var xs = off < x.Length ? x.Slice(off, Math.Min(chunk, x.Length - off)) : [];
            var ys = off < y.Length ? y.Slice(off, Math.Min(chunk, y.Length - off)) : [];
            using var tx = ntt.Transform(xs, len, kp);
            using var ty = ntt.Transform(ys, len, kp);
            Accumulate(acc, t00, tx, t01, ty, r0, off, tmp, mod);
            Accumulate(acc, t10, tx, t11, ty, r1, off, tmp, mod);
        }
        if (keep) transforms = mt;
        else mt.Dispose();
        return (Trim(r0), Trim(r1));

        static void Accumulate(NttMultiplier.Transformed acc, NttMultiplier.Transformed a1, NttMultiplier.Transformed b1,
            NttMultiplier.Transformed a2, NttMultiplier.Transformed b2, ulong[] dst, int off, ulong[]? tmp, in ModulusReducer mod)
        {
            int n = Math.Min(acc.Length, dst.Length - off);
            if (n <= 0) return;
            acc.SetProduct(a1, b1);
            acc.AddProduct(a2, b2);
            if (tmp is null) { acc.InverseTo(dst.AsSpan(off, n)); return; }
            acc.InverseTo(tmp.AsSpan(0, n));
            var d = dst.AsSpan(off, n);
            for (int i = 0; i < n; i++) d[i] = mod.Add(d[i], tmp[i]);
        }
    }

    /// <summary>The matrix product s·r, sharing transforms when the entries are long.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static PolyMatrix MatMul(PolyModContext ctx, PolyMatrix s, PolyMatrix r)
    {
        int small = Math.Min(MinEntry(s), MinEntry(r));
        if (small < UnivariateThresholds.MatrixTransform)
            return new PolyMatrix(
                Dot(ctx, s.M00, r.M00, s.M01, r.M10), Dot(ctx, s.M00, r.M01, s.M01, r.M11),
                Dot(ctx, s.M10, r.M00, s.M11, r.M10), Dot(ctx, s.M10, r.M01, s.M11, r.M11));
        var ntt = ctx.Ntt;
        int n = Math.Max(Math.Max(s.M00.Length, s.M01.Length), Math.Max(s.M10.Length, s.M11.Length))
              + Math.Max(Math.Max(r.M00.Length, r.M01.Length), Math.Max(r.M10.Length, r.M11.Length)) - 1;
        int len = NttMultiplier.TransformLength(n);
        if (len > NttMultiplier.MaxLength)
            return new PolyMatrix(
                Dot(ctx, s.M00, r.M00, s.M01, r.M10), Dot(ctx, s.M00, r.M01, s.M01, r.M11),
                Dot(ctx, s.M10, r.M00, s.M11, r.M10), Dot(ctx, s.M10, r.M01, s.M11, r.M11));
        long terms = 2L * Math.Min(s.MaxLength, r.MaxLength);
        int kp = ntt.PrimesFor(terms);
        using var s00 = ntt.Transform(s.M00, len, kp);
        using var s01 = ntt.Transform(s.M01, len, kp);
        using var s10 = ntt.Transform(s.M10, len, kp);
        using var s11 = ntt.Transform(s.M11, len, kp);
        using var r00 = ntt.Transform(r.M00, len, kp);
        using var r01 = ntt.Transform(r.M01, len, kp);
        using var r10 = ntt.Transform(r.M10, len, kp);
        using var r11 = ntt.Transform(r.M11, len, kp);
        using var acc = ntt.Allocate(len, kp);
        ulong[] Entry(NttMultiplier.Transformed a1, NttMultiplier.Transformed b1, NttMultiplier.Transformed a2, NttMultiplier.Transformed b2)
        {
            var res = new ulong[n];
            acc.SetProduct(a1, b1);
            acc.AddProduct(a2, b2);
            acc.InverseTo(res);
            return Trim(res);
        }
        return new PolyMatrix(Entry(s00, r00, s01, r10), Entry(s00, r01, s01, r11), Entry(s10, r00, s11, r10), Entry(s10, r01, s11, r11));
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static int MinEntry(PolyMatrix m)
    {
        int r = int.MaxValue;
        if (m.M00.Length > 0) r = Math.Min(r, m.M00.Length);
        if (m.M01.Length > 0) r = Math.Min(r, m.M01.Length);
        if (m.M10.Length > 0) r = Math.Min(r, m.M10.Length);
        if (m.M11.Length > 0) r = Math.Min(r, m.M11.Length);
        return r;
    }

    private static int MinNonEmpty(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b) =>
        a.IsEmpty || b.IsEmpty ? int.MaxValue : Math.Min(a.Length, b.Length);

    private static int ProductLength(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b) =>
        a.IsEmpty || b.IsEmpty ? 0 : a.Length + b.Length - 1;

    /// <summary>a1·b1 + a2·b2, trimmed.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static ulong[] Dot(PolyModContext ctx, ReadOnlySpan<ulong> a1, ReadOnlySpan<ulong> b1, ReadOnlySpan<ulong> a2, ReadOnlySpan<ulong> b2)
    {
        var p1 = Multiply(ctx, a1, b1);
        var p2 = Multiply(ctx, a2, b2);
        return Add(ctx.Mod, p1, p2);
    }

    /// <summary>res(a, b) along the Euclidean remainder sequence (0 when either is zero), with the
    /// remainders computed in place (no allocation per step).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ulong Resultant(PolyModContext ctx, ulong[] a, ulong[] b)
    {
        var mod = ctx.Mod;
        if (a.Length == 0 || b.Length == 0) return 0;
        ulong res = 1;
        if (a.Length < b.Length)
        {
            (a, b) = (b, a);
            if (((long)(a.Length - 1) * (b.Length - 1) & 1) != 0) res = mod.Neg(res);
        }
        var r0 = (ulong[])a.Clone();
        var r1 = new ulong[r0.Length];
        b.CopyTo(r1, 0);
        var q = new ulong[r0.Length];
        int l0 = r0.Length, l1 = b.Length;
        while (true)
        {
            int da = l0 - 1, db = l1 - 1;
            if (db == 0) return mod.Mul(res, mod.Pow(r1[0], (ulong)da));
            ulong lc = r1[l1 - 1];
            int lr = RemainderInPlace(mod, r0, l0, r1, l1, q);
            if (lr == 0) return 0;
            int dr = lr - 1;
            res = mod.Mul(res, mod.Pow(lc, (ulong)(da - dr)));
            if (((long)da * db & 1) != 0) res = mod.Neg(res);
            (r0, r1) = (r1, r0);
            (l0, l1) = (l1, lr);
        }
    }
}
