using System.Numerics;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Tests.LinearAlgebra;

public partial class RationalMatrixTests
{
    [Fact]
    public void Factories_BuildExpectedEntries()
    {
        var a = RationalMatrix.FromRows([[1, new Rational(2, 3)], [0, -5]]);
        Assert.Equal(2, a.RowCount);
        Assert.Equal(2, a.ColumnCount);
        Assert.Equal(new Rational(2, 3), a[0, 1]);
        Assert.Equal(a, RationalMatrix.FromArray(new Rational[,] { { 1, new Rational(2, 3) }, { 0, -5 } }));
        Assert.Equal(a, RationalMatrix.FromRowMajor(2, 2, [1, new Rational(4, 6), 0, -5]));
        Assert.Equal(a, RationalMatrix.Create(2, 2, (i, j) => a[i, j]));
        Assert.Equal(RationalMatrix.FromArray(new long[,] { { 1, 0 }, { 0, 1 } }), RationalMatrix.Identity(2));
        Assert.Equal(RationalMatrix.FromRows([[2, 0], [0, 3]]), RationalMatrix.Diagonal(2, 3));
        Assert.True(RationalMatrix.Zero(2, 3).IsZero);
        Assert.False(a.IsZero);
        Assert.Equal(new Rational[] { new(2, 3), -5 }, a.Column(1));
        Assert.Equal(new Rational[] { 0, -5 }, a.Row(1).ToArray());
        Assert.Equal(a[1, 1], a.ToArray()[1, 1]);
    }

    [Fact]
    public void Factories_BadInput_ThrowTypedExceptions()
    {
        var ex = Assert.Throws<DimensionMismatchException>(() => RationalMatrix.FromRows([[1, 2], [3]]));
        Assert.Contains("row 1", ex.Message);
        Assert.Throws<DimensionMismatchException>(() => RationalMatrix.FromRowMajor(2, 2, [1, 2, 3]));
        Assert.Throws<ArgumentOutOfRangeException>(() => RationalMatrix.Zero(-1, 2));
        var a = RationalMatrix.Identity(2);
        Assert.Throws<ArgumentOutOfRangeException>(() => a[2, 0]);
        Assert.Throws<ArgumentOutOfRangeException>(() => a[0, -1]);
        Assert.Throws<ArgumentOutOfRangeException>(() => a.Row(5).ToArray());
        Assert.Throws<ArgumentOutOfRangeException>(() => a.Column(2));
    }

    [Fact]
    public void Arithmetic_SmallExamples()
    {
        var a = RationalMatrix.FromRows([[1, 2], [3, 4]]);
        var b = RationalMatrix.FromRows([[0, 1], [new Rational(1, 2), -1]]);
        Assert.Equal(RationalMatrix.FromRows([[1, 3], [new Rational(7, 2), 3]]), a + b);
        Assert.Equal(RationalMatrix.FromRows([[1, 1], [new Rational(5, 2), 5]]), a - b);
        Assert.Equal(RationalMatrix.FromRows([[-1, -2], [-3, -4]]), -a);
        Assert.Equal(RationalMatrix.FromRows([[1, -1], [2, -1]]), a * b);
        Assert.Equal(RationalMatrix.FromRows([[new Rational(1, 2), 1], [new Rational(3, 2), 2]]), new Rational(1, 2) * a);
        Assert.Equal(a * 3, 3 * a);
        Assert.Equal(new Rational[] { 5, 11 }, a.Multiply([1, 2]));
        Assert.Equal(RationalMatrix.FromRows([[1, 3], [2, 4]]), a.Transpose());
        Assert.Equal(RationalMatrix.FromRows([[1, 2, 0, 1], [3, 4, new Rational(1, 2), -1]]), a.Augment(b));
        Assert.Throws<DimensionMismatchException>(() => a + RationalMatrix.Zero(2, 3));
        Assert.Throws<DimensionMismatchException>(() => a * RationalMatrix.Zero(3, 3));
        Assert.Throws<DimensionMismatchException>(() => a.Multiply([1]));
    }

    [Fact]
    public void Multiply_Random_MatchesTripleLoop()
    {
        var rng = new Random(4);
        var cases = new[]
        {
            (ReferenceLinearAlgebra.RandomInteger(rng, 5, 7, 1_000_000_000_000), ReferenceLinearAlgebra.RandomInteger(rng, 7, 3, 1_000_000_000_000)),
            (ReferenceLinearAlgebra.RandomRational(rng, 4, 4, 1000), ReferenceLinearAlgebra.RandomRational(rng, 4, 6, 1000)),
            (ReferenceLinearAlgebra.RandomHuge(rng, 3, 5, 150), ReferenceLinearAlgebra.RandomRational(rng, 5, 2, 50)),
            (ReferenceLinearAlgebra.RandomInteger(rng, 3, 64, long.MaxValue / 2), ReferenceLinearAlgebra.RandomInteger(rng, 64, 2, long.MaxValue / 2)),
            (RationalMatrix.Zero(3, 0), RationalMatrix.Zero(0, 2)),
        };
        foreach (var (a, b) in cases)
        {
            var expected = RationalMatrix.Create(a.RowCount, b.ColumnCount, (i, j) =>
            {
                Rational s = 0;
                for (int k = 0; k < a.ColumnCount; k++) s += a[i, k] * b[k, j];
                return s;
            });
            Assert.Equal(expected, a * b);
        }
    }

    [Fact]
    public void Equality_AndHash_FollowEntries()
    {
        var a = RationalMatrix.FromRows([[1, 2], [3, 4]]);
        var b = RationalMatrix.FromRows([[1, 2], [3, 4]]);
        Assert.True(a == b);
        Assert.Equal(a.GetHashCode(), b.GetHashCode());
        Assert.True(a != RationalMatrix.FromRows([[1, 2, 3, 4]]));
        Assert.NotEqual(RationalMatrix.Zero(0, 2), RationalMatrix.Zero(0, 3));
        Assert.False(a.Equals(null));
        Assert.False(a == null);
    }

    [Fact]
    public void Text_RoundTrips()
    {
        var rng = new Random(2);
        var matrices = new[]
        {
            RationalMatrix.FromRows([[1, new Rational(-2, 3)], [0, 5]]),
            ReferenceLinearAlgebra.RandomHuge(rng, 2, 3, 90),
            RationalMatrix.Zero(0, 0),
            RationalMatrix.Zero(0, 3),
            RationalMatrix.Zero(2, 0),
        };
        Assert.Equal("[[1, -2/3], [0, 5]]", matrices[0].ToString());
        Assert.Equal("[](0x3)", matrices[3].ToString());
        foreach (var m in matrices) Assert.Equal(m, RationalMatrix.Parse(m.ToString()));
        Assert.Equal("\\begin{pmatrix}1 & -\\frac{2}{3} \\\\ 0 & 5\\end{pmatrix}", matrices[0].ToLatex());
        var bad = Assert.Throws<FormatException>(() => RationalMatrix.Parse("[[1, x]]"));
        Assert.Contains("(0, 1)", bad.Message);
        Assert.Throws<FormatException>(() => RationalMatrix.Parse("[[1, 2]"));
        Assert.Throws<FormatException>(() => RationalMatrix.Parse("[[1, 2]] junk"));
        Assert.Throws<DimensionMismatchException>(() => RationalMatrix.Parse("[[1, 2], [3]]"));
    }

    [Fact]
    public void Builder_SetsEntriesAndCopies()
    {
        var b = new RationalMatrixBuilder(2, 3);
        b[0, 0] = 1;
        b.SetRow(1, [4, 5, new Rational(1, 6)]);
        var m = b.ToImmutable();
        b[0, 0] = 7;
        Assert.Equal(RationalMatrix.FromRows([[1, 0, 0], [4, 5, new Rational(1, 6)]]), m);
        Assert.Equal(7, b.ToImmutable()[0, 0]);
        Assert.Equal(m, new RationalMatrixBuilder(m).ToImmutable());
        Assert.Throws<DimensionMismatchException>(() => b.SetRow(0, [1]));
        Assert.Throws<ArgumentOutOfRangeException>(() => b[2, 0] = 1);
    }

    [Fact]
    public void ToModular_ReducesEntries_AndRejectsDivisibleDenominators()
    {
        var f = new PrimeField(7);
        var a = RationalMatrix.FromRows([[1, new Rational(1, 2)], [-1, 10]]);
        Assert.Equal(ModularMatrix.FromRows(f, [1, 4], [6, 3]), a.ToModular(f));
        var ex = Assert.Throws<DivideByZeroException>(() => RationalMatrix.FromRows([[new Rational(1, 14)]]).ToModular(f));
        Assert.Contains("(0, 0)", ex.Message);
        var big = RationalMatrix.FromRows([[new Rational(BigInteger.Pow(10, 40) + 1, 3)]]);
        Assert.Equal(f.FromRational(big[0, 0]), big.ToModular(f)[0, 0]);
    }

    [Fact]
    public void WithPrimitiveIntegerRows_ScalesEachRow()
    {
        var a = RationalMatrix.FromRows([[new Rational(1, 2), new Rational(-3, 4), 0], [0, 0, 0], [-6, 9, 12], [new Rational(-2, 3), 0, 0]]);
        Assert.Equal(RationalMatrix.FromRows([[2, -3, 0], [0, 0, 0], [-2, 3, 4], [-1, 0, 0]]), a.WithPrimitiveIntegerRows());
        var k = RationalMatrix.FromRows([[1, 2, 3], [2, 4, 7], [1, 2, 4]]).Nullspace().WithPrimitiveIntegerRows();
        Assert.Equal(RationalMatrix.FromRows([[-2, 1, 0]]), k);
    }
}
