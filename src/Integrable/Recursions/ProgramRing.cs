using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Recursions;

/// <summary>The "ring" of straight-line-program steps: evaluating an expression in it compiles the
/// expression into a program (with shared subexpressions and folded constants). Each step also
/// carries its value at two random points modulo a large prime, so that a step can be tested for
/// being identically zero (Schwartz–Zippel: a non-zero rational expression of modest degree vanishes
/// at a random point with probability about degree/p ≈ 10⁻¹⁶, and two independent points square it).</summary>
internal sealed class ProgramRing : IRing<int>
{
    private const int Points = 2;
    private readonly PrimeField _field = new(Primes.Large(7));
    private readonly List<ulong>[] _values = [new(), new()];
    private readonly ulong[][] _inputValues;
    private readonly bool[] _undefined = new bool[Points];

    public ProgramRing(int inputCount, int seed = 20261202)
    {
        Builder = new StraightLineProgramBuilder(inputCount);
        var rng = new Random(seed);
        _inputValues = new ulong[Points][];
        for (int k = 0; k < Points; k++)
        {
            _inputValues[k] = new ulong[inputCount];
            for (int i = 0; i < inputCount; i++) _inputValues[k][i] = (ulong)rng.NextInt64(2, (long)_field.Modulus - 1);
        }
        Zero = Builder.Constant(Rational.Zero);
        Track(Zero);
        One = Builder.Constant(Rational.One);
        Track(One);
    }

    public StraightLineProgramBuilder Builder { get; }

    public int Zero { get; }
    public int One { get; }

    public int Input(int slot) => Track(Builder.Input(slot));

    public int FromInteger(long value) => Track(Builder.Constant(value));
    public int FromRational(Rational value) => Track(Builder.Constant(value));
    public int Add(int a, int b) => Track(Builder.Add(a, b));
    public int Subtract(int a, int b) => Track(Builder.Subtract(a, b));
    public int Multiply(int a, int b) => Track(Builder.Multiply(a, b));
    public int Negate(int a) => Track(Builder.Negate(a));

    /// <summary>True when the step is (with overwhelming probability) identically zero.</summary>
    public bool IsZero(int a)
    {
        bool anyPoint = false;
        for (int k = 0; k < Points; k++)
        {
            if (_undefined[k]) continue;
            anyPoint = true;
            if (_values[k][a] != 0) return false;
        }
        if (!anyPoint) throw new InvalidOperationException("both random evaluation points hit a pole; cannot test for zero");
        return true;
    }

    public bool AreEqual(int a, int b) => IsZero(Subtract(a, b));

    public bool TryDivide(int a, int b, out int quotient)
    {
        if (IsZero(b)) { quotient = -1; return false; }
        quotient = Track(Builder.Divide(a, b));
        return true;
    }

    public int Power(int a, int exponent) => Track(Builder.Power(a, exponent));

    /// <summary>Value of a step at the first random point (for tests of the tracking).</summary>
    internal ulong ValueAt(int point, int step) => _values[point][step];

    // Computes the residues of every new step at the random points (steps are created in order, and
    // a step returned again by hash-consing already has its values).
    private int Track(int step)
    {
        var instructions = BuilderInstructions();
        for (int k = 0; k < Points; k++)
        {
            var vals = _values[k];
            while (vals.Count <= step)
            {
                var ins = instructions[vals.Count];
                vals.Add(Eval(k, ins));
            }
        }
        return step;
    }

    private IReadOnlyList<ProgramInstruction> BuilderInstructions() => Builder.Instructions;

    private ulong Eval(int k, ProgramInstruction ins)
    {
        var f = _field;
        var v = _values[k];
        switch (ins.Op)
        {
            case ProgramOp.Input: return _inputValues[k][ins.A];
            case ProgramOp.Constant:
                var c = Builder.ConstantAt(ins.A);
                return f.CanReduce(c) ? f.FromRational(c) : Poison(k);
            case ProgramOp.Add: return f.Add(v[ins.A], v[ins.B]);
            case ProgramOp.Subtract: return f.Subtract(v[ins.A], v[ins.B]);
            case ProgramOp.Multiply: return f.Multiply(v[ins.A], v[ins.B]);
            case ProgramOp.Negate: return f.Negate(v[ins.A]);
            case ProgramOp.Divide: return v[ins.B] == 0 ? Poison(k) : f.Divide(v[ins.A], v[ins.B]);
            case ProgramOp.Power:
                if (ins.B < 0 && v[ins.A] == 0) return Poison(k);
                return f.Pow(v[ins.A], ins.B);
            default: throw new InvalidOperationException($"unknown op {ins.Op}");
        }
    }

    // A random point that hits a pole (probability ~1e-16): mark it; the values there are meaningless.
    private ulong Poison(int k)
    {
        _undefined[k] = true;
        return 1;
    }

    public override string ToString() => "straight-line programs";
}
