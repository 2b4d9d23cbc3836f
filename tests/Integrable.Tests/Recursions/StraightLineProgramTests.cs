using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Recursions;

namespace Integrable.Tests.Recursions;

public class StraightLineProgramTests
{
    private static StraightLineProgram Lyness()
    {
        // (x + 1)/y: the rule of x_{n+1} x_{n-1} = x_n + 1 with inputs (x_n, x_{n-1}).
        var b = new StraightLineProgramBuilder(2);
        return b.Build(b.Divide(b.Add(b.Input(0), b.Constant(1)), b.Input(1)));
    }

    [Fact]
    public void Evaluate_SameProgram_AgreesAcrossQAndPrimeField()
    {
        var p = Lyness();
        var q = p.Evaluate(RationalField.Instance, [new Rational(3, 2), new Rational(5, 7)]);
        Assert.Equal(new Rational(7, 2), q);
        var f = new PrimeField(1_000_003);
        var m = p.Evaluate(f, [f.FromRational(new Rational(3, 2)), f.FromRational(new Rational(5, 7))]);
        Assert.Equal(f.FromRational(q), m);
    }

    [Fact]
    public void Iterate_LynessRule_HasPeriodFive()
    {
        // x_{n+1} x_{n-1} = x_n + 1 has period 5 (Lyness 1942; Fomin–Zelevinsky 2002).
        var p = Lyness();
        Rational prev = new(2, 3), cur = new(11, 5);
        var start = (prev, cur);
        for (int n = 0; n < 5; n++) (prev, cur) = (cur, p.Evaluate(RationalField.Instance, [cur, prev]));
        Assert.Equal(start, (prev, cur));
    }

    [Fact]
    public void Evaluate_ZeroDivisor_ReportsInstruction()
    {
        var p = Lyness();
        var ex = Assert.Throws<ProgramEvaluationException>(() => p.Evaluate(RationalField.Instance, [Rational.One, Rational.Zero]));
        Assert.Equal(p.Instructions.Length - 1, ex.Instruction);
    }

    [Fact]
    public void Builder_SharesSubexpressionsAndFoldsConstants()
    {
        var b = new StraightLineProgramBuilder(1);
        int x = b.Input(0);
        int s1 = b.Multiply(x, x), s2 = b.Multiply(x, x);
        Assert.Equal(s1, s2);
        int c = b.Add(b.Constant(2), b.Constant(3));
        var p = b.Build(b.Add(b.Power(s1, 2), c));
        Assert.Equal(new Rational(16 + 5), p.Evaluate(RationalField.Instance, [new Rational(2)]));
        Assert.Contains(new Rational(5), p.Constants);
    }

    [Fact]
    public void Power_NegativeExponent_Divides()
    {
        var b = new StraightLineProgramBuilder(1);
        var p = b.Build(b.Power(b.Input(0), -3));
        Assert.Equal(new Rational(1, 8), p.Evaluate(RationalField.Instance, [new Rational(2)]));
        Assert.Throws<ArgumentException>(() => p.Evaluate(RationalField.Instance, [Rational.One, Rational.One]));
    }

    [Fact]
    public void Builder_DoubleNegation_Cancels()
    {
        var b = new StraightLineProgramBuilder(1);
        var p = b.Build(b.Negate(b.Negate(b.Input(0))));
        Assert.Single(p.Instructions);
        Assert.Equal(new Rational(5), p.Evaluate(RationalField.Instance, [new Rational(5)]));
    }

    [Fact]
    public void Evaluate_ExchangeDivisionInLaurentRing_IsFusedAndExact()
    {
        // (x·y + z²)/w with single-use products: the fused exchange step of the Laurent ring.
        var b = new StraightLineProgramBuilder(4);
        var p = b.Build(b.Divide(b.Add(b.Multiply(b.Input(0), b.Input(1)), b.Power(b.Input(2), 2)), b.Input(3)));
        var r = new Integrable.Polynomials.LaurentPolynomialRing("s", "t");
        var s = r.Variable(0);
        var t = r.Variable(1);
        var w = s + t;
        int before = Integrable.Kernels.ProductSumQuotient.Answered;
        var q = p.Evaluate(r, [w * (s + 1), s - t, w, w]);
        Assert.True(Integrable.Kernels.ProductSumQuotient.Answered > before);
        Assert.Equal((s + 1) * (s - t) + w, q);
        // not exact: the same typed error, naming the instruction, as the unfused division
        var e = Assert.Throws<ProgramEvaluationException>(() => p.Evaluate(r, [s + 1, t + 1, s + 2, s + t + 7]));
        Assert.Equal(p.Instructions.Length - 1, e.Instruction);
        Assert.Throws<ProgramEvaluationException>(() => p.Evaluate(r, [s + 1, t + 1, s + 2, r.Zero]));
        // other rings evaluate the same program step by step
        Assert.Equal(new Rational(7, 4), p.Evaluate(RationalField.Instance, [new Rational(2), new Rational(3), new Rational(1), new Rational(4)]));
    }
}
