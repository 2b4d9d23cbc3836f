using System.Net;
using System.Text;
using Integrable.Analyses;
using Integrable.Plots;

namespace Integrable.Notebooks;

/// <summary>HTML summaries of analysis reports for notebooks: a heading, the verdict and figures as
/// preformatted text, how the result was verified, the limit that stopped it (if any), and the
/// report's plot as inline SVG when it has one.</summary>
public static class ReportHtml
{
    /// <summary>The plot that belongs to a report: degrees for a <see cref="GrowthReport"/>, term counts
    /// for a <see cref="LaurentReport"/>; null for the others.</summary>
    /// <param name="report">The report.</param>
    /// <returns>The plot or null.</returns>
    public static SvgPlot? PlotOf(IAnalysisReport report) => report switch
    {
        GrowthReport g when g.Degrees.Length > 0 => GrowthPlot.Render(g),
        LaurentReport l when l.Steps.Length > 0 => LaurentPlot.Render(l),
        _ => null,
    };

    /// <summary>The HTML summary of a report (a <c>&lt;div class="integrable-report"&gt;</c> fragment).</summary>
    /// <param name="report">The report.</param>
    /// <returns>HTML markup.</returns>
    public static string Of(IAnalysisReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        var sb = new StringBuilder();
        sb.Append("<div class=\"integrable-report\">");
        sb.Append("<h4>").Append(WebUtility.HtmlEncode(Heading(report))).Append("</h4>");
        sb.Append("<pre>").Append(WebUtility.HtmlEncode(report.ToString() ?? "")).Append("</pre>");
        sb.Append("<p><b>Verification:</b> ").Append(WebUtility.HtmlEncode(report.Verification)).Append("</p>");
        if (report.Limit != BudgetLimit.None)
            sb.Append("<p><b>Stopped by the ").Append(WebUtility.HtmlEncode(report.Limit.ToString().ToLowerInvariant())).Append(" limit</b> (the verdict covers the work done).</p>");
        if (PlotOf(report) is { } plot) sb.Append("<div class=\"integrable-plot\">").Append(plot.Svg).Append("</div>");
        sb.Append("</div>");
        return sb.ToString();
    }

    private static string Heading(IAnalysisReport report)
    {
        string name = report.GetType().Name;
        if (name.EndsWith("Report", StringComparison.Ordinal)) name = name[..^"Report".Length];
        return name + " report";
    }
}
