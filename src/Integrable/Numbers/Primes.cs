using System.Numerics;

namespace Integrable.Numbers;

/// <summary>Primality and a deterministic supply of large word-size primes for modular algorithms.</summary>
/// <remarks>The supply lists the primes below 2^62 in descending order; index 0 is the largest. The list
/// is the same on every machine and run, so modular computations are reproducible.</remarks>
public static class Primes
{
    private static readonly ulong[] WitnessBases = [2, 3, 5, 7, 11, 13, 17, 19, 23, 29, 31, 37];
    private static readonly List<ulong> Supply = new();
    private static readonly Lock SupplyLock = new();

    /// <summary>Deterministic Miller–Rabin test, exact for every 64-bit input (bases 2…37).</summary>
    /// <param name="n">The number to test.</param>
    /// <returns>True when <paramref name="n"/> is prime.</returns>
    public static bool IsPrime(ulong n)
    {
        if (n < 2) return false;
        foreach (var p in WitnessBases)
        {
            if (n == p) return true;
            if (n % p == 0) return false;
        }
        ulong d = n - 1;
        int s = BitOperations.TrailingZeroCount(d);
        d >>= s;
        foreach (var a in WitnessBases)
        {
            ulong x = PowMod(a, d, n);
            if (x == 1 || x == n - 1) continue;
            bool composite = true;
            for (int r = 1; r < s; r++)
            {
                x = (ulong)((UInt128)x * x % n);
                if (x == n - 1) { composite = false; break; }
            }
            if (composite) return false;
        }
        return true;
    }

    private static ulong PowMod(ulong a, ulong e, ulong n)
    {
        ulong result = 1 % n, b = a % n;
        while (e > 0)
        {
            if ((e & 1) != 0) result = (ulong)((UInt128)result * b % n);
            b = (ulong)((UInt128)b * b % n);
            e >>= 1;
        }
        return result;
    }

    /// <summary>The largest prime strictly below <paramref name="bound"/>.</summary>
    /// <param name="bound">Upper bound, at least 3.</param>
    /// <returns>The prime.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="bound"/> &lt; 3.</exception>
    public static ulong PreviousPrime(ulong bound)
    {
        if (bound < 3) throw new ArgumentOutOfRangeException(nameof(bound), bound, "there is no prime below it");
        ulong n = bound - 1;
        while (!IsPrime(n)) n--;
        return n;
    }

    /// <summary>The <paramref name="index"/>-th prime below 2^62 in descending order (index 0 = the largest).</summary>
    /// <param name="index">Index into the supply, non-negative.</param>
    /// <returns>A prime in (2^61, 2^62).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="index"/> is negative.</exception>
    public static ulong Large(int index)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(index);
        lock (SupplyLock)
        {
            while (Supply.Count <= index)
                Supply.Add(PreviousPrime(Supply.Count == 0 ? PrimeField.ModulusLimit : Supply[^1]));
            return Supply[index];
        }
    }
}
