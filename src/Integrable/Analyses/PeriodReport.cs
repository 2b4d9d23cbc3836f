using System.Globalization;
using System.Text;
using System.Text.Json;

namespace Integrable.Analyses;

/// <summary>The answer of a period search: the least p ≤ P with x_{n+p} = x_n as rational functions of
/// the initial values (and symbolic parameters), or none up to P, with how that was established.</summary>
/// <example><code>
/// var r = Periodicity.Find(Recurrence.Parse("x_{n+1} x_{n-1} = x_n + 1"), 30);
/// Console.WriteLine(r.Period);   // 5
/// </code></example>
public sealed class PeriodReport : IAnalysisReport
{
    internal PeriodReport(string subject, int? period, int maxPeriod, PeriodVerification method, double? errorBound,
        double? degreeBound, int points, int rationalPoints, bool autonomous, BudgetLimit limit, string? limitMessage, TimeSpan elapsed)
    {
        Subject = subject;
        Period = period;
        MaxPeriod = maxPeriod;
        Method = method;
        ErrorBound = errorBound;
        DegreeBound = degreeBound;
        Points = points;
        RationalPoints = rationalPoints;
        IsAutonomous = autonomous;
        Limit = limit;
        LimitMessage = limitMessage;
        Elapsed = elapsed;
    }

    /// <summary>The map.</summary>
    public string Subject { get; }

    /// <summary>The least period, or null when there is none up to <see cref="MaxPeriod"/>.</summary>
    public int? Period { get; }

    /// <summary>The bound P searched up to.</summary>
    public int MaxPeriod { get; }

    /// <summary>How the answer was established.</summary>
    public PeriodVerification Method { get; }

    /// <summary>For <see cref="PeriodVerification.Probabilistic"/>: an upper bound on the probability that the
    /// period is wrong (Schwartz–Zippel with <see cref="DegreeBound"/>); otherwise null.</summary>
    public double? ErrorBound { get; }

    /// <summary>The bound on the degree of N − x·D for the identity tested (probabilistic checks), or null.</summary>
    public double? DegreeBound { get; }

    /// <summary>Number of random points modulo primes used in the search.</summary>
    public int Points { get; }

    /// <summary>Number of exact rational orbits that confirmed the period.</summary>
    public int RationalPoints { get; }

    /// <summary>False for non-autonomous maps, whose periodicity is checked over two periods from the start index only.</summary>
    public bool IsAutonomous { get; }

    /// <inheritdoc/>
    public BudgetLimit Limit { get; }

    /// <summary>Why the exact symbolic check stopped (the answer is then verified probabilistically), or null.</summary>
    public string? LimitMessage { get; }

    /// <summary>Wall time spent.</summary>
    public TimeSpan Elapsed { get; }

    /// <inheritdoc/>
    public string Verification
    {
        get
        {
            string scope = IsAutonomous ? "" : " (non-autonomous: checked over two periods from the start index)";
            if (Period is null)
                return $"for every p ≤ {MaxPeriod} some random point modulo a prime has x_(n+p) ≠ x_n, which disproves period p exactly{scope}";
            string found = $"least p ≤ {MaxPeriod} satisfied at {Points} random points modulo primes (smaller p each disproved by a point); confirmed on {RationalPoints} exact rational orbits; ";
            return Method == PeriodVerification.Symbolic
                ? found + "x_(n+p) = x_n verified as an exact identity of rational functions" + scope
                : found + $"identity tested probabilistically: degree bound {DegreeBound:G4}, error probability ≤ {ErrorBound:G3}" +
                  (LimitMessage is not null ? $" (the symbolic check stopped: {LimitMessage})" : "") + scope;
        }
    }

    /// <summary>Text such as <c>period 5 (verified symbolically)</c> with the evidence.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append("Periodicity of ").AppendLine(Subject);
        sb.AppendLine(Period is { } p ? $"period {p.ToString(CultureInfo.InvariantCulture)}" : $"no period up to {MaxPeriod.ToString(CultureInfo.InvariantCulture)}");
        sb.Append("verification: ").AppendLine(Verification);
        return sb.ToString();
    }

    /// <inheritdoc/>
    public string ToLatex() => Period is { } p
        ? $"x_{{n+{p}}} = x_n \\quad\\text{{(least period {p}; {MethodName})}}"
        : $"\\text{{no period }} p \\le {MaxPeriod}";

    private string MethodName => Method switch
    {
        PeriodVerification.Symbolic => "symbolic",
        PeriodVerification.Probabilistic => "probabilistic",
        _ => "counterexamples",
    };

    /// <summary>Writes <c>period</c> (number or null), <c>maxPeriod</c>, <c>method</c> (symbolic,
    /// probabilistic, counterexamples), <c>errorBound</c>, <c>degreeBound</c>, <c>points</c>,
    /// <c>rationalPoints</c>, <c>autonomous</c>, <c>limit</c>, <c>verification</c>.</summary>
    /// <param name="writer">A writer positioned inside an object.</param>
    public void WriteJsonProperties(Utf8JsonWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        if (Period is { } p) writer.WriteNumber("period", p); else writer.WriteNull("period");
        writer.WriteNumber("maxPeriod", MaxPeriod);
        writer.WriteString("method", MethodName);
        if (ErrorBound is { } e) writer.WriteNumber("errorBound", e); else writer.WriteNull("errorBound");
        if (DegreeBound is { } d) writer.WriteNumber("degreeBound", d); else writer.WriteNull("degreeBound");
        writer.WriteNumber("points", Points);
        writer.WriteNumber("rationalPoints", RationalPoints);
        writer.WriteBoolean("autonomous", IsAutonomous);
        ReportJson.WriteLimit(writer, Limit);
        writer.WriteString("verification", Verification);
    }

    /// <inheritdoc/>
    public string ToJson() => ReportJson.Object(this);
}
