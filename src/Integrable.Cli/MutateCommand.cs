using Integrable.Algebra;
using Integrable.Clusters;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Cli;

/// <summary><c>integrable mutate --matrix B | --type NAME --sequence 1,2,1 [--initial V1,...] [--json]</c>: the cluster
/// variables after a sequence of mutations as Laurent polynomials in x_1, …, x_n (frozen y_1, …, y_m), the mutated
/// matrix, and optionally their values at a point.</summary>
internal sealed class MutateCommand : CliCommand
{
    private const int MaxSteps = 100_000;

    public override string Name => "mutate";
    public override string Summary => "mutate a seed along a sequence of directions; print the cluster variables as Laurent polynomials";
    public override string Usage => "--matrix \"[[0,1],[-1,0]]\" | --type NAME --sequence K1,K2,... [--initial V1,V2,...] [--json]";
    public override string Example => "integrable mutate --matrix \"[[0,1],[-1,0]]\" --sequence 1,2,1 --initial 1,1 --json";
    public override int MaxPositionals => 0;
    public override IReadOnlyList<CliOption> Options { get; } =
    [
        new("matrix", "B", "exchange matrix as nested brackets, rows after the first n are frozen"),
        new("type", "NAME", "a named matrix instead: A5, B3, D_4, E8, F4, G2, Markov, Kronecker"),
        new("sequence", "K1,K2,...", "mutation directions 1..n, applied first to last (empty: no mutation)"),
        new("initial", "V1,V2,...", "values of x_1, ..., x_n, y_1, ..., y_m for the \"values\" field"),
        new("json", null, "print {\"variables\": [...], \"matrix\": [[...]], \"values\": [...]}"),
        SvgOutput.Option("the mutated quiver (valued quiver for a skew-symmetrizable matrix) as a graph"),
    ];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        var matrix = ExploreCommand.ReadMatrix(args);
        var directions = ReadSequence(args.Require("sequence"), matrix);
        List<Rational>? point = null;
        if (args.Get("initial") is string initialText)
        {
            point = ValueLists.ParseRationals(initialText, "initial");
            if (point.Count != matrix.RowCount)
                throw new CliUsageException(
                    $"--initial: the seed has {matrix.MutableCount} cluster and {matrix.FrozenCount} frozen variables, so give {matrix.RowCount} values, got {point.Count}");
        }

        Seed<LaurentPolynomial> seed;
        Seed<Rational>? valued = null;
        try
        {
            seed = Run(LaurentSeeds.Initial(matrix), directions, context.Cancellation);
            if (point is not null) valued = Run(new Seed<Rational>(RationalField.Instance, matrix, point), directions, context.Cancellation);
        }
        catch (ExchangeDivisionException e)
        {
            context.Error.WriteLine($"integrable: {ExploreCommand.OneLine(e.Message)}");
            return 1;
        }
        catch (OverflowException e)
        {
            context.Error.WriteLine($"integrable: {ExploreCommand.OneLine(e.Message)}");
            return 1;
        }

        var variables = seed.Cluster.Select(v => v.ToString()).ToList();
        var values = valued?.Cluster.Select(v => v.ToString()).ToList();
        var result = seed.Matrix;
        SvgOutput.Save(args, () => Plots.QuiverPlot.Render(result, directions.Count == 0 ? "Quiver" : $"Quiver after mutations {string.Join(", ", directions)}"));
        if (args.Has("json"))
        {
            JsonOutput.Write(context.Out, w =>
            {
                w.WriteStartArray("variables");
                foreach (var v in variables) w.WriteStringValue(v);
                w.WriteEndArray();
                w.WriteStartArray("matrix");
                for (int i = 1; i <= result.RowCount; i++)
                {
                    w.WriteStartArray();
                    for (int j = 1; j <= result.MutableCount; j++) w.WriteNumberValue(result[i, j]);
                    w.WriteEndArray();
                }
                w.WriteEndArray();
                if (values is not null)
                {
                    w.WriteStartArray("values");
                    foreach (var v in values) w.WriteStringValue(v);
                    w.WriteEndArray();
                }
            });
            return 0;
        }
        var o = context.Out;
        o.WriteLine(directions.Count == 0 ? "no mutation" : $"after mutations {string.Join(", ", directions)} (first to last):");
        for (int i = 0; i < variables.Count; i++)
            o.WriteLine(values is null ? $"  position {i + 1}: {variables[i]}" : $"  position {i + 1}: {variables[i]}    = {values[i]}");
        if (matrix.FrozenCount > 0)
            o.WriteLine($"frozen: {string.Join(", ", seed.Frozen.Select(v => v.ToString()))}");
        o.WriteLine($"matrix: {result}");
        return 0;
    }

    private static List<int> ReadSequence(string text, ExchangeMatrix matrix)
    {
        List<int> directions;
        try
        {
            directions = [.. MutationSequence.Parse(text)];
        }
        catch (ClusterFormatException e)
        {
            throw new CliUsageException($"--sequence: {ExploreCommand.OneLine(e.Message)}");
        }
        if (directions.Count > MaxSteps) throw new CliUsageException($"--sequence: at most {MaxSteps} mutations, got {directions.Count}");
        for (int s = 0; s < directions.Count; s++)
            if (directions[s] > matrix.MutableCount)
                throw new CliUsageException($"--sequence: direction {directions[s]} at step {s + 1} is out of range; directions are 1..{matrix.MutableCount}");
        return directions;
    }

    private static Seed<T> Run<T>(Seed<T> seed, List<int> directions, CancellationToken cancellation)
    {
        foreach (int k in directions)
        {
            cancellation.ThrowIfCancellationRequested();
            seed = seed.Mutate(k);
        }
        return seed;
    }
}
