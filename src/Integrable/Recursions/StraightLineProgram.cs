using System.Collections.Immutable;
using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Recursions;

/// <summary>A rational expression compiled to a flat list of ring operations (a straight-line
/// program) that evaluates in any domain implementing <see cref="IRing{T}"/>: Q, Z/pZ, Laurent
/// polynomials, series, rational functions, doubles…</summary>
/// <remarks>
/// A program has <see cref="InputCount"/> input slots (state variables, parameters, the index n),
/// a table of rational constants, and instructions that each refer only to earlier instructions, so
/// evaluation is one forward pass. Common subexpressions are shared when the program is built with
/// <see cref="StraightLineProgramBuilder"/>. The last instruction is the result unless
/// <see cref="Outputs"/> names several. Instances are immutable and safe to share between threads.
/// </remarks>
public sealed class StraightLineProgram
{
    internal StraightLineProgram(int inputCount, ImmutableArray<Rational> constants,
        ImmutableArray<ProgramInstruction> instructions, ImmutableArray<int> outputs)
    {
        InputCount = inputCount;
        Constants = constants;
        Instructions = instructions;
        Outputs = outputs;
        _fusion = PlanFusion(instructions, outputs);
    }

    // Per instruction: 0 = evaluate normally, -1 = skipped (a single-use part of a fused step),
    // 1 = a division (a·b + c·d)/e evaluated as one fused step; null when nothing fuses.
    private readonly sbyte[]? _fusion;

    /// <summary>Number of input slots.</summary>
    public int InputCount { get; }

    /// <summary>The rational constants referred to by <see cref="ProgramOp.Constant"/> instructions.</summary>
    public ImmutableArray<Rational> Constants { get; }

    /// <summary>The instructions in evaluation order.</summary>
    public ImmutableArray<ProgramInstruction> Instructions { get; }

    /// <summary>The instruction indices whose values are the program's results.</summary>
    public ImmutableArray<int> Outputs { get; }

    /// <summary>Evaluates the program and returns its first output.</summary>
    /// <typeparam name="T">Element type of the domain.</typeparam>
    /// <param name="ring">The domain.</param>
    /// <param name="inputs">Values of the input slots.</param>
    /// <returns>The value of the first output.</returns>
    /// <exception cref="ArgumentException">Wrong number of inputs.</exception>
    /// <exception cref="ProgramEvaluationException">A division is not exact in <paramref name="ring"/>.</exception>
    public T Evaluate<T>(IRing<T> ring, ReadOnlySpan<T> inputs)
    {
        var results = new T[Outputs.Length];
        EvaluateAll(ring, inputs, results);
        return results[0];
    }

    /// <summary>Evaluates the program and writes every output.</summary>
    /// <typeparam name="T">Element type of the domain.</typeparam>
    /// <param name="ring">The domain.</param>
    /// <param name="inputs">Values of the input slots.</param>
    /// <param name="outputs">Receives the outputs, in the order of <see cref="Outputs"/>.</param>
    /// <exception cref="ArgumentException">Wrong number of inputs or outputs.</exception>
    /// <exception cref="ProgramEvaluationException">A division is not exact in <paramref name="ring"/>.</exception>
    public void EvaluateAll<T>(IRing<T> ring, ReadOnlySpan<T> inputs, Span<T> outputs)
    {
        ArgumentNullException.ThrowIfNull(ring);
        if (inputs.Length != InputCount)
            throw new ArgumentException($"program expects {InputCount} inputs, got {inputs.Length}", nameof(inputs));
        if (outputs.Length != Outputs.Length)
            throw new ArgumentException($"program has {Outputs.Length} outputs, span has {outputs.Length}", nameof(outputs));
        var constants = new T[Constants.Length];
        for (int i = 0; i < constants.Length; i++) constants[i] = ring.FromRational(Constants[i]);
        var v = new T[Instructions.Length];
        var fused = _fusion is not null ? ring as IProductSumDivision<T> : null;
        for (int i = 0; i < v.Length; i++)
        {
            var ins = Instructions[i];
            if (fused is not null && _fusion![i] != 0)
            {
                if (_fusion[i] > 0) v[i] = DivideProductSum(ring, fused, v, ins, i);
                continue;
            }
            v[i] = ins.Op switch
            {
                ProgramOp.Input => inputs[ins.A],
                ProgramOp.Constant => constants[ins.A],
                ProgramOp.Add => ring.Add(v[ins.A], v[ins.B]),
                ProgramOp.Subtract => ring.Subtract(v[ins.A], v[ins.B]),
                ProgramOp.Multiply => ring.Multiply(v[ins.A], v[ins.B]),
                ProgramOp.Negate => ring.Negate(v[ins.A]),
                ProgramOp.Divide => Divide(ring, v[ins.A], v[ins.B], i),
                ProgramOp.Power => Power(ring, v[ins.A], ins.B, i),
                _ => throw new InvalidOperationException($"unknown instruction {ins.Op}"),
            };
        }
        for (int i = 0; i < outputs.Length; i++) outputs[i] = v[Outputs[i]];
    }

    /// <summary>Marks each division whose dividend is a single-use sum of two single-use products
    /// (a square x^2 counts as x·x) for the fused exchange step of <see cref="IProductSumDivision{T}"/>.</summary>
    private static sbyte[]? PlanFusion(ImmutableArray<ProgramInstruction> code, ImmutableArray<int> outputs)
    {
        var uses = new int[code.Length];
        foreach (var ins in code)
        {
            switch (ins.Op)
            {
                case ProgramOp.Add or ProgramOp.Subtract or ProgramOp.Multiply or ProgramOp.Divide:
                    uses[ins.A]++; uses[ins.B]++; break;
                case ProgramOp.Negate or ProgramOp.Power:
                    uses[ins.A]++; break;
            }
        }
        foreach (int o in outputs) uses[o]++;
        sbyte[]? plan = null;
        for (int i = 0; i < code.Length; i++)
        {
            var div = code[i];
            if (div.Op != ProgramOp.Divide || code[div.A].Op != ProgramOp.Add || uses[div.A] != 1) continue;
            var sum = code[div.A];
            if (sum.A == sum.B || !IsProduct(code[sum.A]) || !IsProduct(code[sum.B]) || uses[sum.A] != 1 || uses[sum.B] != 1) continue;
            plan ??= new sbyte[code.Length];
            plan[i] = 1;
            plan[div.A] = plan[sum.A] = plan[sum.B] = -1;
        }
        return plan;

        static bool IsProduct(ProgramInstruction ins) => ins.Op == ProgramOp.Multiply || (ins.Op == ProgramOp.Power && ins.B == 2);
    }

    private T DivideProductSum<T>(IRing<T> ring, IProductSumDivision<T> fused, T[] v, ProgramInstruction div, int step)
    {
        var sum = Instructions[div.A];
        var (p, q) = (Instructions[sum.A], Instructions[sum.B]);
        T a = v[p.A], b = p.Op == ProgramOp.Power ? a : v[p.B];
        T c = v[q.A], d = q.Op == ProgramOp.Power ? c : v[q.B];
        T e = v[div.B];
        if (ring.IsZero(e)) throw new ProgramEvaluationException(step, $"division by zero at instruction {step}");
        if (!fused.TryDivideProductSum(a, b, c, d, e, out var quotient))
            throw new ProgramEvaluationException(step, $"division at instruction {step} is not exact in {ring}");
        return quotient;
    }

    private static T Divide<T>(IRing<T> ring, T a, T b, int step)
    {
        if (ring.IsZero(b)) throw new ProgramEvaluationException(step, $"division by zero at instruction {step}");
        if (!ring.TryDivide(a, b, out var q))
            throw new ProgramEvaluationException(step, $"division at instruction {step} is not exact in {ring}");
        return q;
    }

    private static T Power<T>(IRing<T> ring, T a, int exponent, int step)
    {
        if (exponent < 0) return Divide(ring, ring.One, Power(ring, a, -exponent, step), step);
        T result = ring.One, b = a;
        bool first = true;
        while (exponent > 0)
        {
            if ((exponent & 1) != 0) { result = first ? b : ring.Multiply(result, b); first = false; }
            exponent >>= 1;
            if (exponent > 0) b = ring.Multiply(b, b);
        }
        return result;
    }

    /// <summary>A readable listing, one instruction per line (<c>%3 = %1 * %2</c>).</summary>
    /// <returns>The listing.</returns>
    public override string ToString()
    {
        var sb = new System.Text.StringBuilder();
        for (int i = 0; i < Instructions.Length; i++)
        {
            var ins = Instructions[i];
            sb.Append('%').Append(i).Append(" = ").Append(ins.Op switch
            {
                ProgramOp.Input => $"input {ins.A}",
                ProgramOp.Constant => Constants[ins.A].ToString(),
                ProgramOp.Add => $"%{ins.A} + %{ins.B}",
                ProgramOp.Subtract => $"%{ins.A} - %{ins.B}",
                ProgramOp.Multiply => $"%{ins.A} * %{ins.B}",
                ProgramOp.Divide => $"%{ins.A} / %{ins.B}",
                ProgramOp.Negate => $"-%{ins.A}",
                ProgramOp.Power => $"%{ins.A} ^ {ins.B}",
                _ => "?",
            }).AppendLine();
        }
        return sb.ToString();
    }
}
