namespace Integrable.RationalFunctions;

public sealed partial class RationalFunction
{
    /// <summary>Partial derivative ∂/∂x: (N′·D − N·D′)/D², in canonical form.</summary>
    /// <param name="variable">The variable's name.</param>
    /// <returns>The derivative.</returns>
    /// <exception cref="ArgumentException"><paramref name="variable"/> is not a variable of this field.</exception>
    public RationalFunction Derivative(string variable)
    {
        int v = Field.PolynomialRing.RequireIndex(variable);
        if (IsZero) return this;
        var dn = Numerator.Derivative(v);
        if (Denominator.IsOne) return new RationalFunction(Field, dn, Denominator);
        var dd = Denominator.Derivative(v);
        return Canonical(Field, PolynomialProducts.Multiply(dn, Denominator) - PolynomialProducts.Multiply(Numerator, dd), PolynomialProducts.Multiply(Denominator, Denominator));
    }

    /// <summary>Total degree of the numerator.</summary>
    /// <returns>The largest exponent sum of the numerator's terms.</returns>
    /// <exception cref="InvalidOperationException">The function is zero.</exception>
    public int NumeratorDegree() => Numerator.TotalDegree;

    /// <summary>Total degree of the denominator (0 for polynomials).</summary>
    /// <returns>The largest exponent sum of the denominator's terms.</returns>
    public int DenominatorDegree() => Denominator.TotalDegree;

    /// <summary>Degree of the numerator in one variable.</summary>
    /// <param name="variable">The variable's name.</param>
    /// <returns>The largest exponent of <paramref name="variable"/> in the numerator.</returns>
    /// <exception cref="InvalidOperationException">The function is zero.</exception>
    /// <exception cref="ArgumentException"><paramref name="variable"/> is not a variable of this field.</exception>
    public int NumeratorDegree(string variable) => Numerator.Degree(variable);

    /// <summary>Degree of the denominator in one variable.</summary>
    /// <param name="variable">The variable's name.</param>
    /// <returns>The largest exponent of <paramref name="variable"/> in the denominator.</returns>
    /// <exception cref="ArgumentException"><paramref name="variable"/> is not a variable of this field.</exception>
    public int DenominatorDegree(string variable) => Denominator.Degree(variable);

    /// <summary>The degree of the rational function: max(deg numerator, deg denominator) in total degree
    /// (the usual measure of degree growth of iterated maps).</summary>
    /// <returns>The degree.</returns>
    /// <exception cref="InvalidOperationException">The function is zero.</exception>
    public int Degree() => Math.Max(NumeratorDegree(), DenominatorDegree());
}
