using System.Runtime.CompilerServices;
namespace Integrable.Kernels.Gcd;

/// <summary>Incremental Newton interpolation of a polynomial in x₀..x_{m−1}, x_m from its images at
/// points x_m = α (polynomials in x₀..x_{m−1}): H ← H + (image − H(α))·M(x)/M(α) with
/// M = Π(x − αᵢ) over the points used so far. Coefficients are kept in the monomial basis, one dense
/// array per main monomial, so the degree in x_m is known after every step.</summary>
internal sealed class NewtonInterpolant
{
    private readonly int _m;        // variables per main monomial
    private readonly int _cap;      // maximum number of points
    private int _count;
    private int[] _exps;
    private ulong[] _coeffs;        // _count rows of _cap coefficients
    private int[] _rowDegree;       // −1 for a zero row
    private readonly ulong[] _modulus;  // M, _cap + 1 coefficients
    private int _points;

    public NewtonInterpolant(int mainVars, int capacity)
    {
        _m = mainVars;
        _cap = capacity;
        _exps = [];
        _coeffs = [];
        _rowDegree = [];
        _modulus = new ulong[capacity + 1];
    }

    /// <summary>Number of points used.</summary>
    public int Points => _points;

    /// <summary>True when the last <see cref="Add"/> left the interpolant unchanged.</summary>
    public bool Unchanged { get; private set; }

    /// <summary>Degree of the interpolant in the interpolation variable (−1 when zero).</summary>
    public int Degree { get; private set; } = -1;

    public void Reset()
    {
        _count = 0;
        _points = 0;
        Degree = -1;
        Unchanged = false;
    }

    /// <summary>Adds the image at x = <paramref name="alpha"/> (a point not used before).</summary>
    /// <returns>False when the capacity is exhausted.</returns>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public bool Add(SparseModPoly image, ulong alpha, in ModP f)
    {
        if (_points >= _cap) return false;
        int m = _m;
        if (_points == 0)
        {
            _count = image.Count;
            _exps = image.Exps.AsSpan(0, image.Count * m).ToArray();
            _coeffs = new ulong[_count * _cap];
            _rowDegree = new int[_count];
            for (int j = 0; j < _count; j++) _coeffs[j * _cap] = image.Coeffs[j];
            Array.Clear(_modulus);
            _modulus[0] = f.Neg(alpha);
            _modulus[1] = 1;
            _points = 1;
            Degree = _count > 0 ? 0 : -1;
            Unchanged = false;
            return true;
        }

        int pts = _points;
        ulong mAlpha = DenseModP.Evaluate(_modulus.AsSpan(0, pts + 1), alpha, f);
        ulong inv = f.Inv(mAlpha);

        // Union of the supports (both sorted in descending lex order).
        int union = 0;
        {
            int i = 0, j = 0;
            while (i < _count || j < image.Count)
            {
                int c = i == _count ? -1 : j == image.Count ? 1 : PolynomialAdd.Compare(_exps.AsSpan(i * m, m), image.Exps.AsSpan(j * m, m));
                if (c >= 0) i++;
                if (c <= 0) j++;
                union++;
            }
        }
        if (union != _count)
        {
            var exps = new int[union * m];
            var coeffs = new ulong[union * _cap];
            var rowDeg = new int[union];
            int i = 0, j = 0, r = 0;
            while (i < _count || j < image.Count)
            {
                int c = i == _count ? -1 : j == image.Count ? 1 : PolynomialAdd.Compare(_exps.AsSpan(i * m, m), image.Exps.AsSpan(j * m, m));
                if (c >= 0)
                {
                    Array.Copy(_exps, i * m, exps, r * m, m);
                    Array.Copy(_coeffs, i * _cap, coeffs, r * _cap, _cap);
                    rowDeg[r] = _rowDegree[i];
                    i++;
                }
                else
                {
                    Array.Copy(image.Exps, j * m, exps, r * m, m);
                    rowDeg[r] = -1;
                }
                if (c <= 0) j++;
                r++;
            }
            _exps = exps;
            _coeffs = coeffs;
            _rowDegree = rowDeg;
            _count = union;
        }

        bool changed = false;
        int deg = -1;
        {
            int j = 0;
            for (int i = 0; i < _count; i++)
            {
                ulong v = 0;
                if (j < image.Count && PolynomialAdd.Compare(_exps.AsSpan(i * m, m), image.Exps.AsSpan(j * m, m)) == 0)
                    v = image.Coeffs[j++];
                var row = _coeffs.AsSpan(i * _cap, _cap);
                int rd = _rowDegree[i];
                ulong e = 0;
                for (int d = rd; d >= 0; d--) e = f.Add(f.Mul(e, alpha), row[d]);
                ulong delta = f.Mul(f.Sub(v, e), inv);
                if (delta != 0)
                {
                    for (int d = 0; d <= pts; d++) row[d] = f.Add(row[d], f.Mul(delta, _modulus[d]));
                    _rowDegree[i] = rd = pts;
                    changed = true;
                }
                if (rd > deg) deg = rd;
            }
        }

        // M ← M·(x − α)
        ulong na = f.Neg(alpha);
        for (int d = pts + 1; d >= 1; d--) _modulus[d] = f.Add(_modulus[d - 1], f.Mul(na, _modulus[d]));
        _modulus[0] = f.Mul(na, _modulus[0]);
        _points = pts + 1;
        Degree = deg;
        Unchanged = !changed;
        return true;
    }

    /// <summary>The interpolant as groups: main monomials and trimmed dense coefficients (zero rows dropped).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public void ToGroups(out int count, out int[] mainExps, out ulong[][] dense)
    {
        int m = _m, n = 0;
        for (int i = 0; i < _count; i++) if (_rowDegree[i] >= 0) n++;
        mainExps = new int[n * m];
        dense = new ulong[n][];
        int r = 0;
        for (int i = 0; i < _count; i++)
        {
            if (_rowDegree[i] < 0) continue;
            Array.Copy(_exps, i * m, mainExps, r * m, m);
            dense[r] = DenseModP.Trim(_coeffs.AsSpan(i * _cap, _rowDegree[i] + 1).ToArray());
            r++;
        }
        count = n;
    }
}
