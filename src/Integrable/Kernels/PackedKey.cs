using System.Runtime.CompilerServices;

namespace Integrable.Kernels;

/// <summary>A packed exponent of a fixed number of words held by value (in a heap entry or a local),
/// so that comparisons and sums are inlined register operations instead of span loops over a row
/// buffer. Word 0 is the most significant; fields never straddle words and never overflow, so sums
/// add the words independently and word-by-word comparison is the lexicographic order of the exponent
/// vectors. Used by the heap multiplication and the divisor-heap division.</summary>
internal interface IPackedKey<TSelf> where TSelf : struct, IPackedKey<TSelf>
{
    /// <summary>Words per term.</summary>
    static abstract int Words { get; }

    /// <summary>The exponent of term <paramref name="index"/> of a packed array.</summary>
    static abstract TSelf Load(ReadOnlySpan<ulong> packed, int index);

    /// <summary>The sum of term <paramref name="i"/> of <paramref name="a"/> and term
    /// <paramref name="j"/> of <paramref name="b"/>.</summary>
    static abstract TSelf Sum(ref ulong a, int i, ref ulong b, int j);

    /// <summary>x + y (the product of the monomials).</summary>
    static abstract TSelf Add(TSelf x, TSelf y);

    /// <summary>x &gt; y in the lexicographic order of the words.</summary>
    static abstract bool Greater(TSelf x, TSelf y);

    /// <summary>x = y.</summary>
    static abstract bool Same(TSelf x, TSelf y);

    /// <summary>Writes the words of <paramref name="x"/> at <paramref name="dst"/>.</summary>
    static abstract void Store(ref ulong dst, TSelf x);

    /// <summary>t = exp − d0 word by word, when that is a monomial (no field borrows: guard bits clear)
    /// inside the quotient's box [0, qMax]; false otherwise.</summary>
    static abstract bool TryQuotientExponent(TSelf exp, TSelf d0, TSelf guard, TSelf qMax, out TSelf t);
}

/// <summary>One packed word.</summary>
internal struct Key1 : IPackedKey<Key1>
{
    public ulong W;
    public Key1(ulong w) => W = w;
    public static int Words => 1;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key1 Load(ReadOnlySpan<ulong> packed, int index) => new(packed[index]);
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key1 Sum(ref ulong a, int i, ref ulong b, int j) => new(Unsafe.Add(ref a, i) + Unsafe.Add(ref b, j));
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key1 Add(Key1 x, Key1 y) => new(x.W + y.W);
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool Greater(Key1 x, Key1 y) => x.W > y.W;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool Same(Key1 x, Key1 y) => x.W == y.W;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Store(ref ulong dst, Key1 x) => dst = x.W;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool TryQuotientExponent(Key1 exp, Key1 d0, Key1 guard, Key1 qMax, out Key1 t) =>
        TryWord(exp.W, d0.W, guard.W, qMax.W, out t.W);

    /// <summary>One word of <see cref="TryQuotientExponent"/>.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static bool TryWord(ulong exp, ulong d0, ulong guard, ulong qMax, out ulong t)
    {
        t = exp - d0;
        return (t & guard) == 0 && exp >= d0 && ((qMax - t) & guard) == 0 && t <= qMax;
    }
}

/// <summary>Two packed words, compared high word first (24-byte heap entries; a UInt128 key measured
/// the same speed with 32-byte entries).</summary>
internal struct Key2 : IPackedKey<Key2>
{
    public ulong Hi, Lo;
    public Key2(ulong hi, ulong lo) { Hi = hi; Lo = lo; }
    public static int Words => 2;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key2 Load(ReadOnlySpan<ulong> packed, int index) => new(packed[2 * index], packed[2 * index + 1]);
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key2 Sum(ref ulong a, int i, ref ulong b, int j)
    {
        ref ulong x = ref Unsafe.Add(ref a, 2 * i);
        ref ulong y = ref Unsafe.Add(ref b, 2 * j);
        return new(x + y, Unsafe.Add(ref x, 1) + Unsafe.Add(ref y, 1));
    }
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key2 Add(Key2 x, Key2 y) => new(x.Hi + y.Hi, x.Lo + y.Lo);
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool Greater(Key2 x, Key2 y) => x.Hi > y.Hi || (x.Hi == y.Hi && x.Lo > y.Lo);
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool Same(Key2 x, Key2 y) => x.Hi == y.Hi && x.Lo == y.Lo;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Store(ref ulong dst, Key2 x) { dst = x.Hi; Unsafe.Add(ref dst, 1) = x.Lo; }
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool TryQuotientExponent(Key2 exp, Key2 d0, Key2 guard, Key2 qMax, out Key2 t) =>
        Key1.TryWord(exp.Hi, d0.Hi, guard.Hi, qMax.Hi, out t.Hi) & Key1.TryWord(exp.Lo, d0.Lo, guard.Lo, qMax.Lo, out t.Lo);
}

/// <summary>Three packed words, word 0 most significant (many-variable layouts such as the octahedron
/// recurrence's light cone).</summary>
internal struct Key3 : IPackedKey<Key3>
{
    public ulong W0, W1, W2;
    public Key3(ulong w0, ulong w1, ulong w2) { W0 = w0; W1 = w1; W2 = w2; }
    public static int Words => 3;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key3 Load(ReadOnlySpan<ulong> packed, int index) => new(packed[3 * index], packed[3 * index + 1], packed[3 * index + 2]);
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key3 Sum(ref ulong a, int i, ref ulong b, int j)
    {
        ref ulong x = ref Unsafe.Add(ref a, 3 * i);
        ref ulong y = ref Unsafe.Add(ref b, 3 * j);
        return new(x + y, Unsafe.Add(ref x, 1) + Unsafe.Add(ref y, 1), Unsafe.Add(ref x, 2) + Unsafe.Add(ref y, 2));
    }
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key3 Add(Key3 x, Key3 y) => new(x.W0 + y.W0, x.W1 + y.W1, x.W2 + y.W2);
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool Greater(Key3 x, Key3 y) =>
        x.W0 != y.W0 ? x.W0 > y.W0 : x.W1 != y.W1 ? x.W1 > y.W1 : x.W2 > y.W2;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool Same(Key3 x, Key3 y) => x.W0 == y.W0 && x.W1 == y.W1 && x.W2 == y.W2;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Store(ref ulong dst, Key3 x) { dst = x.W0; Unsafe.Add(ref dst, 1) = x.W1; Unsafe.Add(ref dst, 2) = x.W2; }
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool TryQuotientExponent(Key3 exp, Key3 d0, Key3 guard, Key3 qMax, out Key3 t) =>
        Key1.TryWord(exp.W0, d0.W0, guard.W0, qMax.W0, out t.W0) & Key1.TryWord(exp.W1, d0.W1, guard.W1, qMax.W1, out t.W1)
        & Key1.TryWord(exp.W2, d0.W2, guard.W2, qMax.W2, out t.W2);
}

/// <summary>Four packed words, word 0 most significant.</summary>
internal struct Key4 : IPackedKey<Key4>
{
    public ulong W0, W1, W2, W3;
    public Key4(ulong w0, ulong w1, ulong w2, ulong w3) { W0 = w0; W1 = w1; W2 = w2; W3 = w3; }
    public static int Words => 4;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key4 Load(ReadOnlySpan<ulong> packed, int index) =>
        new(packed[4 * index], packed[4 * index + 1], packed[4 * index + 2], packed[4 * index + 3]);
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key4 Sum(ref ulong a, int i, ref ulong b, int j)
    {
        ref ulong x = ref Unsafe.Add(ref a, 4 * i);
        ref ulong y = ref Unsafe.Add(ref b, 4 * j);
        return new(x + y, Unsafe.Add(ref x, 1) + Unsafe.Add(ref y, 1), Unsafe.Add(ref x, 2) + Unsafe.Add(ref y, 2),
            Unsafe.Add(ref x, 3) + Unsafe.Add(ref y, 3));
    }
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static Key4 Add(Key4 x, Key4 y) => new(x.W0 + y.W0, x.W1 + y.W1, x.W2 + y.W2, x.W3 + y.W3);
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool Greater(Key4 x, Key4 y) =>
        x.W0 != y.W0 ? x.W0 > y.W0 : x.W1 != y.W1 ? x.W1 > y.W1 : x.W2 != y.W2 ? x.W2 > y.W2 : x.W3 > y.W3;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool Same(Key4 x, Key4 y) => x.W0 == y.W0 && x.W1 == y.W1 && x.W2 == y.W2 && x.W3 == y.W3;
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Store(ref ulong dst, Key4 x)
    {
        dst = x.W0; Unsafe.Add(ref dst, 1) = x.W1; Unsafe.Add(ref dst, 2) = x.W2; Unsafe.Add(ref dst, 3) = x.W3;
    }
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool TryQuotientExponent(Key4 exp, Key4 d0, Key4 guard, Key4 qMax, out Key4 t) =>
        Key1.TryWord(exp.W0, d0.W0, guard.W0, qMax.W0, out t.W0) & Key1.TryWord(exp.W1, d0.W1, guard.W1, qMax.W1, out t.W1)
        & Key1.TryWord(exp.W2, d0.W2, guard.W2, qMax.W2, out t.W2) & Key1.TryWord(exp.W3, d0.W3, guard.W3, qMax.W3, out t.W3);
}
