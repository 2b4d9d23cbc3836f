namespace Integrable.Cli;

/// <summary>One option of a command: <c>--name VALUE</c> or a flag <c>--name</c>.</summary>
internal sealed record CliOption(string Name, string? ValueName, string Help)
{
    public bool IsFlag => ValueName is null;
}
