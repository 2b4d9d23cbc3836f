using Integrable.Series;

namespace Integrable.Guessing;

/// <summary>A linear recurrence with constant coefficients a_n = c₁a_{n−1} + … + c_L a_{n−L} (valid for n ≥ L)
/// over a field, together with its initial terms a_0 … a_{L−1}.</summary>
/// <typeparam name="T">The coefficient type (<see cref="Numbers.Rational"/> or residues).</typeparam>
/// <remarks>Its generating function is P/Q with Q = 1 − c₁x − … − c_L x^L and deg P &lt; L
/// (<see cref="GeneratingFunction"/>).</remarks>
/// <example><code>
/// var fib = BerlekampMassey.Find([0, 1, 1, 2, 3, 5, 8, 13, 21, 34, 55, 89]).Value;   // a_n = a_{n−1} + a_{n−2}
/// var next = fib.Terms(20);
/// </code></example>
public sealed class LinearRecurrence<T>
{
    private readonly T[] _c;
    private readonly T[] _initial;

    internal LinearRecurrence(PowerSeriesRing<T> ring, T[] coefficients, T[] initial)
    {
        Ring = ring;
        _c = coefficients;
        _initial = initial;
    }

    /// <summary>The series ring whose coefficient field the recurrence lives in.</summary>
    public PowerSeriesRing<T> Ring { get; }

    /// <summary>The order L.</summary>
    public int Order => _c.Length;

    /// <summary>The coefficients c₁ … c_L.</summary>
    public ReadOnlySpan<T> Coefficients => _c;

    /// <summary>The initial terms a_0 … a_{L−1}.</summary>
    public ReadOnlySpan<T> InitialTerms => _initial;

    /// <summary>The first <paramref name="count"/> terms of the sequence.</summary>
    /// <param name="count">How many terms, non-negative.</param>
    /// <returns>a_0 … a_{count−1}.</returns>
    public T[] Terms(int count)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(count);
        var d = Ring.Domain;
        var a = new T[count];
        for (int n = 0; n < count; n++)
        {
            if (n < _initial.Length) { a[n] = _initial[n]; continue; }
            T s = d.Zero;
            for (int i = 1; i <= _c.Length; i++) s = d.Add(s, d.Multiply(_c[i - 1], a[n - i]));
            a[n] = s;
        }
        return a;
    }

    /// <summary>The generating function Σ a_n x^n = P/Q.</summary>
    public RationalGeneratingFunction<T> GeneratingFunction
    {
        get
        {
            var d = Ring.Domain;
            var q = new T[_c.Length + 1];
            q[0] = d.One;
            for (int i = 0; i < _c.Length; i++) q[i + 1] = d.Negate(_c[i]);
            var qs = Ring.Polynomial(q);
            var p = (qs * Ring.Series(_initial, _initial.Length)).Coefficients;
            return new RationalGeneratingFunction<T>(Ring.Polynomial(p[..Math.Min(p.Length, _c.Length)]), qs);
        }
    }

    /// <summary>Text such as <c>a(n) = a(n-1) + a(n-2)</c>.</summary>
    /// <returns>The recurrence as text.</returns>
    public override string ToString()
    {
        if (_c.Length == 0) return "a(n) = 0";
        var terms = new List<string>();
        var d = Ring.Domain;
        for (int i = 0; i < _c.Length; i++)
        {
            if (d.IsZero(_c[i])) continue;
            string c = d.Format(_c[i]);
            terms.Add(c == "1" ? $"a(n-{i + 1})" : $"{(d.NeedsParentheses(_c[i]) || c.StartsWith('-') ? "(" + c + ")" : c)}*a(n-{i + 1})");
        }
        return "a(n) = " + (terms.Count == 0 ? "0" : string.Join(" + ", terms));
    }
}
