using System.Collections.Immutable;
using Integrable.Analyses;
using Integrable.LinearAlgebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Recursions;

namespace Integrable.Integrals;

/// <summary>Search for first integrals of rational maps: all polynomial integrals up to a degree (a basis over
/// Q(parameters) modulo constants), rational integrals from discrete Darboux polynomials, invariant measures,
/// and the number of functionally independent integrals.</summary>
/// <remarks>
/// <para><b>Method.</b> The unknown coefficients of I = Σ c_{a,b} x^a t^b (x the state, t the parameters, |a| ≤ d,
/// |b| ≤ e) satisfy linear conditions I(φ(x), t) − I(x, t) = 0; these are sampled at random points modulo primes
/// near 2^62, the kernel is reduced to row echelon form, and its coefficients are reconstructed as rationals from
/// several primes (stable when two consecutive reconstructions agree). The parameter degree e grows until the
/// integrals found span the whole space.</para>
/// <para><b>Proof.</b> Every returned integral is checked by the exact identity I∘φ = I of rational functions over
/// Q(parameters); a candidate that fails is rejected and counted. <b>Completeness:</b> the nullity of the
/// sampled system at one random parameter point mod p is an upper bound on the dimension over Q(parameters)
/// (specialising and sampling can only lower the rank); the verified integrals, independent over Q(parameters)
/// (checked mod p at a random parameter point), are a lower bound. The report is complete when both agree.</para>
/// <para><b>Darboux polynomials</b> (Celledoni, Evripidou, McLaren, Owren, Quispel, Tapley, van der Kamp 2019):
/// cofactors are products of the square-free factors of the denominators of φ and of the numerator and
/// denominator of the Jacobian determinant J; ratios of Darboux polynomials with the same cofactor are integrals,
/// and P with P∘φ = ±J·P gives the preserved measure dx/P.</para>
/// </remarks>
/// <example><code>
/// var report = FirstIntegrals.Find(Recurrence.Parse("x_{n+1} x_{n-1} = a + x_n"),
///     IntegralOptions.Default with { Degree = 3, Rational = true });
/// // report.Integrals[0]: (x_n^2 x_{n+1} + … + a)/(x_n x_{n+1})   (Lyness)
/// </code></example>
public static class FirstIntegrals
{
    /// <summary>Searches the integrals of an autonomous scalar recurrence seen as a map of (x_n, …, x_{n+k−1}).</summary>
    /// <param name="recurrence">The recurrence.</param>
    /// <param name="options">Degrees, rational search, budget.</param>
    /// <param name="progress">Receives progress.</param>
    /// <param name="cancellation">Cancels the search.</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentException">The recurrence is non-autonomous.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A degree bound is negative or zero.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static IntegralsReport Find(Recurrence recurrence, IntegralOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default) =>
        Find(IntegralMap.FromRecurrence(recurrence), options, progress, cancellation);

    /// <summary>Searches the integrals of an autonomous system seen as a map of its unknowns' windows.</summary>
    /// <param name="system">The system.</param>
    /// <param name="options">Degrees, rational search, budget.</param>
    /// <param name="progress">Receives progress.</param>
    /// <param name="cancellation">Cancels the search.</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentException">The system is non-autonomous.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static IntegralsReport Find(RecurrenceSystem system, IntegralOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default) =>
        Find(IntegralMap.FromSystem(system), options, progress, cancellation);

    /// <summary>Searches the integrals of a rational map (a plane map, a QRT map, …).</summary>
    /// <param name="map">The map.</param>
    /// <param name="options">Degrees, rational search, budget.</param>
    /// <param name="progress">Receives progress.</param>
    /// <param name="cancellation">Cancels the search.</param>
    /// <returns>The report.</returns>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static IntegralsReport Find(RationalMap map, IntegralOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default) =>
        Find(IntegralMap.FromMap(map), options, progress, cancellation);

    /// <summary>Searches the integrals of a map (for periodic maps: tuples (I₀, …, I_{P−1}) with
    /// I_{j+1}∘φ_j = I_j; Darboux polynomials and measures only for autonomous maps).</summary>
    /// <param name="map">The map.</param>
    /// <param name="options">Degrees, rational search, budget.</param>
    /// <param name="progress">Receives progress.</param>
    /// <param name="cancellation">Cancels the search.</param>
    /// <returns>The report; when the time limit is reached, a partial report whose <see cref="IntegralsReport.Limit"/> says so.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A degree bound is below 1 or a bound is negative.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public static IntegralsReport Find(IntegralMap map, IntegralOptions? options = null,
        IProgress<AnalysisProgress>? progress = null, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(map);
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        options ??= IntegralOptions.Default;
        ArgumentOutOfRangeException.ThrowIfLessThan(options.Degree, 1, nameof(options));
        if (options.DarbouxDegree is { } dd) ArgumentOutOfRangeException.ThrowIfLessThan(dd, 1, nameof(options));
        ArgumentOutOfRangeException.ThrowIfNegative(options.MaxCofactorExponent, nameof(options));
        ArgumentOutOfRangeException.ThrowIfNegative(options.MaxParameterDegree, nameof(options));
        if (options.MaxVariableDegree is { } mv) ArgumentOutOfRangeException.ThrowIfLessThan(mv, 1, nameof(options));
        var clock = new BudgetClock(options.Budget, cancellation);
        var state = new SearchState(map, options);
        try
        {
            Run(map, options, clock, progress, state);
        }
        catch (BudgetHit e)
        {
            state.Limit = e.Limit;
            state.LimitMessage = e.Message;
        }
        int independent = Independent(map, state.Integrals.Concat(state.RationalIntegrals).ToList(), new Random(options.RandomSeed + 7));
        return new IntegralsReport(map, options, [.. state.Integrals], [.. state.RationalIntegrals], [.. state.Darboux],
            [.. state.Measures], state.UpperBound, state.Rejected, independent, state.Limit, state.LimitMessage, clock.Elapsed);
    }

    private sealed class SearchState(IntegralMap map, IntegralOptions options)
    {
        public IntegralMap Map { get; } = map;
        public IntegralOptions Options { get; } = options;
        public List<FirstIntegral> Integrals { get; } = [];
        public List<FirstIntegral> RationalIntegrals { get; } = [];
        public List<DarbouxPolynomial> Darboux { get; } = [];
        public List<InvariantMeasure> Measures { get; } = [];
        public int? UpperBound { get; set; }
        public int Rejected { get; set; }
        public BudgetLimit Limit { get; set; } = BudgetLimit.None;
        public string? LimitMessage { get; set; }
    }

    /// <summary>Checks exactly whether a function is a first integral of an autonomous map: f(φ(x)) = f(x) as
    /// rational functions over Q(parameters).</summary>
    /// <param name="map">The map (autonomous).</param>
    /// <param name="candidate">A rational function over <see cref="IntegralMap.Field"/>.</param>
    /// <returns>True when the identity holds.</returns>
    /// <exception cref="ArgumentException">The map is periodic, or the candidate belongs to another field.</exception>
    public static bool IsIntegral(IntegralMap map, RationalFunction candidate)
    {
        ArgumentNullException.ThrowIfNull(map);
        ArgumentNullException.ThrowIfNull(candidate);
        if (!map.IsAutonomous) throw new ArgumentException($"the map has {map.Period} phases; check each pair I_(j+1)∘φ_j = I_j instead", nameof(map));
        if (!candidate.Field.Equals(map.Field)) throw new ArgumentException($"the candidate lives in {candidate.Field}, the map in {map.Field}", nameof(candidate));
        return (candidate.Compose(map.Substitution(0)) - candidate).IsZero;
    }

    internal static string ProofText(IntegralMap map) =>
        (map.IsAutonomous ? "exact identity I∘φ = I" : $"exact identities I_(j+1)∘φ_j = I_j for the {map.Period} phases") +
        $" over Q({string.Join(", ", map.Field.Variables)})";

    private static void Run(IntegralMap map, IntegralOptions options, BudgetClock clock, IProgress<AnalysisProgress>? progress, SearchState state)
    {
        var rng = new Random(options.RandomSeed);
        int totalSteps = options.Rational && map.IsAutonomous ? 3 : 1;
        var solver = new AnsatzSolver(map, options.Degree, includeConstant: false, cofactors: null, options, clock, rng);
        var outcome = solver.Solve();
        state.UpperBound = outcome.UpperBound;
        state.Rejected += outcome.Rejected;
        foreach (var s in outcome.Basis)
            state.Integrals.Add(new FirstIntegral([.. s.Blocks.Select(map.Field.FromPolynomial)], IntegralKind.Polynomial, ProofText(map), map.Dimension));
        if (!outcome.Complete && state.Limit == BudgetLimit.None)
        {
            state.Limit = BudgetLimit.Degree;
            state.LimitMessage = $"only {outcome.Basis.Count} of at most {outcome.UpperBound} integrals were found with parameter degree ≤ {options.MaxParameterDegree}";
        }
        progress?.Report(new AnalysisProgress("integrals", 1, totalSteps, $"{state.Integrals.Count} polynomial integrals of degree ≤ {options.Degree}"));
        if (!options.Rational || !map.IsAutonomous) return;

        int degree = options.DarbouxDegree ?? options.Degree;
        var jac = map.JacobianDeterminant();
        // Invariant measures: P∘φ = ±J·P.
        foreach (int sign in new[] { 1, -1 })
        {
            if (jac.IsZero) break;
            var c = sign > 0 ? jac : -jac;
            var ms = new AnsatzSolver(map, degree, includeConstant: true, [c], options, clock, rng).Solve();
            state.Rejected += ms.Rejected;
            foreach (var s in ms.Basis)
                state.Measures.Add(new InvariantMeasure(map.Field.FromPolynomial(s.Blocks[0]).Inverse(), sign < 0));
        }
        progress?.Report(new AnalysisProgress("integrals", 2, totalSteps, $"{state.Measures.Count} invariant measures"));

        // Darboux polynomials for cofactors built from the factors of the denominators and of J.
        var factors = FactorPool(map, jac);
        // Keep the number of cofactors tried moderate: (2E+1)^s·2 with s factors.
        int bound = options.MaxCofactorExponent;
        while (bound > 1 && Math.Pow(2 * bound + 1, factors.Count) > 5000) bound--;
        var fieldRng = new Random(options.RandomSeed + 1);
        var seen = new HashSet<RationalFunction>();
        foreach (var exponents in ExponentVectors(factors.Count, bound))
            foreach (int sign in new[] { 1, -1 })
            {
                clock.Check();
                var c = map.Field.FromInteger(sign);
                for (int i = 0; i < factors.Count; i++)
                    if (exponents[i] != 0) c *= map.Field.FromPolynomial(factors[i]).Pow(exponents[i]);
                if (c.IsOne || !seen.Add(c)) continue;
                var solverC = new AnsatzSolver(map, degree, includeConstant: true, [c], options, clock, rng);
                int upper = solverC.UpperBound();
                if (upper == 0) continue;
                var res = solverC.Solve(upper);
                state.Rejected += res.Rejected;
                var polys = res.Basis.Select(s => map.Field.FromPolynomial(s.Blocks[0])).ToList();
                foreach (var p in polys) state.Darboux.Add(new DarbouxPolynomial(p, c));
                for (int i = 1; i < polys.Count; i++)
                {
                    var ratio = polys[i] / polys[0];
                    if (ratio.IsPolynomial || ratio.Inverse().IsPolynomial) continue;
                    if (state.RationalIntegrals.Any(r => r.Value == ratio || r.Value == ratio.Inverse())) continue;
                    // Proof of the ratio itself (it follows from the two verified Darboux identities; checked again).
                    if (!(ratio.Compose(map.Substitution(0)) - ratio).IsZero) { state.Rejected++; continue; }
                    var all = state.Integrals.Concat(state.RationalIntegrals).ToList();
                    var candidate = new FirstIntegral([ratio], IntegralKind.Rational,
                        ProofText(map) + " (ratio of Darboux polynomials with equal cofactor)", map.Dimension);
                    if (Independent(map, [.. all, candidate], fieldRng) <= Independent(map, all, fieldRng)) continue;
                    state.RationalIntegrals.Add(candidate);
                }
            }
        progress?.Report(new AnalysisProgress("integrals", 3, totalSteps, $"{state.Darboux.Count} Darboux polynomials, {state.RationalIntegrals.Count} rational integrals"));
    }

    /// <summary>Pairwise coprime square-free factors (in the state variables) of the denominators of φ and of
    /// the numerator and denominator of J; variables dividing them are separate factors.</summary>
    internal static List<LaurentPolynomial> FactorPool(IntegralMap map, RationalFunction jacobian)
    {
        var sources = map.Components(0).Select(c => c.Denominator).ToList();
        if (!jacobian.IsZero) { sources.Add(jacobian.Numerator); sources.Add(jacobian.Denominator); }
        var ring = map.Field.PolynomialRing;
        var pool = new List<LaurentPolynomial>();
        void Insert(LaurentPolynomial f)
        {
            if (f.IsConstant || FirstIntegral.StateDegree(f, map.Dimension) == 0) return;
            f = f.PrimitivePart;
            for (int i = 0; i < pool.Count; i++)
            {
                var g = pool[i].Gcd(f, MonomialFactor.Keep);
                if (g.IsConstant) continue;
                if (g == pool[i] && g == f) return;
                var a = pool[i].DivideExact(g).Quotient;
                var b = f.DivideExact(g).Quotient;
                pool.RemoveAt(i);
                Insert(g); Insert(a); Insert(b);
                return;
            }
            pool.Add(f);
        }
        foreach (var s in sources)
        {
            if (s.IsConstant) continue;
            for (int v = 0; v < ring.VariableCount; v++)
                if (s.MinExponent(v) > 0) Insert(ring.Variable(v));
            foreach (var sf in s.FactorSquareFree().Factors) Insert(sf.Factor);
        }
        return pool;
    }

    private static IEnumerable<int[]> ExponentVectors(int n, int bound)
    {
        var cur = new int[n];
        return Walk(0);
        IEnumerable<int[]> Walk(int pos)
        {
            if (pos == n) { yield return (int[])cur.Clone(); yield break; }
            for (int e = -bound; e <= bound; e++)
            {
                cur[pos] = e;
                foreach (var v in Walk(pos + 1)) yield return v;
            }
        }
    }

    /// <summary>The rank of the gradients (in the state variables) of the integrals at a random point mod a
    /// prime near 2^62 with random parameter values; the larger of two points.</summary>
    internal static int Independent(IntegralMap map, IReadOnlyList<FirstIntegral> integrals, Random rng)
    {
        if (integrals.Count == 0) return 0;
        var grads = integrals.Select(i => map.StateVariables.Select(v => i.Value.Derivative(v)).ToArray()).ToArray();
        int best = 0;
        for (int attempt = 0, tries = 0; attempt < 2 && tries < 50; tries++)
        {
            var f = new PrimeField(Primes.Large(300 + tries));
            var point = new ulong[map.Field.Variables.Count];
            for (int i = 0; i < point.Length; i++) point[i] = (ulong)rng.NextInt64(1, long.MaxValue) % f.Modulus;
            var b = new ModularMatrixBuilder(f, integrals.Count, map.Dimension);
            try
            {
                for (int r = 0; r < grads.Length; r++)
                    for (int c = 0; c < map.Dimension; c++) b[r, c] = grads[r][c].Evaluate(f, point);
            }
            catch (PoleException)
            {
                continue;
            }
            best = Math.Max(best, b.ToImmutable().Rank());
            attempt++;
        }
        return best;
    }
}
