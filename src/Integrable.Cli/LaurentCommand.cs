using System.Globalization;
using Integrable.Analyses;
using Integrable.Clusters;
using Integrable.Numbers;
using Integrable.Recursions;
using Integrable.Text;

namespace Integrable.Cli;

/// <summary><c>integrable laurent "&lt;equation&gt;" [--steps N] [--set a=…] [--json]</c>: checks the Laurent
/// property of a scalar recurrence, a system (equations separated by ';'), a lattice recurrence such as
/// the T-system, or a mutation sequence (<c>--matrix … --mutations …</c>). Also holds the input helpers
/// shared by the analysis commands.</summary>
internal sealed class LaurentCommand : CliCommand
{
    public override string Name => "laurent";
    public override string Summary => "check the Laurent property: iterate with symbolic initial values, exact division at every step";
    public override string Usage => "\"<equation>\" [--steps N] [--set name=value,...] [--max-terms N] [--time-limit S] [--json | --latex]";
    public override string Example => "integrable laurent \"x_{n+4} x_n = x_{n+3} x_{n+1} + x_{n+2}^2\" --steps 10 --json";
    public override IReadOnlyList<CliOption> Options { get; } =
    [
        new("steps", "N", "number of new terms (default 10; for a lattice recurrence the last time index)"),
        new("set", "name=value,...", "values of parameters (the others stay formal variables)"),
        new("matrix", "[[...],...]", "check a mutation sequence of this exchange matrix instead of an equation"),
        new("mutations", "k1,k2,...", "the mutation directions for --matrix"),
        new("max-terms", "N", "stop when a value has more than N terms (default 200000)"),
        new("time-limit", "S", "stop after S seconds"),
        new("quiet", null, "no progress line on stderr (it is also off when stderr is not a terminal)"),
        new("json", null, "print a JSON object: laurent, positive, steps [{n, terms, positive, integer, ...}], firstFailure, witness, ..."),
        new("latex", null, "print the report as LaTeX"),
        SvgOutput.Option("the number of terms of each iterate (log scale)"),
    ];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        using var progress = new ProgressDisplay(context, args.Has("quiet"));
        var budget = ReadBudget(args, 200_000);
        LaurentReport report;
        if (args.Has("matrix"))
        {
            if (args.Positionals.Count > 0) throw new CliUsageException("give either an equation or --matrix, not both");
            ExchangeMatrix matrix;
            IReadOnlyList<int> dirs;
            try
            {
                matrix = ExchangeMatrix.Parse(args.Require("matrix"));
                dirs = MutationSequence.Parse(args.Require("mutations"));
            }
            catch (ClusterFormatException e)
            {
                throw new CliUsageException($"cannot read the matrix or mutation sequence: {e.Message}");
            }
            catch (Exception e) when (e is FormatException or ArgumentException)
            {
                throw new CliUsageException($"cannot use the matrix: {e.Message.Split('\n')[0]}");
            }
            if (dirs.Count == 0) throw new CliUsageException("--mutations: give at least one direction");
            foreach (var k in dirs)
                if (k > matrix.MutableCount) throw new CliUsageException($"--mutations: direction {k} is out of range 1..{matrix.MutableCount}");
            report = LaurentPhenomenon.Check(matrix, dirs, new LaurentOptions { Budget = budget }, progress: progress, cancellation: context.Cancellation);
        }
        else
        {
            if (args.Has("mutations")) throw new CliUsageException("--mutations needs --matrix");
            int steps = args.GetInt("steps", 10, 1, 100_000);
            var input = ReadInput(args.Positional(0, "equation (e.g. \"x_{n+1} x_{n-1} = x_n^2 + 1\")"));
            var values = ReadParameters(args, input.Parameters);
            var options = new LaurentOptions { ParameterValues = values, Budget = budget };
            report = input switch
            {
                { Scalar: { } r } => LaurentPhenomenon.Check(r, steps, options, progress: progress, cancellation: context.Cancellation),
                { System: { } s } => LaurentPhenomenon.Check(s, steps, options, progress: progress, cancellation: context.Cancellation),
                { Lattice: { } l } => steps < l.Order
                    ? throw new CliUsageException($"--steps: the lattice recurrence has order {l.Order} in time, so the last time index must be at least {l.Order}")
                    : LaurentPhenomenon.Check(l, steps, options: options, progress: progress, cancellation: context.Cancellation),
                _ => throw new CliUsageException("no equation"),
            };
        }
        progress.Dispose();   // clear the progress line before the report
        SvgOutput.Save(args, () => Plots.LaurentPlot.Render(report));
        return Print(report, args, context);
    }

    // ---- helpers shared by the analysis commands ----

    /// <summary>A parsed equation: a scalar recurrence, a system, or a lattice recurrence.</summary>
    internal sealed record Input(Recurrence? Scalar, RecurrenceSystem? System, LatticeRecurrence? Lattice)
    {
        public IReadOnlyList<string> Parameters => Scalar?.Parameters ?? System?.Parameters ?? (IReadOnlyList<string>?)Lattice?.Parameters ?? [];
    }

    internal static Input ReadInput(string text, bool allowLattice = true, bool allowSystem = true)
    {
        try
        {
            if (text.Contains(';') || LooksLikeSystem(text))
            {
                if (!allowSystem) throw new CliUsageException("this command takes one scalar equation, not a system");
                return new Input(null, RecurrenceSystem.Parse(text), null);
            }
            if (allowLattice && LooksLikeLattice(text)) return new Input(null, null, LatticeRecurrence.Parse(text));
            if (LooksLikeLattice(text)) throw new CliUsageException("this command does not take lattice equations (terms with two indices)");
            return new Input(EquationInput.ReadRecurrence(text), null, null);
        }
        catch (ExpressionParseException e)
        {
            throw new CliUsageException($"cannot read the equation: {e.Reason} at position {e.Position}");
        }
        catch (EquationException e)
        {
            throw new CliUsageException($"cannot read the equation: {e.Reason} (at position {e.Position})");
        }
    }

    private static bool LooksLikeSystem(string text)
    {
        int depth = 0, equals = 0;
        foreach (char c in text)
        {
            if (c is '(' or '{' or '[') depth++;
            else if (c is ')' or '}' or ']') depth--;
            else if (c == '=') equals++;
            else if (c == ',' && depth == 0) return true;
        }
        return equals > 1;
    }

    private static bool LooksLikeLattice(string text)
    {
        int depth = 0;
        foreach (char c in text)
        {
            if (c == '{') depth++;
            else if (c == '}') depth--;
            else if (c == ',' && depth > 0) return true;
        }
        return false;
    }

    internal static Dictionary<string, Rational> ReadParameters(ParsedArguments args, IReadOnlyList<string> parameters)
    {
        var values = ValueLists.ParseAssignments(args.Get("set"));
        foreach (var name in values.Keys)
            if (!parameters.Contains(name))
                throw new CliUsageException($"--set: {name} is not a parameter of the equation (parameters: {(parameters.Count == 0 ? "none" : string.Join(", ", parameters))})");
        return values;
    }

    internal static AnalysisBudget ReadBudget(ParsedArguments args, int defaultTerms)
    {
        var budget = AnalysisBudget.Default with { MaxTerms = defaultTerms };
        if (args.Has("max-terms")) budget = budget with { MaxTerms = args.GetInt("max-terms", defaultTerms, 1) };
        if (args.Get("time-limit") is { } t)
        {
            if (!double.TryParse(t, NumberStyles.Float, CultureInfo.InvariantCulture, out double s) || !(s > 0) || s > 1e6)
                throw new CliUsageException($"--time-limit expects a positive number of seconds, got '{t}'");
            budget = budget with { TimeLimit = TimeSpan.FromSeconds(s) };
        }
        return budget;
    }

    /// <summary>Prints a report as JSON, LaTeX or text; exit code 1 (with a line on stderr) when a budget limit stopped it.</summary>
    internal static int Print(IAnalysisReport report, ParsedArguments args, CliContext context)
    {
        if (args.Has("json") && args.Has("latex")) throw new CliUsageException("--json and --latex cannot be used together");
        if (args.Has("json")) context.Out.WriteLine(report.ToJson());
        else if (args.Has("latex")) context.Out.WriteLine(report.ToLatex());
        else context.Out.Write(report.ToString());
        if (report.Limit == BudgetLimit.None) return 0;
        context.Error.WriteLine($"integrable: stopped by the {report.Limit.ToString().ToLowerInvariant()} limit before all requested steps were done");
        return 1;
    }
}
