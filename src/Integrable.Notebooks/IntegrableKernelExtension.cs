using Microsoft.DotNet.Interactive;

namespace Integrable.Notebooks;

/// <summary>The .NET Interactive kernel extension shipped in the package (folder
/// <c>interactive-extensions/dotnet</c>): the kernel runs it when the package is loaded with
/// <c>#r "nuget: Integrable.Notebooks"</c>, and it registers the formatters.</summary>
public sealed class IntegrableKernelExtension : IKernelExtension
{
    /// <summary>Registers the formatters (see <see cref="NotebookFormatters.Register"/>).</summary>
    /// <param name="kernel">The kernel loading the package.</param>
    /// <returns>A completed task.</returns>
    public Task OnLoadAsync(Kernel kernel)
    {
        NotebookFormatters.Register();
        return Task.CompletedTask;
    }
}
