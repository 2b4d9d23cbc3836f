using System.Numerics;
using Integrable.Kernels.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Tests.Kernels.LinearAlgebra;

public class LehmerReconstructionTests
{
    private static BigInteger RandomBig(Random rng, int bits)
    {
        var bytes = new byte[bits / 8 + 2];
        rng.NextBytes(bytes);
        bytes[^1] = 0;
        return new BigInteger(bytes) >> (bytes.Length * 8 - 8 - bits);
    }

    [Fact]
    public void AgreesWithPlainHalfExtendedEuclid()
    {
        // The plain algorithm (Wang 1981) in Numbers.RationalReconstruction is the reference.
        var rng = new Random(3);
        for (int t = 0; t < 150; t++)
        {
            int bits = rng.Next(64, 2000);
            var m = RandomBig(rng, bits) | BigInteger.One;
            BigInteger a;
            if (t % 2 == 0)
            {
                // A genuine fraction n/d with |n|, d below √(m/2): reconstruction must find it.
                var n = RandomBig(rng, rng.Next(1, bits / 2 - 2)) * (rng.Next(2) == 0 ? 1 : -1);
                var d = RandomBig(rng, rng.Next(1, bits / 2 - 2)) + 1;
                if (!BigInteger.GreatestCommonDivisor(d, m).IsOne) continue;
                a = ((n % m + m) % m) * ModInverse(d, m) % m;
                Assert.True(LehmerReconstruction.TryReconstruct(a, m, RationalReconstruction.Sqrt(m / 2), RationalReconstruction.Sqrt(m / 2), out var got));
                Assert.Equal(new Rational(n, d), got);
            }
            else a = RandomBig(rng, bits) % m;
            var bound = RationalReconstruction.Sqrt(m / 2);
            bool ok1 = RationalReconstruction.TryReconstruct(a, m, bound, bound, out var r1);
            bool ok2 = LehmerReconstruction.TryReconstruct(a, m, bound, bound, out var r2);
            Assert.Equal(ok1, ok2);
            if (ok1) Assert.Equal(r1, r2);
            // Unbalanced bounds too.
            var nb = bound << 10; var db = bound >> 10;
            ok1 = RationalReconstruction.TryReconstruct(a, m, nb, db, out r1);
            ok2 = LehmerReconstruction.TryReconstruct(a, m, nb, db, out r2);
            Assert.Equal(ok1, ok2);
            if (ok1) Assert.Equal(r1, r2);
        }
    }

    private static BigInteger ModInverse(BigInteger d, BigInteger m)
    {
        BigInteger r0 = m, r1 = ((d % m) + m) % m, t0 = 0, t1 = 1;
        while (!r1.IsZero)
        {
            var q = BigInteger.DivRem(r0, r1, out var rem);
            (r0, r1) = (r1, rem);
            (t0, t1) = (t1, t0 - q * t1);
        }
        return ((t0 % m) + m) % m;
    }
}
