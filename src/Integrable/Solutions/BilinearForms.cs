using Integrable.Polynomials;
using Integrable.RationalFunctions;
using Integrable.Recursions;

namespace Integrable.Solutions;

/// <summary>Search for tau substitutions that turn a recursion into a bilinear (Hirota-type) equation.</summary>
/// <remarks>For each ansatz x_n = C·Π τ_{n+a_i}/Π τ_{n+c_j} of a small family (<see cref="TauAnsatz.SmallFamily"/>),
/// the substitution is made exactly in the field of rational functions of the shifted τ's; the numerator of
/// left − right, stripped of monomial factors (which vanish nowhere on τ's that are non-zero), is tested for being of
/// degree 2 in the τ's, up to τ-free terms (bilinear with a constant, as in Q-systems); terms of degree 1 or above 2 reject the ansatz. The identity left − right = monomial × B / denominator is re-checked exactly before a form is
/// returned. Substitutions that need a first integral to fix a constant are not searched.</remarks>
public static class BilinearForms
{
    /// <summary>Tries the ansätze in order and returns the first bilinear form found, or null.</summary>
    /// <param name="recurrence">The recursion.</param>
    /// <param name="family">The ansätze (default <see cref="TauAnsatz.SmallFamily"/>).</param>
    /// <param name="cancellation">Cancels between ansätze.</param>
    /// <returns>The verified bilinear form, or null when no ansatz of the family gives one.</returns>
    public static BilinearForm? Search(Recurrence recurrence, IReadOnlyList<TauAnsatz>? family = null, CancellationToken cancellation = default)
    {
        ArgumentNullException.ThrowIfNull(recurrence);
        foreach (var ansatz in family ?? TauAnsatz.SmallFamily())
        {
            cancellation.ThrowIfCancellationRequested();
            var form = TrySubstitute(recurrence, ansatz);
            if (form is not null) return form;
        }
        return null;
    }

    /// <summary>Runs <see cref="Search"/> and wraps the outcome in a report (no tau closed form: that needs data, see
    /// <see cref="TauFitter"/>).</summary>
    /// <param name="recurrence">The recursion.</param>
    /// <param name="family">The ansätze (default <see cref="TauAnsatz.SmallFamily"/>).</param>
    /// <param name="cancellation">Cancels between ansätze.</param>
    /// <returns>The report; verified when a bilinear form was found.</returns>
    public static TauReport Report(Recurrence recurrence, IReadOnlyList<TauAnsatz>? family = null, CancellationToken cancellation = default)
    {
        var form = Search(recurrence, family, cancellation);
        if (form is null)
            return new TauReport(recurrence.Text, "none found", "none found", "not determined (give boundary or initial data)", [], false,
                "no ansatz of the family gives a bilinear equation", null,
                ["searched: " + string.Join("; ", (family ?? TauAnsatz.SmallFamily()).Select(a => a.ToText(recurrence.Unknown, recurrence.Index)))],
                Analyses.BudgetLimit.None);
        return new TauReport(recurrence.Text, form.Ansatz.ToText(recurrence.Unknown, recurrence.Index),
            form.Text + (form.IsHomogeneous ? "" : " (bilinear with inhomogeneous terms)"),
            "not determined (give boundary or initial data)", [], true, form.Verification, null, [], Analyses.BudgetLimit.None);
    }

    /// <summary>Makes one substitution and returns the bilinear form if the result is bilinear, else null.</summary>
    /// <param name="recurrence">The recursion.</param>
    /// <param name="ansatz">The substitution.</param>
    /// <returns>The verified bilinear form, or null.</returns>
    public static BilinearForm? TrySubstitute(Recurrence recurrence, TauAnsatz ansatz)
    {
        ArgumentNullException.ThrowIfNull(recurrence);
        ArgumentNullException.ThrowIfNull(ansatz);
        var residual = EquationResidual.Compile(recurrence);
        int k = recurrence.Order, lo = recurrence.LowestShift;
        var shifts = new SortedSet<int>();
        for (int s = lo; s <= lo + k; s++)
        {
            foreach (var a in ansatz.Numerator) shifts.Add(s + a);
            foreach (var c in ansatz.Denominator) shifts.Add(s + c);
        }
        var names = shifts.Select(TauNames.Variable).ToList();
        int tauCount = names.Count;
        string constant = recurrence.Parameters.Contains("C") ? "C_0" : "C";
        if (ansatz.HasConstant) names.Add(constant);
        names.AddRange(recurrence.Parameters);
        if (!recurrence.IsAutonomous) names.Add(recurrence.Index);
        var field = new RationalFunctionField(names.ToArray());
        var inputs = new RationalFunction[residual.Program.InputCount];
        for (int i = 0; i <= k; i++)
        {
            int s = lo + i;
            var v = ansatz.HasConstant ? field.Variable(constant) : field.One;
            foreach (var a in ansatz.Numerator) v *= field.Variable(TauNames.Variable(s + a));
            foreach (var c in ansatz.Denominator) v /= field.Variable(TauNames.Variable(s + c));
            inputs[i] = v;
        }
        for (int p = 0; p < recurrence.Parameters.Length; p++) inputs[k + 1 + p] = field.Variable(recurrence.Parameters[p]);
        if (!recurrence.IsAutonomous) inputs[^1] = field.Variable(recurrence.Index);
        RationalFunction value;
        try { value = residual.Program.Evaluate(field, inputs); }
        catch (Exception e) when (e is ArithmeticException or InvalidOperationException) { return null; }
        if (value.IsZero) return null;
        var num = value.Numerator;
        var ring = num.Ring;
        // strip the monomial factor in the τ's
        var min = new int[ring.VariableCount];
        for (int v = 0; v < tauCount; v++) min[v] = int.MaxValue;
        foreach (var term in num.Terms)
            for (int v = 0; v < tauCount; v++) min[v] = Math.Min(min[v], term.Exponents[v]);
        var inverse = new int[ring.VariableCount];
        var monomial = new int[ring.VariableCount];
        for (int v = 0; v < tauCount; v++) { inverse[v] = -min[v]; monomial[v] = min[v]; }
        var b = num * ring.Monomial(Numbers.Rational.One, inverse);
        int maxDeg = 0, minDeg = int.MaxValue;
        foreach (var term in b.Terms)
        {
            int d = 0;
            for (int v = 0; v < tauCount; v++) d += term.Exponents[v];
            if (d == 1) return null;   // linear terms: not of Hirota type
            maxDeg = Math.Max(maxDeg, d);
            minDeg = Math.Min(minDeg, d);
        }
        if (maxDeg != 2) return null;
        // exact re-check of the identity  left − right = monomial·B / denominator
        var rebuilt = field.Create(b * ring.Monomial(Numbers.Rational.One, monomial), value.Denominator);
        if (rebuilt != value) throw new InvalidOperationException("internal error: the bilinear identity does not check");
        string text = TauNames.Show(b, recurrence.Index) + " = 0";
        return new BilinearForm(ansatz, b, minDeg == 2, text,
            "exact: substituting " + ansatz.ToText(recurrence.Unknown, recurrence.Index) + " into left − right gives (monomial in the τ's) × B / (denominator) as rational functions over Q");
    }
}
