using Integrable.Analyses;
using Integrable.Recursions;

namespace Integrable.Cli;

/// <summary><c>integrable growth "&lt;equation&gt;" [--steps N] [--set a=…] [--json]</c>: degree growth and algebraic entropy.</summary>
internal sealed class GrowthCommand : CliCommand
{
    public override string Name => "growth";
    public override string Summary => "degree growth and algebraic entropy: degrees on random lines mod p, fitted generating function, growth class";
    public override string Usage => "\"<equation>\" [--steps N] [--set name=value,...] [--max-degree D] [--time-limit S] [--json | --latex]";
    public override string Example => "integrable growth \"x_{n+1} + x_{n-1} = 1/x_n + 1/x_n^2\" --steps 30 --json";
    public override IReadOnlyList<CliOption> Options { get; } =
    [
        new("steps", "N", "number of new terms (default 20)"),
        new("set", "name=value,...", "values of parameters (the others get generic random values)"),
        new("max-degree", "D", "stop when a degree exceeds D (default 200000)"),
        new("time-limit", "S", "stop after S seconds (default 60)"),
        new("quiet", null, "no progress line on stderr (it is also off when stderr is not a terminal)"),
        new("json", null, "print a JSON object: degrees, class, entropy, generatingFunction, minimalPolynomial, ..."),
        new("latex", null, "print the result as LaTeX"),
        SvgOutput.Option("the degrees on log-linear axes with the fitted curve"),
    ];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        using var progress = new ProgressDisplay(context, args.Has("quiet"));
        int steps = args.GetInt("steps", 20, 1, 100_000);
        int maxDegree = args.GetInt("max-degree", 200_000, 1);
        var input = LaurentCommand.ReadInput(args.Positional(0, "equation (e.g. \"x_{n+1} + x_{n-1} = x_n + 1/x_n^2\")"), allowLattice: false);
        var budget = LaurentCommand.ReadBudget(args, 500_000) with { MaxDegree = maxDegree };
        if (budget.TimeLimit is null) budget = budget with { TimeLimit = TimeSpan.FromSeconds(60) };
        var options = new GrowthOptions { ParameterValues = LaurentCommand.ReadParameters(args, input.Parameters), Budget = budget };
        GrowthReport report;
        try
        {
            report = input.Scalar is { } r
                ? DegreeGrowth.Analyse(r, steps, options, progress: progress, cancellation: context.Cancellation)
                : DegreeGrowth.Analyse(input.System!, steps, options, progress: progress, cancellation: context.Cancellation);
        }
        catch (SingularStepException e)
        {
            progress.Dispose();
            context.Error.WriteLine($"integrable: {e.Message}");
            return 1;
        }
        progress.Dispose();   // clear the progress line before the report
        SvgOutput.Save(args, () => Plots.GrowthPlot.Render(report));
        int exit = LaurentCommand.Print(report, args, context);
        if (exit == 0 && !report.Fit.IsFound)
        {
            context.Error.WriteLine($"integrable: no generating function confirmed ({report.Fit.Explanation}); try more --steps");
            return 1;
        }
        return exit;
    }
}
