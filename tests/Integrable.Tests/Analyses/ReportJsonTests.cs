using System.Text.Json;
using Integrable.Analyses;
using Integrable.Recursions;

namespace Integrable.Tests.Analyses;

/// <summary>The reports' JSON parses back with System.Text.Json into the same figures, and analyses
/// run concurrently on shared immutable objects give the same reports as run one after another.</summary>
public class ReportJsonTests
{
    private static readonly JsonSerializerOptions Web = new(JsonSerializerDefaults.Web);

    private sealed record GrowthJson(long[] Degrees, string? Class, double? Entropy, string? GeneratingFunction, int PolynomialDegree,
        string? MinimalPolynomial, bool Found, int TermsUsed, int TermsConfirmed, int[] NumeratorDegrees, int[] DenominatorDegrees,
        int ExactlyConfirmed, int[] RedoneSteps, ulong[] Primes, int StepsRequested, string? Limit, string Verification);

    private sealed record StepJson(long N, string Term, int Terms, bool Positive, bool Integer, Dictionary<string, int> MinExponents, Dictionary<string, int> MaxExponents);

    private sealed record LaurentJson(bool Laurent, bool Positive, bool Integer, StepJson[] Steps, long? FirstFailure, string[] Variables, int StepsRequested, string? Limit, string Verification);

    private sealed record PeriodJson(int? Period, int MaxPeriod, string Method, int Points, bool Autonomous, string? Limit, string Verification);

    // The tour recursion of the docs (our own): Laurent, linear degree growth (both found by the library;
    // the JSON only has to carry the same figures as the report object).
    private const string Tour = "x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1";

    [Fact]
    public void GrowthReport_Json_RoundTripsTheFigures()
    {
        var r = DegreeGrowth.Analyse(Recurrence.Parse(Tour), 12);
        var j = JsonSerializer.Deserialize<GrowthJson>(r.ToJson(), Web)!;
        Assert.Equal(r.Degrees, j.Degrees);
        Assert.Equal(r.Fit.ClassName, j.Class);
        Assert.Equal(r.Fit.Entropy, j.Entropy);
        Assert.Equal(r.Fit.GeneratingFunction, j.GeneratingFunction);
        Assert.Equal(r.Fit.PolynomialDegree, j.PolynomialDegree);
        Assert.Equal(r.Fit.IsFound, j.Found);
        Assert.Equal(r.Fit.TermsUsed, j.TermsUsed);
        Assert.Equal(r.Fit.TermsConfirmed, j.TermsConfirmed);
        Assert.Equal(r.NumeratorDegrees, j.NumeratorDegrees);
        Assert.Equal(r.DenominatorDegrees, j.DenominatorDegrees);
        Assert.Equal(r.ExactlyConfirmed, j.ExactlyConfirmed);
        Assert.Equal(r.Primes, j.Primes);
        Assert.Equal(r.StepsRequested, j.StepsRequested);
        Assert.Null(j.Limit);
        Assert.Equal(r.Verification, j.Verification);
    }

    [Fact]
    public void LaurentReport_Json_RoundTripsTheFigures()
    {
        var r = LaurentPhenomenon.Check(Recurrence.Parse(Tour), 6);
        var j = JsonSerializer.Deserialize<LaurentJson>(r.ToJson(), Web)!;
        Assert.Equal(r.IsLaurent, j.Laurent);
        Assert.Equal(r.AllPositive, j.Positive);
        Assert.Equal(r.AllInteger, j.Integer);
        Assert.Equal(r.Variables, j.Variables);
        Assert.Equal(r.Steps.Length, j.Steps.Length);
        for (int i = 0; i < r.Steps.Length; i++)
        {
            var (s, t) = (r.Steps[i], j.Steps[i]);
            Assert.Equal((s.Index, s.Term, s.TermCount, s.IsPositive, s.IsInteger), (t.N, t.Term, t.Terms, t.Positive, t.Integer));
            Assert.Equal(s.MinExponents, r.Variables.Select(v => t.MinExponents[v]));
            Assert.Equal(s.MaxExponents, r.Variables.Select(v => t.MaxExponents[v]));
        }
        Assert.Equal(r.FirstFailure, j.FirstFailure);
        Assert.Equal(r.Verification, j.Verification);
    }

    [Fact]
    public void PeriodReport_Json_RoundTripsTheFigures()
    {
        // Lyness x_{n+1} x_{n-1} = x_n + 1 has period 5 (common knowledge)
        var r = Periodicity.Find(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1"), 10);
        var j = JsonSerializer.Deserialize<PeriodJson>(r.ToJson(), Web)!;
        Assert.Equal(5, j.Period);
        Assert.Equal((r.Period, r.MaxPeriod, r.Points, r.IsAutonomous, r.Verification), (j.Period, j.MaxPeriod, j.Points, j.Autonomous, j.Verification));
    }
}
