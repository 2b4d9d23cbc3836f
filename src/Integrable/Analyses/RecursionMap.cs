using System.Collections.Immutable;
using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Recursions;

namespace Integrable.Analyses;

/// <summary>A scalar recurrence or a system seen as a map on its state (the last k values, or every
/// unknown's window), so that an analysis can iterate either in any ring.</summary>
internal sealed class RecursionMap
{
    private readonly Recurrence? _scalar;
    private readonly RecurrenceSystem? _system;

    public RecursionMap(Recurrence recurrence, long start = 0)
    {
        _scalar = recurrence;
        Start = start;
        Text = recurrence.Text;
        Dimension = recurrence.Order;
        Parameters = recurrence.Parameters;
        IsAutonomous = recurrence.IsAutonomous;
        Rule = recurrence.Rule;
        StateNames = [.. Enumerable.Range(0, recurrence.Order).Select(i => recurrence.TermName(start + i))];
    }

    public RecursionMap(RecurrenceSystem system)
    {
        _system = system;
        Text = system.Text;
        Dimension = system.Dimension;
        Parameters = system.Parameters;
        IsAutonomous = system.IsAutonomous;
        Rule = system.Rule;
        var names = new List<string>();
        for (int u = 0; u < system.Unknowns.Length; u++)
            for (int i = 0; i < system.Orders[u]; i++) names.Add(LaurentPhenomenon.TermName(system.Unknowns[u], i));
        StateNames = [.. names];
    }

    public string Text { get; }
    public long Start { get; }
    public int Dimension { get; }
    public ImmutableArray<string> Parameters { get; }
    public bool IsAutonomous { get; }
    public StraightLineProgram Rule { get; }
    public ImmutableArray<string> StateNames { get; }
    public bool IsScalar => _scalar is not null;

    /// <summary>Number of new values per step (1 for a scalar recurrence, the number of unknowns for a system).</summary>
    public int OutputCount => Rule.Outputs.Length;

    /// <summary>Name of the value computed by output <paramref name="output"/> at step <paramref name="step"/> (0-based).</summary>
    public string NewTermName(int step, int output) => _scalar is not null
        ? _scalar.TermName(Start + _scalar.Order + step)
        : LaurentPhenomenon.TermName(_system!.Unknowns[output], step + _system.Orders[output]);

    /// <summary>Index of the value computed at step <paramref name="step"/> by output <paramref name="output"/>.</summary>
    public long NewTermIndex(int step, int output) => _scalar is not null ? Start + _scalar.Order + step : step + _system!.Orders[output];

    /// <summary>Position in the state of output <paramref name="output"/>'s newest value.</summary>
    public int NewestSlot(int output)
    {
        if (_scalar is not null) return Dimension - 1;
        int o = 0;
        for (int u = 0; u <= output; u++) o += _system!.Orders[u];
        return o - 1;
    }

    /// <summary>One step: the next state from <paramref name="state"/> (step number <paramref name="step"/>, 0-based).</summary>
    /// <exception cref="ProgramEvaluationException">A division fails in <paramref name="ring"/>.</exception>
    public T[] Step<T>(IRing<T> ring, T[] state, ReadOnlySpan<T> parameters, int step, T[]? newValues = null)
    {
        var input = new T[Rule.InputCount];
        state.AsSpan().CopyTo(input);
        parameters.CopyTo(input.AsSpan(Dimension));
        if (!IsAutonomous)
            input[^1] = ring.FromInteger(_scalar is not null
                ? Start + step - _scalar.LowestShift
                : step - _system!.LowestShifts[0]);
        var fresh = newValues ?? new T[OutputCount];
        Rule.EvaluateAll(ring, input, fresh);
        var next = new T[Dimension];
        if (_scalar is not null)
        {
            Array.Copy(state, 1, next, 0, Dimension - 1);
            next[^1] = fresh[0];
            return next;
        }
        int o = 0;
        for (int u = 0; u < _system!.Unknowns.Length; u++)
        {
            int k = _system.Orders[u];
            Array.Copy(state, o + 1, next, o, k - 1);
            next[o + k - 1] = fresh[u];
            o += k;
        }
        return next;
    }

    /// <summary>Checks parameter values against the map's parameters.</summary>
    public Dictionary<string, Rational> CheckParameters(IReadOnlyDictionary<string, Rational>? values, string paramName)
    {
        var result = new Dictionary<string, Rational>(StringComparer.Ordinal);
        if (values is null) return result;
        foreach (var (name, value) in values)
        {
            if (!Parameters.Contains(name))
                throw new ArgumentException($"'{name}' is not a parameter (parameters: {(Parameters.Length == 0 ? "none" : string.Join(", ", Parameters))})", paramName);
            result[name] = value;
        }
        return result;
    }
}
