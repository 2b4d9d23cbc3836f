using System.Runtime.CompilerServices;
using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Kernels.Gcd;

/// <summary>Result of <see cref="ModularGcd.Compute"/>: A = G·ABar and B = G·BBar exactly.</summary>
internal readonly record struct IntGcd(IntPoly G, IntPoly ABar, IntPoly BBar);

/// <summary>The gcd of two primitive integer polynomials by Brown's modular algorithm over several
/// word primes, with exact verification.</summary>
/// <remarks>
/// <para><b>Steps.</b> (1) Degree bounds: for each variable xᵢ, both inputs are evaluated mod a prime at
/// a random point in the other variables; when the leading coefficients in xᵢ do not vanish there,
/// the degree uᵢ of the univariate gcd bounds deg_{xᵢ} gcd from above. All uᵢ = 0 proves the inputs
/// coprime. (2) Variables: the one needing the most interpolation points becomes the main variable
/// (never evaluated); unused variables are dropped. (3) Algorithm (see <see cref="Choose"/>).
/// (4) Primes: images with a larger leading monomial than others come from unlucky primes and are
/// discarded; a smaller one restarts the Chinese remaindering; γ = gcd(lc A, lc B) scales the images
/// so that they lift to integer polynomials. (5) Verification: the candidate G = pp(lift) is accepted
/// only if G·Ā = A and G·B̄ = B exactly (multiplication) or A/G and B/G are exact (division).
/// (6) Maximality: a verified common divisor G with deg_{xᵢ} G = uᵢ for every i is the gcd; otherwise
/// the cofactors are checked coprime by step (1), or their gcd is split off recursively.</para>
/// </remarks>
internal static class ModularGcd
{
    /// <summary>Threshold of <see cref="Choose"/>: interpolating cofactors is chosen while it needs at
    /// most this factor more evaluation points than interpolating the gcd alone.</summary>
    internal static double CofactorPointRatio = 3.0;

    private const int MaxRestarts = 4;

    /// <summary>gcd(A, B) with cofactors; A, B non-zero, primitive, same variables, non-negative exponents.</summary>
    public static IntGcd Compute(IntPoly A, IntPoly B) => ComputeCore(A, B, 0);

    private static IntGcd ComputeCore(IntPoly A, IntPoly B, int depth)
    {
        int n = A.Vars;
        if (A.IsConstant || B.IsConstant) return new IntGcd(IntPoly.One(n), A, B);
        if (A.SameAs(B.Coeffs, B.Exps)) return new IntGcd(A, IntPoly.One(n), IntPoly.One(n));

        var degA = A.Degrees();
        var degB = B.Degrees();
        var rng = new GcdRandom(0x5DEECE66DUL + (ulong)depth);
        long t0 = System.Diagnostics.Stopwatch.GetTimestamp();
        var u = DegreeBounds(A, B, degA, degB, rng);
        GcdHooks.PhaseTicks[0] += System.Diagnostics.Stopwatch.GetTimestamp() - t0;
        bool allZero = true;
        for (int v = 0; v < n; v++) if (u[v] != 0) allZero = false;
        if (allZero) return new IntGcd(IntPoly.One(n), A, B);

        // One input may divide the other: cheap to try when the bounds allow it.
        if (SameDegrees(u, degB) && TryDivide(A, B, out var qa)) return new IntGcd(B, qa, IntPoly.One(n));
        if (SameDegrees(u, degA) && TryDivide(B, A, out var qb)) return new IntGcd(A, IntPoly.One(n), qb);

        // Variables: drop the unused ones, put the one needing most points first.
        var used = new List<int>();
        for (int v = 0; v < n; v++) if (degA[v] > 0 || degB[v] > 0) used.Add(v);
        int main = used[0];
        foreach (int v in used) if (Points(v, u, degA, degB) > Points(main, u, degA, degB)) main = v;
        var map = new List<int> { main };
        foreach (int v in used) if (v != main) map.Add(v);
        bool reorder = main != used[0];
        var mapArr = map.ToArray();
        var Ai = used.Count == n && !reorder ? A : A.Permute(mapArr, reorder);
        var Bi = used.Count == n && !reorder ? B : B.Permute(mapArr, reorder);
        var ui = new int[mapArr.Length];
        for (int i = 0; i < ui.Length; i++) ui[i] = u[mapArr[i]];

        var algorithm = GcdHooks.ForceAlgorithm ?? Choose(mapArr, u, degA, degB, Math.Min(A.Count, B.Count));
        if (algorithm == GcdAlgorithm.Zippel && mapArr.Length < 3) algorithm = GcdAlgorithm.BrownGcdOnly;
        var r = algorithm == GcdAlgorithm.Zippel ? ZippelDriver(Ai, Bi, depth) : Modular(Ai, Bi, algorithm);

        // Maximality: degrees equal to the upper bounds, or coprime cofactors, or split further.
        var dG = r.G.Degrees();
        bool certified = true;
        for (int i = 0; i < ui.Length; i++) if (dG[i] != ui[i]) certified = false;
        if (!certified)
        {
            var more = ComputeCore(r.ABar, r.BBar, depth + 1);
            if (!more.G.IsConstant)
            {
                if (depth > 8) throw new InvalidOperationException("Modular gcd: the cofactors kept sharing a factor; giving up.");
                r = new IntGcd(Multiply(r.G, more.G), more.ABar, more.BBar);
            }
        }

        if (used.Count == n && !reorder) return r;
        return new IntGcd(Unpermute(r.G, mapArr, n, reorder), Unpermute(r.ABar, mapArr, n, reorder), Unpermute(r.BBar, mapArr, n, reorder));
    }

    /// <summary>Points needed in xᵥ when the gcd and both cofactors are interpolated.</summary>
    private static int Points(int v, int[] u, int[] degA, int[] degB) =>
        Math.Max(u[v], Math.Max(degA[v] - u[v], degB[v] - u[v])) + 1;

    /// <summary>Dispatcher. Brown's variants evaluate the inputs at about Π (points per evaluated
    /// variable) points: with cofactors, max(deg g, deg ā, deg b̄) + 1 per variable, and the result is
    /// verified by two products; gcd only, deg g + 2 per variable, verified by two exact divisions,
    /// which cost about as much as products. Cofactors are interpolated unless that needs more than
    /// <see cref="CofactorPointRatio"/> times the points (a small gcd of large inputs). The product grows
    /// exponentially with the number of variables, while Zippel's sparse interpolation needs about
    /// Σ (deg_{xᵢ} g + 2)·t univariate images for a gcd whose coefficients in x₀ have at most t terms
    /// (t is estimated by the smaller input's term count, an upper bound); Zippel is chosen when Brown
    /// would need more than <see cref="ZippelRatio"/> times as many images.</summary>
    internal static GcdAlgorithm Choose(int[] map, int[] u, int[] degA, int[] degB, int minTerms)
    {
        double withCofactors = 1, gcdOnly = 1, zippel = 0;
        for (int i = 1; i < map.Length; i++)
        {
            int v = map[i];
            withCofactors *= Points(v, u, degA, degB);
            gcdOnly *= u[v] + 2;
            zippel += (u[v] + 2.0) * (i == 1 ? 1 : minTerms);
        }
        var brown = withCofactors <= CofactorPointRatio * gcdOnly ? GcdAlgorithm.BrownCofactors : GcdAlgorithm.BrownGcdOnly;
        double brownImages = Math.Min(withCofactors, gcdOnly);
        if (map.Length >= 3 && brownImages > ZippelRatio * zippel) return GcdAlgorithm.Zippel;
        return brown;
    }

    /// <summary>Threshold of <see cref="Choose"/> between Brown and Zippel.</summary>
    internal static double ZippelRatio = 4.0;

    /// <summary>Zippel's method over Z: contents in x₀ and γ = gcd of the leading coefficients in x₀ by
    /// recursive gcds (fewer variables), images H = γ·g/lc(g) mod primes by <see cref="ZippelModP"/>,
    /// Chinese remaindering until the lift is stable, then g = primitive part of the lift in x₀ (again a
    /// recursive gcd), accepted when it divides both inputs exactly.</summary>
    private static IntGcd ZippelDriver(IntPoly A, IntPoly B, int depth)
    {
        int n = A.Vars;
        var ca = ContentInFirst(A, depth);
        var cb = ContentInFirst(B, depth);
        var c = ComputeCore(ca, cb, depth + 1).G;
        var A1 = ca.IsConstant ? A : DivideOrThrow(A, ca);
        var B1 = cb.IsConstant ? B : DivideOrThrow(B, cb);
        IntPoly g1, a1bar, b1bar;
        if (IsFreeOfFirst(A1) || IsFreeOfFirst(B1))
        {
            g1 = IntPoly.One(n);
            a1bar = A1;
            b1bar = B1;
        }
        else
        {
            // γ must be the full gcd over Z[x₁, …] (integer content included), so that lc(g) divides it
            // and H = γ·g/lc(g) has integer coefficients.
            var lcA = LeadingInFirst(A1);
            var lcB = LeadingInFirst(B1);
            BigInteger ia = lcA.Content(), ib = lcB.Content();
            var gamma = ComputeCore(lcA.DivideExact(ia), lcB.DivideExact(ib), depth + 1).G.Scale(BigInteger.GreatestCommonDivisor(ia, ib));
            (g1, a1bar, b1bar) = ZippelModular(A1, B1, gamma, depth);
        }
        // gcd = c·g1, cofactors (ca/c)·ā₁ and (cb/c)·b̄₁
        var G = Multiply(c, g1);
        var ABar = Multiply(DivideOrThrow(ca, c), a1bar);
        var BBar = Multiply(DivideOrThrow(cb, c), b1bar);
        if (G.Coeffs[0].Sign < 0) { G = G.Scale(-1); ABar = ABar.Scale(-1); BBar = BBar.Scale(-1); }
        return new IntGcd(G, ABar, BBar);
    }

    private static IntGcd ZippelModular(IntPoly A, IntPoly B, IntPoly gamma, int depth)
    {
        int n = A.Vars;
        var acc = new CrtAccumulator(n);
        var dA = A.Degrees();
        var dB = B.Degrees();
        double capBits = 256 + 4 * (gamma.Log2Norm2() + A.Log2Norm2() + B.Log2Norm2() + dA.Sum() + dB.Sum());
        int primeIndex = 0, restarts = 0, failures = 0;
        GcdHooks.PrimesUsed = 0;
        while (true)
        {
            ulong p = NextPrime(ref primeIndex);
            var f = new ModP(p);
            if (f.FromInteger(A.Coeffs[0]) == 0 || f.FromInteger(B.Coeffs[0]) == 0) continue;
            var gp = gamma.Reduce(f);
            if (gp.IsZero) continue;
            var h = new ZippelModP(f, A.Reduce(f), B.Reduce(f), gp, p ^ 0x9E3779B97F4A7C15UL).Interpolate();
            GcdHooks.PrimesUsed++;
            if (h is null || h.IsZero)
            {
                if (++failures > 64) throw new InvalidOperationException("Modular gcd (Zippel): too many primes failed.");
                continue;
            }
            if (acc.PrimeCount > 0)
            {
                int cmp = PolynomialAdd.Compare(h.Exps.AsSpan(0, n), acc.Leading);
                if (cmp > 0)
                {
                    GcdHooks.UnluckyPrimes++;
                    if (++failures > 64) throw new InvalidOperationException("Modular gcd (Zippel): too many primes failed.");
                    if (failures % 8 == 0) { GcdHooks.Restarts++; acc.Reset(); }
                    continue;
                }
                if (cmp < 0) { GcdHooks.Restarts++; acc.Reset(); }
            }
            bool stable = acc.Add(h, f);
            if (stable)
            {
                var lift = acc.Reconstruct();
                var cont = ContentInFirst(lift, depth);
                var g = cont.IsConstant ? lift : DivideOrThrowNull(lift, cont);
                if (g is not null)
                {
                    var ic = g.Content();
                    if (g.Coeffs[0].Sign < 0) ic = -ic;
                    g = g.DivideExact(ic);
                    if (TryDivide(A, g, out var abar) && TryDivide(B, g, out var bbar)) return new IntGcd(g, abar, bbar);
                }
                GcdHooks.FailedVerifications++;
            }
            if (acc.Log2Modulus > capBits)
            {
                if (++restarts > MaxRestarts) throw new InvalidOperationException("Modular gcd (Zippel) did not converge.");
                GcdHooks.Restarts++;
                acc.Reset();
            }
        }
    }

    /// <summary>The coefficients of P as a polynomial in x₀ (exponent of x₀ set to 0), in order.</summary>
    private static List<IntPoly> CoefficientsInFirst(IntPoly P)
    {
        int n = P.Vars;
        var list = new List<IntPoly>();
        int t = 0;
        while (t < P.Count)
        {
            int e0 = P.Exps[t * n], u = t;
            while (u < P.Count && P.Exps[u * n] == e0) u++;
            var c = P.Coeffs.AsSpan(t, u - t).ToArray();
            var e = P.Exps.AsSpan(t * n, (u - t) * n).ToArray();
            for (int k = 0; k < u - t; k++) e[k * n] = 0;
            list.Add(new IntPoly(n, c, e));
            t = u;
        }
        return list;
    }

    private static IntPoly LeadingInFirst(IntPoly P) => CoefficientsInFirst(P)[0];

    private static bool IsFreeOfFirst(IntPoly P)
    {
        for (int t = 0; t < P.Count; t++) if (P.Exps[t * P.Vars] != 0) return false;
        return true;
    }

    /// <summary>Primitive gcd of the coefficients in x₀ (smallest first, stopping at 1).</summary>
    private static IntPoly ContentInFirst(IntPoly P, int depth)
    {
        var cs = CoefficientsInFirst(P);
        if (cs.Count == 1)
        {
            var only = cs[0];
            var ic = only.Content();
            if (only.Coeffs[0].Sign < 0) ic = -ic;
            return only.DivideExact(ic);
        }
        cs.Sort((x, y) => x.Count.CompareTo(y.Count));
        var g = cs[0];
        {
            var ic = g.Content();
            if (g.Coeffs[0].Sign < 0) ic = -ic;
            g = g.DivideExact(ic);
        }
        for (int i = 1; i < cs.Count && !g.IsConstant; i++)
        {
            var ci = cs[i];
            var ic = ci.Content();
            g = ComputeCore(g, ci.DivideExact(ic), depth + 1).G;
        }
        return g;
    }

    private static IntPoly DivideOrThrow(IntPoly a, IntPoly d) =>
        TryDivide(a, d, out var q) ? q : throw new InvalidOperationException("internal error: a computed divisor does not divide");

    private static IntPoly? DivideOrThrowNull(IntPoly a, IntPoly d) => TryDivide(a, d, out var q) ? q : null;

    private static bool SameDegrees(int[] u, int[] d)
    {
        for (int v = 0; v < u.Length; v++) if (u[v] != d[v]) return false;
        return true;
    }

    private static IntGcd Modular(IntPoly A, IntPoly B, GcdAlgorithm algorithm)
    {
        int n = A.Vars;
        bool cofactors = algorithm == GcdAlgorithm.BrownCofactors;
        var lcA = A.Coeffs[0].Numerator;
        var lcB = B.Coeffs[0].Numerator;
        var gamma = BigInteger.GreatestCommonDivisor(lcA, lcB);
        double log2Gamma = BigInteger.Log(gamma, 2);
        double log2A = A.Log2MaxAbs() + log2Gamma, log2B = B.Log2MaxAbs() + log2Gamma;
        // Safety cap on the modulus (a generous multiple of a Mignotte-type bound): past it, the images
        // must have been wrong all along, and the remaindering restarts with other primes.
        var dA = A.Degrees();
        var dB = B.Degrees();
        double capBits = 256 + 4 * (log2Gamma + A.Log2Norm2() + B.Log2Norm2() + dA.Sum() + dB.Sum());

        var accH = new CrtAccumulator(n);
        var accA = cofactors ? new CrtAccumulator(n) : null;
        var accB = cofactors ? new CrtAccumulator(n) : null;
        int primeIndex = 0, restarts = 0, failures = 0;
        GcdHooks.PrimesUsed = 0;
        while (true)
        {
            ulong p = NextPrime(ref primeIndex);
            var f = new ModP(p);
            if (f.FromInteger(A.Coeffs[0]) == 0 || f.FromInteger(B.Coeffs[0]) == 0) continue;
            long t1 = System.Diagnostics.Stopwatch.GetTimestamp();
            var ar = A.Reduce(f); var br = B.Reduce(f);
            long t2 = System.Diagnostics.Stopwatch.GetTimestamp();
            var img = new BrownModP(f, cofactors, p).Gcd(ar, br);
            long t3 = System.Diagnostics.Stopwatch.GetTimestamp();
            GcdHooks.PhaseTicks[1] += t2 - t1;
            GcdHooks.PhaseTicks[2] += t3 - t2;
            GcdHooks.PrimesUsed++;
            if (img is null)
            {
                if (++failures > 64) throw new InvalidOperationException("Modular gcd: too many primes failed.");
                continue;
            }
            if (accH.PrimeCount > 0)
            {
                int cmp = PolynomialAdd.Compare(img.G.Exps.AsSpan(0, n), accH.Leading);
                if (cmp > 0)
                {
                    // Unlucky primes are finitely many; a long run of "too high" images means the
                    // accumulated one was wrong (too low), so start again rather than loop.
                    GcdHooks.UnluckyPrimes++;
                    if (++failures > 64) throw new InvalidOperationException("Modular gcd: too many primes failed.");
                    if (failures % 8 == 0) { GcdHooks.Restarts++; accH.Reset(); accA?.Reset(); accB?.Reset(); }
                    continue;
                }
                if (cmp < 0)
                {
                    GcdHooks.Restarts++;
                    accH.Reset(); accA?.Reset(); accB?.Reset();
                }
            }
            var h = img.G.Scale(f.FromInteger(new Rational(gamma)), f);
            bool stable = accH.Add(h, f);
            if (cofactors)
            {
                stable &= accA!.Add(img.ABar!, f);
                stable &= accB!.Add(img.BBar!, f);
            }

            bool attempt = stable;
            if (!attempt && cofactors)
            {
                // ‖h·ā‖∞ ≤ ‖h‖∞·‖ā‖₁: when both sides are below M/2 the congruence is an identity.
                double m = accH.Log2Modulus - 2, lh = accH.Log2MaxAbs();
                attempt = m > lh + accA!.Log2MaxAbs() + Math.Log2(accA.Count + 1) && m > log2A
                       && m > lh + accB!.Log2MaxAbs() + Math.Log2(accB.Count + 1) && m > log2B;
            }
            GcdHooks.PhaseTicks[3] += System.Diagnostics.Stopwatch.GetTimestamp() - t3;
            if (attempt)
            {
                long t4 = System.Diagnostics.Stopwatch.GetTimestamp();
                var result = cofactors ? VerifyCofactors(A, B, gamma, accH, accA!, accB!) : VerifyByDivision(A, B, accH);
                GcdHooks.PhaseTicks[4] += System.Diagnostics.Stopwatch.GetTimestamp() - t4;
                if (result is { } ok) return ok;
                GcdHooks.FailedVerifications++;
            }
            if (accH.Log2Modulus > capBits)
            {
                if (++restarts > MaxRestarts) throw new InvalidOperationException("Modular gcd did not converge.");
                GcdHooks.Restarts++;
                accH.Reset(); accA?.Reset(); accB?.Reset();
            }
        }
    }

    private static ulong NextPrime(ref int index)
    {
        var forced = GcdHooks.ForcedPrimes;
        if (forced is not null && forced.Count > 0) return forced.Dequeue();
        return Primes.Large(index++);
    }

    /// <summary>G = pp(H*), Ā = Ā*·cont(H*)/γ, B̄ likewise; accepted iff G·Ā = A and G·B̄ = B.</summary>
    private static IntGcd? VerifyCofactors(IntPoly A, IntPoly B, BigInteger gamma, CrtAccumulator accH, CrtAccumulator accA, CrtAccumulator accB)
    {
        var h = accH.Reconstruct();
        if (h.Count == 0) return null;
        var cont = h.Content();
        if (h.Coeffs[0].Sign < 0) cont = -cont;
        var g = h.DivideExact(cont);
        var abar = ScaleDivide(accA.Reconstruct(), cont, gamma);
        var bbar = ScaleDivide(accB.Reconstruct(), cont, gamma);
        if (abar is null || bbar is null) return null;
        if (!IsProduct(g, abar, A) || !IsProduct(g, bbar, B)) return null;
        return new IntGcd(g, abar, bbar);
    }

    private static IntPoly? ScaleDivide(IntPoly p, BigInteger mul, BigInteger div)
    {
        if (p.Count == 0) return null;
        var gcd = BigInteger.GreatestCommonDivisor(mul, div);
        mul /= gcd;
        div /= gcd;
        var c = new Rational[p.Count];
        for (int i = 0; i < c.Length; i++)
        {
            var q = BigInteger.DivRem(p.Coeffs[i].Numerator, div, out var r);
            if (!r.IsZero) return null;
            c[i] = new Rational(q * mul);
        }
        return new IntPoly(p.Vars, c, p.Exps);
    }

    private static bool IsProduct(IntPoly g, IntPoly q, IntPoly target)
    {
        if ((long)g.Count * q.Count < target.Count) return false;
        var prod = Multiply(g, q);
        return target.SameAs(prod.Coeffs, prod.Exps);
    }

    private static IntPoly Multiply(IntPoly a, IntPoly b)
    {
        if (a.IsConstant) return b.Scale(a.Coeffs[0].Numerator);
        if (b.IsConstant) return a.Scale(b.Coeffs[0].Numerator);
        SplitMultiply.Multiply(a.Coeffs, a.Exps, b.Coeffs, b.Exps, a.Vars, out var c, out var e);
        return new IntPoly(a.Vars, c, e);
    }

    /// <summary>G = pp(H*), accepted iff it divides A and B exactly; the quotients are the cofactors.</summary>
    private static IntGcd? VerifyByDivision(IntPoly A, IntPoly B, CrtAccumulator accH)
    {
        var h = accH.Reconstruct();
        if (h.Count == 0) return null;
        var cont = h.Content();
        if (h.Coeffs[0].Sign < 0) cont = -cont;
        var g = h.DivideExact(cont);
        if (!TryDivide(A, g, out var abar) || !TryDivide(B, g, out var bbar)) return null;
        return new IntGcd(g, abar, bbar);
    }

    /// <summary>Exact division of integer polynomials (the quotient of primitive polynomials is integral).</summary>
    private static bool TryDivide(IntPoly a, IntPoly d, out IntPoly q)
    {
        q = a;
        if (d.IsConstant)
        {
            var c = d.Coeffs[0].Numerator;
            if (c.IsOne) return true;
            foreach (var x in a.Coeffs) if (!BigInteger.Remainder(x.Numerator, c).IsZero) return false;
            q = a.DivideExact(c);
            return true;
        }
        // Past word-size coefficients the shared kernel computes with big integers; the multi-modular
        // division is much faster when its dense box is small.
        if ((a.Log2MaxAbs() > 62 || d.Log2MaxAbs() > 62) && ModularDivision.Applies(a))
            return ModularDivision.TryDivide(a, d, out q);
        if (!PolynomialDivide.TryDivide(a.Coeffs, a.Exps, d.Coeffs, d.Exps, a.Vars, out var qc, out var qe)) return false;
        foreach (var x in qc) if (!x.IsInteger) return false;
        // Laurent division may shift exponents; an exact polynomial quotient has none negative.
        foreach (var x in qe) if (x < 0) return false;
        q = new IntPoly(a.Vars, qc, qe);
        return true;
    }

    private static IntPoly Unpermute(IntPoly p, int[] map, int n, bool sort)
    {
        int m = map.Length, terms = p.Count;
        var e = new int[terms * n];
        for (int t = 0; t < terms; t++)
            for (int i = 0; i < m; i++) e[t * n + map[i]] = p.Exps[t * m + i];
        if (!sort) return new IntPoly(n, p.Coeffs, e);
        IntPoly.SortTerms(n, p.Coeffs, e, out var sc, out var se);
        return new IntPoly(n, sc, se);
    }

    /// <summary>Upper bounds uᵢ ≥ deg_{xᵢ} gcd(A, B) from univariate images mod a prime at a random
    /// point (rigorous whenever the images keep the degrees of A and B, which is checked; otherwise the
    /// trivial bound min(deg A, deg B) is used after a few attempts).</summary>
    internal static int[] DegreeBounds(IntPoly A, IntPoly B, int[] degA, int[] degB, GcdRandom rng)
    {
        int n = A.Vars;
        var u = new int[n];
        var done = new bool[n];
        int remaining = 0;
        for (int v = 0; v < n; v++)
        {
            if (degA[v] == 0 || degB[v] == 0) { u[v] = 0; done[v] = true; }
            else remaining++;
        }
        for (int attempt = 0; attempt < 3 && remaining > 0; attempt++)
        {
            var f = new ModP(Primes.Large(attempt));
            var point = new ulong[n];
            for (int v = 0; v < n; v++) point[v] = rng.NextResidue(f.P);
            var ia = UnivariateImages(A, degA, point, done, f);
            var ib = UnivariateImages(B, degB, point, done, f);
            for (int v = 0; v < n; v++)
            {
                if (done[v]) continue;
                if (ia[v]![degA[v]] == 0 || ib[v]![degB[v]] == 0) continue; // leading coefficient vanished
                u[v] = DenseModP.Degree(DenseModP.Gcd(ia[v], ib[v], f));
                done[v] = true;
                remaining--;
            }
        }
        for (int v = 0; v < n; v++) if (!done[v]) u[v] = Math.Min(degA[v], degB[v]);
        return u;
    }

    /// <summary>For each variable v not done: the image of P in Z/pZ[x_v] with every other variable set to its point value.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static ulong[]?[] UnivariateImages(IntPoly P, int[] deg, ulong[] point, bool[] done, in ModP f)
    {
        int n = P.Vars;
        var pw = new ulong[n][];
        var ipw = new ulong[n][];
        for (int v = 0; v < n; v++)
        {
            pw[v] = new ulong[deg[v] + 1];
            ipw[v] = new ulong[deg[v] + 1];
            pw[v][0] = ipw[v][0] = 1;
            ulong inv = f.Inv(point[v]);
            for (int e = 1; e <= deg[v]; e++) { pw[v][e] = f.Mul(pw[v][e - 1], point[v]); ipw[v][e] = f.Mul(ipw[v][e - 1], inv); }
        }
        var img = new ulong[]?[n];
        for (int v = 0; v < n; v++) if (!done[v]) img[v] = new ulong[deg[v] + 1];
        for (int t = 0; t < P.Count; t++)
        {
            ulong w = f.FromInteger(P.Coeffs[t]);
            if (w == 0) continue;
            for (int v = 0; v < n; v++)
            {
                int e = P.Exps[t * n + v];
                if (e != 0) w = f.Mul(w, pw[v][e]);
            }
            for (int v = 0; v < n; v++)
            {
                if (done[v]) continue;
                int e = P.Exps[t * n + v];
                var a = img[v]!;
                a[e] = f.Add(a[e], e == 0 ? w : f.Mul(w, ipw[v][e]));
            }
        }
        for (int v = 0; v < n; v++) if (img[v] is { } a) img[v] = a; // kept untrimmed: index deg[v] is the leading coefficient
        return img;
    }
}
