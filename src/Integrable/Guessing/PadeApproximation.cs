using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Guessing;

/// <summary>Rational generating functions from sequences: P/Q with the fewest parameters (via
/// Berlekamp–Massey), and Padé approximants of given degrees (via Hermite–Padé linear algebra).</summary>
/// <example><code>
/// var f = PadeApproximation.RationalFunction(fibonacci).Value;    // (x)/(1 - x - x^2)
/// </code></example>
public static class PadeApproximation
{
    /// <summary>Guesses the rational generating function of a sequence of rationals.</summary>
    /// <param name="terms">a_0, a_1, ….</param>
    /// <param name="minimumConfirmations">Confirmations required.</param>
    /// <returns>P/Q with Q(0) = 1 and max(deg P + 1, deg Q) minimal, with its evidence.</returns>
    public static GuessResult<RationalGeneratingFunction<Rational>> RationalFunction(ReadOnlySpan<Rational> terms, int minimumConfirmations = GuessDefaults.MinimumConfirmations) =>
        FromRecurrence(BerlekampMassey.Find(terms, minimumConfirmations));

    /// <summary>Guesses the rational function whose expansion is <paramref name="series"/> (known to finite precision).</summary>
    /// <typeparam name="T">The coefficient type.</typeparam>
    /// <param name="series">The series.</param>
    /// <param name="minimumConfirmations">Confirmations required.</param>
    /// <returns>P/Q with its evidence.</returns>
    /// <exception cref="ArgumentException">The series is exact.</exception>
    public static GuessResult<RationalGeneratingFunction<T>> RationalFunction<T>(PowerSeries<T> series, int minimumConfirmations = GuessDefaults.MinimumConfirmations) =>
        FromRecurrence(BerlekampMassey.Find(series, minimumConfirmations));

    private static GuessResult<RationalGeneratingFunction<T>> FromRecurrence<T>(GuessResult<LinearRecurrence<T>> r)
    {
        var f = r.Candidate?.GeneratingFunction;
        return new GuessResult<RationalGeneratingFunction<T>>(f, r.IsFound, r.TermsUsed, r.TermsConfirmed, r.MinimumConfirmations,
            r.Explanation.Replace("a recurrence of order", "a rational function of order", StringComparison.Ordinal));
    }

    /// <summary>The Padé approximant P/Q of type (<paramref name="numeratorDegree"/>, <paramref name="denominatorDegree"/>):
    /// Q·f − P = O(x^N) with deg P ≤ m, deg Q ≤ n, judged like every guess.</summary>
    /// <typeparam name="T">The coefficient type.</typeparam>
    /// <param name="series">The series f (finite precision N).</param>
    /// <param name="numeratorDegree">m ≥ 0.</param>
    /// <param name="denominatorDegree">n ≥ 0.</param>
    /// <param name="minimumConfirmations">Confirmations required.</param>
    /// <returns>P/Q normalized by Q(0) = 1 when Q(0) ≠ 0; not found when the only solutions have Q(0) = 0.</returns>
    public static GuessResult<RationalGeneratingFunction<T>> Pade<T>(PowerSeries<T> series, int numeratorDegree, int denominatorDegree, int minimumConfirmations = GuessDefaults.MinimumConfirmations)
    {
        ArgumentNullException.ThrowIfNull(series);
        var ring = series.Ring;
        var r = HermitePade.Find([ring.One.Truncate(series.Precision), series], [numeratorDegree, denominatorDegree], minimumConfirmations, ["1", "f"]);
        var rel = r.Candidate;
        if (rel is null) return new GuessResult<RationalGeneratingFunction<T>>(null, false, r.TermsUsed, r.TermsConfirmed, r.MinimumConfirmations, r.Explanation);
        var q = rel.Polynomials[1];
        var d = ring.Domain;
        if (q.IsZero || d.IsZero(q.Get(0)))
            return new GuessResult<RationalGeneratingFunction<T>>(null, false, r.TermsUsed, r.TermsConfirmed, r.MinimumConfirmations, "the relation found has Q(0) = 0, so P/Q is not a power series with these degrees");
        var scale = d.Inverse(q.Get(0));
        var f = new RationalGeneratingFunction<T>(-rel.Polynomials[0] * scale, q * scale);
        return new GuessResult<RationalGeneratingFunction<T>>(f, r.IsFound, r.TermsUsed, r.TermsConfirmed, r.MinimumConfirmations, r.Explanation);
    }
}
