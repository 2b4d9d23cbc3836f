using System.Numerics;
using Integrable.Kernels.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Tests.Kernels.LinearAlgebra;

public class IntegerRowsTests
{
    private static Rational[] RandomRationals(Random rng, int count, int bits)
    {
        var r = new Rational[count];
        for (int e = 0; e < count; e++)
        {
            if (rng.Next(5) == 0) continue;   // zeros
            var bytes = new byte[bits / 8 + 1];
            rng.NextBytes(bytes);
            bytes[^1] &= 0x7F;
            var n = new BigInteger(bytes) - (BigInteger.One << (bits - 2));
            // Denominators sharing factors, as in orbit matrices: powers of two bases.
            var d = BigInteger.Pow(3, rng.Next(0, bits / 4)) * BigInteger.Pow(10, rng.Next(0, bits / 8)) * rng.Next(1, 4);
            r[e] = new Rational(n, d);
        }
        return r;
    }

    [Theory]
    [InlineData(8)]
    [InlineData(60)]
    [InlineData(400)]
    public void FromRational_RowsAreLcmTimesRows(int bits)
    {
        var rng = new Random(bits);
        int rows = 5, cols = 7;
        var a = RandomRationals(rng, rows * cols, bits);
        var b = IntegerRows.FromRational(a, rows, cols);
        for (int i = 0; i < rows; i++)
        {
            BigInteger l = 1;
            for (int j = 0; j < cols; j++) { var d = a[i * cols + j].Denominator; l = l / BigInteger.GreatestCommonDivisor(l, d) * d; }
            Assert.Equal(l, b.RowScales[i]);
            for (int j = 0; j < cols; j++)
            {
                Assert.Equal((Rational)b.Entry(i, j), a[i * cols + j] * l);
                Assert.Equal(b.Entry(i, j).IsZero ? 0 : BigInteger.Abs(b.Entry(i, j)).GetBitLength(), b.EntryBits(i, j));
            }
        }
    }

    [Fact]
    public void Annihilates_SmallAndWordPaths()
    {
        // Row space orthogonal to (1, 1, −1, 0) and not to (1, 0, 0, 0).
        foreach (var scale in new[] { BigInteger.One, BigInteger.Pow(2, 200) + 1 })
        {
            Rational s = scale;
            Rational[] a = [1 * s, 2 * s, 3 * s, 4, 5 * s, -7 * s, -2 * s, 9];
            var b = IntegerRows.FromRational(a, 2, 4);
            Assert.True(b.Annihilates([0, 1, 2], [1, 1, -1]));
            Assert.False(b.Annihilates([0], [1]));
            Assert.True(b.Annihilates([0, 1, 2], [BigInteger.Pow(3, 90), BigInteger.Pow(3, 90), -BigInteger.Pow(3, 90)]));
            Assert.False(b.Annihilates([0, 1, 2], [BigInteger.Pow(3, 90), BigInteger.Pow(3, 90), 1 - BigInteger.Pow(3, 90)]));
        }
    }
}
