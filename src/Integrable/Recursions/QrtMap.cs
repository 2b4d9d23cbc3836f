using System.Text;
using Integrable.Numbers;
using Integrable.RationalFunctions;
using Integrable.Text;

namespace Integrable.Recursions;

/// <summary>A map of the Quispel–Roberts–Thompson (QRT) family built from two 3×3 matrices A₀, A₁, with
/// its biquadratic invariant K(x, y) = XᵀA₀Y / XᵀA₁Y (X = (x², x, 1)ᵀ, Y = (y², y, 1)ᵀ) and its invariant
/// measure, each verified exactly before it is returned.</summary>
/// <remarks>
/// <para>Source: G. R. W. Quispel, J. A. G. Roberts, C. J. Thompson, "Integrable mappings and soliton
/// equations", Phys. Lett. A 126 (1988) 419, and Physica D 34 (1989) 183. With f = (A₀Y) × (A₁Y) (cross
/// product, entries polynomials in y), the other root in x of K(·, y) = K(x, y) is
/// x̃ = (f₁(y) − x f₂(y)) / (f₂(y) − x f₃(y)).</para>
/// <para><see cref="Symmetric(RationalFunction[,], RationalFunction[,], string, string)"/> (A₀, A₁ symmetric):
/// the map (x, y) ↦ (y, x̃) of the second-order recurrence x_{n+1} = (f₁(x_n) − x_{n−1} f₂(x_n)) /
/// (f₂(x_n) − x_{n−1} f₃(x_n)). <see cref="Asymmetric(RationalFunction[,], RationalFunction[,], string, string)"/>
/// (any A₀, A₁): the map (x, y) ↦ (x̃, ỹ) with ỹ = (g₁(x̃) − y g₂(x̃)) / (g₂(x̃) − y g₃(x̃)) and
/// g = (A₀ᵀX̃) × (A₁ᵀX̃), the composition of the two switches along the fibres of K.</para>
/// <para>The density ρ = 1/(XᵀA₁Y) is checked with <see cref="RationalMap.DensityRatio"/>: the map sends
/// ρ dx dy to ±ρ dx dy; the sign is computed exactly and returned in <see cref="DensityRatio"/>.</para>
/// <para>Matrix entries may be rational functions of parameters (any variables other than x and y).</para>
/// </remarks>
/// <example><code>
/// // K = (x + y + xy + 3)/(xy): entries are the coefficients of x^{2−i} y^{2−j}
/// var qrt = QrtMap.Symmetric("[[0,0,0],[0,1,1],[0,1,3]]", "[[0,0,0],[0,1,0],[0,0,0]]");
/// RationalMap phi = qrt.Map;            // (x, y) -> (y, (y + 3)/x)
/// RationalFunction k = qrt.Invariant;   // verified: k ∘ phi = k
/// </code></example>
public sealed class QrtMap
{
    private readonly RationalFunction[,] _a0, _a1;

    private QrtMap(RationalFunction[,] a0, RationalFunction[,] a1, bool symmetric, RationalMap map,
        RationalFunction invariant, RationalFunction density, RationalFunction densityRatio)
    {
        _a0 = a0;
        _a1 = a1;
        IsSymmetric = symmetric;
        Map = map;
        Invariant = invariant;
        Density = density;
        DensityRatio = densityRatio;
    }

    /// <summary>True for the symmetric map (x, y) ↦ (y, x̃); false for the asymmetric (x, y) ↦ (x̃, ỹ).</summary>
    public bool IsSymmetric { get; }

    /// <summary>The map.</summary>
    public RationalMap Map { get; }

    /// <summary>K = XᵀA₀Y / XᵀA₁Y, verified exactly: K ∘ φ = K.</summary>
    public RationalFunction Invariant { get; }

    /// <summary>ρ = 1/(XᵀA₁Y), the density of the invariant measure.</summary>
    public RationalFunction Density { get; }

    /// <summary>(ρ ∘ φ)·det Dφ / ρ, computed exactly: 1 or −1 (see <see cref="Verification"/>).</summary>
    public RationalFunction DensityRatio { get; }

    /// <summary>How the results were verified.</summary>
    public string Verification =>
        $"K ∘ φ = K checked exactly by substitution; (ρ ∘ φ)·det Dφ / ρ = {DensityRatio} computed exactly";

    /// <summary>The entry (A₀)_{ij}, 0-based (row i ↔ x^{2−i}, column j ↔ y^{2−j}).</summary>
    /// <param name="i">Row.</param>
    /// <param name="j">Column.</param>
    /// <returns>The entry.</returns>
    public RationalFunction A0(int i, int j) => _a0[i, j];

    /// <summary>The entry (A₁)_{ij}, 0-based.</summary>
    /// <param name="i">Row.</param>
    /// <param name="j">Column.</param>
    /// <returns>The entry.</returns>
    public RationalFunction A1(int i, int j) => _a1[i, j];

    /// <summary>The symmetric QRT map from symmetric matrices given as text, e.g.
    /// <c>[[0,1,1],[1,a+2,a+1],[1,a+1,a]]</c>; names other than <paramref name="x"/>, <paramref name="y"/> are parameters.</summary>
    /// <param name="a0">A₀ (numerator of K).</param>
    /// <param name="a1">A₁ (denominator of K).</param>
    /// <param name="x">First state variable.</param>
    /// <param name="y">Second state variable.</param>
    /// <returns>The verified QRT map.</returns>
    /// <exception cref="ExpressionParseException">Malformed matrix text.</exception>
    /// <exception cref="ArgumentException">Not 3×3, not symmetric (naming the entry), or a degenerate pencil.</exception>
    public static QrtMap Symmetric(string a0, string a1, string x = "x", string y = "y")
    {
        var (m0, m1) = ParsePair(a0, a1, x, y);
        return Symmetric(m0, m1, x, y);
    }

    /// <summary>The asymmetric QRT map from matrices given as text.</summary>
    /// <param name="a0">A₀.</param>
    /// <param name="a1">A₁.</param>
    /// <param name="x">First state variable.</param>
    /// <param name="y">Second state variable.</param>
    /// <returns>The verified QRT map.</returns>
    /// <exception cref="ExpressionParseException">Malformed matrix text.</exception>
    /// <exception cref="ArgumentException">Not 3×3 or a degenerate pencil.</exception>
    public static QrtMap Asymmetric(string a0, string a1, string x = "x", string y = "y")
    {
        var (m0, m1) = ParsePair(a0, a1, x, y);
        return Asymmetric(m0, m1, x, y);
    }

    /// <summary>The symmetric QRT map (x, y) ↦ (y, x̃) from symmetric 3×3 matrices.</summary>
    /// <param name="a0">A₀, symmetric.</param>
    /// <param name="a1">A₁, symmetric.</param>
    /// <param name="x">First state variable.</param>
    /// <param name="y">Second state variable.</param>
    /// <returns>The verified QRT map.</returns>
    /// <exception cref="ArgumentException">Not 3×3, not symmetric (naming the entry), entries using x or y,
    /// or a degenerate pencil (the map is undefined).</exception>
    public static QrtMap Symmetric(RationalFunction[,] a0, RationalFunction[,] a1, string x = "x", string y = "y")
    {
        var (field, m0, m1) = Prepare(a0, a1, x, y);
        for (int i = 0; i < 3; i++)
            for (int j = i + 1; j < 3; j++)
            {
                if (m0[i, j] != m0[j, i]) throw new ArgumentException($"A0 is not symmetric: entry ({i + 1},{j + 1}) = {m0[i, j]} but ({j + 1},{i + 1}) = {m0[j, i]}", nameof(a0));
                if (m1[i, j] != m1[j, i]) throw new ArgumentException($"A1 is not symmetric: entry ({i + 1},{j + 1}) = {m1[i, j]} but ({j + 1},{i + 1}) = {m1[j, i]}", nameof(a1));
            }
        var X = Powers(field.Variable(x));
        var Y = Powers(field.Variable(y));
        var xt = OtherRoot(field, m0, m1, Y, field.Variable(x), "x");
        var map = RationalMap.Create([x, y], [field.Variable(y), xt]);
        return Finish(a0, a1, true, map, field, m0, m1, X, Y);
    }

    /// <summary>The asymmetric QRT map (x, y) ↦ (x̃, ỹ) from any two 3×3 matrices.</summary>
    /// <param name="a0">A₀.</param>
    /// <param name="a1">A₁.</param>
    /// <param name="x">First state variable.</param>
    /// <param name="y">Second state variable.</param>
    /// <returns>The verified QRT map.</returns>
    /// <exception cref="ArgumentException">Not 3×3, entries using x or y, or a degenerate pencil.</exception>
    public static QrtMap Asymmetric(RationalFunction[,] a0, RationalFunction[,] a1, string x = "x", string y = "y")
    {
        var (field, m0, m1) = Prepare(a0, a1, x, y);
        var X = Powers(field.Variable(x));
        var Y = Powers(field.Variable(y));
        var xt = OtherRoot(field, m0, m1, Y, field.Variable(x), "x");
        var Xt = Powers(xt);
        var yt = OtherRoot(field, Transpose(m0), Transpose(m1), Xt, field.Variable(y), "y");
        var map = RationalMap.Create([x, y], [xt, yt]);
        return Finish(a0, a1, false, map, field, m0, m1, X, Y);
    }

    private static QrtMap Finish(RationalFunction[,] a0, RationalFunction[,] a1, bool symmetric, RationalMap map,
        RationalFunctionField field, RationalFunction[,] m0, RationalFunction[,] m1, RationalFunction[] X, RationalFunction[] Y)
    {
        var n = Bilinear(field, X, m0, Y);
        var d = Bilinear(field, X, m1, Y);
        if (d.IsZero) throw new ArgumentException("XᵀA1Y vanishes identically: A1 is zero", nameof(a1));
        var k = n / d;
        if (!map.IsInvariant(k))
            throw new InvalidOperationException($"internal check failed: K = {k} is not invariant under {map}");
        var density = field.One / d;
        var ratio = map.DensityRatio(density);
        if (!(ratio.IsOne || (-ratio).IsOne))
            throw new InvalidOperationException($"internal check failed: the density ratio of 1/(XᵀA1Y) is {ratio}, not ±1");
        return new QrtMap(a0, a1, symmetric, map, k, density, ratio);
    }

    /// <summary>x̃ = (f₁ − x f₂)/(f₂ − x f₃) with f = (A₀Y) × (A₁Y).</summary>
    private static RationalFunction OtherRoot(RationalFunctionField field, RationalFunction[,] m0, RationalFunction[,] m1,
        RationalFunction[] Y, RationalFunction x, string name)
    {
        var a = Apply(field, m0, Y);
        var b = Apply(field, m1, Y);
        var f1 = a[1] * b[2] - a[2] * b[1];
        var f2 = a[2] * b[0] - a[0] * b[2];
        var f3 = a[0] * b[1] - a[1] * b[0];
        var den = f2 - x * f3;
        if (den.IsZero)
            throw new ArgumentException($"degenerate pencil: the update of {name} has denominator zero (A0 and A1 give proportional or degenerate quadratics)");
        return (f1 - x * f2) / den;
    }

    private static RationalFunction[] Powers(RationalFunction v) => [v * v, v, v.Field.One];

    private static RationalFunction[] Apply(RationalFunctionField field, RationalFunction[,] m, RationalFunction[] v)
    {
        var r = new RationalFunction[3];
        for (int i = 0; i < 3; i++)
        {
            var s = field.Zero;
            for (int j = 0; j < 3; j++) s += m[i, j] * v[j];
            r[i] = s;
        }
        return r;
    }

    private static RationalFunction Bilinear(RationalFunctionField field, RationalFunction[] X, RationalFunction[,] m, RationalFunction[] Y)
    {
        var s = field.Zero;
        var my = Apply(field, m, Y);
        for (int i = 0; i < 3; i++) s += X[i] * my[i];
        return s;
    }

    private static RationalFunction[,] Transpose(RationalFunction[,] m)
    {
        var t = new RationalFunction[3, 3];
        for (int i = 0; i < 3; i++)
            for (int j = 0; j < 3; j++) t[i, j] = m[j, i];
        return t;
    }

    private static (RationalFunctionField Field, RationalFunction[,] A0, RationalFunction[,] A1) Prepare(
        RationalFunction[,] a0, RationalFunction[,] a1, string x, string y)
    {
        ArgumentNullException.ThrowIfNull(a0);
        ArgumentNullException.ThrowIfNull(a1);
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        if (x == y) throw new ArgumentException($"the two state variables must differ (both are '{x}')", nameof(y));
        foreach (var (m, name) in new[] { (a0, "a0"), (a1, "a1") })
        {
            if (m.GetLength(0) != 3 || m.GetLength(1) != 3)
                throw new ArgumentException($"{name} must be 3×3, got {m.GetLength(0)}×{m.GetLength(1)}", name);
        }
        var names = new List<string> { x, y };
        foreach (var m in new[] { a0, a1 })
            for (int i = 0; i < 3; i++)
                for (int j = 0; j < 3; j++)
                {
                    var e = m[i, j] ?? throw new ArgumentNullException(m == a0 ? nameof(a0) : nameof(a1), $"entry ({i + 1},{j + 1}) is null");
                    foreach (var v in e.Field.Variables)
                    {
                        bool used = e.Numerator.IsZero ? false : e.Numerator.MaxExponent(v) != 0 || e.Numerator.MinExponent(v) != 0
                            || e.Denominator.MaxExponent(v) != 0;
                        if (!used) continue;
                        if (v == x || v == y)
                            throw new ArgumentException($"entry ({i + 1},{j + 1}) = {e} of {(m == a0 ? "A0" : "A1")} uses the state variable {v}; entries may only use parameters",
                                m == a0 ? nameof(a0) : nameof(a1));
                        if (!names.Contains(v)) names.Add(v);
                    }
                }
        var field = new RationalFunctionField([.. names]);
        var r0 = new RationalFunction[3, 3];
        var r1 = new RationalFunction[3, 3];
        for (int i = 0; i < 3; i++)
            for (int j = 0; j < 3; j++)
            {
                r0[i, j] = RationalMap.Embed(field, a0[i, j]);
                r1[i, j] = RationalMap.Embed(field, a1[i, j]);
            }
        return (field, r0, r1);
    }

    /// <summary>A 3×3 matrix of rational numbers as rational functions in the variables x, y.</summary>
    /// <param name="entries">The entries.</param>
    /// <param name="x">First state variable.</param>
    /// <param name="y">Second state variable.</param>
    /// <returns>The same matrix with constant rational-function entries.</returns>
    public static RationalFunction[,] Constant(Rational[,] entries, string x = "x", string y = "y")
    {
        ArgumentNullException.ThrowIfNull(entries);
        var field = new RationalFunctionField(x, y);
        var m = new RationalFunction[entries.GetLength(0), entries.GetLength(1)];
        for (int i = 0; i < m.GetLength(0); i++)
            for (int j = 0; j < m.GetLength(1); j++) m[i, j] = field.Constant(entries[i, j]);
        return m;
    }

    private static (RationalFunction[,], RationalFunction[,]) ParsePair(string a0, string a1, string x, string y)
    {
        ArgumentNullException.ThrowIfNull(a0);
        ArgumentNullException.ThrowIfNull(a1);
        var e0 = ParseMatrix(a0);
        var e1 = ParseMatrix(a1);
        var names = new List<string> { x, y };
        foreach (var e in e0.Cast<Expression>().Concat(e1.Cast<Expression>()))
            foreach (var s in ExpressionEvaluator.Symbols(e))
                if (!names.Contains(s.Name)) names.Add(s.Name);
        var field = new RationalFunctionField([.. names]);
        RationalFunction[,] Eval(Expression[,] m)
        {
            var r = new RationalFunction[3, 3];
            for (int i = 0; i < 3; i++)
                for (int j = 0; j < 3; j++) r[i, j] = ExpressionEvaluator.Evaluate(m[i, j], field, s => field.Variable(s.Name));
            return r;
        }
        return (Eval(e0), Eval(e1));
    }

    /// <summary>Reads <c>[[a,b,c],[d,e,f],[g,h,i]]</c> into expressions.</summary>
    private static Expression[,] ParseMatrix(string text)
    {
        string t = text.Trim();
        int offset = text.IndexOf(t, StringComparison.Ordinal);
        if (t.Length < 2 || t[0] != '[' || t[^1] != ']')
            throw new ExpressionParseException(text, 0, Math.Max(1, text.Length), "a 3×3 matrix is written [[a,b,c],[d,e,f],[g,h,i]]");
        var rows = new List<(int Start, int Length)>();
        int depth = 0, start = -1;
        for (int i = 1; i < t.Length - 1; i++)
        {
            char c = t[i];
            if (c == '[') { if (depth == 0) start = i + 1; depth++; }
            else if (c == ']')
            {
                depth--;
                if (depth < 0) throw new ExpressionParseException(text, offset + i, 1, "unbalanced ']'");
                if (depth == 0) rows.Add((start, i - start));
            }
            else if (depth == 0 && c != ',' && !char.IsWhiteSpace(c))
                throw new ExpressionParseException(text, offset + i, 1, "expected '[' starting a row");
        }
        if (depth != 0) throw new ExpressionParseException(text, offset + t.Length - 1, 1, "unbalanced '['");
        if (rows.Count != 3) throw new ExpressionParseException(text, 0, Math.Max(1, text.Length), $"a QRT matrix has 3 rows, got {rows.Count}");
        var m = new Expression[3, 3];
        for (int r = 0; r < 3; r++)
        {
            IReadOnlyList<Expression> items;
            try
            {
                items = ExpressionParser.ParseList(t.Substring(rows[r].Start, rows[r].Length));
            }
            catch (ExpressionParseException e)
            {
                throw new ExpressionParseException(text, offset + rows[r].Start + e.Position, e.Length, e.Reason);
            }
            if (items.Count != 3)
                throw new ExpressionParseException(text, offset + rows[r].Start, Math.Max(1, rows[r].Length), $"row {r + 1} has {items.Count} entries, a QRT matrix has 3");
            for (int c = 0; c < 3; c++) m[r, c] = items[c];
        }
        return m;
    }

    /// <summary>A short description: the map and the invariant.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append(IsSymmetric ? "symmetric" : "asymmetric").Append(" QRT map ").Append(Map).Append(", invariant K = ").Append(Invariant);
        return sb.ToString();
    }

    /// <summary>LaTeX: the map and the invariant.</summary>
    /// <returns>The LaTeX text (math mode, without delimiters).</returns>
    public string ToLatex() => Map.ToLatex() + ",\\quad K = " + Invariant.ToLatex();
}
