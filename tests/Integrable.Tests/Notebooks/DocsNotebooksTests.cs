using System.Reflection;
using System.Text.RegularExpressions;
using Integrable.Notebooks;
using Microsoft.DotNet.Interactive.Commands;
using Microsoft.DotNet.Interactive.CSharp;
using Microsoft.DotNet.Interactive.Documents;
using Microsoft.DotNet.Interactive.Documents.Jupyter;
using Microsoft.DotNet.Interactive.Events;
using Integrable.Tests.Packaging;

namespace Integrable.Tests.Notebooks;

/// <summary>Runs every notebook of docs/notebooks headless: each C# cell is submitted to an in-process
/// C# kernel with the freshly built assemblies referenced (the notebook's <c>#r "nuget: Integrable.Notebooks, V"</c>
/// line is replaced by <c>#r</c> of the built files, V must be the current version), and any cell error fails.</summary>
public partial class DocsNotebooksTests
{
    private static List<string> NotebookNames() =>
        Directory.GetFiles(NotebookFolder, "*.ipynb").Select(f => Path.GetFileName(f)).Order(StringComparer.Ordinal).ToList();

    public static TheoryData<string> Notebooks() => new(NotebookNames());

    private static string NotebookFolder => Path.Combine(DotnetProcess.RepositoryRoot, "docs", "notebooks");

    private static string Version =>
        typeof(Integrable.Numbers.Rational).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()!.InformationalVersion.Split('+')[0];

    [GeneratedRegex("^#r \"nuget:\\s*Integrable(\\.Notebooks)?\\s*,\\s*(?<version>[^\"]+)\"\\s*$", RegexOptions.Multiline)]
    private static partial Regex PackageReference();

    [Fact]
    public void Notebooks_Folder_HasTheTourAndOnePerCapability()
    {
        Assert.Equal(["00-tour.ipynb", "01-iterate.ipynb", "02-laurent.ipynb", "03-growth.ipynb", "04-clusters.ipynb", "05-plots.ipynb"], NotebookNames());
    }

    [Theory]
    [MemberData(nameof(Notebooks))]
    public async Task Notebook_RunHeadless_EveryCellSucceeds(string name)
    {
        var document = Notebook.Parse(File.ReadAllText(Path.Combine(NotebookFolder, name)),
            new KernelInfoCollection { new Microsoft.DotNet.Interactive.Documents.KernelInfo("csharp") });
        using var kernel = new CSharpKernel();
        await new IntegrableKernelExtension().OnLoadAsync(kernel);
        string references = $"#r \"{typeof(Integrable.Numbers.Rational).Assembly.Location}\"\n#r \"{typeof(NotebookFormatters).Assembly.Location}\"";
        int cells = 0, rich = 0;
        bool loaded = false;
        foreach (var cell in document.Elements.Where(e => e.KernelName != "markdown"))
        {
            Assert.True(cell.KernelName == "csharp", $"{name}: a code cell has kernel '{cell.KernelName}', not csharp (it would not be run)");
            string code = cell.Contents;
            var match = PackageReference().Match(code);
            if (match.Success)
            {
                Assert.Equal(Version, match.Groups["version"].Value.Trim());
                code = PackageReference().Replace(code, references);
                loaded = true;
            }
            var result = await kernel.SendAsync(new SubmitCode(code));
            var failure = result.Events.OfType<CommandFailed>().FirstOrDefault();
            Assert.True(failure is null, $"{name}, cell {cells + 1} failed: {failure?.Message}\n{code}");
            rich += result.Events.OfType<DisplayEvent>()
                .Count(e => e.FormattedValues.Any(v => v.MimeType is NotebookFormatters.Latex or NotebookFormatters.Html));
            cells++;
        }
        Assert.True(loaded, $"{name} does not load the package with #r \"nuget: Integrable.Notebooks, {Version}\"");
        Assert.True(cells >= 3, $"{name} has only {cells} code cells");
        Assert.True(rich >= 1, $"{name} displayed nothing as LaTeX or HTML");
    }
}
