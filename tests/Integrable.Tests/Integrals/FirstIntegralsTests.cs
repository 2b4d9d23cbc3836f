using Integrable.Integrals;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Recursions;
using Integrable.Text;

namespace Integrable.Tests.Integrals;

public class FirstIntegralsTests
{
    private static IntegralsReport Find(string equation, int degree, bool rational = false) =>
        FirstIntegrals.Find(Recurrence.Parse(equation), IntegralOptions.Default with { Degree = degree, Rational = rational });

    private static RationalFunction In(IntegralMap map, string text) => map.Field.Parse(text);

    /// <summary>True when f is an integral of the map (exact check).</summary>
    private static bool Preserved(IntegralMap map, RationalFunction f) => (f.Compose(map.Substitution(0)) - f).IsZero;

    /// <summary>True when the two functions are functionally dependent: their gradients are proportional as
    /// rational functions (the 2×2 minors vanish identically).</summary>
    private static bool Dependent(IntegralMap map, RationalFunction a, RationalFunction b)
    {
        var ga = map.StateVariables.Select(a.Derivative).ToArray();
        var gb = map.StateVariables.Select(b.Derivative).ToArray();
        for (int i = 0; i < ga.Length; i++)
            for (int j = i + 1; j < ga.Length; j++)
                if (!(ga[i] * gb[j] - ga[j] * gb[i]).IsZero) return false;
        return true;
    }

    [Fact]
    public void Find_McMillanMap_RecoversBiquadraticIntegralWithParameter()
    {
        // McMillan, "A problem in the stability of periodic systems" (1971): x_{n+1} + x_{n-1} = 2μ x_n/(1 − x_n²)
        // preserves the biquadratic x²y² − x² − y² + 2μxy (sign convention checked here by the exact identity;
        // it is the symmetric QRT form with α = 1, γ = −1, δ = 2μ).
        var r = Find("x_{n+1} + x_{n-1} = 2 μ x_n/(1 - x_n^2)", 4);
        Assert.True(r.IsComplete);
        var i = Assert.Single(r.PolynomialIntegrals);
        var expected = In(r.Map, "x_n^2 x_{n+1}^2 - x_n^2 - x_{n+1}^2 + 2 μ x_n x_{n+1}");
        Assert.True(i.Value == expected || i.Value == -expected, i.ToString());
        Assert.Equal(1, r.Independent);
        Assert.True(r.HasExpectedIntegrals);
        Assert.Equal(0, r.RejectedCandidates);
    }

    [Fact]
    public void Find_AutonomousDiscretePainleveI_CubicIntegral()
    {
        // Grammaticos, Ramani, Papageorgiou, "Do integrable mappings have the Painlevé property?", PRL 67 (1991):
        // autonomous d-PI x_{n+1} + x_n + x_{n-1} = a + b/x_n has the integral xy(x + y) − a xy − b(x + y).
        var r = Find("x_{n+1} + x_n + x_{n-1} = a + b/x_n", 3);
        Assert.True(r.IsComplete);
        var i = Assert.Single(r.PolynomialIntegrals);
        Assert.Equal(In(r.Map, "x_n^2 x_{n+1} + x_n x_{n+1}^2 - a x_n x_{n+1} - b x_n - b x_{n+1}"), i.Value);
    }

    [Fact]
    public void Find_LynessMapRational_RecoversPublishedIntegralAndMeasure()
    {
        // Lyness (1942), Kocic–Ladas, "Global behavior of nonlinear difference equations of higher order" (1993):
        // x_{n+1} = (a + x_n)/x_{n-1} preserves I = (x+1)(y+1)(x+y+a)/(xy) and the measure dx dy/(xy).
        var r = Find("x_{n+1} x_{n-1} = a + x_n", 3, rational: true);
        Assert.Empty(r.PolynomialIntegrals);
        Assert.True(r.IsComplete);
        var published = In(r.Map, "(x_n + 1)(x_{n+1} + 1)(x_n + x_{n+1} + a)/(x_n x_{n+1})");
        Assert.True(Preserved(r.Map, published));
        var found = Assert.Single(r.RationalIntegrals);
        Assert.True(Dependent(r.Map, found.Value, published), found.ToString());
        Assert.Equal(IntegralKind.Rational, found.Kind);
        Assert.Contains(r.Measures, m => m.Density == In(r.Map, "1/(x_n x_{n+1})"));
        Assert.Equal(1, r.Independent);
    }

    [Fact]
    public void Find_QSystemA1_RationalIntegral()
    {
        // Kedem, "Q-systems as cluster algebras", J. Phys. A 41 (2008): Q_{n+1}Q_{n-1} = Q_n² + 1 has the conserved
        // quantity Q_{n+1}/Q_n + Q_{n-1}/Q_n, i.e. (Q_{n-1}² + Q_n² + 1)/(Q_{n-1}Q_n) in the state (checked exactly).
        var r = Find("Q_{n+1} Q_{n-1} = Q_n^2 + 1", 2, rational: true);
        var published = In(r.Map, "(Q_n^2 + Q_{n+1}^2 + 1)/(Q_n Q_{n+1})");
        Assert.True(Preserved(r.Map, published));
        var found = Assert.Single(r.RationalIntegrals);
        Assert.True(Dependent(r.Map, found.Value, published), found.ToString());
        Assert.True(r.HasExpectedIntegrals);
    }

    [Fact]
    public void Find_Somos4RatioVariables_RationalIntegral()
    {
        // Somos-4 τ_{n+4}τ_n = τ_{n+3}τ_{n+1} + τ_{n+2}² in u_n = τ_{n+2}τ_n/τ_{n+1}² becomes u_{n+1}u_n²u_{n-1} = u_n + 1
        // (derivation: u_{n+2}u_{n+1}²u_n = τ_{n+4}τ_n/τ_{n+2}²); Hone, "Elliptic curves and quadratic recurrence
        // sequences", Bull. LMS 37 (2005): conserved u_{n-1}u_n + 1/u_{n-1} + 1/u_n + 1/(u_{n-1}u_n).
        var r = Find("u_{n+1} u_n^2 u_{n-1} = u_n + 1", 4, rational: true);
        var published = In(r.Map, "u_n u_{n+1} + 1/u_n + 1/u_{n+1} + 1/(u_n u_{n+1})");
        Assert.True(Preserved(r.Map, published));
        Assert.Contains(r.RationalIntegrals, i => Dependent(r.Map, i.Value, published));
        Assert.Equal(1, r.Independent);
    }

    [Fact]
    public void Find_QuadrangulationRecursion_IntegralPolynomialInWeight()
    {
        // Bouttier, Di Francesco, Guitter, "Geodesic distance in planar graphs", Nucl. Phys. B 663 (2003): the
        // two-point function of quadrangulations R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1}) has a conserved quantity;
        // in the state (x, y) = (R_n, R_{n+1}) it is g xy(x + y) − xy + x + y (found here, proved exactly).
        var r = Find("R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})", 3);
        Assert.True(r.IsComplete);
        var i = Assert.Single(r.PolynomialIntegrals);
        Assert.Equal(In(r.Map, "g R_n^2 R_{n+1} + g R_n R_{n+1}^2 - R_n R_{n+1} + R_n + R_{n+1}"), i.Value);
    }

    [Fact]
    public void Find_HietarintaVialletDegree8_NoPolynomialIntegral()
    {
        // Hietarinta, Viallet, "Singularity confinement and chaos in discrete systems", PRL 81 (1998): the map has
        // positive entropy, hence no polynomial integral; the search up to degree 8 is complete and empty.
        var r = Find("x_{n+1} + x_{n-1} = x_n + 1/x_n^2", 8);
        Assert.Empty(r.PolynomialIntegrals);
        Assert.Equal(0, r.UpperBound);
        Assert.True(r.IsComplete);
        Assert.Equal(0, r.Independent);
        Assert.False(r.HasExpectedIntegrals);
    }

    /// <summary>The symmetric QRT map (x, y) ↦ (y, (f1(y) − x f2(y))/(f2(y) − x f3(y))) with (f1, f2, f3) = (A0 Y) × (A1 Y),
    /// Y = (y², y, 1); it preserves (Xᵀ A0 Y)/(Xᵀ A1 Y), X = (x², x, 1) (Quispel, Roberts, Thompson, Phys. Lett. A 126 (1988) 419).</summary>
    private static (IntegralMap Map, RationalFunction Numerator, RationalFunction Denominator) Qrt(long[,] a0, long[,] a1)
    {
        var field = new RationalFunctionField("x_n", "x_{n+1}");
        var x = field.Variable(0);
        var y = field.Variable(1);
        RationalFunction[] X = [x * x, x, field.One], Y = [y * y, y, field.One];
        RationalFunction[] Mul(long[,] a, RationalFunction[] v) =>
            [.. Enumerable.Range(0, 3).Select(i => Enumerable.Range(0, 3).Aggregate(field.Zero, (acc, j) => acc + field.FromInteger(a[i, j]) * v[j]))];
        RationalFunction Form(long[,] a) => Enumerable.Range(0, 3).Aggregate(field.Zero, (acc, i) => acc + X[i] * Mul(a, Y)[i]);
        var u = Mul(a0, Y);
        var w = Mul(a1, Y);
        var f1 = u[1] * w[2] - u[2] * w[1];
        var f2 = u[2] * w[0] - u[0] * w[2];
        var f3 = u[0] * w[1] - u[1] * w[0];
        var map = IntegralMap.FromComponents(field, [y, (f1 - x * f2) / (f2 - x * f3)]);
        return (map, Form(a0), Form(a1));
    }

    [Fact]
    public void Find_QrtMapWithPolynomialIntegral_RecoversBiquadratic()
    {
        // QRT 1988 (see Qrt): with A1 = e3 e3ᵀ the integral Xᵀ A0 Y is a biquadratic polynomial.
        var (map, num, den) = Qrt(new long[,] { { 1, 2, 0 }, { 2, 0, -1 }, { 0, -1, 3 } }, new long[,] { { 0, 0, 0 }, { 0, 0, 0 }, { 0, 0, 1 } });
        Assert.True(den.IsOne);
        var r = FirstIntegrals.Find(map, IntegralOptions.Default with { Degree = 4 });
        Assert.True(r.IsComplete);
        var i = Assert.Single(r.PolynomialIntegrals);
        Assert.True(Dependent(map, i.Value, num));
        Assert.True((i.Value - num).IsConstant || (i.Value + num).IsConstant, i.ToString());
    }

    [Fact]
    public void Find_QrtMapWithRationalIntegral_RecoversRatioByDarboux()
    {
        // QRT 1988 (see Qrt): a general pair A0, A1 gives the rational integral (Xᵀ A0 Y)/(Xᵀ A1 Y).
        var (map, num, den) = Qrt(new long[,] { { 1, 2, 0 }, { 2, 0, -1 }, { 0, -1, 3 } }, new long[,] { { 0, 0, 1 }, { 0, 1, 0 }, { 1, 0, 0 } });
        Assert.True(Preserved(map, num / den));
        var r = FirstIntegrals.Find(map, IntegralOptions.Default with { Degree = 4, Rational = true });
        Assert.Empty(r.PolynomialIntegrals);
        Assert.Contains(r.RationalIntegrals, i => Dependent(map, i.Value, num / den));
        Assert.Equal(1, r.Independent);
    }

    [Fact]
    public void Find_AlternatingCoefficient_PairOfIntegrals()
    {
        // Asymmetric QRT (Quispel, Roberts, Thompson, Physica D 34 (1989) 183): the biquadratic
        // I(u, v) = u²v + uv² + u + c v gives, alternating the two root involutions, x_{n+1} + x_n + x_{n-1} = −b_n/x_n
        // with b_n = 1, c, 1, c, … (derivation checked here exactly); the pair is (I(x_n, x_{n+1}), I(x_{n+1}, x_n)).
        var map = IntegralMap.FromRecurrence(Recurrence.Parse("x_{n+1} + x_n + x_{n-1} = -b/x_n"),
            [new Dictionary<string, string> { ["b"] = "1" }, new Dictionary<string, string> { ["b"] = "c" }]);
        Assert.Equal(2, map.Period);
        var r = FirstIntegrals.Find(map, IntegralOptions.Default with { Degree = 3 });
        Assert.True(r.IsComplete);
        var i = Assert.Single(r.PolynomialIntegrals);
        var a = In(map, "x_n^2 x_{n+1} + x_n x_{n+1}^2 + x_n + c x_{n+1}");
        var b = In(map, "x_n^2 x_{n+1} + x_n x_{n+1}^2 + c x_n + x_{n+1}");
        Assert.Equal(2, i.Phases.Length);
        Assert.True((i.Phases[0] == a && i.Phases[1] == b) || (i.Phases[0] == b && i.Phases[1] == a), i.ToString());
        // The pair property: I_1∘φ_0 = I_0 and I_0∘φ_1 = I_1.
        Assert.Equal(i.Phases[0], i.Phases[1].Compose(map.Substitution(0)));
        Assert.Equal(i.Phases[1], i.Phases[0].Compose(map.Substitution(1)));
        // No single autonomous-style integral: the two phases differ.
        Assert.NotEqual(i.Phases[0], i.Phases[1]);
    }

    [Fact]
    public void Find_CandidateHoldingOnlyModP_Rejected()
    {
        // d-PI with a = 0, b = 1 (Grammaticos–Ramani–Papageorgiou 1991): I = x²y + xy² − x − y. The hook replaces
        // every candidate by I + p·x³ with p a prime near 2^62: it satisfies I∘φ = I modulo p but not over Q.
        ulong p = Integrable.Numbers.Primes.Large(5);
        var map = IntegralMap.FromRecurrence(Recurrence.Parse("x_{n+1} + x_n + x_{n-1} = 1/x_n"));
        var cube = LaurentPolynomial.Parse(map.Field.PolynomialRing, "x_n^3") * new Integrable.Numbers.Rational(p);
        var wrong = new List<LaurentPolynomial>();
        var options = IntegralOptions.Default with
        {
            Degree = 3,
            CandidateHook = cands => cands.Select(c => { var w = c[0] + cube; wrong.Add(w); return new[] { w }; }).ToList(),
        };
        var r = FirstIntegrals.Find(map, options);
        Assert.NotEmpty(wrong);
        // The wrong candidate really holds modulo p at a random point: I(φ(x)) − I(x) ≡ 0.
        var f = new Integrable.Numbers.PrimeField(p);
        var w0 = map.Field.FromPolynomial(wrong[0]);
        ulong[] point = [12345, 67890];
        Assert.Equal(w0.Evaluate(f, point), w0.Compose(map.Substitution(0)).Evaluate(f, point));
        Assert.True(r.RejectedCandidates >= 1);
        var i = Assert.Single(r.PolynomialIntegrals);
        Assert.Equal(In(map, "x_n^2 x_{n+1} + x_n x_{n+1}^2 - x_n - x_{n+1}"), i.Value);
        Assert.True(r.IsComplete);
    }

    [Fact]
    public void Find_CandidatesHoldingOnlyOnSampledPoints_RejectedThenRecovered()
    {
        // Same map; only 4 sampled points: the kernel of the sampled system has candidates that vanish at those
        // points only. They fail the exact proof; a second pass with enough points recovers I (GRP 1991).
        var map = IntegralMap.FromRecurrence(Recurrence.Parse("x_{n+1} + x_n + x_{n-1} = 1/x_n"));
        var r = FirstIntegrals.Find(map, IntegralOptions.Default with { Degree = 3, RowsOverride = 4 });
        Assert.True(r.RejectedCandidates >= 1);
        var i = Assert.Single(r.PolynomialIntegrals);
        Assert.Equal(In(map, "x_n^2 x_{n+1} + x_n x_{n+1}^2 - x_n - x_{n+1}"), i.Value);
        Assert.True(r.IsComplete);
    }

    [Fact]
    public void Find_TwoIntegralsOfThirdOrderMap_BothIndependent()
    {
        // A linear map x_{n+3} = x_n (period 3, common knowledge) has the independent integrals
        // x_n + x_{n+1} + x_{n+2} and x_n x_{n+1} + x_{n+1} x_{n+2} + x_{n+2} x_n (symmetric functions).
        var r = Find("x_{n+3} = x_n", 2);
        Assert.True(r.IsComplete);
        Assert.Equal(2, r.Independent);
        Assert.True(r.HasExpectedIntegrals);
        Assert.Contains(r.PolynomialIntegrals, i => i.Value == In(r.Map, "x_n + x_{n+1} + x_{n+2}"));
    }

    [Fact]
    public void Find_TextOfIntegral_ParsesBack()
    {
        var r = Find("x_{n+1} + x_{n-1} = 2 μ x_n/(1 - x_n^2)", 4);
        var text = r.PolynomialIntegrals[0].ToString();
        _ = ExpressionParser.Parse(text);
        Assert.Equal(r.PolynomialIntegrals[0].Value, r.Map.Field.Parse(text));
    }

    [Fact]
    public void Find_Cancelled_Throws()
    {
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.Throws<OperationCanceledException>(() =>
            FirstIntegrals.Find(Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2"), IntegralOptions.Default with { Degree = 6 }, cancellation: cts.Token));
    }

    [Fact]
    public void Find_TimeLimit_PartialReportNamesLimit()
    {
        var options = IntegralOptions.Default with { Degree = 10, Budget = Integrable.Analyses.AnalysisBudget.Default with { TimeLimit = TimeSpan.Zero } };
        var r = FirstIntegrals.Find(Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2"), options);
        Assert.Equal(Integrable.Analyses.BudgetLimit.Time, r.Limit);
        Assert.False(r.IsComplete);
    }

    [Fact]
    public void FromRecurrence_NonAutonomous_Throws()
    {
        var e = Assert.Throws<ArgumentException>(() => IntegralMap.FromRecurrence(Recurrence.Parse("x_{n+1} + x_{n-1} = n/x_n")));
        Assert.Contains("index n", e.Message);
    }

    [Fact]
    public void FromRecurrence_PhaseValueForUnknownName_Throws()
    {
        var e = Assert.Throws<ArgumentException>(() => IntegralMap.FromRecurrence(Recurrence.Parse("x_{n+1} + x_{n-1} = b/x_n"),
            [new Dictionary<string, string> { ["q"] = "1" }]));
        Assert.Contains("'q'", e.Message);
    }

    [Fact]
    public void Report_JsonAndLatex_CarryIntegrals()
    {
        var r = Find("x_{n+1} x_{n-1} = a + x_n", 3, rational: true);
        var root = System.Text.Json.JsonDocument.Parse(r.ToJson()).RootElement;
        Assert.Equal(1, root.GetProperty("integrals").GetArrayLength());
        Assert.Equal(1, root.GetProperty("independent").GetInt32());
        Assert.True(root.GetProperty("verified").GetBoolean());
        Assert.Contains("I_{1}", r.ToLatex());
        Assert.Contains("exact identity", r.Verification);
    }

    private sealed class ListProgress : IProgress<Integrable.Analyses.AnalysisProgress>
    {
        public List<Integrable.Analyses.AnalysisProgress> Items { get; } = [];
        public void Report(Integrable.Analyses.AnalysisProgress value) => Items.Add(value);
    }

    [Fact]
    public void Find_Progress_ReportsEachStage()
    {
        var progress = new ListProgress();
        FirstIntegrals.Find(Recurrence.Parse("Q_{n+1} Q_{n-1} = Q_n^2 + 1"), IntegralOptions.Default with { Degree = 2, Rational = true }, progress);
        Assert.Equal(3, progress.Items.Count);
        Assert.All(progress.Items, p => Assert.Equal("integrals", p.Analysis));
    }

    [Fact]
    public void Find_System_IntegralInBothUnknowns()
    {
        // Derivation checked here: for u_{n+1} = v_n, v_{n+1} = −u_n + 1/v_n the product p = uv maps to 1 − uv,
        // so uv(1 − uv) is conserved; up to degree 4 it spans the integrals (sign and constant normalised).
        var r = FirstIntegrals.Find(RecurrenceSystem.Parse("u_{n+1} = v_n; v_{n+1} = -u_n + 1/v_n"), IntegralOptions.Default with { Degree = 4 });
        Assert.Equal(["u_n", "v_n"], r.Map.StateVariables.ToArray());
        Assert.True(r.IsComplete);
        var i = Assert.Single(r.PolynomialIntegrals);
        Assert.Equal(In(r.Map, "u_n^2 v_n^2 - u_n v_n"), i.Value);
        Assert.True(Preserved(r.Map, i.Value));
    }

    [Fact]
    public void Find_BenchmarkMapDegree8_IntegralAndItsSquare()
    {
        // The W6 map (our own scenario) is the symmetric QRT normal form x_{n+1} + x_{n-1} = −(δy + ε)/(αy² + γ) with
        // α = γ = 1, δ = −k, ε = −1 (QRT 1988), integral x²y² + x² + y² − kxy − x − y; up to degree 8 the space is
        // spanned by I and I² (modulo constants).
        var r = Find("x_{n+1} + x_{n-1} = (k x_n + 1)/(x_n^2 + 1)", 8);
        Assert.True(r.IsComplete);
        Assert.Equal(2, r.PolynomialIntegrals.Length);
        var i = In(r.Map, "x_n^2 x_{n+1}^2 + x_n^2 + x_{n+1}^2 - k x_n x_{n+1} - x_n - x_{n+1}");
        Assert.Equal(i, r.PolynomialIntegrals[0].Value);
        Assert.Equal(8, r.PolynomialIntegrals[1].Degree);
        Assert.True(Dependent(r.Map, r.PolynomialIntegrals[1].Value, i));
        Assert.Equal(1, r.Independent);
    }

    [Fact]
    public void IsIntegral_PublishedAndPerturbed_TrueThenFalse()
    {
        // Lyness 1942; Kocic–Ladas 1993.
        var map = IntegralMap.FromRecurrence(Recurrence.Parse("x_{n+1} x_{n-1} = a + x_n"));
        var i = In(map, "(x_n + 1)(x_{n+1} + 1)(x_n + x_{n+1} + a)/(x_n x_{n+1})");
        Assert.True(FirstIntegrals.IsIntegral(map, i));
        Assert.False(FirstIntegrals.IsIntegral(map, i + In(map, "x_n")));
    }

    [Fact]
    public void Find_MultidegreeBound_BiquadraticOnly()
    {
        // McMillan 1971 (see above): with degree ≤ 2 in each variable the integral is still found; with degree ≤ 1
        // in each variable (total 4) there is none, and the search says so completely.
        var options = IntegralOptions.Default with { Degree = 4, MaxVariableDegree = 2 };
        var r = FirstIntegrals.Find(Recurrence.Parse("x_{n+1} + x_{n-1} = 2 μ x_n/(1 - x_n^2)"), options);
        Assert.Single(r.PolynomialIntegrals);
        r = FirstIntegrals.Find(Recurrence.Parse("x_{n+1} + x_{n-1} = 2 μ x_n/(1 - x_n^2)"), options with { MaxVariableDegree = 1 });
        Assert.Empty(r.PolynomialIntegrals);
        Assert.True(r.IsComplete);
    }
}
