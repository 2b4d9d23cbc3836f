using System.Collections.Immutable;
using Integrable.Algebra;
using Integrable.Text;

namespace Integrable.Recursions;

/// <summary>A system of recurrences in several unknowns, e.g. <c>x_{n+1} = y_n, y_{n+1} = -x_n + a/y_n + 1</c>,
/// compiled into one straight-line program with one output per unknown.</summary>
/// <remarks>
/// <para>Each unknown u has a lowest shift l_u and a highest shift h_u over all the equations; the
/// state is u_{n+l_u}, …, u_{n+h_u−1} for every u (in the order the unknowns first appear), and one
/// step computes the new terms u_{n+h_u}. Each equation is solved for one new term, which must enter
/// it linearly; a new term may use new terms solved before it (triangular systems such as
/// x_{n+1} = f(x_n, y_n), y_{n+1} = g(x_{n+1}, y_n)). A system that is not triangular in its new
/// terms is rejected with a clear error.</para>
/// <para>Initial values are given per unknown in the state order, x_0 … x_{k_x−1}, then y_0 …; a
/// step from absolute index j computes every unknown's term with index j + k_u.</para>
/// </remarks>
/// <example><code>
/// var s = RecurrenceSystem.Parse("x_{n+1} = y_n, y_{n+1} = (y_n + 1)/x_n");
/// var orbit = s.Iterate(RationalField.Instance, [2, 3], 5);   // states (x_j, y_j)
/// </code></example>
public sealed class RecurrenceSystem
{
    private RecurrenceSystem(string text, ImmutableArray<Equation> equations, ImmutableArray<string> unknowns,
        ImmutableArray<int> orders, ImmutableArray<int> lowestShifts, ImmutableArray<string> parameters,
        string index, bool usesIndex, StraightLineProgram rule)
    {
        Text = text;
        Equations = equations;
        Unknowns = unknowns;
        Orders = orders;
        LowestShifts = lowestShifts;
        Parameters = parameters;
        Index = index;
        IsAutonomous = !usesIndex;
        Rule = rule;
    }

    /// <summary>The system as typed.</summary>
    public string Text { get; }

    /// <summary>The parsed equations.</summary>
    public ImmutableArray<Equation> Equations { get; }

    /// <summary>The unknowns in order of first appearance.</summary>
    public ImmutableArray<string> Unknowns { get; }

    /// <summary>The order of each unknown (highest minus lowest shift).</summary>
    public ImmutableArray<int> Orders { get; }

    /// <summary>The lowest shift of each unknown as written.</summary>
    public ImmutableArray<int> LowestShifts { get; }

    /// <summary>The parameters in order of first appearance.</summary>
    public ImmutableArray<string> Parameters { get; }

    /// <summary>The index variable.</summary>
    public string Index { get; }

    /// <summary>False when the index appears explicitly.</summary>
    public bool IsAutonomous { get; }

    /// <summary>Dimension of the state (sum of the orders).</summary>
    public int Dimension => Orders.Sum();

    /// <summary>The step. Inputs: the state (each unknown's window in order), the parameters, then n
    /// (the equations' index at this step) for non-autonomous systems. Outputs: the new term of each unknown.</summary>
    public StraightLineProgram Rule { get; }

    /// <summary>Reads a system from comma- or semicolon-separated equations.</summary>
    /// <param name="equations">The equations, e.g. <c>x_{n+1} = y_n; y_{n+1} = -x_n + 1/y_n</c>.</param>
    /// <param name="index">The index variable; detected when null.</param>
    /// <returns>The system.</returns>
    /// <exception cref="ExpressionParseException">Malformed text.</exception>
    /// <exception cref="EquationException">The equations do not form a solvable triangular system.</exception>
    public static RecurrenceSystem Parse(string equations, string? index = null)
    {
        ArgumentNullException.ThrowIfNull(equations);
        var eqs = ExpressionParser.ParseEquationList(equations.Replace(';', ','));
        var shape = EquationReader.Analyse(eqs, index);
        var unknowns = shape.Unknowns.ToImmutableArray();
        var low = unknowns.Select(u => shape.Terms.Values.Where(t => t.Unknown == u).Min(t => t.Shift)).ToImmutableArray();
        var high = unknowns.Select(u => shape.Terms.Values.Where(t => t.Unknown == u).Max(t => t.Shift)).ToImmutableArray();
        var orders = unknowns.Select((u, i) => high[i] - low[i]).ToImmutableArray();
        var wholeSpan = eqs[0].Left.Span.Union(eqs[^1].Right.Span);
        for (int i = 0; i < unknowns.Length; i++)
            if (orders[i] == 0)
                throw new EquationException($"{unknowns[i]} appears with one shift only; every unknown needs at least two", wholeSpan);
        if (eqs.Count != unknowns.Length)
            throw new EquationException($"{eqs.Count} equations for {unknowns.Length} unknowns ({string.Join(", ", unknowns)}); give one equation per unknown", wholeSpan);
        var parameters = shape.Parameters.ToImmutableArray();
        int stateSize = orders.Sum();
        int inputs = stateSize + parameters.Length + (shape.UsesIndex ? 1 : 0);
        var offsets = new int[unknowns.Length];
        for (int i = 1; i < unknowns.Length; i++) offsets[i] = offsets[i - 1] + orders[i - 1];

        var ring = new ProgramRing(inputs);
        var solved = new Dictionary<string, int>(); // top term name -> step
        string TopName(int u) => shape.Terms.First(t => t.Value.Unknown == unknowns[u] && t.Value.Shift == high[u]).Key;
        var tops = Enumerable.Range(0, unknowns.Length).ToDictionary(TopName, u => u);
        int StepOf(SymbolExpression s)
        {
            if (solved.TryGetValue(s.Name, out int st)) return st;
            if (shape.Terms.TryGetValue(s.Name, out var t))
            {
                int u = unknowns.IndexOf(t.Unknown);
                if (t.Shift == high[u]) throw new InvalidOperationException("unsolved new term used as input");
                return ring.Input(offsets[u] + t.Shift - low[u]);
            }
            int p = parameters.IndexOf(s.Name);
            return ring.Input(p >= 0 ? stateSize + p : stateSize + parameters.Length);
        }
        var pending = Enumerable.Range(0, eqs.Count).ToList();
        var outputs = new int[unknowns.Length];
        while (pending.Count > 0)
        {
            bool progress = false;
            foreach (int e in pending.ToList())
            {
                var names = ExpressionEvaluator.Symbols(eqs[e].Left).Concat(ExpressionEvaluator.Symbols(eqs[e].Right)).Select(s => s.Name).Distinct();
                var open = names.Where(n => tops.ContainsKey(n) && !solved.ContainsKey(n)).ToList();
                if (open.Count != 1) continue;
                int step = EquationReader.SolveFor(eqs[e], open[0], ring, StepOf);
                solved[open[0]] = step;
                outputs[tops[open[0]]] = step;
                pending.Remove(e);
                progress = true;
            }
            if (!progress)
                throw new EquationException(
                    "the system is not triangular in its new terms: no remaining equation contains exactly one unsolved highest-shift term",
                    eqs[pending[0]].Left.Span.Union(eqs[pending[0]].Right.Span));
        }
        var rule = ring.Builder.Build(outputs);
        return new RecurrenceSystem(equations, eqs.ToImmutableArray(), unknowns, orders, low, parameters, shape.Index, shape.UsesIndex, rule);
    }

    /// <summary>Iterates the system; each returned state lists every unknown's window.</summary>
    /// <typeparam name="T">Element type of the domain.</typeparam>
    /// <param name="ring">The domain.</param>
    /// <param name="initial">The initial state (<see cref="Dimension"/> values: each unknown's k_u first terms in turn).</param>
    /// <param name="steps">Number of steps.</param>
    /// <param name="parameters">Parameter values in the order of <see cref="Parameters"/>.</param>
    /// <param name="cancellation">Cancels between steps.</param>
    /// <returns>The states, starting with the initial one (<paramref name="steps"/> + 1 of them).</returns>
    /// <exception cref="ArgumentException">Wrong number of values.</exception>
    /// <exception cref="SingularStepException">A step cannot be computed in <paramref name="ring"/>.</exception>
    public IReadOnlyList<T[]> Iterate<T>(IRing<T> ring, IReadOnlyList<T> initial, int steps,
        IReadOnlyList<T>? parameters = null, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(initial);
        ArgumentOutOfRangeException.ThrowIfNegative(steps);
        if (initial.Count != Dimension)
            throw new ArgumentException($"the state has dimension {Dimension}; got {initial.Count} values", nameof(initial));
        int pc = parameters?.Count ?? 0;
        if (pc != Parameters.Length)
            throw new ArgumentException($"give values for the parameters ({string.Join(", ", Parameters)}), got {pc}", nameof(parameters));
        var input = new T[Rule.InputCount];
        for (int p = 0; p < pc; p++) input[Dimension + p] = parameters![p];
        var state = initial.ToArray();
        var result = new List<T[]> { state };
        var fresh = new T[Unknowns.Length];
        for (int s = 0; s < steps; s++)
        {
            cancellation.ThrowIfCancellationRequested();
            state.AsSpan().CopyTo(input);
            if (!IsAutonomous) input[^1] = ring.FromInteger(s - LowestShifts[0]);
            try
            {
                Rule.EvaluateAll(ring, input, fresh);
            }
            catch (ProgramEvaluationException e)
            {
                throw new SingularStepException(s + 1, $"state {s + 1}", e.Message, e);
            }
            var next = new T[Dimension];
            int o = 0;
            for (int u = 0; u < Unknowns.Length; u++)
            {
                int k = Orders[u];
                Array.Copy(state, o + 1, next, o, k - 1);
                next[o + k - 1] = fresh[u];
                o += k;
            }
            state = next;
            result.Add(state);
        }
        return result;
    }

    /// <summary>The system as typed.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Text;
}
