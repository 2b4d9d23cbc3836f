namespace Integrable.Kernels.Univariate;

internal static partial class PolyMod
{
    /// <summary>Monic gcd of a and b (trimmed); gcd(0, 0) = 0 (empty). Plain Euclid while the larger
    /// degree is below <see cref="UnivariateThresholds.HalfGcd"/>, half-GCD reductions above.</summary>
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
    public static ulong[] GcdEuclid(PolyModContext ctx, ulong[] a, ulong[] b)
    {
        if (a.Length < b.Length) (a, b) = (b, a);
        if (b.Length == 0) return a.Length == 0 ? [] : MakeMonic(ctx.Mod, a);
        var (_, c, _) = EuclidSteps(ctx.Mod, a, b, 0, needMatrix: false);
        return MakeMonic(ctx.Mod, c);
    }

    /// <summary>Monic gcd g with cofactors s, t such that s·a + t·b = g (Bézout). For a = b = 0 all
    /// three are zero; when exactly one input is zero the other is made monic.</summary>
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
    public static (PolyMatrix? M, ulong[] C, ulong[] D) HalfGcd(PolyModContext ctx, ulong[] a, ulong[] b, bool needMatrix)
    {
        int n = a.Length - 1, m = (n + 1) / 2;
        if (b.Length - 1 < m) return (needMatrix ? PolyMatrix.Identity() : null, a, b);
        if (n < UnivariateThresholds.HalfGcdBase || n < 8) { long t00 = Prof.Now; var res = HalfGcdBase(ctx, a, b, m, needMatrix); Prof.Add(0, t00); return res; }

        var (r, a1, b1) = HalfGcd(ctx, a[m..], b[m..], needMatrix: true);
        long t1 = Prof.Now;
        var (x, y) = Recombine(ctx, r!, a1, b1, a.AsSpan(0, m), b.AsSpan(0, m), m);
        Prof.Add(1, t1); Prof.Add(5 + Math.Min(10, System.Numerics.BitOperations.Log2((uint)n) - 6), t1);
        if (y.Length - 1 < m) return (r, x, y);
        long t2 = Prof.Now;
        var (q, rem) = DivRem(ctx, x, y);
        r!.ApplyQuotient(ctx, q);
        Prof.Add(2, t2);
        (x, y) = (y, rem);
        if (y.Length - 1 < m) return (r, x, y);
        int k = 2 * m - (x.Length - 1);
        var (s, a2, b2) = HalfGcd(ctx, x[k..], y.Length > k ? y[k..] : [], needMatrix: true);
        long t3 = Prof.Now;
        var (c, d) = Recombine(ctx, s!, a2, b2, x.AsSpan(0, k), y.AsSpan(0, Math.Min(k, y.Length)), k);
        Prof.Add(3, t3);
        long t4 = Prof.Now;
        var mm = needMatrix ? MatMul(ctx, s!, r) : null;
        Prof.Add(4, t4);
        return (mm, c, d);
    }

    /// <summary>(hiA·x^k + M00·loA + M01·loB, hiB·x^k + M10·loA + M11·loB).</summary>
    private static (ulong[], ulong[]) Recombine(PolyModContext ctx, PolyMatrix mat, ulong[] hiA, ulong[] hiB,
        ReadOnlySpan<ulong> loA, ReadOnlySpan<ulong> loB, int k)
    {
        loA = loA[..TrimmedLength(loA)];
        loB = loB[..TrimmedLength(loB)];
        var (u, v) = MatVec(ctx, mat, loA, loB);
        return (AddShifted(ctx.Mod, u, hiA, k), AddShifted(ctx.Mod, v, hiB, k));
    }

    /// <summary>low + high·x^k, trimmed.</summary>
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
    private static (PolyMatrix? M, ulong[] C, ulong[] D) HalfGcdBase(PolyModContext ctx, ulong[] a, ulong[] b, int m, bool needMatrix)
    {
        return EuclidSteps(ctx.Mod, a, b, m, needMatrix);
    }

    /// <summary>(M00·x + M01·y, M10·x + M11·y), sharing the transforms of all six operands when they are long.</summary>
    public static (ulong[], ulong[]) MatVec(PolyModContext ctx, PolyMatrix mat, ReadOnlySpan<ulong> x, ReadOnlySpan<ulong> y)
    {
        int small = Math.Min(Math.Min(MinNonEmpty(mat.M00, x), MinNonEmpty(mat.M01, y)), Math.Min(MinNonEmpty(mat.M10, x), MinNonEmpty(mat.M11, y)));
        if (small == int.MaxValue) return ([], []);
        if (small < UnivariateThresholds.MatrixTransform)
            return (Dot(ctx, mat.M00, x, mat.M01, y), Dot(ctx, mat.M10, x, mat.M11, y));
        var ntt = ctx.Ntt;
        int n0 = Math.Max(ProductLength(mat.M00, x), ProductLength(mat.M01, y));
        int n1 = Math.Max(ProductLength(mat.M10, x), ProductLength(mat.M11, y));
        int len = NttMultiplier.TransformLength(Math.Max(n0, n1));
        long terms = Math.Max(Math.Min(mat.M00.Length, x.Length) + (long)Math.Min(mat.M01.Length, y.Length),
                              Math.Min(mat.M10.Length, x.Length) + (long)Math.Min(mat.M11.Length, y.Length));
        int kp = ntt.PrimesFor(terms);
        using var tx = ntt.Transform(x, len, kp);
        using var ty = ntt.Transform(y, len, kp);
        using var t00 = ntt.Transform(mat.M00, len, kp);
        using var t01 = ntt.Transform(mat.M01, len, kp);
        using var t10 = ntt.Transform(mat.M10, len, kp);
        using var t11 = ntt.Transform(mat.M11, len, kp);
        using var acc = ntt.Allocate(len, kp);
        var r0 = new ulong[n0];
        acc.SetProduct(t00, tx);
        acc.AddProduct(t01, ty);
        acc.InverseTo(r0);
        var r1 = new ulong[n1];
        acc.SetProduct(t10, tx);
        acc.AddProduct(t11, ty);
        acc.InverseTo(r1);
        return (Trim(r0), Trim(r1));
    }

    /// <summary>The matrix product s·r, sharing transforms when the entries are long.</summary>
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
    private static ulong[] Dot(PolyModContext ctx, ReadOnlySpan<ulong> a1, ReadOnlySpan<ulong> b1, ReadOnlySpan<ulong> a2, ReadOnlySpan<ulong> b2)
    {
        var p1 = Multiply(ctx, a1, b1);
        var p2 = Multiply(ctx, a2, b2);
        return Add(ctx.Mod, p1, p2);
    }

    /// <summary>res(a, b) along the Euclidean remainder sequence (0 when either is zero).</summary>
    public static ulong Resultant(PolyModContext ctx, ulong[] a, ulong[] b)
    {
        var mod = ctx.Mod;
        if (a.Length == 0 || b.Length == 0) return 0;
        int da = a.Length - 1, db = b.Length - 1;
        ulong res = 1;
        if (da < db)
        {
            (a, b) = (b, a);
            (da, db) = (db, da);
            if (((long)da * db & 1) != 0) res = mod.Neg(res);
        }
        while (true)
        {
            if (db == 0) return mod.Mul(res, mod.Pow(b[0], (ulong)da));
            var r = DivRem(ctx, a, b).Remainder;
            if (r.Length == 0) return 0;
            int dr = r.Length - 1;
            res = mod.Mul(res, mod.Pow(b[^1], (ulong)(da - dr)));
            if (((long)da * db & 1) != 0) res = mod.Neg(res);
            (a, b, da, db) = (b, r, db, dr);
        }
    }
}
