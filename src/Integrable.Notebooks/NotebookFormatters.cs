using System.Net;
using Integrable.Analyses;
using Integrable.Clusters;
using Integrable.LinearAlgebra;
using Integrable.Plots;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Microsoft.DotNet.Interactive.Formatting;

namespace Integrable.Notebooks;

/// <summary>Registers the notebook formatters of the library's types with .NET Interactive:
/// Laurent polynomials, rational functions, rational and exchange matrices and seeds as LaTeX
/// (<c>text/latex</c>, display math <c>$$…$$</c>, plus an HTML form for MathJax/KaTeX pages);
/// quivers as an SVG graph with their matrix; reports as HTML summaries with their plot; plots as
/// SVG.</summary>
/// <remarks>Loading the package in a notebook (<c>#r "nuget: Integrable.Notebooks"</c>) calls
/// <see cref="Register"/> through <see cref="IntegrableKernelExtension"/>; call it yourself when
/// the assembly is referenced another way. Registering twice does nothing.</remarks>
public static class NotebookFormatters
{
    /// <summary>The MIME type of LaTeX output.</summary>
    public const string Latex = "text/latex";

    /// <summary>The MIME type of HTML output.</summary>
    public const string Html = "text/html";

    /// <summary>The MIME type of SVG output.</summary>
    public const string Svg = "image/svg+xml";

    private static readonly Lock Gate = new();
    private static bool _registered;

    /// <summary>True once <see cref="Register"/> has run.</summary>
    public static bool IsRegistered
    {
        get { lock (Gate) return _registered; }
    }

    /// <summary>Registers every formatter (idempotent, thread-safe).</summary>
    public static void Register()
    {
        lock (Gate)
        {
            if (_registered) return;
            RegisterMath<LaurentPolynomial>(p => p.ToLatex());
            RegisterMath<RationalFunction>(f => f.ToLatex());
            RegisterMath<RationalMatrix>(m => m.ToLatex());
            RegisterMath<ExchangeMatrix>(MathLatex.Matrix);
            Formatter.Register(typeof(Seed<>), (object seed, TextWriter w) => w.Write(MathLatex.Display(SeedLatex(seed))), Latex);
            Formatter.Register(typeof(Seed<>), (object seed, TextWriter w) => w.Write(HtmlMath(SeedLatex(seed))), Html);
            Formatter.SetPreferredMimeTypesFor(typeof(Seed<>), Latex);

            Formatter.Register<Quiver>((q, w) => w.Write(MathLatex.Display(MathLatex.Of(q))), Latex);
            Formatter.Register<Quiver>((q, w) => w.Write(QuiverHtml(q)), Html);
            Formatter.SetPreferredMimeTypesFor(typeof(Quiver), Html);

            Formatter.Register<SvgPlot>((p, w) => w.Write(p.Svg), Svg);
            Formatter.Register<SvgPlot>((p, w) => w.Write(p.Svg), Html);
            Formatter.SetPreferredMimeTypesFor(typeof(SvgPlot), Html);

            Formatter.Register<IAnalysisReport>((r, w) => w.Write(ReportHtml.Of(r)), Html);
            Formatter.Register<IAnalysisReport>((r, w) => w.Write(MathLatex.Display(r.ToLatex())), Latex);
            foreach (var type in new[] { typeof(GrowthReport), typeof(LaurentReport), typeof(PeriodReport), typeof(ConfinementReport) })
                Formatter.SetPreferredMimeTypesFor(type, Html);
            _registered = true;
        }
    }

    private static void RegisterMath<T>(Func<T, string> latex)
    {
        Formatter.Register<T>((x, w) => w.Write(MathLatex.Display(latex(x))), Latex);
        Formatter.Register<T>((x, w) => w.Write(HtmlMath(latex(x))), Html);
        Formatter.SetPreferredMimeTypesFor(typeof(T), Latex);
    }

    /// <summary>Display math inside a div, HTML-escaped, for pages that typeset <c>$$…$$</c> with MathJax or KaTeX.</summary>
    internal static string HtmlMath(string latex) => "<div class=\"integrable-math\">" + WebUtility.HtmlEncode(MathLatex.Display(latex)) + "</div>";

    internal static string QuiverHtml(Quiver q) =>
        "<div class=\"integrable-quiver\">" + QuiverPlot.Render(q).Svg + HtmlMath("B = " + MathLatex.Of(q)) + "</div>";

    private static string SeedLatex(object seed)
    {
        var method = typeof(MathLatex).GetMethod(nameof(MathLatex.Seed))!.MakeGenericMethod(seed.GetType().GetGenericArguments()[0]);
        return (string)method.Invoke(null, [seed])!;
    }
}
