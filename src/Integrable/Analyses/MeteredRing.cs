using Integrable.Algebra;
using Integrable.Numbers;

namespace Integrable.Analyses;

/// <summary>A ring with a budget: the size of every sum, product and quotient is checked against the
/// term limit, and the clock against the time limit and cancellation (before each product and division).</summary>
internal sealed class MeteredRing<T>(IRing<T> inner, BudgetClock clock, Func<T, int> size) : IRing<T>
{
    public IRing<T> Inner { get; } = inner;

    public T Zero => Inner.Zero;
    public T One => Inner.One;
    public T FromInteger(long value) => Inner.FromInteger(value);
    public T FromRational(Rational value) => Inner.FromRational(value);
    public T Add(T a, T b) => Checked(Inner.Add(a, b));
    public T Subtract(T a, T b) => Checked(Inner.Subtract(a, b));
    public T Negate(T a) => Inner.Negate(a);
    public bool IsZero(T a) => Inner.IsZero(a);
    public bool AreEqual(T a, T b) => Inner.AreEqual(a, b);

    public T Multiply(T a, T b)
    {
        clock.Check();
        return Checked(Inner.Multiply(a, b));
    }

    public bool TryDivide(T a, T b, out T quotient)
    {
        clock.Check();
        bool ok = Inner.TryDivide(a, b, out quotient);
        if (ok) clock.CheckTerms(size(quotient));
        return ok;
    }

    private T Checked(T p)
    {
        clock.CheckTerms(size(p));
        return p;
    }

    public override string ToString() => Inner.ToString() ?? "";
}
