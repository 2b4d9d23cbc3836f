using System.Collections.Immutable;
using System.Text;
using System.Text.Json;
using Integrable.Numbers;

namespace Integrable.Analyses;

/// <summary>The answer of a singularity-confinement test: for each singular value, the pattern of the
/// orbit through it (Laurent series in ε computed exactly over Q) and whether it is confined with the
/// free initial data recovered.</summary>
/// <example><code>
/// var r = SingularityConfinement.Test(Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2"));
/// Console.WriteLine(r);   // x = 0 + ε: pattern {0, ∞^2, ∞^2, 0}, confined …
/// </code></example>
public sealed class ConfinementReport : IAnalysisReport
{
    internal ConfinementReport(string subject, ImmutableArray<SingularityPattern> singularities, ImmutableArray<Rational> candidates,
        int steps, ImmutableArray<Rational> parameterValues, ImmutableArray<string> parameters, BudgetLimit limit, string? limitMessage, TimeSpan elapsed)
    {
        Subject = subject;
        Singularities = singularities;
        Candidates = candidates;
        Steps = steps;
        ParameterValues = parameterValues;
        Parameters = parameters;
        Limit = limit;
        LimitMessage = limitMessage;
        Elapsed = elapsed;
    }

    /// <summary>The equation.</summary>
    public string Subject { get; }

    /// <summary>One entry per singular value that leads to an infinite term within the step limit.</summary>
    public ImmutableArray<SingularityPattern> Singularities { get; }

    /// <summary>Every value tried (those without an infinite term are not singular and are not listed in <see cref="Singularities"/>).</summary>
    public ImmutableArray<Rational> Candidates { get; }

    /// <summary>The step limit K.</summary>
    public int Steps { get; }

    /// <summary>The parameter names.</summary>
    public ImmutableArray<string> Parameters { get; }

    /// <summary>The parameter values used (given, or random for generic parameters).</summary>
    public ImmutableArray<Rational> ParameterValues { get; }

    /// <summary>True when there is at least one singularity and every one is confined.</summary>
    public bool IsConfined => Singularities.Length > 0 && Singularities.All(s => s.IsConfined);

    /// <inheritdoc/>
    public BudgetLimit Limit { get; }

    /// <summary>Why the budget stopped the test, or null.</summary>
    public string? LimitMessage { get; }

    /// <summary>Wall time spent.</summary>
    public TimeSpan Elapsed { get; }

    /// <inheritdoc/>
    public string Verification =>
        $"orbits through x = s + ε computed as Laurent series in ε with exact rational coefficients (free initial data and generic parameters random rationals); " +
        $"confinement means a full regular state within {Steps} steps whose ε → 0 limit changes with the free data (checked with a second random choice)";

    /// <summary>A readable report with every term's leading behaviour.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append("Singularity confinement of ").AppendLine(Subject);
        if (Parameters.Length > 0)
            sb.Append("parameters: ").AppendLine(string.Join(", ", Parameters.Select((p, i) => $"{p} = {ParameterValues[i]}")));
        if (Singularities.Length == 0)
            sb.Append("no singular value among ").Append(string.Join(", ", Candidates)).Append(" leads to an infinite term within ").Append(Steps)
              .AppendLine(" steps (only rational singular values are tried; give parameter values that make the others rational)");
        foreach (var s in Singularities)
        {
            sb.Append("x = ").Append(s.SingularValue).Append(" + ε (free data ").Append(string.Join(", ", s.FreeData)).Append("): pattern ")
              .Append(s.PatternText).Append(", ").AppendLine(s.Verdict);
            sb.Append("  ").AppendLine(s.Reason);
            foreach (var e in s.Terms) sb.Append("  ").AppendLine(ReportJson.Shorten(e.ToString(), 200));
        }
        if (Limit != BudgetLimit.None) sb.Append("stopped by the ").Append(ReportJson.LimitName(Limit)).Append(" limit: ").AppendLine(LimitMessage);
        sb.Append("verification: ").AppendLine(Verification);
        return sb.ToString();
    }

    /// <inheritdoc/>
    public string ToLatex()
    {
        var sb = new StringBuilder();
        foreach (var s in Singularities)
            sb.Append("x = ").Append(s.SingularValue).Append(" + \\varepsilon:\\ \\{")
              .Append(string.Join(", ", s.Pattern.Select(e => e.LatexSymbol))).Append("\\}\\ \\text{")
              .Append(s.IsConfined ? "confined" : "not confined").AppendLine("}\\\\");
        return sb.ToString();
    }

    /// <summary>Writes <c>confined</c> (all singularities confined), <c>singularities</c> (each with
    /// <c>value</c>, <c>pattern</c> (symbols such as "0", "∞^2", "f" for a regular term), <c>confined</c>,
    /// <c>confinedAt</c> (index of the first regular term after the pattern, or null), <c>length</c>, <c>cyclic</c>,
    /// <c>recoversInitialData</c>, <c>precision</c>, <c>freeData</c>, <c>reason</c>, <c>terms</c> with
    /// <c>n</c>, <c>term</c>, <c>valuation</c>, <c>leading</c>, <c>symbol</c>), <c>candidates</c>,
    /// <c>steps</c>, <c>parameters</c>, <c>limit</c> and <c>verification</c>.</summary>
    /// <param name="writer">A writer positioned inside an object.</param>
    public void WriteJsonProperties(Utf8JsonWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        writer.WriteBoolean("confined", IsConfined);
        writer.WriteStartArray("singularities");
        foreach (var s in Singularities)
        {
            writer.WriteStartObject();
            writer.WriteString("value", s.SingularValue.ToString());
            writer.WriteStartArray("pattern");
            foreach (var e in s.Pattern) writer.WriteStringValue(e.Symbol);
            writer.WriteEndArray();
            writer.WriteBoolean("confined", s.IsConfined);
            if (s.ConfinedAt is { } c) writer.WriteNumber("confinedAt", c); else writer.WriteNull("confinedAt");
            writer.WriteNumber("length", s.PatternLength);
            writer.WriteBoolean("cyclic", s.IsCyclic);
            writer.WriteBoolean("recoversInitialData", s.RecoversInitialData);
            writer.WriteNumber("precision", s.Precision);
            writer.WriteStartArray("freeData");
            foreach (var u in s.FreeData) writer.WriteStringValue(u.ToString());
            writer.WriteEndArray();
            writer.WriteString("reason", s.Reason);
            writer.WriteStartArray("terms");
            foreach (var e in s.Terms)
            {
                writer.WriteStartObject();
                writer.WriteNumber("n", e.Index);
                writer.WriteString("term", e.Term);
                if (e.Value.HasLeadingTerm)
                {
                    writer.WriteNumber("valuation", e.Value.Valuation);
                    writer.WriteString("leading", e.Value.LeadingCoefficient.ToString());
                }
                writer.WriteString("symbol", e.Symbol);
                writer.WriteEndObject();
            }
            writer.WriteEndArray();
            writer.WriteEndObject();
        }
        writer.WriteEndArray();
        writer.WriteStartArray("candidates");
        foreach (var c in Candidates) writer.WriteStringValue(c.ToString());
        writer.WriteEndArray();
        writer.WriteNumber("steps", Steps);
        writer.WriteStartObject("parameters");
        for (int i = 0; i < Parameters.Length; i++) writer.WriteString(Parameters[i], ParameterValues[i].ToString());
        writer.WriteEndObject();
        ReportJson.WriteLimit(writer, Limit);
        writer.WriteString("verification", Verification);
    }

    /// <inheritdoc/>
    public string ToJson() => ReportJson.Object(this);
}
