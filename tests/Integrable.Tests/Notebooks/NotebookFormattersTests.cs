using Integrable.Analyses;
using Integrable.Clusters;
using Integrable.LinearAlgebra;
using Integrable.Numbers;
using Integrable.Notebooks;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Recursions;
using Microsoft.DotNet.Interactive.Commands;
using Microsoft.DotNet.Interactive.CSharp;
using Microsoft.DotNet.Interactive.Events;
using Microsoft.DotNet.Interactive.Formatting;

namespace Integrable.Tests.Notebooks;

public class NotebookFormattersTests
{
    public NotebookFormattersTests() => NotebookFormatters.Register();

    [Fact]
    public void Register_LaurentPolynomial_IsDisplayMathLatex()
    {
        var ring = new LaurentPolynomialRing("x", "y");
        var p = LaurentPolynomial.Parse(ring, "x^2 + 3*x/y");
        Assert.Equal("$$" + p.ToLatex() + "$$", p.ToDisplayString(NotebookFormatters.Latex));
        Assert.Contains("integrable-math", p.ToDisplayString(NotebookFormatters.Html));
    }

    [Fact]
    public void Register_RationalFunctionAndMatrix_DisplayMathOfTheirLatex()
    {
        var f = RationalFunction.Parse(new RationalFunctionField("x", "y"), "(x^2 + 3*x + 1)/(x*y)");
        Assert.Equal("$$" + f.ToLatex() + "$$", f.ToDisplayString(NotebookFormatters.Latex));
        var m = RationalMatrix.Create(2, 2, (i, j) => new Rational(i + 1, j + 2));
        string latex = m.ToDisplayString(NotebookFormatters.Latex);
        Assert.Equal("$$" + m.ToLatex() + "$$", latex);
        Assert.StartsWith("$$\\begin{pmatrix}", latex);
    }

    [Fact]
    public void Register_Twice_IsHarmless()
    {
        NotebookFormatters.Register();
        Assert.True(NotebookFormatters.IsRegistered);
        var ring = new LaurentPolynomialRing("x");
        Assert.Equal("$$x$$", ring.Variable(0).ToDisplayString(NotebookFormatters.Latex));
    }

    [Fact]
    public void Register_ExchangeMatrixAndSeed_PmatrixWithFrozenRule()
    {
        var b = new ExchangeMatrix(new[,] { { 0, 1 }, { -1, 0 }, { 1, 0 } });
        Assert.Equal("$$\\begin{pmatrix}0 & 1 \\\\ -1 & 0 \\\\ \\hline 1 & 0\\end{pmatrix}$$", b.ToDisplayString(NotebookFormatters.Latex));
        var ring = new LaurentPolynomialRing("a", "b", "c");
        var seed = new Seed<LaurentPolynomial>(ring, b, [ring.Variable(0), ring.Variable(1), ring.Variable(2)]);
        string latex = seed.ToDisplayString(NotebookFormatters.Latex);
        Assert.StartsWith("$$\\left(a,\\ b \\;\\middle|\\; c;", latex);
    }

    [Fact]
    public void Register_Quiver_HtmlHasTheGraphAndTheMatrix()
    {
        var q = new Quiver(2, 0, [new Arrow(1, 2, 3)]);
        string html = q.ToDisplayString(NotebookFormatters.Html);
        Assert.Contains("<svg", html);
        Assert.Contains("\\begin{pmatrix}0 &amp; 3", html);
    }

    [Fact]
    public void Register_GrowthReport_HtmlSummaryWithPlotAndVerification()
    {
        var report = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1"), 10);
        string html = report.ToDisplayString(NotebookFormatters.Html);
        Assert.StartsWith("<div class=\"integrable-report\"><h4>Growth report</h4>", html);
        Assert.Contains("<b>Verification:</b>", html);
        Assert.Contains("class=\"degree\"", html);
    }

    [Fact]
    public async Task KernelExtension_InCSharpKernel_ReturnValuesUseTheFormatters()
    {
        using var kernel = new CSharpKernel();
        await new IntegrableKernelExtension().OnLoadAsync(kernel);
        var result = await kernel.SendAsync(new SubmitCode($"#r \"{typeof(LaurentPolynomial).Assembly.Location}\""));
        Assert.Empty(result.Events.OfType<CommandFailed>());
        result = await kernel.SendAsync(new SubmitCode(
            "var ring = new Integrable.Polynomials.LaurentPolynomialRing(\"x\");\nIntegrable.Polynomials.LaurentPolynomial.Parse(ring, \"x + 1/x\")"));
        Assert.Empty(result.Events.OfType<CommandFailed>());
        var value = result.Events.OfType<ReturnValueProduced>().Single();
        var latex = Assert.Single(value.FormattedValues, f => f.MimeType == NotebookFormatters.Latex);
        Assert.StartsWith("$$", latex.Value);
    }
}
