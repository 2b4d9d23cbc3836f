using Integrable.Algebra;
using Integrable.Analyses;
using Integrable.Clusters;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Recursions;
using Xunit;

namespace Integrable.Tests.Hardening;

/// <summary>Immutable objects and compiled rules are safe to share: a mix of analyses runs on many
/// threads over the same recurrence objects, rings and matrices, and every result equals the one computed
/// sequentially.</summary>
public class ConcurrencyTests
{
    private static readonly Recurrence Somos4 = Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2");
    private static readonly Recurrence Lyness = Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1");
    private static readonly Recurrence Qrt = Recurrence.Parse("x_{n+1} + x_{n-1} = 1/x_n + 1/x_n^2");
    private static readonly Recurrence PainleveI = Recurrence.Parse("x_{n+1} + x_n + x_{n-1} = a + b/x_n");
    private static readonly ExchangeMatrix A4 = ExchangeMatrix.Parse("[[0,1,0,0],[-1,0,1,0],[0,-1,0,1],[0,0,-1,0]]");
    private static readonly LaurentPolynomialRing Ring = new(["a", "b", "c", "d"]);

    /// <summary>Each job returns a text that captures its whole result.</summary>
    private static readonly Func<string>[] Jobs =
    [
        () => LaurentPhenomenon.Check(Somos4, 10).ToJson(),
        () => DegreeGrowth.Analyse(Qrt, 14).ToJson(),
        () => Periodicity.Find(Lyness, 12).ToJson(),
        () => SingularityConfinement.Test(PainleveI).ToJson(),
        () => ExchangeGraph.Explore(A4).ToString(),
        () => string.Join(",", Somos4.Iterate(RationalField.Instance, [Rational.One, Rational.One, Rational.One, Rational.One], 20)),
        () => string.Join(";", Somos4.Iterate(Ring, [Ring.Variable(0), Ring.Variable(1), Ring.Variable(2), Ring.Variable(3)], 7)),
        () => string.Join(",", Lyness.Iterate(new PrimeField(1_000_003), [2UL, 5UL], 30)),
        () => LaurentPhenomenon.Check(A4, [1, 2, 3, 4, 1, 2]).ToJson(),
        () => Integrable.Integrals.FirstIntegrals.Find(Lyness, new Integrable.Integrals.IntegralOptions { Degree = 3, Rational = true }).ToJson(),
        () => Integrable.Solutions.SeriesSolver.SolveBoundaryValue(Recurrence.Parse("R_n = 1 + g R_n (R_{n-1} + R_n + R_{n+1})"), "g", 0,
            [Rational.Zero], new Integrable.Solutions.SeriesOptions { Order = 15 }).ToJson(),
    ];

    [Fact]
    public void MixedAnalyses_ManyThreads_MatchSequentialResults()
    {
        var expected = Jobs.Select(j => WithoutTimings(j())).ToArray();
        const int copies = 6;
        var results = new string[Jobs.Length * copies];
        var order = Enumerable.Range(0, results.Length).OrderBy(i => (i * 7919) % results.Length).ToArray();
        Parallel.ForEach(order, new ParallelOptions { MaxDegreeOfParallelism = 8 }, i => results[i] = WithoutTimings(Jobs[i % Jobs.Length]()));
        for (int i = 0; i < results.Length; i++)
            Assert.Equal(expected[i % Jobs.Length], results[i]);
    }

    /// <summary>Drops elapsed-time fields, the only part of a report that may differ between runs.</summary>
    private static string WithoutTimings(string json) =>
        System.Text.RegularExpressions.Regex.Replace(json, "\"(seconds|elapsed|elapsedSeconds)\": [0-9.eE+-]+,?", "");

    [Fact]
    public async Task SharedCompiledRule_ManyThreads_SameValues()
    {
        var expected = Somos4.Iterate(RationalField.Instance, [Rational.One, new(2), new(3), new(4)], 25);
        var threads = Enumerable.Range(0, 8).Select(_ => Task.Run(() =>
        {
            for (int k = 0; k < 30; k++)
                Assert.Equal(expected, Somos4.Iterate(RationalField.Instance, [Rational.One, new(2), new(3), new(4)], 25));
        })).ToArray();
        await Task.WhenAll(threads);
    }
}
