namespace Integrable.Recursions;

/// <summary>The instruction set of a <see cref="StraightLineProgram"/>.</summary>
public enum ProgramOp : byte
{
    /// <summary>Load input slot <c>A</c>.</summary>
    Input,
    /// <summary>Load constant number <c>A</c> of the constant table.</summary>
    Constant,
    /// <summary>r = A + B.</summary>
    Add,
    /// <summary>r = A − B.</summary>
    Subtract,
    /// <summary>r = A · B.</summary>
    Multiply,
    /// <summary>r = A / B (exact division in the domain; failure is reported with the instruction).</summary>
    Divide,
    /// <summary>r = −A.</summary>
    Negate,
    /// <summary>r = A^B for the integer B (negative B divides).</summary>
    Power,
}
