using System.Collections.Immutable;
using Integrable.Algebra;
using Integrable.Recursions;
using Integrable.Text;

namespace Integrable.Solutions;

/// <summary>The residual left − right of a recursion, compiled once: inputs x_j, …, x_{j+k} (j = n + lowest shift),
/// then the parameters, then the index n of the equation as written (non-autonomous equations).</summary>
internal sealed class EquationResidual
{
    private EquationResidual(Recurrence recurrence, StraightLineProgram program)
    {
        Recurrence = recurrence;
        Program = program;
    }

    public Recurrence Recurrence { get; }
    public StraightLineProgram Program { get; }
    public int Order => Recurrence.Order;
    public int LowestShift => Recurrence.LowestShift;
    public ImmutableArray<string> Parameters => Recurrence.Parameters;

    public static EquationResidual Compile(Recurrence recurrence)
    {
        ArgumentNullException.ThrowIfNull(recurrence);
        var eq = recurrence.Equation;
        var shape = EquationReader.Analyse([eq], recurrence.Index);
        int k = recurrence.Order, lo = recurrence.LowestShift;
        var ps = recurrence.Parameters;
        var ring = new ProgramRing(k + 1 + ps.Length + (recurrence.IsAutonomous ? 0 : 1));
        int Slot(SymbolExpression s)
        {
            if (shape.Terms.TryGetValue(s.Name, out var t)) return ring.Input(t.Shift - lo);
            int p = ps.IndexOf(s.Name);
            if (p >= 0) return ring.Input(k + 1 + p);
            return ring.Input(k + 1 + ps.Length);
        }
        int left = ExpressionEvaluator.Evaluate(eq.Left, ring, Slot);
        int right = ExpressionEvaluator.Evaluate(eq.Right, ring, Slot);
        return new EquationResidual(recurrence, ring.Builder.Build(ring.Subtract(left, right)));
    }

    /// <summary>Evaluates the residual of the equation whose lowest term is x_j.</summary>
    public T Evaluate<T>(IRing<T> ring, long j, Func<long, T> term, ReadOnlySpan<T> parameters)
    {
        int k = Order;
        var inputs = new T[Program.InputCount];
        for (int i = 0; i <= k; i++) inputs[i] = term(j + i);
        for (int i = 0; i < parameters.Length; i++) inputs[k + 1 + i] = parameters[i];
        if (!Recurrence.IsAutonomous) inputs[^1] = ring.FromInteger(j - LowestShift);
        return Program.Evaluate(ring, inputs);
    }
}
