using Integrable.Numbers;
using Integrable.Series;

namespace Integrable.Guessing;

/// <summary>The Berlekamp–Massey algorithm: the shortest linear recurrence with constant coefficients
/// that generates a finite sequence over a field (Q or Z/pZ), in O(N²) field operations.</summary>
/// <remarks>
/// For a recurrence of order L found from N terms, <see cref="GuessResult{TValue}.TermsUsed"/> is
/// max(2L, k + 1) where k is the index of the last term that changed the candidate (2L terms are needed
/// to determine an order-L recurrence), and every later term is a confirmation: the candidate predicted
/// it before seeing it. The recurrence is re-checked against all N terms before it is returned.
/// Reference: J. L. Massey, "Shift-register synthesis and BCH decoding", IEEE Trans. Inform. Theory 15
/// (1969) 122–127.
/// </remarks>
/// <example><code>
/// var g = BerlekampMassey.Find([0, 1, 1, 2, 3, 5, 8, 13, 21, 34, 55, 89, 144]);
/// // g.Value: a(n) = a(n-1) + a(n-2); g.TermsUsed = 4, g.TermsConfirmed = 9
/// </code></example>
public static class BerlekampMassey
{
    /// <summary>Finds the minimal recurrence of a sequence of rationals.</summary>
    /// <param name="terms">a_0, a_1, ….</param>
    /// <param name="minimumConfirmations">Confirmations required (default <see cref="GuessDefaults.MinimumConfirmations"/>).</param>
    /// <returns>The guess with its evidence.</returns>
    public static GuessResult<LinearRecurrence<Rational>> Find(ReadOnlySpan<Rational> terms, int minimumConfirmations = GuessDefaults.MinimumConfirmations) =>
        FindCore(PowerSeriesRing.Rationals, terms.ToArray(), minimumConfirmations);

    /// <summary>Finds the minimal recurrence of a sequence over Z/pZ.</summary>
    /// <param name="field">The prime field.</param>
    /// <param name="terms">Residues a_0, a_1, … in [0, p).</param>
    /// <param name="minimumConfirmations">Confirmations required.</param>
    /// <returns>The guess with its evidence.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A term is not a reduced residue.</exception>
    public static GuessResult<LinearRecurrence<ulong>> Find(PrimeField field, ReadOnlySpan<ulong> terms, int minimumConfirmations = GuessDefaults.MinimumConfirmations)
    {
        ArgumentNullException.ThrowIfNull(field);
        for (int i = 0; i < terms.Length; i++)
            if (terms[i] >= field.Modulus) throw new ArgumentOutOfRangeException(nameof(terms), terms[i], $"term {i} is not a residue modulo {field.Modulus}");
        return FindCore(PowerSeriesRing.Modular(field), terms.ToArray(), minimumConfirmations);
    }

    /// <summary>Finds the minimal recurrence of the coefficients of a series known to finite precision.</summary>
    /// <typeparam name="T">The coefficient type.</typeparam>
    /// <param name="series">The series; its known coefficients are the terms.</param>
    /// <param name="minimumConfirmations">Confirmations required.</param>
    /// <returns>The guess with its evidence.</returns>
    /// <exception cref="ArgumentException">The series is exact (infinitely many terms).</exception>
    public static GuessResult<LinearRecurrence<T>> Find<T>(PowerSeries<T> series, int minimumConfirmations = GuessDefaults.MinimumConfirmations)
    {
        ArgumentNullException.ThrowIfNull(series);
        if (series.IsExact) throw new ArgumentException("give the series a finite precision: the terms to guess from are its known coefficients", nameof(series));
        var t = new T[series.Precision];
        for (int i = 0; i < t.Length; i++) t[i] = series[i];
        return FindCore(series.Ring, t, minimumConfirmations);
    }

    internal static GuessResult<LinearRecurrence<T>> FindCore<T>(PowerSeriesRing<T> ring, T[] s, int minimumConfirmations)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(minimumConfirmations);
        var d = ring.Domain;
        int n = s.Length;
        var c = new List<T> { d.One };
        var b = new List<T> { d.One };
        int l = 0, m = 1, lastChange = -1;
        T bd = d.One;
        for (int k = 0; k < n; k++)
        {
            T disc = s[k];
            for (int i = 1; i <= l && i < c.Count; i++) disc = d.Add(disc, d.Multiply(c[i], s[k - i]));
            if (d.IsZero(disc)) { m++; continue; }
            lastChange = k;
            var coef = d.Multiply(disc, d.Inverse(bd));
            var old = 2 * l <= k ? new List<T>(c) : null;
            while (c.Count < b.Count + m) c.Add(d.Zero);
            for (int i = 0; i < b.Count; i++) c[i + m] = d.Subtract(c[i + m], d.Multiply(coef, b[i]));
            if (old is not null)
            {
                l = k + 1 - l;
                b = old;
                bd = disc;
                m = 1;
            }
            else m++;
        }
        var coeffs = new T[l];
        for (int i = 1; i <= l; i++) coeffs[i - 1] = i < c.Count ? d.Negate(c[i]) : d.Zero;
        var initial = s[..Math.Min(l, n)];
        var rec = new LinearRecurrence<T>(ring, coeffs, initial);
        // Exact check against every term.
        var regenerated = rec.Terms(n);
        for (int k = 0; k < n; k++)
            if (!d.AreEqual(regenerated[k], s[k]))
                throw new InvalidOperationException($"internal error: the recurrence found does not reproduce term {k}");
        int used = Math.Max(2 * l, lastChange + 1);
        return GuessResult<LinearRecurrence<T>>.Judge(rec, Math.Min(used, n), n, minimumConfirmations, $"a recurrence of order {l}");
    }
}
