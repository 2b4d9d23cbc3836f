using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Runtime.Intrinsics;
using System.Runtime.Intrinsics.X86;
using Integrable.Numbers;

namespace Integrable.Kernels.LinearAlgebra;

/// <summary>Word-level modular arithmetic for the elimination kernels: reduction of arbitrary 64- and
/// 128-bit values and dot products with delayed reduction, for any prime p &lt; 2^62.</summary>
/// <remarks>
/// <see cref="PrimeField.Reduce"/> needs its argument below p²; the kernels instead accumulate up to
/// sixteen products of residues in a 128-bit accumulator and fold its high word every so often, so they
/// reduce values of any size with a 64-bit Barrett step (<see cref="Reduce64"/>) and the constant
/// 2^64 mod p.
/// </remarks>
internal readonly struct ModularReducer
{
    /// <summary>The field.</summary>
    public readonly PrimeField Field;

    /// <summary>The prime p.</summary>
    public readonly ulong P;

    private readonly ulong _m64;     // floor((2^64 - 1) / p)
    private readonly ulong _r64;     // 2^64 mod p
    private readonly ulong _r31;     // 2^31 mod p
    private readonly ulong _r62;     // 2^62 mod p

    /// <summary>Dot products at least this long use the AVX-512 kernel (when the processor has it).</summary>
    internal const int VectorDotThreshold = 64;

    public ModularReducer(PrimeField field)
    {
        Field = field;
        P = field.Modulus;
        _m64 = ulong.MaxValue / P;
        _r64 = (ulong)((UInt128.One << 64) % P);
        _r31 = (1UL << 31) % P;
        _r62 = (1UL << 62) % P;
    }

    /// <summary>x mod p for any word x.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Reduce64(ulong x)
    {
        ulong q = Math.BigMul(x, _m64, out _);
        ulong r = x - q * P;
        // q is at most two below floor(x/p).
        while (r >= P) r -= P;
        return r;
    }

    /// <summary>(hi·2^64 + lo) mod p for any 128-bit value.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Reduce128(ulong hi, ulong lo)
    {
        ulong h = Reduce64(hi);
        ulong l = Reduce64(lo);
        ulong t = h == 0 ? 0 : Field.Multiply(h, _r64);
        ulong s = t + l;
        return s >= P ? s - P : s;
    }

    /// <summary>a·b mod p for residues a, b.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Multiply(ulong a, ulong b) => Field.Multiply(a, b);

    /// <summary>a⁻¹ mod p for a non-zero residue, by the extended Euclidean algorithm in word arithmetic
    /// (all cofactors stay below p &lt; 2^62 in absolute value).</summary>
    /// <exception cref="DivideByZeroException"><paramref name="a"/> is zero.</exception>
    public ulong Inverse(ulong a)
    {
        if (a == 0) throw new DivideByZeroException($"zero has no inverse modulo {P}");
        ulong r0 = P, r1 = a;
        long t0 = 0, t1 = 1;
        while (r1 != 0)
        {
            ulong q = r0 / r1;
            (r0, r1) = (r1, r0 - q * r1);
            (t0, t1) = (t1, t0 - (long)q * t1);
        }
        return t0 < 0 ? (ulong)(t0 + (long)P) : (ulong)t0;
    }

    /// <summary>a − b mod p for residues a, b.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Subtract(ulong a, ulong b) => a >= b ? a - b : a + P - b;

    /// <summary>a + b mod p for residues a, b.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong Add(ulong a, ulong b)
    {
        ulong s = a + b;
        return s >= P ? s - P : s;
    }

    /// <summary>The residue of a signed word.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong FromSigned(long v)
    {
        if (v >= 0) return (ulong)v < P ? (ulong)v : Reduce64((ulong)v);
        ulong m = IntegerMath.UnsignedAbs(v);
        ulong r = m < P ? m : Reduce64(m);
        return r == 0 ? 0 : P - r;
    }

    /// <summary>The residue of a magnitude given by little-endian 64-bit words, negated when <paramref name="negative"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public ulong FromWords(ReadOnlySpan<ulong> words, bool negative)
    {
        ulong r = 0;
        if (P > uint.MaxValue)
        {
            // r < p, so r·2^32 + w < p·2^32 < p² and the field's Barrett step applies.
            for (int i = words.Length - 1; i >= 0; i--)
            {
                ulong w = words[i];
                r = Field.Reduce(r >> 32, (r << 32) | (w >> 32));
                r = Field.Reduce(r >> 32, (r << 32) | (w & 0xFFFFFFFFUL));
            }
        }
        else
        {
            for (int i = words.Length - 1; i >= 0; i--)
            {
                ulong w = words[i];
                r = Reduce64((r << 32) | (w >> 32));
                r = Reduce64((r << 32) | (w & 0xFFFFFFFFUL));
            }
        }
        return negative && r != 0 ? P - r : r;
    }

    /// <summary>Σ a[i]·b[i] mod p over residues (delayed reduction: one fold per sixteen products).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public ulong Dot(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        int n = a.Length;
        if (n == 0) return 0;
        if (b.Length < n) throw new ArgumentException("dot product of spans of different lengths");
        if (P <= HalfWordLimit)
            return n >= HalfWordVectorThreshold && Avx512F.IsSupported ? DotHalfWordAvx512(a, b) : DotHalfWordScalar(a, b);
        if (n >= VectorDotThreshold && Avx512F.IsSupported) return DotAvx512(a, b);
        return DotScalar(a, b);
    }

    /// <summary>Moduli up to this bound (2^31) have residues that fit in 31 bits, so a product fits in
    /// 62 bits and four products fit in a word: the half-word kernels need no splitting and no carries.</summary>
    internal const ulong HalfWordLimit = 1UL << 31;

    /// <summary>Dot products at least this long use the half-word AVX-512 kernel.</summary>
    internal const int HalfWordVectorThreshold = 16;

    /// <summary>Σ a[i]·b[i] mod p for p ≤ 2^31, scalar: four products per word, then one reduction.</summary>
    internal ulong DotHalfWordScalar(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        int n = a.Length;
        ulong acc = 0;
        int i = 0;
        for (; i + 4 <= n; i += 4)
            acc = Reduce64(acc + a[i] * b[i] + a[i + 1] * b[i + 1] + a[i + 2] * b[i + 2]) + a[i + 3] * b[i + 3];
        for (; i < n; i++) acc = Reduce64(acc) + a[i] * b[i];
        return Reduce64(acc);
    }

    /// <summary>Σ a[i]·b[i] mod p for p ≤ 2^31 with AVX-512: one 32×32→64-bit multiply per term and lane,
    /// four rounds per lane before the lane sums are split into 32-bit halves and added to wide accumulators.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal ulong DotHalfWordAvx512(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        int n = a.Length;
        ref ulong ra = ref MemoryMarshal.GetReference(a);
        ref ulong rb = ref MemoryMarshal.GetReference(b);
        var mask32 = Vector512.Create(0xFFFFFFFFUL);
        Vector512<ulong> wl = default, wh = default;
        int i = 0;
        while (n - i >= 32)
        {
            var s = Avx512F.Multiply(Vector512.LoadUnsafe(ref ra, (nuint)i).AsUInt32(), Vector512.LoadUnsafe(ref rb, (nuint)i).AsUInt32());
            s += Avx512F.Multiply(Vector512.LoadUnsafe(ref ra, (nuint)(i + 8)).AsUInt32(), Vector512.LoadUnsafe(ref rb, (nuint)(i + 8)).AsUInt32());
            s += Avx512F.Multiply(Vector512.LoadUnsafe(ref ra, (nuint)(i + 16)).AsUInt32(), Vector512.LoadUnsafe(ref rb, (nuint)(i + 16)).AsUInt32());
            s += Avx512F.Multiply(Vector512.LoadUnsafe(ref ra, (nuint)(i + 24)).AsUInt32(), Vector512.LoadUnsafe(ref rb, (nuint)(i + 24)).AsUInt32());
            wl += s & mask32;
            wh += Vector512.ShiftRightLogical(s, 32);
            i += 32;
        }
        for (; n - i >= 8; i += 8)
        {
            var s = Avx512F.Multiply(Vector512.LoadUnsafe(ref ra, (nuint)i).AsUInt32(), Vector512.LoadUnsafe(ref rb, (nuint)i).AsUInt32());
            wl += s & mask32;
            wh += Vector512.ShiftRightLogical(s, 32);
        }
        ulong r = Wide(wl, wh);
        return i < n ? Add(r, DotHalfWordScalar(a[i..], b[i..])) : r;
    }

    /// <summary>Σ a[i]·b[i] mod p with AVX-512: every residue (below 2^62) is split into 31-bit halves,
    /// the four half-products (below 2^62) are summed in 64-bit lanes for four rounds, then the lane sums
    /// are split into 32-bit halves and added to wide accumulators; the four classes are combined with
    /// 2^31 and 2^62 mod p at the end.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    internal ulong DotAvx512(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        int n = a.Length;
        ref ulong ra = ref MemoryMarshal.GetReference(a);
        ref ulong rb = ref MemoryMarshal.GetReference(b);
        var mask31 = Vector512.Create((1UL << 31) - 1);
        var mask32 = Vector512.Create(0xFFFFFFFFUL);
        Vector512<ulong> w00l = default, w00h = default, w01l = default, w01h = default,
                         w10l = default, w10h = default, w11l = default, w11h = default;
        int i = 0;
        while (n - i >= 32)
        {
            Vector512<ulong> s00 = default, s01 = default, s10 = default, s11 = default;
            for (int round = 0; round < 4; round++, i += 8)
            {
                var va = Vector512.LoadUnsafe(ref ra, (nuint)i);
                var vb = Vector512.LoadUnsafe(ref rb, (nuint)i);
                var a0 = (va & mask31).AsUInt32();
                var a1 = Vector512.ShiftRightLogical(va, 31).AsUInt32();
                var b0 = (vb & mask31).AsUInt32();
                var b1 = Vector512.ShiftRightLogical(vb, 31).AsUInt32();
                s00 += Avx512F.Multiply(a0, b0);
                s01 += Avx512F.Multiply(a0, b1);
                s10 += Avx512F.Multiply(a1, b0);
                s11 += Avx512F.Multiply(a1, b1);
            }
            w00l += s00 & mask32; w00h += Vector512.ShiftRightLogical(s00, 32);
            w01l += s01 & mask32; w01h += Vector512.ShiftRightLogical(s01, 32);
            w10l += s10 & mask32; w10h += Vector512.ShiftRightLogical(s10, 32);
            w11l += s11 & mask32; w11h += Vector512.ShiftRightLogical(s11, 32);
        }
        ulong t00 = Wide(w00l, w00h), t01 = Wide(w01l, w01h), t10 = Wide(w10l, w10h), t11 = Wide(w11l, w11h);
        ulong mid = Add(t01, t10);
        ulong r = Add(Add(Multiply(t11, _r62), Multiply(mid, _r31)), t00);
        return i < n ? Add(r, DotScalar(a[i..], b[i..])) : r;
    }

    /// <summary>(Σ lanes of h)·2^32 + Σ lanes of l, mod p.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private ulong Wide(Vector512<ulong> l, Vector512<ulong> h)
    {
        ulong hs = Vector512.Sum(h), ls = Vector512.Sum(l);   // each below 2^64 for any realistic length
        UInt128 v = ((UInt128)hs << 32) + ls;
        return Reduce128((ulong)(v >> 64), (ulong)v);
    }

    internal ulong DotScalar(ReadOnlySpan<ulong> a, ReadOnlySpan<ulong> b)
    {
        int n = a.Length;
        ref ulong ra = ref MemoryMarshal.GetReference(a);
        ref ulong rb = ref MemoryMarshal.GetReference(b);
        // Two accumulators (even and odd terms). Invariant after a fold: hi < p < 2^62, so the value is
        // below 2^126; eight more products (each < 2^124) keep it below 2^128.
        ulong h0 = 0, l0 = 0, h1 = 0, l1 = 0;
        int i = 0;
        while (n - i >= 16)
        {
            int end = i + 16;
            for (; i < end; i += 2)
            {
                ulong ph = Math.BigMul(Unsafe.Add(ref ra, i), Unsafe.Add(ref rb, i), out ulong pl);
                l0 += pl;
                h0 += ph + (l0 < pl ? 1UL : 0UL);
                ph = Math.BigMul(Unsafe.Add(ref ra, i + 1), Unsafe.Add(ref rb, i + 1), out pl);
                l1 += pl;
                h1 += ph + (l1 < pl ? 1UL : 0UL);
            }
            h0 = Reduce64(h0);
            h1 = Reduce64(h1);
        }
        for (; i + 1 < n; i += 2)
        {
            ulong ph = Math.BigMul(Unsafe.Add(ref ra, i), Unsafe.Add(ref rb, i), out ulong pl);
            l0 += pl;
            h0 += ph + (l0 < pl ? 1UL : 0UL);
            ph = Math.BigMul(Unsafe.Add(ref ra, i + 1), Unsafe.Add(ref rb, i + 1), out pl);
            l1 += pl;
            h1 += ph + (l1 < pl ? 1UL : 0UL);
        }
        if (i < n)
        {
            ulong ph = Math.BigMul(Unsafe.Add(ref ra, i), Unsafe.Add(ref rb, i), out ulong pl);
            l0 += pl;
            h0 += ph + (l0 < pl ? 1UL : 0UL);
        }
        h0 = Reduce64(h0);
        h1 = Reduce64(h1);
        ulong lo = l0 + l1;
        ulong hi = h0 + h1 + (lo < l0 ? 1UL : 0UL);   // h0 + h1 < 2p < 2^63: no overflow
        return Reduce128(hi, lo);
    }
}
