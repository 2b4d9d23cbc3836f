using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using System.Text.Json;

namespace Integrable.Analyses;

/// <summary>The answer of a Laurent-property check: every iterate computed, each verified to be a
/// Laurent polynomial in the initial values by exact division over Q, or the first iterate that is not
/// one with its witness.</summary>
/// <remarks>"Laurent up to step N" rests on the exact computation of every iterate up to N; nothing is
/// sampled. When a budget limit stops the check, <see cref="Limit"/> names it and the verdict covers
/// the steps done.</remarks>
/// <example><code>
/// var report = LaurentPhenomenon.Check(Recurrence.Parse("x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2"), 10);
/// Console.WriteLine(report);          // text
/// Console.WriteLine(report.ToJson()); // {"laurent": true, "positive": true, "steps": [...], "firstFailure": null, ...}
/// </code></example>
public sealed class LaurentReport : IAnalysisReport
{
    internal LaurentReport(string subject, ImmutableArray<string> variables, ImmutableArray<LaurentStep> steps,
        LaurentFailure? failure, int stepsRequested, BudgetLimit limit, string? limitMessage, TimeSpan elapsed)
    {
        Subject = subject;
        Variables = variables;
        Steps = steps;
        Failure = failure;
        StepsRequested = stepsRequested;
        Limit = limit;
        LimitMessage = limitMessage;
        Elapsed = elapsed;
    }

    /// <summary>What was checked (the equation, or a description of the lattice or mutation sequence).</summary>
    public string Subject { get; }

    /// <summary>The variables of the Laurent ring: the initial values, then the formal parameters.</summary>
    public ImmutableArray<string> Variables { get; }

    /// <summary>The iterates verified to be Laurent, in order.</summary>
    public ImmutableArray<LaurentStep> Steps { get; }

    /// <summary>The first iterate that is not Laurent, with its witness, or null.</summary>
    public LaurentFailure? Failure { get; }

    /// <summary>The number of steps asked for.</summary>
    public int StepsRequested { get; }

    /// <inheritdoc/>
    public BudgetLimit Limit { get; }

    /// <summary>Why the budget stopped the check, or null.</summary>
    public string? LimitMessage { get; }

    /// <summary>Wall time spent.</summary>
    public TimeSpan Elapsed { get; }

    /// <summary>True when no iterate failed (all <see cref="Steps"/> are Laurent; see <see cref="IsComplete"/>).</summary>
    public bool IsLaurent => Failure is null;

    /// <summary>True when every requested step was done (no failure and no budget limit).</summary>
    public bool IsComplete => Failure is null && Limit == BudgetLimit.None;

    /// <summary>True when every computed iterate has positive coefficients only.</summary>
    public bool AllPositive => Steps.All(s => s.IsPositive);

    /// <summary>True when every computed iterate has integer coefficients only.</summary>
    public bool AllInteger => Steps.All(s => s.IsInteger);

    /// <summary>The index of the first non-Laurent iterate, or null.</summary>
    public long? FirstFailure => Failure?.Index;

    /// <inheritdoc/>
    public string Verification => Failure is null
        ? $"each of the {Steps.Length} iterates was computed exactly over Q as a Laurent polynomial (every division checked to be exact)"
        : $"{Failure.Term} = N/D with Laurent polynomials N, D computed exactly; D does not divide N (non-zero remainder), so {Failure.Term} is not Laurent; the {Steps.Length} earlier iterates were computed exactly";

    /// <summary>A readable report: the verdict, one line per iterate, the witness of a failure.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append("Laurent property of ").AppendLine(Subject);
        sb.Append("variables: ").AppendLine(string.Join(", ", Variables));
        string range = Steps.Length == 0 ? "no iterate computed" : $"{Steps[0].Term} … {Steps[^1].Term}";
        if (Failure is null)
            sb.Append(Limit == BudgetLimit.None ? "Laurent up to " : "Laurent as far as computed, up to ")
              .Append(Steps.Length == 0 ? "(nothing)" : Steps[^1].Term)
              .Append(AllPositive ? ", all coefficients positive" : ", some coefficients not positive")
              .AppendLine(AllInteger ? ", all integer" : ", some not integer");
        else
            sb.Append("NOT Laurent: first failure at ").Append(Failure.Term).Append(" (n = ").Append(Failure.Index.ToString(CultureInfo.InvariantCulture)).AppendLine(")");
        if (Limit != BudgetLimit.None) sb.Append("stopped by the ").Append(ReportJson.LimitName(Limit)).Append(" limit: ").AppendLine(LimitMessage);
        sb.Append("iterates (").Append(range).AppendLine("):");
        foreach (var s in Steps)
        {
            sb.Append("  ").Append(s.Term).Append(": ").Append(s.TermCount.ToString(CultureInfo.InvariantCulture)).Append(" terms");
            sb.Append(s.IsPositive ? ", positive" : ", not positive").Append(s.IsInteger ? ", integer" : ", not integer");
            sb.Append(", exponents ");
            for (int v = 0; v < Variables.Length; v++)
            {
                if (v > 0) sb.Append(' ');
                sb.Append(Variables[v]).Append(" [").Append(s.MinExponents[v]).Append(", ").Append(s.MaxExponents[v]).Append(']');
            }
            if (s.IntermediateDivisionFailed) sb.Append(" (an inner division was not exact; the term is)");
            sb.AppendLine();
        }
        if (Failure is { } f)
        {
            sb.Append("witness: ").Append(f.Term).AppendLine(" = N/D with");
            sb.Append("  D = ").AppendLine(ReportJson.Shorten(f.Divisor.ToString()));
            sb.Append("  N = ").AppendLine(ReportJson.Shorten(f.Numerator.ToString()));
            if (f.Remainder is { } r) sb.Append("  remainder of N by D = ").AppendLine(ReportJson.Shorten(r.ToString()));
            sb.Append("  ").AppendLine(f.Reason);
            if (f.ValueAtOnes is { } v1) sb.Append("  value at all ones: ").AppendLine(v1.ToString());
            if (f.Specialisation is not null)
                sb.Append("  specialisation ").Append(f.Specialisation).Append(": ").Append(f.Term).Append(" = N(t)/D(t) with D(t) = ")
                  .Append(ReportJson.Shorten(f.SpecialisedDivisor!.ToString())).AppendLine(", which does not divide N(t)");
        }
        sb.Append("verification: ").Append(Verification).AppendLine();
        return sb.ToString();
    }

    /// <inheritdoc/>
    public string ToLatex()
    {
        var sb = new StringBuilder();
        sb.AppendLine("\\begin{tabular}{lrcc}");
        sb.AppendLine("term & terms & positive & integer \\\\ \\hline");
        foreach (var s in Steps)
            sb.Append('$').Append(s.Term).Append("$ & ").Append(s.TermCount).Append(" & ")
              .Append(s.IsPositive ? "yes" : "no").Append(" & ").Append(s.IsInteger ? "yes" : "no").AppendLine(" \\\\");
        sb.AppendLine("\\end{tabular}");
        if (Failure is { } f)
        {
            sb.Append("\\par $").Append(f.Term).Append("$ is not a Laurent polynomial: it equals $N/D$ with $D = ");
            sb.Append(f.Divisor.TermCount <= 30 ? f.Divisor.ToLatex() : $"\\text{{({f.Divisor.TermCount} terms)}}");
            sb.AppendLine("$, which does not divide $N$.");
        }
        else if (Steps.Length > 0)
            sb.Append("\\par Laurent up to $").Append(Steps[^1].Term).AppendLine("$.");
        return sb.ToString();
    }

    /// <summary>Writes <c>laurent</c>, <c>positive</c>, <c>integer</c>, <c>steps</c> (each with <c>n</c>,
    /// <c>term</c>, <c>terms</c>, <c>positive</c>, <c>integer</c>, <c>minExponents</c>, <c>maxExponents</c>),
    /// <c>firstFailure</c> (index or null), <c>witness</c> (or null), <c>variables</c>, <c>stepsRequested</c>,
    /// <c>limit</c> and <c>verification</c>.</summary>
    /// <param name="writer">A writer positioned inside an object.</param>
    public void WriteJsonProperties(Utf8JsonWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        writer.WriteBoolean("laurent", IsLaurent);
        writer.WriteBoolean("positive", AllPositive);
        writer.WriteBoolean("integer", AllInteger);
        writer.WriteStartArray("steps");
        foreach (var s in Steps)
        {
            writer.WriteStartObject();
            writer.WriteNumber("n", s.Index);
            writer.WriteString("term", s.Term);
            writer.WriteNumber("terms", s.TermCount);
            writer.WriteBoolean("positive", s.IsPositive);
            writer.WriteBoolean("integer", s.IsInteger);
            writer.WriteStartObject("minExponents");
            for (int v = 0; v < Variables.Length; v++) writer.WriteNumber(Variables[v], s.MinExponents[v]);
            writer.WriteEndObject();
            writer.WriteStartObject("maxExponents");
            for (int v = 0; v < Variables.Length; v++) writer.WriteNumber(Variables[v], s.MaxExponents[v]);
            writer.WriteEndObject();
            writer.WriteEndObject();
        }
        writer.WriteEndArray();
        if (Failure is { } f)
        {
            writer.WriteNumber("firstFailure", f.Index);
            writer.WriteStartObject("witness");
            writer.WriteString("term", f.Term);
            writer.WriteString("divisor", f.Divisor.ToString());
            writer.WriteNumber("numeratorTerms", f.Numerator.TermCount);
            if (f.Numerator.TermCount <= 2000) writer.WriteString("numerator", f.Numerator.ToString());
            if (f.Remainder is { } r) writer.WriteNumber("remainderTerms", r.TermCount);
            if (f.ValueAtOnes is { } v1) writer.WriteString("valueAtOnes", v1.ToString());
            else writer.WriteNull("valueAtOnes");
            if (f.Specialisation is not null)
            {
                writer.WriteString("specialisation", f.Specialisation);
                writer.WriteString("specialisedDivisor", f.SpecialisedDivisor!.ToString());
            }
            writer.WriteString("reason", f.Reason);
            writer.WriteEndObject();
        }
        else
        {
            writer.WriteNull("firstFailure");
            writer.WriteNull("witness");
        }
        writer.WriteStartArray("variables");
        foreach (var v in Variables) writer.WriteStringValue(v);
        writer.WriteEndArray();
        writer.WriteNumber("stepsRequested", StepsRequested);
        ReportJson.WriteLimit(writer, Limit);
        writer.WriteString("verification", Verification);
    }

    /// <inheritdoc/>
    public string ToJson() => ReportJson.Object(this);
}
