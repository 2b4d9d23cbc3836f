using System.Collections.Immutable;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Text;

namespace Integrable.Recursions;

/// <summary>A recurrence on a two-dimensional lattice, T_{a,n+k} = R(neighbouring T_{a+i,n+j}), read
/// from an equation such as the T-system <c>T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n}</c>
/// (first subscript: the space index a, second: the time index n), compiled once and evaluated in any
/// domain from initial rows and optional boundary values.</summary>
/// <remarks>
/// <para>The equation is solved for the term with the highest time shift (there must be exactly one such
/// term, entering linearly). The value T_{a,N} is computed in its light cone from initial rows
/// n = 0, …, k−1 (k the order in time), by memoised recursion; values at space indices outside
/// [<see cref="Evaluate{T}"/>'s bounds] come from a boundary function (for the A_r T-system,
/// T_{0,n} = T_{r+1,n} = 1).</para>
/// </remarks>
/// <example><code>
/// var t = LatticeRecurrence.Parse("T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n}");
/// var v = t.Evaluate(RationalField.Instance, 0, 4, (a, n) => 1);   // 2^{4·3/2}·… domino count
/// </code></example>
public sealed class LatticeRecurrence
{
    private readonly ImmutableArray<(int Da, int Dn)> _inputs;

    private LatticeRecurrence(string text, string unknown, string space, string time, int order, int lowestShift,
        ImmutableArray<(int, int)> inputs, ImmutableArray<string> parameters, StraightLineProgram rule)
    {
        Text = text;
        Unknown = unknown;
        SpaceIndex = space;
        TimeIndex = time;
        Order = order;
        LowestTimeShift = lowestShift;
        _inputs = inputs;
        Parameters = parameters;
        Rule = rule;
    }

    /// <summary>The equation as typed.</summary>
    public string Text { get; }

    /// <summary>The unknown's name.</summary>
    public string Unknown { get; }

    /// <summary>The space index (first subscript).</summary>
    public string SpaceIndex { get; }

    /// <summary>The time index (second subscript).</summary>
    public string TimeIndex { get; }

    /// <summary>The order in time (highest minus lowest time shift).</summary>
    public int Order { get; }

    /// <summary>The lowest time shift as written.</summary>
    public int LowestTimeShift { get; }

    /// <summary>The parameters in order of first appearance.</summary>
    public ImmutableArray<string> Parameters { get; }

    /// <summary>The rule: inputs are the neighbouring terms in the order of <see cref="Stencil"/>, then
    /// the parameters; output the new term T_{a, n+k} (relative offsets measured from it).</summary>
    public StraightLineProgram Rule { get; }

    /// <summary>Offsets (Δa, Δn) of the rule's inputs relative to the new term (Δn &lt; 0).</summary>
    public ImmutableArray<(int SpaceOffset, int TimeOffset)> Stencil => _inputs;

    /// <summary>Reads a lattice recurrence.</summary>
    /// <param name="equation">The equation, terms written U_{a+i,n+j}.</param>
    /// <returns>The recurrence.</returns>
    /// <exception cref="ExpressionParseException">Malformed text.</exception>
    /// <exception cref="EquationException">Not a two-index recurrence solvable for its highest time shift.</exception>
    public static LatticeRecurrence Parse(string equation)
    {
        var eq = ExpressionParser.ParseEquation(equation);
        var symbols = ExpressionEvaluator.Symbols(eq.Left).Concat(ExpressionEvaluator.Symbols(eq.Right))
            .GroupBy(s => s.Name).Select(g => g.First()).ToList();
        var whole = eq.Left.Span.Union(eq.Right.Span);
        var lattice = symbols.Where(s => s.Subscripts.Count == 2).ToList();
        if (lattice.Count == 0) throw new EquationException("no term with two indices such as T_{a,n+1}", whole);
        var unknown = lattice[0].BaseName;
        foreach (var s in lattice)
            if (s.BaseName != unknown) throw new EquationException($"several lattice unknowns ({unknown}, {s.BaseName})", s.Span);
        string space = IndexName(lattice, 0, whole), time = IndexName(lattice, 1, whole);
        if (space == time) throw new EquationException("the two subscripts must use different index names", whole);
        var offsets = new Dictionary<string, (int Da, int Dn)>();
        foreach (var s in lattice)
            offsets[s.Name] = (Shift(s, 0, space), Shift(s, 1, time));
        var parameters = symbols.Where(s => s.Subscripts.Count != 2).Select(s => s.Name).ToList();
        foreach (var p in parameters)
            if (p == space || p == time)
                throw new EquationException($"the index {p} appears outside subscripts; only autonomous lattice equations are supported", symbols.First(s => s.Name == p).Span);
            else if (symbols.First(s => s.Name == p).Subscripts.Count > 0 && symbols.First(s => s.Name == p).BaseName == unknown)
                throw new EquationException($"'{p}' must have two indices like the other {unknown} terms", symbols.First(s => s.Name == p).Span);
        int high = offsets.Values.Max(o => o.Dn), low = offsets.Values.Min(o => o.Dn);
        if (high == low) throw new EquationException("only one time shift appears", whole);
        var tops = offsets.Where(o => o.Value.Dn == high).ToList();
        if (tops.Count != 1)
            throw new EquationException($"several terms have the highest time shift ({string.Join(", ", tops.Select(t => t.Key))}); exactly one is needed", whole);
        var top = tops[0];
        var inputs = offsets.Where(o => o.Key != top.Key)
            .Select(o => (o.Value.Da - top.Value.Da, o.Value.Dn - top.Value.Dn)).Distinct().ToImmutableArray();
        int slots = inputs.Length + parameters.Count;
        var ring = new ProgramRing(slots);
        int StepOf(SymbolExpression s)
        {
            if (offsets.TryGetValue(s.Name, out var o))
                return ring.Input(inputs.IndexOf((o.Da - top.Value.Da, o.Dn - top.Value.Dn)));
            return ring.Input(inputs.Length + parameters.IndexOf(s.Name));
        }
        int solution = EquationReader.SolveFor(eq, top.Key, ring, StepOf);
        return new LatticeRecurrence(equation, unknown, space, time, high - low, low, inputs,
            parameters.ToImmutableArray(), ring.Builder.Build(solution));
    }

    private static string IndexName(List<SymbolExpression> lattice, int slot, SourceSpan whole)
    {
        var names = lattice.SelectMany(s => ExpressionEvaluator.Symbols(s.Subscripts[slot])).Select(s => s.Name).Distinct().ToList();
        if (names.Count != 1)
            throw new EquationException($"subscript {slot + 1} of the lattice terms must use exactly one index name (found {(names.Count == 0 ? "none" : string.Join(", ", names))})", whole);
        return names[0];
    }

    private static int Shift(SymbolExpression s, int slot, string index) =>
        EquationReader.ReadShift(s.Subscripts[slot], index, $"subscript {slot + 1} of '{s.Name}'", 10_000);

    /// <summary>Computes T_{a,n} (n ≥ k) from the initial rows n = 0, …, k−1.</summary>
    /// <typeparam name="T">Element type of the domain.</typeparam>
    /// <param name="ring">The domain.</param>
    /// <param name="a">Space index of the wanted term.</param>
    /// <param name="n">Time index of the wanted term.</param>
    /// <param name="initial">Initial values T_{a,n} for 0 ≤ n &lt; k (called only inside the light cone).</param>
    /// <param name="parameters">Parameter values in the order of <see cref="Parameters"/>.</param>
    /// <param name="boundary">Optional: values outside the interval [<paramref name="spaceMin"/>, <paramref name="spaceMax"/>] (e.g. T_{0,n} = T_{r+1,n} = 1 for type A_r).</param>
    /// <param name="spaceMin">Smallest space index computed by the rule (default unbounded).</param>
    /// <param name="spaceMax">Largest space index computed by the rule (default unbounded).</param>
    /// <param name="cancellation">Cancels the computation.</param>
    /// <returns>The value T_{a,n}.</returns>
    /// <exception cref="ArgumentException">Wrong parameter count or n &lt; 0.</exception>
    /// <exception cref="SingularStepException">A term cannot be computed in <paramref name="ring"/>.</exception>
    public T Evaluate<T>(IRing<T> ring, int a, int n, Func<int, int, T> initial, IReadOnlyList<T>? parameters = null,
        Func<int, int, T>? boundary = null, int spaceMin = int.MinValue, int spaceMax = int.MaxValue,
        CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(initial);
        ArgumentOutOfRangeException.ThrowIfNegative(n);
        int pc = parameters?.Count ?? 0;
        if (pc != Parameters.Length) throw new ArgumentException($"give {Parameters.Length} parameter values, got {pc}", nameof(parameters));
        if ((spaceMin != int.MinValue || spaceMax != int.MaxValue) && boundary is null)
            throw new ArgumentException("a bounded space range needs a boundary function", nameof(boundary));
        var memo = new Dictionary<(int, int), T>();
        var input = new T[Rule.InputCount];
        for (int p = 0; p < pc; p++) input[_inputs.Length + p] = parameters![p];
        T Value(int x, int t)
        {
            if (x < spaceMin || x > spaceMax) return boundary!(x, t);
            if (t < Order) return initial(x, t);
            if (memo.TryGetValue((x, t), out var v)) return v;
            cancellation.ThrowIfCancellationRequested();
            var args = new T[_inputs.Length];
            for (int i = 0; i < _inputs.Length; i++) args[i] = Value(x + _inputs[i].Da, t + _inputs[i].Dn);
            args.CopyTo(input, 0);
            try
            {
                v = Rule.Evaluate(ring, input);
            }
            catch (ProgramEvaluationException e)
            {
                throw new SingularStepException(t, $"{Unknown}_{{{x},{t}}}", e.Message, e);
            }
            memo[(x, t)] = v;
            return v;
        }
        return Value(a, n);
    }

    /// <summary>The equation as typed.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Text;
}
