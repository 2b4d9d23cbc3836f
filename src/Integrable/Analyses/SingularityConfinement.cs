using System.Collections.Immutable;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Recursions;
using Integrable.Series;

namespace Integrable.Analyses;

/// <summary>The singularity-confinement test: start an orbit with free initial data and one value at a
/// singular value plus ε, iterate Laurent series in ε with exact rational coefficients, read off the
/// singularity pattern, and decide whether the orbit becomes regular again with its dependence on the
/// free data restored.</summary>
/// <remarks>
/// <para>For a recurrence of order k the initial values x_0 … x_{k−2} are random rationals (the free
/// data u) and x_{k−1} = s + ε. Each later term is a truncated Laurent series; its symbol is ∞^m
/// (valuation −m), s'^m when it tends to a singular value s' with x − s' ~ ε^m, or f (regular). The
/// singularity is confined when, after the first infinite term, k consecutive regular terms appear
/// within the step limit and their ε → 0 limits change when u is drawn again (the initial data are not
/// lost). Non-autonomous equations are handled with the index as it is at each step. Series precision
/// is doubled when a cancellation leaves a term without a known leading coefficient.</para>
/// <para>Singular values are given, or detected: 0, and the rational roots of the denominator of the
/// rule as a function of each of its arguments (others random) that do not depend on the random choice.</para>
/// <para>Reference: B. Grammaticos, A. Ramani, V. Papageorgiou, "Do integrable mappings have the
/// Painlevé property?", Phys. Rev. Lett. 67 (1991) 1825.</para>
/// </remarks>
/// <example><code>
/// var r = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} + x_{n-1} = a/x_n + 1/x_n^2"));
/// Console.WriteLine(r.Singularities[0].PatternText);   // {0, ∞^2, 0}
/// </code></example>
public static class SingularityConfinement
{
    private const int InitialPrecision = 8;

    /// <summary>Runs the test on a scalar recurrence.</summary>
    /// <param name="recurrence">The recurrence.</param>
    /// <param name="options">Singular values, parameters, steps, budget.</param>
    /// <param name="progress">Receives one report per singular value.</param>
    /// <param name="cancellation">Cancels the test.</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="recurrence"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The step limit is below 1.</exception>
    /// <exception cref="ArgumentException">A parameter value names no parameter.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static ConfinementReport Test(Recurrence recurrence, ConfinementOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(recurrence);
        options ??= ConfinementOptions.Default;
        ArgumentOutOfRangeException.ThrowIfLessThan(options.Steps, 1, nameof(options));
        var map = new RecursionMap(recurrence, options.Start);
        var fixedValues = map.CheckParameters(options.ParameterValues, nameof(options));
        var rng = new Random(options.RandomSeed);
        var parameters = map.Parameters.Select(p => fixedValues.TryGetValue(p, out var v) ? v : RandomRational(rng)).ToArray();
        var clock = new BudgetClock(options.Budget, cancellation);
        var candidates = options.SingularValues?.Distinct().ToList() ?? DetectSingularValues(map, parameters, rng, clock);
        var found = ImmutableArray.CreateBuilder<SingularityPattern>();
        BudgetLimit limit = BudgetLimit.None;
        string? limitMessage = null;
        try
        {
            for (int c = 0; c < candidates.Count; c++)
            {
                var pattern = Analyse(map, candidates[c], candidates, parameters, options, rng, clock, ref limit, ref limitMessage);
                if (pattern is not null) found.Add(pattern);
                progress?.Report(new AnalysisProgress("confine", c + 1, candidates.Count, $"x = {candidates[c]} + ε"));
            }
        }
        catch (BudgetHit e)
        {
            limit = e.Limit;
            limitMessage = e.Message;
        }
        return new ConfinementReport(recurrence.Text, found.ToImmutable(), [.. candidates], options.Steps, [.. parameters],
            map.Parameters, limit, limitMessage, clock.Elapsed);
    }

    private static Rational RandomRational(Random rng) => new(rng.Next(2, 50), rng.Next(1, 12));

    private static SingularityPattern? Analyse(RecursionMap map, Rational s, List<Rational> singular, Rational[] parameters,
        ConfinementOptions options, Random rng, BudgetClock clock, ref BudgetLimit limit, ref string? limitMessage)
    {
        int k = map.Dimension;
        var u1 = Enumerable.Range(0, k - 1).Select(_ => RandomRational(rng)).ToArray();
        var u2 = Enumerable.Range(0, k - 1).Select(_ => RandomRational(rng)).ToArray();
        for (int precision = InitialPrecision; ; precision *= 2)
        {
            if (precision > options.Budget.MaxPrecision)
            {
                limit = BudgetLimit.Precision;
                limitMessage = $"x = {s} + ε: a cancellation leaves a term without a known leading coefficient even with {options.Budget.MaxPrecision} ε-terms";
                return null;
            }
            var run1 = Run(map, s, u1, parameters, options.Steps, precision, clock, singular);
            if (run1 is null) continue;
            var entries = run1.Select((x, i) => Classify(map, i, x, singular)).ToArray();
            if (entries.Any(e => e is null)) continue;
            var terms = entries.Select(e => e!).ToImmutableArray();
            int firstInfinite = -1;
            for (int i = 0; i < terms.Length && firstInfinite < 0; i++) if (terms[i].IsInfinite) firstInfinite = i;
            if (firstInfinite < 0) return null;   // s is not singular within the step limit
            int recovery = -1;
            for (int i = firstInfinite + 1; i + k - 1 < terms.Length; i++)
                if (Enumerable.Range(i, k).All(j => terms[j].IsRegular)) { recovery = i; break; }
            if (recovery < 0)
            {
                // A cyclic pattern: the orbit comes back to the singular initial state (free data u, then s + O(ε)),
                // as for periodic maps; nothing is lost, but the singularity recurs.
                for (int j = Math.Max(k - 1, 1); j < terms.Length; j++)
                {
                    if (terms[j].IsInfinite || terms[j].Limit != s || terms[j].Order != terms[0].Order) continue;
                    bool back = true;
                    for (int m = 0; m < k - 1 && back; m++)
                    {
                        int i = j - (k - 1) + m;
                        back = i >= 0 && !terms[i].IsInfinite && terms[i].Limit == u1[m];
                    }
                    if (back)
                        return new SingularityPattern(s, terms, j, true, true, precision, [.. u1],
                            $"cyclic: after {j} steps the orbit is back at the singular initial state (free data and x = {s} + O(ε)); the pattern repeats and no initial data are lost", j);
                }
                int last = terms.Length;
                return new SingularityPattern(s, terms, last, false, false, precision, [.. u1],
                    $"no {k} consecutive regular terms within {options.Steps} steps after the singular term");
            }
            // The same terms with other free data: does the regular state depend on them?
            var run2 = Run(map, s, u2, parameters, recovery + k - 1, precision, clock, null);
            if (run2 is not null && run2.Length < recovery + k) run2 = null;
            bool recovers;
            if (k == 1) recovers = true;
            else if (run2 is null) continue;
            else
            {
                recovers = false;
                for (int j = recovery; j < recovery + k; j++)
                {
                    var a = run2[j];
                    if (!a.HasLeadingTerm || a.Valuation < 0 || a.AbsolutePrecision <= 0) { recovers = true; break; }   // different behaviour: depends on u
                    if (terms[j].Limit != (a.Valuation > 0 ? Rational.Zero : a[0])) { recovers = true; break; }
                }
            }
            return new SingularityPattern(s, terms, recovery, recovers, recovers, precision, [.. u1],
                recovers
                    ? $"{k} regular terms from {terms[recovery].Term} on, whose limits depend on the free initial data"
                    : $"regular again from {terms[recovery].Term} on, but the limits do not depend on the free initial data (information lost)");
        }
    }

    /// <summary>The singular term and the next <paramref name="steps"/> terms, or null when precision ran out.
    /// With <paramref name="singular"/> given, stops early after an infinite term followed by a regular state.</summary>
    private static LaurentSeries[]? Run(RecursionMap map, Rational s, Rational[] u, Rational[] parameters, int steps, int precision,
        BudgetClock clock, List<Rational>? singular)
    {
        bool seenInfinite = false;
        int regularRun = 0;
        var ring = new LaurentSeriesRing(precision);
        int k = map.Dimension;
        var state = u.Select(LaurentSeries.Constant).Append(LaurentSeries.Constant(s) + LaurentSeries.Epsilon).ToArray();
        var pars = parameters.Select(LaurentSeries.Constant).ToArray();
        var terms = new LaurentSeries[steps + 1];
        terms[0] = state[k - 1];
        var fresh = new LaurentSeries[1];
        for (int step = 0; step < steps; step++)
        {
            clock.Check();
            try
            {
                state = map.Step(ring, state, pars, step, fresh);
            }
            catch (ProgramEvaluationException)
            {
                return null;   // a divisor with no known leading term: more precision needed
            }
            if (!fresh[0].HasLeadingTerm) return null;
            terms[step + 1] = fresh[0];
            if (singular is null) continue;
            var x = fresh[0];
            if (x.Valuation < 0) { seenInfinite = true; regularRun = 0; }
            else if (x.Valuation == 0 && x.AbsolutePrecision > 0 && !singular.Contains(x[0])) regularRun++;
            else regularRun = 0;
            if (seenInfinite && regularRun >= map.Dimension) return terms[..(step + 2)];
        }
        return terms;
    }

    private static SingularityEntry? Classify(RecursionMap map, int i, LaurentSeries x, List<Rational> singular)
    {
        long index = map.NewTermIndex(i - 1, 0);
        string term = map.NewTermName(i - 1, 0);
        int v = x.Valuation;
        if (v < 0) return new SingularityEntry(index, term, x, true, null, -v);
        if (x.AbsolutePrecision <= 0) return null;
        var limit = v > 0 ? Rational.Zero : x[0];
        if (!singular.Contains(limit)) return new SingularityEntry(index, term, x, false, limit, 0);
        var d = x - LaurentSeries.Constant(limit);
        if (!d.HasLeadingTerm) return null;
        return new SingularityEntry(index, term, x, false, limit, d.Valuation);
    }

    /// <summary>0 and the rational roots of the rule's denominator in each argument that are the same for two random choices of the others.</summary>
    private static List<Rational> DetectSingularValues(RecursionMap map, Rational[] parameters, Random rng, BudgetClock clock)
    {
        var result = new List<Rational> { Rational.Zero };
        var ring = new LaurentPolynomialRing("t");
        var frac = new LaurentFractionRing(ring, new BudgetClock(clock.Budget with { MaxTerms = 10_000 }, clock.Cancellation));
        var pars = parameters.Select(frac.FromRational).ToArray();
        for (int slot = 0; slot < map.Dimension; slot++)
        {
            HashSet<Rational>? common = null;
            for (int trial = 0; trial < 2; trial++)
            {
                var state = Enumerable.Range(0, map.Dimension)
                    .Select(i => i == slot ? frac.FromPolynomial(ring.Variable(0)) : frac.FromRational(RandomRational(rng))).ToArray();
                var fresh = new LaurentFraction[1];
                List<Rational>? roots;
                try
                {
                    map.Step(frac, state, pars, 0, fresh);
                    var d = fresh[0].Denominator;
                    if (d.IsOne) { roots = []; }
                    else
                    {
                        int lo = d.MinExponent(0), hi = d.MaxExponent(0);
                        var c = new Rational[hi - lo + 1];
                        for (int e = lo; e <= hi; e++) c[e - lo] = d.Coefficient([e]);
                        roots = IntegerPolynomial.RationalRoots(IntegerPolynomial.FromRationals(c));
                    }
                }
                catch (Exception e) when (e is ProgramEvaluationException or BudgetHit)
                {
                    roots = null;
                }
                if (roots is null) { common = []; break; }
                if (common is null) common = [.. roots];
                else common.IntersectWith(roots);
            }
            foreach (var r in common ?? []) if (!result.Contains(r)) result.Add(r);
        }
        return result;
    }
}
