using System.Collections.Immutable;
using Integrable.Algebra;
using Integrable.Text;

namespace Integrable.Recursions;

/// <summary>A scalar recurrence of order k, x_{n+k} = R(x_n, …, x_{n+k−1}; parameters; n), read from an
/// equation written as on paper and compiled once into a <see cref="StraightLineProgram"/> that runs in
/// any domain (Q, Z/pZ, Laurent polynomials, series, …).</summary>
/// <remarks>
/// <para>The equation is solved for its highest shift, which must enter linearly
/// (<c>R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})</c> becomes an explicit rule for R_{n+1}); when the
/// lowest shift also enters linearly the backward rule is compiled too. Identifiers other than the
/// unknown and the index are parameters; the index may appear explicitly (non-autonomous equations).</para>
/// <para>Indexing convention: the initial values of an orbit are x_0, …, x_{k−1} (or from a chosen
/// start index), and the term x_j is computed from x_{j−k}, …, x_{j−1}.</para>
/// </remarks>
/// <example><code>
/// var somos4 = Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2");
/// var values = somos4.Iterate(RationalField.Instance, [1, 1, 1, 1], 8);   // 1,1,1,1,2,3,7,23,59,314,1529,8209
/// </code></example>
public sealed class Recurrence
{
    private Recurrence(string text, Equation equation, string unknown, string index, int order, int lowestShift,
        ImmutableArray<string> parameters, bool usesIndex, StraightLineProgram rule, StraightLineProgram? inverse)
    {
        Text = text;
        Equation = equation;
        Unknown = unknown;
        Index = index;
        Order = order;
        LowestShift = lowestShift;
        Parameters = parameters;
        IsAutonomous = !usesIndex;
        Rule = rule;
        InverseRule = inverse;
    }

    /// <summary>The equation as typed.</summary>
    public string Text { get; }

    /// <summary>The parsed equation.</summary>
    public Equation Equation { get; }

    /// <summary>The unknown's name, e.g. <c>x</c>.</summary>
    public string Unknown { get; }

    /// <summary>The index variable, e.g. <c>n</c>.</summary>
    public string Index { get; }

    /// <summary>The order k (highest minus lowest shift).</summary>
    public int Order { get; }

    /// <summary>The lowest shift in the equation as written (−1 for <c>x_{n+1} x_{n-1} = …</c>).</summary>
    public int LowestShift { get; }

    /// <summary>The parameters in order of first appearance.</summary>
    public ImmutableArray<string> Parameters { get; }

    /// <summary>False when the index appears explicitly.</summary>
    public bool IsAutonomous { get; }

    /// <summary>The forward rule. Inputs: x_n, …, x_{n+k−1}, then the parameters, then (for
    /// non-autonomous equations) the index n of the equation as written; output x_{n+k}.</summary>
    public StraightLineProgram Rule { get; }

    /// <summary>The backward rule (x_n from x_{n+1}, …, x_{n+k}, parameters, n), or null when the lowest
    /// shift does not enter linearly.</summary>
    public StraightLineProgram? InverseRule { get; }

    /// <summary>True when the backward rule exists.</summary>
    public bool IsInvertible => InverseRule is not null;

    /// <summary>Reads a recurrence from an equation such as <c>x_{n+1} x_{n-1} = x_n^2 + 1</c>.</summary>
    /// <param name="equation">The equation; exactly one unknown with one index.</param>
    /// <param name="index">The index variable; detected when null (n if present, else the only name in subscripts).</param>
    /// <returns>The recurrence.</returns>
    /// <exception cref="ExpressionParseException">The text is not a well-formed equation (with position and caret).</exception>
    /// <exception cref="EquationException">The equation is not a recursion that can be solved for its highest shift.</exception>
    public static Recurrence Parse(string equation, string? index = null)
    {
        var eq = ExpressionParser.ParseEquation(equation);
        var shape = EquationReader.Analyse([eq], index);
        if (shape.Unknowns.Count > 1)
            throw new EquationException(
                $"one equation with several unknowns ({string.Join(", ", shape.Unknowns)}); give one equation per unknown as a system",
                shape.FirstOccurrence[shape.Terms.First(t => t.Value.Unknown == shape.Unknowns[1]).Key].Span);
        string unknown = shape.Unknowns[0];
        var shifts = shape.Terms.Values.Select(t => t.Shift).ToList();
        int low = shifts.Min(), high = shifts.Max();
        int order = high - low;
        if (order == 0)
            throw new EquationException($"only one shift of {unknown} appears; a recursion needs at least two", eq.Left.Span.Union(eq.Right.Span));
        if (order > 64)
            throw new EquationException($"order {order} is too large (at most 64)", eq.Left.Span.Union(eq.Right.Span));
        var parameters = shape.Parameters.ToImmutableArray();
        string TermAt(int shift) => shape.Terms.First(t => t.Value.Shift == shift).Key;

        // Forward: inputs are the shifts low..high-1, then parameters, then n.
        int inputs = order + parameters.Length + (shape.UsesIndex ? 1 : 0);
        int SlotOf(SymbolExpression s, int baseShift)
        {
            if (shape.Terms.TryGetValue(s.Name, out var t)) return t.Shift - baseShift;
            int p = parameters.IndexOf(s.Name);
            if (p >= 0) return order + p;
            return order + parameters.Length; // the index
        }
        var forward = new ProgramRing(inputs);
        int fwd = EquationReader.SolveFor(eq, TermAt(high), forward, s => forward.Input(SlotOf(s, low)));
        var rule = forward.Builder.Build(fwd);

        StraightLineProgram? inverse = null;
        var backward = new ProgramRing(inputs);
        if (EquationReader.TrySolveFor(eq, TermAt(low), backward, s => backward.Input(SlotOf(s, low + 1)), out int bwd))
            inverse = backward.Builder.Build(bwd);

        return new Recurrence(equation, eq, unknown, shape.Index, order, low, parameters, shape.UsesIndex, rule, inverse);
    }

    /// <summary>The name of the term with absolute index <paramref name="j"/>, e.g. <c>x_7</c> or <c>x_{12}</c>.</summary>
    /// <param name="j">The index.</param>
    /// <returns>The term's name.</returns>
    public string TermName(long j) => j is >= 0 and <= 9 ? $"{Unknown}_{j}" : $"{Unknown}_{{{j}}}";

    /// <summary>Iterates forward from the initial values x_{start}, …, x_{start+k−1}.</summary>
    /// <typeparam name="T">Element type of the domain.</typeparam>
    /// <param name="ring">The domain.</param>
    /// <param name="initial">The k initial values.</param>
    /// <param name="steps">Number of new terms to compute.</param>
    /// <param name="parameters">Parameter values in the order of <see cref="Parameters"/> (empty when none).</param>
    /// <param name="start">Index of the first initial value.</param>
    /// <param name="cancellation">Cancels between steps.</param>
    /// <returns>The initial values followed by <paramref name="steps"/> new terms.</returns>
    /// <exception cref="ArgumentException">Wrong number of initial values or parameter values.</exception>
    /// <exception cref="SingularStepException">A term cannot be computed in <paramref name="ring"/>; names the step.</exception>
    public IReadOnlyList<T> Iterate<T>(IRing<T> ring, IReadOnlyList<T> initial, int steps,
        IReadOnlyList<T>? parameters = null, long start = 0, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(initial);
        ArgumentOutOfRangeException.ThrowIfNegative(steps);
        if (initial.Count != Order)
            throw new ArgumentException($"{Unknown} has order {Order}: give {Order} initial values, not {initial.Count}", nameof(initial));
        var values = new List<T>(initial);
        var input = PrepareInput(ring, parameters);
        for (int s = 0; s < steps; s++)
        {
            cancellation.ThrowIfCancellationRequested();
            long j = start + Order + s;
            for (int i = 0; i < Order; i++) input[i] = values[values.Count - Order + i];
            if (!IsAutonomous) input[^1] = ring.FromInteger(j - Order - LowestShift);
            values.Add(Apply(Rule, ring, input, j));
        }
        return values;
    }

    /// <summary>Iterates backward from x_{start}, …, x_{start+k−1}, computing x_{start−1}, x_{start−2}, ….</summary>
    /// <typeparam name="T">Element type of the domain.</typeparam>
    /// <param name="ring">The domain.</param>
    /// <param name="initial">The k values x_{start}, …, x_{start+k−1}.</param>
    /// <param name="steps">Number of earlier terms to compute.</param>
    /// <param name="parameters">Parameter values in the order of <see cref="Parameters"/>.</param>
    /// <param name="start">Index of the first given value.</param>
    /// <param name="cancellation">Cancels between steps.</param>
    /// <returns>The computed earlier terms followed by the given values, in increasing index order.</returns>
    /// <exception cref="InvalidOperationException">The recurrence has no backward rule.</exception>
    /// <exception cref="SingularStepException">A term cannot be computed; names the step.</exception>
    public IReadOnlyList<T> IterateBackward<T>(IRing<T> ring, IReadOnlyList<T> initial, int steps,
        IReadOnlyList<T>? parameters = null, long start = 0, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        if (InverseRule is null)
            throw new InvalidOperationException($"the lowest shift of {Unknown} does not enter the equation linearly, so there is no backward rule");
        ArgumentNullException.ThrowIfNull(ring);
        if (initial.Count != Order)
            throw new ArgumentException($"{Unknown} has order {Order}: give {Order} values, not {initial.Count}", nameof(initial));
        var values = new List<T>(initial);
        var input = PrepareInput(ring, parameters);
        for (int s = 0; s < steps; s++)
        {
            cancellation.ThrowIfCancellationRequested();
            long j = start - 1 - s;
            for (int i = 0; i < Order; i++) input[i] = values[i];
            if (!IsAutonomous) input[^1] = ring.FromInteger(j - LowestShift);
            values.Insert(0, Apply(InverseRule, ring, input, j));
        }
        return values;
    }

    private T[] PrepareInput<T>(IRing<T> ring, IReadOnlyList<T>? parameters)
    {
        int pc = parameters?.Count ?? 0;
        if (pc != Parameters.Length)
            throw new ArgumentException(Parameters.Length == 0
                ? $"the recurrence has no parameters, got {pc} values"
                : $"give values for the parameters {string.Join(", ", Parameters)} ({Parameters.Length}), got {pc}", nameof(parameters));
        var input = new T[Rule.InputCount];
        for (int p = 0; p < pc; p++) input[Order + p] = parameters![p];
        return input;
    }

    private T Apply<T>(StraightLineProgram program, IRing<T> ring, T[] input, long j)
    {
        try
        {
            return program.Evaluate(ring, input);
        }
        catch (ProgramEvaluationException e)
        {
            throw new SingularStepException(j, TermName(j), e.Message, e);
        }
    }

    /// <summary>The equation as typed.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Text;
}
