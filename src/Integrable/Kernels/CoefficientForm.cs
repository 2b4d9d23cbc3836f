using System.Runtime.CompilerServices;
using System.Numerics;
using Integrable.Numbers;

namespace Integrable.Kernels;

/// <summary>Turns rational coefficients into integers over one common denominator, so that the
/// inner loops run on machine words (or big integers) instead of rationals.</summary>
internal static class CoefficientForm
{
    /// <summary>Writes c_i = words_i / denominator with every words_i and the denominator in a word
    /// (|words_i| &lt; 2^63). Fails when some value does not fit.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static bool TryWords(ReadOnlySpan<Rational> c, out long[] words, out long denominator)
    {
        words = new long[c.Length];
        denominator = 1;
        bool allIntegers = true;
        for (int i = 0; i < c.Length; i++)
        {
            if (!c[i].TryGetSmall(out long n, out long d)) return false;
            words[i] = n;
            if (d != 1)
            {
                allIntegers = false;
                ulong g = IntegerMath.Gcd((ulong)denominator, (ulong)d);
                long f = d / (long)g;
                long hi = Math.BigMul(denominator, f, out long lo);
                if (hi != 0 || lo < 0) return false;
                denominator = lo;
            }
        }
        if (allIntegers) return true;
        for (int i = 0; i < c.Length; i++)
        {
            c[i].TryGetSmall(out long n, out long d);
            long scale = denominator / d;
            long hi = Math.BigMul(n, scale, out long lo);
            if (hi != (lo >> 63) || lo == long.MinValue) return false;
            words[i] = lo;
        }
        return true;
    }

    /// <summary>Writes c_i = x_i / denominator with every |x_i| &lt; 2^126 (the dividend form of exact
    /// division): in <paramref name="words"/> when every value and the denominator fit in a word
    /// (<see cref="TryWords"/>, no big integers; <paramref name="wide"/> is then null and the caller widens
    /// only if it needs 128 bits), else in <paramref name="wide"/> through big integers
    /// (<paramref name="words"/> null). Both routes give the same least common denominator and the same
    /// scaled numerators. Fails when some value does not fit in 126 bits.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static bool TryWide(ReadOnlySpan<Rational> c, out long[]? words, out Int128[]? wide, out BigInteger denominator)
    {
        wide = null;
        if (TryWords(c, out var w, out long den))
        {
            words = w;
            denominator = den;
            return true;
        }
        words = null;
        ToBig(c, out var ints, out denominator);
        var x = new Int128[c.Length];
        var limit = BigInteger.One << 126;
        for (int i = 0; i < ints.Length; i++)
        {
            if (BigInteger.Abs(ints[i]) >= limit) return false;
            x[i] = (Int128)ints[i];
        }
        wide = x;
        return true;
    }

    /// <summary>The multi-limb form of integer coefficients read straight from the rationals (no common
    /// denominator, no intermediate big integers for word-size values); false when some coefficient is not
    /// an integer or has more bits than <typeparamref name="TM"/> holds.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static bool TryIntegerMagnitudes<TM>(ReadOnlySpan<Rational> c, out TM[] magnitudes)
        where TM : struct, IMagnitude<TM>
    {
        magnitudes = new TM[c.Length];
        for (int i = 0; i < c.Length; i++)
        {
            if (c[i].TryGetSmall(out long n, out long d))
            {
                if (d != 1) return false;
                magnitudes[i] = TM.FromWord(n);
            }
            else if (!c[i].IsInteger || !TM.TryFrom(c[i].Numerator, out magnitudes[i])) return false;
        }
        return true;
    }

    /// <summary>The multi-limb form of integers, or false when some value has more bits than
    /// <typeparamref name="TM"/> holds.</summary>
    public static bool TryMagnitudes<TM>(ReadOnlySpan<BigInteger> ints, out TM[] magnitudes)
        where TM : struct, IMagnitude<TM>
    {
        magnitudes = new TM[ints.Length];
        for (int i = 0; i < ints.Length; i++)
            if (!TM.TryFrom(ints[i], out magnitudes[i])) return false;
        return true;
    }

    /// <summary>Bit length of the largest |c_i|, or −1 when some coefficient is not an integer.</summary>
    public static int IntegerBits(ReadOnlySpan<Rational> c)
    {
        int bits = 0;
        ulong or = 0;
        foreach (var r in c)
        {
            if (r.TryGetSmall(out long n, out long d))
            {
                if (d != 1) return -1;
                or |= IntegerMath.UnsignedAbs(n);
            }
            else if (!r.IsInteger) return -1;
            else bits = Math.Max(bits, (int)BigInteger.Abs(r.Numerator).GetBitLength());
        }
        return Math.Max(bits, 64 - BitOperations.LeadingZeroCount(or));
    }

    /// <summary>Writes c_i = ints_i / denominator with big integers.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static void ToBig(ReadOnlySpan<Rational> c, out BigInteger[] ints, out BigInteger denominator)
    {
        denominator = BigInteger.One;
        foreach (var r in c)
        {
            var d = r.Denominator;
            if (!d.IsOne) denominator = denominator / BigInteger.GreatestCommonDivisor(denominator, d) * d;
        }
        ints = new BigInteger[c.Length];
        for (int i = 0; i < c.Length; i++)
            ints[i] = denominator.IsOne ? c[i].Numerator : c[i].Numerator * (denominator / c[i].Denominator);
    }
}
