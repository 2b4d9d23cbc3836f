using Integrable.Numbers;
using Integrable.Recursions;
using Integrable.Solutions;

namespace Integrable.Tests.Solutions;

public class ExponentialTauTests
{
    private static readonly Recurrence QSystem = Recurrence.Parse("Q_{n+1} Q_{n-1} = Q_n^2 - 1");

    [Fact]
    public void Relations_QSystemTwoExponentials_GivesChebyshevDispersion()
    {
        // A_1 Q-system Q_{n+1}Q_{n-1} = Q_n^2 - 1 with Q_n = c0 λ^n + c1 λ^{-n}: c0 c1 (λ - 1/λ)^2 = -1 (common knowledge:
        // Chebyshev-type solution).
        var rel = ExponentialTau.Relations(QSystem, [new ExponentialTerm(1), new ExponentialTerm(-1)]);
        var p = Assert.Single(rel.Relations);
        var ring = p.Ring;
        var c0 = ring.Variable("c0");
        var c1 = ring.Variable("c1");
        var l = ring.Variable("lambda");
        var one = ring.One;
        var expected = c0 * c1 * (l * l - one) * (l * l - one) + l * l;
        Assert.Equal(expected * ring.Constant(Rational.One / expected.LeadingCoefficient), p);
        // a numeric instance: λ = 2, c0 = 4/3, c1 = -1/3 satisfies it, and the sequence solves the Q-system
        Assert.True(p.Evaluate([new Rational(4, 3), new Rational(-1, 3), new Rational(2), Rational.One, Rational.One]).IsZero);
        Rational Q(int n) => new Rational(4, 3) * new Rational(2).Pow(n) - new Rational(1, 3) * new Rational(1, 2).Pow(n);
        for (int n = 1; n < 8; n++) Assert.Equal(Q(n) * Q(n) - 1, Q(n + 1) * Q(n - 1));
    }

    [Fact]
    public void Relations_QSystemRepeatedRoot_ForcesUnitSlope()
    {
        // Q_n = c0 + c1 n (λ = 1 repeated): c1² = 1, so Q_0 = 1, Q_1 = 2 gives Q_n = n + 1 (Kirillov–Reshetikhin;
        // common knowledge).
        var rel = ExponentialTau.Relations(QSystem, [new ExponentialTerm(0), new ExponentialTerm(0, 1)]);
        var p = Assert.Single(rel.Relations);
        var c1 = p.Ring.Variable("c1");
        Assert.Equal(c1 * c1 - p.Ring.One, p);
    }

    [Fact]
    public void Relations_Somos4SingleExponential_HasCondition()
    {
        // τ_n = c λ^{n}: Somos-4 gives c² λ^{2n+4}(1 - 1 - 1) = -c² λ^4 ... i.e. c = 0 only (common knowledge: no
        // non-zero geometric solution of τ_{n+4}τ_n = τ_{n+3}τ_{n+1} + τ_{n+2}²).
        var rel = ExponentialTau.Relations(Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2"), [new ExponentialTerm(1)]);
        var p = Assert.Single(rel.Relations);
        var c0 = p.Ring.Variable("c0");
        var l = p.Ring.Variable("lambda");
        Assert.Equal(c0 * c0 * l * l * l * l, p);
    }

    [Fact]
    public void Relations_NoTerms_Throws()
    {
        Assert.Throws<ArgumentException>(() => ExponentialTau.Relations(QSystem, []));
    }
}
