using Integrable.Numbers;
using Integrable.Recursions;

namespace Integrable.Analyses;

/// <summary>Random primes and random points for the sampling steps of the analyses.</summary>
internal static class Sampling
{
    /// <summary>A random prime in (2^61, 2^62) such that every constant of <paramref name="rule"/> and
    /// every fixed parameter value has an image modulo it.</summary>
    public static PrimeField RandomField(Random rng, StraightLineProgram rule, IEnumerable<Rational> fixedValues)
    {
        var values = fixedValues.ToArray();
        while (true)
        {
            ulong n = (ulong)rng.NextInt64(1L << 61, (1L << 62) - 1_000_000) | 1UL;
            while (!Primes.IsPrime(n)) n += 2;
            var field = new PrimeField(n);
            if (rule.Constants.All(field.CanReduce) && values.All(field.CanReduce)) return field;
        }
    }

    public static ulong Element(Random rng, PrimeField field) => (ulong)rng.NextInt64(1, (long)field.Modulus);
}
