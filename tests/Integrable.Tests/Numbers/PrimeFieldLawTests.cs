using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Tests.Algebra;

namespace Integrable.Tests.Numbers;

/// <summary>The ring-law suite on Z/pZ for a large prime, residues biased to 0, 1, p−1 and p/2.</summary>
public sealed class PrimeFieldLawTests : RingLaws<ulong>
{
    private static readonly PrimeField Field = new(Primes.Large(2));

    protected override IRing<ulong> Ring => Field;

    protected override ulong Generate(Random rng) => rng.Next(6) switch
    {
        0 => 0,
        1 => 1,
        2 => Field.Modulus - 1,
        3 => Field.Modulus / 2,
        _ => (ulong)rng.NextInt64(0, (long)Field.Modulus),
    };

    protected override bool IsCanonical(ulong value) => value < Field.Modulus;
}

/// <summary>The ring-law suite on the smallest field Z/2Z (Barrett reduction at its smallest width).</summary>
public sealed class SmallPrimeFieldLawTests : RingLaws<ulong>
{
    private static readonly PrimeField Field = new(2);

    protected override IRing<ulong> Ring => Field;

    protected override ulong Generate(Random rng) => (ulong)rng.Next(2);

    protected override bool IsCanonical(ulong value) => value < 2;
}
