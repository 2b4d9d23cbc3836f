using System.Numerics;
using System.Text.Json;
using CsCheck;
using Integrable.Algebra;
using Integrable.Clusters;
using Integrable.LinearAlgebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Recursions;
using Integrable.Serialization;
using Integrable.Tests.Clusters;

namespace Integrable.Tests.Serialization;

/// <summary>Round trips through <see cref="IntegrableJson"/>: every value reads back equal to the one written.</summary>
public class IntegrableJsonTests
{
    private static T RoundTrip<T>(T value) => IntegrableJson.Deserialize<T>(IntegrableJson.Serialize(value));

    // ---- numbers and matrices ----

    private static readonly Gen<BigInteger> EdgeInteger = Gen.OneOf(
        Gen.Int[-3, 3].Select(x => new BigInteger(x)),
        Gen.Long.Select(x => new BigInteger(x)),
        Gen.Int[-3, 3].Select(x => new BigInteger(long.MaxValue) + x),
        Gen.Int[-3, 3].Select(x => new BigInteger(long.MinValue) + x),
        Gen.Select(Gen.Long, Gen.Long).Select((a, b) => new BigInteger(a) * b));

    private static readonly Gen<Rational> EdgeRational =
        Gen.Select(EdgeInteger, EdgeInteger.Where(d => !d.IsZero)).Select((n, d) => new Rational(n, d));

    [Fact]
    public void Rational_RandomEdgeValues_RoundTripAsPOverQString()
    {
        EdgeRational.Sample(q =>
        {
            string json = IntegrableJson.Serialize(q);
            Assert.Equal("\"" + q + "\"", json);
            Assert.Equal(q, IntegrableJson.Deserialize<Rational>(json));
        }, iter: 2000);
        Assert.Equal("\"-3/4\"", IntegrableJson.Serialize(new Rational(6, -8)));
    }

    [Fact]
    public void Rational_JsonInteger_Reads()
    {
        Assert.Equal(new Rational(BigInteger.Pow(10, 30)), IntegrableJson.Deserialize<Rational>("1000000000000000000000000000000"));
        Assert.Equal(new Rational(-7), IntegrableJson.Deserialize<Rational>("-7"));
    }

    private static readonly Gen<Rational> Entry = Gen.OneOf(
        Gen.Const(Rational.Zero), Gen.Int[-5, 5].Select(i => (Rational)i),
        Gen.Select(Gen.Int[-9, 9], Gen.Int[1, 9]).Select((n, d) => new Rational(n, d)), EdgeRational);

    [Fact]
    public void RationalMatrix_RandomShapesIncludingEmpty_RoundTrip()
    {
        Gen.Select(Gen.Int[0, 5], Gen.Int[0, 5])
            .SelectMany((m, n) => Entry.Array[m * n].Select(e => RationalMatrix.FromRowMajor(m, n, e)))
            .Sample(a =>
            {
                var b = RoundTrip(a);
                Assert.Equal(a, b);
                Assert.Equal((a.RowCount, a.ColumnCount), (b.RowCount, b.ColumnCount));
            }, iter: 500);
    }

    // ---- polynomials and rational functions ----

    private static readonly LaurentPolynomialRing Ring = new("x", "y", "x_{n+1}", "T_{a+1,n}");

    private static readonly Gen<LaurentPolynomial> Polynomial =
        Gen.Select(Gen.Int[-40, 40], Gen.Int[1, 9], Gen.Int[-3, 3].Array[4]).Array[0, 6].Select(terms =>
        {
            var b = Ring.CreateBuilder();
            foreach (var (num, den, e) in terms) b.Add(new Rational(num, den), e);
            return b.ToPolynomial();
        });

    [Fact]
    public void LaurentPolynomial_Random_RoundTripsInTheSameRing()
    {
        Polynomial.Sample(p =>
        {
            var q = RoundTrip(p);
            Assert.Equal(p, q);
            Assert.Equal(p.Ring, q.Ring);
        }, iter: 1000);
    }

    [Fact]
    public void RationalFunction_RandomQuotients_RoundTrip()
    {
        var field = new RationalFunctionField(Ring);
        Gen.Select(Polynomial, Polynomial.Where(q => !q.IsZero)).Sample((p, q) =>
        {
            var f = field.Parse($"({p})/({q})");
            var g = RoundTrip(f);
            Assert.Equal(f, g);
            Assert.Equal(field, g.Field);
        }, iter: 200);
    }

    // ---- clusters ----

    [Fact]
    public void ExchangeMatrix_RandomSkewSymmetricAndSymmetrizable_RoundTrip()
    {
        Gen.OneOf(ClusterGenerators.SkewSymmetric, ClusterGenerators.Matrix).Sample(b =>
        {
            var c = RoundTrip(b);
            Assert.Equal(b, c);
            Assert.Equal(b.FrozenCount, c.FrozenCount);
            Assert.Equal(b.Symmetrizer.ToArray(), c.Symmetrizer.ToArray());
        }, iter: 500);
    }

    [Fact]
    public void Quiver_RandomSkewSymmetricAfterMutation_RoundTrip()
    {
        Gen.Select(ClusterGenerators.SkewSymmetric, Gen.Int[0, 100].Array[0, 4]).Sample((b, raw) =>
        {
            var q = Quiver.FromMatrix(b).Mutate(raw.Select(r => 1 + r % b.MutableCount).ToArray());
            var r = RoundTrip(q);
            Assert.Equal(q, r);
            Assert.Equal(q.ToMatrix(), r.ToMatrix());
        }, iter: 300);
    }

    [Fact]
    public void Seed_LaurentVariablesAfterRandomMutations_RoundTrip()
    {
        // The cluster variables stay Laurent polynomials (Fomin–Zelevinsky, Cluster algebras I, 2002, Thm. 3.1).
        // To keep them small: rank ≤ 2 with entries up to 2 (finite or affine type, |b c| ≤ 4), rank 3 with entries ±1
        // (a path or oriented 3-cycle of type A₃, or the acyclic triangle of affine type); the Markov quiver (all entries 2)
        // grows doubly exponentially and is left out (common knowledge).
        var small = from n in Gen.Int[1, 3]
                    from m in Gen.Int[0, 2]
                    from upper in Gen.Int[n <= 2 ? -2 : -1, n <= 2 ? 2 : 1].Array[n * n]
                    from frozen in Gen.Int[-1, 1].Array[m * n]
                    select Skew(n, m, upper, frozen);
        Gen.Select(small, Gen.Int[0, 100].Array[0, 5]).Sample((b, raw) =>
        {
            var seed = LaurentSeeds.Initial(b).Mutate(raw.Select(r => 1 + r % b.MutableCount).ToArray());
            var back = RoundTrip(seed);
            Assert.Equal(seed, back);
            Assert.Equal(seed.Ring, back.Ring);
            // the copy keeps mutating like the original
            Assert.Equal(seed.Mutate(1), back.Mutate(1));
        }, iter: 150);
    }

    private static ExchangeMatrix Skew(int n, int m, int[] upper, int[] frozen)
    {
        var b = new int[(n + m) * n];
        for (int i = 0; i < n; i++)
            for (int j = i + 1; j < n; j++) { b[i * n + j] = upper[i * n + j]; b[j * n + i] = -upper[i * n + j]; }
        Array.Copy(frozen, 0, b, n * n, m * n);
        return ExchangeMatrix.FromRows(n, m, b);
    }

    [Fact]
    public void Seed_RationalValues_RoundTrip()
    {
        // type A_2 with values (2, 3): five mutations give (3, 2) (Fomin–Zelevinsky, Cluster algebras I, 2002; the pentagon).
        var s = new Seed<Rational>(RationalField.Instance, ExchangeMatrix.Parse("[[0,1],[-1,0]]"), [new Rational(2), new Rational(3, 7)]);
        foreach (var t in new[] { s, s.Mutate(1), s.Mutate(1, 2), s.Mutate(1, 2, 1) })
            Assert.Equal(t, RoundTrip(t));
    }

    // ---- recursions and maps ----

    public static TheoryData<string, string?> Published => new()
    {
        { "x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2", null },             // Somos-4 (M. Somos 1989; D. Gale, Math. Intelligencer 13 (1991) 40)
        { "x_{n+4} x_n = a x_{n+3} x_{n+1} + b x_{n+2}^2", null },         // Somos-4 with coefficients (A. Hone, "Elliptic curves and quadratic recurrence sequences", 2005)
        { "x_{n+5} x_n = x_{n+4} x_{n+1} + x_{n+3} x_{n+2}", null },       // Somos-5 (Gale 1991)
        { "x_{n+1} x_{n-1} = x_n + 1", null },                             // Lyness, period 5 (R. C. Lyness 1942)
        { "x_{n+1} x_{n-1} = x_n + a", null },                             // Lyness family with a parameter (Lyness 1942)
        { "x_{n+1} + x_{n-1} = 2 m x_n/(1 + x_n^2)", null },              // McMillan's symmetric QRT map (Quispel–Roberts–Thompson, Phys. Lett. A 126 (1988) 419)
        { "x_{n+1} + x_{n-1} = x_n + 1/x_n^2", null },                     // Hietarinta–Viallet (Phys. Rev. Lett. 81 (1998) 325)
        { "x_{n+1} + x_n + x_{n-1} = (a n + b)/x_n + c", null },           // d-PI, non-autonomous (Grammaticos–Ramani–Papageorgiou, Phys. Rev. Lett. 67 (1991) 1825)
        { "x_{n+1} + x_{n-1} = ((a n + b) x_n + c)/(1 - x_n^2)", null },   // d-PII, non-autonomous (Ramani–Grammaticos–Hietarinta, Phys. Rev. Lett. 67 (1991) 1829)
        { "u_{k+1} u_{k-1} = u_k^2 + k", "k" },                            // our own, index k given explicitly
    };

    [Theory]
    [MemberData(nameof(Published))]
    public void Recurrence_PublishedEquations_RoundTripToSameTextShapeAndIterates(string equation, string? index)
    {
        var rec = Recurrence.Parse(equation, index);
        string json = IntegrableJson.Serialize(rec);
        var back = IntegrableJson.Deserialize<Recurrence>(json);
        Assert.Equal(rec.Text, back.Text);
        Assert.Equal((rec.Unknown, rec.Index, rec.Order, rec.LowestShift, rec.IsAutonomous, rec.IsInvertible),
            (back.Unknown, back.Index, back.Order, back.LowestShift, back.IsAutonomous, back.IsInvertible));
        Assert.Equal(rec.Parameters.ToArray(), back.Parameters.ToArray());
        // the recompiled rule gives the same iterates at a generic rational point
        var q = RationalField.Instance;
        var initial = Enumerable.Range(0, rec.Order).Select(i => new Rational(2 * i + 3, i + 2)).ToArray();
        var parameters = rec.Parameters.Select((_, i) => new Rational(i + 5, 3)).ToArray();
        Assert.Equal(rec.Iterate(q, initial, 6, parameters, start: 1), back.Iterate(q, initial, 6, parameters, start: 1));
        // the same JSON again: writing is deterministic
        Assert.Equal(json, IntegrableJson.Serialize(back));
    }

    [Fact]
    public void RecurrenceSystem_RoundTripsToSameShapeAndIterates()
    {
        var s = RecurrenceSystem.Parse("u_{n+2} = u_{n+1} + a v_n, v_{n+1} = u_n/(v_n + n)");
        var back = RoundTrip(s);
        Assert.Equal(s.Text, back.Text);
        Assert.Equal((s.Index, s.IsAutonomous, s.Dimension), (back.Index, back.IsAutonomous, back.Dimension));
        Assert.Equal(s.Unknowns.ToArray(), back.Unknowns.ToArray());
        Assert.Equal(s.Orders.ToArray(), back.Orders.ToArray());
        Assert.Equal(s.Parameters.ToArray(), back.Parameters.ToArray());
        var q = RationalField.Instance;
        Rational[] start = [new(1), new(2, 3), new(5)], a = [new(7, 2)];
        var x = s.Iterate(q, start, 6, a);
        var y = back.Iterate(q, start, 6, a);
        Assert.Equal(x.Count, y.Count);
        for (int i = 0; i < x.Count; i++) Assert.Equal(x[i], y[i]);
    }

    [Fact]
    public void LatticeRecurrence_TSystem_RoundTripsToSameValues()
    {
        // the T-system of type A (Kuniba–Nakanishi–Suzuki, "T-systems and Y-systems in integrable systems", J. Phys. A 44 (2011) 103001)
        var t = LatticeRecurrence.Parse("T_{a,n+1} T_{a,n-1} = T_{a,n}^2 + T_{a+1,n} T_{a-1,n}");
        var back = RoundTrip(t);
        Assert.Equal(t.Text, back.Text);
        Assert.Equal(t.Stencil.ToArray(), back.Stencil.ToArray());
        var q = RationalField.Instance;
        Rational Init(int a, int n) => new(a * a + n + 2, n + 1);
        Assert.Equal(t.Evaluate(q, 0, 4, Init), back.Evaluate(q, 0, 4, Init));
    }

    [Fact]
    public void RationalMap_LibraryMaps_RoundTripEqual()
    {
        // Lyness as a QRT map (Lyness 1942; Quispel–Roberts–Thompson 1988), a map with parameters in a non-default order,
        // a three-dimensional map and the map of Somos-4 (Gale 1991).
        var maps = new[]
        {
            QrtMap.Symmetric("[[0, 1, 1], [1, a + 2, a + 1], [1, a + 1, a]]", "[[0, 0, 0], [0, 1, 0], [0, 0, 0]]").Map,
            RationalMap.Parse("(p, q) -> (q, (b q + a)/p)"),
            RationalMap.Parse("(x, y, z) -> (y, z, (y z + c)/x)"),
            RationalMap.FromRecurrence(Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2")),
        };
        foreach (var phi in maps)
        {
            var back = RoundTrip(phi);
            Assert.Equal(phi, back);
            Assert.Equal(phi.Parameters.ToArray(), back.Parameters.ToArray());
        }
    }

    [Fact]
    public void RationalMap_RandomPlaneMaps_RoundTripEqual()
    {
        var ring = new LaurentPolynomialRing("x", "y", "a");
        var poly = Gen.Select(Gen.Int[-9, 9], Gen.Int[1, 4], Gen.Int[0, 2].Array[3]).Array[1, 4].Select(terms =>
        {
            var b = ring.CreateBuilder();
            foreach (var (num, den, e) in terms) b.Add(new Rational(num, den), e);
            return b.ToPolynomial();
        });
        var field = new RationalFunctionField(ring);
        Gen.Select(poly, poly.Where(p => !p.IsZero), poly, poly.Where(p => !p.IsZero)).Sample((p1, q1, p2, q2) =>
        {
            var phi = RationalMap.Plane(field.Parse($"({p1})/({q1})"), field.Parse($"({p2})/({q2})"));
            Assert.Equal(phi, RoundTrip(phi));
        }, iter: 150);
    }

    // ---- records of users, reports ----

    private sealed record Experiment(string Name, Recurrence Rule, Rational[] Start, Seed<LaurentPolynomial> Seed, RationalMap? Map);

    [Fact]
    public void UserRecord_WithLibraryValues_RoundTripsThroughOptions()
    {
        var e = new Experiment("our run", Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 3 x_n + 1"), [new(1), new(-2, 5)],
            LaurentSeeds.Initial(ExchangeMatrix.Parse("[[0,2],[-1,0]]")).Mutate(1, 2), null);
        string json = JsonSerializer.Serialize(e, IntegrableJson.Options);
        Assert.Contains("\"rule\":{\"equation\":", json, StringComparison.Ordinal);   // camelCase names of the user's record
        var back = JsonSerializer.Deserialize<Experiment>(json, IntegrableJson.Options)!;
        Assert.Equal(e.Name, back.Name);
        Assert.Equal(e.Rule.Text, back.Rule.Text);
        Assert.Equal(e.Start, back.Start);
        Assert.Equal(e.Seed, back.Seed);
        Assert.Null(back.Map);
    }

    [Fact]
    public void AddConverters_OwnOptions_ReadTheSameJson()
    {
        var options = new JsonSerializerOptions();
        IntegrableJson.AddConverters(options);
        var b = ExchangeMatrix.FiniteType("D4");
        Assert.Equal(b, JsonSerializer.Deserialize<ExchangeMatrix>(JsonSerializer.Serialize(b, options), options));
        Assert.Equal(IntegrableJson.Serialize(b), JsonSerializer.Serialize(b, options));
        Assert.Throws<InvalidOperationException>(() => IntegrableJson.AddConverters(IntegrableJson.Options));
    }

    [Fact]
    public void Report_SerializedInsideARecord_IsItsToJsonObject()
    {
        var report = Integrable.Analyses.Periodicity.Find(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1"), 8);
        string json = IntegrableJson.Serialize(new { report });
        using var ours = JsonDocument.Parse(json);
        using var own = JsonDocument.Parse(report.ToJson());
        Assert.True(JsonElement.DeepEquals(own.RootElement, ours.RootElement.GetProperty("report")));
        var e = Assert.Throws<JsonException>(() => IntegrableJson.Deserialize<Integrable.Analyses.PeriodReport>(report.ToJson()));
        Assert.Contains("not read back", e.Message, StringComparison.Ordinal);
    }

    private sealed record Point(Rational? X, Rational Y);

    [Fact]
    public void NullableRational_InUserRecord_NullStaysNull()
    {
        var p = new Point(null, new Rational(-1, 3));
        string json = JsonSerializer.Serialize(p, IntegrableJson.Options);
        Assert.Equal("""{"x":null,"y":"-1/3"}""", json);
        Assert.Equal(p, JsonSerializer.Deserialize<Point>(json, IntegrableJson.Options));
    }

    [Fact]
    public void SharedOptions_ParallelRoundTrips_SameAsSequential()
    {
        // the shared read-only options and the immutable values are used from many threads at once
        var equations = Published.Select(row => ((string)row[0], (string?)row[1])).ToArray();
        var sequential = equations.Select(e => IntegrableJson.Serialize(Recurrence.Parse(e.Item1, e.Item2))).ToArray();
        var parallel = new string[64];
        Parallel.For(0, parallel.Length, i =>
        {
            var e = equations[i % equations.Length];
            var back = IntegrableJson.Deserialize<Recurrence>(IntegrableJson.Serialize(Recurrence.Parse(e.Item1, e.Item2)));
            parallel[i] = IntegrableJson.Serialize(back);
        });
        for (int i = 0; i < parallel.Length; i++) Assert.Equal(sequential[i % equations.Length], parallel[i]);
    }
}
