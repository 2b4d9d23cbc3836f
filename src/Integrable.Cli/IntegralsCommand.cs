using Integrable.Integrals;

namespace Integrable.Cli;

/// <summary><c>integrable integrals "&lt;equation&gt;" [--degree D] [--var-degree D] [--rational] [--json | --latex]</c>: proven first integrals.</summary>
internal sealed class IntegralsCommand : CliCommand
{
    public override string Name => "integrals";
    public override string Summary => "first integrals up to a degree (proven by exact identities), rational integrals from Darboux polynomials, invariant measures";
    public override string Usage => "\"<equation>\" [--degree D] [--var-degree D] [--rational] [--darboux-degree D] [--set name=value,...] [--periodic \"name=v0,v1,...\"] [--time-limit S] [--json | --latex]";
    public override string Example => "integrable integrals \"x_{n+1} + x_{n-1} = 2 m x_n/(1 - x_n^2)\" --degree 4 --json";
    public override IReadOnlyList<CliOption> Options { get; } =
    [
        new("degree", "D", "largest total degree of a polynomial integral (default 4)"),
        new("var-degree", "D", "largest degree in each single unknown (e.g. 2 for biquadratic integrals)"),
        new("rational", null, "also search Darboux polynomials, rational integrals and invariant measures"),
        new("darboux-degree", "D", "largest degree of a Darboux polynomial (default: --degree)"),
        new("set", "name=value,...", "fix parameters to rational values"),
        new("periodic", "name=v0,v1,...", "a parameter taking the values v0, v1, … periodically in n (expressions in other names); several separated by ';'"),
        new("time-limit", "S", "stop after S seconds (default 60)"),
        new("json", null, "print a JSON object: integrals, independent, verified, complete, ..."),
        new("latex", null, "print the result as LaTeX"),
    ];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        int degree = args.GetInt("degree", 4, 1, 40);
        int? darboux = args.Has("darboux-degree") ? args.GetInt("darboux-degree", degree, 1, 12) : null;
        var input = LaurentCommand.ReadInput(args.Positional(0, "equation (e.g. \"x_{n+1} x_{n-1} = a + x_n\")"), allowLattice: false);
        var budget = LaurentCommand.ReadBudget(args, 500_000);
        if (budget.TimeLimit is null) budget = budget with { TimeLimit = TimeSpan.FromSeconds(60) };
        int? varDegree = args.Has("var-degree") ? args.GetInt("var-degree", degree, 1, 40) : null;
        var options = IntegralOptions.Default with
        {
            Degree = degree, MaxVariableDegree = varDegree, Rational = args.Has("rational"), DarbouxDegree = darboux, Budget = budget,
        };
        var fixedValues = LaurentCommand.ReadParameters(args, input.Parameters);
        IntegralMap map;
        try
        {
            if (input.Scalar is { } r)
            {
                var phases = ReadPhases(args.Get("periodic"), r.Parameters);
                foreach (var (name, value) in fixedValues)
                {
                    if (phases.Count == 0) phases.Add(new Dictionary<string, string>(StringComparer.Ordinal));
                    foreach (var ph in phases)
                        if (!ph.TryAdd(name, value.ToString())) throw new CliUsageException($"--set and --periodic both give {name}");
                }
                map = IntegralMap.FromRecurrence(r, phases);
            }
            else
            {
                if (args.Has("periodic") || fixedValues.Count > 0) throw new CliUsageException("--periodic and --set apply to scalar equations only");
                map = IntegralMap.FromSystem(input.System!);
            }
        }
        catch (ArgumentException e)
        {
            throw new CliUsageException(e.Message.Split(" (Parameter")[0]);
        }
        var report = FirstIntegrals.Find(map, options, cancellation: context.Cancellation);
        return LaurentCommand.Print(report, args, context);
    }

    private static List<Dictionary<string, string>> ReadPhases(string? text, IReadOnlyList<string> parameters)
    {
        var phases = new List<Dictionary<string, string>>();
        if (text is null) return phases;
        foreach (var part in text.Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            int eq = part.IndexOf('=');
            if (eq <= 0) throw new CliUsageException($"--periodic expects name=v0,v1,..., got '{part}'");
            string name = part[..eq].Trim();
            if (!parameters.Contains(name))
                throw new CliUsageException($"--periodic: {name} is not a parameter of the equation (parameters: {(parameters.Count == 0 ? "none" : string.Join(", ", parameters))})");
            var values = part[(eq + 1)..].Split(',', StringSplitOptions.TrimEntries);
            if (values.Length < 2 || values.Any(v => v.Length == 0))
                throw new CliUsageException($"--periodic: {name} needs at least two non-empty values");
            if (phases.Count == 0) for (int i = 0; i < values.Length; i++) phases.Add(new Dictionary<string, string>(StringComparer.Ordinal));
            else if (phases.Count != values.Length) throw new CliUsageException("--periodic: every parameter needs the same number of values (the period)");
            for (int i = 0; i < values.Length; i++)
                if (!phases[i].TryAdd(name, values[i])) throw new CliUsageException($"--periodic gives {name} twice");
        }
        return phases;
    }
}
