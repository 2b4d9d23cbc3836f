using Integrable.Analyses;
using Integrable.Clusters;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Recursions;

namespace Integrable.Tests.Analyses;

public class LaurentPhenomenonTests
{
    private const string Somos4 = "x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2";
    private const string Somos5 = "x_{n+5} x_n = x_{n+4} x_{n+1} + x_{n+3} x_{n+2}";
    private const string Somos6 = "x_{n+6} x_n = x_{n+5} x_{n+1} + x_{n+4} x_{n+2} + x_{n+3}^2";
    private const string Somos7 = "x_{n+7} x_n = x_{n+6} x_{n+1} + x_{n+5} x_{n+2} + x_{n+4} x_{n+3}";
    private const string Somos8 = "x_{n+8} x_n = x_{n+7} x_{n+1} + x_{n+6} x_{n+2} + x_{n+5} x_{n+3} + x_{n+4}^2";

    [Theory]
    [InlineData(Somos4, 12)]
    [InlineData(Somos5, 12)]
    [InlineData(Somos6, 10)]
    [InlineData(Somos7, 10)]
    public void Check_Somos4To7_LaurentWithIntegerCoefficients(string equation, int steps)
    {
        // Somos-4 … Somos-7 generate Laurent polynomials with integer coefficients in their initial
        // values (Fomin–Zelevinsky, "The Laurent phenomenon", Adv. Appl. Math. 28 (2002), Example 3.3;
        // Gale 1991 for the integrality of the sequences from all ones).
        var report = LaurentPhenomenon.Check(Recurrence.Parse(equation), steps);
        Assert.True(report.IsLaurent);
        Assert.True(report.IsComplete);
        Assert.Equal(steps, report.Steps.Length);
        Assert.True(report.AllInteger);
        foreach (var s in report.Steps) Assert.Equal(s.IsPositive, s.Value.Coefficients.ToArray().All(c => c.Sign > 0));
    }

    [Fact]
    public void Check_Somos4_PositiveAndMatchesOeisAtOnes()
    {
        // Somos-4 is a cluster recurrence (Fordy–Marsh, "Cluster mutation-periodic quivers and associated
        // Laurent sequences", J. Algebraic Combin. 34 (2011)), so its coefficients are positive
        // (Lee–Schiffler, Ann. Math. 182 (2015)); at all ones the values are OEIS A006720.
        var report = LaurentPhenomenon.Check(Recurrence.Parse(Somos4), 10);
        Assert.True(report.AllPositive);
        long[] a006720 = [2, 3, 7, 23, 59, 314, 1529, 8209, 83313, 620297];
        for (int i = 0; i < a006720.Length; i++)
            Assert.Equal(new Rational(a006720[i]), report.Steps[i].Value.Evaluate([1, 1, 1, 1]));
        Assert.Equal("x_4", report.Steps[0].Term);
        Assert.Equal(2, report.Steps[0].TermCount);                     // (x_1 x_3 + x_2^2)/x_0
        Assert.Equal(-1, report.Steps[0].MinExponents[0]);
        Assert.Equal(-1, report.Steps[0].MaxExponents[0]);
    }

    [Fact]
    public void Check_Somos8_FirstNonLaurentTermX16_WithWitness()
    {
        // Somos-8 is not Laurent (Fomin–Zelevinsky 2002, Section 1; Gale, Math. Intelligencer 13 (1991)).
        // From all ones the first non-integer term is x_17 = 420514/7 (OEIS A030127); symbolically the
        // first term that is not a Laurent polynomial is already x_16 (integral at all ones). The test
        // confirms x_16 independently: with x_0 = … = x_6 = 1 and x_7 = t, the library's iteration in
        // Q[t^±1] fails exactly at x_16, and a specialisation is a ring homomorphism.
        var rec = Recurrence.Parse(Somos8);
        var report = LaurentPhenomenon.Check(rec, 12);
        Assert.False(report.IsLaurent);
        Assert.Equal(16, report.FirstFailure);
        var f = report.Failure!;
        Assert.Equal("x_{16}", f.Term);
        Assert.False(f.Divisor.IsMonomial);
        Assert.False(f.Remainder!.IsZero);
        Assert.False(f.Numerator.TryDivideExact(f.Divisor, out _));
        var (q, r) = f.Numerator.DivideExact(f.Divisor);
        Assert.Equal(f.Numerator, q * f.Divisor + r);
        Assert.Equal(8, report.Steps.Length);                            // x_8 … x_15 are Laurent
        Assert.NotNull(f.Specialisation);
        Assert.False(f.SpecialisedDivisor!.IsMonomial);
        Assert.False(f.SpecialisedNumerator!.TryDivideExact(f.SpecialisedDivisor, out _));

        var t = new LaurentPolynomialRing("t");
        var init = Enumerable.Range(0, 8).Select(i => i == 7 ? t.Variable(0) : t.One).ToList();
        var e = Assert.Throws<SingularStepException>(() => rec.Iterate(t, init, 10));
        Assert.Equal(16, e.Index);

        var ones = rec.Iterate(Integrable.Algebra.RationalField.Instance, Enumerable.Repeat(Rational.One, 8).ToList(), 10);
        Assert.Equal(ones[16], f.ValueAtOnes);
        Assert.True(ones[16].IsInteger);
        Assert.Equal(new Rational(420514, 7), ones[17]);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    public void Check_XnPowerB_LaurentPositive(int b)
    {
        // x_{n+1} x_{n-1} = x_n^b + 1 is the rank-2 cluster algebra of type (b, b): Laurent with positive
        // coefficients (Fomin–Zelevinsky 2002, Example 1.3/Thm 1.5; positivity: Lee–Schiffler 2015).
        var report = LaurentPhenomenon.Check(Recurrence.Parse($"x_{{n+1}} x_{{n-1}} = x_n^{b} + 1"), b <= 2 ? 10 : 4);
        Assert.True(report.IsLaurent);
        Assert.True(report.AllPositive);
        Assert.True(report.AllInteger);
        if (b == 1)   // period 5 (Lyness 1942): x_5 = x_0
            Assert.Equal(report.Steps[3].Value, new LaurentPolynomialRing("x_0", "x_1").Variable(0));
    }

    [Fact]
    public void Check_NonLaurentMap_InnerFailureButTermLaurent_NotReportedAsFailure()
    {
        // x_{n+1} = (x_n^2 + x_n)/x_n - 1/x_n · x_n = x_n: the rule divides by x_n + 1 internally, but the
        // term is Laurent. Rule: x_{n+1} = (x_n^2 - 1)/(x_n - 1) = x_n + 1 (common practice: exact cancellation).
        var report = LaurentPhenomenon.Check(Recurrence.Parse("x_{n+1} (x_n - 1) = x_n^2 - 1"), 3);
        Assert.True(report.IsLaurent);
        Assert.True(report.Steps[0].IntermediateDivisionFailed || report.Steps[0].Value.TermCount == 2);
        var r = new LaurentPolynomialRing("x_0");
        Assert.Equal(r.Variable(0) + 3, report.Steps[2].Value);
    }

    [Fact]
    public void Check_HietarintaViallet_NotLaurentAtX3()
    {
        // x_{n+1} + x_{n-1} = x_n + 1/x_n^2: x_2 = x_1 + x_1^-2 - x_0 is Laurent, x_3 has denominator x_2^2.
        var report = LaurentPhenomenon.Check(Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2"), 4);
        Assert.Equal(3, report.FirstFailure);
        Assert.Single(report.Steps);
    }

    [Fact]
    public void Check_ParametersFormalUnlessGiven()
    {
        // Somos-4 with coefficients is Laurent in the x's over Z[a, b] (Fomin–Zelevinsky, The Laurent
        // phenomenon, 2002, Example 1.7 / Thm 1.8 with arbitrary coefficients).
        var rec = Recurrence.Parse("x_{n+4} x_n = a x_{n+3} x_{n+1} + b x_{n+2}^2");
        var formal = LaurentPhenomenon.Check(rec, 6);
        Assert.Equal(["x_0", "x_1", "x_2", "x_3", "a", "b"], formal.Variables.ToArray());
        Assert.True(formal.IsLaurent && formal.AllPositive);
        Assert.All(formal.Steps, s => Assert.True(s.MinExponents[4] >= 0 && s.MinExponents[5] >= 0));   // polynomial in a, b
        var set = LaurentPhenomenon.Check(rec, 6, new LaurentOptions { ParameterValues = new Dictionary<string, Rational> { ["a"] = 2 } });
        Assert.Equal(["x_0", "x_1", "x_2", "x_3", "b"], set.Variables.ToArray());
        Assert.True(set.IsLaurent);
        Assert.Throws<ArgumentException>(() => LaurentPhenomenon.Check(rec, 2, new LaurentOptions { ParameterValues = new Dictionary<string, Rational> { ["c"] = 1 } }));
    }

    [Fact]
    public void Check_TermBudget_PartialReportNamesLimit()
    {
        var report = LaurentPhenomenon.Check(Recurrence.Parse(Somos4), 30, new LaurentOptions { Budget = AnalysisBudget.Default with { MaxTerms = 50 } });
        Assert.Equal(BudgetLimit.Terms, report.Limit);
        Assert.True(report.IsLaurent);
        Assert.False(report.IsComplete);
        Assert.InRange(report.Steps.Length, 3, 29);
        Assert.Contains("\"limit\": \"terms\"", report.ToJson());
    }

    [Fact]
    public void Check_Cancellation_Throws()
    {
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => LaurentPhenomenon.Check(Recurrence.Parse(Somos4), 5, cancellation: cts.Token));
    }

    [Fact]
    public void Check_Progress_OnePerStep()
    {
        var seen = new List<AnalysisProgress>();
        LaurentPhenomenon.Check(Recurrence.Parse(Somos4), 4, progress: new SyncProgress<AnalysisProgress>(seen.Add));
        Assert.Equal(4, seen.Count);
        Assert.Equal(4, seen[^1].Step);
    }

    [Fact]
    public void Check_System_LaurentPerUnknown()
    {
        // The system x_{n+1} = y_n, y_{n+1} x_n = y_n^2 + 1 is the scalar x_{n+1} x_{n-1} = x_n^2 + 1 in disguise.
        var report = LaurentPhenomenon.Check(RecurrenceSystem.Parse("x_{n+1} = y_n, y_{n+1} x_n = y_n^2 + 1"), 5);
        Assert.True(report.IsLaurent);
        Assert.Equal(10, report.Steps.Length);
        Assert.Equal(["x_0", "y_0"], report.Variables.ToArray());
    }

    [Fact]
    public void Check_TSystem_TermCountsAndDominoCount()
    {
        // T_{0,N} of the T-system with symbolic light-cone data has 2, 7, 41, 395 terms for N = 2..5 and
        // value 2^{N(N-1)/2} at all ones (Aztec diamond domino tilings, Elkies–Kuperberg–Larsen–Propp 1992);
        // term counts as in the reference README of the performance anchors (FLINT, Singular agree).
        var t = LatticeRecurrence.Parse("T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n}");
        var report = LaurentPhenomenon.Check(t, 5);
        Assert.True(report.IsLaurent && report.AllPositive);
        Assert.Equal([2, 7, 41, 395], report.Steps.Select(s => s.TermCount));
        var ones = Enumerable.Repeat(Rational.One, report.Variables.Length).ToArray();
        Assert.Equal(new Rational(1024), report.Steps[^1].Value.Evaluate(ones));
    }

    [Fact]
    public void Check_TSystemTypeA2_BoundaryOnes_LaurentPositive()
    {
        // The A_r T-system with T_{0,n} = T_{r+1,n} = 1 has Laurent solutions with positive coefficients in
        // any admissible initial data (Di Francesco–Kedem, "Q-systems, heaps, paths and cluster positivity",
        // Comm. Math. Phys. 293 (2010); for the T-system: Di Francesco–Kedem 2013).
        var t = LatticeRecurrence.Parse("T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n}");
        var report = LaurentPhenomenon.Check(t, 6, space: 1, spaceRange: (1, 2));
        Assert.True(report.IsLaurent && report.AllPositive);
        Assert.All(report.Variables, v => Assert.Matches(@"^T_\{[12],[01]\}$", v));
        Assert.Throws<ArgumentOutOfRangeException>(() => LaurentPhenomenon.Check(t, 6, space: 3, spaceRange: (1, 2)));
    }

    [Fact]
    public void Check_Octahedron_PowersOfTwoAllCoefficientsOne()
    {
        // Speyer, "Perfect matchings and the octahedron recurrence", J. Algebraic Combin. 25 (2007):
        // f at height k has 2^{k(k-1)/2} terms, all with coefficient 1.
        var report = LaurentPhenomenon.CheckOctahedron(5);
        Assert.True(report.IsLaurent);
        Assert.Equal([2, 8, 64, 1024], report.Steps.Select(s => s.TermCount));
        Assert.All(report.Steps, s => Assert.All(s.Value.Coefficients.ToArray(), c => Assert.True(c.IsOne)));
    }

    [Fact]
    public void Check_MutationSequence_MarkovLaurentPositive()
    {
        // Cluster variables are Laurent (Fomin–Zelevinsky, Cluster algebras I, 2002, Thm 3.1) with positive
        // coefficients (Lee–Schiffler 2015).
        var report = LaurentPhenomenon.Check(ExchangeMatrix.Markov, [1, 2, 3, 1, 2, 3]);
        Assert.True(report.IsLaurent && report.AllPositive);
        Assert.Equal("x_1'", report.Steps[0].Term);
        Assert.Equal("x_1''", report.Steps[3].Term);
    }

    [Fact]
    public void Report_TextLatexJson_CarryVerdictAndEvidence()
    {
        var report = LaurentPhenomenon.Check(Recurrence.Parse(Somos8), 10);
        var text = report.ToString();
        Assert.Contains("NOT Laurent", text);
        Assert.Contains("x_{16}", text);
        Assert.Contains("specialisation", text);
        Assert.Contains("not a Laurent polynomial", report.ToLatex());
        using var doc = System.Text.Json.JsonDocument.Parse(report.ToJson());
        var root = doc.RootElement;
        Assert.False(root.GetProperty("laurent").GetBoolean());
        Assert.Equal(16, root.GetProperty("firstFailure").GetInt32());
        Assert.Equal(8, root.GetProperty("steps")[0].GetProperty("n").GetInt32());
        Assert.Equal(report.Failure!.ValueAtOnes!.Value.ToString(), root.GetProperty("witness").GetProperty("valueAtOnes").GetString());
    }

    [Fact]
    public void Check_BadArguments_Typed()
    {
        Assert.Throws<ArgumentNullException>(() => LaurentPhenomenon.Check((Recurrence)null!, 3));
        Assert.Throws<ArgumentOutOfRangeException>(() => LaurentPhenomenon.Check(Recurrence.Parse(Somos4), 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => LaurentPhenomenon.CheckOctahedron(1));
        Assert.Throws<ArgumentOutOfRangeException>(() => LaurentPhenomenon.Check(ExchangeMatrix.Markov, [4]));
        Assert.Throws<ArgumentException>(() => LaurentPhenomenon.Check(ExchangeMatrix.Markov, []));
    }
}

/// <summary>An IProgress that calls back synchronously (Progress&lt;T&gt; posts to the thread pool).</summary>
internal sealed class SyncProgress<T>(Action<T> report) : IProgress<T>
{
    public void Report(T value) => report(value);
}
