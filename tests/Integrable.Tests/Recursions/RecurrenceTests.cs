using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Recursions;
using Integrable.Text;

namespace Integrable.Tests.Recursions;

public class RecurrenceTests
{
    private static IReadOnlyList<Rational> Ones(int k) => Enumerable.Repeat(Rational.One, k).ToList();

    [Fact]
    public void Somos4_FromOnes_MatchesOeisA006720()
    {
        // Somos-4: OEIS A006720 = 1, 1, 1, 1, 2, 3, 7, 23, 59, 314, 1529, 8209, 83313, 620297, 7869898.
        var r = Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2");
        Assert.Equal(4, r.Order);
        Assert.True(r.IsAutonomous);
        Assert.Empty(r.Parameters);
        var v = r.Iterate(RationalField.Instance, Ones(4), 11);
        long[] expected = [1, 1, 1, 1, 2, 3, 7, 23, 59, 314, 1529, 8209, 83313, 620297, 7869898];
        Assert.Equal(expected.Select(x => new Rational(x)), v);
    }

    [Fact]
    public void Somos5_FromOnes_MatchesOeisA006721()
    {
        // Somos-5: OEIS A006721 = 1, 1, 1, 1, 1, 2, 3, 5, 11, 37, 83, 274, 1217, 6161, 22833, 165713.
        var r = Recurrence.Parse("x_{n+5} x_n = x_{n+4} x_{n+1} + x_{n+3} x_{n+2}");
        var v = r.Iterate(RationalField.Instance, Ones(5), 11);
        long[] expected = [1, 1, 1, 1, 1, 2, 3, 5, 11, 37, 83, 274, 1217, 6161, 22833, 165713];
        Assert.Equal(expected.Select(x => new Rational(x)), v);
    }

    [Fact]
    public void Lyness_PeriodFive_AndBackwardRuleInvertsForward()
    {
        // x_{n+1} x_{n-1} = x_n + 1 has period 5 (Lyness 1942; Fomin–Zelevinsky 2002).
        var r = Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1");
        Assert.Equal(2, r.Order);
        Assert.Equal(-1, r.LowestShift);
        Assert.True(r.IsInvertible);
        var start = new[] { new Rational(3, 7), new Rational(-5, 2) };
        var v = r.Iterate(RationalField.Instance, start, 5);
        Assert.Equal(v[0], v[5]);
        Assert.Equal(v[1], v[6]);
        var back = r.IterateBackward(RationalField.Instance, [v[5], v[6]], 5, start: 5);
        Assert.Equal(v, back);
    }

    [Fact]
    public void ImplicitEquation_SolvedForHighestShift()
    {
        // R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1}) is linear in R_{n+1}: R_{n+1} = (R_n - 1)/(g R_n) - R_{n-1} - R_n.
        var r = Recurrence.Parse("R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})");
        Assert.Equal("R", r.Unknown);
        Assert.Equal(["g"], r.Parameters.ToArray());
        var g = new Rational(1, 12);
        Rational a = new(1, 2), b = new(2, 3);
        var v = r.Iterate(RationalField.Instance, [a, b], 1, [g]);
        Assert.Equal((b - 1) / (g * b) - a - b, v[2]);
    }

    [Fact]
    public void NonAutonomous_IndexEntersAsValue()
    {
        // x_{n+1} = x_n + n from x_0 = 0 gives triangular numbers n(n-1)/2 (common knowledge).
        var r = Recurrence.Parse("x_{n+1} = x_n + n");
        Assert.False(r.IsAutonomous);
        var v = r.Iterate(RationalField.Instance, [Rational.Zero], 6);
        Assert.Equal(new long[] { 0, 0, 1, 3, 6, 10, 15 }.Select(x => new Rational(x)), v);
    }

    [Fact]
    public void SameRule_PrimeFieldOrbit_IsReductionOfRationalOrbit()
    {
        var r = Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2");
        var f = new PrimeField(1_000_003);
        var q = r.Iterate(RationalField.Instance, Ones(4), 20);
        var m = r.Iterate<ulong>(f, [1UL, 1, 1, 1], 20);
        Assert.Equal(q.Select(f.FromRational), m);
    }

    [Fact]
    public void SingularOrbit_ReportsStep()
    {
        var r = Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1");
        // From (1, -1): x_2 = 0/1 = 0, then x_3 = (0 + 1)/(-1) = -1, x_4 = (-1 + 1)/0 -> singular at index 4.
        var e = Assert.Throws<SingularStepException>(() => r.Iterate(RationalField.Instance, [Rational.One, -Rational.One], 5));
        Assert.Equal(4, e.Index);
        Assert.Equal("x_4", e.Term);
    }

    [Theory]
    [InlineData("x_{n+1}^2 = x_n + 1", "degree 2")]
    [InlineData("x_{n+1} + x_n = x_n + x_{n+1}", "holds identically")]
    [InlineData("x_{n+1} + x_n = x_{n+1} + 1", "cancels out")]
    [InlineData("x_n = x_n + 1", "only one shift")]
    [InlineData("x + y = 1", "no index variable")]
    [InlineData("x_{n+1} x_{n*1} = x_n^2 + 1", "same term written two ways")]
    [InlineData("x_{2n} = x_n", "plus or minus an integer")]
    [InlineData("x_{n+1} = y_n", "several unknowns")]
    [InlineData("x_{n+1} = x_n + x", "both as an unknown")]
    [InlineData("T_{a,n+1} = T_{a,n}", "indices")]
    public void BadEquation_TypedErrorWithReason(string text, string fragment)
    {
        var e = Assert.Throws<EquationException>(() => Recurrence.Parse(text));
        Assert.Contains(fragment, e.Reason);
        Assert.InRange(e.Position, 0, text.Length);
    }

    [Fact]
    public void MalformedText_ParseErrorWithPosition()
    {
        var e = Assert.Throws<ExpressionParseException>(() => Recurrence.Parse("x_{n+1} = x_n +"));
        Assert.Equal(15, e.Position);
    }

    [Fact]
    public void WrongCounts_ArgumentErrors()
    {
        var r = Recurrence.Parse("R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})");
        Assert.Throws<ArgumentException>(() => r.Iterate(RationalField.Instance, [Rational.One], 3, [Rational.One]));
        Assert.Throws<ArgumentException>(() => r.Iterate(RationalField.Instance, [Rational.One, Rational.One], 3));
    }

    [Fact]
    public void NoBackwardRule_WhenLowestShiftNonlinear()
    {
        var r = Recurrence.Parse("x_{n+1} = x_n^2 + 1");
        Assert.False(r.IsInvertible);
        Assert.Throws<InvalidOperationException>(() => r.IterateBackward(RationalField.Instance, [Rational.One], 1));
    }
}
