using System.Collections.Immutable;
using System.Text;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Text;

namespace Integrable.Recursions;

/// <summary>A rational map φ: (x₁, …, x_k) ↦ (φ₁, …, φ_k) of affine k-space, each component a rational
/// function of the named state variables and of parameters; for k = 2 a rational map of the plane.</summary>
/// <remarks>
/// <para>The components live in one <see cref="RationalFunctionField"/> whose variables are the state
/// variables followed by the parameters. Parameters are never mapped: composition and inversion treat
/// them as constants.</para>
/// <para>The map can be composed (<see cref="Compose"/>), inverted with a verified inverse
/// (<see cref="Invert"/>), differentiated (<see cref="JacobianDeterminant"/>), evaluated at points of
/// any <see cref="IRing{T}"/> (<see cref="Apply{T}"/>, <see cref="Orbit{T}"/>), compiled into a
/// <see cref="StraightLineProgram"/> (<see cref="ToProgram"/>) and handed to the analyses as a
/// <see cref="RecurrenceSystem"/> (<see cref="ToRecurrenceSystem"/>).</para>
/// <para>Instances are immutable; two maps are equal when they have the same state variables and
/// equal components in the same field.</para>
/// </remarks>
/// <example><code>
/// var phi = RationalMap.Parse("(x, y) -> (y, (y + 2)/x)");
/// var inverse = phi.Invert().Inverse;          // (x, y) -> ((x + 2)/y, x)
/// var jac = phi.JacobianDeterminant();          // (y + 2)/x^2
/// var orbit = phi.Orbit(RationalField.Instance, [1, 1], 4);
/// </code></example>
public sealed partial class RationalMap : IEquatable<RationalMap>
{
    private readonly int[] _slotOfField; // field variable index -> program input slot
    private StraightLineProgram? _program;

    private RationalMap(RationalFunctionField field, ImmutableArray<string> state, ImmutableArray<string> parameters,
        ImmutableArray<RationalFunction> components)
    {
        Field = field;
        StateVariables = state;
        Parameters = parameters;
        Components = components;
        _slotOfField = new int[field.Variables.Count];
        for (int v = 0; v < _slotOfField.Length; v++)
        {
            string name = field.Variables[v];
            int s = state.IndexOf(name);
            _slotOfField[v] = s >= 0 ? s : state.Length + parameters.IndexOf(name);
        }
    }

    /// <summary>The field of the components: state variables and parameters.</summary>
    public RationalFunctionField Field { get; }

    /// <summary>The state variables x₁, …, x_k in order.</summary>
    public ImmutableArray<string> StateVariables { get; }

    /// <summary>The parameters: the field's other variables, in the field's order.</summary>
    public ImmutableArray<string> Parameters { get; }

    /// <summary>The components φ₁, …, φ_k.</summary>
    public ImmutableArray<RationalFunction> Components { get; }

    /// <summary>The dimension k.</summary>
    public int Dimension => StateVariables.Length;

    /// <summary>True for a map of the plane (k = 2).</summary>
    public bool IsPlane => Dimension == 2;

    /// <summary>The map with the given components.</summary>
    /// <param name="stateVariables">The state variables, distinct.</param>
    /// <param name="components">One rational function per state variable (any fields; they are unified and
    /// the state variables added when missing).</param>
    /// <returns>The map.</returns>
    /// <exception cref="ArgumentException">No state variables, repeated names, or not one component per variable.</exception>
    public static RationalMap Create(IReadOnlyList<string> stateVariables, IReadOnlyList<RationalFunction> components)
    {
        ArgumentNullException.ThrowIfNull(stateVariables);
        ArgumentNullException.ThrowIfNull(components);
        if (stateVariables.Count == 0) throw new ArgumentException("a map needs at least one state variable", nameof(stateVariables));
        if (stateVariables.Distinct(StringComparer.Ordinal).Count() != stateVariables.Count)
            throw new ArgumentException($"the state variables ({string.Join(", ", stateVariables)}) repeat a name", nameof(stateVariables));
        if (components.Count != stateVariables.Count)
            throw new ArgumentException($"{stateVariables.Count} state variables need {stateVariables.Count} components, got {components.Count}", nameof(components));
        var parameters = new List<string>();
        foreach (var c in components)
        {
            ArgumentNullException.ThrowIfNull(c, nameof(components));
            foreach (var name in c.Field.Variables)
                if (!stateVariables.Contains(name) && !parameters.Contains(name)) parameters.Add(name);
        }
        // Keep only the parameters that a component actually uses.
        parameters.RemoveAll(p => !components.Any(c => Uses(c, p)));
        var field = new RationalFunctionField([.. stateVariables, .. parameters]);
        var embedded = components.Select(c => Embed(field, c)).ToImmutableArray();
        return new RationalMap(field, [.. stateVariables], [.. parameters], embedded);
    }

    /// <summary>The map (x, y) ↦ (<paramref name="first"/>, <paramref name="second"/>) of the plane.</summary>
    /// <param name="first">The first component.</param>
    /// <param name="second">The second component.</param>
    /// <param name="x">Name of the first state variable.</param>
    /// <param name="y">Name of the second state variable.</param>
    /// <returns>The plane map.</returns>
    /// <exception cref="ArgumentException">Equal variable names.</exception>
    public static RationalMap Plane(RationalFunction first, RationalFunction second, string x = "x", string y = "y") =>
        Create([x, y], [first, second]);

    /// <summary>The map of the plane with components given as text, e.g. <c>Plane("y", "(y + 1)/x")</c>;
    /// names other than <paramref name="x"/> and <paramref name="y"/> are parameters.</summary>
    /// <param name="first">The first component.</param>
    /// <param name="second">The second component.</param>
    /// <param name="x">Name of the first state variable.</param>
    /// <param name="y">Name of the second state variable.</param>
    /// <returns>The plane map.</returns>
    /// <exception cref="ExpressionParseException">Malformed text.</exception>
    /// <exception cref="ExpressionEvaluationException">A division by zero in the text.</exception>
    public static RationalMap Plane(string first, string second, string x = "x", string y = "y") =>
        FromExpressions([x, y], [ExpressionParser.Parse(first), ExpressionParser.Parse(second)]);

    /// <summary>Reads a map written as <c>(x, y) -> (y, (y + 1)/x)</c> (the arrow may also be <c>↦</c>);
    /// names that are not state variables are parameters, in order of first appearance.</summary>
    /// <param name="text">The map.</param>
    /// <returns>The map.</returns>
    /// <exception cref="ExpressionParseException">Malformed text, a missing arrow, a state that is not a list of
    /// distinct names, or a different number of components (with position and caret).</exception>
    /// <exception cref="ExpressionEvaluationException">A division by zero in a component.</exception>
    public static RationalMap Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        int arrow = text.IndexOf("->", StringComparison.Ordinal);
        int arrowLength = 2;
        if (arrow < 0) { arrow = text.IndexOf('↦'); arrowLength = 1; }
        if (arrow < 0)
            throw new ExpressionParseException(text, 0, text.Length, "a map is written (x, y) -> (first, second); no arrow '->' found");
        var (left, leftOffset) = ParseTuple(text, 0, arrow);
        var (right, _) = ParseTuple(text, arrow + arrowLength, text.Length - arrow - arrowLength);
        var names = new List<string>();
        foreach (var e in left)
        {
            if (e is not SymbolExpression s || names.Contains(s.Name))
                throw new ExpressionParseException(text, leftOffset + e.Span.Start, Math.Max(1, e.Span.Length),
                    e is SymbolExpression ? $"state variable '{((SymbolExpression)e).Name}' repeats" : "the left side must list the state variables' names");
            names.Add(s.Name);
        }
        if (right.Count != names.Count)
            throw new ExpressionParseException(text, arrow + arrowLength, text.Length - arrow - arrowLength,
                $"{names.Count} state variables need {names.Count} components, got {right.Count}");
        return FromExpressions(names, right);
    }

    /// <summary>The map (x₀, …, x_{k−1}) ↦ (x₁, …, x_{k−1}, R(x₀, …, x_{k−1})) of an autonomous recurrence
    /// of order k; for order 2 the plane map (x, y) ↦ (y, R(x, y)).</summary>
    /// <param name="recurrence">The recurrence; autonomous.</param>
    /// <param name="stateVariables">Names of the state variables; by default x, y for order 2 (when no parameter
    /// has these names) and the term names x_0, …, x_{k−1} otherwise.</param>
    /// <returns>The map; its parameters are the recurrence's.</returns>
    /// <exception cref="ArgumentException">The recurrence is not autonomous, or the names do not fit.</exception>
    /// <exception cref="ProgramEvaluationException">The rule divides by zero identically.</exception>
    public static RationalMap FromRecurrence(Recurrence recurrence, IReadOnlyList<string>? stateVariables = null)
    {
        ArgumentNullException.ThrowIfNull(recurrence);
        if (!recurrence.IsAutonomous)
            throw new ArgumentException($"'{recurrence.Text}' depends on {recurrence.Index} explicitly; only autonomous recurrences give a map", nameof(recurrence));
        int k = recurrence.Order;
        stateVariables ??= k == 2 && !recurrence.Parameters.Contains("x") && !recurrence.Parameters.Contains("y")
            ? ["x", "y"]
            : [.. Enumerable.Range(0, k).Select(i => recurrence.TermName(i))];
        if (stateVariables.Count != k)
            throw new ArgumentException($"the recurrence has order {k}: give {k} state names, not {stateVariables.Count}", nameof(stateVariables));
        foreach (var name in stateVariables)
            if (recurrence.Parameters.Contains(name))
                throw new ArgumentException($"state name '{name}' is a parameter of the recurrence", nameof(stateVariables));
        var field = new RationalFunctionField([.. stateVariables, .. recurrence.Parameters]);
        var inputs = new RationalFunction[recurrence.Rule.InputCount];
        for (int i = 0; i < inputs.Length; i++) inputs[i] = field.Variable(i);
        var r = recurrence.Rule.Evaluate(field, inputs);
        var components = new RationalFunction[k];
        for (int i = 0; i + 1 < k; i++) components[i] = inputs[i + 1];
        components[k - 1] = r;
        return Create(stateVariables, components);
    }

    /// <summary>The identity map of the given state variables.</summary>
    /// <param name="stateVariables">The state variables.</param>
    /// <returns>x ↦ x.</returns>
    public static RationalMap Identity(params string[] stateVariables)
    {
        ArgumentNullException.ThrowIfNull(stateVariables);
        if (stateVariables.Length == 0) throw new ArgumentException("a map needs at least one state variable", nameof(stateVariables));
        var field = new RationalFunctionField(stateVariables);
        return Create(stateVariables, [.. stateVariables.Select(field.Variable)]);
    }

    /// <summary>The value φ(point) in any ring (Q, Z/pZ, doubles, series…).</summary>
    /// <typeparam name="T">Element type of the ring.</typeparam>
    /// <param name="ring">The ring.</param>
    /// <param name="point">One value per state variable.</param>
    /// <param name="parameters">One value per parameter (may be omitted when there are none).</param>
    /// <returns>The image point.</returns>
    /// <exception cref="ArgumentException">Wrong number of values.</exception>
    /// <exception cref="PoleException">A component is not defined at the point in <paramref name="ring"/>.</exception>
    public T[] Apply<T>(IRing<T> ring, ReadOnlySpan<T> point, ReadOnlySpan<T> parameters = default)
    {
        ArgumentNullException.ThrowIfNull(ring);
        var input = Inputs(point, parameters);
        var result = new T[Dimension];
        try
        {
            ToProgram().EvaluateAll(ring, input, result);
        }
        catch (ProgramEvaluationException e)
        {
            throw new PoleException($"{this} is not defined at ({string.Join(", ", point.ToArray())}) in {ring}: {e.Message}");
        }
        return result;
    }

    /// <summary>The orbit p, φ(p), φ²(p), … of a point.</summary>
    /// <typeparam name="T">Element type of the ring.</typeparam>
    /// <param name="ring">The ring.</param>
    /// <param name="initial">The starting point.</param>
    /// <param name="steps">Number of applications of φ.</param>
    /// <param name="parameters">One value per parameter.</param>
    /// <param name="cancellation">Cancels between steps.</param>
    /// <returns><paramref name="steps"/> + 1 points, starting with <paramref name="initial"/>.</returns>
    /// <exception cref="ArgumentException">Wrong number of values.</exception>
    /// <exception cref="SingularStepException">The orbit hits a point where φ is not defined; names the step.</exception>
    public IReadOnlyList<T[]> Orbit<T>(IRing<T> ring, IReadOnlyList<T> initial, int steps,
        IReadOnlyList<T>? parameters = null, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(initial);
        ArgumentOutOfRangeException.ThrowIfNegative(steps);
        var input = Inputs(initial.ToArray(), (parameters ?? []).ToArray());
        var program = ToProgram();
        var orbit = new List<T[]> { initial.ToArray() };
        for (int s = 1; s <= steps; s++)
        {
            cancellation.ThrowIfCancellationRequested();
            var next = new T[Dimension];
            try
            {
                program.EvaluateAll(ring, input, next);
            }
            catch (ProgramEvaluationException e)
            {
                throw new SingularStepException(s, $"point {s}", e.Message, e);
            }
            orbit.Add(next);
            next.AsSpan().CopyTo(input);
        }
        return orbit;
    }

    private T[] Inputs<T>(ReadOnlySpan<T> point, ReadOnlySpan<T> parameters)
    {
        if (point.Length != Dimension)
            throw new ArgumentException($"the map acts on {Dimension} variables ({string.Join(", ", StateVariables)}); got {point.Length} values", nameof(point));
        if (parameters.Length != Parameters.Length)
            throw new ArgumentException(Parameters.Length == 0
                ? $"the map has no parameters, got {parameters.Length} values"
                : $"give values for the parameters {string.Join(", ", Parameters)} ({Parameters.Length}), got {parameters.Length}", nameof(parameters));
        var input = new T[Dimension + Parameters.Length];
        point.CopyTo(input);
        parameters.CopyTo(input.AsSpan(Dimension));
        return input;
    }

    /// <summary>The map compiled into a straight-line program. Inputs: the state variables, then the
    /// parameters; outputs: the components in order.</summary>
    /// <returns>The program (built once and cached).</returns>
    public StraightLineProgram ToProgram()
    {
        if (_program is not null) return _program;
        var b = new StraightLineProgramBuilder(Dimension + Parameters.Length);
        var outputs = new int[Dimension];
        for (int i = 0; i < Dimension; i++)
        {
            int num = Emit(b, Components[i].Numerator);
            int den = Emit(b, Components[i].Denominator);
            outputs[i] = b.Divide(num, den);
        }
        return _program = b.Build(outputs);
    }

    private int Emit(StraightLineProgramBuilder b, LaurentPolynomial p)
    {
        int acc = b.Constant(Rational.Zero);
        int n = Field.Variables.Count;
        foreach (var t in p.Terms)
        {
            int term = b.Constant(t.Coefficient);
            for (int v = 0; v < n; v++)
                if (t.Exponents[v] != 0) term = b.Multiply(term, b.Power(b.Input(_slotOfField[v]), t.Exponents[v]));
            acc = b.Add(acc, term);
        }
        return acc;
    }

    /// <summary>The map as a system of first-order recurrences, u_{n+1} = φ_u(state_n) for every state
    /// variable u, so that the analyses (degree growth, periodicity, Laurent property, …) can iterate it.</summary>
    /// <param name="index">The index variable's name; it must differ from every variable.</param>
    /// <returns>The system; its unknowns are the state variables and its parameters the map's.</returns>
    /// <exception cref="InvalidOperationException">A state variable's name has a subscript or the index name is taken.</exception>
    public RecurrenceSystem ToRecurrenceSystem(string index = "n")
    {
        ArgumentNullException.ThrowIfNull(index);
        if (Field.Variables.Contains(index))
            throw new InvalidOperationException($"'{index}' is a variable of the map; choose another index name");
        foreach (var s in StateVariables)
            if (s.Contains('_') || s.Contains('{'))
                throw new InvalidOperationException($"state variable '{s}' has a subscript; rename it before writing the map as recurrences");
        var renamed = new Dictionary<string, RationalFunction>(StringComparer.Ordinal);
        var target = new RationalFunctionField([.. StateVariables.Select(s => $"{s}_{index}"), .. Parameters]);
        foreach (var s in StateVariables) renamed[s] = target.Variable($"{s}_{index}");
        var text = new StringBuilder();
        for (int i = 0; i < Dimension; i++)
        {
            if (i > 0) text.Append("; ");
            var c = Components[i].Substitute(renamed);
            text.Append(StateVariables[i]).Append("_{").Append(index).Append("+1} = ").Append(c.ToString());
        }
        return RecurrenceSystem.Parse(text.ToString(), index);
    }

    /// <summary>Text such as <c>(x, y) -> (y, (y + 1)/x)</c>, which <see cref="Parse"/> reads back.</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "(" + string.Join(", ", StateVariables) + ") -> (" + string.Join(", ", Components.Select(c => c.ToString())) + ")";

    /// <summary>LaTeX such as <c>(x, y) \mapsto \left(y, \frac{y + 1}{x}\right)</c>.</summary>
    /// <returns>The LaTeX text (math mode, without delimiters).</returns>
    public string ToLatex() =>
        "(" + string.Join(", ", StateVariables) + ") \\mapsto \\left(" + string.Join(", ", Components.Select(c => c.ToLatex())) + "\\right)";

    /// <inheritdoc/>
    public bool Equals(RationalMap? other) =>
        other is not null && StateVariables.SequenceEqual(other.StateVariables) && Field.Equals(other.Field)
        && Components.SequenceEqual(other.Components);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as RationalMap);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        foreach (var s in StateVariables) h.Add(s);
        foreach (var c in Components) h.Add(c);
        return h.ToHashCode();
    }

    private static bool Uses(RationalFunction f, string name)
    {
        int v = f.Field.PolynomialRing.IndexOf(name);
        if (v < 0) return false;
        return (!f.Numerator.IsZero && (f.Numerator.MaxExponent(v) != 0 || f.Numerator.MinExponent(v) != 0))
            || f.Denominator.MaxExponent(v) != 0 || f.Denominator.MinExponent(v) != 0;
    }

    /// <summary>Moves <paramref name="f"/> into <paramref name="field"/> (which has every variable f uses).</summary>
    internal static RationalFunction Embed(RationalFunctionField field, RationalFunction f)
    {
        if (f.Field.Equals(field)) return f;
        var values = new RationalFunction[f.Field.Variables.Count];
        for (int v = 0; v < values.Length; v++)
        {
            string name = f.Field.Variables[v];
            if (field.PolynomialRing.Contains(name)) values[v] = field.Variable(name);
            else if (Uses(f, name)) throw new ArgumentException($"{f} uses '{name}', which is not a variable of {field}");
            else values[v] = field.Zero; // unused: any value
        }
        return f.Evaluate(field, values);
    }

    private static RationalMap FromExpressions(IReadOnlyList<string> state, IReadOnlyList<Expression> components)
    {
        var names = new List<string>(state);
        foreach (var e in components)
            foreach (var s in ExpressionEvaluator.Symbols(e))
                if (!names.Contains(s.Name)) names.Add(s.Name);
        var field = new RationalFunctionField([.. names]);
        var values = components.Select(e => ExpressionEvaluator.Evaluate(e, field, s => field.Variable(s.Name))).ToArray();
        return Create(state, values);
    }

    private static (IReadOnlyList<Expression> Items, int Offset) ParseTuple(string text, int start, int length)
    {
        var part = text.Substring(start, length);
        int open = part.IndexOf('('), close = part.LastIndexOf(')');
        if (open < 0 || close < open || part[..open].Trim().Length > 0 || part[(close + 1)..].Trim().Length > 0)
            throw new ExpressionParseException(text, start, Math.Max(1, length), "expected a parenthesised, comma-separated list");
        try
        {
            return (ExpressionParser.ParseList(part.Substring(open + 1, close - open - 1)), start + open + 1);
        }
        catch (ExpressionParseException e)
        {
            throw new ExpressionParseException(text, start + open + 1 + e.Position, e.Length, e.Reason);
        }
    }
}
