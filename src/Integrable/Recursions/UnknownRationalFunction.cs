namespace Integrable.Recursions;

/// <summary>A rational function N(u)/D(u) in one distinguished unknown u whose coefficients are steps
/// of a <see cref="ProgramRing"/> (expressions in everything else). Used to solve an equation for its
/// highest (or lowest) shifted term: the equation becomes N(u) = 0 and is solvable when N has degree 1.</summary>
internal readonly record struct UnknownRationalFunction(int[] Numerator, int[] Denominator);

/// <summary>The ring of <see cref="UnknownRationalFunction"/> values over a <see cref="ProgramRing"/>.
/// Leading coefficients that vanish identically are trimmed (tested at random points).</summary>
internal sealed class UnknownRationalFunctionRing(ProgramRing steps) : Algebra.IRing<UnknownRationalFunction>
{
    public ProgramRing Steps { get; } = steps;

    public UnknownRationalFunction Constant(int step) => new([step], [Steps.One]);

    public UnknownRationalFunction Unknown => new([Steps.Zero, Steps.One], [Steps.One]);

    public UnknownRationalFunction Zero => Constant(Steps.Zero);
    public UnknownRationalFunction One => Constant(Steps.One);
    public UnknownRationalFunction FromInteger(long value) => Constant(Steps.FromInteger(value));
    public UnknownRationalFunction FromRational(Numbers.Rational value) => Constant(Steps.FromRational(value));

    public UnknownRationalFunction Add(UnknownRationalFunction a, UnknownRationalFunction b)
    {
        if (IsOne(a.Denominator) && IsOne(b.Denominator)) return new(Trim(PolyAdd(a.Numerator, b.Numerator)), a.Denominator);
        return new(Trim(PolyAdd(PolyMul(a.Numerator, b.Denominator), PolyMul(b.Numerator, a.Denominator))),
                   Trim(PolyMul(a.Denominator, b.Denominator)));
    }

    public UnknownRationalFunction Subtract(UnknownRationalFunction a, UnknownRationalFunction b) => Add(a, Negate(b));

    public UnknownRationalFunction Multiply(UnknownRationalFunction a, UnknownRationalFunction b) =>
        new(Trim(PolyMul(a.Numerator, b.Numerator)), Trim(PolyMul(a.Denominator, b.Denominator)));

    public UnknownRationalFunction Negate(UnknownRationalFunction a) =>
        new(a.Numerator.Select(Steps.Negate).ToArray(), a.Denominator);

    public bool IsZero(UnknownRationalFunction a) => a.Numerator.Length == 1 && Steps.IsZero(a.Numerator[0]);

    public bool AreEqual(UnknownRationalFunction a, UnknownRationalFunction b) => IsZero(Subtract(a, b));

    public bool TryDivide(UnknownRationalFunction a, UnknownRationalFunction b, out UnknownRationalFunction quotient)
    {
        if (IsZero(b)) { quotient = default; return false; }
        // Constant divisor: divide the coefficients and keep the denominator polynomial small.
        if (b.Numerator.Length == 1 && IsOne(b.Denominator))
        {
            int c = b.Numerator[0];
            var num = new int[a.Numerator.Length];
            for (int i = 0; i < num.Length; i++) Steps.TryDivide(a.Numerator[i], c, out num[i]);
            quotient = new(num, a.Denominator);
            return true;
        }
        quotient = new(Trim(PolyMul(a.Numerator, b.Denominator)), Trim(PolyMul(a.Denominator, b.Numerator)));
        return true;
    }

    private bool IsOne(int[] p) => p.Length == 1 && p[0] == Steps.One;

    private int[] PolyAdd(int[] a, int[] b)
    {
        var r = new int[Math.Max(a.Length, b.Length)];
        for (int i = 0; i < r.Length; i++)
            r[i] = i < a.Length && i < b.Length ? Steps.Add(a[i], b[i]) : i < a.Length ? a[i] : b[i];
        return r;
    }

    private int[] PolyMul(int[] a, int[] b)
    {
        if (a.Length == 1 && a[0] == Steps.One) return b;
        if (b.Length == 1 && b[0] == Steps.One) return a;
        var r = new int[a.Length + b.Length - 1];
        for (int i = 0; i < r.Length; i++) r[i] = Steps.Zero;
        for (int i = 0; i < a.Length; i++)
            for (int j = 0; j < b.Length; j++)
                r[i + j] = Steps.Add(r[i + j], Steps.Multiply(a[i], b[j]));
        return r;
    }

    /// <summary>Drops leading coefficients that vanish identically.</summary>
    public int[] Trim(int[] p)
    {
        int n = p.Length;
        while (n > 1 && Steps.IsZero(p[n - 1])) n--;
        return n == p.Length ? p : p[..n];
    }

    public override string ToString() => "rational functions in the unknown";
}
