using Integrable.Plots;

namespace Integrable.Cli;

/// <summary>The <c>--svg FILE</c> option shared by the commands that have a plot.</summary>
internal static class SvgOutput
{
    /// <summary>The option's table entry, with what the command draws.</summary>
    public static CliOption Option(string what) => new("svg", "FILE", $"also write {what} as an SVG file");

    /// <summary>Renders and writes the plot when <c>--svg</c> was given; a file that cannot be written is a usage error.</summary>
    public static void Save(ParsedArguments args, Func<SvgPlot> render)
    {
        if (args.Get("svg") is not { } path) return;
        if (path.Length == 0) throw new CliUsageException("--svg needs a file name");
        try
        {
            render().Save(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException)
        {
            throw new CliUsageException($"--svg: cannot write '{path}': {e.Message.ReplaceLineEndings(" ")}");
        }
    }
}
