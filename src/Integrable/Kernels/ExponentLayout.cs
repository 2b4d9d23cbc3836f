using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Numerics;

namespace Integrable.Kernels;

/// <summary>How shifted exponent vectors are packed into words.</summary>
/// <remarks>
/// <para>Each variable v gets a bit field of its own width, wide enough for the largest shifted
/// exponent (e_v − offset_v ≥ 0) the operation can produce, plus optionally one guard bit used by
/// division to detect a negative difference. Variables whose range is zero take no bits at all, so
/// polynomials that mention few of many ring variables still pack into one word.</para>
/// <para>Fields are placed from variable 0 downwards starting at the most significant bit of word
/// 0, never straddling a word; word 0 is the most significant word. Comparing packed vectors
/// word by word as unsigned integers is therefore lexicographic comparison of the exponent
/// vectors with variable 0 most significant, and adding packed vectors adds exponents (no field
/// overflows by construction).</para>
/// </remarks>
internal sealed class ExponentLayout
{
    /// <summary>Number of words per packed vector.</summary>
    public readonly int Words;
    /// <summary>Per variable: word index.</summary>
    public readonly int[] Word;
    /// <summary>Per variable: bit shift inside the word.</summary>
    public readonly int[] Shift;
    /// <summary>Per variable: field width in bits including the guard bit (0 for constant variables).</summary>
    public readonly int[] Bits;
    /// <summary>Per word: the mask of guard bits (top bit of each field), or 0 without guards.</summary>
    public readonly ulong[] GuardMask;

    private ExponentLayout(int words, int[] word, int[] shift, int[] bits, ulong[] guardMask)
    {
        Words = words;
        Word = word;
        Shift = shift;
        Bits = bits;
        GuardMask = guardMask;
    }

    /// <summary>Builds a layout whose field v holds values in [0, <paramref name="maxValue"/>[v]].</summary>
    /// <param name="maxValue">Largest shifted exponent per variable (non-negative).</param>
    /// <param name="guard">Add one guard bit to every non-empty field.</param>
    public static ExponentLayout Create(ReadOnlySpan<long> maxValue, bool guard)
    {
        int n = maxValue.Length;
        var word = new int[n];
        var shift = new int[n];
        var bits = new int[n];
        int w = 0, free = 64;
        for (int v = 0; v < n; v++)
        {
            int b = maxValue[v] == 0 ? 0 : 64 - BitOperations.LeadingZeroCount((ulong)maxValue[v]);
            if (b > 0 && guard) b++;
            if (b > 64) throw new OverflowException("Exponent range too large to pack.");
            if (b > free) { w++; free = 64; }
            free -= b;
            word[v] = w;
            shift[v] = free;
            bits[v] = b;
        }
        int words = w + 1;
        var guardMask = new ulong[words];
        if (guard)
            for (int v = 0; v < n; v++)
                if (bits[v] > 0) guardMask[word[v]] |= 1UL << (shift[v] + bits[v] - 1);
        return new ExponentLayout(words, word, shift, bits, guardMask);
    }

    /// <summary>Packs term-major exponents (<paramref name="nvars"/> per term) shifted by
    /// <paramref name="offset"/> into <paramref name="packed"/> (Words per term).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void Pack(ReadOnlySpan<int> exps, int nvars, ReadOnlySpan<int> offset, Span<ulong> packed)
    {
        int terms = exps.Length / nvars;
        if (packed.Length < terms * Words) throw new ArgumentException("Packed buffer too short.", nameof(packed));
        // Only the fields that take bits, grouped by word (fields follow the variable order, so the
        // fields of word w are the contiguous range start[w] .. start[w + 1] − 1).
        int active = 0;
        for (int v = 0; v < nvars; v++) if (Bits[v] > 0) active++;
        var vars = new int[active + 1];
        var shifts = new int[active + 1];
        var offsets = new long[active + 1];
        var start = new int[Words + 1];
        for (int v = 0, k = 0; v < nvars; v++)
        {
            if (Bits[v] == 0) continue;
            vars[k] = v; shifts[k] = Shift[v]; offsets[k] = offset[v];
            k++;
            start[Word[v] + 1] = k;
        }
        for (int w = 1; w <= Words; w++) start[w] = Math.Max(start[w], start[w - 1]);
        ref int e0 = ref MemoryMarshal.GetReference(exps);
        ref ulong p0 = ref MemoryMarshal.GetReference(packed);
        ref int vr = ref vars[0];
        ref int sr = ref shifts[0];
        ref long offr = ref offsets[0];
        for (int t = 0; t < terms; t++)
        {
            ref int e = ref Unsafe.Add(ref e0, (nint)t * nvars);
            ref ulong p = ref Unsafe.Add(ref p0, (nint)t * Words);
            for (int w = 0; w < Words; w++)
            {
                ulong x = 0;
                for (int k = start[w]; k < start[w + 1]; k++)
                    x |= (ulong)(Unsafe.Add(ref e, Unsafe.Add(ref vr, k)) - Unsafe.Add(ref offr, k)) << Unsafe.Add(ref sr, k);
                Unsafe.Add(ref p, w) = x;
            }
        }
    }

    /// <summary>Unpacks <paramref name="terms"/> vectors and adds <paramref name="offset"/> back.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void Unpack(ReadOnlySpan<ulong> packed, int terms, int nvars, ReadOnlySpan<long> offset, Span<int> exps)
    {
        for (int t = 0; t < terms; t++)
        {
            var p = packed.Slice(t * Words, Words);
            var e = exps.Slice(t * nvars, nvars);
            for (int v = 0; v < nvars; v++)
            {
                int b = Bits[v];
                ulong field = b == 0 ? 0 : (p[Word[v]] >> Shift[v]) & (b == 64 ? ulong.MaxValue : (1UL << b) - 1);
                e[v] = checked((int)((long)field + offset[v]));
            }
        }
    }
}
