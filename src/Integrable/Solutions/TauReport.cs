using System.Text;
using System.Text.Json;
using Integrable.Analyses;

namespace Integrable.Solutions;

/// <summary>An exact solution of a recursion through a tau function: the substitution x_n = (ratio of τ's), the bilinear
/// equation for τ, the closed form of τ, the algebraic relations that fix its constants, and the evidence.</summary>
public sealed class TauReport : IAnalysisReport
{
    internal TauReport(string equation, string substitution, string bilinear, string tau, IReadOnlyList<string> relations,
        bool verified, string verification, string? seriesCheck, IReadOnlyList<string> notes, BudgetLimit limit)
    {
        Equation = equation;
        Substitution = substitution;
        Bilinear = bilinear;
        Tau = tau;
        Relations = relations;
        Verified = verified;
        Verification = verification;
        SeriesCheck = seriesCheck;
        Notes = notes;
        Limit = limit;
    }

    /// <summary>The recursion as typed.</summary>
    public string Equation { get; }

    /// <summary>The tau substitution, e.g. <c>R_n = R_∞ τ_n τ_{n+3} / (τ_{n+1} τ_{n+2})</c>.</summary>
    public string Substitution { get; }

    /// <summary>The bilinear equation satisfied by τ (or an explanation when none was found).</summary>
    public string Bilinear { get; }

    /// <summary>The closed form of τ_n (or an explanation when none was found).</summary>
    public string Tau { get; }

    /// <summary>Exact relations fixing the constants (rational parametrisations, minimal polynomials, linear recurrences),
    /// and the first terms of the constants' series.</summary>
    public IReadOnlyList<string> Relations { get; }

    /// <summary>True when the closed form was verified exactly to solve the recursion with the given data for every n.</summary>
    public bool Verified { get; }

    /// <inheritdoc/>
    public string Verification { get; }

    /// <summary>The comparison with the direct series solution, when one was made.</summary>
    public string? SeriesCheck { get; }

    /// <summary>What was tried and rejected, and other remarks.</summary>
    public IReadOnlyList<string> Notes { get; }

    /// <inheritdoc/>
    public BudgetLimit Limit { get; }

    /// <summary>The report as plain text.</summary>
    /// <returns>Text.</returns>
    public string ToText()
    {
        var sb = new StringBuilder();
        sb.AppendLine($"tau form of {Equation}");
        sb.AppendLine($"  substitution: {Substitution}");
        sb.AppendLine($"  bilinear:     {Bilinear}");
        sb.AppendLine($"  tau:          {Tau}");
        foreach (var r in Relations) sb.AppendLine($"  relation:     {r}");
        if (SeriesCheck is not null) sb.AppendLine($"  series:       {SeriesCheck}");
        sb.AppendLine($"  verified:     {(Verified ? "yes" : "no")} — {Verification}");
        foreach (var n in Notes) sb.AppendLine($"  note: {n}");
        return sb.ToString();
    }

    /// <inheritdoc/>
    public string ToLatex()
    {
        static string Esc(string s)
        {
            var e = new StringBuilder();
            foreach (char c in s)
                e.Append(c switch
                {
                    '\\' => "\\textbackslash{}",
                    '_' or '{' or '}' or '&' or '%' or '$' or '#' => "\\" + c,
                    '^' => "\\^{}",
                    '~' => "\\~{}",
                    _ => c.ToString(),
                });
            return e.ToString();
        }
        var sb = new StringBuilder();
        sb.AppendLine("\\begin{description}");
        sb.AppendLine($"\\item[substitution] \\texttt{{{Esc(Substitution)}}}");
        sb.AppendLine($"\\item[bilinear] \\texttt{{{Esc(Bilinear)}}}");
        sb.AppendLine($"\\item[tau] \\texttt{{{Esc(Tau)}}}");
        foreach (var r in Relations) sb.AppendLine($"\\item[relation] \\texttt{{{Esc(r)}}}");
        sb.AppendLine($"\\item[verified] {(Verified ? "yes" : "no")}: {Esc(Verification)}");
        sb.AppendLine("\\end{description}");
        return sb.ToString();
    }

    /// <inheritdoc/>
    public void WriteJsonProperties(Utf8JsonWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        writer.WriteString("equation", Equation);
        writer.WriteString("substitution", Substitution);
        writer.WriteString("bilinear", Bilinear);
        writer.WriteString("tau", Tau);
        writer.WriteStartArray("relations");
        foreach (var r in Relations) writer.WriteStringValue(r);
        writer.WriteEndArray();
        writer.WriteBoolean("verified", Verified);
        writer.WriteString("verification", Verification);
        if (SeriesCheck is null) writer.WriteNull("seriesCheck");
        else writer.WriteString("seriesCheck", SeriesCheck);
        writer.WriteStartArray("notes");
        foreach (var n in Notes) writer.WriteStringValue(n);
        writer.WriteEndArray();
        ReportJson.WriteLimit(writer, Limit);
    }

    /// <inheritdoc/>
    public string ToJson() => ReportJson.Object(this);

    /// <summary>The plain-text report.</summary>
    /// <returns>Text.</returns>
    public override string ToString() => ToText();
}
