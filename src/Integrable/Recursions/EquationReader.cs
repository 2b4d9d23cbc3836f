using Integrable.Algebra;
using Integrable.Numbers;
using Integrable.Text;

namespace Integrable.Recursions;

/// <summary>Reads the shape of recursion equations: which symbol is the index (n), which subscripted
/// symbols are unknowns and with which shifts, which plain symbols are parameters, and whether the
/// index appears explicitly. Also solves an equation for one shifted term.</summary>
internal static class EquationReader
{
    /// <summary>A term u_{n+shift} of an unknown u.</summary>
    internal readonly record struct ShiftedTerm(string Unknown, int Shift);

    internal sealed class Shape
    {
        public required string Index { get; init; }
        public required List<string> Unknowns { get; init; }
        public required Dictionary<string, ShiftedTerm> Terms { get; init; }   // symbol name -> term
        public required Dictionary<string, SymbolExpression> FirstOccurrence { get; init; }
        public required List<string> Parameters { get; init; }
        public required bool UsesIndex { get; init; }
    }

    public static Shape Analyse(IReadOnlyList<Equation> equations, string? index = null)
    {
        var symbols = new List<SymbolExpression>();
        var seen = new HashSet<string>();
        foreach (var eq in equations)
            foreach (var side in new[] { eq.Left, eq.Right })
                foreach (var s in ExpressionEvaluator.Symbols(side))
                    if (seen.Add(s.Name)) symbols.Add(s);

        index ??= DetectIndex(symbols, equations);
        var unknowns = new List<string>();
        var terms = new Dictionary<string, ShiftedTerm>();
        var first = new Dictionary<string, SymbolExpression>();
        var parameters = new List<string>();
        bool usesIndex = false;
        foreach (var s in symbols)
        {
            first[s.Name] = s;
            if (s.Subscripts.Count == 0)
            {
                if (s.Name == index) usesIndex = true;
                else parameters.Add(s.Name);
                continue;
            }
            if (!s.Subscripts.Any(sub => Mentions(sub, index)))
            {
                parameters.Add(s.Name); // a subscripted constant such as a_1
                continue;
            }
            if (s.Subscripts.Count != 1)
                throw new EquationException(
                    $"'{s.Name}' has {s.Subscripts.Count} indices; a scalar recursion has one index {index} (lattice equations such as T-systems have their own type)",
                    s.Span);
            int shift = ReadShift(s.Subscripts[0], index, $"the subscript of '{s.Name}'");
            if (!unknowns.Contains(s.BaseName)) unknowns.Add(s.BaseName);
            var term = new ShiftedTerm(s.BaseName, shift);
            foreach (var (other, t) in terms)
                if (t == term)
                    throw new EquationException($"'{s.Name}' and '{other}' are the same term written two ways; write it one way", s.Span);
            terms[s.Name] = term;
        }
        if (unknowns.Count == 0)
            throw new EquationException($"no term with the index {index} in a subscript (write e.g. x_n, x_{{{index}+1}})", equations[0].Left.Span.Union(equations[^1].Right.Span));
        // A symbol such as "x" without subscript next to x_n is ambiguous: reject it.
        foreach (var p in parameters)
            if (unknowns.Contains(p))
                throw new EquationException($"'{p}' is used both as an unknown with an index and as a plain symbol", first[p].Span);
        return new Shape { Index = index, Unknowns = unknowns, Terms = terms, FirstOccurrence = first, Parameters = parameters, UsesIndex = usesIndex };
    }

    private static string DetectIndex(List<SymbolExpression> symbols, IReadOnlyList<Equation> equations)
    {
        var inner = new List<string>();
        foreach (var s in symbols)
            foreach (var sub in s.Subscripts)
                foreach (var t in ExpressionEvaluator.Symbols(sub))
                    if (!inner.Contains(t.Name)) inner.Add(t.Name);
        if (inner.Contains("n")) return "n";
        if (inner.Count == 1) return inner[0];
        var span = equations[0].Left.Span.Union(equations[^1].Right.Span);
        if (inner.Count == 0) throw new EquationException("no index variable: subscripts must involve an index such as n (x_n, x_{n+1})", span);
        throw new EquationException($"cannot tell the index variable among {string.Join(", ", inner)}; name it n or pass the index explicitly", span);
    }

    private static bool Mentions(Expression e, string index) =>
        ExpressionEvaluator.Symbols(e).Any(s => s.Name == index);

    /// <summary>Reads a subscript of the form index ± integer and returns the integer shift;
    /// <paramref name="what"/> names the subscript in the error ("the subscript of 'x_{2n}'").</summary>
    internal static int ReadShift(Expression subscript, string index, string what, int maxShift = 1_000_000)
    {
        Rational At(long n)
        {
            try
            {
                return ExpressionEvaluator.Evaluate(subscript, RationalField.Instance,
                    s => s.Name == index && s.Subscripts.Count == 0 ? new Rational(n) : throw new KeyNotFoundException(s.Name));
            }
            catch (ExpressionEvaluationException e)
            {
                throw new EquationException($"{what} must be {index} plus or minus an integer ({e.Reason})", subscript.Span);
            }
        }
        var v0 = At(0);
        if (At(1) - v0 != Rational.One || !v0.IsInteger || Rational.Abs(v0) > maxShift)
            throw new EquationException($"{what} must be {index} plus or minus an integer", subscript.Span);
        return (int)(long)v0;
    }

    /// <summary>Solves <paramref name="equation"/> for the term named <paramref name="target"/>
    /// (which must enter linearly) in the program ring; every other symbol is the program step given
    /// by <paramref name="stepOf"/>.</summary>
    /// <returns>The program step of the solution.</returns>
    public static int SolveFor(Equation equation, string target, ProgramRing steps, Func<SymbolExpression, int> stepOf)
    {
        var ring = new UnknownRationalFunctionRing(steps);
        UnknownRationalFunction Resolve(SymbolExpression s) =>
            s.Name == target ? ring.Unknown : ring.Constant(stepOf(s));
        UnknownRationalFunction left, right;
        try
        {
            left = ExpressionEvaluator.Evaluate(equation.Left, ring, Resolve);
            right = ExpressionEvaluator.Evaluate(equation.Right, ring, Resolve);
        }
        catch (ExpressionEvaluationException e)
        {
            throw new EquationException(e.Reason, e.Span);
        }
        var difference = ring.Subtract(left, right);
        var n = ring.Trim(difference.Numerator);
        var span = equation.Left.Span.Union(equation.Right.Span);
        if (n.Length == 1)
            throw new EquationException(steps.IsZero(n[0])
                ? "the equation holds identically; it does not determine " + target
                : $"'{target}' cancels out of the equation, so it cannot be solved for it", span);
        if (n.Length > 2)
            throw new EquationException($"'{target}' enters the equation with degree {n.Length - 1}; a recursion is read off only when its highest shift enters linearly", span);
        // n[1] * u + n[0] = 0  =>  u = -n[0] / n[1]
        steps.TryDivide(steps.Negate(n[0]), n[1], out int solution);
        return solution;
    }

    /// <summary>Like <see cref="SolveFor"/> but returns false instead of throwing when the target
    /// does not enter linearly (used for the optional backward rule).</summary>
    public static bool TrySolveFor(Equation equation, string target, ProgramRing steps, Func<SymbolExpression, int> stepOf, out int solution)
    {
        try
        {
            solution = SolveFor(equation, target, steps, stepOf);
            return true;
        }
        catch (EquationException)
        {
            solution = -1;
            return false;
        }
    }
}
