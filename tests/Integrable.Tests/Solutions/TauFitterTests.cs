using Integrable.Numbers;
using Integrable.RationalFunctions;
using Integrable.Recursions;
using Integrable.Solutions;

namespace Integrable.Tests.Solutions;

public class TauFitterTests
{
    [Fact]
    public void FitBoundary_Quadrangulations_RediscoversPublishedClosedForm()
    {
        // Bouttier, Di Francesco, Guitter, "Geodesic distance in planar graphs", Nucl. Phys. B 663 (2003) 535–567:
        // R_n = R u_n u_{n+3}/(u_{n+1}u_{n+2}), u_n = 1 − x^n, R = 1 + 3gR², x + 1/x + 1 = 1/(gR²).
        var rec = Recurrence.Parse("R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})");
        var report = TauFitter.FitBoundary(rec, "g", 0, Rational.Zero, new SeriesOptions { Order = 20 });
        Assert.True(report.Verified, report.ToText());
        Assert.Equal("R_n = R_∞ τ_n τ_{n+3} / (τ_{n+1} τ_{n+2})", report.Substitution);
        Assert.Equal("τ_n = 1 - lambda^n", report.Tau);
        Assert.NotNull(report.SeriesCheck);
        Assert.Contains("all 10 indices", report.SeriesCheck, StringComparison.Ordinal);
        Assert.Contains("O(g^21)", report.SeriesCheck, StringComparison.Ordinal);
        // the constants as rational functions of λ, checked against the published relations
        var field = new RationalFunctionField("lambda");
        RationalFunction Rhs(string prefix) => field.Parse(report.Relations.Single(r => r.StartsWith(prefix, StringComparison.Ordinal))[prefix.Length..]);
        var bigR = Rhs("R_∞ = ");
        var g = Rhs("g = ");
        var x = field.Variable("lambda");
        Assert.Equal(field.One, (x + field.One / x + field.One) * g * bigR * bigR);   // x + 1/x + 1 = 1/(g R²)
        Assert.Equal(bigR, field.One + field.Constant(3) * g * bigR * bigR);          // R = 1 + 3 g R²
        Assert.Contains("τ_{n+4} τ_n", report.Bilinear, StringComparison.Ordinal);
    }

    [Fact]
    public void FitSeries_PrecomputedSeries_SameClosedForm()
    {
        // the series-data route gives the same closed form (Bouttier, Di Francesco, Guitter, Nucl. Phys. B 663 (2003) 535)
        var rec = Recurrence.Parse("R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})");
        var sol = SeriesSolver.SolveBoundaryValue(rec, "g", 0, [Rational.Zero], new SeriesOptions { Order = 16 });
        var report = TauFitter.FitSeries(sol, Rational.Zero);
        Assert.True(report.Verified);
        Assert.Equal("R_n = R_∞ τ_n τ_{n+3} / (τ_{n+1} τ_{n+2})", report.Substitution);
        Assert.Contains("\\begin{description}", report.ToLatex(), StringComparison.Ordinal);
    }

    [Fact]
    public void FitBoundary_NonZeroBoundary_NotFoundWithReason()
    {
        var rec = Recurrence.Parse("R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})");
        var report = TauFitter.FitBoundary(rec, "g", 0, Rational.One, new SeriesOptions { Order = 8 });
        Assert.False(report.Verified);
        Assert.Contains(report.Notes, n => n.Contains("vanishing boundary", StringComparison.Ordinal));
    }

    [Fact]
    public void FitInitial_QSystem_GivesNPlusOne()
    {
        // A_1 Q-system Q_{n+1}Q_{n-1} = Q_n^2 - 1, Q_0 = 1, Q_1 = 2 gives Q_n = n + 1 (Kirillov–Reshetikhin; common knowledge).
        var report = TauFitter.FitInitial(Recurrence.Parse("Q_{n+1} Q_{n-1} = Q_n^2 - 1"), [Rational.One, new Rational(2)]);
        Assert.True(report.Verified, report.ToText());
        Assert.Equal("τ_n = n + 1", report.Tau);
        Assert.Contains("τ_{n+2} = 2 τ_{n+1} - τ_n", report.Relations);
    }

    [Fact]
    public void FitInitial_QSystemGeneric_GivesChebyshevType()
    {
        // Q_0 = 1, Q_1 = 5/2: Q_n = (4/3) 2^n - (1/3) 2^{-n} (common knowledge: Chebyshev-type solution, λ + 1/λ = 5/2).
        var report = TauFitter.FitInitial(Recurrence.Parse("Q_{n+1} Q_{n-1} = Q_n^2 - 1"), [Rational.One, new Rational(5, 2)]);
        Assert.True(report.Verified, report.ToText());
        Assert.Contains("(4/3) (2)^n", report.Tau, StringComparison.Ordinal);
        Assert.Contains("(-1/3) (1/2)^n", report.Tau, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(3, 5, "τ_{n+2} = 11/5 τ_{n+1} - τ_n")]
    [InlineData(2, 3, "τ_{n+2} = 2 τ_{n+1} - τ_n")]
    [InlineData(1, 3, "τ_{n+2} = 3 τ_{n+1} - τ_n")]
    public void FitInitial_QSystemAnyStart_ChebyshevRecurrence(long q0, long q1, string expected)
    {
        // Q_{n+1} + Q_{n-1} = (λ + 1/λ) Q_n with λ + 1/λ = (Q_0² + Q_1² − 1)/(Q_0 Q_1) for the A_1 Q-system (common
        // knowledge: Q_2 = (Q_1² − 1)/Q_0, and the Casoratian Q_{n+1}Q_{n-1} − Q_n² = −1 is conserved).
        var report = TauFitter.FitInitial(Recurrence.Parse("Q_{n+1} Q_{n-1} = Q_n^2 - 1"), [new Rational(q0), new Rational(q1)]);
        Assert.True(report.Verified, report.ToText());
        Assert.Contains(expected, report.Relations);
    }

    [Fact]
    public void FitInitial_OddFibonacci_FindsLinearRecurrence()
    {
        // x_{n+1} x_{n-1} = x_n^2 + 1, x_0 = x_1 = 1 gives F_{2n-1} (OEIS A001519), with x_{n+1} = 3 x_n - x_{n-1}.
        var report = TauFitter.FitInitial(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 1"), [Rational.One, Rational.One]);
        Assert.True(report.Verified, report.ToText());
        Assert.Contains("τ_{n+2} = 3 τ_{n+1} - τ_n", report.Relations);
        Assert.Contains(report.Relations, r => r.Contains("lambda^2 - 3*lambda + 1", StringComparison.Ordinal) || r.Contains("lambda^2 - 3 lambda + 1", StringComparison.Ordinal));
    }

    [Fact]
    public void FitInitial_Somos4_IsItsOwnTauForm()
    {
        // Somos-4 with 1,1,1,1 (OEIS A006720) is elliptic, not linearly recurrent; its tau form is itself (common knowledge).
        var report = TauFitter.FitInitial(Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2"),
            [Rational.One, Rational.One, Rational.One, Rational.One]);
        Assert.Equal("x_n = τ_n", report.Substitution);
        Assert.Contains("τ_n τ_{n+4}", report.Bilinear, StringComparison.Ordinal);
        Assert.True(report.Verified);
        Assert.Contains("no exponential-polynomial", report.Tau, StringComparison.Ordinal);
        using var doc = System.Text.Json.JsonDocument.Parse(report.ToJson());
        Assert.True(doc.RootElement.GetProperty("verified").GetBoolean());
    }
}
