using System.Runtime.CompilerServices;

namespace Integrable.Kernels.Univariate;

/// <summary>Repeated reduction modulo one fixed polynomial m: long division for small m, otherwise the
/// power-series inverse of the reversed m is computed once and every remainder costs two products.</summary>
internal sealed class PolyReducer
{
    private readonly PolyModContext _ctx;
    private readonly ulong[] _m;
    private ulong[]? _revInverse;   // (rev m)^{-1} mod x^(deg m)

    public PolyReducer(PolyModContext ctx, ulong[] m)
    {
        _ctx = ctx;
        _m = m;
        long d = m.Length - 1;
        if (d >= UnivariateThresholds.NewtonDivision && d * d >= UnivariateThresholds.NewtonDivisionWork)
            _revInverse = PolyMod.InverseSeries(ctx, PolyMod.Reverse(m, m.Length), m.Length - 1);
    }

    /// <summary>a mod m for deg a ≤ 2·deg m − 2 (any a when long division is used).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public ulong[] Reduce(ulong[] a)
    {
        if (a.Length < _m.Length) return a;
        int lq = a.Length - _m.Length + 1;
        if (_revInverse is null || lq > _revInverse.Length) return PolyMod.DivRem(_ctx, a, _m).Remainder;
        var q = PolyMod.QuotientFromInverse(_ctx, a, _m.Length, _revInverse);
        return PolyMod.RemainderWrapped(_ctx, a, _m, q);
    }
}
