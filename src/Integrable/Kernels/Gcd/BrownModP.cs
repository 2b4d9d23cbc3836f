using System.Runtime.CompilerServices;
namespace Integrable.Kernels.Gcd;

/// <summary>The gcd of two polynomials over Z/pZ with optional cofactors, as returned by
/// <see cref="BrownModP"/>: <see cref="G"/> is monic (leading coefficient 1 in lex order) and, when
/// computed, G·<see cref="ABar"/> = a and G·<see cref="BBar"/> = b.</summary>
internal sealed record BrownImage(SparseModPoly G, SparseModPoly? ABar, SparseModPoly? BBar);

/// <summary>Brown's dense modular gcd over Z/pZ (W. S. Brown, "On Euclid's algorithm and the computation
/// of polynomial greatest common divisors", J. ACM 18, 1971; the recursive form PGCD of Geddes,
/// Czapor and Labahn, "Algorithms for Computer Algebra", 1992, §7.4).</summary>
/// <remarks>
/// <para>Recursion on the last variable x = x_{k−1}: the inputs are viewed as polynomials in
/// x₀..x_{k−2} with coefficients in Z/pZ[x]. Contents in Z/pZ[x] are split off, γ = gcd of the leading
/// coefficients is the known multiple of the leading coefficient of the gcd, and for points α with
/// γ(α) ≠ 0 the gcd of the images a(α), b(α) is computed recursively (down to Euclid's algorithm in
/// x₀), scaled to leading coefficient γ(α) and interpolated in x by Newton's method.</para>
/// <para><b>Unlucky points.</b> The image gcd is always a multiple of the true gcd's image, so an image
/// whose leading monomial is larger than the others is unlucky and discarded; a smaller one means every
/// image so far was unlucky, and the interpolation restarts.</para>
/// <para><b>Termination.</b> With cofactors (ā = γa/h, b̄ = γb/h interpolated beside h = γ·g/lc(g)):
/// once deg h + deg ā = deg γa and deg h + deg b̄ = deg γb the interpolants are exact (if h or ā were
/// still wrong, its degree would be below the true one). Without cofactors: when a new point leaves h
/// unchanged. Both tests assume lucky images; the integer driver verifies the final result exactly.</para>
/// <para>Returns null when it cannot finish (too many unlucky points); the caller then takes another
/// prime.</para>
/// </remarks>
internal sealed class BrownModP
{
    private readonly ModP _f;
    private readonly GcdRandom _rng;
    private readonly bool _cofactors;

    public BrownModP(in ModP f, bool cofactors, ulong seed)
    {
        _f = f;
        _cofactors = cofactors;
        _rng = new GcdRandom(seed);
    }

    /// <summary>gcd(a, b) with cofactors when requested; both inputs non-zero with the same number of variables.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public BrownImage? Gcd(SparseModPoly a, SparseModPoly b)
    {
        var f = _f;
        int k = a.Vars;
        GcdHooks.ImageCount++;
        if (k == 1)
        {
            var da = a.GroupDense(0, a.Count);
            var db = b.GroupDense(0, b.Count);
            var g = DenseModP.Gcd(da, db, f);
            var gs = SparseModPoly.FromGroups(0, 1, [], [g]);
            if (!_cofactors) return new BrownImage(gs, null, null);
            return new BrownImage(gs,
                SparseModPoly.FromGroups(0, 1, [], [DenseModP.DivideExact(da, g, f)]),
                SparseModPoly.FromGroups(0, 1, [], [DenseModP.DivideExact(db, g, f)]));
        }

        int m = k - 1;
        var sa = a.GroupStarts();
        var sb = b.GroupStarts();
        var cA = Content(a, sa);
        var cB = Content(b, sb);
        var c = DenseModP.Gcd(cA, cB, f);
        var a1 = a;
        var b1 = b;
        if (cA.Length > 1) { a1 = DivideGroups(a, sa, cA); sa = a1.GroupStarts(); }
        if (cB.Length > 1) { b1 = DivideGroups(b, sb, cB); sb = b1.GroupStarts(); }

        SparseModPoly gP;                 // primitive part of the gcd (w.r.t. x₀..x_{k−2})
        SparseModPoly? aP = null, bP = null; // a1/gP, b1/gP
        if (IsFreeOfMain(a1, sa) || IsFreeOfMain(b1, sb))
        {
            gP = SparseModPoly.Constant(k, 1);
            aP = a1;
            bP = b1;
        }
        else
        {
            var gamma = DenseModP.Gcd(a1.GroupDense(sa[0], sa[1]), b1.GroupDense(sb[0], sb[1]), f);
            int degA = a1.LastDegree(), degB = b1.LastDegree(), dg = gamma.Length - 1;
            int DA = dg + degA, DB = dg + degB;
            int cap = _cofactors ? Math.Max(DA, DB) + 1 : Math.Min(DA, DB) + 2;
            if (k == 2)
            {
                var bi = Bivariate(a1, sa, b1, sb, gamma, DA, DB, cap);
                if (bi is null) return null;
                (gP, aP, bP) = bi.Value;
                goto finish;
            }
            var ih = new NewtonInterpolant(m, cap);
            var ia = _cofactors ? new NewtonInterpolant(m, cap) : null;
            var ib = _cofactors ? new NewtonInterpolant(m, cap) : null;
            var pw = new ulong[Math.Max(degA, degB) + 1];
            var used = new List<ulong>();
            SparseModPoly? lead = null;
            int failures = 0, failureLimit = 16 + cap;
            while (true)
            {
                if (ih.Points >= cap) return null;
                ulong alpha = NextPoint();
                if (used.Contains(alpha)) { if (++failures > failureLimit) return null; continue; }
                ulong gAlpha = DenseModP.Evaluate(gamma, alpha, f);
                if (gAlpha == 0) { if (++failures > failureLimit) return null; continue; }
                pw[0] = 1;
                for (int i = 1; i < pw.Length; i++) pw[i] = f.Mul(pw[i - 1], alpha);
                var ea = a1.EvaluateLast(sa, pw, f);
                var eb = b1.EvaluateLast(sb, pw, f);
                var r = Gcd(ea, eb);
                if (r is null) { if (++failures > failureLimit) return null; continue; }
                if (lead is not null)
                {
                    int cmp = SparseModPoly.CompareLeading(r.G, lead);
                    if (cmp > 0)
                    {
                        GcdHooks.UnluckyPoints++;
                        if (++failures > failureLimit) return null;
                        continue;
                    }
                    if (cmp < 0)
                    {
                        GcdHooks.Restarts++;
                        ih.Reset(); ia?.Reset(); ib?.Reset();
                        used.Clear();
                    }
                }
                lead = r.G;
                used.Add(alpha);
                ih.Add(r.G.Scale(gAlpha, f), alpha, f);
                if (_cofactors)
                {
                    ia!.Add(r.ABar!, alpha, f);
                    ib!.Add(r.BBar!, alpha, f);
                    if (ih.Degree + ia.Degree == DA && ih.Degree + ib.Degree == DB) break;
                }
                else if (ih.Points >= 2 && ih.Unchanged) break;
            }

            ih.ToGroups(out int hc, out var hExps, out var hDense);
            var cH = RowsContent(hDense);
            if (cH.Length > 1)
                for (int i = 0; i < hc; i++) hDense[i] = DenseModP.DivideExact(hDense[i], cH, f);
            var lcG = hDense[0];
            gP = SparseModPoly.FromGroups(m, hc, hExps, hDense);
            if (_cofactors)
            {
                aP = DivideInterpolant(ia!, lcG, m);
                bP = DivideInterpolant(ib!, lcG, m);
                if (aP is null || bP is null) return null;
            }
        }

        finish:
        // gcd = c·gP; cofactors (cA/c)·aP and (cB/c)·bP; then make the gcd monic.
        var G = MultiplyGroups(gP, c);
        SparseModPoly? ABar = null, BBar = null;
        if (_cofactors)
        {
            ABar = MultiplyGroups(aP!, DenseModP.DivideExact(cA, c, f));
            BBar = MultiplyGroups(bP!, DenseModP.DivideExact(cB, c, f));
        }
        ulong u = G.Coeffs[0];
        if (u != 1)
        {
            G = G.Scale(f.Inv(u), f);
            ABar = ABar?.Scale(u, f);
            BBar = BBar?.Scale(u, f);
        }
        return new BrownImage(G, ABar, BBar);
    }

    /// <summary>The interpolation loop for two variables: images are dense univariate polynomials in x₀
    /// and the interpolants have one row per power of x₀ (no sparse bookkeeping).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private (SparseModPoly G, SparseModPoly? A, SparseModPoly? B)? Bivariate(
        SparseModPoly a1, int[] sa, SparseModPoly b1, int[] sb, ulong[] gamma, int DA, int DB, int cap)
    {
        var f = _f;
        int degA0 = a1.Exps[0], degB0 = b1.Exps[0];
        int rowsH = Math.Min(degA0, degB0) + 1;
        var ih = new DenseNewtonInterpolant(rowsH, cap);
        var ia = _cofactors ? new DenseNewtonInterpolant(degA0 + 1, cap) : null;
        var ib = _cofactors ? new DenseNewtonInterpolant(degB0 + 1, cap) : null;
        var pw = new ulong[Math.Max(a1.LastDegree(), b1.LastDegree()) + 1];
        var ea = new ulong[degA0 + 1];
        var eb = new ulong[degB0 + 1];
        var used = new HashSet<ulong>();
        int lead = -1, failures = 0, failureLimit = 16 + cap;
        while (true)
        {
            if (ih.Points >= cap) return null;
            ulong alpha = NextPoint();
            if (!used.Add(alpha)) { if (++failures > failureLimit) return null; continue; }
            ulong gAlpha = DenseModP.Evaluate(gamma, alpha, f);
            if (gAlpha == 0) { if (++failures > failureLimit) return null; continue; }
            pw[0] = 1;
            for (int i = 1; i < pw.Length; i++) pw[i] = f.Mul(pw[i - 1], alpha);
            EvaluateDense(a1, pw, ea);
            EvaluateDense(b1, pw, eb);
            var ta = ea.AsSpan(0, DenseModP.TrimmedLength(ea));
            var tb = eb.AsSpan(0, DenseModP.TrimmedLength(eb));
            var g = DenseModP.Gcd(ta, tb, f);
            int dgx = g.Length - 1;
            if (lead >= 0 && dgx > lead)
            {
                GcdHooks.UnluckyPoints++;
                if (++failures > failureLimit) return null;
                continue;
            }
            if (lead >= 0 && dgx < lead)
            {
                GcdHooks.Restarts++;
                ih.Reset(); ia?.Reset(); ib?.Reset();
                used.Clear();
                used.Add(alpha);
            }
            lead = dgx;
            var h = DenseModP.Scale(g, gAlpha, f);
            ih.Add(h, alpha, f);
            if (_cofactors)
            {
                ia!.Add(DenseModP.DivideExact(ta, g, f), alpha, f);
                ib!.Add(DenseModP.DivideExact(tb, g, f), alpha, f);
                if (ih.Degree + ia.Degree == DA && ih.Degree + ib.Degree == DB) break;
            }
            else if (ih.Points >= 2 && ih.Unchanged) break;
        }
        ih.ToGroups(out int hc, out var hExps, out var hDense);
        var cH = RowsContent(hDense);
        if (cH.Length > 1)
            for (int i = 0; i < hc; i++) hDense[i] = DenseModP.DivideExact(hDense[i], cH, f);
        var lcG = hDense[0];
        var gP = SparseModPoly.FromGroups(1, hc, hExps, hDense);
        if (!_cofactors) return (gP, null, null);
        var aP = DivideRows(ia!, lcG);
        var bP = DivideRows(ib!, lcG);
        if (aP is null || bP is null) return null;
        return (gP, aP, bP);
    }

    private SparseModPoly? DivideRows(DenseNewtonInterpolant it, ulong[] lc)
    {
        it.ToGroups(out int n, out var exps, out var dense);
        for (int i = 0; i < n; i++)
        {
            if (!DenseModP.TryDivide(dense[i], lc, _f, out var q)) return null;
            dense[i] = q;
        }
        return SparseModPoly.FromGroups(1, n, exps, dense);
    }

    /// <summary>Evaluates a bivariate polynomial at x₁ = α (powers given) into a dense array in x₀.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private void EvaluateDense(SparseModPoly p, ulong[] pw, ulong[] into)
    {
        var f = _f;
        Array.Clear(into);
        var exps = p.Exps;
        var coeffs = p.Coeffs;
        for (int t = 0; t < p.Count; t++)
        {
            int e0 = exps[2 * t];
            into[e0] = f.Add(into[e0], f.Mul(coeffs[t], pw[exps[2 * t + 1]]));
        }
    }

    private ulong NextPoint()
    {
        var forced = GcdHooks.ForcedPoints;
        if (forced is not null && forced.Count > 0) return forced.Dequeue() % _f.P;
        return _rng.NextResidue(_f.P);
    }

    /// <summary>Content in Z/pZ[x_{k−1}]: monic gcd of the groups' coefficients, smallest first, stopping at 1.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private ulong[] Content(SparseModPoly p, int[] starts)
    {
        int groups = starts.Length - 1;
        int first = 0;
        for (int g = 1; g < groups; g++)
            if (p.GroupDegree(starts[g]) < p.GroupDegree(starts[first])) first = g;
        var cur = p.GroupDense(starts[first], starts[first + 1]);
        if (cur.Length == 1) return DenseModP.One;
        DenseModP.MakeMonic(cur, _f);
        for (int g = 0; g < groups && cur.Length > 1; g++)
        {
            if (g == first) continue;
            cur = DenseModP.Gcd(cur, p.GroupDense(starts[g], starts[g + 1]), _f);
        }
        return cur.Length == 1 ? DenseModP.One : cur;
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private ulong[] RowsContent(ulong[][] rows)
    {
        int first = 0;
        for (int i = 1; i < rows.Length; i++) if (rows[i].Length < rows[first].Length) first = i;
        var cur = (ulong[])rows[first].Clone();
        if (cur.Length == 1) return DenseModP.One;
        DenseModP.MakeMonic(cur, _f);
        for (int i = 0; i < rows.Length && cur.Length > 1; i++)
            if (i != first) cur = DenseModP.Gcd(cur, rows[i], _f);
        return cur.Length == 1 ? DenseModP.One : cur;
    }

    private static bool IsFreeOfMain(SparseModPoly p, int[] starts)
    {
        if (starts.Length != 2) return false;
        int m = p.Vars - 1;
        for (int v = 0; v < m; v++) if (p.Exps[v] != 0) return false;
        return true;
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private SparseModPoly DivideGroups(SparseModPoly p, int[] starts, ulong[] c)
    {
        int groups = starts.Length - 1, m = p.Vars - 1;
        var mainExps = new int[groups * m];
        var dense = new ulong[groups][];
        for (int g = 0; g < groups; g++)
        {
            if (m > 0) Array.Copy(p.Exps, starts[g] * p.Vars, mainExps, g * m, m);
            dense[g] = DenseModP.DivideExact(p.GroupDense(starts[g], starts[g + 1]), c, _f);
        }
        return SparseModPoly.FromGroups(m, groups, mainExps, dense);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private SparseModPoly MultiplyGroups(SparseModPoly p, ulong[] c)
    {
        if (c.Length == 1 && c[0] == 1) return p;
        if (c.Length == 1) return p.Scale(c[0], _f);
        p.ToGroups(out var starts, out var mainExps, out var dense);
        for (int g = 0; g < dense.Length; g++) dense[g] = DenseModP.Multiply(dense[g], c, _f);
        return SparseModPoly.FromGroups(p.Vars - 1, starts.Length - 1, mainExps, dense);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private SparseModPoly? DivideInterpolant(NewtonInterpolant it, ulong[] lc, int m)
    {
        it.ToGroups(out int n, out var exps, out var dense);
        for (int i = 0; i < n; i++)
        {
            if (!DenseModP.TryDivide(dense[i], lc, _f, out var q)) return null;
            dense[i] = q;
        }
        return SparseModPoly.FromGroups(m, n, exps, dense);
    }
}
