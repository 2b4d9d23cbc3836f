using System.Text;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;

namespace Integrable.Recursions;

/// <summary>How an inverse map was found.</summary>
public enum InversionMethod
{
    /// <summary>Every unknown was solved from an equation of degree 1 in it (triangular linear elimination,
    /// the usual case for recurrence and QRT-type maps).</summary>
    Linear,

    /// <summary>At least one unknown was eliminated with a resultant (Sylvester determinant over the
    /// polynomial ring), followed by gcds to isolate the factor of degree 1.</summary>
    Resultant,
}

/// <summary>Why a map could not be inverted.</summary>
public enum InversionFailure
{
    /// <summary>The Jacobian determinant vanishes identically: the map is not dominant, so not birational.</summary>
    NotDominant,

    /// <summary>After elimination an unknown still satisfies an equation of degree above 1 over the field of the
    /// image coordinates (after removing content, base-point factors and repeated factors): the map is
    /// generically many-to-one, or the degree-1 factor could not be isolated without factorisation.</summary>
    HigherDegree,

    /// <summary>The candidate inverse failed the exact check φ∘ψ = ψ∘φ = id.</summary>
    VerificationFailed,
}

/// <summary>Thrown when <see cref="RationalMap.Invert"/> cannot produce a verified inverse.</summary>
public sealed class MapInversionException : ArithmeticException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="failure">The kind of failure.</param>
    /// <param name="reason">What happened, naming the variable or equation concerned.</param>
    public MapInversionException(InversionFailure failure, string reason)
        : base($"cannot invert the map: {reason}")
    {
        Failure = failure;
        Reason = reason;
    }

    /// <summary>The kind of failure.</summary>
    public InversionFailure Failure { get; }

    /// <summary>What happened.</summary>
    public string Reason { get; }
}

/// <summary>A verified inverse ψ of a birational map φ.</summary>
/// <param name="Inverse">ψ, on the same state variables.</param>
/// <param name="Method">How ψ was found.</param>
/// <param name="Verification">How ψ was checked (always both compositions, exactly).</param>
public sealed record MapInverse(RationalMap Inverse, InversionMethod Method, string Verification);

public sealed partial class RationalMap
{
    private MapInverse? _inverse;

    /// <summary>The inverse map ψ with φ∘ψ = ψ∘φ = id, found by elimination and verified exactly.</summary>
    /// <param name="cancellation">Cancels between elimination steps.</param>
    /// <returns>The inverse, the method and the verification.</returns>
    /// <remarks>
    /// <para>The equations φ_i(x) = u_i are cleared of denominators. Repeatedly, an equation of degree 1 in
    /// a remaining unknown is solved for it and the solution substituted into the rest. When no equation is
    /// linear, two equations sharing an unknown z are combined into their resultant in z, and the gcd of the
    /// equations left in a single unknown isolates the common root. Before an equation in one unknown is
    /// used, factors free of the image coordinates u (base points), factors free of the unknown (content)
    /// and repeated factors are divided out. No Gröbner bases and no factorisation are used; when they
    /// would be needed a <see cref="MapInversionException"/> says so.</para>
    /// <para>The result is returned only after checking both compositions exactly.</para>
    /// </remarks>
    /// <exception cref="MapInversionException">The map is not dominant, the elimination ends in an equation
    /// of degree above 1, or the candidate fails verification.</exception>
    /// <exception cref="OperationCanceledException">Cancelled.</exception>
    public MapInverse Invert(CancellationToken cancellation = default)
    {
        if (_inverse is not null) return _inverse;
        if (JacobianDeterminant().IsZero)
            throw new MapInversionException(InversionFailure.NotDominant, "the Jacobian determinant vanishes identically, so the map is not dominant");
        var (candidate, method) = new Elimination(this, cancellation).Run();
        var forward = Compose(candidate);
        var backward = candidate.Compose(this);
        if (!forward.IsIdentity || !backward.IsIdentity)
            throw new MapInversionException(InversionFailure.VerificationFailed,
                $"the candidate {candidate} gives φ∘ψ = {forward} and ψ∘φ = {backward}");
        var verification = "φ∘ψ = id and ψ∘φ = id checked exactly by composing rational functions";
        candidate._inverse = new MapInverse(this, method, verification);
        return _inverse = new MapInverse(candidate, method, verification);
    }

    /// <summary>Solves φ(x) = u for x by linear elimination, resultants and gcds (see <see cref="Invert"/>).</summary>
    private sealed class Elimination
    {
        private const int MaxResultantTerms = 200_000;
        private readonly RationalMap _map;
        private readonly CancellationToken _cancel;
        private readonly RationalFunctionField _work;
        private readonly LaurentPolynomialRing _ring;
        private readonly string[] _targets;
        private readonly int[] _targetIndex;

        public Elimination(RationalMap map, CancellationToken cancel)
        {
            _map = map;
            _cancel = cancel;
            var taken = new HashSet<string>(map.Field.Variables, StringComparer.Ordinal);
            _targets = new string[map.Dimension];
            for (int i = 0; i < map.Dimension; i++)
            {
                string name = "u" + (i + 1);
                while (taken.Contains(name)) name += "'";
                taken.Add(name);
                _targets[i] = name;
            }
            _work = new RationalFunctionField([.. map.Field.Variables, .. _targets]);
            _ring = _work.PolynomialRing;
            _targetIndex = [.. _targets.Select(_ring.IndexOf)];
        }

        public (RationalMap Inverse, InversionMethod Method) Run()
        {
            var method = InversionMethod.Linear;
            var eqs = new List<LaurentPolynomial>();
            for (int i = 0; i < _map.Dimension; i++)
                eqs.Add((Embed(_work, _map.Components[i]) - _work.Variable(_targets[i])).Numerator);
            var unknowns = _map.StateVariables.Select(_ring.IndexOf).ToList();
            var solved = new List<(int Variable, RationalFunction Value)>();
            var triedPairs = new HashSet<(LaurentPolynomial, LaurentPolynomial, int)>();
            for (int round = 0; unknowns.Count > 0; round++)
            {
                _cancel.ThrowIfCancellationRequested();
                if (round > 20 * _map.Dimension + 20)
                    throw new MapInversionException(InversionFailure.HigherDegree, "the elimination did not finish");
                eqs.RemoveAll(e => e.IsZero);
                if (eqs.Count == 0)
                    throw new MapInversionException(InversionFailure.HigherDegree,
                        $"no equation is left for {string.Join(", ", unknowns.Select(Name))}");

                // 1. An equation of degree 1 in some unknown: solve it.
                if (TrySolveLinear(eqs, unknowns, solved)) continue;

                // 2. Equations in a single unknown: take their gcd and clean it.
                bool changed = false;
                foreach (int z in unknowns)
                {
                    var only = eqs.Where(e => Involves(e, unknowns).SequenceEqual([z])).ToList();
                    if (only.Count == 0) continue;
                    var g = only.Count == 1 ? only[0] : PolynomialGcd.Gcd(only);
                    g = Clean(g, z);
                    if (Degree(g, z) == 1)
                    {
                        foreach (var e in only) eqs.Remove(e);
                        eqs.Insert(0, g);
                        changed = true;
                        break;
                    }
                    if (only.Count == 1 && unknowns.Count == 1)
                        throw new MapInversionException(InversionFailure.HigherDegree,
                            $"{Name(z)} satisfies an equation of degree {Degree(g, z)} over the image coordinates: {g}");
                }
                if (changed) continue;

                // 3. A resultant of two equations sharing an unknown.
                LaurentPolynomial? bestA = null, bestB = null;
                int bestZ = -1;
                long bestCost = long.MaxValue;
                for (int a = 0; a < eqs.Count; a++)
                    for (int b = a + 1; b < eqs.Count; b++)
                        foreach (int z in unknowns)
                        {
                            int da = Degree(eqs[a], z), db = Degree(eqs[b], z);
                            if (da == 0 || db == 0 || triedPairs.Contains((eqs[a], eqs[b], z))) continue;
                            long cost = (long)(da + db) * (eqs[a].TermCount + eqs[b].TermCount);
                            if (cost < bestCost) { bestCost = cost; bestA = eqs[a]; bestB = eqs[b]; bestZ = z; }
                        }
                if (bestA is null || bestB is null)
                    throw new MapInversionException(InversionFailure.HigherDegree,
                        $"no equation is linear in {string.Join(", ", unknowns.Select(Name))} and no pair of equations shares an unknown to eliminate");
                triedPairs.Add((bestA, bestB, bestZ));
                var r = Resultant(bestA, bestB, bestZ);
                if (r.IsZero)
                    throw new MapInversionException(InversionFailure.HigherDegree,
                        $"the equations {bestA} = 0 and {bestB} = 0 have a common factor in {Name(bestZ)}");
                eqs.Add(r);
                method = InversionMethod.Resultant;
            }

            var back = new Dictionary<string, RationalFunction>(StringComparer.Ordinal);
            var stateField = new RationalFunctionField([.. _map.Field.Variables]);
            for (int i = 0; i < _targets.Length; i++) back[_targets[i]] = stateField.Variable(_map.StateVariables[i]);
            var components = new RationalFunction[_map.Dimension];
            foreach (var (v, value) in solved)
                components[_map.StateVariables.IndexOf(_ring.Variables[v])] = Embed(stateField, value.Substitute(back));
            return (Create(_map.StateVariables, components), method);
        }

        private bool TrySolveLinear(List<LaurentPolynomial> eqs, List<int> unknowns, List<(int Variable, RationalFunction Value)> solved)
        {
            LaurentPolynomial? best = null;
            int bestZ = -1;
            foreach (var e in eqs)
                foreach (int z in unknowns)
                    if (e.MinExponent(z) >= 0 && Degree(e, z) == 1 && (best is null || e.TermCount < best.TermCount))
                    {
                        best = e;
                        bestZ = z;
                    }
            if (best is null) return false;
            var c = CoefficientsIn(best, bestZ);
            var value = _work.Create(-c[0], c[1]);
            var sub = new Dictionary<string, RationalFunction>(StringComparer.Ordinal) { [_ring.Variables[bestZ]] = value };
            eqs.Remove(best);
            for (int i = 0; i < eqs.Count; i++)
                eqs[i] = Embed(_work, _work.FromPolynomial(eqs[i]).Substitute(sub)).Numerator;
            for (int i = 0; i < solved.Count; i++)
                solved[i] = (solved[i].Variable, Embed(_work, solved[i].Value.Substitute(sub)));
            solved.Add((bestZ, value));
            unknowns.Remove(bestZ);
            return true;
        }

        private string Name(int v) => _ring.Variables[v];

        private static int Degree(LaurentPolynomial p, int z) => p.IsZero ? 0 : p.MaxExponent(z);

        private static List<int> Involves(LaurentPolynomial p, List<int> unknowns) =>
            p.IsZero ? [] : [.. unknowns.Where(z => p.MaxExponent(z) != 0 || p.MinExponent(z) != 0)];

        /// <summary>Divides out the power of z, factors free of the image coordinates, factors free of z and
        /// repeated factors.</summary>
        private LaurentPolynomial Clean(LaurentPolynomial p, int z)
        {
            if (p.IsZero) return p;
            int n = _ring.VariableCount;
            var shift = new int[n];
            for (int v = 0; v < n; v++) shift[v] = -p.MinExponent(v);
            p *= _ring.Monomial(Rational.One, shift);
            // Group the terms by their exponents in the image coordinates.
            var groups = new Dictionary<string, LaurentPolynomialBuilder>(StringComparer.Ordinal);
            var exps = new int[n];
            foreach (var t in p.Terms)
            {
                var kb = new StringBuilder();
                foreach (int i in _targetIndex) kb.Append(t.Exponents[i]).Append(',');
                var key = kb.ToString();
                if (!groups.TryGetValue(key, out var b)) groups[key] = b = _ring.CreateBuilder();
                t.Exponents.CopyTo(exps);
                foreach (int i in _targetIndex) exps[i] = 0;
                b.Add(t.Coefficient, exps);
            }
            if (groups.Count > 1)
            {
                var g = PolynomialGcd.Gcd(groups.Values.Select(b => b.ToPolynomial()));
                if (!g.IsConstant && p.TryDivideExact(g, out var q)) p = q;
            }
            p = p.PrimitivePartIn(_ring.Variables[z]);
            if (Degree(p, z) > 1)
            {
                var g = p.Gcd(p.Derivative(z));
                if (Degree(g, z) > 0 && p.TryDivideExact(g, out var q)) p = q;
            }
            for (int v = 0; v < n; v++) shift[v] = -p.MinExponent(v);
            return p * _ring.Monomial(Rational.One, shift);
        }

        /// <summary>Coefficients of p as a polynomial in variable z (p must have no negative power of z).</summary>
        private LaurentPolynomial[] CoefficientsIn(LaurentPolynomial p, int z)
        {
            int d = Degree(p, z);
            var builders = new LaurentPolynomialBuilder[d + 1];
            for (int i = 0; i <= d; i++) builders[i] = _ring.CreateBuilder();
            var exps = new int[_ring.VariableCount];
            foreach (var t in p.Terms)
            {
                t.Exponents.CopyTo(exps);
                int e = exps[z];
                exps[z] = 0;
                builders[e].Add(t.Coefficient, exps);
            }
            return [.. builders.Select(b => b.ToPolynomial())];
        }

        /// <summary>Res_z(a, b) as the determinant of the Sylvester matrix, by fraction-free (Bareiss) elimination.</summary>
        private LaurentPolynomial Resultant(LaurentPolynomial a, LaurentPolynomial b, int z)
        {
            a = Shifted(a, z);
            b = Shifted(b, z);
            var ca = CoefficientsIn(a, z);
            var cb = CoefficientsIn(b, z);
            int m = ca.Length - 1, n = cb.Length - 1, size = m + n;
            var s = new LaurentPolynomial[size, size];
            for (int r = 0; r < size; r++)
                for (int c = 0; c < size; c++) s[r, c] = _ring.Zero;
            for (int r = 0; r < n; r++)
                for (int i = 0; i <= m; i++) s[r, r + i] = ca[m - i];
            for (int r = 0; r < m; r++)
                for (int i = 0; i <= n; i++) s[n + r, r + i] = cb[n - i];
            var prev = _ring.One;
            bool negate = false;
            for (int k = 0; k < size - 1; k++)
            {
                _cancel.ThrowIfCancellationRequested();
                int p = k;
                while (p < size && s[p, k].IsZero) p++;
                if (p == size) return _ring.Zero;
                if (p != k)
                {
                    for (int c = 0; c < size; c++) (s[k, c], s[p, c]) = (s[p, c], s[k, c]);
                    negate = !negate;
                }
                for (int r = k + 1; r < size; r++)
                    for (int c = k + 1; c < size; c++)
                    {
                        var num = s[r, c] * s[k, k] - s[r, k] * s[k, c];
                        if (!num.TryDivideExact(prev, out var q))
                            throw new InvalidOperationException("fraction-free elimination: inexact division");
                        if (q.TermCount > MaxResultantTerms)
                            throw new MapInversionException(InversionFailure.HigherDegree,
                                $"the resultant in {Name(z)} grows beyond {MaxResultantTerms} terms");
                        s[r, c] = q;
                    }
                prev = s[k, k];
            }
            var det = s[size - 1, size - 1];
            return negate ? -det : det;
        }

        private LaurentPolynomial Shifted(LaurentPolynomial p, int z)
        {
            int low = p.MinExponent(z);
            if (low == 0) return p;
            var e = new int[_ring.VariableCount];
            e[z] = -low;
            return p * _ring.Monomial(Rational.One, e);
        }
    }
}
