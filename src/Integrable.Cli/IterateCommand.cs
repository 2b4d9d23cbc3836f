using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Recursions;
using Integrable.Text;

namespace Integrable.Cli;

/// <summary><c>integrable iterate "&lt;equation&gt;" --initial … --steps N [--set g=…] [--mod P | --float] [--json]</c>.</summary>
internal sealed class IterateCommand : CliCommand
{
    public override string Name => "iterate";
    public override string Summary => "iterate a recursion exactly (or modulo a prime, or in floating point) from initial values";
    public override string Usage => "\"<equation>\" --initial V1,V2,... [--steps N] [--set name=value,...] [--mod P | --float] [--json]";
    public override string Example => "integrable iterate \"y_{n+2} y_n = y_{n+1}^2 + w y_{n+1}\" --initial 1,2 --set w=3 --steps 8 --json";
    public override IReadOnlyList<CliOption> Options { get; } =
    [
        new("initial", "V1,V2,...", "initial values x_0, ..., x_{k-1} (integers, p/q or decimals)"),
        new("steps", "N", "number of new terms (default 10)"),
        new("set", "name=value,...", "values of the parameters"),
        new("mod", "P", "compute modulo the prime P (P < 2^62)"),
        new("float", null, "compute in double precision"),
        new("json", null, "print {\"values\": [...]} for scripts"),
        SvgOutput.Option("the orbit (x_n, x_{n+1}) of a second-order map (exact or --float values)"),
    ];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        var recurrence = EquationInput.ReadRecurrence(args.Positional(0, "equation (e.g. \"x_{n+1} x_{n-1} = x_n^2 + 1\")"));
        int steps = args.GetInt("steps", 10, 0, 1_000_000);
        if (args.Has("mod") && args.Has("float")) throw new CliUsageException("--mod and --float cannot be used together");
        var assignments = ValueLists.ParseAssignments(args.Get("set"));
        foreach (var name in assignments.Keys)
            if (!recurrence.Parameters.Contains(name))
                throw new CliUsageException($"--set: {name} is not a parameter of the equation (parameters: {(recurrence.Parameters.Length == 0 ? "none" : string.Join(", ", recurrence.Parameters))})");
        foreach (var p in recurrence.Parameters)
            if (!assignments.ContainsKey(p)) throw new CliUsageException($"parameter {p} has no value; give it with --set {p}=VALUE");
        if (args.Has("svg") && (recurrence.Order != 2 || args.Has("mod")))
            throw new CliUsageException(recurrence.Order != 2 ? $"--svg draws the orbit of a second-order map; this recursion has order {recurrence.Order}" : "--svg needs exact or --float values, not --mod");
        var initialText = args.Require("initial");
        List<string> printed;
        List<double>? orbit = null;
        try
        {
            if (args.Has("float"))
            {
                var init = ValueLists.ParseDoubles(initialText, "initial");
                CheckCount(init.Count, recurrence);
                var pars = recurrence.Parameters.Select(p => assignments[p].ToDouble()).ToList();
                var values = recurrence.Iterate(DoubleField.Instance, init, steps, pars, cancellation: context.Cancellation);
                orbit = [.. values];
                printed = values.Select(v => v.ToString("R", System.Globalization.CultureInfo.InvariantCulture)).ToList();
            }
            else if (args.Has("mod"))
            {
                var pText = args.Require("mod");
                if (!ulong.TryParse(pText, out ulong p) || p < 2 || p >= PrimeField.ModulusLimit || !Primes.IsPrime(p))
                    throw new CliUsageException($"--mod: '{pText}' is not a prime below 2^62");
                var field = new PrimeField(p);
                var init = ValueLists.ParseRationals(initialText, "initial");
                CheckCount(init.Count, recurrence);
                var reduce = (Rational r, string what) => field.CanReduce(r) ? field.FromRational(r)
                    : throw new CliUsageException($"{what} {r} has no value modulo {p} (the prime divides its denominator)");
                var pars = recurrence.Parameters.Select(n => reduce(assignments[n], $"parameter {n} =")).ToList();
                printed = recurrence.Iterate(field, init.Select(r => reduce(r, "initial value")).ToList(), steps, pars, cancellation: context.Cancellation)
                    .Select(v => v.ToString(System.Globalization.CultureInfo.InvariantCulture)).ToList();
            }
            else
            {
                var init = ValueLists.ParseRationals(initialText, "initial");
                CheckCount(init.Count, recurrence);
                var pars = recurrence.Parameters.Select(p => assignments[p]).ToList();
                var values = recurrence.Iterate(RationalField.Instance, init, steps, pars, cancellation: context.Cancellation);
                orbit = values.Select(v => v.ToDouble()).ToList();
                printed = values.Select(v => v.ToString()).ToList();
            }
        }
        catch (SingularStepException e)
        {
            context.Error.WriteLine($"integrable: {e.Message}");
            return 1;
        }
        if (orbit is not null)
            SvgOutput.Save(args, () => Plots.OrbitPlot.Render([orbit.Zip(orbit.Skip(1)).Select(p => (p.First, p.Second)).ToList()],
                new Plots.OrbitPlotOptions { Title = $"Orbit of {recurrence.Text}" }));
        if (args.Has("json"))
        {
            JsonOutput.Write(context.Out, w =>
            {
                w.WriteStartArray("values");
                foreach (var v in printed) w.WriteStringValue(v);
                w.WriteEndArray();
            });
        }
        else
        {
            for (int i = 0; i < printed.Count; i++) context.Out.WriteLine($"{recurrence.TermName(i)} = {printed[i]}");
        }
        return 0;
    }

    private static void CheckCount(int count, Recurrence r)
    {
        if (count != r.Order)
            throw new CliUsageException($"--initial: the recursion has order {r.Order}, so it needs {r.Order} initial values, got {count}");
    }
}
