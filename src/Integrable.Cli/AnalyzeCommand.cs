using System.Text;
using Integrable.Analyses;
using Integrable.Integrals;
using Integrable.Recursions;

namespace Integrable.Cli;

/// <summary><c>integrable analyze "&lt;equation&gt;" [--json]</c>: runs the battery of analyses on one
/// equation (Laurent property, degree growth, period, singularity confinement, first integrals) and prints one report:
/// a summary and each analysis's report as text, or with <c>--json</c> one object holding one member
/// per analysis (the report's own JSON, or <c>{"error": …}</c> when that analysis could not run).</summary>
internal sealed class AnalyzeCommand : CliCommand
{
    public override string Name => "analyze";
    public override string Summary => "run the whole battery (Laurent, growth, period, confinement, first integrals) on one equation and print one report";
    public override string Usage => "\"<equation>\" [--steps N] [--growth-steps N] [--max-period P] [--degree D] [--set name=value,...] [--time-limit S] [--quiet] [--json]";
    public override string Example => "integrable analyze \"x_{n+1} x_{n-1} = x_n^2 + 3*x_n + 1\" --json";
    public override IReadOnlyList<CliOption> Options { get; } =
    [
        new("steps", "N", "iterates for the Laurent check (default 8)"),
        new("growth-steps", "N", "terms for the degree growth (default 20)"),
        new("max-period", "P", "largest period searched (default 30)"),
        new("degree", "D", "total degree of the first integrals searched, polynomial and rational (default 4)"),
        new("set", "name=value,...", "values of parameters (the others stay symbolic or get random values)"),
        new("time-limit", "S", "time limit of each analysis in seconds (default 60)"),
        new("quiet", null, "no progress display on stderr (it is also off when stderr is not a terminal)"),
        new("json", null, "print one JSON object: subject, then laurent, growth, period, confinement, integrals (each the analysis's report object)"),
    ];

    /// <summary>One analysis of the battery: its JSON member name and how to run it.</summary>
    private sealed record Analysis(string Name, Func<IProgress<AnalysisProgress>, IAnalysisReport> Run);

    public override int Execute(ParsedArguments args, CliContext context)
    {
        int steps = args.GetInt("steps", 8, 1, 10_000);
        int growthSteps = args.GetInt("growth-steps", 20, 1, 100_000);
        int maxPeriod = args.GetInt("max-period", 30, 1, 100_000);
        var input = LaurentCommand.ReadInput(args.Positional(0, "equation (e.g. \"x_{n+1} x_{n-1} = x_n^2 + 1\")"), allowLattice: false);
        var parameters = LaurentCommand.ReadParameters(args, input.Parameters);
        var budget = LaurentCommand.ReadBudget(args, 500_000);
        if (budget.TimeLimit is null) budget = budget with { TimeLimit = TimeSpan.FromSeconds(60) };
        var ct = context.Cancellation;
        Recurrence? scalar = input.Scalar;
        RecurrenceSystem? system = input.System;

        var battery = new List<Analysis>
        {
            new("laurent", p => scalar is not null
                ? LaurentPhenomenon.Check(scalar, steps, new LaurentOptions { ParameterValues = parameters, Budget = budget }, p, ct)
                : LaurentPhenomenon.Check(system!, steps, new LaurentOptions { ParameterValues = parameters, Budget = budget }, p, ct)),
            new("growth", p => scalar is not null
                ? DegreeGrowth.Analyse(scalar, growthSteps, new GrowthOptions { ParameterValues = parameters, Budget = budget }, p, ct)
                : DegreeGrowth.Analyse(system!, growthSteps, new GrowthOptions { ParameterValues = parameters, Budget = budget }, p, ct)),
            new("period", p => scalar is not null
                ? Periodicity.Find(scalar, maxPeriod, new PeriodOptions { ParameterValues = parameters, Budget = budget }, p, ct)
                : Periodicity.Find(system!, maxPeriod, new PeriodOptions { ParameterValues = parameters, Budget = budget }, p, ct)),
        };
        if (scalar is not null)
            battery.Add(new("confinement", p => SingularityConfinement.Test(scalar, new ConfinementOptions { ParameterValues = parameters, Budget = budget }, p, ct)));
        int integralDegree = args.GetInt("degree", 4, 1, 40);
        var integralOptions = IntegralOptions.Default with { Degree = integralDegree, Rational = true, Budget = budget };
        battery.Add(new("integrals", p =>
        {
            IntegralMap map;
            if (scalar is not null)
            {
                if (!scalar.IsAutonomous) throw new ArgumentException("first integrals are searched for autonomous equations only");
                var values = parameters.ToDictionary(kv => kv.Key, kv => kv.Value.ToString(), StringComparer.Ordinal);
                map = values.Count == 0 ? IntegralMap.FromRecurrence(scalar) : IntegralMap.FromRecurrence(scalar, [values]);
            }
            else
            {
                if (parameters.Count > 0) throw new ArgumentException("--set applies to scalar equations only for first integrals");
                map = IntegralMap.FromSystem(system!);
            }
            return FirstIntegrals.Find(map, integralOptions, p, ct);
        }));

        var results = new List<(string Name, IAnalysisReport? Report, string? Error)>();
        using (var progress = new ProgressDisplay(context, args.Has("quiet")))
        {
            foreach (var analysis in battery)
            {
                ct.ThrowIfCancellationRequested();
                progress.Start(analysis.Name);
                try
                {
                    results.Add((analysis.Name, analysis.Run(progress), null));
                }
                catch (Exception e) when (e is SingularStepException or BudgetExceededException or ArithmeticException or InvalidOperationException or ArgumentException)
                {
                    results.Add((analysis.Name, null, e.Message.ReplaceLineEndings(" ")));
                }
            }
        }

        string subject = scalar?.Text ?? system!.Text;
        if (args.Has("json"))
        {
            JsonOutput.Write(context.Out, w =>
            {
                w.WriteString("subject", subject);
                foreach (var (name, report, error) in results)
                {
                    w.WriteStartObject(name);
                    if (report is not null) report.WriteJsonProperties(w);
                    else w.WriteString("error", error);
                    w.WriteEndObject();
                }
            });
        }
        else
        {
            var o = context.Out;
            o.WriteLine($"Analysis of {subject}");
            o.WriteLine();
            foreach (var (name, report, error) in results) o.WriteLine($"  {name,-12} {SummaryLine(report, error)}");
            foreach (var (name, report, error) in results)
            {
                o.WriteLine();
                o.WriteLine($"== {name} ==");
                if (report is not null) o.Write(report.ToString());
                else o.WriteLine($"could not run: {error}");
            }
        }
        int failed = results.Count(r => r.Report is null || r.Report.Limit != BudgetLimit.None);
        if (failed > 0)
            context.Error.WriteLine($"integrable: {failed} of {results.Count} analyses did not complete (see their reports)");
        return failed > 0 ? 1 : 0;
    }

    /// <summary>The one-line verdict of an analysis.</summary>
    internal static string SummaryLine(IAnalysisReport? report, string? error)
    {
        var sb = new StringBuilder();
        switch (report)
        {
            case null:
                return "could not run: " + error;
            case LaurentReport l:
                sb.Append(l.IsLaurent
                    ? $"Laurent up to {(l.Steps.Length == 0 ? "(nothing)" : l.Steps[^1].Term)}{(l.AllPositive ? ", positive coefficients" : "")}"
                    : $"not Laurent: first failure at {l.Failure!.Term}");
                break;
            case GrowthReport g:
                sb.Append(g.Fit.IsFound ? g.Fit.ToString() : "no growth law confirmed").Append($" (degrees up to d_{g.Degrees.Length - 1} = {(g.Degrees.Length == 0 ? 0 : g.Degrees[^1])})");
                break;
            case PeriodReport p:
                sb.Append(p.Period is { } period ? $"period {period}" : $"no period up to {p.MaxPeriod}");
                break;
            case IntegralsReport i:
                sb.Append(i.Integrals.Length == 0
                    ? $"no first integral up to degree {i.Degree}"
                    : $"{i.Integrals.Length} first integral{(i.Integrals.Length == 1 ? "" : "s")} up to degree {i.Degree}, {i.Independent} independent (of {i.Expected} for complete integrability)");
                break;
            case ConfinementReport c:
                sb.Append(c.Singularities.Length == 0 ? "no singularity found to test"
                    : c.IsConfined ? $"all {c.Singularities.Length} singularities confined" : $"{c.Singularities.Count(s => !s.IsConfined)} of {c.Singularities.Length} singularities not confined");
                break;
            default:
                sb.Append(report.GetType().Name);
                break;
        }
        if (report.Limit != BudgetLimit.None) sb.Append($" [stopped by the {report.Limit.ToString().ToLowerInvariant()} limit]");
        return sb.ToString();
    }
}
