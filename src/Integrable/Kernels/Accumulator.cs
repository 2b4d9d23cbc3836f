namespace Integrable.Kernels;

/// <summary>Accumulators of the word-coefficient paths (see <see cref="PolynomialMultiply.SelectAccumulator"/>).</summary>
internal enum Accumulator
{
    /// <summary>Signed 64-bit.</summary>
    Word64,
    /// <summary>Carry-free split sums of non-negative products below 2^96.</summary>
    Split96,
    /// <summary>Unsigned 128-bit for non-negative products.</summary>
    Unsigned128,
    /// <summary>Signed 128-bit.</summary>
    Word128,
    /// <summary>Signed 192-bit.</summary>
    Word192,
}
