using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using System.Text.Json;
using Integrable.Analyses;

namespace Integrable.Integrals;

/// <summary>The first integrals of a map up to a degree: a basis over Q(parameters) of the polynomial integrals
/// modulo constants, rational integrals and Darboux polynomials, invariant measures, the number of functionally
/// independent integrals, and how each was proved.</summary>
/// <example><code>
/// var r = FirstIntegrals.Find(Recurrence.Parse("x_{n+1} + x_{n-1} = -x_n + 1/x_n"), IntegralOptions.Default with { Degree = 3 });
/// Console.WriteLine(r);   // one integral x_n^2 x_{n+1} + x_n x_{n+1}^2 − x_n − x_{n+1}, independent 1
/// </code></example>
public sealed class IntegralsReport : IAnalysisReport
{
    internal IntegralsReport(IntegralMap map, IntegralOptions options, ImmutableArray<FirstIntegral> integrals,
        ImmutableArray<FirstIntegral> rational, ImmutableArray<DarbouxPolynomial> darboux, ImmutableArray<InvariantMeasure> measures,
        int? upperBound, int rejected, int independent, BudgetLimit limit, string? limitMessage, TimeSpan elapsed)
    {
        Map = map;
        Degree = options.Degree;
        RationalSearched = options.Rational && map.IsAutonomous;
        PolynomialIntegrals = integrals;
        RationalIntegrals = rational;
        DarbouxPolynomials = darboux;
        Measures = measures;
        UpperBound = upperBound;
        RejectedCandidates = rejected;
        Independent = independent;
        Limit = limit;
        LimitMessage = limitMessage;
        Elapsed = elapsed;
    }

    /// <summary>The map.</summary>
    public IntegralMap Map { get; }

    /// <summary>The degree bound d of the polynomial search.</summary>
    public int Degree { get; }

    /// <summary>True when Darboux polynomials, rational integrals and measures were searched.</summary>
    public bool RationalSearched { get; }

    /// <summary>A basis over Q(parameters) of the polynomial integrals of degree ≤ d modulo constants; each
    /// primitive (coefficients integer polynomials in the parameters without common factor, positive leading coefficient).</summary>
    public ImmutableArray<FirstIntegral> PolynomialIntegrals { get; }

    /// <summary>Rational integrals (ratios of Darboux polynomials with equal cofactors), each functionally independent
    /// of the integrals before it.</summary>
    public ImmutableArray<FirstIntegral> RationalIntegrals { get; }

    /// <summary>All integrals: the polynomial ones, then the rational ones.</summary>
    public ImmutableArray<FirstIntegral> Integrals => PolynomialIntegrals.AddRange(RationalIntegrals);

    /// <summary>Darboux polynomials found (a basis per cofactor).</summary>
    public ImmutableArray<DarbouxPolynomial> DarbouxPolynomials { get; }

    /// <summary>Preserved measures dx/P.</summary>
    public ImmutableArray<InvariantMeasure> Measures { get; }

    /// <summary>Upper bound on the dimension of the polynomial integrals of degree ≤ d over Q(parameters)
    /// (nullity mod p at a random parameter point), or null when the search stopped before it.</summary>
    public int? UpperBound { get; }

    /// <summary>True when the polynomial integrals found reach <see cref="UpperBound"/>: the basis is complete.</summary>
    public bool IsComplete => UpperBound is { } u && u == PolynomialIntegrals.Length;

    /// <summary>Candidates that failed the exact proof and were discarded.</summary>
    public int RejectedCandidates { get; }

    /// <summary>Number of functionally independent integrals (rank of the gradients at a random point mod a large prime).</summary>
    public int Independent { get; }

    /// <summary>k − 1, the number of independent integrals of an integrable map of dimension k in the sense used here.</summary>
    public int Expected => Map.Dimension - 1;

    /// <summary>True when at least <see cref="Expected"/> independent integrals were found.</summary>
    public bool HasExpectedIntegrals => Independent >= Expected;

    /// <summary>True: every integral, Darboux polynomial and measure listed was proved by an exact identity.</summary>
    public bool Verified => true;

    /// <inheritdoc/>
    public BudgetLimit Limit { get; }

    /// <summary>What stopped the search early, or null.</summary>
    public string? LimitMessage { get; }

    /// <summary>Wall time spent.</summary>
    public TimeSpan Elapsed { get; }

    /// <inheritdoc/>
    public string Verification
    {
        get
        {
            var sb = new StringBuilder("each integral proved by the ");
            sb.Append(FirstIntegrals.ProofText(Map));
            if (RationalSearched) sb.Append("; each Darboux polynomial by P∘φ = C·P and each measure by P∘φ = ±J·P, exactly");
            sb.Append("; completeness: ");
            sb.Append(UpperBound is { } u
                ? IsComplete
                    ? $"the {u} integrals found match the dimension bound {u} (nullity of the conditions mod p at a random parameter point)"
                    : $"{PolynomialIntegrals.Length} found, dimension bound {u}: incomplete"
                : "not established");
            sb.Append($"; independence: gradient rank at random points mod a prime near 2^62; {RejectedCandidates} candidate(s) failed the exact proof and were rejected");
            return sb.ToString();
        }
    }

    /// <summary>The integrals, one per line, with independence and verification.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append("First integrals of ").AppendLine(Map.Text);
        sb.Append("state: ").Append(string.Join(", ", Map.StateVariables));
        if (Map.Parameters.Length > 0) sb.Append("; parameters: ").Append(string.Join(", ", Map.Parameters));
        sb.AppendLine();
        sb.AppendLine(CultureInfo.InvariantCulture, $"polynomial integrals of degree ≤ {Degree}: {PolynomialIntegrals.Length}{(IsComplete ? " (complete)" : "")}");
        if (!Map.IsAutonomous)
            sb.AppendLine(CultureInfo.InvariantCulture, $"(periodic coefficients: I_j is the integral on states x_n, … with n ≡ j mod {Map.Period}; I_(j+1)∘φ_j = I_j)");
        foreach (var i in PolynomialIntegrals)
        {
            if (Map.IsAutonomous) sb.Append("  I = ").AppendLine(i.ToString());
            else
                for (int j = 0; j < i.Phases.Length; j++)
                    sb.Append(CultureInfo.InvariantCulture, $"  {(j == 0 ? "" : " ")}I_{j} = ").AppendLine(i.Phases[j].ToString());
        }
        if (RationalSearched)
        {
            sb.AppendLine(CultureInfo.InvariantCulture, $"rational integrals: {RationalIntegrals.Length}");
            foreach (var i in RationalIntegrals) sb.Append("  I = ").AppendLine(i.ToString());
            sb.AppendLine(CultureInfo.InvariantCulture, $"Darboux polynomials: {DarbouxPolynomials.Length}");
            foreach (var d in DarbouxPolynomials) sb.Append("  ").AppendLine(d.ToString());
            sb.AppendLine(CultureInfo.InvariantCulture, $"invariant measures: {Measures.Length}");
            foreach (var m in Measures) sb.Append("  density ").AppendLine(m.ToString());
        }
        sb.AppendLine(CultureInfo.InvariantCulture, $"independent: {Independent} (expected {Expected} for an integrable map of dimension {Map.Dimension})");
        if (Limit != BudgetLimit.None) sb.Append("stopped: ").AppendLine(LimitMessage);
        sb.Append("verification: ").AppendLine(Verification);
        return sb.ToString();
    }

    /// <inheritdoc/>
    public string ToLatex()
    {
        var sb = new StringBuilder("\\begin{aligned}\n");
        int n = 0;
        foreach (var i in Integrals) sb.Append(CultureInfo.InvariantCulture, $"I_{{{++n}}} &= {i.ToLatex()} \\\\\n");
        foreach (var m in Measures) sb.Append(CultureInfo.InvariantCulture, $"\\mu &= {m.Density.ToLatex()}\\, d{string.Join("\\,d", Map.StateVariables)} \\\\\n");
        sb.Append(CultureInfo.InvariantCulture, $"&\\text{{{Independent} independent; {ReportJson.LatexText(IsComplete ? "complete up to degree " + Degree : "incomplete")}}}\n");
        sb.Append("\\end{aligned}");
        return sb.ToString();
    }

    /// <summary>Writes <c>integrals</c> (texts of phase 0, polynomial then rational), <c>independent</c>,
    /// <c>verified</c>, <c>phases</c> (periodic maps: every phase's text), <c>polynomial</c>, <c>rational</c>,
    /// <c>darboux</c>, <c>measures</c>, <c>state</c>, <c>parameters</c>, <c>degree</c>, <c>complete</c>,
    /// <c>upperBound</c>, <c>expected</c>, <c>rejected</c>, <c>limit</c>, <c>seconds</c>, <c>verification</c>.</summary>
    /// <param name="writer">A writer positioned inside an object.</param>
    public void WriteJsonProperties(Utf8JsonWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        writer.WriteStartArray("integrals");
        foreach (var i in Integrals) writer.WriteStringValue(i.Value.ToString());
        writer.WriteEndArray();
        writer.WriteNumber("independent", Independent);
        writer.WriteBoolean("verified", Verified);
        if (!Map.IsAutonomous)
        {
            writer.WriteStartArray("phases");
            foreach (var i in Integrals)
            {
                writer.WriteStartArray();
                foreach (var p in i.Phases) writer.WriteStringValue(p.ToString());
                writer.WriteEndArray();
            }
            writer.WriteEndArray();
        }
        writer.WriteNumber("polynomial", PolynomialIntegrals.Length);
        writer.WriteNumber("rational", RationalIntegrals.Length);
        if (RationalSearched)
        {
            writer.WriteStartArray("darboux");
            foreach (var d in DarbouxPolynomials)
            {
                writer.WriteStartObject();
                writer.WriteString("polynomial", d.Polynomial.ToString());
                writer.WriteString("cofactor", d.Cofactor.ToString());
                writer.WriteEndObject();
            }
            writer.WriteEndArray();
            writer.WriteStartArray("measures");
            foreach (var m in Measures) writer.WriteStringValue(m.Density.ToString());
            writer.WriteEndArray();
        }
        writer.WriteStartArray("state");
        foreach (var s in Map.StateVariables) writer.WriteStringValue(s);
        writer.WriteEndArray();
        writer.WriteStartArray("parameters");
        foreach (var s in Map.Parameters) writer.WriteStringValue(s);
        writer.WriteEndArray();
        writer.WriteNumber("period", Map.Period);
        writer.WriteNumber("degree", Degree);
        writer.WriteBoolean("complete", IsComplete);
        if (UpperBound is { } u) writer.WriteNumber("upperBound", u); else writer.WriteNull("upperBound");
        writer.WriteNumber("expected", Expected);
        writer.WriteNumber("rejected", RejectedCandidates);
        ReportJson.WriteLimit(writer, Limit);
        writer.WriteNumber("seconds", Math.Round(Elapsed.TotalSeconds, 3));
        writer.WriteString("verification", Verification);
    }

    /// <inheritdoc/>
    public string ToJson() => ReportJson.Object(this);
}
