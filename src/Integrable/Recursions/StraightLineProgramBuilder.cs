using System.Collections.Immutable;
using Integrable.Numbers;

namespace Integrable.Recursions;

/// <summary>Builds a <see cref="StraightLineProgram"/> step by step, sharing identical
/// subexpressions (hash-consing) and folding operations on constants.</summary>
/// <example><code>
/// var b = new StraightLineProgramBuilder(inputCount: 2);
/// int x = b.Input(0), y = b.Input(1);
/// int r = b.Divide(b.Add(b.Multiply(x, x), b.Constant(1)), y);   // (x² + 1)/y
/// StraightLineProgram p = b.Build(r);
/// </code></example>
public sealed class StraightLineProgramBuilder
{
    private readonly List<ProgramInstruction> _instructions = new();
    private readonly Dictionary<ProgramInstruction, int> _seen = new();
    private readonly List<Rational> _constants = new();
    private readonly Dictionary<Rational, int> _constantIndex = new();
    private readonly Dictionary<int, Rational> _constantValue = new();

    /// <summary>Creates a builder for programs with <paramref name="inputCount"/> input slots.</summary>
    /// <param name="inputCount">Number of inputs, non-negative.</param>
    public StraightLineProgramBuilder(int inputCount)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(inputCount);
        InputCount = inputCount;
    }

    /// <summary>Number of input slots.</summary>
    public int InputCount { get; }

    /// <summary>The instructions emitted so far (including ones the final program may drop).</summary>
    internal IReadOnlyList<ProgramInstruction> Instructions => _instructions;

    /// <summary>The constant with table index <paramref name="index"/>.</summary>
    internal Rational ConstantAt(int index) => _constants[index];

    private int Emit(ProgramInstruction ins)
    {
        if (_seen.TryGetValue(ins, out int index)) return index;
        _instructions.Add(ins);
        index = _instructions.Count - 1;
        _seen[ins] = index;
        return index;
    }

    private void Check(int step)
    {
        if ((uint)step >= (uint)_instructions.Count)
            throw new ArgumentOutOfRangeException(nameof(step), step, "not an instruction of this builder");
    }

    private bool IsConstant(int step, out Rational value) => _constantValue.TryGetValue(step, out value);

    /// <summary>Loads input slot <paramref name="slot"/>.</summary>
    /// <param name="slot">The slot, in [0, InputCount).</param>
    /// <returns>The step index.</returns>
    public int Input(int slot)
    {
        if ((uint)slot >= (uint)InputCount) throw new ArgumentOutOfRangeException(nameof(slot), slot, $"inputs are 0..{InputCount - 1}");
        return Emit(new ProgramInstruction(ProgramOp.Input, slot, 0));
    }

    /// <summary>Loads a rational constant.</summary>
    /// <param name="value">The constant.</param>
    /// <returns>The step index.</returns>
    public int Constant(Rational value)
    {
        if (!_constantIndex.TryGetValue(value, out int c))
        {
            _constants.Add(value);
            c = _constants.Count - 1;
            _constantIndex[value] = c;
        }
        int step = Emit(new ProgramInstruction(ProgramOp.Constant, c, 0));
        _constantValue[step] = value;
        return step;
    }

    /// <summary>Sum of two steps.</summary>
    /// <param name="a">First step.</param>
    /// <param name="b">Second step.</param>
    /// <returns>The step index.</returns>
    public int Add(int a, int b)
    {
        Check(a); Check(b);
        if (IsConstant(a, out var ca) && IsConstant(b, out var cb)) return Constant(ca + cb);
        if (IsConstant(a, out ca) && ca.IsZero) return b;
        if (IsConstant(b, out cb) && cb.IsZero) return a;
        return Emit(new ProgramInstruction(ProgramOp.Add, Math.Min(a, b), Math.Max(a, b)));
    }

    /// <summary>Difference of two steps.</summary>
    /// <param name="a">Minuend.</param>
    /// <param name="b">Subtrahend.</param>
    /// <returns>The step index.</returns>
    public int Subtract(int a, int b)
    {
        Check(a); Check(b);
        if (IsConstant(a, out var ca) && IsConstant(b, out var cb)) return Constant(ca - cb);
        if (IsConstant(b, out cb) && cb.IsZero) return a;
        return Emit(new ProgramInstruction(ProgramOp.Subtract, a, b));
    }

    /// <summary>Product of two steps.</summary>
    /// <param name="a">First factor.</param>
    /// <param name="b">Second factor.</param>
    /// <returns>The step index.</returns>
    public int Multiply(int a, int b)
    {
        Check(a); Check(b);
        if (IsConstant(a, out var ca) && IsConstant(b, out var cb)) return Constant(ca * cb);
        if (IsConstant(a, out ca) && ca.IsOne) return b;
        if (IsConstant(b, out cb) && cb.IsOne) return a;
        if ((IsConstant(a, out ca) && ca.IsZero) || (IsConstant(b, out cb) && cb.IsZero)) return Constant(Rational.Zero);
        return Emit(new ProgramInstruction(ProgramOp.Multiply, Math.Min(a, b), Math.Max(a, b)));
    }

    /// <summary>Quotient of two steps (exact division in the evaluation domain).</summary>
    /// <param name="a">Dividend.</param>
    /// <param name="b">Divisor.</param>
    /// <returns>The step index.</returns>
    /// <exception cref="DivideByZeroException"><paramref name="b"/> is the constant zero.</exception>
    public int Divide(int a, int b)
    {
        Check(a); Check(b);
        if (IsConstant(b, out var cb))
        {
            if (cb.IsZero) throw new DivideByZeroException("division by the constant zero");
            if (IsConstant(a, out var ca)) return Constant(ca / cb);
            if (cb.IsOne) return a;
        }
        return Emit(new ProgramInstruction(ProgramOp.Divide, a, b));
    }

    /// <summary>Negation of a step.</summary>
    /// <param name="a">The step.</param>
    /// <returns>The step index.</returns>
    public int Negate(int a)
    {
        Check(a);
        if (IsConstant(a, out var ca)) return Constant(-ca);
        if (_instructions[a].Op == ProgramOp.Negate) return _instructions[a].A;   // −(−x) = x
        return Emit(new ProgramInstruction(ProgramOp.Negate, a, 0));
    }

    /// <summary>Integer power of a step (negative exponents divide).</summary>
    /// <param name="a">The base step.</param>
    /// <param name="exponent">The exponent.</param>
    /// <returns>The step index.</returns>
    public int Power(int a, int exponent)
    {
        Check(a);
        if (exponent == 0) return Constant(Rational.One);
        if (exponent == 1) return a;
        if (IsConstant(a, out var ca))
        {
            if (ca.IsZero && exponent < 0) throw new DivideByZeroException("zero raised to a negative power");
            return Constant(ca.Pow(exponent));
        }
        return Emit(new ProgramInstruction(ProgramOp.Power, a, exponent));
    }

    /// <summary>Finishes the program with the given output steps.</summary>
    /// <param name="outputs">Output steps; at least one.</param>
    /// <returns>The immutable program, keeping only the instructions the outputs need.</returns>
    public StraightLineProgram Build(params int[] outputs)
    {
        if (outputs.Length == 0) throw new ArgumentException("a program needs at least one output", nameof(outputs));
        foreach (var o in outputs) Check(o);
        // Dead-code elimination: keep the instructions reachable from the outputs, renumbered.
        var live = new bool[_instructions.Count];
        foreach (var o in outputs) live[o] = true;
        for (int i = _instructions.Count - 1; i >= 0; i--)
        {
            if (!live[i]) continue;
            var ins = _instructions[i];
            if (ins.Op is ProgramOp.Add or ProgramOp.Subtract or ProgramOp.Multiply or ProgramOp.Divide) { live[ins.A] = true; live[ins.B] = true; }
            else if (ins.Op is ProgramOp.Negate or ProgramOp.Power) live[ins.A] = true;
        }
        var map = new int[_instructions.Count];
        var kept = ImmutableArray.CreateBuilder<ProgramInstruction>();
        for (int i = 0; i < _instructions.Count; i++)
        {
            if (!live[i]) { map[i] = -1; continue; }
            var ins = _instructions[i];
            map[i] = kept.Count;
            kept.Add(ins.Op switch
            {
                ProgramOp.Add or ProgramOp.Subtract or ProgramOp.Multiply or ProgramOp.Divide => ins with { A = map[ins.A], B = map[ins.B] },
                ProgramOp.Negate or ProgramOp.Power => ins with { A = map[ins.A] },
                _ => ins,
            });
        }
        return new StraightLineProgram(InputCount, _constants.ToImmutableArray(), kept.ToImmutable(),
            outputs.Select(o => map[o]).ToImmutableArray());
    }
}
