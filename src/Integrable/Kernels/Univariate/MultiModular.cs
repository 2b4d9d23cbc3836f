using System.Numerics;
using System.Runtime.CompilerServices;

namespace Integrable.Kernels.Univariate;

/// <summary>Incremental Chinese remaindering of a vector of residues over several word primes: the
/// symmetric representatives (in (−M/2, M/2]) are updated in O(length) big-integer word operations per
/// new prime, and <see cref="Stable"/> tells whether the last prime changed nothing.</summary>
internal sealed class MultiModular
{
    private readonly BigInteger[] _values;

    public MultiModular(int count)
    {
        _values = new BigInteger[count];
    }

    /// <summary>Product of the primes added so far.</summary>
    public BigInteger Modulus { get; private set; } = BigInteger.One;

    /// <summary>Number of primes added.</summary>
    public int Count { get; private set; }

    /// <summary>True when the last prime added left every value unchanged (and at least two were added).</summary>
    public bool Stable { get; private set; }

    /// <summary>Adds residues modulo a new prime (entries beyond the span are zero).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void Add(ulong p, ReadOnlySpan<ulong> residues)
    {
        var mod = new ModulusReducer(p);
        ulong mInv = mod.Inverse(IntegerPoly.Residue(Modulus, p));
        var newModulus = Modulus * p;
        var half = newModulus >> 1;
        bool changed = false;
        for (int c = 0; c < _values.Length; c++)
        {
            ulong r = c < residues.Length ? residues[c] : 0;
            var old = _values[c];
            ulong oldModP = IntegerPoly.Residue(old, p);
            if (oldModP == r) continue;
            ulong t = mod.Mul(mod.Sub(r, oldModP), mInv);
            var v = old + Modulus * t;
            if (v > half) v -= newModulus;
            _values[c] = v;
            changed = true;
        }
        Modulus = newModulus;
        Count++;
        Stable = !changed && Count >= 2;
    }

    /// <summary>The current symmetric representatives (a copy).</summary>
    public BigInteger[] Reconstruct() => (BigInteger[])_values.Clone();
}
