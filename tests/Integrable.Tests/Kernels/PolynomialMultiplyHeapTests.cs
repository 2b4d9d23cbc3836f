using System.Numerics;
using Fractions;
using Integrable.Kernels;
using Integrable.Numbers;
using Integrable.Polynomials;
using Xunit;

namespace Integrable.Tests.Kernels;

/// <summary>Differential tests of the heap multiplication on two packed exponent words
/// (<c>MultiplyHeap2</c>, exponents held inline in the heap entries) against the general multi-word
/// kernel (<c>MultiplyHeapN</c>) and against a naive dictionary-of-terms product with
/// <see cref="Fraction"/> coefficients. Running a fast path and an obviously correct slow one on the
/// same random inputs and comparing is common practice (differential testing; common knowledge).
/// The dense method is not a reference here: two words mean a degree box of more than 2^64 cells,
/// far above its limit, so such products always go to the heap.</summary>
public sealed class PolynomialMultiplyHeapTests
{
    private static readonly BigInteger Two64 = BigInteger.One << 64;

    /// <summary>Operand shapes whose products need 65–128 bits of packed exponents.</summary>
    private enum Layout { ManyVariables, LargeDegrees }

    /// <summary>Coefficient classes chosen to land in every accumulator of the word path and past it.</summary>
    private enum Coefficients { Small, NonNegative40, NonNegative58, Signed50, Signed62, Wide, Fractions }

    private static LaurentPolynomialRing Ring(Layout layout) => layout == Layout.ManyVariables
        ? new([.. Enumerable.Range(0, 24).Select(i => $"w{i}")])
        : new("p", "q", "r");

    private static BigInteger Coefficient(Random rng, Coefficients kind, out BigInteger denominator)
    {
        denominator = BigInteger.One;
        switch (kind)
        {
            case Coefficients.Small: return rng.Next(-9, 10);
            case Coefficients.NonNegative40: return rng.NextInt64(0, 1L << 40);
            case Coefficients.NonNegative58: return rng.NextInt64(1L << 57, 1L << 58);
            case Coefficients.Signed50: return rng.NextInt64(-(1L << 50), 1L << 50);
            case Coefficients.Signed62: return rng.NextInt64(-(1L << 62), 1L << 62);
            case Coefficients.Wide:
                // 65–190 bits, either sign, with word-boundary values mixed in
                if (rng.Next(4) == 0) return rng.Next(2) == 0 ? Two64 + 1 : -(Two64 - 1);
                var v = (new BigInteger(rng.NextInt64()) << rng.Next(1, 127)) + rng.NextInt64();
                return v.IsZero ? 1 : v;
            default:
                denominator = rng.Next(1, 40);
                return rng.Next(-50, 51);
        }
    }

    private static LaurentPolynomial RandomPolynomial(Random rng, LaurentPolynomialRing ring, Layout layout, Coefficients kind, int maxTerms)
    {
        while (true)
        {
            var p = Attempt();
            if (p.TermCount >= 2) return p;   // monomial operands bypass the kernels
        }
        LaurentPolynomial Attempt()
        {
            var b = ring.CreateBuilder();
            int n = ring.VariableCount, terms = rng.Next(2, maxTerms + 1);
            for (int t = 0; t < terms; t++)
            {
                var e = new int[n];
                if (layout == Layout.ManyVariables)
                    for (int v = 0; v < n; v++) e[v] = rng.Next(3) == 0 ? 0 : rng.Next(-4, 5);
                else
                    for (int v = 0; v < n; v++) e[v] = rng.Next(-(1 << 28), 1 << 28);
                var c = Coefficient(rng, kind, out var d);
                b.Add(new Rational(c, d), e);
            }
            return b.ToPolynomial();
        }
    }

    /// <summary>The number of packed words the heap uses for A·B (as <c>PolynomialMultiply.Run</c> computes it).</summary>
    private static ExponentLayout LayoutOf(LaurentPolynomial a, LaurentPolynomial b, out ProductShape shape)
    {
        shape = new ProductShape(a.Exponents, b.Exponents, a.TermCount, b.TermCount, a.Ring.VariableCount);
        var max = new long[shape.Nvars];
        for (int v = 0; v < shape.Nvars; v++) max[v] = shape.Radix[v] - 1;
        return ExponentLayout.Create(max, guard: false);
    }

    private static Dictionary<string, Fraction> NaiveProduct(LaurentPolynomial a, LaurentPolynomial b)
    {
        var r = new Dictionary<string, Fraction>();
        foreach (var ta in a.Terms)
            foreach (var tb in b.Terms)
            {
                var e = new int[a.Ring.VariableCount];
                for (int v = 0; v < e.Length; v++) e[v] = ta.Exponents[v] + tb.Exponents[v];
                string key = string.Join(",", e);
                var c = new Fraction(ta.Coefficient.Numerator, ta.Coefficient.Denominator) * new Fraction(tb.Coefficient.Numerator, tb.Coefficient.Denominator);
                r[key] = r.GetValueOrDefault(key, Fraction.Zero) + c;
            }
        foreach (var k in r.Where(kv => kv.Value.IsZero).Select(kv => kv.Key).ToList()) r.Remove(k);
        return r;
    }

    private static void AssertSame(Dictionary<string, Fraction> expected, LaurentPolynomial actual, string context)
    {
        Assert.True(expected.Count == actual.TermCount, $"{context}: {actual.TermCount} terms, expected {expected.Count}");
        int[]? previous = null;
        foreach (var t in actual.Terms)
        {
            // canonical form: exponent vectors strictly descending in lex order
            var current = t.Exponents.ToArray();
            if (previous != null) Assert.True(previous.AsSpan().SequenceCompareTo(current) > 0, $"{context}: terms out of order");
            previous = current;
            string key = string.Join(",", t.Exponents.ToArray());
            Assert.True(expected.TryGetValue(key, out var c), $"{context}: unexpected term {key}");
            Assert.True(c == new Fraction(t.Coefficient.Numerator, t.Coefficient.Denominator), $"{context}: coefficient of {key}");
        }
    }

    private static LaurentPolynomial HeapProduct(LaurentPolynomial a, LaurentPolynomial b)
    {
        var old = PolynomialMultiply.Force;
        PolynomialMultiply.Force = MultiplyAlgorithm.Heap;
        try { return a * b; }
        finally { PolynomialMultiply.Force = old; }
    }

    public static TheoryData<string> Layouts => new() { nameof(Layout.ManyVariables), nameof(Layout.LargeDegrees) };

    [Theory]
    [MemberData(nameof(Layouts))]
    public void Multiply_TwoWordLayouts_EveryCoefficientClassMatchesNaive(string layoutName)
    {
        var layout = Enum.Parse<Layout>(layoutName);
        var ring = Ring(layout);
        var rng = new Random(layout == Layout.ManyVariables ? 4101 : 4102);
        var accumulators = new HashSet<Accumulator>();
        int wide = 0;
        foreach (var kind in Enum.GetValues<Coefficients>())
            for (int i = 0; i < 14; i++)
            {
                var a = RandomPolynomial(rng, ring, layout, kind, 30);
                var b = RandomPolynomial(rng, ring, layout, kind, 45);
                Assert.Equal(2, LayoutOf(a, b, out _).Words);
                if (CoefficientForm.TryWords(a.Coefficients, out var wa, out _) && CoefficientForm.TryWords(b.Coefficients, out var wb, out _))
                    accumulators.Add(PolynomialMultiply.SelectAccumulator(wa, wb));
                else wide++;
                AssertSame(NaiveProduct(a, b), HeapProduct(a, b), $"{layout} {kind} #{i}");
            }
        // every word accumulator and the wide paths were used on two-word layouts
        Assert.Equal(5, accumulators.Count);
        Assert.True(wide > 0);
    }

    [Theory]
    [MemberData(nameof(Layouts))]
    public void Square_SameOperand_TriangleHeapMatchesNaiveAndProduct(string layoutName)
    {
        // p * p with the same arrays takes the triangle heap (diagonal once, off-diagonal twice); a copy of p
        // (other arrays) takes the ordinary product. Both equal the naive square (common practice: differential test).
        var layout = Enum.Parse<Layout>(layoutName);
        var ring = Ring(layout);
        var small = new LaurentPolynomialRing("s", "t", "u");
        var rng = new Random(layout == Layout.ManyVariables ? 4111 : 4112);
        foreach (var kind in Enum.GetValues<Coefficients>())
            for (int i = 0; i < 8; i++)
            {
                var a = RandomPolynomial(rng, ring, layout, kind, 40);
                var copy = ring.CreateBuilder();
                foreach (var t in a.Terms) copy.Add(t.Coefficient, t.Exponents.ToArray());
                var b = copy.ToPolynomial();
                Assert.False(ReferenceEquals(a, b));
                var expected = NaiveProduct(a, a);
                AssertSame(expected, HeapProduct(a, a), $"square {layout} {kind} #{i}");
                AssertSame(expected, HeapProduct(a, b), $"product {layout} {kind} #{i}");
                // one-word layout: three variables of small degree
                var c = RandomPolynomial(rng, small, Layout.ManyVariables, kind, 40);
                AssertSame(NaiveProduct(c, c), HeapProduct(c, c), $"square one-word {kind} #{i}");
            }
    }

    /// <summary>Variable counts that pack A·B into three and four words (Key3, Key4 inline in the heap)
    /// and into six (the row-buffer kernel).</summary>
    public static TheoryData<int, int> ManyWordShapes => new() { { 33, 3 }, { 45, 4 }, { 70, 6 } };

    /// <summary>Two anchor terms (every exponent −4, every exponent 4) fix the field widths; the other terms
    /// vary in only one variable per 13, so most product exponents agree on their leading words and the
    /// order is decided by the later ones.</summary>
    private static LaurentPolynomial Clustered(Random rng, LaurentPolynomialRing ring, Coefficients kind, int maxTerms)
    {
        int n = ring.VariableCount;
        var builder = ring.CreateBuilder();
        builder.Add(new Rational(Coefficient(rng, kind, out var d0), d0), Enumerable.Repeat(-4, n).ToArray());
        builder.Add(new Rational(Coefficient(rng, kind, out var d1), d1), Enumerable.Repeat(4, n).ToArray());
        for (int t = rng.Next(2, maxTerms); t > 0; t--)
        {
            var e = new int[n];
            for (int v = 0; v < n; v += 13) e[v] = rng.Next(0, 3);
            builder.Add(new Rational(Coefficient(rng, kind, out var d), d), e);
        }
        return builder.ToPolynomial();
    }

    [Theory]
    [MemberData(nameof(ManyWordShapes))]
    public void Multiply_ThreeOrMoreWords_ProductsAndSquaresMatchNaive(int vars, int words)
    {
        // Differential test against the naive product (common practice); exponents in ±4 need 4 bits per field.
        var ring = new LaurentPolynomialRing([.. Enumerable.Range(0, vars).Select(i => $"z{i}")]);
        var rng = new Random(4200 + vars);
        foreach (var kind in new[] { Coefficients.Small, Coefficients.Signed62, Coefficients.Wide, Coefficients.Fractions })
            for (int i = 0; i < 6; i++)
            {
                LaurentPolynomial a, b;
                int attempts = 0;
                do
                {
                    Assert.True(++attempts < 500, $"no operands with a {words}-word layout in {vars} variables");
                    a = i % 2 == 0 ? RandomPolynomial(rng, ring, Layout.ManyVariables, kind, 25) : Clustered(rng, ring, kind, 25);
                    b = i % 2 == 0 ? RandomPolynomial(rng, ring, Layout.ManyVariables, kind, 35) : Clustered(rng, ring, kind, 35);
                } while (LayoutOf(a, b, out _).Words != words || LayoutOf(a, a, out _).Words != words);
                AssertSame(NaiveProduct(a, b), HeapProduct(a, b), $"{vars} variables {kind} #{i}");
                AssertSame(NaiveProduct(a, a), HeapProduct(a, a), $"square, {vars} variables {kind} #{i}");
            }
    }

    [Fact]
    public void Multiply_TwoWordTelescopingProduct_CancelsToTwoTerms()
    {
        // r·(1 + m + … + m^(K−1))·(1 − m) = r·(1 − m^K): every middle product cancels (geometric sum, common knowledge).
        var ring = Ring(Layout.ManyVariables);
        var rng = new Random(4103);
        for (int trial = 0; trial < 6; trial++)
        {
            var e = new int[24];
            for (int v = 0; v < 24; v++) e[v] = rng.Next(2) == 0 ? 1 : -1;
            var m = ring.FromTerms([Rational.One], e);
            var r = ring.FromTerms([new Rational(trial % 2 == 0 ? 3 : (BigInteger.One << 70) + 5)], new int[24]);
            int k = 12 + 3 * trial;   // 4–5 bits per variable: 96–120 bits
            var sum = ring.Zero;
            var power = ring.One;
            for (int i = 0; i < k; i++) { sum += power; power *= m; }
            var p = r * sum;
            var q = ring.One - m;
            Assert.Equal(2, LayoutOf(p, q, out _).Words);
            var product = HeapProduct(p, q);
            Assert.Equal(2, product.TermCount);
            Assert.Equal(r - r * power, product);
            AssertSame(NaiveProduct(p, q), product, $"telescoping K={k}");
        }
    }

    [Theory]
    [MemberData(nameof(Layouts))]
    public void MultiplyHeap2_EveryAccumulator_SameAsMultiWordKernelAndNaive(string layoutName)
    {
        var layout = Enum.Parse<Layout>(layoutName);
        var ring = Ring(layout);
        var rng = new Random(layout == Layout.ManyVariables ? 4104 : 4105);
        int checkedPairs = 0;
        foreach (var kind in new[] { Coefficients.Small, Coefficients.NonNegative40, Coefficients.Signed50, Coefficients.Signed62, Coefficients.Wide })
            for (int i = 0; i < 10; i++)
            {
                var a = RandomPolynomial(rng, ring, layout, kind, 40);
                var b = RandomPolynomial(rng, ring, layout, kind, 60);
                var pl = LayoutOf(a, b, out var shape);
                Assert.Equal(2, pl.Words);
                var pa = new ulong[a.TermCount * 2];
                var pb = new ulong[b.TermCount * 2];
                pl.Pack(a.Exponents, shape.Nvars, shape.MinA, pa);
                pl.Pack(b.Exponents, shape.Nvars, shape.MinB, pb);
                var offset = new long[shape.Nvars];
                for (int v = 0; v < shape.Nvars; v++) offset[v] = (long)shape.MinA[v] + shape.MinB[v];
                var expected = NaiveProduct(a, b);
                void Check(List<(ulong Hi, ulong Lo, BigInteger C)> two, List<(ulong Hi, ulong Lo, BigInteger C)> multi, string acc)
                {
                    Assert.Equal(multi, two);
                    Assert.Equal(expected.Count, two.Count);
                    var exps = new int[shape.Nvars];
                    for (int t = 0; t < two.Count; t++)
                    {
                        if (t > 0) Assert.True(two[t - 1].Hi > two[t].Hi || (two[t - 1].Hi == two[t].Hi && two[t - 1].Lo > two[t].Lo), "descending order");
                        pl.Unpack([two[t].Hi, two[t].Lo], 1, shape.Nvars, offset, exps);
                        Assert.True(expected[string.Join(",", exps)] == new Fraction(two[t].C), $"{kind} {acc} #{i}");
                    }
                }
                if (CoefficientForm.TryWords(a.Coefficients, out var wa, out _) && CoefficientForm.TryWords(b.Coefficients, out var wb, out _))
                {
                    int bits = CoefficientBounds.ProductSumBits(wa, wb);
                    bool nonNegative = wa.All(x => x >= 0) && wb.All(x => x >= 0);
                    if (bits <= 63) Check(Kernel<Word64Ops, long, long>(true, pa, wa, pb, wb), Kernel<Word64Ops, long, long>(false, pa, wa, pb, wb), "Word64");
                    if (bits <= 96 && nonNegative) Check(Kernel<UWord96Ops, long, Split96>(true, pa, wa, pb, wb), Kernel<UWord96Ops, long, Split96>(false, pa, wa, pb, wb), "Split96");
                    if (bits <= 127 && nonNegative) Check(Kernel<UWord128Ops, long, Int128>(true, pa, wa, pb, wb), Kernel<UWord128Ops, long, Int128>(false, pa, wa, pb, wb), "UWord128");
                    if (bits <= 127) Check(Kernel<Word128Ops, long, Int128>(true, pa, wa, pb, wb), Kernel<Word128Ops, long, Int128>(false, pa, wa, pb, wb), "Word128");
                    Check(Kernel<Word192Ops, long, Int192>(true, pa, wa, pb, wb), Kernel<Word192Ops, long, Int192>(false, pa, wa, pb, wb), "Word192");
                    // the longer operand as the heap rows: same output
                    Check(Kernel<Word192Ops, long, Int192>(true, pb, wb, pa, wa), Kernel<Word192Ops, long, Int192>(false, pa, wa, pb, wb), "Word192 swapped");
                }
                Assert.True(CoefficientForm.TryIntegerMagnitudes<Magnitude192>(a.Coefficients, out var ma) & CoefficientForm.TryIntegerMagnitudes<Magnitude192>(b.Coefficients, out var mb));
                Check(Kernel<Wide448Ops, Magnitude192, Int448>(true, pa, ma, pb, mb), Kernel<Wide448Ops, Magnitude192, Int448>(false, pa, ma, pb, mb), "Wide448");
                checkedPairs++;
            }
        Assert.Equal(50, checkedPairs);
    }

    /// <summary>Runs MultiplyHeap2 (<paramref name="two"/>) or MultiplyHeapN with two words, starting from
    /// the smallest pooled output buffers so that growth is exercised.</summary>
    private static List<(ulong Hi, ulong Lo, BigInteger C)> Kernel<TOps, TC, TAcc>(bool two, ulong[] ea, TC[] ca, ulong[] eb, TC[] cb)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        var oe = Pool.Rent<ulong>(2);
        var oc = Pool.Rent<TAcc>(1);
        int count = two ? PolynomialMultiply.MultiplyHeap2<TOps, TC, TAcc>(ea, ca, eb, cb, ref oe, ref oc)
                        : PolynomialMultiply.MultiplyHeapN<TOps, TC, TAcc>(ea, ca, eb, cb, 2, ref oe, ref oc);
        var list = new List<(ulong, ulong, BigInteger)>(count);
        for (int t = 0; t < count; t++) list.Add((oe[2 * t], oe[2 * t + 1], TOps.ToBigInteger(in oc[t])));
        Pool.Return(oe);
        Pool.Return(oc);
        return list;
    }
}
