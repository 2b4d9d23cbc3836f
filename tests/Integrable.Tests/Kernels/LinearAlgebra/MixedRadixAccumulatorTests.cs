using System.Numerics;
using Integrable.Kernels.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Tests.Kernels.LinearAlgebra;

public class MixedRadixAccumulatorTests
{
    [Fact]
    public void Values_MatchBigIntegerRemainders()
    {
        // Random integers below the product of the primes are recovered exactly (Chinese remainder theorem).
        var rng = new Random(4);
        foreach (bool small in new[] { false, true })
        {
            var primes = small ? new ulong[] { 101, 103, 107, 109, 113, 127, 131, 137, 139, 149 } : Enumerable.Range(0, 10).Select(Primes.Large).ToArray();
            BigInteger m = 1;
            foreach (var p in primes) m *= p;
            var values = Enumerable.Range(0, 40).Select(i =>
            {
                var bytes = new byte[(int)(m.GetBitLength() / 8) + 2];
                rng.NextBytes(bytes);
                bytes[^1] = 0;
                return i < 3 ? (i == 0 ? BigInteger.Zero : m - i) : new BigInteger(bytes) % m;
            }).ToArray();
            var acc = new MixedRadixAccumulator(values.Length);
            BigInteger mk = 1;
            foreach (var p in primes)
            {
                var reducer = new ModularReducer(new PrimeField(p));
                acc.Add(reducer, values.Select(v => (ulong)(v % p)).ToArray());
                mk *= p;
                Assert.Equal(mk, acc.Modulus);
                for (int e = 0; e < values.Length; e++)
                {
                    Assert.Equal(values[e] % mk, acc.Value(e));
                    Assert.Equal((values[e] % mk).IsZero, acc.IsZero(e));
                }
            }
            Assert.Equal(primes.Length, acc.PrimeCount);
        }
    }
}
