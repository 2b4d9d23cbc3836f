using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Recursions;

namespace Integrable.Cli;

/// <summary>The built-in example run when no command is given: a weighted three-step product
/// recursion of our own, iterated exactly over Q and, from the same compiled rule, over Z/pZ.</summary>
internal sealed class DemoCommand : CliCommand
{
    public override string Name => "demo";
    public override string Summary => "run the built-in example (a weighted three-step product recursion)";
    public override string Usage => "[--steps N]";
    public override string Example => "integrable demo --steps 15";
    public override int MaxPositionals => 0;
    public override IReadOnlyList<CliOption> Options { get; } = [new("steps", "N", "number of new terms (default 15)")];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        int steps = args.GetInt("steps", 15, 1, 10_000);
        var o = context.Out;
        o.WriteLine("Example: the weighted three-step product recursion  y_{n+3} y_n = y_{n+2} y_{n+1} + w,  w = 2");
        o.WriteLine("from y_0 = y_1 = y_2 = 1. The rule is compiled once to a straight-line program and run");
        o.WriteLine("exactly over Q and over Z/pZ.");
        o.WriteLine();
        // rule: y_{n+3} = (y_{n+2} y_{n+1} + w) / y_n with inputs (y_n, y_{n+1}, y_{n+2}, w)
        var b = new StraightLineProgramBuilder(4);
        var rule = b.Build(b.Divide(b.Add(b.Multiply(b.Input(2), b.Input(1)), b.Input(3)), b.Input(0)));
        o.WriteLine("compiled rule:");
        o.Write(rule.ToString());
        o.WriteLine();

        var q = RationalField.Instance;
        var values = new List<Rational> { 1, 1, 1 };
        for (int n = 0; n < steps; n++)
        {
            context.Cancellation.ThrowIfCancellationRequested();
            values.Add(rule.Evaluate(q, [values[^3], values[^2], values[^1], new Rational(2)]));
        }
        o.WriteLine("exact values: " + string.Join(", ", values));
        bool integral = values.All(v => v.IsInteger);
        o.WriteLine($"all values integers: {(integral ? "yes" : "no")} (a sign of the Laurent property)");

        var field = new PrimeField(Primes.Large(0));
        var residues = new List<ulong> { 1, 1, 1 };
        for (int n = 0; n < steps; n++)
            residues.Add(rule.Evaluate(field, [residues[^3], residues[^2], residues[^1], 2UL]));
        bool agree = values.Select(v => field.FromRational(v)).SequenceEqual(residues);
        o.WriteLine($"same orbit modulo p = {field.Modulus}: {(agree ? "yes" : "NO")}");
        return agree ? 0 : 1;
    }
}
