namespace Integrable.Recursions;

/// <summary>One step of a straight-line program: an operation on the results of earlier steps.</summary>
/// <param name="Op">The operation.</param>
/// <param name="A">First operand: an earlier step index, an input slot (for <see cref="ProgramOp.Input"/>) or a constant index (for <see cref="ProgramOp.Constant"/>).</param>
/// <param name="B">Second operand: an earlier step index, or the exponent for <see cref="ProgramOp.Power"/>.</param>
public readonly record struct ProgramInstruction(ProgramOp Op, int A, int B);
