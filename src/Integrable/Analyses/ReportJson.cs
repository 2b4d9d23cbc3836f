using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;

namespace Integrable.Analyses;

/// <summary>Shared JSON and text helpers for the reports.</summary>
internal static class ReportJson
{
    public static string Object(IAnalysisReport report)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            w.WriteStartObject();
            report.WriteJsonProperties(w);
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    public static string LimitName(BudgetLimit limit) => limit switch
    {
        BudgetLimit.None => "none",
        BudgetLimit.Terms => "terms",
        BudgetLimit.Time => "time",
        BudgetLimit.Degree => "degree",
        BudgetLimit.Precision => "precision",
        _ => limit.ToString().ToLowerInvariant(),
    };

    public static void WriteLimit(Utf8JsonWriter w, BudgetLimit limit)
    {
        if (limit == BudgetLimit.None) w.WriteNull("limit");
        else w.WriteString("limit", LimitName(limit));
    }

    /// <summary>Text of a value, shortened to its first and last characters when long.</summary>
    public static string Shorten(string text, int max = 400)
    {
        if (text.Length <= max) return text;
        int half = max / 2;
        return text[..half] + " … " + text[^half..] + $" ({text.Length} characters)";
    }

    /// <summary>Escapes text for LaTeX \text{…}.</summary>
    public static string LatexText(string s) =>
        s.Replace("\\", "\\textbackslash{}").Replace("{", "\\{").Replace("}", "\\}").Replace("_", "\\_")
         .Replace("^", "\\^{}").Replace("%", "\\%").Replace("&", "\\&").Replace("#", "\\#").Replace("$", "\\$");
}
