using System.Text.Json;
using Integrable.Analyses;
using Integrable.Integrals;
using Integrable.Numbers;
using Integrable.Recursions;
using Integrable.Solutions;

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
        AssertNoRepeatedNames(JsonDocument.Parse(r.ToJson()).RootElement);
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
        AssertNoRepeatedNames(JsonDocument.Parse(r.ToJson()).RootElement);
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
        AssertNoRepeatedNames(JsonDocument.Parse(r.ToJson()).RootElement);
        var j = JsonSerializer.Deserialize<PeriodJson>(r.ToJson(), Web)!;
        Assert.Equal(5, j.Period);
        Assert.Equal((r.Period, r.MaxPeriod, r.Points, r.IsAutonomous, r.Verification), (j.Period, j.MaxPeriod, j.Points, j.Autonomous, j.Verification));
    }

    private static string[] Strings(JsonElement array) => [.. array.EnumerateArray().Select(e => e.GetString()!)];

    /// <summary>No object in the report repeats a property name (a repeated name silently hides the first value
    /// from most readers).</summary>
    private static void AssertNoRepeatedNames(JsonElement e)
    {
        if (e.ValueKind == JsonValueKind.Object)
        {
            var names = e.EnumerateObject().Select(p => p.Name).ToList();
            Assert.Equal(names.Count, names.Distinct(StringComparer.Ordinal).Count());
            foreach (var p in e.EnumerateObject()) AssertNoRepeatedNames(p.Value);
        }
        else if (e.ValueKind == JsonValueKind.Array)
            foreach (var x in e.EnumerateArray()) AssertNoRepeatedNames(x);
    }

    private static void AssertLimit(BudgetLimit limit, JsonElement json)
    {
        if (limit == BudgetLimit.None) Assert.Equal(JsonValueKind.Null, json.ValueKind);
        else Assert.Equal(limit.ToString(), json.GetString(), ignoreCase: true);
    }

    [Fact]
    public void ConfinementReport_Json_RoundTripsTheFigures()
    {
        // Hietarinta–Viallet x_{n+1} + x_{n-1} = x_n + 1/x_n^2 confines its singularity (Hietarinta, Viallet,
        // "Singularity confinement and chaos in discrete systems", Phys. Rev. Lett. 81 (1998) 325)
        var r = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2"));
        Assert.True(r.IsConfined);
        using var doc = JsonDocument.Parse(r.ToJson());
        var j = doc.RootElement;
        AssertNoRepeatedNames(j);
        Assert.Equal(r.IsConfined, j.GetProperty("confined").GetBoolean());
        var singularities = j.GetProperty("singularities").EnumerateArray().ToArray();
        Assert.Equal(r.Singularities.Length, singularities.Length);
        for (int i = 0; i < singularities.Length; i++)
        {
            var (s, t) = (r.Singularities[i], singularities[i]);
            Assert.Equal(s.SingularValue, Rational.Parse(t.GetProperty("value").GetString()!));
            Assert.Equal(s.Pattern.Select(e => e.Symbol), Strings(t.GetProperty("pattern")));
            Assert.Equal(s.IsConfined, t.GetProperty("confined").GetBoolean());
            Assert.Equal(s.ConfinedAt, t.GetProperty("confinedAt").ValueKind == JsonValueKind.Null ? null : t.GetProperty("confinedAt").GetInt64());
            Assert.Equal(s.PatternLength, t.GetProperty("length").GetInt32());
            Assert.Equal(s.IsCyclic, t.GetProperty("cyclic").GetBoolean());
            Assert.Equal(s.RecoversInitialData, t.GetProperty("recoversInitialData").GetBoolean());
            Assert.Equal(s.Precision, t.GetProperty("precision").GetInt32());
            Assert.Equal(s.FreeData.ToArray(), Strings(t.GetProperty("freeData")).Select(Rational.Parse).ToArray());
            var terms = t.GetProperty("terms").EnumerateArray().ToArray();
            Assert.Equal(s.Terms.Length, terms.Length);
            for (int k = 0; k < terms.Length; k++)
                Assert.Equal((s.Terms[k].Index, s.Terms[k].Term, s.Terms[k].Symbol),
                    (terms[k].GetProperty("n").GetInt64(), terms[k].GetProperty("term").GetString(), terms[k].GetProperty("symbol").GetString()));
        }
        Assert.Equal(r.Candidates.ToArray(), Strings(j.GetProperty("candidates")).Select(Rational.Parse).ToArray());
        Assert.Equal(r.Steps, j.GetProperty("steps").GetInt32());
        AssertLimit(r.Limit, j.GetProperty("limit"));
        Assert.Equal(r.Verification, j.GetProperty("verification").GetString());
    }

    [Fact]
    public void IntegralsReport_Json_RoundTripsTheFigures()
    {
        // Lyness x_{n+1} x_{n-1} = x_n + a has a rational integral and no polynomial one (Lyness 1942; Kocic–Ladas,
        // "Global behavior of nonlinear difference equations of higher order", 1993); the JSON carries the library's figures.
        var r = FirstIntegrals.Find(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + a"), IntegralOptions.Default with { Degree = 3, Rational = true });
        Assert.NotEmpty(r.Integrals);
        using var doc = JsonDocument.Parse(r.ToJson());
        var j = doc.RootElement;
        AssertNoRepeatedNames(j);
        // every integral's text reads back to the same rational function in the map's field
        Assert.Equal(r.Integrals.Select(i => i.Value), Strings(j.GetProperty("integrals")).Select(r.Map.Field.Parse));
        Assert.Equal(r.Independent, j.GetProperty("independent").GetInt32());
        Assert.Equal(r.Verified, j.GetProperty("verified").GetBoolean());
        Assert.Equal(r.PolynomialIntegrals.Length, j.GetProperty("polynomial").GetInt32());
        Assert.Equal(r.RationalIntegrals.Length, j.GetProperty("rational").GetInt32());
        var darboux = j.GetProperty("darboux").EnumerateArray().ToArray();
        Assert.Equal(r.DarbouxPolynomials.Select(d => (d.Polynomial, d.Cofactor)),
            darboux.Select(d => (r.Map.Field.Parse(d.GetProperty("polynomial").GetString()!), r.Map.Field.Parse(d.GetProperty("cofactor").GetString()!))));
        Assert.Equal(r.Measures.Select(m => m.Density), Strings(j.GetProperty("measures")).Select(r.Map.Field.Parse));
        Assert.Equal(r.Map.StateVariables.ToArray(), Strings(j.GetProperty("state")));
        Assert.Equal(r.Map.Parameters.ToArray(), Strings(j.GetProperty("parameters")));
        Assert.Equal((r.Map.Period, r.Degree, r.IsComplete, r.Expected, r.RejectedCandidates),
            (j.GetProperty("period").GetInt32(), j.GetProperty("degree").GetInt32(), j.GetProperty("complete").GetBoolean(),
             j.GetProperty("expected").GetInt32(), j.GetProperty("rejected").GetInt32()));
        Assert.Equal(r.UpperBound, j.GetProperty("upperBound").ValueKind == JsonValueKind.Null ? null : j.GetProperty("upperBound").GetInt32());
        AssertLimit(r.Limit, j.GetProperty("limit"));
        Assert.Equal(r.Verification, j.GetProperty("verification").GetString());
    }

    private const string Quadrangulations = "R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})";

    [Fact]
    public void SeriesSolution_Json_RoundTripsTheFigures()
    {
        // The quadrangulation boundary-value problem (Bouttier, Di Francesco, Guitter, "Geodesic distance in planar
        // graphs", Nucl. Phys. B 663 (2003) 535); the JSON has to carry the library's coefficients exactly.
        var s = SeriesSolver.SolveBoundaryValue(Recurrence.Parse(Quadrangulations), "g", 0, [Rational.Zero], new SeriesOptions { Order = 10 });
        Assert.NotNull(s.LimitValue);   // a boundary-value problem carries its limit x_∞
        using var doc = JsonDocument.Parse(s.ToJson());
        var j = doc.RootElement;
        AssertNoRepeatedNames(j);
        Assert.Equal(s.Recurrence.Text, j.GetProperty("equation").GetString());
        Assert.Equal(s.Parameter, j.GetProperty("parameter").GetString());
        Assert.Equal(s.Kind == SeriesProblemKind.BoundaryValue ? "boundary" : "initial", j.GetProperty("kind").GetString());
        Assert.Equal((s.Order, s.FirstIndex), (j.GetProperty("order").GetInt32(), j.GetProperty("firstIndex").GetInt64()));
        var series = j.GetProperty("series").EnumerateObject().ToArray();
        Assert.Equal(s.Terms.Count, series.Length);
        for (int i = 0; i < series.Length; i++)
        {
            Assert.Equal(s.Recurrence.TermName(s.FirstIndex + i), series[i].Name);
            Assert.Equal(Enumerable.Range(0, s.Order + 1).Select(d => s.Terms[i][d]), Strings(series[i].Value).Select(Rational.Parse));
        }
        if (s.LimitValue is { } limit)
        {
            Assert.Equal(Enumerable.Range(0, s.Order + 1).Select(d => limit[d]), Strings(j.GetProperty("limitValue")).Select(Rational.Parse));
            Assert.Equal(s.Window, j.GetProperty("window").GetInt32());
        }
        AssertLimit(s.Limit, j.GetProperty("limit"));
        Assert.Equal(s.Verification, j.GetProperty("verification").GetString());
    }

    [Fact]
    public void TauReport_Json_RoundTripsTheFigures()
    {
        // The fitted closed form of the quadrangulation series (Bouttier, Di Francesco, Guitter, Nucl. Phys. B 663 (2003) 535).
        var s = SeriesSolver.SolveBoundaryValue(Recurrence.Parse(Quadrangulations), "g", 0, [Rational.Zero], new SeriesOptions { Order = 16 });
        var r = TauFitter.FitSeries(s, Rational.Zero);
        Assert.True(r.Verified);
        using var doc = JsonDocument.Parse(r.ToJson());
        var j = doc.RootElement;
        AssertNoRepeatedNames(j);
        Assert.Equal((r.Equation, r.Substitution, r.Bilinear, r.Tau),
            (j.GetProperty("equation").GetString(), j.GetProperty("substitution").GetString(), j.GetProperty("bilinear").GetString(), j.GetProperty("tau").GetString()));
        Assert.Equal(r.Relations, Strings(j.GetProperty("relations")));
        Assert.Equal(r.Verified, j.GetProperty("verified").GetBoolean());
        Assert.Equal(r.Verification, j.GetProperty("verification").GetString());
        Assert.Equal(r.SeriesCheck, j.GetProperty("seriesCheck").ValueKind == JsonValueKind.Null ? null : j.GetProperty("seriesCheck").GetString());
        Assert.Equal(r.Notes, Strings(j.GetProperty("notes")));
        AssertLimit(r.Limit, j.GetProperty("limit"));
    }
}
