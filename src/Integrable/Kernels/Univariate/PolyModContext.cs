using System.Collections.Concurrent;
using Integrable.Numbers;

namespace Integrable.Kernels.Univariate;

/// <summary>Per-modulus state shared by all dense polynomials over one Z/pZ: the reducer constants and
/// the transform multiplier (created on first use). One instance per prime, cached.</summary>
internal sealed class PolyModContext
{
    private static readonly ConcurrentDictionary<ulong, PolyModContext> Cache = new();

    public readonly PrimeField Field;
    public readonly ModulusReducer Mod;
    private NttMultiplier? _ntt;

    private PolyModContext(PrimeField field)
    {
        Field = field;
        Mod = new ModulusReducer(field.Modulus);
    }

    /// <summary>The shared context of <paramref name="field"/>.</summary>
    public static PolyModContext For(PrimeField field) =>
        Cache.TryGetValue(field.Modulus, out var c) ? c : Cache.GetOrAdd(field.Modulus, _ => new PolyModContext(field));

    /// <summary>The transform multiplier for this modulus.</summary>
    public NttMultiplier Ntt => _ntt ??= new NttMultiplier(Mod.P);

    public ulong P => Mod.P;
}
