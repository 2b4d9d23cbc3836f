using System.Numerics;
using System.Runtime.CompilerServices;
using Integrable.Numbers;

namespace Integrable.Kernels.LinearAlgebra;

/// <summary>Chinese remaindering of many values at once in mixed radix (Garner): each value modulo
/// M = p_0⋯p_{k−1} is kept as digits v_0, …, v_{k−1} with x = v_0 + v_1·p_0 + v_2·p_0·p_1 + ⋯, so adding
/// an image modulo a new prime costs O(k) word operations per value and no big-integer arithmetic; big
/// integers are only built for the values actually reconstructed.</summary>
internal sealed class MixedRadixAccumulator
{
    private readonly int _count;
    private readonly List<ulong> _primes = [];
    private ulong[] _digits;           // entry-major: value e has digits _digits[e·_capacity .. + k)
    private int _capacity;

    public MixedRadixAccumulator(int count)
    {
        _count = count;
        _capacity = 4;
        _digits = new ulong[Math.Max(1, count * _capacity)];
        Modulus = BigInteger.One;
    }

    /// <summary>The number of primes combined so far.</summary>
    public int PrimeCount => _primes.Count;

    /// <summary>The product of the primes combined so far.</summary>
    public BigInteger Modulus { get; private set; }

    /// <summary>Adds the images of all values modulo a new prime (coprime to the earlier ones).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void Add(ModularReducer reducer, ReadOnlySpan<ulong> image)
    {
        int k = _primes.Count;
        if (k == _capacity) Grow();
        ulong p = reducer.P;
        int cap = _capacity;
        if (k == 0)
        {
            for (int e = 0; e < _count; e++) _digits[e * cap] = image[e];
        }
        else
        {
            // pm[j] = p_j mod p; c = (p_0⋯p_{k−1})⁻¹ mod p.
            Span<ulong> pm = k <= 256 ? stackalloc ulong[k] : new ulong[k];
            ulong prod = 1;
            for (int j = 0; j < k; j++) { pm[j] = reducer.Reduce64(_primes[j]); prod = reducer.Multiply(prod, pm[j]); }
            ulong c = reducer.Inverse(prod);
            for (int e = 0; e < _count; e++)
            {
                var d = _digits.AsSpan(e * cap, k + 1);
                // x mod p by Horner on the digits, then the new digit.
                ulong t = d[k - 1] < p ? d[k - 1] : reducer.Reduce64(d[k - 1]);
                for (int j = k - 2; j >= 0; j--)
                {
                    ulong v = d[j] < p ? d[j] : reducer.Reduce64(d[j]);
                    t = reducer.Add(reducer.Multiply(t, pm[j]), v);
                }
                d[k] = reducer.Multiply(reducer.Subtract(image[e], t), c);
            }
        }
        _primes.Add(p);
        Modulus *= p;
    }

    /// <summary>Value <paramref name="entry"/> as an integer in [0, M).</summary>
    public BigInteger Value(int entry)
    {
        int k = _primes.Count;
        if (k == 0) return BigInteger.Zero;
        var d = _digits.AsSpan(entry * _capacity, k);
        // Horner from the top digit: w = w·p_j + v_j, on words.
        var w = new ulong[k + 1];
        int len = 1;
        w[0] = d[k - 1];
        for (int j = k - 2; j >= 0; j--) len = WordArithmetic.MulWordAdd(w, len, _primes[j], d[j]);
        return WordArithmetic.ToBigInteger(w.AsSpan(0, len), false);
    }

    /// <summary>True when value <paramref name="entry"/> is zero modulo M.</summary>
    public bool IsZero(int entry)
    {
        var d = _digits.AsSpan(entry * _capacity, _primes.Count);
        return !d.ContainsAnyExcept(0UL);
    }

    /// <summary>Value <paramref name="entry"/> when M is a single prime.</summary>
    public ulong Word(int entry) => _digits[entry * _capacity];

    private void Grow()
    {
        int cap = _capacity * 2;
        var nd = new ulong[Math.Max(1, _count * cap)];
        for (int e = 0; e < _count; e++) _digits.AsSpan(e * _capacity, _capacity).CopyTo(nd.AsSpan(e * cap));
        _digits = nd;
        _capacity = cap;
    }
}
