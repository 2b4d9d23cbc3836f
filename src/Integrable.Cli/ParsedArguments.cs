namespace Integrable.Cli;

/// <summary>The options and positional arguments given to one command, already checked against the
/// command's option table.</summary>
internal sealed class ParsedArguments
{
    private readonly Dictionary<string, string?> _options;

    public ParsedArguments(Dictionary<string, string?> options, List<string> positionals)
    {
        _options = options;
        Positionals = positionals;
    }

    public IReadOnlyList<string> Positionals { get; }

    public bool Has(string name) => _options.ContainsKey(name);

    public string? Get(string name) => _options.TryGetValue(name, out var v) ? v : null;

    public string Require(string name) =>
        Get(name) ?? throw new CliUsageException($"option --{name} is required");

    public int GetInt(string name, int fallback, int min = int.MinValue, int max = int.MaxValue)
    {
        var text = Get(name);
        if (text is null) return fallback;
        if (!int.TryParse(text, System.Globalization.NumberStyles.AllowLeadingSign, System.Globalization.CultureInfo.InvariantCulture, out int v))
            throw new CliUsageException($"option --{name} expects an integer, got '{text}'");
        if (v < min || v > max)
            throw new CliUsageException($"option --{name} must be between {min} and {max}, got {v}");
        return v;
    }

    public string Positional(int index, string what) =>
        index < Positionals.Count ? Positionals[index] : throw new CliUsageException($"missing {what}");
}
