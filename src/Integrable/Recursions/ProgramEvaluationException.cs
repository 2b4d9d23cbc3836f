namespace Integrable.Recursions;

/// <summary>Thrown when a straight-line program cannot be evaluated in a domain: a division that is
/// not exact there (a zero or non-unit divisor), reported with the instruction that failed.</summary>
public sealed class ProgramEvaluationException : ArithmeticException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="instruction">Index of the failing instruction.</param>
    /// <param name="message">What failed.</param>
    public ProgramEvaluationException(int instruction, string message) : base(message) => Instruction = instruction;

    /// <summary>Index of the instruction that failed.</summary>
    public int Instruction { get; }
}
