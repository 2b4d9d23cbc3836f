using Integrable.Analyses;
using Integrable.Numbers;
using Integrable.Solutions;

namespace Integrable.Cli;

/// <summary><c>integrable series "&lt;equation&gt;" --parameter g [--order N] [--boundary "R_0=0" | --initial a,b] [--json]</c>:
/// the solution as power series in a weight.</summary>
internal sealed class SeriesCommand : CliCommand
{
    public override string Name => "series";
    public override string Summary => "solution as power series in a weight: boundary values with the fixed point as limit, or initial values";
    public override string Usage => "\"<equation>\" --parameter g [--order N] [--boundary \"x_0=0\" | --initial a,b,...] [--count K] [--set name=value,...] [--time-limit S] [--json | --latex]";
    public override string Example => "integrable series \"W_n = 1 + t W_n (W_{n-1} + W_{n+1})\" --parameter t --order 12 --boundary \"W_0=0\" --json";
    public override IReadOnlyList<CliOption> Options { get; } =
    [
        new("parameter", "g", "the weight: the series variable (a parameter of the equation)"),
        new("order", "N", "coefficients of g^0 … g^N (default 20)"),
        new("boundary", "x_b=v", "boundary-value problem: the value(s) at the low end, and x_n → the fixed point as n → ∞"),
        new("initial", "a,b,...", "initial-value problem: x_0 … x_{k-1}"),
        new("count", "K", "number of indices to print (default 10)"),
        new("set", "name=value,...", "values of the other parameters"),
        new("time-limit", "S", "stop after S seconds (default 60)"),
        new("json", null, "print a JSON object: series (coefficients per index), order, firstIndex, limit, window, verification"),
        new("latex", null, "print the result as LaTeX"),
    ];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        var input = LaurentCommand.ReadInput(args.Positional(0, "equation (e.g. \"R_n = 1 + g R_n (R_{n-1} + R_{n+1})\")"), allowLattice: false, allowSystem: false);
        var rec = input.Scalar!;
        string parameter = args.Require("parameter");
        if (!rec.Parameters.Contains(parameter))
            throw new CliUsageException($"--parameter: '{parameter}' is not a parameter of the equation (parameters: {(rec.Parameters.Length == 0 ? "none" : string.Join(", ", rec.Parameters))})");
        int order = args.GetInt("order", 20, 0, 5000);
        int count = args.GetInt("count", 10, 1, 100_000);
        var budget = LaurentCommand.ReadBudget(args, 500_000);
        if (budget.TimeLimit is null) budget = budget with { TimeLimit = TimeSpan.FromSeconds(60) };
        var values = LaurentCommand.ReadParameters(args, rec.Parameters);
        if (values.ContainsKey(parameter)) throw new CliUsageException($"--set: '{parameter}' is the series variable and cannot be given a value");
        foreach (var p in rec.Parameters)
            if (p != parameter && !values.ContainsKey(p)) throw new CliUsageException($"the parameter '{p}' needs a value (--set {p}=...)");
        var options = new SeriesOptions { Order = order, Count = count, ParameterValues = values, Budget = budget };
        if (args.Has("boundary") == args.Has("initial")) throw new CliUsageException("give exactly one of --boundary and --initial");
        SeriesSolution solution;
        try
        {
            if (args.Has("boundary"))
            {
                var conditions = args.Require("boundary").Split(';', ',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries)
                    .Select(t => BoundaryInput.Read(t, rec)).OrderBy(c => c.Index).ToList();
                if (conditions.Count != rec.Order - 1)
                    throw new CliUsageException($"--boundary: an equation of order {rec.Order} needs {rec.Order - 1} boundary value(s), got {conditions.Count}");
                for (int i = 1; i < conditions.Count; i++)
                    if (conditions[i].Index != conditions[0].Index + i) throw new CliUsageException("--boundary: the values must be at consecutive indices");
                solution = SeriesSolver.SolveBoundaryValue(rec, parameter, conditions[0].Index, conditions.Select(c => c.Value).ToList(), options, cancellation: context.Cancellation);
            }
            else
            {
                var initial = ValueLists.ParseRationals(args.Require("initial"), "initial");
                if (initial.Count != rec.Order) throw new CliUsageException($"--initial: an equation of order {rec.Order} needs {rec.Order} values, got {initial.Count}");
                solution = SeriesSolver.SolveInitialValue(rec, parameter, initial, 0, options, cancellation: context.Cancellation);
            }
        }
        catch (ArgumentException e)
        {
            throw new CliUsageException(e.Message.Split(" (Parameter", 2)[0]);
        }
        catch (SeriesConvergenceException e)
        {
            context.Error.WriteLine($"integrable: {e.Message}");
            return 1;
        }
        catch (BudgetExceededException e)
        {
            context.Error.WriteLine($"integrable: {e.Message}");
            return 1;
        }
        return LaurentCommand.Print(solution, args, context);
    }
}
