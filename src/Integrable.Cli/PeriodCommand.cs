using Integrable.Analyses;
using Integrable.Recursions;

namespace Integrable.Cli;

/// <summary><c>integrable period "&lt;equation&gt;" [--max P] [--set a=…] [--json]</c>: the exact period of a map.</summary>
internal sealed class PeriodCommand : CliCommand
{
    public override string Name => "period";
    public override string Summary => "find the exact period x_{n+p} = x_n of a map (as rational functions), or none up to P";
    public override string Usage => "\"<equation>\" [--max P] [--set name=value,...] [--points R] [--time-limit S] [--json | --latex]";
    public override string Example => "integrable period \"x_{n+1} x_{n-1} = x_n + 1\" --max 30 --json";
    public override IReadOnlyList<CliOption> Options { get; } =
    [
        new("max", "P", "largest period searched (default 30)"),
        new("set", "name=value,...", "values of parameters (the others stay symbolic)"),
        new("points", "R", "random points modulo primes (default 3)"),
        new("time-limit", "S", "stop after S seconds"),
        new("quiet", null, "no progress line on stderr (it is also off when stderr is not a terminal)"),
        new("json", null, "print a JSON object: period (number or null), maxPeriod, method, errorBound, ..."),
        new("latex", null, "print the result as LaTeX"),
    ];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        using var progress = new ProgressDisplay(context, args.Has("quiet"));
        int max = args.GetInt("max", 30, 1, 100_000);
        int points = args.GetInt("points", 3, 1, 100);
        var input = LaurentCommand.ReadInput(args.Positional(0, "equation (e.g. \"x_{n+1} x_{n-1} = x_n + 1\")"), allowLattice: false);
        var options = new PeriodOptions
        {
            ParameterValues = LaurentCommand.ReadParameters(args, input.Parameters),
            Points = points,
            Budget = LaurentCommand.ReadBudget(args, 500_000),
        };
        PeriodReport report;
        try
        {
            report = input.Scalar is { } r
                ? Periodicity.Find(r, max, options, progress: progress, cancellation: context.Cancellation)
                : Periodicity.Find(input.System!, max, options, progress: progress, cancellation: context.Cancellation);
        }
        catch (SingularStepException e)
        {
            progress.Dispose();
            context.Error.WriteLine($"integrable: {e.Message}");
            return 1;
        }
        catch (BudgetExceededException e)
        {
            progress.Dispose();
            context.Error.WriteLine($"integrable: {e.Message}");
            return 1;
        }
        progress.Dispose();   // clear the progress line before the report
        return LaurentCommand.Print(report, args, context);
    }
}
