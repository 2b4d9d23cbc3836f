using System.Collections.Immutable;
using Integrable.Numbers;
using Integrable.RationalFunctions;
using Integrable.Recursions;

namespace Integrable.Analyses;

/// <summary>The degree-growth computation, generic in the line field (univariate rational functions
/// over Z/pZ): two random lines iterated in lockstep; a disagreement at a step is decided by a fresh line
/// computed from the start.</summary>
internal static class DegreeEngine
{
    private sealed class Line<T>(ILineField<T> field, T[] state, T[] parameters)
    {
        public ILineField<T> Field { get; } = field;
        public T[] State { get; set; } = state;
        public T[] Parameters { get; } = parameters;
        public int Steps { get; set; }
        public List<(int Num, int Den)> Last { get; } = [];
    }

    public static GrowthReport Run<T>(RecursionMap map, int steps, GrowthOptions options, Func<PrimeField, ILineField<T>> fieldFactory,
        IProgress<AnalysisProgress>? progress, CancellationToken cancellation)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(steps, 1);
        if (options.PrimeBits is < 20 or > 62) throw new ArgumentOutOfRangeException(nameof(options), options.PrimeBits, "PrimeBits must be between 20 and 62");
        var fixedValues = map.CheckParameters(options.ParameterValues, nameof(options));
        var clock = new BudgetClock(options.Budget, cancellation);
        var rng = new Random(options.RandomSeed);
        var primes = new List<ulong>();
        var redone = new List<int>();

        Line<T> NewLine()
        {
            var field = RandomField(rng, options.PrimeBits, map, fixedValues);
            primes.Add(field.Modulus);
            var lf = fieldFactory(field);
            var state = Enumerable.Range(0, map.Dimension).Select(_ => lf.Line(Sampling.Element(rng, field), Sampling.Element(rng, field))).ToArray();
            var pars = map.Parameters.Select(p => lf.Residue(fixedValues.TryGetValue(p, out var v) ? field.FromRational(v) : Sampling.Element(rng, field))).ToArray();
            return new Line<T>(lf, state, pars);
        }

        // One step of a line; false when a division by zero occurs (a degenerate line).
        bool Advance(Line<T> line)
        {
            var fresh = new T[map.OutputCount];
            try
            {
                line.State = map.Step(line.Field, line.State, line.Parameters, line.Steps, fresh);
            }
            catch (ProgramEvaluationException)
            {
                return false;
            }
            line.Steps++;
            line.Last.Clear();
            for (int u = 0; u < fresh.Length; u++)
            {
                var reduced = line.Field.Reduce(fresh[u]);
                line.State[map.NewestSlot(u)] = reduced;
                line.Last.Add(line.Field.Degrees(reduced));
            }
            return true;
        }

        static long DegreeOf(Line<T> l) => l.Last.Max(d => (long)Math.Max(Math.Max(d.Num, d.Den), 0));

        int k = map.IsScalar ? map.Dimension : 1;
        var degrees = new List<long>(Enumerable.Repeat(1L, k));
        var nums = new List<int>(Enumerable.Repeat(1, k));
        var dens = new List<int>(Enumerable.Repeat(0, k));
        BudgetLimit limit = BudgetLimit.None;
        string? limitMessage = null;
        var a = NewLine();
        var b = NewLine();
        try
        {
            for (int s = 0; s < steps; s++)
            {
                clock.Check();
                bool okA = Advance(a), okB = Advance(b);
                if (!okA || !okB || DegreeOf(a) != DegreeOf(b))
                {
                    // Decide with fresh lines computed from the start; keep the two that agree.
                    redone.Add(s + 1);
                    var pool = new List<Line<T>>();
                    if (okA) pool.Add(a);
                    if (okB) pool.Add(b);
                    bool decided = false;
                    for (int attempt = 0; attempt < 4 && !decided; attempt++)
                    {
                        var c = NewLine();
                        bool okC = true;
                        for (int t = 0; t <= s && okC; t++) { clock.Check(); okC = Advance(c); }
                        if (!okC) continue;
                        var agree = pool.FirstOrDefault(l => DegreeOf(l) == DegreeOf(c));
                        if (agree is not null) { a = agree; b = c; decided = true; }
                        else pool.Add(c);
                    }
                    if (!decided)
                        throw new SingularStepException(map.NewTermIndex(s, 0), map.NewTermName(s, 0),
                            "random lines give different degrees or hit a division by zero at this step: the map is not defined for generic initial values");
                }
                long d = DegreeOf(a);
                degrees.Add(d);
                var top = a.Last.MaxBy(x => Math.Max(x.Num, x.Den));
                nums.Add(top.Num);
                dens.Add(top.Den);
                progress?.Report(new AnalysisProgress("growth", s + 1, steps, $"{map.NewTermName(s, 0)}: degree {d}"));
                if (d > options.Budget.MaxDegree)
                {
                    limit = BudgetLimit.Degree;
                    limitMessage = $"degree {d} at step {s + 1} exceeds the limit {options.Budget.MaxDegree}";
                    break;
                }
            }
        }
        catch (BudgetHit e)
        {
            limit = e.Limit;
            limitMessage = e.Message;
        }
        var fit = GrowthFit.FromDegrees(degrees, options.MinimumConfirmations);
        int exact = 0;
        string? mismatch = null;
        if (options.ExactConfirmation)
            (exact, mismatch) = ConfirmExactly(map, degrees, fixedValues, rng, clock);
        return new GrowthReport(map.Text, [.. degrees], [.. nums], [.. dens], fit, steps, [.. primes], [.. redone], exact, mismatch,
            limit, limitMessage, clock.Elapsed);
    }

    private static PrimeField RandomField(Random rng, int bits, RecursionMap map, Dictionary<string, Rational> fixedValues)
    {
        while (true)
        {
            long lo = 1L << (bits - 1), hi = bits == 62 ? (1L << 62) - 1_000_000 : (1L << bits) - 1;
            ulong n = (ulong)rng.NextInt64(lo, hi) | 1UL;
            while (!Primes.IsPrime(n)) n += 2;
            if (n >= PrimeField.ModulusLimit) continue;
            var field = new PrimeField(n);
            if (map.Rule.Constants.All(field.CanReduce) && fixedValues.Values.All(field.CanReduce)) return field;
        }
    }

    /// <summary>Exact degrees of the first iterates, computed as reduced rational functions over Q in the
    /// initial values (parameters at random rational values) while that is cheap, compared with the line
    /// degrees: the degree of N/D in lowest terms is max(total degree of N, total degree of D).</summary>
    private static (int Confirmed, string? Mismatch) ConfirmExactly(RecursionMap map, List<long> degrees, Dictionary<string, Rational> fixedValues,
        Random rng, BudgetClock outer)
    {
        var field = new RationalFunctionField(map.StateNames.ToArray());
        var clock = new BudgetClock(AnalysisBudget.Default with { MaxTerms = 3000, TimeLimit = TimeSpan.FromSeconds(0.3) }, outer.Cancellation);
        var ring = new MeteredRing<RationalFunction>(field, clock, f => f.Numerator.TermCount + f.Denominator.TermCount);
        var state = Enumerable.Range(0, map.Dimension).Select(field.Variable).ToArray();
        var pars = map.Parameters.Select(p => field.Constant(fixedValues.TryGetValue(p, out var v) ? v : new Rational(rng.Next(2, 40), rng.Next(1, 9)))).ToArray();
        int first = map.IsScalar ? map.Dimension : 1;
        int confirmed = first;   // the initial values have degree 1
        var fresh = new RationalFunction[map.OutputCount];
        try
        {
            for (int s = 0; first + s < degrees.Count; s++)
            {
                state = map.Step(ring, state, pars, s, fresh);
                long d = fresh.Max(f => f.IsZero ? 0L : Math.Max(f.Numerator.TotalDegree, f.Denominator.TotalDegree));
                if (d != degrees[first + s])
                    return (confirmed, $"{map.NewTermName(s, 0)} has exact degree {d} but degree {degrees[first + s]} on the lines");
                confirmed++;
            }
        }
        catch (Exception e) when (e is BudgetHit or ProgramEvaluationException)
        {
            // too large for an exact check (or singular at these parameter values): stop confirming here
        }
        return (confirmed, null);
    }
}
