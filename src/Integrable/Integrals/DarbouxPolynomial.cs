using Integrable.RationalFunctions;

namespace Integrable.Integrals;

/// <summary>A discrete Darboux polynomial P of a map: P(φ(x)) = C(x)·P(x) with cofactor C a rational function
/// (Celledoni, Evripidou, McLaren, Owren, Quispel, Tapley, van der Kamp, J. Phys. A 52 (2019) 31LT01).</summary>
/// <param name="Polynomial">P, as a rational function with denominator 1.</param>
/// <param name="Cofactor">C.</param>
public sealed record DarbouxPolynomial(RationalFunction Polynomial, RationalFunction Cofactor)
{
    /// <summary><c>P = …, cofactor …</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => $"{Polynomial}  (cofactor {Cofactor})";
}
