namespace Integrable.Cli;

/// <summary>A subcommand of the <c>integrable</c> tool.</summary>
internal abstract class CliCommand
{
    public abstract string Name { get; }
    public abstract string Summary { get; }
    /// <summary>Usage line after the command name, e.g. <c>"&lt;equation&gt; [options]"</c>.</summary>
    public abstract string Usage { get; }
    /// <summary>One complete example invocation (shown by --help).</summary>
    public abstract string Example { get; }
    public abstract IReadOnlyList<CliOption> Options { get; }
    /// <summary>Maximum number of positional arguments.</summary>
    public virtual int MaxPositionals => 1;

    /// <summary>Runs the command. Returns the exit code (0 success, 1 failed computation).</summary>
    public abstract int Execute(ParsedArguments args, CliContext context);

    public ParsedArguments Parse(IReadOnlyList<string> args)
    {
        var options = new Dictionary<string, string?>(StringComparer.Ordinal);
        var positionals = new List<string>();
        for (int i = 0; i < args.Count; i++)
        {
            var a = args[i];
            if (a.StartsWith("--", StringComparison.Ordinal) && a.Length > 2)
            {
                string name = a[2..];
                string? inline = null;
                int eq = name.IndexOf('=');
                if (eq >= 0) { inline = name[(eq + 1)..]; name = name[..eq]; }
                var opt = Options.FirstOrDefault(o => o.Name == name)
                          ?? throw new CliUsageException($"unknown option --{name} for '{Name}' (see 'integrable {Name} --help')");
                if (options.ContainsKey(name)) throw new CliUsageException($"option --{name} given twice");
                if (opt.IsFlag)
                {
                    if (inline is not null) throw new CliUsageException($"option --{name} takes no value");
                    options[name] = null;
                }
                else
                {
                    string? value = inline;
                    if (value is null)
                    {
                        if (i + 1 >= args.Count) throw new CliUsageException($"option --{name} needs a value ({opt.ValueName})");
                        value = args[++i];
                    }
                    options[name] = value;
                }
            }
            else positionals.Add(a);
        }
        if (positionals.Count > MaxPositionals)
            throw new CliUsageException($"unexpected argument '{positionals[MaxPositionals]}' for '{Name}'");
        return new ParsedArguments(options, positionals);
    }

    public string Help()
    {
        var sb = new System.Text.StringBuilder();
        sb.AppendLine($"integrable {Name} {Usage}");
        sb.AppendLine();
        sb.AppendLine(Summary);
        sb.AppendLine();
        sb.AppendLine("Options:");
        foreach (var o in Options.Append(new CliOption("help", null, "show this help")))
        {
            var left = o.IsFlag ? $"--{o.Name}" : $"--{o.Name} {o.ValueName}";
            sb.AppendLine($"  {left,-24} {o.Help}");
        }
        sb.AppendLine();
        sb.AppendLine("Example:");
        sb.AppendLine($"  {Example}");
        return sb.ToString();
    }
}
