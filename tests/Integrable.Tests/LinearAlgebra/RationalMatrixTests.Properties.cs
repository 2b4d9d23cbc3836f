using System.Numerics;
using CsCheck;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Tests.LinearAlgebra;

public partial class RationalMatrixTests
{
    // Entries biased to edge cases: 0, ±1, small, just past 64 bits, fractions.
    private static readonly Gen<Rational> Entry = Gen.OneOf(
        Gen.Const(Rational.Zero), Gen.Const(Rational.One), Gen.Const(Rational.NegativeOne),
        Gen.Int[-5, 5].Select(i => (Rational)i),
        Gen.Select(Gen.Int[-9, 9], Gen.Int[1, 9]).Select((n, d) => new Rational(n, d)),
        Gen.Long.Select(v => (Rational)(new BigInteger(v) * ulong.MaxValue + 1)));

    private static readonly Gen<RationalMatrix> SmallMatrix =
        Gen.Select(Gen.Int[0, 6], Gen.Int[0, 6]).SelectMany((m, n) =>
            Entry.Array[m * n].Select(e => RationalMatrix.FromRowMajor(m, n, e)));

    [Fact]
    public void Property_RrefMatchesReference_ForBothMethods()
    {
        SmallMatrix.Sample(a =>
        {
            var (rref, pivots) = ReferenceLinearAlgebra.GaussJordan(a);
            var expected = RationalMatrix.FromArray(rref);
            foreach (var method in new[] { EliminationMethod.Multimodular, EliminationMethod.FractionFree })
            {
                var ours = Rref(a, method);
                if (!pivots.SequenceEqual(ours.PivotColumns.ToArray()) || ours.Matrix != expected) return false;
            }
            return true;
        }, iter: 150);
    }

    [Fact]
    public void Property_KernelAndSolve_AreConsistent()
    {
        SmallMatrix.Sample(a =>
        {
            var k = a.Nullspace();
            if (k.RowCount > 0 && !(a * k.Transpose()).IsZero) return false;
            var x = Enumerable.Range(0, a.ColumnCount).Select(i => (Rational)(i - 2)).ToArray();
            var b = a.Multiply(x);
            var s = a.Solve(b);
            return s.IsConsistent && a.Multiply(s.Particular).SequenceEqual(b) && s.Kernel == k;
        }, iter: 150);
    }
}
