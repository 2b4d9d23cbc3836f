using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Recursions;

namespace Integrable.Solutions;

/// <summary>Exponential-polynomial solutions τ_n = Σ c_i n^{d_i} λ^{e_i n} of an equation for τ (typically bilinear).</summary>
/// <remarks>τ_{n+s} = Σ c_i (n + s)^{d_i} λ^{e_i s} (λ^n)^{e_i} is substituted with λ^n and n as independent symbols, exactly
/// over Q(c, λ, parameters); the coefficient of each monomial (λ^n)^a n^b of the numerator of left − right must vanish.
/// Those coefficients are the returned relations; the sum of relation × monomial is re-checked to equal the numerator.</remarks>
/// <example><code>
/// var y = Recurrence.Parse("y_{n+1} y_{n-1} = y_n^2 - 4");
/// var rel = ExponentialTau.Relations(y, [new ExponentialTerm(1), new ExponentialTerm(-1)]);
/// // one relation: c0 c1 (lambda^2 − 1)^2 + 4 lambda^2 = 0, scaled to leading coefficient 1
/// </code></example>
public static class ExponentialTau
{
    /// <summary>The relations for the ansatz with the given terms (coefficients named c0, c1, …; λ named
    /// <paramref name="lambda"/>).</summary>
    /// <param name="equation">The equation for τ (its unknown is τ).</param>
    /// <param name="terms">The terms of the ansatz, at least one.</param>
    /// <param name="lambda">The name of λ (must not be a parameter of the equation).</param>
    /// <returns>The relations, verified.</returns>
    /// <exception cref="ArgumentException">No terms, a negative degree, or a name clash.</exception>
    public static ExponentialTauRelations Relations(Recurrence equation, IReadOnlyList<ExponentialTerm> terms, string lambda = "lambda")
    {
        ArgumentNullException.ThrowIfNull(equation);
        ArgumentNullException.ThrowIfNull(terms);
        if (terms.Count == 0) throw new ArgumentException("give at least one term", nameof(terms));
        if (terms.Any(t => t.Degree < 0)) throw new ArgumentException("degrees in n must be non-negative", nameof(terms));
        var coefficientNames = Enumerable.Range(0, terms.Count).Select(i => $"c{i}").ToList();
        string power = "LAMBDAn", nName = "NINDEX";
        var names = new List<string>(coefficientNames) { lambda, power, nName };
        foreach (var p in equation.Parameters)
        {
            if (names.Contains(p)) throw new ArgumentException($"the parameter '{p}' clashes with a name of the ansatz", nameof(equation));
            names.Add(p);
        }
        var field = new RationalFunctionField(names.ToArray());
        var residual = EquationResidual.Compile(equation);
        int k = equation.Order, lo = equation.LowestShift;
        var inputs = new RationalFunction[residual.Program.InputCount];
        var l = field.Variable(lambda);
        var x = field.Variable(power);
        var n = field.Variable(nName);
        for (int i = 0; i <= k; i++)
        {
            int s = lo + i;
            var v = field.Zero;
            for (int t = 0; t < terms.Count; t++)
            {
                var term = field.Variable(coefficientNames[t]) * Pow(field, l, terms[t].Exponent * s) * Pow(field, x, terms[t].Exponent);
                for (int d = 0; d < terms[t].Degree; d++) term *= n + field.Constant(s);
                v += term;
            }
            inputs[i] = v;
        }
        for (int p = 0; p < equation.Parameters.Length; p++) inputs[k + 1 + p] = field.Variable(equation.Parameters[p]);
        if (!equation.IsAutonomous) inputs[^1] = n;
        var value = residual.Program.Evaluate(field, inputs);
        var num = value.Numerator;
        var ring = num.Ring;
        int px = ring.IndexOf(power), pn = ring.IndexOf(nName);
        var groups = new SortedDictionary<(int, int), LaurentPolynomialBuilder>();
        foreach (var term in num.Terms)
        {
            var key = (term.Exponents[px], term.Exponents[pn]);
            if (!groups.TryGetValue(key, out var b)) groups[key] = b = ring.CreateBuilder();
            var e = term.Exponents.ToArray();
            e[px] = 0;
            e[pn] = 0;
            b.Add(term.Coefficient, e);
        }
        var relations = new List<LaurentPolynomial>();
        var check = ring.Zero;
        foreach (var (key, b) in groups)
        {
            var r = b.ToPolynomial();
            var mono = new int[ring.VariableCount];
            mono[px] = key.Item1;
            mono[pn] = key.Item2;
            check += r * ring.Monomial(Rational.One, mono);
            var primitive = Normalise(r);
            if (!primitive.IsZero && !relations.Contains(primitive)) relations.Add(primitive);
        }
        if (check != num) throw new InvalidOperationException("internal error: the relations do not recombine to the substituted equation");
        string tau = $"{equation.Unknown}_n = " + string.Join(" + ", terms.Select((t, i) =>
            $"{coefficientNames[i]}{(t.Degree == 0 ? "" : t.Degree == 1 ? " n" : $" n^{t.Degree}")}{(t.Exponent == 0 ? "" : t.Exponent == 1 ? $" {lambda}^n" : $" {lambda}^({t.Exponent} n)")}"));
        return new ExponentialTauRelations(terms, coefficientNames, lambda, relations, tau,
            "exact: left − right after substitution, with λ^n and n as independent symbols, equals Σ relation × (λ^n)^a n^b over Q(c, λ, parameters)");
    }

    private static RationalFunction Pow(RationalFunctionField field, RationalFunction v, int e)
    {
        var r = field.One;
        for (int i = 0; i < Math.Abs(e); i++) r *= v;
        return e >= 0 ? r : field.One / r;
    }

    /// <summary>Scales a relation so that its leading coefficient is 1 (the relation's zero set is unchanged).</summary>
    internal static LaurentPolynomial Normalise(LaurentPolynomial p) =>
        p.IsZero ? p : p * p.Ring.Constant(Rational.One / p.LeadingCoefficient);
}
