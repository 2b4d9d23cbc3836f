using System.Numerics;
using Integrable.Kernels;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Tests.Kernels;

/// <summary>The two heap-division variants of Monagan and Pearce ("Sparse polynomial division using a
/// heap", J. Symbolic Comput. 46, 2011): one heap entry per quotient term, or one per divisor term.
/// Differential testing (common practice): both variants, pinned with
/// <see cref="PolynomialDivide.ForceDivisorHeap"/>, must give the same answer on the same input, and that
/// answer is checked against a naive big-integer multiplication back (q·B == A).</summary>
public sealed class PolynomialDivideTests
{
    public static TheoryData<bool> Variants => new() { true, false };

    private static T With<T>(bool divisorHeap, Func<T> f)
    {
        var (oldHeap, oldDense) = (PolynomialDivide.ForceDivisorHeap, PolynomialDivide.ForceDense);
        PolynomialDivide.ForceDivisorHeap = divisorHeap;
        PolynomialDivide.ForceDense = false;
        try { return f(); }
        finally { (PolynomialDivide.ForceDivisorHeap, PolynomialDivide.ForceDense) = (oldHeap, oldDense); }
    }

    private static Dictionary<string, BigInteger> RandomTerms(Random rng, int vars, int terms, int maxExp, Func<Random, BigInteger> coefficient)
    {
        var d = new Dictionary<string, BigInteger>();
        for (int t = 0; t < terms; t++)
        {
            var e = new int[vars];
            for (int v = 0; v < vars; v++) e[v] = rng.Next(-maxExp / 4, maxExp + 1);
            string key = string.Join(",", e);
            var c = d.GetValueOrDefault(key) + coefficient(rng);
            if (c.IsZero) d.Remove(key); else d[key] = c;
        }
        return d;
    }

    private static BigInteger Small(Random rng) => rng.Next(-20, 21) is int x && x != 0 ? x : 1;

    /// <summary>Magnitudes around the 64-bit boundary: 2^62 ± small, 2^63 ± 1, 2^64 + small.</summary>
    private static BigInteger NearWord(Random rng)
    {
        int pick = rng.Next(4);
        BigInteger v = pick switch
        {
            0 => (BigInteger.One << 62) + rng.Next(-50, 50),
            1 => (BigInteger.One << 63) + rng.Next(-1, 2),
            2 => (BigInteger.One << 64) + rng.Next(1, 99),
            _ => rng.Next(1, 1000),
        };
        return rng.Next(2) == 0 ? v : -v;
    }

    /// <summary>Magnitudes of 100–250 bits (the multi-limb and big-integer paths).</summary>
    private static BigInteger Wide(Random rng)
    {
        var bytes = new byte[rng.Next(13, 32)];
        rng.NextBytes(bytes);
        bytes[^1] = (byte)(bytes[^1] & 0x7F | 0x40);
        var v = new BigInteger(bytes);
        return rng.Next(2) == 0 ? v : -v;
    }

    private static LaurentPolynomial Build(LaurentPolynomialRing ring, Dictionary<string, BigInteger> terms)
    {
        var b = ring.CreateBuilder();
        foreach (var (k, c) in terms) b.Add(new Rational(c), k.Split(',').Select(int.Parse).ToArray());
        return b.ToPolynomial();
    }

    private static Dictionary<string, BigInteger> Read(LaurentPolynomial p)
    {
        var d = new Dictionary<string, BigInteger>();
        foreach (var t in p.Terms)
        {
            Assert.Equal(BigInteger.One, t.Coefficient.Denominator);
            d[string.Join(",", t.Exponents.ToArray())] = t.Coefficient.Numerator;
        }
        return d;
    }

    /// <summary>Reference: schoolbook product of term dictionaries with big integers.</summary>
    private static Dictionary<string, BigInteger> NaiveProduct(Dictionary<string, BigInteger> a, Dictionary<string, BigInteger> b)
    {
        var r = new Dictionary<string, BigInteger>();
        foreach (var (ka, ca) in a)
        {
            var ea = ka.Split(',').Select(int.Parse).ToArray();
            foreach (var (kb, cb) in b)
            {
                var eb = kb.Split(',').Select(int.Parse).ToArray();
                string key = string.Join(",", ea.Zip(eb, (x, y) => x + y));
                var c = r.GetValueOrDefault(key) + ca * cb;
                if (c.IsZero) r.Remove(key); else r[key] = c;
            }
        }
        return r;
    }

    private static void AssertSame(Dictionary<string, BigInteger> expected, Dictionary<string, BigInteger> actual)
    {
        Assert.Equal(expected.Count, actual.Count);
        foreach (var (k, c) in expected) Assert.Equal(c, actual.GetValueOrDefault(k));
    }

    /// <summary>Number of packed words the heap division uses for a dividend with these exponents
    /// (the layout of TryDivide: per-variable range of the dividend plus one guard bit).</summary>
    private static int Words(LaurentPolynomial p, int vars)
    {
        var max = new long[vars];
        for (int v = 0; v < vars; v++)
        {
            int lo = int.MaxValue, hi = int.MinValue;
            foreach (var t in p.Terms) { lo = Math.Min(lo, t.Exponents[v]); hi = Math.Max(hi, t.Exponents[v]); }
            max[v] = (long)hi - lo;
        }
        return ExponentLayout.Create(max, guard: true).Words;
    }

    /// <summary>Random exact products A·B divided by B with both heap variants; the quotient must be A
    /// and must multiply back to A·B under the naive reference. Then A·B + (stray monomial) must be
    /// reported non-divisible (a non-monomial B cannot divide a monomial, a unit of the Laurent ring).</summary>
    private static void RoundTrip(int seed, int vars, int maxExp, int iterations, int words,
        Func<Random, BigInteger> quotientCoefficient, Func<Random, BigInteger> divisorCoefficient, bool forceBig = false)
    {
        var rng = new Random(seed);
        var ring = new LaurentPolynomialRing([.. Enumerable.Range(0, vars).Select(i => $"x{i}")]);
        for (int it = 0; it < iterations; it++)
        {
            // Alternate shapes: quotient much larger than divisor (the divisor heap's case) and the reverse.
            bool bigQuotient = it % 2 == 0;
            var a = RandomTerms(rng, vars, bigQuotient ? rng.Next(20, 120) : rng.Next(1, 8), maxExp, quotientCoefficient);
            var b = RandomTerms(rng, vars, bigQuotient ? rng.Next(2, 7) : rng.Next(10, 40), maxExp, divisorCoefficient);
            if (a.Count == 0 || b.Count < 2) continue;
            var pa = Build(ring, a);
            var pb = Build(ring, b);
            var product = Build(ring, NaiveProduct(a, b));
            Assert.Equal(words, Words(product, vars));
            var stray = new int[vars];
            for (int v = 0; v < vars; v++) stray[v] = rng.Next(-maxExp / 4, maxExp + 1);
            var off = product + ring.Monomial(new Rational(rng.Next(1, 9)), stray);
            foreach (bool divisorHeap in new[] { true, false })
            {
                PolynomialMultiply.ForceBig = forceBig;
                try
                {
                    var quotient = With(divisorHeap, () => product.TryDivideExact(pb, out var q) ? q : null);
                    Assert.True(quotient is not null, $"seed {seed} iteration {it} divisorHeap={divisorHeap}: exact product reported non-divisible");
                    AssertSame(a, Read(quotient));
                    AssertSame(Read(product), NaiveProduct(Read(quotient), b));
                    Assert.False(With(divisorHeap, () => off.TryDivideExact(pb, out _)),
                        $"seed {seed} iteration {it} divisorHeap={divisorHeap}: A·B + monomial reported divisible");
                }
                finally { PolynomialMultiply.ForceBig = false; }
            }
        }
    }

    [Fact]
    public void TryDivideExact_OneWordSmallCoefficients_BothVariantsRecoverFactor() =>
        RoundTrip(seed: 101, vars: 3, maxExp: 8, iterations: 60, words: 1, Small, Small);

    [Fact]
    public void TryDivideExact_MultiWordManyVariables_BothVariantsRecoverFactor() =>
        RoundTrip(seed: 202, vars: 16, maxExp: 40, iterations: 40, words: 2, Small, Small);

    /// <summary>Three and four words (exponents held by value, Key3/Key4) and six words (the row-buffer loops).</summary>
    public static TheoryData<int, int> ManyWordShapes => new() { { 20, 3 }, { 30, 4 }, { 48, 6 } };

    [Theory]
    [MemberData(nameof(ManyWordShapes))]
    public void TryDivideExact_ThreeOrMoreWords_BothVariantsRecoverFactor(int vars, int words) =>
        RoundTrip(seed: 252 + vars, vars: vars, maxExp: 40, iterations: 24, words: words, Small, Small);

    [Fact]
    public void TryDivideExact_MultiWordLargeDegrees_BothVariantsRecoverFactor() =>
        RoundTrip(seed: 303, vars: 4, maxExp: 400_000, iterations: 40, words: 2, Small, Small);

    [Fact]
    public void TryDivideExact_CoefficientsNearWordBoundary_BothVariantsRecoverFactor()
    {
        // Quotient near and past 2^63 with a word divisor: the 64-, 128- and 192-bit accumulators and
        // the QuotientTooLarge hand-over; then divisor past 2^63 (multi-limb path).
        RoundTrip(seed: 404, vars: 3, maxExp: 10, iterations: 30, words: 1, NearWord, Small);
        RoundTrip(seed: 405, vars: 10, maxExp: 40, iterations: 20, words: 2, NearWord, NearWord);
    }

    [Fact]
    public void TryDivideExact_WideCoefficients_MultiLimbAndBigIntegerPathsRecoverFactor()
    {
        RoundTrip(seed: 505, vars: 3, maxExp: 10, iterations: 16, words: 1, Wide, Wide);
        RoundTrip(seed: 506, vars: 10, maxExp: 40, iterations: 12, words: 2, Wide, NearWord, forceBig: true);
    }

    [Fact]
    public void TryDivideExact_RationalCoefficients_MatchesFractionReference()
    {
        // Reference: (A/3)·(B/5) divided by B/5 is A/3 (rational scaling commutes with exact division; common knowledge).
        var ring = new LaurentPolynomialRing("x", "y");
        var rng = new Random(606);
        var a = RandomTerms(rng, 2, 60, 20, Small);
        var b = RandomTerms(rng, 2, 5, 20, Small);
        var pa = Build(ring, a) * new Rational(1, 3);
        var pb = Build(ring, b) * new Rational(-2, 5);
        var product = pa * pb;
        foreach (bool divisorHeap in new[] { true, false })
        {
            Assert.True(With(divisorHeap, () => product.TryDivideExact(pb, out var q) && q == pa));
            Assert.False(With(divisorHeap, () => (product + ring.One).TryDivideExact(pb, out _)));
        }
    }

    // ---- Direct kernel calls (one packed word, univariate, guard bit) ----

    private static (ulong[] Packed, ulong Guard, ulong QMax) Pack(int[] exps, int maxExp, int qMax)
    {
        var layout = ExponentLayout.Create([maxExp], guard: true);
        var packed = new ulong[exps.Length];
        layout.Pack(exps, 1, [0], packed);
        var q = new ulong[1];
        layout.Pack([qMax], 1, [0], q);
        return (packed, layout.GuardMask[0], q[0]);
    }

    /// <summary>A univariate product q·d as descending (exponent, coefficient) arrays.</summary>
    private static (int[] E, long[] C) Product(long[] q, int[] qe, long[] d, int[] de)
    {
        var acc = new SortedDictionary<int, long>(Comparer<int>.Create((x, y) => y.CompareTo(x)));
        for (int i = 0; i < q.Length; i++)
            for (int j = 0; j < d.Length; j++)
                acc[qe[i] + de[j]] = acc.GetValueOrDefault(qe[i] + de[j]) + q[i] * d[j];
        var nz = acc.Where(kv => kv.Value != 0).ToArray();
        return (nz.Select(kv => kv.Key).ToArray(), nz.Select(kv => kv.Value).ToArray());
    }

    private static DivideStatus Divide(bool divisorHeap, int[] pe, long[] pc, int[] de, long[] dc, int maxExp, int qMax,
        long limit, double qSumLimit, out ulong[] qe, out long[] qc, out int count)
    {
        var (pp, guard, qm) = Pack(pe, maxExp, qMax);
        var (pd, _, _) = Pack(de, maxExp, qMax);
        var old = PolynomialDivide.ForceDivisorHeap;
        PolynomialDivide.ForceDivisorHeap = divisorHeap;
        try
        {
            return PolynomialDivide.DivideHeap1<Word64Ops, long, long>(pp, pc, pd, dc, guard, qm, limit, qSumLimit,
                static x => Math.Abs((double)x), out qe, out qc, out count);
        }
        finally { PolynomialDivide.ForceDivisorHeap = old; }
    }

    [Theory]
    [MemberData(nameof(Variants))]
    public void DivideHeap1_DenseUnivariate_QuotientDescendingAndExact(bool divisorHeap)
    {
        // q = Σ_{i<300} c_i x^i with c_i = (i mod 7) − 3, or 1 when that is 0; d = 2 + x − 3x^5 + x^9: the quotient has far more terms than
        // the divisor, and equal products collide (chained heap entries).
        var qe = Enumerable.Range(0, 300).Reverse().ToArray();
        var q = qe.Select(i => i % 7 == 3 ? 1L : i % 7 - 3).ToArray();
        int[] de = [9, 5, 1, 0];
        long[] dc = [1, -3, 1, 2];
        var (pe, pc) = Product(q, qe, dc, de);
        Assert.Equal(DivideStatus.Exact, Divide(divisorHeap, pe, pc, de, dc, 308, 299, long.MaxValue, 1e18, out var ge, out var gc, out int n));
        Assert.Equal(q.Length, n);
        var (expectedPacked, _, _) = Pack(qe, 308, 299);
        for (int i = 0; i < n; i++)
        {
            Assert.Equal(expectedPacked[i], ge[i]);
            Assert.Equal(q[i], gc[i]);
            if (i > 0) Assert.True(ge[i] < ge[i - 1], "quotient terms must be in descending order");
        }
    }

    [Theory]
    [MemberData(nameof(Variants))]
    public void DivideHeap1_StatusCodes_SameForBothVariants(bool divisorHeap)
    {
        // p = (5x^3 + 4x^2 − 7x + 100)·(3x^2 + x − 2), expanded by the schoolbook Product above.
        long[] q = [5, 4, -7, 100];
        int[] qe = [3, 2, 1, 0];
        long[] dc = [3, 1, -2];
        int[] de = [2, 1, 0];
        var (pe, pc) = Product(q, qe, dc, de);
        Assert.Equal(DivideStatus.Exact, Divide(divisorHeap, pe, pc, de, dc, 5, 3, long.MaxValue, 1e18, out _, out _, out _));
        // Coefficient not a multiple of the leading coefficient 3.
        var bad = (long[])pc.Clone();
        bad[0] += 1;
        Assert.Equal(DivideStatus.NotDivisible, Divide(divisorHeap, pe, bad, de, dc, 5, 3, long.MaxValue, 1e18, out _, out _, out _));
        // p without its constant term: a remainder term of degree below the divisor's (guard-bit test).
        Assert.Equal(0, pe[^1]);
        Assert.Equal(DivideStatus.NotDivisible, Divide(divisorHeap, pe[..^1], pc[..^1], de, dc, 5, 3, long.MaxValue, 1e18, out _, out _, out _));
        // Quotient outside the box [0, 2]: x^3 term rejected.
        Assert.Equal(DivideStatus.NotDivisible, Divide(divisorHeap, pe, pc, de, dc, 5, 2, long.MaxValue, 1e18, out _, out _, out _));
        // Quotient coefficient 100 above the coefficient limit 99.
        Assert.Equal(DivideStatus.QuotientTooLarge, Divide(divisorHeap, pe, pc, de, dc, 5, 3, 99, 1e18, out _, out _, out _));
        // Σ|q| = 116 above the accumulator bound 50.
        Assert.Equal(DivideStatus.TooLarge, Divide(divisorHeap, pe, pc, de, dc, 5, 3, long.MaxValue, 50, out _, out _, out _));
    }

    [Theory]
    [MemberData(nameof(Variants))]
    public void DivideHeap1_CancelledToken_StopsWithOperationCanceled(bool divisorHeap)
    {
        var qe = Enumerable.Range(0, 5000).Reverse().ToArray();
        var q = qe.Select(i => 1L + i % 3).ToArray();
        int[] de = [2, 0];
        long[] dc = [1, 1];
        var (pe, pc) = Product(q, qe, dc, de);
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        using (KernelCancellation.Enter(cts.Token))
            Assert.Throws<OperationCanceledException>(() => Divide(divisorHeap, pe, pc, de, dc, 5001, 4999, long.MaxValue, 1e18, out _, out _, out _));
    }

    [Fact]
    public void UseDivisorHeap_Dispatch_FollowsSquareRule()
    {
        var old = PolynomialDivide.ForceDivisorHeap;
        PolynomialDivide.ForceDivisorHeap = null;
        try
        {
            Assert.True(PolynomialDivide.UseDivisorHeap(np: 7_500_000, nd: 395));
            Assert.True(PolynomialDivide.UseDivisorHeap(np: 100, nd: 10));
            Assert.False(PolynomialDivide.UseDivisorHeap(np: 99, nd: 10));
            PolynomialDivide.ForceDivisorHeap = false;
            Assert.False(PolynomialDivide.UseDivisorHeap(np: 7_500_000, nd: 395));
        }
        finally { PolynomialDivide.ForceDivisorHeap = old; }
    }
}
