using System.Collections.Immutable;
using Integrable.Polynomials;

namespace Integrable.Analyses;

/// <summary>One iterate found to be a Laurent polynomial in the initial values: its index and name,
/// the polynomial itself, its size, its exponent range per variable and the sign and integrality of
/// its coefficients.</summary>
/// <example><code>
/// var step = report.Steps[^1];
/// Console.WriteLine($"{step.Term}: {step.TermCount} terms, positive = {step.IsPositive}");
/// </code></example>
public sealed class LaurentStep
{
    internal LaurentStep(long index, string term, LaurentPolynomial value, bool intermediateDivisionFailed)
    {
        Index = index;
        Term = term;
        Value = value;
        IntermediateDivisionFailed = intermediateDivisionFailed;
        int n = value.Ring.VariableCount;
        var min = ImmutableArray.CreateBuilder<int>(n);
        var max = ImmutableArray.CreateBuilder<int>(n);
        for (int v = 0; v < n; v++)
        {
            min.Add(value.IsZero ? 0 : value.MinExponent(v));
            max.Add(value.IsZero ? 0 : value.MaxExponent(v));
        }
        MinExponents = min.MoveToImmutable();
        MaxExponents = max.MoveToImmutable();
        bool positive = true, integer = true;
        foreach (var c in value.Coefficients)
        {
            if (c.Sign <= 0) positive = false;
            if (!c.IsInteger) integer = false;
        }
        IsPositive = positive && !value.IsZero;
        IsInteger = integer;
    }

    /// <summary>The index n of the term (x_n, or the time of a lattice value, or the mutation step).</summary>
    public long Index { get; }

    /// <summary>The term's name, e.g. <c>x_7</c>, <c>T_{0,5}</c>, <c>x_2'</c>.</summary>
    public string Term { get; }

    /// <summary>The term as a Laurent polynomial in the report's variables (verified exactly).</summary>
    public LaurentPolynomial Value { get; }

    /// <summary>The number of terms.</summary>
    public int TermCount => Value.TermCount;

    /// <summary>The smallest exponent of each variable (in the order of the report's variables).</summary>
    public ImmutableArray<int> MinExponents { get; }

    /// <summary>The largest exponent of each variable.</summary>
    public ImmutableArray<int> MaxExponents { get; }

    /// <summary>True when every coefficient is positive.</summary>
    public bool IsPositive { get; }

    /// <summary>True when every coefficient is an integer.</summary>
    public bool IsInteger { get; }

    /// <summary>True when a division inside the rule was not exact but the term as a whole still is a
    /// Laurent polynomial (found by computing it as a fraction N/D and dividing D into N exactly).</summary>
    public bool IntermediateDivisionFailed { get; }

    /// <summary>Text such as <c>x_7: 23 terms, positive, integer</c>.</summary>
    /// <returns>The summary.</returns>
    public override string ToString() =>
        $"{Term}: {TermCount} terms, {(IsPositive ? "positive" : "not positive")}, {(IsInteger ? "integer" : "not integer")} coefficients";
}
