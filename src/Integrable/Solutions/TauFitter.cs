using Integrable.Algebra;
using Integrable.Analyses;
using Integrable.Guessing;
using Integrable.LinearAlgebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Recursions;
using Integrable.Series;

namespace Integrable.Solutions;

/// <summary>Finds exact tau-function solutions of a recursion from its boundary or initial data.</summary>
/// <remarks>
/// <para><b>Boundary-value route</b> (<see cref="FitBoundary"/>): the series solution is computed
/// (<see cref="SeriesSolver.SolveBoundaryValue"/>); for each balanced ansatz x_n = C·τ_{n+a}τ_{n+b}/(τ_{n+c}τ_{n+d}) of
/// the family and τ_n = c₀ + c₁λ^n, the limit fixes C = x_∞ (λ^n → 0 g-adically when λ = O(g)), the vanishing boundary
/// value fixes which factor vanishes there (τ_n ∝ 1 − λ^{n−m}), and the first free term x_{b+1} fixes λ as a power series
/// in g (Newton). The candidate must reproduce the series of every reported index. Then x_∞ and g are guessed as rational
/// functions of λ (Hermite–Padé), which gives the minimal polynomial of λ over Q(g), and the closed form is verified
/// symbolically: substituting g = G(λ), x_∞ = X(λ) and λ^n as an independent symbol, left − right of the recursion is
/// identically zero, for every n at once. The bilinear (Hirota-type) equation τ_{n+4}τ_n, τ_{n+3}τ_{n+1}, τ_{n+2}² of the
/// fitted τ is found by solving for its coefficients over Q(λ) and verified by substitution.</para>
/// <para><b>Initial-value route</b> (<see cref="FitInitial"/>): the orbit is computed exactly, Berlekamp–Massey guesses
/// a linear recurrence for τ_n = x_n, and the guess is proved: the recursion's residual at step n+1, with every term
/// written through the linear recurrence in d free symbols, equals (a multiple of) the residual at step n, and the first
/// residual vanishes, so by induction the linearly recurrent sequence solves the recursion with the given initial values.
/// With rational characteristic roots the closed form Σ p_i(n) r_i^n is solved for exactly.</para>
/// </remarks>
public static class TauFitter
{
    private const string LambdaName = "lambda";
    private const string PowerName = "LAMBDAn";

    /// <summary>Fits a tau function to the boundary-value problem of an order-2 recursion with a weight: x_b = value
    /// and x_n → x_∞ (see the type remarks).</summary>
    /// <param name="recurrence">An autonomous recursion of order 2.</param>
    /// <param name="parameter">The weight.</param>
    /// <param name="boundaryIndex">The index b of the given value.</param>
    /// <param name="boundaryValue">The value x_b.</param>
    /// <param name="options">Series order (default 20), count (at least 10 indices are compared), other parameter values.</param>
    /// <param name="family">The ansätze to try (default: the balanced ones of <see cref="TauAnsatz.SmallFamily"/>).</param>
    /// <param name="cancellation">Cancels between candidates.</param>
    /// <param name="progress">Receives one report per candidate.</param>
    /// <returns>The report; <see cref="TauReport.Verified"/> is false (with notes) when no candidate passed.</returns>
    /// <exception cref="ArgumentException">Not of order 2, bad parameter.</exception>
    /// <exception cref="SeriesConvergenceException">The series solution itself cannot be computed.</exception>
    public static TauReport FitBoundary(Recurrence recurrence, string parameter, long boundaryIndex, Rational boundaryValue,
        SeriesOptions? options = null, IReadOnlyList<TauAnsatz>? family = null, IProgress<AnalysisProgress>? progress = null,
        CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(recurrence);
        if (recurrence.Order != 2) throw new ArgumentException($"the boundary fitter handles recursions of order 2, this one has order {recurrence.Order}", nameof(recurrence));
        options ??= new SeriesOptions();
        options = options with { Count = Math.Max(options.Count, 10) };
        var sol = SeriesSolver.SolveBoundaryValue(recurrence, parameter, boundaryIndex, [boundaryValue], options, cancellation: cancellation);
        return FitSeries(sol, boundaryValue, options.ParameterValues, family, progress, cancellation);
    }

    /// <summary>Fits a tau function to an already computed boundary-value series solution (the series-data route of
    /// <see cref="FitBoundary"/>; the boundary is the index just before <see cref="SeriesSolution.FirstIndex"/>).</summary>
    /// <param name="solution">A boundary-value series solution of an order-2 recursion.</param>
    /// <param name="boundaryValue">The value at index FirstIndex − 1.</param>
    /// <param name="parameterValues">Values of the parameters other than the weight, as used for the series.</param>
    /// <param name="family">The ansätze to try (default: the balanced ones of <see cref="TauAnsatz.SmallFamily"/>).</param>
    /// <param name="cancellation">Cancels between candidates.</param>
    /// <param name="progress">Receives one report per candidate.</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentException">Not a boundary-value solution of an order-2 recursion.</exception>
    public static TauReport FitSeries(SeriesSolution solution, Rational boundaryValue, IReadOnlyDictionary<string, Rational>? parameterValues = null,
        IReadOnlyList<TauAnsatz>? family = null, IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(solution);
        if (solution.Kind != SeriesProblemKind.BoundaryValue || solution.LimitValue is null || solution.Recurrence.Order != 2)
            throw new ArgumentException("give a boundary-value series solution of an order-2 recursion", nameof(solution));
        var sol = solution;
        var recurrence = sol.Recurrence;
        string parameter = sol.Parameter;
        long boundaryIndex = sol.FirstIndex - 1;
        var options = new SeriesOptions { Order = sol.Order, Count = sol.Terms.Count, ParameterValues = parameterValues };
        var notes = new List<string>();
        string limitName = recurrence.Unknown + "_∞";
        string seriesSummary = $"direct series solution to O({parameter}^{options.Order + 1}) for {recurrence.TermName(sol.FirstIndex)} … {recurrence.TermName(sol.FirstIndex + sol.Terms.Count - 1)} ({sol.Verification})";
        if (!boundaryValue.IsZero)
        {
            notes.Add("only a vanishing boundary value is fitted (by a vanishing factor of τ); this one is " + boundaryValue);
            return NotFound(recurrence, notes, seriesSummary);
        }
        var candidates = (family ?? TauAnsatz.SmallFamily()).Where(a => a.HasConstant && a.Denominator.Length > 0).ToList();
        int step = 0;
        foreach (var ansatz in candidates)
        {
            foreach (int a0 in ansatz.Numerator.Distinct())
            {
                cancellation.ThrowIfCancellationRequested();
                progress?.Report(new AnalysisProgress("tau", ++step, candidates.Count * 2, ansatz.ToText(recurrence.Unknown)));
                var report = TryCandidate(recurrence, parameter, boundaryIndex, options, sol, ansatz, a0, limitName, seriesSummary, notes);
                if (report is not null) return report;
            }
        }
        return NotFound(recurrence, notes, seriesSummary);
    }

    private static TauReport NotFound(Recurrence recurrence, List<string> notes, string? seriesCheck) =>
        new(recurrence.Text, "none found", "none found", "none found", [], false,
            "no candidate of the ansatz family matched the data; see the notes", seriesCheck, notes, BudgetLimit.None);

    private static TauReport? TryCandidate(Recurrence rec, string parameter, long b, SeriesOptions options, SeriesSolution sol,
        TauAnsatz ansatz, int a0, string limitName, string seriesSummary, List<string> notes)
    {
        string label = ansatz.ToText(rec.Unknown, rec.Index, limitName) + $" with τ vanishing at shift {a0}";
        if (ansatz.Numerator.Any(a => a < a0) || ansatz.Denominator.Any(c => c <= a0))
        {
            notes.Add($"{label}: rejected, a factor would vanish or blow up at an index past the boundary");
            return null;
        }
        int prec = options.Order + 1;
        var ring = sol.LimitValue!.Ring;
        var limit = sol.LimitValue.Truncate(prec);
        // x_{b+1}/x_∞ = Π u(1 + a − a0) / Π u(1 + c − a0), u(m) = 1 − λ^m
        int[] num = ansatz.Numerator.Select(a => 1 + a - a0).ToArray(), den = ansatz.Denominator.Select(c => 1 + c - a0).ToArray();
        int d1 = -num.Count(m => m == 1) + den.Count(m => m == 1);
        if (d1 == 0)
        {
            notes.Add($"{label}: rejected, x_{{b+1}} does not determine λ at first order");
            return null;
        }
        var target = PowerSeries<Rational>.Divide(sol.Terms[0], limit, prec);
        if (!target.ConstantTerm.IsOne)
        {
            notes.Add($"{label}: rejected, x_{{b+1}}/x_∞ is not 1 at {parameter} = 0");
            return null;
        }
        PowerSeries<Rational> Ratio(PowerSeries<Rational> y, int shiftFromFirst, int p)
        {
            var top = ring.One.WithPrecision(p);
            var bottom = ring.One.WithPrecision(p);
            foreach (var m in num) top = PowerSeries<Rational>.MultiplyCore(top, ring.One - y.Pow(m + shiftFromFirst), p);
            foreach (var m in den) bottom = PowerSeries<Rational>.MultiplyCore(bottom, ring.One - y.Pow(m + shiftFromFirst), p);
            return PowerSeries<Rational>.Divide(top, bottom, p);
        }
        PowerSeries<Rational> lambda;
        try
        {
            var inv = Rational.One / d1;
            lambda = SeriesEquations.SolveNewton(ring, y => y - (Ratio(y, 0, y.Precision) - target.Truncate(y.Precision)) * inv, prec,
                initial: ring.Zero.WithPrecision(1));
        }
        catch (Exception e) when (e is ArgumentException or InvalidOperationException or ArithmeticException)
        {
            notes.Add($"{label}: rejected, λ could not be solved for ({e.Message})");
            return null;
        }
        for (int i = 0; i < sol.Terms.Count; i++)
        {
            var fitted = (limit * Ratio(lambda, i, prec)).Truncate(prec);
            if (!(fitted - sol.Terms[i]).Truncate(prec).IsZero)
            {
                notes.Add($"{label}: rejected, it disagrees with the series of {rec.TermName(sol.FirstIndex + i)} at order {(fitted - sol.Terms[i]).Truncate(prec).Valuation}");
                return null;
            }
        }
        string seriesCheck = $"the closed form agrees with the {seriesSummary}: all {sol.Terms.Count} indices, all coefficients exactly";
        // algebraic relations: x_∞ and g as rational functions of λ
        var relations = new List<string>();
        var limitRational = RationalIn(lambda, limit, ring, 4);
        var weightRational = RationalIn(lambda, ring.X.WithPrecision(prec), ring, 5);
        var field = new RationalFunctionField(LambdaName, PowerName);
        var lam = field.Variable(LambdaName);
        relations.Add($"{LambdaName} = {ShowSeries(lambda, parameter, 6)} + O({parameter}^7)");
        var minL = HermitePade.AlgebraicEquation(limit, 4, 4);
        if (minL.IsFound) relations.Add($"minimal polynomial of {limitName} over Q({parameter}): {ShowRelation(minL.Value, limitName, parameter)} = 0");
        if (limitRational is null || weightRational is null)
        {
            notes.Add($"{label}: matches the series, but {limitName} or {parameter} was not found rational in λ, so no symbolic check was possible");
            return new TauReport(rec.Text, ansatz.ToText(rec.Unknown, rec.Index, limitName), "not derived", $"τ_n = 1 - {LambdaName}^(n - {b + a0})",
                relations, false, "series agreement only (exact to the order computed); no symbolic proof", seriesCheck, notes, BudgetLimit.None);
        }
        var lr = ToFunction(field, limitRational.Value, lam);
        var gr = ToFunction(field, weightRational.Value, lam);
        relations.Insert(0, $"{limitName} = {lr}");
        relations.Insert(1, $"{parameter} = {gr}");
        relations.Insert(2, $"minimal polynomial of {LambdaName} over Q({parameter}): {parameter} ({gr.Denominator}) - ({gr.Numerator}) = 0 (irreducible: linear in {parameter} with coprime coefficients)");
        // symbolic verification: λ^n independent
        var residual = EquationResidual.Compile(rec);
        var xsym = field.Variable(PowerName);
        RationalFunction U(int shift) => field.One - Pow(field, lam, shift - (int)b - a0) * xsym; // u at index n + shift
        RationalFunction Term(int shift)
        {
            var v = lr;
            foreach (var a in ansatz.Numerator) v *= U(shift + a);
            foreach (var c in ansatz.Denominator) v /= U(shift + c);
            return v;
        }
        var inputs = new RationalFunction[residual.Program.InputCount];
        for (int i = 0; i <= rec.Order; i++) inputs[i] = Term(rec.LowestShift + i);
        for (int p = 0; p < rec.Parameters.Length; p++)
        {
            string name = rec.Parameters[p];
            inputs[rec.Order + 1 + p] = name == parameter ? gr
                : field.Constant(options.ParameterValues![name]);
        }
        var value = residual.Program.Evaluate(field, inputs);
        if (!value.IsZero)
        {
            notes.Add($"{label}: matches the series but the symbolic check fails (residual {value})");
            return null;
        }
        // boundary: at n = b the factor u(b + a0) = 1 − λ^0 = 0
        var atBoundary = Term(0).Numerator.Substitute(PowerName, field.PolynomialRing.Monomial(Rational.One, [(int)b, 0]));
        bool boundaryOk = atBoundary.IsZero;
        var bilinear = HirotaForTwoExponentials(field, lam);
        string tau = b + a0 == 0 ? $"τ_n = 1 - {LambdaName}^n" : $"τ_n = 1 - {LambdaName}^(n - {b + a0})";
        return new TauReport(rec.Text, ansatz.ToText(rec.Unknown, rec.Index, limitName), bilinear, tau, relations, boundaryOk,
            $"exact: with {parameter} = G(λ), {limitName} = X(λ) and λ^n an independent symbol, left − right of the recursion is identically 0 in Q(λ, λ^n) (so for every n); " +
            $"{rec.TermName(b)} = 0 by the factor 1 − λ^0; λ = O({parameter}) so {rec.Unknown}_n → {limitName} {parameter}-adically; the bilinear equation was checked by substituting τ",
            seriesCheck, notes, BudgetLimit.None);
    }

    private static (Rational[] Num, Rational[] Den)? RationalIn(PowerSeries<Rational> lambda, PowerSeries<Rational> f, PowerSeriesRing<Rational> ring, int maxDegree)
    {
        int prec = Math.Min(lambda.Precision, f.Precision);
        for (int d = 1; d <= maxDegree; d++)
        {
            if (2 * (d + 1) + 4 > prec) break;
            var list = new List<PowerSeries<Rational>>();
            var pw = ring.One.WithPrecision(prec);
            var powers = new List<PowerSeries<Rational>>();
            for (int i = 0; i <= d; i++) { powers.Add(pw); pw = (pw * lambda).Truncate(prec); }
            foreach (var p in powers) list.Add((f * p).Truncate(prec));
            foreach (var p in powers) list.Add(p);
            var g = HermitePade.Find(list, Enumerable.Repeat(0, list.Count).ToArray());
            if (!g.IsFound || g.Value.NullspaceDimension > 1) continue;
            var polys = g.Value.Polynomials;
            var den = new Rational[d + 1];
            var num = new Rational[d + 1];
            for (int i = 0; i <= d; i++) { den[i] = polys[i][0]; num[i] = -polys[d + 1 + i][0]; }
            if (den.All(c => c.IsZero)) continue;
            return (num, den);
        }
        return null;
    }

    private static RationalFunction ToFunction(RationalFunctionField field, (Rational[] Num, Rational[] Den) r, RationalFunction lam)
    {
        RationalFunction Poly(Rational[] c)
        {
            var v = field.Zero;
            for (int i = c.Length - 1; i >= 0; i--) v = v * lam + field.Constant(c[i]);
            return v;
        }
        return Poly(r.Num) / Poly(r.Den);
    }

    private static RationalFunction Pow(RationalFunctionField field, RationalFunction v, int e)
    {
        var r = field.One;
        for (int i = 0; i < Math.Abs(e); i++) r *= v;
        return e >= 0 ? r : field.One / r;
    }

    /// <summary>The Hirota equation β₀τ_{n+4}τ_n + β₁τ_{n+3}τ_{n+1} + β₂τ_{n+2}² = 0 satisfied by every τ_n = c₀ + c₁λ^n,
    /// with β solved over Q(λ) and checked by substitution.</summary>
    private static string HirotaForTwoExponentials(RationalFunctionField field, RationalFunction lam)
    {
        // τ_{n+s} = c0 + c1 λ^s X; the products have X-degrees 0, 1, 2; degree 0 and 2 give β0 + β1 + β2 = 0,
        // degree 1 gives β0 (1 + λ^4) + β1 (λ + λ^3) + β2 (2 λ^2) = 0. Nullspace of the 2×3 system by cross product.
        var one = field.One;
        RationalFunction[] r1 = [one, one, one];
        RationalFunction[] r2 = [one + Pow(field, lam, 4), lam + Pow(field, lam, 3), field.Constant(2) * lam * lam];
        var beta = new[] { r1[1] * r2[2] - r1[2] * r2[1], r1[2] * r2[0] - r1[0] * r2[2], r1[0] * r2[1] - r1[1] * r2[0] };
        // clear denominators and common factors
        var common = beta[0].Numerator;
        foreach (var bb in beta) common = PolynomialGcd.Gcd(common, bb.Numerator);
        for (int i = 0; i < 3; i++) beta[i] = beta[i] / field.FromPolynomial(common);
        // check by substitution with symbolic c0, c1, X
        var check = new RationalFunctionField(LambdaName, PowerName, "c0", "c1");
        var l = check.Embed(lam);
        var x = check.Variable(PowerName);
        RationalFunction T(int s) => check.Variable("c0") + check.Variable("c1") * Pow(check, l, s) * x;
        var sum = check.Embed(beta[0]) * T(4) * T(0) + check.Embed(beta[1]) * T(3) * T(1) + check.Embed(beta[2]) * T(2) * T(2);
        if (!sum.IsZero) throw new InvalidOperationException("internal error: the Hirota equation of the two-exponential tau does not check");
        return $"({beta[0]}) τ_{{n+4}} τ_n + ({beta[1]}) τ_{{n+3}} τ_{{n+1}} + ({beta[2]}) τ_{{n+2}}^2 = 0";
    }

    private static string ShowSeries(PowerSeries<Rational> s, string v, int terms)
    {
        var parts = new List<string>();
        for (int i = 0; i < Math.Min(terms + 1, s.Precision); i++)
        {
            var c = s[i];
            if (c.IsZero) continue;
            string mono = i == 0 ? "" : i == 1 ? v : $"{v}^{i}";
            parts.Add(i == 0 ? c.ToString() : c.IsOne ? mono : $"{c} {mono}");
        }
        return parts.Count == 0 ? "0" : string.Join(" + ", parts).Replace("+ -", "- ", StringComparison.Ordinal);
    }

    private static string ShowRelation(PolynomialRelation<Rational> rel, string y, string x)
    {
        var parts = new List<string>();
        for (int i = 0; i < rel.Polynomials.Count; i++)
        {
            var p = rel.Polynomials[i];
            var c = new List<string>();
            for (int d = 0; d <= p.Degree; d++)
            {
                var a = p[d];
                if (a.IsZero) continue;
                c.Add(d == 0 ? a.ToString() : $"{(a.IsOne ? "" : a == -Rational.One ? "-" : a + " ")}{(d == 1 ? x : $"{x}^{d}")}");
            }
            if (c.Count == 0) continue;
            string coef = c.Count == 1 ? c[0] : "(" + string.Join(" + ", c) + ")";
            string power = i == 1 ? y : $"{y}^{i}";
            parts.Add(i == 0 ? coef : coef == "1" ? power : coef == "-1" ? "-" + power : $"{coef} {power}");
        }
        return string.Join(" + ", parts).Replace("+ -", "- ", StringComparison.Ordinal);
    }

    /// <summary>Fits a tau function to an initial-value problem over Q: x_n = τ_n with τ linearly recurrent
    /// (Berlekamp–Massey on the exact orbit), proved by induction (see the type remarks).</summary>
    /// <param name="recurrence">A recursion without parameters (or with all parameter values given).</param>
    /// <param name="initial">The k initial values x_0 … x_{k−1}.</param>
    /// <param name="terms">How many terms of the orbit to compute for the guess (default 40).</param>
    /// <param name="parameterValues">Values of the parameters, if any.</param>
    /// <param name="cancellation">Cancels the orbit computation.</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentException">Wrong number of initial values or missing parameter values.</exception>
    /// <exception cref="SingularStepException">The orbit hits a division by zero.</exception>
    public static TauReport FitInitial(Recurrence recurrence, IReadOnlyList<Rational> initial, int terms = 40,
        IReadOnlyDictionary<string, Rational>? parameterValues = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(recurrence);
        ArgumentNullException.ThrowIfNull(initial);
        ArgumentOutOfRangeException.ThrowIfLessThan(terms, 8);
        int k = recurrence.Order;
        if (initial.Count != k) throw new ArgumentException($"{recurrence.Unknown} has order {k}: give {k} initial values, not {initial.Count}", nameof(initial));
        var pars = recurrence.Parameters.Select(p => parameterValues is not null && parameterValues.TryGetValue(p, out var v) ? v
            : throw new ArgumentException($"the parameter '{p}' needs a value", nameof(parameterValues))).ToArray();
        var notes = new List<string>();
        var form = BilinearForms.TrySubstitute(recurrence, TauAnsatz.Identity);
        string substitution = TauAnsatz.Identity.ToText(recurrence.Unknown, recurrence.Index);
        string bilinear = form is not null ? form.Text + (form.IsHomogeneous ? "" : " (bilinear with inhomogeneous terms)")
            : "the equation is not bilinear in x itself";
        var orbit = recurrence.Iterate(RationalField.Instance, initial, terms - k, pars, 0, cancellation);
        var guess = BerlekampMassey.Find(orbit.ToArray().AsSpan());
        if (!guess.IsFound)
        {
            notes.Add($"no linear recurrence for τ_n = {recurrence.Unknown}_n: {guess.Explanation}");
            return new TauReport(recurrence.Text, substitution, bilinear, $"τ_n = {recurrence.Unknown}_n (no exponential-polynomial closed form found)",
                [], form is not null,
                form is not null ? form.Verification + "; the equation is its own tau form (no closed form for τ)" : "nothing verified",
                null, notes, BudgetLimit.None);
        }
        var lin = guess.Value;
        int d = lin.Order;
        var c = lin.Coefficients.ToArray();
        // Induction proof: d free symbols, the sequence extended by the linear recurrence.
        var names = Enumerable.Range(0, d).Select(i => $"y{i}").ToArray();
        var field = new RationalFunctionField(names);
        var seq = new List<RationalFunction>();
        for (int i = 0; i < d; i++) seq.Add(field.Variable(i));
        while (seq.Count < k + 2 + d)
        {
            var v = field.Zero;
            for (int i = 1; i <= d; i++) v += field.Constant(c[i - 1]) * seq[^i];
            seq.Add(v);
        }
        var residual = EquationResidual.Compile(recurrence);
        var parField = pars.Select(field.Constant).ToArray();
        RationalFunction E(int j) => residual.Evaluate(field, j, i => seq[(int)i], parField);
        if (!recurrence.IsAutonomous)
        {
            notes.Add("the induction proof needs an autonomous recursion");
            return new TauReport(recurrence.Text, substitution, bilinear, "τ_n linearly recurrent (unproved)", [lin.ToString()], false,
                $"guess only: {guess.Explanation}", null, notes, BudgetLimit.None);
        }
        var e0 = E(0);
        var e1 = E(1);
        bool step = e1 == e0 || (!e0.IsZero && (e1 / e0).IsPolynomial);
        // the linearly recurrent sequence must agree with the orbit on the first k + d + 1 terms
        var lrTerms = lin.Terms(Math.Min(orbit.Count, k + d + 1));
        bool start = lrTerms.Select((v, i) => v == orbit[i]).All(x => x);
        string recurrenceText = $"τ_{{n+{d}}} = " + LinearText(c, d);
        var relations = new List<string> { recurrenceText };
        // characteristic polynomial t^d − c1 t^{d−1} − … − c_d
        var chi = new Rational[d + 1];
        chi[d] = Rational.One;
        for (int i = 1; i <= d; i++) chi[d - i] = -c[i - 1];
        var chiPoly = Univariate.UnivariatePolynomial.FromCoefficients(chi);
        relations.Add($"characteristic polynomial: {chiPoly.ToString().Replace("x", LambdaName, StringComparison.Ordinal)}");
        var roots = chiPoly.RationalRoots();
        string tau;
        bool closed = false;
        if (roots.Sum(r => r.Multiplicity) == d && roots.All(r => !r.Root.IsZero))
        {
            // solve Σ a_{ie} n^e r_i^n = x_n for n = 0..d−1
            var basis = new List<(Rational Root, int Degree)>();
            foreach (var (root, mult) in roots) for (int e = 0; e < mult; e++) basis.Add((root, e));
            var m = RationalMatrix.Create(d, d, (n, j) => basis[j].Root.Pow(n) * new Rational(n).Pow(basis[j].Degree));
            var rhs = Enumerable.Range(0, d).Select(n => orbit[n]).ToArray();
            var solved = m.Solve(rhs);
            if (solved.IsConsistent)
            {
                var a = solved.Particular.ToArray();
                // verify the closed form on the first terms (both satisfy the linear recurrence, so all terms agree)
                bool ok = true;
                for (int n = 0; n < Math.Min(orbit.Count, d + 4); n++)
                {
                    var v = Rational.Zero;
                    for (int j = 0; j < d; j++) v += a[j] * basis[j].Root.Pow(n) * new Rational(n).Pow(basis[j].Degree);
                    if (v != orbit[n]) ok = false;
                }
                if (ok)
                {
                    closed = true;
                    tau = "τ_n = " + ClosedFormText(basis, a);
                }
                else tau = $"τ_n linearly recurrent ({recurrenceText})";
            }
            else tau = $"τ_n linearly recurrent ({recurrenceText})";
        }
        else
        {
            tau = $"τ_n = Σ_i a_i {LambdaName}_i^n over the roots {LambdaName}_i of the characteristic polynomial (irrational roots)";
        }
        bool verified = step && start;
        string verification = verified
            ? $"exact induction: with {recurrence.Unknown}_n … written through the linear recurrence in {d} free symbols, the residual at n+1 " +
              (e1 == e0 ? "equals" : "is a polynomial multiple of") + $" the residual at n; the linear recurrence reproduces the orbit's first {k + d + 1} terms, which satisfy the recursion" +
              (closed ? "; the closed form satisfies the linear recurrence and matches the first terms" : "")
            : $"guess only ({guess.Explanation}); the induction step {(step ? "holds" : "fails")}, the start {(start ? "holds" : "fails")}";
        return new TauReport(recurrence.Text, substitution, bilinear, tau, relations, verified, verification, null, notes, BudgetLimit.None);
    }

    private static string LinearText(Rational[] c, int d)
    {
        var sb = new System.Text.StringBuilder();
        for (int i = 1; i <= d; i++)
        {
            var a = c[i - 1];
            if (a.IsZero) continue;
            bool negative = a < Rational.Zero;
            var abs = negative ? -a : a;
            if (sb.Length > 0) sb.Append(negative ? " - " : " + ");
            else if (negative) sb.Append('-');
            if (!abs.IsOne) sb.Append(abs).Append(' ');
            sb.Append(TauNames.Term(d - i));
        }
        return sb.Length == 0 ? "0" : sb.ToString();
    }

    private static string ClosedFormText(List<(Rational Root, int Degree)> basis, Rational[] a)
    {
        // group by root: polynomial in n times r^n
        var parts = new List<string>();
        foreach (var group in basis.Select((b, j) => (b.Root, b.Degree, Coef: a[j])).GroupBy(t => t.Root))
        {
            var poly = group.Where(t => !t.Coef.IsZero).OrderByDescending(t => t.Degree)
                .Select(t => t.Degree == 0 ? t.Coef.ToString() : $"{(t.Coef.IsOne ? "" : t.Coef == -Rational.One ? "-" : t.Coef + " ")}{(t.Degree == 1 ? "n" : $"n^{t.Degree}")}").ToList();
            if (poly.Count == 0) continue;
            string p = string.Join(" + ", poly).Replace("+ -", "- ", StringComparison.Ordinal);
            if (group.Key.IsOne) parts.Add(p);
            else parts.Add($"({p}) ({group.Key.ToString()})^n");
        }
        return parts.Count == 0 ? "0" : string.Join(" + ", parts);
    }
}
