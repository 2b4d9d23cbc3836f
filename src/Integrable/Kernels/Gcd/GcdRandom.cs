namespace Integrable.Kernels.Gcd;

/// <summary>A small deterministic generator (xorshift64*) for evaluation points, so that modular gcds
/// are reproducible run to run.</summary>
internal sealed class GcdRandom
{
    private ulong _state;

    public GcdRandom(ulong seed) => _state = seed == 0 ? 0x9E3779B97F4A7C15UL : seed;

    public ulong Next()
    {
        ulong x = _state;
        x ^= x >> 12;
        x ^= x << 25;
        x ^= x >> 27;
        _state = x;
        return x * 0x2545F4914F6CDD1DUL;
    }

    /// <summary>A residue in [1, p).</summary>
    public ulong NextResidue(ulong p) => 1 + Next() % (p - 1);
}
