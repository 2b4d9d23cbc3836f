using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.RationalFunctions;
using Integrable.Recursions;

namespace Integrable.Analyses;

/// <summary>The exact period of a recursion as a map of its initial values: the least p with
/// x_{n+p} = x_n as rational functions of the initial values (and of the parameters left symbolic).</summary>
/// <remarks>
/// <para><b>Search.</b> The orbit of a few random points modulo random primes near 2^61 is computed up to
/// P steps. Each p ≤ P that fails at some point is disproved exactly (if x_{n+p} = x_n held as rational
/// functions it would hold at every point where the iteration is defined, modulo any prime that
/// reduces the constants). The least p that holds at every point is the candidate; any true period
/// holds at every point, so a verified candidate is the least period.</para>
/// <para><b>Verification.</b> The candidate is confirmed on exact rational orbits, then x_{n+p} = x_n is
/// checked as an exact identity of reduced rational functions over Q when that fits the budget. Otherwise the report gives a Schwartz–Zippel error bound (degree bound of the
/// unreduced iterates over the prime size, per point).</para>
/// </remarks>
/// <example><code>
/// Periodicity.Find(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1"), 30).Period;               // 5 (Lyness)
/// Periodicity.Find(Recurrence.Parse("x_{n+3} x_n = 1 + x_{n+1} + x_{n+2}"), 30).Period;     // 8 (Todd)
/// </code></example>
public static class Periodicity
{
    private const int SymbolicTermLimit = 50_000;

    /// <summary>Finds the least period p ≤ <paramref name="maxPeriod"/> of a scalar recurrence.</summary>
    /// <param name="recurrence">The recurrence.</param>
    /// <param name="maxPeriod">The bound P, at least 1.</param>
    /// <param name="options">Parameter values, sampling, budget.</param>
    /// <param name="progress">Receives progress of the search.</param>
    /// <param name="cancellation">Cancels the search.</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="recurrence"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="maxPeriod"/> &lt; 1 or too few points.</exception>
    /// <exception cref="ArgumentException">A parameter value names no parameter.</exception>
    /// <exception cref="SingularStepException">Every sampled orbit hits a division by zero: the map is not defined.</exception>
    /// <exception cref="BudgetExceededException">The time limit was reached before an answer.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static PeriodReport Find(Recurrence recurrence, int maxPeriod, PeriodOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(recurrence);
        options ??= PeriodOptions.Default;
        return Find(new RecursionMap(recurrence, options.Start), maxPeriod, options, progress, cancellation);
    }

    /// <summary>Finds the least period p ≤ <paramref name="maxPeriod"/> of a system (the state returns after p steps).</summary>
    /// <param name="system">The system.</param>
    /// <param name="maxPeriod">The bound P, at least 1.</param>
    /// <param name="options">Parameter values, sampling, budget (the start index is ignored).</param>
    /// <param name="progress">Receives progress.</param>
    /// <param name="cancellation">Cancels the search.</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="system"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="maxPeriod"/> &lt; 1.</exception>
    /// <exception cref="ArgumentException">A parameter value names no parameter.</exception>
    /// <exception cref="SingularStepException">Every sampled orbit hits a division by zero.</exception>
    /// <exception cref="BudgetExceededException">The time limit was reached before an answer.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static PeriodReport Find(RecurrenceSystem system, int maxPeriod, PeriodOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(system);
        return Find(new RecursionMap(system), maxPeriod, options ?? PeriodOptions.Default, progress, cancellation);
    }

    private static PeriodReport Find(RecursionMap map, int maxPeriod, PeriodOptions options,
        IProgress<AnalysisProgress>? progress, CancellationToken cancellation)
    {
        try
        {
            return FindCore(map, maxPeriod, options, progress, cancellation);
        }
        catch (BudgetHit e)
        {
            throw new BudgetExceededException(e.Limit, -1, $"period search stopped before an answer: {e.Message}");
        }
    }

    private static PeriodReport FindCore(RecursionMap map, int maxPeriod, PeriodOptions options,
        IProgress<AnalysisProgress>? progress, CancellationToken cancellation)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(maxPeriod, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(options.Points, 1, nameof(options));
        var fixedValues = map.CheckParameters(options.ParameterValues, nameof(options));
        var free = map.Parameters.Where(p => !fixedValues.ContainsKey(p)).ToArray();
        var clock = new BudgetClock(options.Budget, cancellation);
        var rng = new Random(options.RandomSeed);
        int orbitLength = map.IsAutonomous ? maxPeriod : 2 * maxPeriod;

        // 1. Orbits of random points modulo random primes.
        var fields = new PrimeField[options.Points];
        var orbits = new ulong[options.Points][][];
        for (int r = 0; r < options.Points; r++)
        {
            (fields[r], orbits[r]) = ModularOrbit(map, fixedValues, rng, orbitLength, clock);
            progress?.Report(new AnalysisProgress("period", r + 1, options.Points + 1, $"orbit {r + 1} modulo {fields[r].Modulus}"));
        }

        bool Holds(int p)
        {
            for (int r = 0; r < orbits.Length; r++)
            {
                int span = map.IsAutonomous ? 0 : p;
                for (int j = 0; j <= span; j++)
                    if (!orbits[r][j + p].AsSpan().SequenceEqual(orbits[r][j])) return false;
            }
            return true;
        }

        int rationalPoints = 0;
        for (int p = 1; p <= maxPeriod; p++)
        {
            clock.Check();
            if (!Holds(p)) continue;
            // 2. Exact rational orbits.
            if (!RationalOrbitsAgree(map, fixedValues, rng, p, clock, out rationalPoints)) continue;
            // 3. Symbolic identity, else a probabilistic bound.
            BudgetLimit limit = BudgetLimit.None;
            string? limitMessage = null;
            if (options.SymbolicCheck)
            {
                bool? symbolic;
                try
                {
                    symbolic = SymbolicIdentity(map, fixedValues, free, p, clock);
                }
                catch (BudgetHit e)
                {
                    symbolic = null;
                    limit = e.Limit;
                    limitMessage = e.Message;
                }
                if (symbolic == true)
                    return new PeriodReport(map.Text, p, maxPeriod, PeriodVerification.Symbolic, null, null, options.Points, rationalPoints,
                        map.IsAutonomous, BudgetLimit.None, null, clock.Elapsed);
                if (symbolic == false) continue;
            }
            double bound = DegreeBoundOf(map, free.Length, p);
            double perPoint = 1.0;
            foreach (var f in fields) perPoint *= Math.Min(1.0, bound / (f.Modulus - bound));
            // A budget that stopped the symbolic check only weakens the verification, not the answer:
            // the report keeps Limit = None and says why the check is probabilistic.
            return new PeriodReport(map.Text, p, maxPeriod, PeriodVerification.Probabilistic, perPoint, bound, options.Points, rationalPoints,
                map.IsAutonomous, BudgetLimit.None, limitMessage, clock.Elapsed);
        }
        return new PeriodReport(map.Text, null, maxPeriod, PeriodVerification.Counterexamples, null, null, options.Points, 0,
            map.IsAutonomous, BudgetLimit.None, null, clock.Elapsed);
    }

    private static (PrimeField, ulong[][]) ModularOrbit(RecursionMap map, Dictionary<string, Rational> fixedValues, Random rng, int length, BudgetClock clock)
    {
        ProgramEvaluationException? last = null;
        int lastStep = 0;
        for (int attempt = 0; attempt < 12; attempt++)
        {
            var field = Sampling.RandomField(rng, map.Rule, fixedValues.Values);
            var state = Enumerable.Range(0, map.Dimension).Select(_ => Sampling.Element(rng, field)).ToArray();
            var pars = map.Parameters.Select(p => fixedValues.TryGetValue(p, out var v) ? field.FromRational(v) : Sampling.Element(rng, field)).ToArray();
            var orbit = new ulong[length + 1][];
            orbit[0] = state;
            try
            {
                for (int s = 0; s < length; s++)
                {
                    clock.Check();
                    orbit[s + 1] = map.Step(field, orbit[s], pars, s);
                }
                return (field, orbit);
            }
            catch (ProgramEvaluationException e)
            {
                last = e;
                lastStep = Array.FindIndex(orbit, o => o is null);
            }
        }
        int step = Math.Max(lastStep - 1, 0);
        throw new SingularStepException(map.NewTermIndex(step, 0), map.NewTermName(step, 0),
            $"every sampled orbit hits a division by zero ({last!.Message}): the map is not defined for generic initial values", last);
    }

    private static bool RationalOrbitsAgree(RecursionMap map, Dictionary<string, Rational> fixedValues, Random rng, int p, BudgetClock clock, out int count)
    {
        count = 0;
        var q = RationalField.Instance;
        for (int attempt = 0; attempt < 8 && count < 2; attempt++)
        {
            var state0 = Enumerable.Range(0, map.Dimension).Select(_ => new Rational(rng.Next(2, 60))).ToArray();
            var pars = map.Parameters.Select(n => fixedValues.TryGetValue(n, out var v) ? v : new Rational(rng.Next(2, 60))).ToArray();
            var states = new List<Rational[]> { state0 };
            int length = map.IsAutonomous ? p : 2 * p;
            try
            {
                for (int s = 0; s < length; s++)
                {
                    clock.Check();
                    states.Add(map.Step(q, states[^1], pars, s));
                }
            }
            catch (ProgramEvaluationException)
            {
                continue;   // this point is singular; draw another
            }
            int span = map.IsAutonomous ? 0 : p;
            for (int j = 0; j <= span; j++)
                if (!states[j + p].AsSpan().SequenceEqual(states[j])) return false;
            count++;
        }
        return true;
    }

    /// <summary>True/false when x_{n+p} = x_n holds/fails as an identity of rational functions in Q(initial
    /// values, symbolic parameters) — reduced fractions, so equality is structural; throws BudgetHit when too large.</summary>
    private static bool? SymbolicIdentity(RecursionMap map, Dictionary<string, Rational> fixedValues, string[] free, int p, BudgetClock outer)
    {
        var names = map.StateNames.Concat(free).ToArray();
        var field = new RationalFunctionField(names);
        var budget = outer.Budget with { MaxTerms = Math.Min(outer.Budget.MaxTerms, SymbolicTermLimit) };
        var clock = new BudgetClock(budget, outer.Cancellation);
        var ring = new MeteredRing<RationalFunction>(field, clock, f => f.Numerator.TermCount + f.Denominator.TermCount);
        var state0 = Enumerable.Range(0, map.Dimension).Select(field.Variable).ToArray();
        var pars = map.Parameters.Select(n => fixedValues.TryGetValue(n, out var v) ? field.Constant(v) : field.Variable(n)).ToArray();
        var states = new List<RationalFunction[]> { state0 };
        int length = map.IsAutonomous ? p : 2 * p;
        try
        {
            for (int s = 0; s < length; s++)
            {
                outer.Check();
                states.Add(map.Step(ring, states[^1], pars, s));
            }
        }
        catch (ProgramEvaluationException)
        {
            return false;   // a value is identically zero and then divided by: the map is not periodic there
        }
        int span = map.IsAutonomous ? 0 : p;
        for (int j = 0; j <= span; j++)
            for (int i = 0; i < map.Dimension; i++)
                if (states[j + p][i] != states[j][i]) return false;
        return true;
    }

    private static double DegreeBoundOf(RecursionMap map, int freeParameters, int p)
    {
        var ring = DegreeBoundRing.Instance;
        var state = Enumerable.Repeat(DegreeBoundRing.Variable, map.Dimension).ToArray();
        var pars = map.Parameters.Select(_ => DegreeBoundRing.Variable).ToArray();
        int length = map.IsAutonomous ? p : 2 * p;
        double bound = 1;
        for (int s = 0; s < length; s++)
        {
            state = map.Step(ring, state, pars, s);
            foreach (var d in state) bound = Math.Max(bound, d.Identity);
        }
        return bound;
    }
}
