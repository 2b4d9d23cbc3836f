using System.Text;
using Integrable.Series;

namespace Integrable.Guessing;

/// <summary>A relation P₀f₀ + P₁f₁ + … + P_r f_r = O(x^N) with polynomial coefficients P_i between power
/// series f_i (a Hermite–Padé approximant); for an algebraic equation f_i = y^i, for a linear differential
/// equation f_i = y^{(i)}.</summary>
/// <typeparam name="T">The coefficient type.</typeparam>
/// <example><code>
/// var eq = HermitePade.AlgebraicEquation(catalan, maxDegreeInY: 2, maxDegreeInX: 2).Value;
/// // eq.Polynomials = [1, −1, x] up to a common factor: 1 − C + x C² = 0
/// </code></example>
public sealed class PolynomialRelation<T>
{
    private readonly PowerSeries<T>[] _p;

    internal PolynomialRelation(PowerSeries<T>[] polynomials, string[] labels, int nullspaceDimension)
    {
        _p = polynomials;
        Labels = labels;
        NullspaceDimension = nullspaceDimension;
    }

    /// <summary>The polynomial coefficients P₀ … P_r (exact polynomials), normalized so the first non-zero
    /// coefficient of the first non-zero P_i is 1.</summary>
    public IReadOnlyList<PowerSeries<T>> Polynomials => _p;

    /// <summary>Names of the series f_i for printing (e.g. "1", "y", "y^2", or "y'").</summary>
    public IReadOnlyList<string> Labels { get; }

    /// <summary>The dimension of the space of relations with the given degree bounds (1 when the relation is unique
    /// up to a scalar; larger when, for instance, a smaller relation times x also fits).</summary>
    public int NullspaceDimension { get; }

    /// <summary>Text such as <c>(1) + (-1)*y + (x)*y^2 = 0</c>.</summary>
    /// <returns>The relation as text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        for (int i = 0; i < _p.Length; i++)
        {
            if (_p[i].IsZero) continue;
            if (sb.Length > 0) sb.Append(" + ");
            sb.Append('(').Append(_p[i]).Append(')');
            if (Labels[i] != "1") sb.Append('*').Append(Labels[i]);
        }
        return sb.Append(" = 0").ToString();
    }
}
