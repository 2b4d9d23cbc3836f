using Integrable.Algebra;

namespace Integrable.Tests.Algebra;

/// <summary>Reusable ring-law suite: derive from it with a ring and a generator of (edge-biased)
/// random elements, and every law below runs for that ring. Laws: associativity and commutativity of
/// + and ·, distributivity, identities, negation, subtraction, equality/hash consistency, exact
/// division where TryDivide succeeds, and the canonical-form check after every operation.</summary>
/// <typeparam name="T">Element type.</typeparam>
/// <remarks>Seeds are fixed (<see cref="Seed"/>) and reported in failure messages; the environment
/// variable INTEGRABLE_TEST_MULTIPLIER scales the number of iterations.</remarks>
public abstract class RingLaws<T>
{
    /// <summary>The ring under test.</summary>
    protected abstract IRing<T> Ring { get; }

    /// <summary>A random element, biased towards edge cases.</summary>
    protected abstract T Generate(Random rng);

    /// <summary>Checks the element's canonical-form invariant (default: always true).</summary>
    protected virtual bool IsCanonical(T value) => true;

    /// <summary>Base iteration count per law (multiplied by INTEGRABLE_TEST_MULTIPLIER).</summary>
    protected virtual int Iterations => 150;

    /// <summary>Seed of the random generator.</summary>
    protected virtual int Seed => 20240611;

    private int Count => Iterations * Multiplier;

    private static int Multiplier =>
        int.TryParse(Environment.GetEnvironmentVariable("INTEGRABLE_TEST_MULTIPLIER"), out int m) && m > 0 ? m : 1;

    private void ForAll(int arity, Action<T[], string> law, int seedOffset)
    {
        var rng = new Random(Seed + seedOffset);
        var args = new T[arity];
        for (int i = 0; i < Count; i++)
        {
            for (int k = 0; k < arity; k++) args[k] = Generate(rng);
            string where = $"seed {Seed + seedOffset}, iteration {i}, inputs: " + string.Join(" | ", args.Select(a => a?.ToString()));
            law(args, where);
        }
    }

    private void Same(T expected, T actual, string law, string where)
    {
        Assert.True(IsCanonical(actual), $"{law}: result not canonical ({where})");
        Assert.True(Ring.AreEqual(expected, actual), $"{law} fails: {expected} vs {actual} ({where})");
        Assert.True(EqualityComparer<T>.Default.Equals(expected, actual), $"{law}: Equals disagrees with AreEqual ({where})");
        Assert.True(EqualityComparer<T>.Default.GetHashCode(expected!) == EqualityComparer<T>.Default.GetHashCode(actual!),
            $"{law}: equal values with different hash codes ({where})");
    }

    [Fact]
    public void Addition_IsAssociative() => ForAll(3, (x, w) =>
        Same(Ring.Add(Ring.Add(x[0], x[1]), x[2]), Ring.Add(x[0], Ring.Add(x[1], x[2])), "(a+b)+c = a+(b+c)", w), 1);

    [Fact]
    public void Addition_IsCommutative() => ForAll(2, (x, w) =>
        Same(Ring.Add(x[0], x[1]), Ring.Add(x[1], x[0]), "a+b = b+a", w), 2);

    [Fact]
    public void Multiplication_IsAssociative() => ForAll(3, (x, w) =>
        Same(Ring.Multiply(Ring.Multiply(x[0], x[1]), x[2]), Ring.Multiply(x[0], Ring.Multiply(x[1], x[2])), "(ab)c = a(bc)", w), 3);

    [Fact]
    public void Multiplication_IsCommutative() => ForAll(2, (x, w) =>
        Same(Ring.Multiply(x[0], x[1]), Ring.Multiply(x[1], x[0]), "ab = ba", w), 4);

    [Fact]
    public void Multiplication_DistributesOverAddition() => ForAll(3, (x, w) =>
        Same(Ring.Multiply(x[0], Ring.Add(x[1], x[2])), Ring.Add(Ring.Multiply(x[0], x[1]), Ring.Multiply(x[0], x[2])), "a(b+c) = ab+ac", w), 5);

    [Fact]
    public void Identities_AreNeutral() => ForAll(1, (x, w) =>
    {
        Same(x[0], Ring.Add(x[0], Ring.Zero), "a+0 = a", w);
        Same(x[0], Ring.Multiply(x[0], Ring.One), "a·1 = a", w);
        Same(Ring.Zero, Ring.Multiply(x[0], Ring.Zero), "a·0 = 0", w);
        Assert.True(Ring.IsZero(Ring.Zero), "IsZero(0)");
        Assert.False(Ring.IsZero(Ring.One), "IsZero(1)");
    }, 6);

    [Fact]
    public void Negation_IsAdditiveInverse() => ForAll(2, (x, w) =>
    {
        Same(Ring.Zero, Ring.Add(x[0], Ring.Negate(x[0])), "a+(−a) = 0", w);
        Same(x[0], Ring.Negate(Ring.Negate(x[0])), "−(−a) = a", w);
        Same(Ring.Add(x[0], Ring.Negate(x[1])), Ring.Subtract(x[0], x[1]), "a−b = a+(−b)", w);
        Same(x[0], Ring.Subtract(Ring.Add(x[0], x[1]), x[1]), "(a+b)−b = a", w);
    }, 7);

    [Fact]
    public void Integers_MapHomomorphically() => ForAll(1, (x, w) =>
    {
        Same(Ring.FromInteger(5), Ring.Add(Ring.FromInteger(2), Ring.FromInteger(3)), "2+3 = 5", w);
        Same(Ring.FromInteger(-6), Ring.Multiply(Ring.FromInteger(2), Ring.FromInteger(-3)), "2·(−3) = −6", w);
        Same(Ring.Add(x[0], x[0]), Ring.Multiply(Ring.FromInteger(2), x[0]), "a+a = 2a", w);
    }, 8);

    [Fact]
    public void Equality_IsConsistentWithHash() => ForAll(2, (x, w) =>
    {
        bool eq = Ring.AreEqual(x[0], x[1]);
        Assert.Equal(eq, EqualityComparer<T>.Default.Equals(x[0], x[1]));
        if (eq) Assert.Equal(EqualityComparer<T>.Default.GetHashCode(x[0]!), EqualityComparer<T>.Default.GetHashCode(x[1]!));
        Assert.True(Ring.AreEqual(x[0], x[0]), $"reflexivity ({w})");
        Assert.True(IsCanonical(x[0]), $"generated value not canonical ({w})");
    }, 9);

    [Fact]
    public void Division_IsExactWhereItSucceeds() => ForAll(2, (x, w) =>
    {
        var product = Ring.Multiply(x[0], x[1]);
        if (!Ring.IsZero(x[1]))
        {
            Assert.True(Ring.TryDivide(product, x[1], out var q), $"ab/b must succeed ({w})");
            Same(x[0], q, "(ab)/b = a", w);
        }
        else Assert.False(Ring.TryDivide(x[0], x[1], out _), $"division by zero must fail ({w})");
        if (Ring.TryDivide(x[0], x[1], out var q2)) Same(x[0], Ring.Multiply(q2, x[1]), "q·b = a", w);
    }, 10);
}
