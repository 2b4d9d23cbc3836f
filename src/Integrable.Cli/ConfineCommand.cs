using Integrable.Analyses;
using Integrable.Numbers;

namespace Integrable.Cli;

/// <summary><c>integrable confine "&lt;equation&gt;" [--steps K] [--value s,…] [--set a=…] [--json]</c>: the
/// singularity-confinement test.</summary>
/// <remarks>JSON fields: <c>confined</c> (all singularities confined), <c>singularities</c> (one object per
/// singular value s: <c>value</c>, <c>pattern</c> (symbols "0", "∞^2", "f" for a regular term), <c>confined</c>,
/// <c>confinedAt</c> (index of the first regular term after the pattern or null), <c>length</c>,
/// <c>recoversInitialData</c>, <c>precision</c>, <c>freeData</c>, <c>reason</c>, <c>terms</c>), <c>candidates</c>,
/// <c>steps</c>, <c>parameters</c> (values used), <c>limit</c>, <c>verification</c>.</remarks>
internal sealed class ConfineCommand : CliCommand
{
    public override string Name => "confine";
    public override string Summary => "singularity confinement: iterate Laurent series in ε from a singular value, report the pattern";
    public override string Usage => "\"<equation>\" [--steps K] [--value s1,s2,...] [--set name=value,...] [--start n] [--time-limit S] [--json | --latex]";
    public override string Example => "integrable confine \"x_{n+1} + x_{n-1} = a/x_n + 1/x_n^2\" --json";
    public override IReadOnlyList<CliOption> Options { get; } =
    [
        new("steps", "K", "steps after the singular term within which it must be confined (default 10)"),
        new("value", "s1,s2,...", "singular values to start from (default: 0 and the rational roots of the denominators)"),
        new("set", "name=value,...", "values of parameters (the others get random rational values)"),
        new("start", "n", "index of the first initial value (non-autonomous equations; default 0)"),
        new("time-limit", "S", "stop after S seconds"),
        new("quiet", null, "no progress line on stderr (it is also off when stderr is not a terminal)"),
        new("json", null, "print a JSON object: confined, singularities [{value, pattern, confined, confinedAt, ...}], ..."),
        new("latex", null, "print the patterns as LaTeX"),
    ];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        using var progress = new ProgressDisplay(context, args.Has("quiet"));
        int steps = args.GetInt("steps", 10, 1, 1000);
        int start = args.GetInt("start", 0, -1_000_000, 1_000_000);
        var input = LaurentCommand.ReadInput(args.Positional(0, "equation (e.g. \"x_{n+1} + x_{n-1} = x_n + 1/x_n^2\")"), allowLattice: false, allowSystem: false);
        List<Rational>? values = args.Get("value") is { } v ? ValueLists.ParseRationals(v, "value") : null;
        var options = new ConfinementOptions
        {
            Steps = steps,
            Start = start,
            SingularValues = values,
            ParameterValues = LaurentCommand.ReadParameters(args, input.Parameters),
            Budget = LaurentCommand.ReadBudget(args, 500_000),
        };
        var report = SingularityConfinement.Test(input.Scalar!, options, progress: progress, cancellation: context.Cancellation);
        progress.Dispose();   // clear the progress line before the report
        return LaurentCommand.Print(report, args, context);
    }
}
