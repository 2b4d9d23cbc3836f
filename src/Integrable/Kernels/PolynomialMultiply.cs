using System.Runtime.InteropServices;
using System.Numerics;
using System.Runtime.CompilerServices;
using Integrable.Numbers;

namespace Integrable.Kernels;

/// <summary>Multiplication of sparse Laurent polynomials given as flat arrays: coefficients and
/// term-major exponent vectors sorted in descending lex order.</summary>
/// <remarks>
/// <para>Dispatch (<see cref="Multiply"/>; zero, constant and monomial operands are handled by the
/// caller): exponents are shifted by the per-variable minima of each operand, which makes them
/// non-negative and preserves the order. Coefficients are put over a common denominator; when the
/// integers fit in words, products accumulate in the narrowest accumulator that the bound
/// min(‖A‖₁·max|B|, max|A|·‖B‖₁) on every partial sum of a product coefficient allows
/// (<see cref="SelectAccumulator"/>: 64-bit; for non-negative inputs a carry-free split 96-bit or
/// unsigned 128-bit; signed 128-bit; 192-bit), so the inner loops never test for overflow; otherwise
/// big integers. Then:</para>
/// <list type="bullet">
/// <item>Dense (<see cref="MultiplyDense"/>) when both operands have at least
/// <see cref="DenseMinTerms"/> terms and the product's degree box (Π over variables of the summed
/// exponent ranges + 1) holds at most <see cref="DenseBoxPerProduct"/> cells per term product
/// #a·#b and at most <see cref="DenseMaxBox"/> cells. Reason: the dense method costs about one
/// multiply-add (a few cycles) per term product plus the scan of the touched part of each window,
/// while the heap costs a heap operation (tens of nanoseconds) per product; so dense wins unless
/// the box is much larger than the number of products. For (1+x+y+z+t)^20·((1+x+y+z+t)^20+1) the
/// box has 2.8·10⁶ cells for 1.1·10⁸ products; for the sparse product
/// (1+x+y+2z²+3t³+5u⁵)^8·(1+u+t+2z²+3y³+5x⁵)^8 it has 8.6·10⁷ cells for 1.7·10⁶ products and the
/// heap is chosen. Windows are aligned to the trailing variables when such a slice fits in
/// <see cref="DenseBufferBytes"/> (see <see cref="DenseWindow"/>).</item>
/// <item>Otherwise Johnson's heap method (<see cref="MultiplyHeap1"/> / <see cref="MultiplyHeap2"/> on one / two packed
/// words with the exponent held in the heap entries, <see cref="MultiplyHeapN"/> on more words), whose
/// memory and time follow the number of terms whatever the degrees.</item>
/// </list>
/// <para>Thresholds are <c>internal static</c>; <see cref="Force"/> and
/// <see cref="ForceDenseShift"/> let tests and benchmarks pin each path on their thread.</para>
/// </remarks>
internal static partial class PolynomialMultiply
{
    /// <summary>Forces an algorithm on the current thread (tests and benchmarks);
    /// <see cref="MultiplyAlgorithm.Auto"/> (the default) dispatches.</summary>
    [ThreadStatic] internal static MultiplyAlgorithm Force;

    /// <summary>When positive, forces the dense method's window size to 2^value on the current
    /// thread (tests use tiny windows to exercise the carries between windows).</summary>
    [ThreadStatic] internal static int ForceDenseShift;

    /// <summary>Skips the multi-limb path on the current thread (tests compare it with big integers).</summary>
    [ThreadStatic] internal static bool ForceBig;

    /// <summary>Skips the three-limb path on the current thread, so that the four-limb path takes every
    /// multi-limb product and division (tests compare the two).</summary>
    [ThreadStatic] internal static bool ForceFourLimbs;

    /// <summary>Dense is chosen only when the degree box has at most this many cells per term product.</summary>
    internal static double DenseBoxPerProduct = 2.0;

    /// <summary>Dense is never chosen above this box size.</summary>
    internal static long DenseMaxBox = 1L << 32;

    /// <summary>Dense is chosen only when both operands have at least this many terms.</summary>
    internal static int DenseMinTerms = 16;

    /// <summary>Size in bytes of the dense method's accumulator buffer; it should fit in the
    /// first-level data cache (48 KiB per core on the reference machine).</summary>
    internal static int DenseBufferBytes = 32 * 1024;

    /// <summary>Multiplies A by B (both non-empty, canonical, <paramref name="nvars"/> variables).</summary>
    /// <exception cref="OverflowException">A product exponent does not fit in 32 bits.</exception>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void Multiply(ReadOnlySpan<Rational> ca, ReadOnlySpan<int> ea, ReadOnlySpan<Rational> cb, ReadOnlySpan<int> eb,
        int nvars, out Rational[] coeffs, out int[] exps)
    {
        var shape = new ProductShape(ea, eb, ca.Length, cb.Length, nvars);
        // A·A (the same arrays, as in x^2 or p * p): the heap squares on the triangle i ≤ j.
        bool square = ca.Length == cb.Length && ea.Length == eb.Length &&
            Unsafe.AreSame(ref MemoryMarshal.GetReference(ea), ref MemoryMarshal.GetReference(eb)) &&
            Unsafe.AreSame(ref MemoryMarshal.GetReference(ca), ref MemoryMarshal.GetReference(cb));
        if (WorthProjecting(in shape) && SupportHull.TryFind(ea, square ? [] : eb, nvars) is { } hull)
        {
            // Graded operands: their supports span a proper affine subspace; multiply on its pivot coordinates
            // when that makes the product dense, then lift the exponents back.
            var pa = hull.Project(ea);
            var pb = square ? pa : hull.Project(eb);
            var projected = new ProductShape(pa, pb, ca.Length, cb.Length, hull.Rank);
            if (Choose(in projected) == MultiplyAlgorithm.Dense)
            {
                SupportHull.Applied++;
                MultiplyShaped(ca, pa, cb, pb, in projected, square, out coeffs, out var pe);
                var origin = new long[nvars];
                for (int v = 0; v < nvars; v++) origin[v] = (long)ea[v] + eb[v];
                if (!hull.TryLift(pe, origin, out exps))
                    throw new OverflowException("A product exponent leaves the 32-bit range.");
                return;
            }
        }
        MultiplyShaped(ca, ea, cb, eb, in shape, square, out coeffs, out exps);
    }

    /// <summary>Skips the projection onto the affine hull of graded supports on the current thread (tests compare).</summary>
    [ThreadStatic] internal static bool NoProjection;

    /// <summary>True when the product would go to the heap only because its degree box is sparse, so that a
    /// projection onto the supports' affine hull (<see cref="SupportHull"/>) could make it dense.</summary>
    /// <remarks>Finding the hull costs up to (#A + #B)·n² word operations, so it is tried only when that is
    /// small against the #A·#B products of the heap.</remarks>
    private static bool WorthProjecting(in ProductShape s) =>
        !NoProjection && Force == MultiplyAlgorithm.Auto && s.Nvars >= 2 &&
        Math.Min(s.CountA, s.CountB) >= DenseMinTerms && Choose(in s) == MultiplyAlgorithm.Heap &&
        ((double)s.CountA + s.CountB) * s.Nvars * s.Nvars <= (double)s.CountA * s.CountB;

    /// <summary>The product with its shape known (<paramref name="square"/>: A and B are the same arrays).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void MultiplyShaped(ReadOnlySpan<Rational> ca, ReadOnlySpan<int> ea, ReadOnlySpan<Rational> cb, ReadOnlySpan<int> eb,
        in ProductShape shape, bool square, out Rational[] coeffs, out int[] exps)
    {
        if (TryKronecker(ca, ea, cb, eb, in shape, square, out coeffs, out exps)) return;
        if (CoefficientForm.TryWords(ca, out var wa, out long da) && CoefficientForm.TryWords(cb, out var wb, out long db))
        {
            var den = (BigInteger)da * db;
            switch (SelectAccumulator(wa, wb))
            {
                case Accumulator.Word64: Run<Word64Ops, long, long>(wa, ea, wb, eb, in shape, square, den, out coeffs, out exps); break;
                case Accumulator.Split96: Run<UWord96Ops, long, Split96>(wa, ea, wb, eb, in shape, square, den, out coeffs, out exps); break;
                case Accumulator.Unsigned128: Run<UWord128Ops, long, Int128>(wa, ea, wb, eb, in shape, square, den, out coeffs, out exps); break;
                case Accumulator.Word128: Run<Word128Ops, long, Int128>(wa, ea, wb, eb, in shape, square, den, out coeffs, out exps); break;
                default: Run<Word192Ops, long, Int192>(wa, ea, wb, eb, in shape, square, den, out coeffs, out exps); break;
            }
            return;
        }
        if (!ForceBig)
        {
            // Integer coefficients: multi-limb magnitudes read straight from the rationals, three limbs up
            // to 191 bits and four up to 255 (sums stay inside the 448- and 576-bit accumulators).
            int bitsA = CoefficientForm.IntegerBits(ca), bitsB = bitsA < 0 ? -1 : CoefficientForm.IntegerBits(cb);
            int bits = Math.Max(bitsA, bitsB);
            if (bitsB >= 0)
            {
                if (bits <= Magnitude192.MaxBits && !ForceFourLimbs)
                {
                    CoefficientForm.TryIntegerMagnitudes<Magnitude192>(ca, out var ia);
                    CoefficientForm.TryIntegerMagnitudes<Magnitude192>(cb, out var ib);
                    Run<Wide448Ops, Magnitude192, Int448>(ia, ea, ib, eb, in shape, square, BigInteger.One, out coeffs, out exps);
                    return;
                }
                if (bits <= Magnitude256.MaxBits)
                {
                    CoefficientForm.TryIntegerMagnitudes<Magnitude256>(ca, out var ia);
                    CoefficientForm.TryIntegerMagnitudes<Magnitude256>(cb, out var ib);
                    Run<Wide576Ops, Magnitude256, Int576>(ia, ea, ib, eb, in shape, square, BigInteger.One, out coeffs, out exps);
                    return;
                }
            }
        }
        CoefficientForm.ToBig(ca, out var ba, out var bda);
        CoefficientForm.ToBig(cb, out var bb, out var bdb);
        // Rational coefficients: multi-limb numerators over the common denominators when they fit.
        if (!ForceBig && !ForceFourLimbs && CoefficientForm.TryMagnitudes<Magnitude192>(ba, out var ma) && CoefficientForm.TryMagnitudes<Magnitude192>(bb, out var mb))
        {
            Run<Wide448Ops, Magnitude192, Int448>(ma, ea, mb, eb, in shape, square, bda * bdb, out coeffs, out exps);
            return;
        }
        if (!ForceBig && CoefficientForm.TryMagnitudes<Magnitude256>(ba, out var na) && CoefficientForm.TryMagnitudes<Magnitude256>(bb, out var nb))
        {
            Run<Wide576Ops, Magnitude256, Int576>(na, ea, nb, eb, in shape, square, bda * bdb, out coeffs, out exps);
            return;
        }
        Run<BigOps, BigInteger, BigInteger>(ba, ea, bb, eb, in shape, square, bda * bdb, out coeffs, out exps);
    }

    /// <summary>Dense products with integer coefficients of several words by Kronecker substitution and
    /// multi-modular transforms (<see cref="KroneckerProduct"/>), when the dense method is chosen and the cost
    /// estimate favours transforms.</summary>
    private static bool TryKronecker(ReadOnlySpan<Rational> ca, ReadOnlySpan<int> ea, ReadOnlySpan<Rational> cb, ReadOnlySpan<int> eb,
        in ProductShape s, bool square, out Rational[] coeffs, out int[] exps)
    {
        coeffs = [];
        exps = [];
        bool dense = KroneckerProduct.Force == true || (Force == MultiplyAlgorithm.Auto && Choose(in s) == MultiplyAlgorithm.Dense);
        if (!dense || ForceBig || s.Box > 1L << KroneckerProduct.MaxLog) return false;
        int bitsA = CoefficientForm.IntegerBits(ca), bitsB = square ? bitsA : CoefficientForm.IntegerBits(cb);
        if (bitsA < 0 || bitsB < 0 || !KroneckerProduct.Worth(ca.Length, cb.Length, bitsA, bitsB, s.Box)) return false;
        int n = s.Nvars;
        var stride = Strides(in s);
        var ia = new long[ca.Length];
        Index(ea, n, s.MinA, stride, ia);
        var ba = new BigInteger[ca.Length];
        for (int i = 0; i < ba.Length; i++) ba[i] = ca[i].Numerator;
        long[] ib = ia;
        BigInteger[] bb = ba;
        if (!square)
        {
            ib = new long[cb.Length];
            Index(eb, n, s.MinB, stride, ib);
            bb = new BigInteger[cb.Length];
            for (int i = 0; i < bb.Length; i++) bb[i] = cb[i].Numerator;
        }
        int count = KroneckerProduct.Multiply(ba, ia, bb, ib, s.Box, square, bitsA, bitsB, out var oi, out var oc);
        exps = Decode(oi, count, in s, stride);
        coeffs = new Rational[count];
        for (int t = 0; t < count; t++) coeffs[t] = new Rational(oc[t]);
        return true;
    }

    /// <summary>Mixed-radix strides of the product's degree box, variable 0 most significant.</summary>
    private static long[] Strides(in ProductShape s) => Strides(s.Radix);

    /// <summary>Mixed-radix strides for the given radices, variable 0 most significant.</summary>
    internal static long[] Strides(long[] radix)
    {
        var stride = new long[radix.Length];
        long st = 1;
        for (int v = radix.Length - 1; v >= 0; v--) { stride[v] = st; st *= radix[v]; }
        return stride;
    }

    /// <summary>The exponents of product cells given by their mixed-radix indices.</summary>
    private static int[] Decode(long[] oi, int count, in ProductShape s, long[] stride)
    {
        int n = s.Nvars;
        var exps = new int[count * n];
        for (int t = 0; t < count; t++)
        {
            long x = oi[t];
            for (int v = 0; v < n; v++)
            {
                long digit = x / stride[v];
                x -= digit * stride[v];
                exps[t * n + v] = (int)(digit + (long)s.MinA[v] + s.MinB[v]);
            }
        }
        return exps;
    }

    /// <summary>The narrowest accumulator that holds every partial sum of a product coefficient
    /// (bound: <see cref="CoefficientBounds.ProductSumBits"/>); non-negative inputs get the unsigned
    /// variants, whose inner loops are shorter.</summary>
    internal static Accumulator SelectAccumulator(long[] wa, long[] wb)
    {
        int bits = CoefficientBounds.ProductSumBits(wa, wb);
        if (bits <= 63) return Accumulator.Word64;
        bool nonNegative = NonNegative(wa) && NonNegative(wb);
        if (bits <= 96 && nonNegative) return Accumulator.Split96;
        if (bits <= 127) return nonNegative ? Accumulator.Unsigned128 : Accumulator.Word128;
        return Accumulator.Word192;
    }

    /// <summary>Which algorithm <see cref="Multiply"/> would use for these operands.</summary>
    internal static MultiplyAlgorithm Choose(in ProductShape s)
    {
        if (Force != MultiplyAlgorithm.Auto) return Force;
        if (Math.Min(s.CountA, s.CountB) < DenseMinTerms) return MultiplyAlgorithm.Heap;
        double products = (double)s.CountA * s.CountB;
        if (s.Box <= DenseMaxBox && s.Box <= DenseBoxPerProduct * products) return MultiplyAlgorithm.Dense;
        return MultiplyAlgorithm.Heap;
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static void Run<TOps, TC, TAcc>(TC[] ca, ReadOnlySpan<int> ea, TC[] cb, ReadOnlySpan<int> eb,
        in ProductShape s, bool square, BigInteger den, out Rational[] coeffs, out int[] exps)
        where TOps : ICoefficientOps<TC, TAcc>
    {
        int n = s.Nvars;
        var offset = new long[n];
        for (int v = 0; v < n; v++) offset[v] = (long)s.MinA[v] + s.MinB[v];
        int count;
        TAcc[] acc;
        var algorithm = Choose(in s);
        int estimate = Math.Max(ca.Length, cb.Length) * 2;
        // Dense needs per-window scratch proportional to Box / window: above DenseMaxBox use the heap even when forced.
        if (algorithm == MultiplyAlgorithm.Dense && s.Box <= DenseMaxBox)
        {
            var stride = Strides(in s);
            var ia = Pool.Rent<long>(ca.Length);
            var ib = Pool.Rent<long>(cb.Length);
            Index(ea, n, s.MinA, stride, ia);
            Index(eb, n, s.MinB, stride, ib);
            DenseWindow(in s, Unsafe.SizeOf<TAcc>(), out long window, out bool aligned);
            var oi = Pool.Rent<long>(estimate);
            acc = Pool.Rent<TAcc>(estimate);
            TC[]? doubled = square && TryDouble(ca, out var twice) ? twice : null;
            count = MultiplyDense<TOps, TC, TAcc>(ia.AsSpan(0, ca.Length), ca, ib.AsSpan(0, cb.Length), cb, window, aligned, ref oi, ref acc, doubled);
            Pool.Return(ia);
            Pool.Return(ib);
            exps = Decode(oi, count, in s, stride);
            Pool.Return(oi);
        }
        else
        {
            var maxValue = new long[n];
            for (int v = 0; v < n; v++) maxValue[v] = s.Radix[v] - 1;
            var layout = ExponentLayout.Create(maxValue, guard: false);
            int N = layout.Words;
            var pa = Pool.Rent<ulong>(ca.Length * N);
            var pb = Pool.Rent<ulong>(cb.Length * N);
            layout.Pack(ea, n, s.MinA, pa);
            layout.Pack(eb, n, s.MinB, pb);
            var ra = pa.AsSpan(0, ca.Length * N);
            var rb = pb.AsSpan(0, cb.Length * N);
            var oe = Pool.Rent<ulong>(estimate * N);
            acc = Pool.Rent<TAcc>(estimate);
            count = square
                ? SquareHeap<TOps, TC, TAcc>(ra, ca, N, ref oe, ref acc)
                : HeapMultiply<TOps, TC, TAcc>(ra, ca, rb, cb, N, ref oe, ref acc);
            Pool.Return(pa);
            Pool.Return(pb);
            exps = new int[count * n];
            layout.Unpack(oe, count, n, offset, exps);
            Pool.Return(oe);
        }
        coeffs = new Rational[count];
        for (int t = 0; t < count; t++) coeffs[t] = TOps.ToRational(in acc[t], in den);
        Pool.Return(acc);
    }

    private static bool NonNegative(long[] w)
    {
        foreach (var x in w) if (x < 0) return false;
        return true;
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal static void Index(ReadOnlySpan<int> e, int n, int[] min, long[] stride, long[] idx)
    {
        int terms = e.Length / n;
        for (int t = 0; t < terms; t++)
        {
            long x = 0;
            for (int v = 0; v < n; v++) x += ((long)e[t * n + v] - min[v]) * stride[v];
            idx[t] = x;
        }
    }

    /// <summary>Window of the dense method. Preferred: the product of the radices of the trailing
    /// variables that fits in <see cref="DenseBufferBytes"/> (no carries between windows, and every
    /// window is one slice of fixed leading exponents); when that is smaller than 1/16 of the buffer,
    /// a power of two half the buffer (carries go to the next window).</summary>
    internal static void DenseWindow(in ProductShape s, int accBytes, out long window, out bool aligned)
    {
        long cells = Math.Max(4, DenseBufferBytes / accBytes);
        if (ForceDenseShift > 0) { window = 1L << ForceDenseShift; aligned = false; return; }
        long suffix = 1;
        for (int v = s.Nvars - 1; v >= 0 && suffix * s.Radix[v] <= cells; v--) suffix *= s.Radix[v];
        if (suffix * 16 >= cells || suffix == s.Box) { window = suffix; aligned = true; return; }
        window = 2;
        while (window * 4 <= cells && window * 2 <= s.Box) window *= 2;
        aligned = false;
    }
}
