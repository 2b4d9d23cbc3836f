using Integrable.Clusters;

namespace Integrable.Cli;

/// <summary><c>integrable explore --matrix "[[0,1],[-1,0]]" | --type E8 [--limit N] [--exact] [--json]</c>: counts
/// the seeds and cluster variables of the exchange graph, breadth first, up to a limit.</summary>
internal sealed class ExploreCommand : CliCommand
{
    public override string Name => "explore";
    public override string Summary => "count the seeds and cluster variables reachable by mutations (exchange graph, breadth first)";
    public override string Usage => "--matrix \"[[0,1],[-1,0]]\" | --type NAME [--limit N] [--exact] [--json]";
    public override string Example => "integrable explore --type E8 --limit 100000 --json";
    public override int MaxPositionals => 0;
    public override IReadOnlyList<CliOption> Options { get; } =
    [
        new("matrix", "B", "exchange matrix as nested brackets, rows after the first n are frozen"),
        new("type", "NAME", "a named matrix instead: A5, B3, D_4, E8, F4, G2, Markov, Kronecker"),
        new("limit", "N", "stop after N seeds (default 200000)"),
        new("exact", null, "identify cluster variables as exact Laurent polynomials instead of fingerprints"),
        new("json", null, "print {\"seeds\": S, \"variables\": V, \"complete\": true|false, \"depth\": D}"),
        SvgOutput.Option("the initial quiver as a graph"),
    ];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        var matrix = ReadMatrix(args);
        int limit = args.GetInt("limit", 200_000, 1, 50_000_000);
        var options = new ExplorationOptions { MaxSeeds = limit };
        SvgOutput.Save(args, () => Plots.QuiverPlot.Render(matrix, "Initial quiver"));
        ExchangeGraphReport report;
        try
        {
            report = args.Has("exact")
                ? ExchangeGraph.Explore(LaurentSeeds.Initial(matrix), options, cancellation: context.Cancellation).Report
                : ExchangeGraph.Explore(matrix, options, cancellation: context.Cancellation);
        }
        catch (OverflowException e)
        {
            context.Error.WriteLine($"integrable: {OneLine(e.Message)} (the exchange graph is infinite; lower --limit)");
            return 1;
        }
        if (args.Has("json"))
        {
            JsonOutput.Write(context.Out, w =>
            {
                w.WriteNumber("seeds", report.SeedCount);
                w.WriteNumber("variables", report.ClusterVariableCount);
                w.WriteBoolean("complete", report.Complete);
                w.WriteNumber("depth", report.Depth);
            });
            return 0;
        }
        var o = context.Out;
        o.WriteLine($"seeds:             {report.SeedCount}");
        o.WriteLine($"cluster variables: {report.ClusterVariableCount}");
        o.WriteLine(report.Complete
            ? "complete:          yes (the whole exchange graph)"
            : $"complete:          no (stopped at the limit of {limit} seeds)");
        o.WriteLine($"depth:             {report.Depth}");
        o.WriteLine($"identified by:     {report.Identification}");
        return 0;
    }

    /// <summary>Reads <c>--matrix</c> or <c>--type</c> (exactly one of them), mapping the library's errors to usage errors.</summary>
    internal static ExchangeMatrix ReadMatrix(ParsedArguments args)
    {
        var text = args.Get("matrix");
        var name = args.Get("type");
        if (text is not null && name is not null) throw new CliUsageException("give either --matrix or --type, not both");
        if (text is null && name is null) throw new CliUsageException("give the exchange matrix with --matrix \"[[0,1],[-1,0]]\" or a name with --type (e.g. --type A3)");
        try
        {
            return text is not null ? ExchangeMatrix.Parse(text) : ExchangeMatrix.Named(name!);
        }
        catch (ClusterFormatException e)
        {
            throw new CliUsageException($"--matrix: {OneLine(e.Message)}");
        }
        catch (ArgumentException e)
        {
            var message = e.ParamName is null ? e.Message : e.Message.Replace($" (Parameter '{e.ParamName}')", "", StringComparison.Ordinal);
            throw new CliUsageException($"--{(text is not null ? "matrix" : "type")}: {OneLine(message)}");
        }
    }

    internal static string OneLine(string message) => message.ReplaceLineEndings(" ");
}
