using System.Collections.Immutable;
using Integrable.Algebra;
using Integrable.Clusters;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Recursions;

namespace Integrable.Analyses;

/// <summary>Tests of the Laurent phenomenon: iterates a recursion with its initial values (and, unless
/// given values, its parameters) as formal variables of a Laurent polynomial ring over Q, and reports
/// for each iterate whether it is a Laurent polynomial, its size, exponent ranges, positivity and
/// integrality — or the first iterate that is not Laurent, with a witness.</summary>
/// <remarks>
/// <para>Each step evaluates the recursion's compiled rule in the Laurent ring, where a division
/// succeeds only when it is exact. When an inner division fails, the step is recomputed as a fraction
/// N/D of Laurent polynomials: the term is Laurent exactly when D divides N (any representative will
/// do), so an inner failure never gives a false "not Laurent", and a failure is proved by the non-zero
/// remainder of N by D.</para>
/// <para>Works for scalar recurrences, systems, lattice recurrences (T-systems), the octahedron
/// recurrence and mutation sequences of cluster seeds. Long runs honour the budget (terms per value,
/// wall time), report progress and can be cancelled.</para>
/// <para>References: S. Fomin, A. Zelevinsky, "The Laurent phenomenon", Adv. Appl. Math. 28 (2002) 119–144;
/// D. Gale, "The strange and surprising saga of the Somos sequences", Math. Intelligencer 13 (1991).</para>
/// </remarks>
/// <example><code>
/// var r = LaurentPhenomenon.Check(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 1"), 8);
/// Console.WriteLine(r.IsLaurent &amp;&amp; r.AllPositive);   // True
/// </code></example>
public static class LaurentPhenomenon
{
    /// <summary>Checks a scalar recurrence for <paramref name="steps"/> new terms.</summary>
    /// <param name="recurrence">The recurrence.</param>
    /// <param name="steps">Number of new terms, at least 1.</param>
    /// <param name="options">Parameter values, start index and budget (defaults when null).</param>
    /// <param name="progress">Receives one report per step.</param>
    /// <param name="cancellation">Cancels between and inside steps.</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="recurrence"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="steps"/> &lt; 1.</exception>
    /// <exception cref="ArgumentException">A parameter value names no parameter of the recurrence.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static LaurentReport Check(Recurrence recurrence, int steps, LaurentOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(recurrence);
        ArgumentOutOfRangeException.ThrowIfLessThan(steps, 1);
        options ??= LaurentOptions.Default;
        var fixedValues = CheckParameters(recurrence.Parameters, options.ParameterValues);
        int k = recurrence.Order;
        var names = Enumerable.Range(0, k).Select(i => recurrence.TermName(options.Start + i))
            .Concat(recurrence.Parameters.Where(p => !fixedValues.ContainsKey(p))).ToArray();
        var ring = new LaurentPolynomialRing(names);
        var clock = new BudgetClock(options.Budget, cancellation);
        var paramValues = ParameterInputs(ring, recurrence.Parameters, fixedValues);
        var values = Enumerable.Range(0, k).Select(ring.Variable).ToList();
        var engine = new Engine(ring, clock);
        var input = new LaurentPolynomial[recurrence.Rule.InputCount];
        for (int p = 0; p < paramValues.Length; p++) input[k + p] = paramValues[p];
        var found = ImmutableArray.CreateBuilder<LaurentStep>();
        LaurentFailure? failure = null;
        BudgetLimit limit = BudgetLimit.None;
        string? limitMessage = null;
        try
        {
            for (int s = 0; s < steps; s++)
            {
                clock.Check();
                long j = options.Start + k + s;
                for (int i = 0; i < k; i++) input[i] = values[values.Count - k + i];
                if (!recurrence.IsAutonomous) input[^1] = ring.FromInteger(j - k - recurrence.LowestShift);
                var outcome = engine.Evaluate(recurrence.Rule, input)[0];
                string term = recurrence.TermName(j);
                if (outcome.Value is null)
                {
                    var ones = ValueAtOnesScalar(recurrence, options, fixedValues, j);
                    failure = outcome.ToFailure(j, term, ones);
                    failure = Specialise(recurrence, options, fixedValues, j, failure, clock);
                    break;
                }
                values.Add(outcome.Value);
                found.Add(new LaurentStep(j, term, outcome.Value, outcome.InnerFailure));
                progress?.Report(new AnalysisProgress("laurent", s + 1, steps, $"{term}: {outcome.Value.TermCount} terms"));
            }
        }
        catch (BudgetHit e)
        {
            limit = e.Limit;
            limitMessage = e.Message;
        }
        return new LaurentReport(recurrence.Text, [.. names], found.ToImmutable(), failure, steps, limit, limitMessage, clock.Elapsed);
    }

    /// <summary>Checks a system of recurrences for <paramref name="steps"/> steps (each step yields one
    /// new term per unknown).</summary>
    /// <param name="system">The system.</param>
    /// <param name="steps">Number of steps, at least 1.</param>
    /// <param name="options">Parameter values and budget (the start index is ignored: states start at index 0).</param>
    /// <param name="progress">Receives one report per step.</param>
    /// <param name="cancellation">Cancels the check.</param>
    /// <returns>The report; the steps list every new term.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="system"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="steps"/> &lt; 1.</exception>
    /// <exception cref="ArgumentException">A parameter value names no parameter.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static LaurentReport Check(RecurrenceSystem system, int steps, LaurentOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(system);
        ArgumentOutOfRangeException.ThrowIfLessThan(steps, 1);
        options ??= LaurentOptions.Default;
        var fixedValues = CheckParameters(system.Parameters, options.ParameterValues);
        var stateNames = new List<string>();
        for (int u = 0; u < system.Unknowns.Length; u++)
            for (int i = 0; i < system.Orders[u]; i++) stateNames.Add(TermName(system.Unknowns[u], i));
        var names = stateNames.Concat(system.Parameters.Where(p => !fixedValues.ContainsKey(p))).ToArray();
        var ring = new LaurentPolynomialRing(names);
        var clock = new BudgetClock(options.Budget, cancellation);
        var paramValues = ParameterInputs(ring, system.Parameters, fixedValues);
        int dim = system.Dimension;
        var state = Enumerable.Range(0, dim).Select(ring.Variable).ToArray();
        var input = new LaurentPolynomial[system.Rule.InputCount];
        for (int p = 0; p < paramValues.Length; p++) input[dim + p] = paramValues[p];
        var engine = new Engine(ring, clock);
        var found = ImmutableArray.CreateBuilder<LaurentStep>();
        LaurentFailure? failure = null;
        BudgetLimit limit = BudgetLimit.None;
        string? limitMessage = null;
        try
        {
            for (int s = 0; s < steps && failure is null; s++)
            {
                clock.Check();
                state.CopyTo(input, 0);
                if (!system.IsAutonomous) input[^1] = ring.FromInteger(s - system.LowestShifts[0]);
                var outcomes = engine.Evaluate(system.Rule, input);
                var next = new LaurentPolynomial[dim];
                int o = 0;
                for (int u = 0; u < system.Unknowns.Length; u++)
                {
                    int ku = system.Orders[u];
                    string term = TermName(system.Unknowns[u], s + ku);
                    if (outcomes[u].Value is null)
                    {
                        failure = outcomes[u].ToFailure(s + ku, term, ValueAtOnesSystem(system, fixedValues, s, u));
                        break;
                    }
                    Array.Copy(state, o + 1, next, o, ku - 1);
                    next[o + ku - 1] = outcomes[u].Value!;
                    found.Add(new LaurentStep(s + ku, term, outcomes[u].Value!, outcomes[u].InnerFailure));
                    o += ku;
                }
                state = next;
                progress?.Report(new AnalysisProgress("laurent", s + 1, steps, $"step {s + 1}"));
            }
        }
        catch (BudgetHit e)
        {
            limit = e.Limit;
            limitMessage = e.Message;
        }
        return new LaurentReport(system.Text, [.. names], found.ToImmutable(), failure, steps, limit, limitMessage, clock.Elapsed);
    }

    /// <summary>Checks a lattice recurrence (e.g. the T-system): computes U_{a,n} for the space index
    /// <paramref name="space"/> and n = k, …, <paramref name="time"/> (k the order in time) from the
    /// initial rows n &lt; k, whose values in the light cone are formal variables <c>U_{a,n}</c>.</summary>
    /// <param name="lattice">The lattice recurrence.</param>
    /// <param name="time">The last time index, at least the order.</param>
    /// <param name="space">The space index a of the reported values.</param>
    /// <param name="spaceRange">Optional bounds [min, max] of the space index; values outside are 1
    /// (as for the A_r T-system with T_{0,n} = T_{r+1,n} = 1).</param>
    /// <param name="options">Parameter values and budget.</param>
    /// <param name="progress">Receives one report per time step.</param>
    /// <param name="cancellation">Cancels the check.</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="lattice"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="time"/> is below the order, or the space range is empty or excludes <paramref name="space"/>.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static LaurentReport Check(LatticeRecurrence lattice, int time, int space = 0, (int Min, int Max)? spaceRange = null,
        LaurentOptions? options = null, IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(lattice);
        ArgumentOutOfRangeException.ThrowIfLessThan(time, lattice.Order);
        if (spaceRange is { } sr && (sr.Min > sr.Max || space < sr.Min || space > sr.Max))
            throw new ArgumentOutOfRangeException(nameof(spaceRange), $"space range [{sr.Min}, {sr.Max}] must be non-empty and contain the space index {space}");
        options ??= LaurentOptions.Default;
        var fixedValues = CheckParameters(lattice.Parameters, options.ParameterValues);
        int kt = lattice.Order;
        var stencil = lattice.Stencil;
        int lo = spaceRange?.Min ?? int.MinValue, hi = spaceRange?.Max ?? int.MaxValue;
        string Name(int a, int t) => $"{lattice.Unknown}_{{{a},{t}}}";
        // The initial points in the light cone of (space, time), in a fixed order.
        var initialPoints = new SortedSet<(int T, int A)>();
        var seen = new HashSet<(int, int)>();
        void Collect(int a, int t)
        {
            if (a < lo || a > hi || !seen.Add((a, t))) return;
            if (t < kt) { initialPoints.Add((t, a)); return; }
            foreach (var (da, dt) in stencil) Collect(a + da, t + dt);
        }
        for (int t = kt; t <= time; t++) Collect(space, t);
        var names = initialPoints.Select(p => Name(p.A, p.T))
            .Concat(lattice.Parameters.Where(p => !fixedValues.ContainsKey(p))).ToArray();
        var ring = new LaurentPolynomialRing(names);
        var clock = new BudgetClock(options.Budget, cancellation);
        var paramValues = ParameterInputs(ring, lattice.Parameters, fixedValues);
        var engine = new Engine(ring, clock);
        var memo = new Dictionary<(int, int), LaurentPolynomial>();
        var found = ImmutableArray.CreateBuilder<LaurentStep>();
        LaurentFailure? failure = null;
        BudgetLimit limit = BudgetLimit.None;
        string? limitMessage = null;
        LaurentPolynomial? Value(int a, int t)
        {
            if (a < lo || a > hi) return ring.One;
            if (t < kt) return ring.Variable(Name(a, t));
            if (memo.TryGetValue((a, t), out var v)) return v;
            clock.Check();
            var input = new LaurentPolynomial[lattice.Rule.InputCount];
            for (int i = 0; i < stencil.Length; i++)
            {
                var x = Value(a + stencil[i].SpaceOffset, t + stencil[i].TimeOffset);
                if (x is null) return null;
                input[i] = x;
            }
            for (int p = 0; p < paramValues.Length; p++) input[stencil.Length + p] = paramValues[p];
            var outcome = engine.Evaluate(lattice.Rule, input)[0];
            if (outcome.Value is null)
            {
                failure = outcome.ToFailure(t, Name(a, t), null);
                return null;
            }
            memo[(a, t)] = outcome.Value;
            return outcome.Value;
        }
        try
        {
            for (int t = kt; t <= time; t++)
            {
                var v = Value(space, t);
                if (v is null) break;
                found.Add(new LaurentStep(t, Name(space, t), v, false));
                progress?.Report(new AnalysisProgress("laurent", t - kt + 1, time - kt + 1, $"{Name(space, t)}: {v.TermCount} terms"));
            }
        }
        catch (BudgetHit e)
        {
            limit = e.Limit;
            limitMessage = e.Message;
        }
        return new LaurentReport(lattice.Text, [.. names], found.ToImmutable(), failure, time - kt + 1, limit, limitMessage, clock.Elapsed);
    }

    /// <summary>Checks the octahedron recurrence f(i,j,k+1) f(i,j,k−1) = f(i+1,j,k) f(i−1,j,k) + f(i,j+1,k) f(i,j−1,k)
    /// with initial data on the flat stepped surface h(i, j) = (i + j + H) mod 2 (H = <paramref name="height"/>),
    /// as formal variables <c>f(i,j,h)</c>: reports f(0,0,k) for k ≡ H (mod 2) and f(1,0,k) otherwise, k = 2 … H.</summary>
    /// <param name="height">The largest height H, at least 2.</param>
    /// <param name="options">Budget (parameters do not apply).</param>
    /// <param name="progress">Receives one report per height.</param>
    /// <param name="cancellation">Cancels the check.</param>
    /// <returns>The report (Speyer 2007: 2^{k(k−1)/2} terms, all coefficients 1).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="height"/> &lt; 2.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static LaurentReport CheckOctahedron(int height, LaurentOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentOutOfRangeException.ThrowIfLessThan(height, 2);
        options ??= LaurentOptions.Default;
        int parity = height & 1;
        int H(int i, int j) => (int)(((long)i + j + parity) & 1);
        (int I, int J) Apex(int k) => ((k & 1) == parity) ? (0, 0) : (1, 0);
        string Name(int i, int j, int k) => $"f({i},{j},{k})";
        var initial = new SortedSet<(int, int)>();
        var seen = new HashSet<(int, int, int)>();
        void Collect(int i, int j, int k)
        {
            if (!seen.Add((i, j, k))) return;
            if (k == H(i, j)) { initial.Add((i, j)); return; }
            Collect(i + 1, j, k - 1); Collect(i - 1, j, k - 1); Collect(i, j + 1, k - 1); Collect(i, j - 1, k - 1);
            Collect(i, j, k - 2);
        }
        for (int k = 2; k <= height; k++) { var (ai, aj) = Apex(k); Collect(ai, aj, k); }
        var names = initial.Select(p => Name(p.Item1, p.Item2, H(p.Item1, p.Item2))).ToArray();
        var ring = new LaurentPolynomialRing(names);
        var clock = new BudgetClock(options.Budget, cancellation);
        var metered = new MeteredRing<LaurentPolynomial>(ring, clock, p => p.TermCount);
        var memo = new Dictionary<(int, int, int), LaurentPolynomial>();
        var found = ImmutableArray.CreateBuilder<LaurentStep>();
        LaurentFailure? failure = null;
        BudgetLimit limit = BudgetLimit.None;
        string? limitMessage = null;
        LaurentPolynomial? Value(int i, int j, int k)
        {
            if (k == H(i, j)) return ring.Variable(Name(i, j, k));
            if (memo.TryGetValue((i, j, k), out var v)) return v;
            clock.Check();
            var a = Value(i + 1, j, k - 1); if (a is null) return null;
            var b = Value(i - 1, j, k - 1); if (b is null) return null;
            var c = Value(i, j + 1, k - 1); if (c is null) return null;
            var d = Value(i, j - 1, k - 1); if (d is null) return null;
            var e = Value(i, j, k - 2); if (e is null) return null;
            var num = metered.Add(metered.Multiply(a, b), metered.Multiply(c, d));
            if (!metered.TryDivide(num, e, out v))
            {
                failure = Engine.FailureOf(k, Name(i, j, k), num, e, null);
                return null;
            }
            memo[(i, j, k)] = v;
            return v;
        }
        try
        {
            for (int k = 2; k <= height; k++)
            {
                var (ai, aj) = Apex(k);
                var v = Value(ai, aj, k);
                if (v is null) break;
                found.Add(new LaurentStep(k, Name(ai, aj, k), v, false));
                progress?.Report(new AnalysisProgress("laurent", k - 1, height - 1, $"{Name(ai, aj, k)}: {v.TermCount} terms"));
            }
        }
        catch (BudgetHit e)
        {
            limit = e.Limit;
            limitMessage = e.Message;
        }
        return new LaurentReport("octahedron recurrence f(i,j,k+1) f(i,j,k-1) = f(i+1,j,k) f(i-1,j,k) + f(i,j+1,k) f(i,j-1,k)",
            [.. names], found.ToImmutable(), failure, height - 1, limit, limitMessage, clock.Elapsed);
    }

    /// <summary>Checks a mutation sequence of a cluster seed whose variables x_1, …, x_{n+m} are formal:
    /// each mutation's new cluster variable is reported as a step (named <c>x_k</c> with a prime per
    /// earlier mutation in that direction).</summary>
    /// <param name="matrix">The extended exchange matrix.</param>
    /// <param name="directions">1-based directions, applied first to last.</param>
    /// <param name="options">Budget.</param>
    /// <param name="progress">Receives one report per mutation.</param>
    /// <param name="cancellation">Cancels the check.</param>
    /// <returns>The report (Fomin–Zelevinsky, Cluster algebras I, 2002: always Laurent).</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">The sequence is empty.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A direction is out of range.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static LaurentReport Check(ExchangeMatrix matrix, IEnumerable<int> directions, LaurentOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(matrix);
        ArgumentNullException.ThrowIfNull(directions);
        var dirs = directions.ToArray();
        if (dirs.Length == 0) throw new ArgumentException("give at least one mutation direction", nameof(directions));
        for (int s = 0; s < dirs.Length; s++)
            if (dirs[s] < 1 || dirs[s] > matrix.MutableCount)
                throw new ArgumentOutOfRangeException(nameof(directions), dirs[s], $"direction at step {s + 1} must be in 1..{matrix.MutableCount}");
        options ??= LaurentOptions.Default;
        var names = Enumerable.Range(1, matrix.RowCount).Select(i => TermName("x", i)).ToArray();
        var ring = new LaurentPolynomialRing(names);
        var clock = new BudgetClock(options.Budget, cancellation);
        var metered = new MeteredRing<LaurentPolynomial>(ring, clock, p => p.TermCount);
        var seed = new Seed<LaurentPolynomial>(metered, matrix, Enumerable.Range(0, matrix.RowCount).Select(ring.Variable));
        var primes = new int[matrix.MutableCount];
        var found = ImmutableArray.CreateBuilder<LaurentStep>();
        LaurentFailure? failure = null;
        BudgetLimit limit = BudgetLimit.None;
        string? limitMessage = null;
        try
        {
            for (int s = 0; s < dirs.Length; s++)
            {
                clock.Check();
                int k = dirs[s];
                string term = names[k - 1] + new string('\'', ++primes[k - 1]);
                try
                {
                    seed = seed.Mutate(k);
                    found.Add(new LaurentStep(s + 1, term, seed[k], false));
                }
                catch (ExchangeDivisionException)
                {
                    var b = seed.Matrix;
                    LaurentPolynomial plus = ring.One, minus = ring.One;
                    for (int i = 1; i <= b.RowCount; i++)
                    {
                        int e = b[i, k];
                        if (e > 0) plus *= seed[i].Pow(e);
                        else if (e < 0) minus *= seed[i].Pow(-e);
                    }
                    failure = Engine.FailureOf(s + 1, term, plus + minus, seed[k], null);
                    break;
                }
                progress?.Report(new AnalysisProgress("laurent", s + 1, dirs.Length, $"{term}: {seed[k].TermCount} terms"));
            }
        }
        catch (BudgetHit e)
        {
            limit = e.Limit;
            limitMessage = e.Message;
        }
        return new LaurentReport($"mutations [{string.Join(", ", dirs)}] of {matrix}", [.. names], found.ToImmutable(), failure,
            dirs.Length, limit, limitMessage, clock.Elapsed);
    }

    internal static string TermName(string unknown, long j) => j is >= 0 and <= 9 ? $"{unknown}_{j}" : $"{unknown}_{{{j}}}";

    private static Dictionary<string, Rational> CheckParameters(ImmutableArray<string> parameters, IReadOnlyDictionary<string, Rational>? values)
    {
        var result = new Dictionary<string, Rational>(StringComparer.Ordinal);
        if (values is null) return result;
        foreach (var (name, value) in values)
        {
            if (!parameters.Contains(name))
                throw new ArgumentException($"'{name}' is not a parameter (parameters: {(parameters.Length == 0 ? "none" : string.Join(", ", parameters))})", nameof(values));
            result[name] = value;
        }
        return result;
    }

    private static LaurentPolynomial[] ParameterInputs(LaurentPolynomialRing ring, ImmutableArray<string> parameters, Dictionary<string, Rational> fixedValues) =>
        parameters.Select(p => fixedValues.TryGetValue(p, out var v) ? ring.Constant(v) : ring.Variable(p)).ToArray();

    private static Rational? ValueAtOnesScalar(Recurrence r, LaurentOptions options, Dictionary<string, Rational> fixedValues, long j)
    {
        try
        {
            var pars = r.Parameters.Select(p => fixedValues.TryGetValue(p, out var v) ? v : Rational.One).ToList();
            var ones = Enumerable.Repeat(Rational.One, r.Order).ToList();
            var v = r.Iterate(RationalField.Instance, ones, (int)(j - options.Start - r.Order + 1), pars, options.Start);
            return v[^1];
        }
        catch (SingularStepException)
        {
            return null;
        }
    }

    /// <summary>Looks for a one-variable specialisation (one initial value t, the others small integers,
    /// formal parameters 1) under which term <paramref name="j"/> still fails to be Laurent in t: a small
    /// witness with a univariate non-monomial denominator. Specialisation is a ring homomorphism, so such
    /// a failure also proves the general one; the search is skipped silently when nothing is found.</summary>
    private static LaurentFailure Specialise(Recurrence r, LaurentOptions options, Dictionary<string, Rational> fixedValues,
        long j, LaurentFailure failure, BudgetClock clock)
    {
        var ring = new LaurentPolynomialRing("t");
        var engine = new Engine(ring, clock);
        int k = r.Order;
        var pars = r.Parameters.Select(p => ring.Constant(fixedValues.TryGetValue(p, out var v) ? v : Rational.One)).ToArray();
        foreach (bool ones in new[] { true, false })
        {
            for (int sym = k - 1; sym >= 0; sym--)
            {
                try
                {
                    var values = Enumerable.Range(0, k).Select(i => i == sym ? ring.Variable(0) : ring.FromInteger(ones ? 1 : i + 2)).ToList();
                    var input = new LaurentPolynomial[r.Rule.InputCount];
                    for (int p = 0; p < pars.Length; p++) input[k + p] = pars[p];
                    for (long jj = options.Start + k; jj <= j; jj++)
                    {
                        for (int i = 0; i < k; i++) input[i] = values[values.Count - k + i];
                        if (!r.IsAutonomous) input[^1] = ring.FromInteger(jj - k - r.LowestShift);
                        var o = engine.Evaluate(r.Rule, input)[0];
                        if (o.Value is not null) { values.Add(o.Value); continue; }
                        if (jj < j || o.ZeroDivision is not null) break;   // degenerate specialisation
                        var text = string.Join(", ", Enumerable.Range(0, k).Select(i => $"{r.TermName(options.Start + i)} = {(i == sym ? "t" : (ones ? 1 : i + 2).ToString(System.Globalization.CultureInfo.InvariantCulture))}"));
                        if (pars.Length > 0)
                            text += ", " + string.Join(", ", r.Parameters.Where(p => !fixedValues.ContainsKey(p)).Select(p => $"{p} = 1"));
                        return failure.WithSpecialisation(text.TrimEnd(',', ' '), o.Fraction.Numerator, o.Fraction.Denominator);
                    }
                }
                catch (BudgetHit)
                {
                    return failure;
                }
            }
        }
        return failure;
    }

    private static Rational? ValueAtOnesSystem(RecurrenceSystem system, Dictionary<string, Rational> fixedValues, int step, int unknown)
    {
        try
        {
            var pars = system.Parameters.Select(p => fixedValues.TryGetValue(p, out var v) ? v : Rational.One).ToList();
            var states = system.Iterate(RationalField.Instance, Enumerable.Repeat(Rational.One, system.Dimension).ToList(), step + 1, pars);
            int o = 0;
            for (int u = 0; u <= unknown; u++) o += system.Orders[u];
            return states[^1][o - 1];
        }
        catch (SingularStepException)
        {
            return null;
        }
    }

    /// <summary>Evaluates a rule on Laurent inputs: in the Laurent ring first, then, when an inner
    /// division is not exact, as fractions N/D of Laurent polynomials.</summary>
    internal sealed class Engine(LaurentPolynomialRing ring, BudgetClock clock)
    {
        private readonly MeteredRing<LaurentPolynomial> _laurent = new(ring, clock, p => p.TermCount);
        private readonly LaurentFractionRing _fractions = new(ring, clock);

        public Outcome[] Evaluate(StraightLineProgram rule, LaurentPolynomial[] input)
        {
            var outputs = new LaurentPolynomial[rule.Outputs.Length];
            try
            {
                rule.EvaluateAll(_laurent, input, outputs);
                return outputs.Select(v => new Outcome(v, false, default, null)).ToArray();
            }
            catch (ProgramEvaluationException)
            {
                // An inner division is not exact: decide each output from a fraction N/D.
            }
            var fin = input.Select(_fractions.FromPolynomial).ToArray();
            var fout = new LaurentFraction[rule.Outputs.Length];
            try
            {
                rule.EvaluateAll(_fractions, fin, fout);
            }
            catch (ProgramEvaluationException e)
            {
                // A division by a value that is identically zero.
                return Enumerable.Repeat(new Outcome(null, true, new LaurentFraction(ring.One, ring.Zero),
                    $"division by an identically zero value ({e.Message})"), fout.Length).ToArray();
            }
            return fout.Select(f => f.IsLaurent ? new Outcome(f.Numerator, true, default, null) : new Outcome(null, true, f, null)).ToArray();
        }

        internal static LaurentFailure FailureOf(long index, string term, LaurentPolynomial numerator, LaurentPolynomial divisor, Rational? ones)
        {
            if (divisor.IsZero)
                return new LaurentFailure(index, term, numerator, divisor, null, ones, "division by an identically zero value");
            var (_, remainder) = numerator.DivideExact(divisor);
            return new LaurentFailure(index, term, numerator, divisor, remainder, ones,
                $"the denominator D ({divisor.TermCount} terms) does not divide the numerator N ({numerator.TermCount} terms): the remainder has {remainder.TermCount} terms");
        }
    }

    /// <summary>The result of one output: a Laurent polynomial, or a fraction that is not one, or a division by zero.</summary>
    internal readonly record struct Outcome(LaurentPolynomial? Value, bool InnerFailure, LaurentFraction Fraction, string? ZeroDivision)
    {
        public LaurentFailure ToFailure(long index, string term, Rational? ones)
        {
            if (ZeroDivision is not null)
                return new LaurentFailure(index, term, Fraction.Numerator, Fraction.Denominator, null, ones, ZeroDivision);
            return Engine.FailureOf(index, term, Fraction.Numerator, Fraction.Denominator, ones);
        }
    }
}
