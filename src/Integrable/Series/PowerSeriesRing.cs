using Integrable.Numbers;

namespace Integrable.Series;

/// <summary>Factories for the rings of truncated power series over Q and over Z/pZ.</summary>
/// <example><code>
/// var r = PowerSeriesRing.Rationals;
/// var x = r.X;
/// var f = (1 - x + r.O(10)).Inverse();     // 1 + x + … + x^9 + O(x^10)
/// </code></example>
public static class PowerSeriesRing
{
    /// <summary>Power series over Q in the variable x.</summary>
    public static PowerSeriesRing<Rational> Rationals { get; } = new(RationalDomain.Instance, "x");

    /// <summary>Power series over Q in a named variable.</summary>
    /// <param name="variable">The variable's name, used only for printing.</param>
    /// <returns>The ring.</returns>
    /// <exception cref="ArgumentException"><paramref name="variable"/> is empty.</exception>
    public static PowerSeriesRing<Rational> OverRationals(string variable) => new(RationalDomain.Instance, CheckName(variable));

    /// <summary>Power series over Z/pZ in the variable x; coefficients are residues in [0, p).</summary>
    /// <param name="field">The prime field.</param>
    /// <param name="variable">The variable's name, used only for printing.</param>
    /// <returns>The ring.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="field"/> is null.</exception>
    public static PowerSeriesRing<ulong> Modular(PrimeField field, string variable = "x")
    {
        ArgumentNullException.ThrowIfNull(field);
        return new(new ModularDomain(field), CheckName(variable));
    }

    /// <summary>The image of a series over Q in a series ring over Z/pZ (coefficient-wise reduction; the precision is kept).</summary>
    /// <param name="series">A series over Q.</param>
    /// <param name="target">A series ring over Z/pZ.</param>
    /// <returns>The reduced series.</returns>
    /// <exception cref="DivideByZeroException">p divides the denominator of a coefficient.</exception>
    public static PowerSeries<ulong> Reduce(PowerSeries<Rational> series, PowerSeriesRing<ulong> target)
    {
        ArgumentNullException.ThrowIfNull(series);
        ArgumentNullException.ThrowIfNull(target);
        var c = series.Coefficients;
        var r = new ulong[c.Length];
        for (int i = 0; i < c.Length; i++) r[i] = target.CoefficientRing.FromRational(c[i]);
        return PowerSeries<ulong>.Create(target, r, series.Precision);
    }

    private static string CheckName(string variable)
    {
        if (string.IsNullOrWhiteSpace(variable)) throw new ArgumentException("variable name must be non-empty", nameof(variable));
        return variable;
    }
}
