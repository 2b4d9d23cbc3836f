using System.Numerics;
using Integrable.Kernels.LinearAlgebra;

namespace Integrable.Tests.Kernels.LinearAlgebra;

public class WordArithmeticTests
{
    private static BigInteger RandomBig(Random rng, int bits)
    {
        var bytes = new byte[bits / 8 + 2];
        rng.NextBytes(bytes);
        bytes[^1] = 0;
        return new BigInteger(bytes);
    }

    private static ulong[] Words(BigInteger v)
    {
        var w = new ulong[WordArithmetic.WordCount(v)];
        WordArithmetic.WriteMagnitude(v, w);
        return w;
    }

    [Fact]
    public void AddMul_And_Multiply_MatchBigInteger()
    {
        var rng = new Random(7);
        for (int t = 0; t < 200; t++)
        {
            var x = RandomBig(rng, rng.Next(1, 400));
            var y = RandomBig(rng, rng.Next(1, 200));
            var z = RandomBig(rng, rng.Next(1, 500));
            var acc = new ulong[(int)((Math.Max(z.GetBitLength(), x.GetBitLength() + y.GetBitLength()) + 1) / 64) + 2];
            WordArithmetic.WriteMagnitude(z, acc.AsSpan(0, WordArithmetic.WordCount(z)));
            WordArithmetic.AddMul(acc, Words(x), Words(y));
            Assert.Equal(z + x * y, WordArithmetic.ToBigInteger(acc, false));
            Assert.Equal(x * y, WordArithmetic.ToBigInteger(WordArithmetic.Multiply(Words(x), Words(y)), false));
        }
    }

    [Fact]
    public void TryDivideExact_DivisibleAndNot()
    {
        var rng = new Random(8);
        for (int t = 0; t < 300; t++)
        {
            var d = RandomBig(rng, rng.Next(1, 600)) + 1;
            var q = RandomBig(rng, rng.Next(0, 600));
            if (t % 3 == 0) d <<= rng.Next(0, 130);          // even divisors
            if (t % 5 == 0) q <<= rng.Next(0, 130);
            var a = q * d;
            var exact = WordArithmetic.TryDivideExact(Words(a), Words(d));
            Assert.NotNull(exact);
            Assert.Equal(q, WordArithmetic.ToBigInteger(exact, false));
            // Not divisible: perturb a.
            var b = a + 1 + RandomBig(rng, 20) % (d - 1 > 0 ? d - 1 : 1);
            if (b % d != 0) Assert.Null(WordArithmetic.TryDivideExact(Words(b), Words(d)));
            // A smaller dividend is never divisible unless zero.
            if (d > 1) Assert.Null(WordArithmetic.TryDivideExact(Words(d - 1), Words(d)));
        }
        Assert.Empty(WordArithmetic.TryDivideExact([], [3])!);
        Assert.Throws<DivideByZeroException>(() => WordArithmetic.TryDivideExact([1], []));
        // 2^128 / 2^64 and 2^64 + 1 / 2.
        Assert.Equal(new ulong[] { 0, 1 }, WordArithmetic.TryDivideExact([0, 0, 1], [0, 1]));
        Assert.Null(WordArithmetic.TryDivideExact([1, 1], [2]));
    }
}
