using System.Collections.Immutable;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Recursions;
using Integrable.Text;

namespace Integrable.Integrals;

/// <summary>A rational map φ: (x₁, …, x_k) ↦ (φ₁(x), …, φ_k(x)) whose components are rational functions of the
/// state variables and of symbolic parameters; for maps with periodic coefficients, one such map per phase
/// n mod P (φ₀, φ₁, …, φ_{P−1}, applied in turn).</summary>
/// <remarks>A recurrence of order k is read as the map of its state (x_n, …, x_{n+k−1}) ↦
/// (x_{n+1}, …, x_{n+k}); the state variables are named with the equation's own shifted unknowns so that
/// integrals print in them, e.g. <c>x_n</c>, <c>x_{n+1}</c>.</remarks>
/// <example><code>
/// var map = IntegralMap.FromRecurrence(Recurrence.Parse("x_{n+1} x_{n-1} = a + x_n"));
/// // map.StateVariables = [x_n, x_{n+1}], map.Parameters = [a], map.Components(0)[1] = (a + x_{n+1})/x_n
/// </code></example>
public sealed class IntegralMap
{
    private readonly ImmutableArray<ImmutableArray<RationalFunction>> _phases;

    private IntegralMap(string text, RationalFunctionField field, ImmutableArray<string> state, ImmutableArray<string> parameters,
        ImmutableArray<ImmutableArray<RationalFunction>> phases)
    {
        Text = text;
        Field = field;
        StateVariables = state;
        Parameters = parameters;
        _phases = phases;
    }

    /// <summary>A description of the map (the equation as typed, or the components).</summary>
    public string Text { get; }

    /// <summary>The field Q(state variables, parameters) the components live in; its variables are the state
    /// variables followed by the parameters.</summary>
    public RationalFunctionField Field { get; }

    /// <summary>The state variables x₁, …, x_k (e.g. <c>x_n</c>, <c>x_{n+1}</c>).</summary>
    public ImmutableArray<string> StateVariables { get; }

    /// <summary>The symbolic parameters (variables of <see cref="Field"/> after the state variables).</summary>
    public ImmutableArray<string> Parameters { get; }

    /// <summary>The dimension k of the state.</summary>
    public int Dimension => StateVariables.Length;

    /// <summary>The period P of the coefficients (1 for an autonomous map).</summary>
    public int Period => _phases.Length;

    /// <summary>True when the map is the same at every step (<see cref="Period"/> = 1).</summary>
    public bool IsAutonomous => _phases.Length == 1;

    /// <summary>The components φ₁, …, φ_k of the map applied at steps n ≡ <paramref name="phase"/> (mod P).</summary>
    /// <param name="phase">The phase, 0 ≤ phase &lt; <see cref="Period"/>.</param>
    /// <returns>The k components.</returns>
    public ImmutableArray<RationalFunction> Components(int phase)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(phase);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(phase, Period);
        return _phases[phase];
    }

    /// <summary>The values to substitute for every variable of <see cref="Field"/> to apply the map of a phase:
    /// the components, then each parameter itself.</summary>
    internal RationalFunction[] Substitution(int phase)
    {
        var s = new RationalFunction[Field.Variables.Count];
        for (int i = 0; i < Dimension; i++) s[i] = _phases[phase][i];
        for (int i = Dimension; i < s.Length; i++) s[i] = Field.Variable(i);
        return s;
    }

    /// <summary>The Jacobian determinant det(∂φᵢ/∂x_j) of the map of a phase.</summary>
    /// <param name="phase">The phase.</param>
    /// <returns>The determinant, a rational function.</returns>
    public RationalFunction JacobianDeterminant(int phase = 0)
    {
        var c = Components(phase);
        var m = new RationalFunction[Dimension, Dimension];
        for (int i = 0; i < Dimension; i++)
            for (int j = 0; j < Dimension; j++) m[i, j] = c[i].Derivative(StateVariables[j]);
        return RationalMap.Determinant(Field, m);
    }

    /// <summary>The map of an autonomous scalar recurrence of order k on (x_n, …, x_{n+k−1}).</summary>
    /// <param name="recurrence">The recurrence; the index must not appear explicitly.</param>
    /// <returns>The map.</returns>
    /// <exception cref="ArgumentException">The recurrence is non-autonomous (use the overload with phase values).</exception>
    public static IntegralMap FromRecurrence(Recurrence recurrence)
    {
        ArgumentNullException.ThrowIfNull(recurrence);
        if (!recurrence.IsAutonomous)
            throw new ArgumentException($"'{recurrence.Text}': the index {recurrence.Index} appears explicitly; integrals are searched for autonomous maps, or for periodic coefficients given as phase values of a parameter", nameof(recurrence));
        return FromRecurrence(recurrence, []);
    }

    /// <summary>The map of a scalar recurrence whose parameters take periodic values: at steps where the equation's
    /// index n ≡ j (mod P), parameter q is replaced by <c>phaseValues[j][q]</c> (an expression in the remaining
    /// parameters), e.g. <c>[{a: "b"}, {a: "-b"}]</c> for a_n = (−1)ⁿ b.</summary>
    /// <param name="recurrence">An autonomous recurrence (the periodicity enters through the phase values).</param>
    /// <param name="phaseValues">One substitution per phase (P = count); empty for an autonomous map.</param>
    /// <returns>The map with P phases; phase j is applied to the state (x_n, …) with n ≡ j (mod P).</returns>
    /// <exception cref="ArgumentException">Non-autonomous recurrence, a name that is not a parameter, or an unreadable value.</exception>
    public static IntegralMap FromRecurrence(Recurrence recurrence, IReadOnlyList<IReadOnlyDictionary<string, string>> phaseValues)
    {
        ArgumentNullException.ThrowIfNull(recurrence);
        ArgumentNullException.ThrowIfNull(phaseValues);
        if (!recurrence.IsAutonomous)
            throw new ArgumentException($"'{recurrence.Text}': the index {recurrence.Index} appears explicitly; give periodic coefficients as phase values of a parameter instead", nameof(recurrence));
        int k = recurrence.Order;
        var state = Enumerable.Range(0, k).Select(i => ShiftedName(recurrence.Unknown, recurrence.Index, i)).ToArray();
        var substituted = new HashSet<string>(StringComparer.Ordinal);
        foreach (var phase in phaseValues)
            foreach (var name in (phase ?? throw new ArgumentNullException(nameof(phaseValues))).Keys)
            {
                if (!recurrence.Parameters.Contains(name))
                    throw new ArgumentException($"phase value for '{name}', which is not a parameter of '{recurrence.Text}' (parameters: {(recurrence.Parameters.Length == 0 ? "none" : string.Join(", ", recurrence.Parameters))})", nameof(phaseValues));
                substituted.Add(name);
            }
        var kept = recurrence.Parameters.Where(p => !substituted.Contains(p)).ToList();
        var extra = new List<string>();
        var parsedValues = new List<Dictionary<string, string>>();
        foreach (var phase in phaseValues) parsedValues.Add(phase.ToDictionary(kv => kv.Key, kv => kv.Value, StringComparer.Ordinal));
        // Names used in the phase values that are not parameters become new parameters.
        foreach (var phase in parsedValues)
            foreach (var (name, text) in phase)
                foreach (var sym in ExpressionEvaluator.Symbols(ParseValue(name, text)))
                    if (!state.Contains(sym.Name) && !kept.Contains(sym.Name) && !extra.Contains(sym.Name)) extra.Add(sym.Name);
        var parameters = kept.Concat(extra).ToImmutableArray();
        var field = new RationalFunctionField([.. state, .. parameters]);
        int phases = Math.Max(1, parsedValues.Count);
        var result = ImmutableArray.CreateBuilder<ImmutableArray<RationalFunction>>(phases);
        for (int j = 0; j < phases; j++)
        {
            var input = new RationalFunction[recurrence.Rule.InputCount];
            for (int i = 0; i < k; i++) input[i] = field.Variable(i);
            for (int p = 0; p < recurrence.Parameters.Length; p++)
            {
                string name = recurrence.Parameters[p];
                input[k + p] = parsedValues.Count > 0 && parsedValues[j].TryGetValue(name, out var text)
                    ? ExpressionEvaluator.Evaluate(ParseValue(name, text), field, s => field.Variable(s.Name))
                    : field.Variable(name);
            }
            RationalFunction next;
            try
            {
                next = recurrence.Rule.Evaluate(field, input);
            }
            catch (ProgramEvaluationException e)
            {
                throw new ArgumentException($"'{recurrence.Text}' has no rule as a rational map (phase {j}): {e.Message}", nameof(recurrence), e);
            }
            var comps = new RationalFunction[k];
            for (int i = 0; i + 1 < k; i++) comps[i] = field.Variable(i + 1);
            comps[k - 1] = next;
            result.Add([.. comps]);
        }
        string desc = recurrence.Text + (parsedValues.Count == 0 ? "" :
            "  with " + string.Join("; ", parsedValues.Select((d, j) => $"n ≡ {j} (mod {phases}): " + string.Join(", ", d.Select(kv => $"{kv.Key} = {kv.Value}")))));
        // Phase j is applied when the state starts at x_n with n ≡ j; the equation's index there is n − (lowest shift).
        var byStateIndex = new ImmutableArray<RationalFunction>[phases];
        for (int j = 0; j < phases; j++)
        {
            long eqIndex = j - recurrence.LowestShift;
            byStateIndex[j] = result[(int)(((eqIndex % phases) + phases) % phases)];
        }
        return new IntegralMap(desc, field, [.. state], parameters, [.. byStateIndex]);
    }

    private static Expression ParseValue(string name, string text)
    {
        try
        {
            return ExpressionParser.Parse(text);
        }
        catch (ExpressionParseException e)
        {
            throw new ArgumentException($"phase value for '{name}': {e.Message}", e);
        }
    }

    /// <summary>The map of an autonomous system on the windows of its unknowns (u_n, …, u_{n+k_u−1} for each unknown u).</summary>
    /// <param name="system">The system.</param>
    /// <returns>The map.</returns>
    /// <exception cref="ArgumentException">The system is non-autonomous or has no rule as a rational map.</exception>
    public static IntegralMap FromSystem(RecurrenceSystem system)
    {
        ArgumentNullException.ThrowIfNull(system);
        if (!system.IsAutonomous)
            throw new ArgumentException($"'{system.Text}': the index {system.Index} appears explicitly; integrals are searched for autonomous maps", nameof(system));
        var names = new List<string>();
        for (int u = 0; u < system.Unknowns.Length; u++)
            for (int i = 0; i < system.Orders[u]; i++) names.Add(ShiftedName(system.Unknowns[u], system.Index, i));
        var field = new RationalFunctionField([.. names, .. system.Parameters]);
        int dim = names.Count;
        var input = new RationalFunction[system.Rule.InputCount];
        for (int i = 0; i < dim; i++) input[i] = field.Variable(i);
        for (int p = 0; p < system.Parameters.Length; p++) input[dim + p] = field.Variable(system.Parameters[p]);
        var fresh = new RationalFunction[system.Unknowns.Length];
        try
        {
            system.Rule.EvaluateAll(field, input, fresh);
        }
        catch (ProgramEvaluationException e)
        {
            throw new ArgumentException($"'{system.Text}' has no rule as a rational map: {e.Message}", nameof(system), e);
        }
        var comps = new RationalFunction[dim];
        int o = 0;
        for (int u = 0; u < system.Unknowns.Length; u++)
        {
            int k = system.Orders[u];
            for (int i = 0; i + 1 < k; i++) comps[o + i] = field.Variable(o + i + 1);
            comps[o + k - 1] = fresh[u];
            o += k;
        }
        return new IntegralMap(system.Text, field, [.. names], system.Parameters, [[.. comps]]);
    }

    /// <summary>The map of a <see cref="RationalMap"/> (e.g. a QRT map or a plane map built from two rational functions).</summary>
    /// <param name="map">The map.</param>
    /// <returns>The same map, with its state variables and parameters.</returns>
    public static IntegralMap FromMap(RationalMap map)
    {
        ArgumentNullException.ThrowIfNull(map);
        var field = new RationalFunctionField([.. map.StateVariables, .. map.Parameters]);
        var components = map.Components.Select(field.Embed).ToArray();
        return new IntegralMap(map.ToString(), field, map.StateVariables, map.Parameters, [[.. components]]);
    }

    /// <summary>A map given by its components.</summary>
    /// <param name="field">The field; its first <c>components.Count</c> variables are the state variables, the rest parameters.</param>
    /// <param name="components">φ₁, …, φ_k over <paramref name="field"/>.</param>
    /// <returns>The map.</returns>
    /// <exception cref="ArgumentException">No components, more components than variables, or a component from another field.</exception>
    public static IntegralMap FromComponents(RationalFunctionField field, IReadOnlyList<RationalFunction> components) =>
        Periodic(field, [components]);

    /// <summary>A map with periodic coefficients given by one list of components per phase (applied in turn,
    /// phase j to states with n ≡ j mod P).</summary>
    /// <param name="field">The field; its first k variables are the state variables, the rest parameters.</param>
    /// <param name="phases">For each phase, the k components.</param>
    /// <returns>The map.</returns>
    /// <exception cref="ArgumentException">No phases, phases of different sizes, or a component from another field.</exception>
    public static IntegralMap Periodic(RationalFunctionField field, IReadOnlyList<IReadOnlyList<RationalFunction>> phases)
    {
        ArgumentNullException.ThrowIfNull(field);
        ArgumentNullException.ThrowIfNull(phases);
        if (phases.Count == 0) throw new ArgumentException("a map needs at least one phase", nameof(phases));
        int k = phases[0].Count;
        if (k == 0 || k > field.Variables.Count)
            throw new ArgumentException($"{k} components for a field with {field.Variables.Count} variables", nameof(phases));
        var list = ImmutableArray.CreateBuilder<ImmutableArray<RationalFunction>>();
        for (int j = 0; j < phases.Count; j++)
        {
            if (phases[j].Count != k) throw new ArgumentException($"phase {j} has {phases[j].Count} components, phase 0 has {k}", nameof(phases));
            foreach (var c in phases[j])
                if (c is null || !c.Field.Equals(field)) throw new ArgumentException($"phase {j}: a component is null or belongs to another field than {field}", nameof(phases));
            list.Add([.. phases[j]]);
        }
        var state = field.Variables.Take(k).ToImmutableArray();
        var pars = field.Variables.Skip(k).ToImmutableArray();
        string text = string.Join(" | ", list.Select(ph => "(" + string.Join(", ", state) + ") ↦ (" + string.Join(", ", ph) + ")"));
        return new IntegralMap(text, field, state, pars, list.ToImmutable());
    }

    /// <summary>The name of u shifted by s in the equation's own notation: <c>x_n</c>, <c>x_{n+1}</c>.</summary>
    internal static string ShiftedName(string unknown, string index, int shift) =>
        shift == 0 ? $"{unknown}_{index}" : $"{unknown}_{{{index}+{shift}}}";

    /// <inheritdoc/>
    public override string ToString() => Text;
}
