using Integrable.Algebra;
using Integrable.Analyses;
using Integrable.Integrals;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.Recursions;
using Integrable.Solutions;

namespace Integrable.Cli;

/// <summary>The built-in example run when no command is given: a weighted three-step product
/// recursion of our own, read from text, compiled once, and run exactly over Q, over Z/pZ and over
/// Laurent polynomials in symbolic initial values; then its degree growth, its first integrals and the
/// linear recurrence of an orbit — the whole job on one example.</summary>
internal sealed class DemoCommand : CliCommand
{
    internal const string Equation = "y_{n+3} y_n = y_{n+2} y_{n+1} + w";

    public override string Name => "demo";
    public override string Summary => "run the built-in example (a weighted three-step product recursion)";
    public override string Usage => "[--steps N]";
    public override string Example => "integrable demo --steps 12";
    public override int MaxPositionals => 0;
    public override IReadOnlyList<CliOption> Options { get; } = [new("steps", "N", "number of new terms (default 12)")];

    public override int Execute(ParsedArguments args, CliContext context)
    {
        int steps = args.GetInt("steps", 12, 1, 200);
        var o = context.Out;
        var r = Recurrence.Parse(Equation);
        o.WriteLine($"Example recursion:  {Equation}   (order {r.Order}, parameter {string.Join(", ", r.Parameters)})");
        o.WriteLine("It is compiled once into a straight-line program and evaluated in three domains.");
        o.WriteLine();

        var values = r.Iterate(RationalField.Instance, [1, 1, 1], steps, [new Rational(2)], cancellation: context.Cancellation);
        o.WriteLine($"1. Exactly over Q from y_0 = y_1 = y_2 = 1, w = 2:");
        o.WriteLine("   " + string.Join(", ", values));
        o.WriteLine($"   all integers: {(values.All(v => v.IsInteger) ? "yes" : "no")}");

        var field = new PrimeField(Primes.Large(0));
        var residues = r.Iterate<ulong>(field, [1, 1, 1], steps, [2], cancellation: context.Cancellation);
        bool agree = values.Select(field.FromRational).SequenceEqual(residues);
        o.WriteLine($"2. Modulo p = {field.Modulus}: same orbit reduced mod p: {(agree ? "yes" : "NO")}");

        var ring = new LaurentPolynomialRing("y_0", "y_1", "y_2", "w");
        var symbolic = r.Iterate(ring, [ring.Variable(0), ring.Variable(1), ring.Variable(2)], steps, [ring.Variable(3)],
            cancellation: context.Cancellation);
        o.WriteLine("3. Over Laurent polynomials in y_0, y_1, y_2, w (every division exact):");
        for (int j = 3; j < symbolic.Count; j++)
        {
            var p = symbolic[j];
            bool positive = p.Coefficients.ToArray().All(c => c.Sign > 0);
            string shown = p.TermCount <= 4 ? $" = {p}" : "";
            o.WriteLine($"   {r.TermName(j),-6} {p.TermCount,5} terms, positive coefficients: {(positive ? "yes" : "no")}{shown}");
        }
        var check = symbolic.Select(p => p.Evaluate([1, 1, 1, 2])).SequenceEqual(values);
        o.WriteLine($"   the Laurent iterates at (1, 1, 1, 2) give the orbit of step 1: {(check ? "yes" : "NO")}");

        var growth = DegreeGrowth.Analyse(r, 16, cancellation: context.Cancellation);
        o.WriteLine($"4. Degree growth (degrees of y_n in y_0, y_1, y_2, on random lines mod p): {string.Join(", ", growth.Degrees)}");
        o.WriteLine($"   growth: {(growth.Fit.IsFound ? growth.Fit.ToString() : "no law confirmed")}");

        var integrals = FirstIntegrals.Find(r, new IntegralOptions { Degree = 3, Rational = true }, cancellation: context.Cancellation);
        o.WriteLine($"5. First integrals up to degree 3 (each proved by the exact identity I∘φ = I over Q(w)):");
        foreach (var integral in integrals.Integrals) o.WriteLine($"   I = {integral}");
        o.WriteLine($"   functionally independent: {integrals.Independent} of the {integrals.Expected} an integrable map of dimension {r.Order} needs");

        var tau = TauFitter.FitInitial(r, [1, 1, 1], 40, new Dictionary<string, Rational> { ["w"] = new(2) }, context.Cancellation);
        o.WriteLine("6. Exact counts: the orbit of step 1 (τ_n = y_n) as a linear recurrence (Berlekamp–Massey on 40 exact terms):");
        foreach (var relation in tau.Relations) o.WriteLine($"   {relation}");
        o.WriteLine($"   status: {(tau.Verified ? "proved" : "a guess confirmed by the further terms, not a proof")}");
        return agree && check ? 0 : 1;
    }
}
