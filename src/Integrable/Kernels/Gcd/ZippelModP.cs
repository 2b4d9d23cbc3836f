using System.Runtime.CompilerServices;

namespace Integrable.Kernels.Gcd;

/// <summary>Zippel's sparse interpolation of a gcd over Z/pZ (R. Zippel, "Probabilistic algorithms for
/// sparse polynomials", EUROSAM 1979; "Interpolating polynomials from their values", J. Symbolic Comput.
/// 9, 1990), for inputs primitive in x₀ with a given γ = gcd(lc_{x₀} a, lc_{x₀} b).</summary>
/// <remarks>
/// <para>Computes H = γ·g/lc_{x₀}(g) for the gcd g, i.e. the gcd scaled so that its leading
/// coefficient in x₀ is γ; every univariate image at a point P is then γ(P)·(monic gcd of a(x₀, P) and
/// b(x₀, P)). Variables are added one at a time from a random base point α: H(x₀, x₁, α₂, …) is
/// interpolated densely in x₁; then for each further xₖ the monomials (the skeleton) found so far are
/// assumed, and the images of H(…, xₖ = β, α_{k+1}, …) for new values β are obtained by evaluating at
/// the powers r^j of a random point and solving transposed Vandermonde systems, one per power of x₀
/// (O(t²) each); extra equations check the skeleton. Dense Newton interpolation in xₖ stops when a new β
/// leaves the interpolant unchanged.</para>
/// <para>The method is probabilistic (a missing monomial, an unlucky point); it returns null when it
/// notices a problem, and the integer driver verifies the final result exactly in any case.</para>
/// </remarks>
internal sealed class ZippelModP
{
    private readonly ModP _f;
    private readonly GcdRandom _rng;
    private readonly int _n;
    private readonly SparseModPoly _a, _b, _gamma;
    private readonly int[] _maxDeg;

    public ZippelModP(in ModP f, SparseModPoly a, SparseModPoly b, SparseModPoly gamma, ulong seed)
    {
        _f = f;
        _rng = new GcdRandom(seed);
        _n = a.Vars;
        _a = a;
        _b = b;
        _gamma = gamma;
        _maxDeg = new int[_n];
        for (int v = 0; v < _n; v++) _maxDeg[v] = Math.Max(Math.Max(a.Degree(v), b.Degree(v)), gamma.Degree(v)) ;
    }

    /// <summary>H mod p (n variables, descending lex), or null when a check failed.</summary>
    public SparseModPoly? Interpolate()
    {
        var f = _f;
        int n = _n;
        var alpha = new ulong[n];
        for (int v = 1; v < n; v++) alpha[v] = _rng.NextResidue(f.P);

        // Stage 1: dense in x₁ over the base point.
        var stage = DenseStage(alpha, out int d);
        if (stage is null) return null;
        // stage: coefficients of x₀^i (i = d…0), each as a polynomial in x₁..x_k (terms in descending lex)
        for (int k = 2; k < n; k++)
        {
            stage = SparseStage(stage, k, alpha, d);
            if (stage is null) return null;
        }
        return Assemble(stage, n);
    }

    /// <summary>One coefficient of x₀^i: monomials in x₁..x_k (k per term) and values.</summary>
    private sealed record Coefficient(int Degree, int[] Exps, ulong[] Values);

    private List<Coefficient>? DenseStage(ulong[] alpha, out int degree)
    {
        var f = _f;
        degree = -1;
        int cap = _maxDeg[1] + _maxDeg[1] + 3; // deg_{x₁} H ≤ deg γ + deg g ≤ 2·max degree
        var interp = new NewtonInterpolant(1, cap);
        var point = (ulong[])alpha.Clone();
        var used = new HashSet<ulong>();
        int failures = 0;
        int lead = -1;
        while (true)
        {
            if (interp.Points >= cap || failures > 16 + cap) return null;
            ulong beta = _rng.NextResidue(f.P);
            if (!used.Add(beta)) { failures++; continue; }
            point[1] = beta;
            ulong gv = EvaluateAll(_gamma, point);
            if (gv == 0) { failures++; continue; }
            var g = UnivariateGcd(point);
            int dg = g.Length - 1;
            if (lead >= 0 && dg > lead) { failures++; GcdHooks.UnluckyPoints++; continue; }
            if (lead >= 0 && dg < lead) { interp.Reset(); GcdHooks.Restarts++; }
            lead = dg;
            // image as a polynomial in x₀ (1 variable), scaled by γ(point)
            var img = SparseModPoly.FromGroups(0, 1, [], [DenseModP.Scale(g, gv, f)]);
            interp.Add(img, beta, f);
            if (interp.Points >= 2 && interp.Unchanged) break;
        }
        degree = lead;
        interp.ToGroups(out int count, out var exps, out var dense);
        var result = new List<Coefficient>(count);
        for (int r = 0; r < count; r++)
        {
            var row = dense[r];
            int terms = 0;
            foreach (var x in row) if (x != 0) terms++;
            var e = new int[terms];
            var c = new ulong[terms];
            int m = 0;
            for (int i = row.Length - 1; i >= 0; i--)
            {
                if (row[i] == 0) continue;
                e[m] = i;
                c[m] = row[i];
                m++;
            }
            result.Add(new Coefficient(exps[r], e, c));
        }
        return result;
    }

    /// <summary>Adds variable x_k: images for new values of x_k by sparse interpolation on the skeleton, dense Newton in x_k.</summary>
    private List<Coefficient>? SparseStage(List<Coefficient> skeleton, int k, ulong[] alpha, int degree)
    {
        var f = _f;
        int m = k - 1; // variables x₁..x_{k−1} in the skeleton monomials
        int T = 0;
        foreach (var c in skeleton) T = Math.Max(T, c.Values.Length);
        // random r with pairwise distinct monomial values inside each coefficient
        ulong[] r = new ulong[k];
        ulong[][] nodes = new ulong[skeleton.Count][];
        for (int attempt = 0; ; attempt++)
        {
            if (attempt > 8) return null;
            for (int v = 1; v < k; v++) r[v] = _rng.NextResidue(f.P);
            bool distinct = true;
            for (int i = 0; i < skeleton.Count && distinct; i++)
            {
                var c = skeleton[i];
                var vals = new ulong[c.Values.Length];
                for (int l = 0; l < vals.Length; l++)
                {
                    ulong x = 1;
                    for (int v = 0; v < m; v++) x = f.Mul(x, f.Pow(r[v + 1], c.Exps[l * m + v]));
                    vals[l] = x;
                }
                if (vals.Distinct().Count() != vals.Length || vals.Contains(0UL)) distinct = false;
                nodes[i] = vals;
            }
            if (distinct) break;
        }

        // Dense interpolation in x_k: each image gives values on the skeleton (rows = skeleton monomials of all coefficients).
        int rows = 0;
        foreach (var c in skeleton) rows += c.Values.Length;
        int cap = 2 * _maxDeg[k] + 3;
        var interp = new NewtonInterpolant(m + 1, cap); // main monomial = (x₀-degree, x₁..x_{k−1} exponents)
        var rowExps = new int[rows * (m + 1)];
        {
            int q = 0;
            foreach (var c in skeleton)
                for (int l = 0; l < c.Values.Length; l++, q++)
                {
                    rowExps[q * (m + 1)] = c.Degree;
                    Array.Copy(c.Exps, l * m, rowExps, q * (m + 1) + 1, m);
                }
        }
        // the base image (x_k = α_k) is the skeleton itself
        var used = new HashSet<ulong> { alpha[k] };
        interp.Add(ImageOnSkeleton(skeleton, rowExps, rows, m), alpha[k], f);
        var point = (ulong[])alpha.Clone();
        int failures = 0;
        while (true)
        {
            if (interp.Points >= cap || failures > 16 + cap) return null;
            ulong beta = _rng.NextResidue(f.P);
            if (!used.Add(beta)) { failures++; continue; }
            point[k] = beta;
            // images at P_j = (r^j, β, α_{k+1}, …), j = 1..T
            var h = new ulong[T][];
            bool ok = true;
            var rp = new ulong[k];
            for (int v = 1; v < k; v++) rp[v] = 1;
            for (int j = 0; j < T && ok; j++)
            {
                for (int v = 1; v < k; v++) { rp[v] = f.Mul(rp[v], r[v]); point[v] = rp[v]; }
                ulong gv = EvaluateAll(_gamma, point);
                if (gv == 0) { ok = false; break; }
                var g = UnivariateGcd(point);
                if (g.Length - 1 > degree) { ok = false; GcdHooks.UnluckyPoints++; break; }
                if (g.Length - 1 < degree) return null; // the degree from stage 1 was too high: start over
                h[j] = DenseModP.Scale(g, gv, f);
            }
            if (!ok) { failures++; continue; }
            // solve one transposed Vandermonde system per power of x₀
            var values = new ulong[rows];
            int q0 = 0;
            for (int i = 0; i < skeleton.Count; i++)
            {
                var c = skeleton[i];
                int t = c.Values.Length;
                var s = new ulong[T];
                for (int j = 0; j < T; j++) s[j] = c.Degree < h[j].Length ? h[j][c.Degree] : 0;
                var sol = SolveTransposedVandermonde(nodes[i], s, t);
                // the remaining equations must hold as well
                for (int j = t; j < T; j++)
                {
                    ulong acc = 0;
                    for (int l = 0; l < t; l++) acc = f.Add(acc, f.Mul(sol[l], f.Pow(nodes[i][l], j + 1)));
                    if (acc != s[j]) return null;
                }
                Array.Copy(sol, 0, values, q0, t);
                q0 += t;
            }
            // monomials of x₀ absent from the skeleton must vanish in every image
            for (int j = 0; j < T; j++)
                for (int e = 0; e < h[j].Length; e++)
                    if (h[j][e] != 0 && !skeleton.Exists(c => c.Degree == e)) return null;
            var img = new SparseModPoly(m + 1, values, rowExps, rows);
            interp.Add(Compact(img), beta, f);
            if (interp.Unchanged) break;
        }
        // new skeleton: monomials in x₁..x_k
        interp.ToGroups(out int count, out var mexps, out var dense);
        var byDegree = new SortedDictionary<int, (List<int> E, List<ulong> C)>(Comparer<int>.Create((x, y) => y.CompareTo(x)));
        for (int q = 0; q < count; q++)
        {
            int deg0 = mexps[q * (m + 1)];
            if (!byDegree.TryGetValue(deg0, out var lists)) byDegree[deg0] = lists = (new List<int>(), new List<ulong>());
            var row = dense[q];
            for (int e = row.Length - 1; e >= 0; e--)
            {
                if (row[e] == 0) continue;
                for (int v = 0; v < m; v++) lists.E.Add(mexps[q * (m + 1) + 1 + v]);
                lists.E.Add(e);
                lists.C.Add(row[e]);
            }
        }
        var result = new List<Coefficient>();
        foreach (var (deg0, lists) in byDegree)
        {
            // terms are grouped by x₁..x_{k−1} then x_k descending, which is descending lex in x₁..x_k
            result.Add(new Coefficient(deg0, lists.E.ToArray(), lists.C.ToArray()));
        }
        return result;
    }

    private static SparseModPoly ImageOnSkeleton(List<Coefficient> skeleton, int[] rowExps, int rows, int m)
    {
        var values = new ulong[rows];
        int q = 0;
        foreach (var c in skeleton)
            for (int l = 0; l < c.Values.Length; l++) values[q++] = c.Values[l];
        return Compact(new SparseModPoly(m + 1, values, rowExps, rows));
    }

    /// <summary>Drops zero coefficients (the interpolant takes sparse images in descending lex order).</summary>
    private static SparseModPoly Compact(SparseModPoly p)
    {
        int nz = 0;
        for (int t = 0; t < p.Count; t++) if (p.Coeffs[t] != 0) nz++;
        if (nz == p.Count) return p;
        var c = new ulong[nz];
        var e = new int[nz * p.Vars];
        int m = 0;
        for (int t = 0; t < p.Count; t++)
        {
            if (p.Coeffs[t] == 0) continue;
            c[m] = p.Coeffs[t];
            Array.Copy(p.Exps, t * p.Vars, e, m * p.Vars, p.Vars);
            m++;
        }
        return new SparseModPoly(p.Vars, c, e, nz);
    }

    /// <summary>Solves Σ_l c_l·v_l^(j+1) = s_j (j = 0..t−1) for c (distinct non-zero nodes v).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private ulong[] SolveTransposedVandermonde(ulong[] v, ulong[] s, int t)
    {
        var f = _f;
        // master polynomial M(z) = Π (z − v_l), coefficients low → high
        var master = new ulong[t + 1];
        master[0] = 1;
        for (int l = 0; l < t; l++)
        {
            ulong nv = f.Neg(v[l]);
            for (int i = l + 1; i >= 1; i--) master[i] = f.Add(master[i - 1], f.Mul(nv, master[i]));
            master[0] = f.Mul(nv, master[0]);
        }
        var c = new ulong[t];
        var q = new ulong[t];
        for (int l = 0; l < t; l++)
        {
            // q = M/(z − v_l) by synthetic division, high → low
            ulong carry = 0;
            for (int i = t; i >= 1; i--)
            {
                carry = f.Add(master[i], f.Mul(carry, v[l]));
                q[i - 1] = carry;
            }
            ulong num = 0, qv = 0;
            for (int i = t - 1; i >= 0; i--) qv = f.Add(f.Mul(qv, v[l]), q[i]);
            for (int i = 0; i < t; i++) num = f.Add(num, f.Mul(q[i], s[i]));
            c[l] = f.Mul(num, f.Inv(f.Mul(v[l], qv)));
        }
        return c;
    }

    /// <summary>Monic gcd in x₀ of a and b with x₁.. set to <paramref name="point"/> (indices 1..n−1).</summary>
    private ulong[] UnivariateGcd(ulong[] point)
    {
        var ua = Univariate(_a, point);
        var ub = Univariate(_b, point);
        return DenseModP.Gcd(DenseModP.Trim(ua), DenseModP.Trim(ub), _f);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private ulong[] Univariate(SparseModPoly p, ulong[] point)
    {
        var f = _f;
        int n = _n;
        var pw = PowerTables(point);
        var r = new ulong[p.Degree(0) + 1];
        for (int t = 0; t < p.Count; t++)
        {
            ulong w = p.Coeffs[t];
            for (int v = 1; v < n; v++)
            {
                int e = p.Exps[t * n + v];
                if (e != 0) w = f.Mul(w, pw[v][e]);
            }
            int e0 = p.Exps[t * n];
            r[e0] = f.Add(r[e0], w);
        }
        return r;
    }

    private ulong EvaluateAll(SparseModPoly p, ulong[] point)
    {
        var f = _f;
        int n = _n;
        var pw = PowerTables(point);
        ulong acc = 0;
        for (int t = 0; t < p.Count; t++)
        {
            ulong w = p.Coeffs[t];
            for (int v = 1; v < n; v++)
            {
                int e = p.Exps[t * n + v];
                if (e != 0) w = f.Mul(w, pw[v][e]);
            }
            acc = f.Add(acc, w);
        }
        return acc;
    }

    private ulong[][] PowerTables(ulong[] point)
    {
        var f = _f;
        var pw = new ulong[_n][];
        for (int v = 1; v < _n; v++)
        {
            var t = new ulong[_maxDeg[v] + 1];
            t[0] = 1;
            for (int e = 1; e < t.Length; e++) t[e] = f.Mul(t[e - 1], point[v]);
            pw[v] = t;
        }
        return pw;
    }

    /// <summary>The n-variable polynomial from its coefficients in x₀ (monomials in x₁..x_{n−1}).</summary>
    private static SparseModPoly Assemble(List<Coefficient> stage, int n)
    {
        int terms = 0;
        foreach (var c in stage) terms += c.Values.Length;
        var coeffs = new ulong[terms];
        var exps = new int[terms * n];
        int q = 0;
        foreach (var c in stage) // descending x₀-degree, then descending lex in x₁..
            for (int l = 0; l < c.Values.Length; l++)
            {
                if (c.Values[l] == 0) continue;
                coeffs[q] = c.Values[l];
                exps[q * n] = c.Degree;
                Array.Copy(c.Exps, l * (n - 1), exps, q * n + 1, n - 1);
                q++;
            }
        return new SparseModPoly(n, coeffs, exps, q);
    }
}
