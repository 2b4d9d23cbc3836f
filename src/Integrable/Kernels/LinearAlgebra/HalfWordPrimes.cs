using Integrable.Numbers;

namespace Integrable.Kernels.LinearAlgebra;

/// <summary>A deterministic supply of primes below 2^31 in descending order (index 0 is the largest),
/// for multimodular computations on large matrices: residues of such primes fit in 31 bits, so the
/// elimination kernels multiply them with one 32×32-bit product and no carries (see
/// <see cref="ModularReducer.Dot"/>), about three times faster per term than 62-bit primes, which more
/// than pays for the halved number of bits per prime when the elimination dominates.</summary>
internal static class HalfWordPrimes
{
    private static readonly List<ulong> Supply = [];
    private static readonly Lock SupplyLock = new();

    /// <summary>The <paramref name="index"/>-th prime below 2^31, descending.</summary>
    public static ulong Get(int index)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(index);
        lock (SupplyLock)
        {
            while (Supply.Count <= index)
                Supply.Add(Primes.PreviousPrime(Supply.Count == 0 ? ModularReducer.HalfWordLimit : Supply[^1]));
            return Supply[index];
        }
    }
}
