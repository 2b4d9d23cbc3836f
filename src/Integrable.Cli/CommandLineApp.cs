namespace Integrable.Cli;

/// <summary>The <c>integrable</c> tool: dispatches to subcommands, turns bad input into one line on
/// stderr with exit code 2 and failed computations into exit code 1.</summary>
internal static class CommandLineApp
{
    public static IReadOnlyList<CliCommand> Commands { get; } =
    [
        new DemoCommand(),
        new IterateCommand(),
        new MutateCommand(),
        new ExploreCommand(),
        new LaurentCommand(),
        new GrowthCommand(),
        new PeriodCommand(),
        new ConfineCommand(),
        new IntegralsCommand(),
        new SeriesCommand(),
        new TauCommand(),
        new AnalyzeCommand(),
    ];

    public static int Run(string[] args, TextWriter stdout, TextWriter stderr, CancellationToken cancellation = default)
    {
        var context = new CliContext(stdout, stderr, cancellation);
        try
        {
            if (args.Length == 0) return new DemoCommand().Execute(new ParsedArguments(new(), new()), context);
            if (args[0] is "--help" or "-h" or "help")
            {
                stdout.Write(GeneralHelp());
                return 0;
            }
            var command = Commands.FirstOrDefault(c => c.Name == args[0])
                          ?? throw new CliUsageException($"unknown command '{args[0]}' (commands: {string.Join(", ", Commands.Select(c => c.Name))})");
            var rest = args[1..];
            if (rest.Contains("--help") || rest.Contains("-h"))
            {
                stdout.Write(command.Help());
                return 0;
            }
            return command.Execute(command.Parse(rest), context);
        }
        catch (CliUsageException e)
        {
            stderr.WriteLine($"integrable: {e.Message}");
            return 2;
        }
        catch (OperationCanceledException)
        {
            stderr.WriteLine("integrable: cancelled");
            return 1;
        }
    }

    public static string GeneralHelp()
    {
        var sb = new System.Text.StringBuilder();
        sb.AppendLine("integrable — exact analysis of discrete integrable recursions");
        sb.AppendLine();
        sb.AppendLine("Usage: integrable <command> [arguments] [options]   (no command: run the built-in demo)");
        sb.AppendLine();
        sb.AppendLine("Commands:");
        foreach (var c in Commands) sb.AppendLine($"  {c.Name,-10} {c.Summary}");
        sb.AppendLine();
        sb.AppendLine("'integrable <command> --help' shows the options and an example.");
        return sb.ToString();
    }
}
