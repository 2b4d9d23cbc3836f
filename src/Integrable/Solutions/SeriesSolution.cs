using System.Text;
using System.Text.Json;
using Integrable.Analyses;
using Integrable.Numbers;
using Integrable.Recursions;
using Integrable.Series;

namespace Integrable.Solutions;

/// <summary>A solution x_n of a recursion as power series in a weight g, known modulo g^{Order+1}, for consecutive
/// indices from <see cref="FirstIndex"/>, with the evidence of its verification.</summary>
public sealed class SeriesSolution : IAnalysisReport
{
    internal SeriesSolution(Recurrence recurrence, string parameter, SeriesProblemKind kind, int order, long firstIndex,
        IReadOnlyList<PowerSeries<Rational>> terms, PowerSeries<Rational>? limit, int window,
        string verification, BudgetLimit budgetLimit, TimeSpan elapsed)
    {
        Recurrence = recurrence;
        Parameter = parameter;
        Kind = kind;
        Order = order;
        FirstIndex = firstIndex;
        Terms = terms;
        LimitValue = limit;
        Window = window;
        Verification = verification;
        Limit = budgetLimit;
        Elapsed = elapsed;
    }

    /// <summary>The recursion.</summary>
    public Recurrence Recurrence { get; }

    /// <summary>The weight variable.</summary>
    public string Parameter { get; }

    /// <summary>Initial- or boundary-value problem.</summary>
    public SeriesProblemKind Kind { get; }

    /// <summary>The order reached: coefficients of g^0 … g^Order are exact.</summary>
    public int Order { get; }

    /// <summary>The index of <c>Terms[0]</c> (the first index not given as data).</summary>
    public long FirstIndex { get; }

    /// <summary>The series x_{FirstIndex}, x_{FirstIndex+1}, …, each with precision Order + 1.</summary>
    public IReadOnlyList<PowerSeries<Rational>> Terms { get; }

    /// <summary>The limit x_∞ (fixed point) for boundary-value problems, else null.</summary>
    public PowerSeries<Rational>? LimitValue { get; }

    /// <summary>The number of indices solved together (boundary-value problems; 0 otherwise).</summary>
    public int Window { get; }

    /// <inheritdoc/>
    public string Verification { get; }

    /// <inheritdoc/>
    public BudgetLimit Limit { get; }

    /// <summary>Wall time of the computation.</summary>
    public TimeSpan Elapsed { get; }

    /// <summary>The series of x_<paramref name="index"/>.</summary>
    /// <param name="index">An index in FirstIndex … FirstIndex + Terms.Count − 1.</param>
    /// <returns>The series.</returns>
    /// <exception cref="ArgumentOutOfRangeException">The index is outside the reported range.</exception>
    public PowerSeries<Rational> this[long index]
    {
        get
        {
            if (index < FirstIndex || index >= FirstIndex + Terms.Count)
                throw new ArgumentOutOfRangeException(nameof(index), $"indices {FirstIndex} … {FirstIndex + Terms.Count - 1} are reported");
            return Terms[(int)(index - FirstIndex)];
        }
    }

    /// <summary>The coefficients of g^0 … g^Order of x_<paramref name="index"/>.</summary>
    /// <param name="index">A reported index.</param>
    /// <returns>Order + 1 rationals.</returns>
    public Rational[] Coefficients(long index)
    {
        var s = this[index];
        var c = new Rational[Order + 1];
        for (int i = 0; i <= Order; i++) c[i] = s[i];
        return c;
    }

    /// <summary>The report as plain text: one line per index with the first coefficients.</summary>
    /// <returns>Text.</returns>
    public string ToText()
    {
        var sb = new StringBuilder();
        sb.AppendLine($"{(Kind == SeriesProblemKind.BoundaryValue ? "boundary-value" : "initial-value")} series solution of {Recurrence.Text} in {Parameter}, to O({Parameter}^{Order + 1})");
        if (LimitValue is { } l) sb.AppendLine($"  limit {Recurrence.Unknown}_∞ = {Show(l)}");
        for (int i = 0; i < Terms.Count; i++) sb.AppendLine($"  {Recurrence.TermName(FirstIndex + i)} = {Show(Terms[i])}");
        if (Window > 0) sb.AppendLine($"  window: {Window} indices");
        sb.AppendLine($"  verified: {Verification}");
        return sb.ToString();
    }

    private string Show(PowerSeries<Rational> s)
    {
        var parts = new List<string>();
        int shown = 0;
        for (int i = 0; i <= Order && shown < 8; i++)
        {
            var c = s[i];
            if (c.IsZero) continue;
            shown++;
            string mono = i == 0 ? "" : i == 1 ? Parameter : $"{Parameter}^{i}";
            parts.Add(i == 0 ? c.ToString() : c == Rational.One ? mono : $"{c} {mono}");
        }
        string body = parts.Count == 0 ? "0" : string.Join(" + ", parts).Replace("+ -", "- ");
        return $"{body} + O({Parameter}^{Order + 1})";
    }

    /// <inheritdoc/>
    public string ToLatex()
    {
        var sb = new StringBuilder();
        sb.AppendLine("\\begin{align*}");
        for (int i = 0; i < Terms.Count; i++)
        {
            var s = Terms[i];
            var parts = new List<string>();
            for (int d = 0; d <= Math.Min(Order, 6); d++)
            {
                var c = s[d];
                if (c.IsZero) continue;
                string mono = d == 0 ? "" : d == 1 ? Parameter : $"{Parameter}^{{{d}}}";
                parts.Add(d == 0 ? c.ToLatex() : c == Rational.One ? mono : $"{c.ToLatex()}\\,{mono}");
            }
            string lhs = FirstIndex + i is >= 0 and <= 9 ? $"{Recurrence.Unknown}_{FirstIndex + i}" : $"{Recurrence.Unknown}_{{{FirstIndex + i}}}";
            sb.AppendLine($"{lhs} &= {(parts.Count == 0 ? "0" : string.Join(" + ", parts))} + O({Parameter}^{{{Order + 1}}})\\\\");
        }
        sb.AppendLine("\\end{align*}");
        return sb.ToString();
    }

    /// <inheritdoc/>
    public void WriteJsonProperties(Utf8JsonWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        writer.WriteString("equation", Recurrence.Text);
        writer.WriteString("parameter", Parameter);
        writer.WriteString("kind", Kind == SeriesProblemKind.BoundaryValue ? "boundary" : "initial");
        writer.WriteNumber("order", Order);
        writer.WriteNumber("firstIndex", FirstIndex);
        writer.WriteStartObject("series");
        for (int i = 0; i < Terms.Count; i++)
        {
            writer.WriteStartArray(Recurrence.TermName(FirstIndex + i));
            for (int d = 0; d <= Order; d++) writer.WriteStringValue(Terms[i][d].ToString());
            writer.WriteEndArray();
        }
        writer.WriteEndObject();
        if (LimitValue is { } l)
        {
            writer.WriteStartArray("limitValue");   // not "limit": that name holds the budget limit below
            for (int d = 0; d <= Order; d++) writer.WriteStringValue(l[d].ToString());
            writer.WriteEndArray();
            writer.WriteNumber("window", Window);
        }
        writer.WriteString("verification", Verification);
        ReportJson.WriteLimit(writer, Limit);
    }

    /// <inheritdoc/>
    public string ToJson() => ReportJson.Object(this);

    /// <summary>The plain-text report.</summary>
    /// <returns>Text.</returns>
    public override string ToString() => ToText();
}
