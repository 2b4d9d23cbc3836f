using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Analyses;

/// <summary>The evidence that a term is not a Laurent polynomial in the initial values: the term is
/// N/D with Laurent polynomials N and D, and D does not divide N (division with remainder gives
/// N = q·D + r with r ≠ 0); for a division by an identically zero value, D is zero.</summary>
/// <remarks>If the term were a Laurent polynomial L, then N = L·D and the exact division of N by D
/// would succeed, so a non-zero remainder proves the term is not Laurent.</remarks>
/// <example><code>
/// var f = report.Failure;
/// if (f is not null) Console.WriteLine($"{f.Term} = N/D with D = {f.Divisor}");
/// </code></example>
public sealed class LaurentFailure
{
    internal LaurentFailure(long index, string term, LaurentPolynomial numerator, LaurentPolynomial divisor,
        LaurentPolynomial? remainder, Rational? valueAtOnes, string reason)
    {
        Specialisation = null;
        Index = index;
        Term = term;
        Numerator = numerator;
        Divisor = divisor;
        Remainder = remainder;
        ValueAtOnes = valueAtOnes;
        Reason = reason;
    }

    /// <summary>The index n of the first term that is not Laurent.</summary>
    public long Index { get; }

    /// <summary>The term's name.</summary>
    public string Term { get; }

    /// <summary>A numerator N with term = N/D.</summary>
    public LaurentPolynomial Numerator { get; }

    /// <summary>The denominator D (not a monomial, does not divide N; zero for a division by zero).</summary>
    public LaurentPolynomial Divisor { get; }

    /// <summary>The remainder r ≠ 0 of N by D in lex order (null for a division by zero).</summary>
    public LaurentPolynomial? Remainder { get; }

    /// <summary>The term's value when every initial value (and every symbolic parameter) is 1, when
    /// defined: a non-integer value is a small specialisation showing a denominator.</summary>
    public Rational? ValueAtOnes { get; }

    /// <summary>A one-variable specialisation that shows the failure on a small scale, e.g.
    /// <c>x_0 = 1, x_1 = t, x_2 = 1</c>, or null when none was found (or none was tried).</summary>
    public string? Specialisation { get; private init; }

    /// <summary>The term under <see cref="Specialisation"/> as N(t)/D(t): the numerator.</summary>
    public LaurentPolynomial? SpecialisedNumerator { get; private init; }

    /// <summary>The denominator D(t) under <see cref="Specialisation"/>: not a monomial and not dividing N(t).</summary>
    public LaurentPolynomial? SpecialisedDivisor { get; private init; }

    internal LaurentFailure WithSpecialisation(string text, LaurentPolynomial numerator, LaurentPolynomial divisor) =>
        new(Index, Term, Numerator, Divisor, Remainder, ValueAtOnes, Reason)
        {
            Specialisation = text,
            SpecialisedNumerator = numerator,
            SpecialisedDivisor = divisor,
        };

    /// <summary>What failed, in words.</summary>
    public string Reason { get; }

    /// <summary>Text such as <c>x_17 is not Laurent: …</c>.</summary>
    /// <returns>The summary.</returns>
    public override string ToString() => $"{Term} is not a Laurent polynomial: {Reason}";
}
