using Integrable.Analyses;
using Integrable.Numbers;
using Integrable.Recursions;
using Integrable.Solutions;

namespace Integrable.Cli;

/// <summary><c>integrable tau "&lt;equation&gt;" [--parameter g --boundary "R_0=0" | --initial 1,2] [--json]</c>: tau
/// substitution, bilinear form and closed-form tau function.</summary>
internal sealed class TauCommand : CliCommand
{
    public override string Name => "tau";
    public override string Summary => "tau substitution, bilinear equation and exact tau function fitted to boundary or initial data";
    public override string Usage => "\"<equation>\" [--parameter g --boundary \"x_0=0\" [--order N] | --initial a,b,...] [--set name=value,...] [--json | --latex]";
    public override string Example => "integrable tau \"W_n = 1 + t W_n (W_{n-1} + W_n + W_{n+1})\" --parameter t --boundary \"W_0=0\" --json";
    public override IReadOnlyList<CliOption> Options { get; } =
    [
        new("parameter", "g", "the weight (with --boundary)"),
        new("boundary", "x_b=0", "fit to the boundary-value problem x_b = 0, x_n → fixed point (order-2 equations)"),
        new("order", "N", "series order used to fit and check (default 20)"),
        new("initial", "a,b,...", "fit to the orbit of these initial values (linear recurrence for τ, proved by induction)"),
        new("set", "name=value,...", "values of the other parameters"),
        new("json", null, "print a JSON object: substitution, bilinear, tau, relations, verified, verification, seriesCheck, notes"),
        new("latex", null, "print the result as LaTeX"),
    ];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        var input = LaurentCommand.ReadInput(args.Positional(0, "equation (e.g. \"x_{n+1} x_{n-1} = x_n^2 + 1\")"), allowLattice: false, allowSystem: false);
        var rec = input.Scalar!;
        var values = LaurentCommand.ReadParameters(args, rec.Parameters);
        if (args.Has("boundary") && args.Has("initial")) throw new CliUsageException("give --boundary or --initial, not both");
        TauReport report;
        try
        {
            if (args.Has("boundary"))
            {
                string parameter = args.Require("parameter");
                if (!rec.Parameters.Contains(parameter))
                    throw new CliUsageException($"--parameter: '{parameter}' is not a parameter of the equation (parameters: {(rec.Parameters.Length == 0 ? "none" : string.Join(", ", rec.Parameters))})");
                if (rec.Order != 2) throw new CliUsageException($"--boundary: the tau fitter takes equations of order 2, this one has order {rec.Order}");
                foreach (var p in rec.Parameters)
                    if (p != parameter && !values.ContainsKey(p)) throw new CliUsageException($"the parameter '{p}' needs a value (--set {p}=...)");
                var (index, value) = BoundaryInput.Read(args.Require("boundary"), rec);
                int order = args.GetInt("order", 20, 8, 2000);
                report = TauFitter.FitBoundary(rec, parameter, index, value,
                    new SeriesOptions { Order = order, ParameterValues = values, Budget = AnalysisBudget.Default with { TimeLimit = TimeSpan.FromSeconds(120) } },
                    cancellation: context.Cancellation);
            }
            else if (args.Has("initial"))
            {
                var initial = ValueLists.ParseRationals(args.Require("initial"), "initial");
                if (initial.Count != rec.Order) throw new CliUsageException($"--initial: an equation of order {rec.Order} needs {rec.Order} values, got {initial.Count}");
                foreach (var p in rec.Parameters)
                    if (!values.ContainsKey(p)) throw new CliUsageException($"the parameter '{p}' needs a value (--set {p}=...)");
                report = TauFitter.FitInitial(rec, initial, 40, values, context.Cancellation);
            }
            else
            {
                report = BilinearForms.Report(rec, cancellation: context.Cancellation);
            }
        }
        catch (ArgumentException e)
        {
            throw new CliUsageException(e.Message.Split(" (Parameter", 2)[0]);
        }
        catch (Exception e) when (e is SeriesConvergenceException or BudgetExceededException or SingularStepException)
        {
            context.Error.WriteLine($"integrable: {e.Message}");
            return 1;
        }
        int exit = LaurentCommand.Print(report, args, context);
        if (exit == 0 && !report.Verified)
        {
            context.Error.WriteLine("integrable: no verified tau form found (see the notes)");
            return 1;
        }
        return exit;
    }
}
