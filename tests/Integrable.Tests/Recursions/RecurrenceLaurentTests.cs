using Integrable.Polynomials;
using Integrable.Recursions;

namespace Integrable.Tests.Recursions;

public class RecurrenceLaurentTests
{
    [Fact]
    public void Somos4_SymbolicInitialValues_IteratesAreLaurentWithPositiveCoefficients()
    {
        // Somos-4 iterates are Laurent polynomials in x_0..x_3 with positive integer coefficients
        // (Fomin–Zelevinsky, The Laurent phenomenon, 2002); at all ones they give OEIS A006720.
        var r = Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2");
        var ring = new LaurentPolynomialRing("x_0", "x_1", "x_2", "x_3");
        var init = Enumerable.Range(0, 4).Select(i => ring.Variable(i)).ToList();
        var v = r.Iterate(ring, init, 10);
        long[] values = [1, 1, 1, 1, 2, 3, 7, 23, 59, 314, 1529, 8209, 83313, 620297];
        for (int j = 0; j < v.Count; j++)
        {
            foreach (var c in v[j].Coefficients) Assert.True(c.Sign > 0 && c.IsInteger);
            Assert.Equal(new Integrable.Numbers.Rational(values[j]), v[j].Evaluate([1, 1, 1, 1]));
        }
        // x_4 = (x_1 x_3 + x_2^2)/x_0 has 2 terms.
        Assert.Equal(2, v[4].TermCount);
    }

    [Fact]
    public void Somos8_SymbolicInitialValues_FirstNonLaurentTermReported()
    {
        // Somos-8 is not Laurent: with all ones its sequence first fails to be integral at term 17
        // (Gale 1991; OEIS A030127 lists the sequence). Symbolically the division fails earlier or there.
        var r = Recurrence.Parse("x_{n+8} x_n = x_{n+7} x_{n+1} + x_{n+6} x_{n+2} + x_{n+5} x_{n+3} + x_{n+4}^2");
        var ring = new LaurentPolynomialRing(Enumerable.Range(0, 8).Select(i => $"x_{i}").ToArray());
        var init = Enumerable.Range(0, 8).Select(i => ring.Variable(i)).ToList();
        var e = Assert.Throws<SingularStepException>(() => r.Iterate(ring, init, 12));
        Assert.InRange(e.Index, 8, 17);
        // Numerically, from all ones the first non-integer is x_17 = 420514/7 (Gale 1991; OEIS A030127).
        var ones = Enumerable.Repeat(Integrable.Numbers.Rational.One, 8).ToList();
        var q = r.Iterate(Integrable.Algebra.RationalField.Instance, ones, 10);
        Assert.All(q.Take(17), x => Assert.True(x.IsInteger));
        Assert.Equal(new Integrable.Numbers.Rational(420514, 7), q[17]);
    }
}
