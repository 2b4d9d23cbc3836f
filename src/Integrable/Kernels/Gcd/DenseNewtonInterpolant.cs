using System.Runtime.CompilerServices;

namespace Integrable.Kernels.Gcd;

/// <summary>Newton interpolation in x₁ of a polynomial in x₀, x₁ from dense univariate images in x₀:
/// the bivariate special case of <see cref="NewtonInterpolant"/>, with one row per power of x₀ and no
/// merging of supports.</summary>
internal sealed class DenseNewtonInterpolant
{
    private readonly int _rows;      // powers x₀^0 … x₀^(rows−1)
    private readonly int _cap;       // maximum number of points
    private readonly ulong[] _coeffs; // row i at [i·cap, (i+1)·cap)
    private readonly int[] _rowDegree;
    private readonly ulong[] _modulus;
    private int _points;

    public DenseNewtonInterpolant(int rows, int capacity)
    {
        _rows = rows;
        _cap = capacity;
        _coeffs = new ulong[rows * capacity];
        _rowDegree = new int[rows];
        _modulus = new ulong[capacity + 1];
        Reset();
    }

    public int Points => _points;

    public bool Unchanged { get; private set; }

    public int Degree { get; private set; } = -1;

    public void Reset()
    {
        if (_points > 0) Array.Clear(_coeffs);
        Array.Fill(_rowDegree, -1);
        _points = 0;
        Degree = -1;
        Unchanged = false;
    }

    /// <summary>Adds the image (dense in x₀, at most <c>rows</c> coefficients) at x₁ = α.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public bool Add(ReadOnlySpan<ulong> image, ulong alpha, in ModP f)
    {
        if (_points >= _cap || image.Length > _rows) return false;
        int pts = _points;
        var m = _modulus;
        if (pts == 0)
        {
            int deg0 = -1;
            for (int i = 0; i < image.Length; i++)
            {
                if (image[i] == 0) continue;
                _coeffs[i * _cap] = image[i];
                _rowDegree[i] = 0;
                deg0 = 0;
            }
            Array.Clear(m);
            m[0] = f.Neg(alpha);
            m[1] = 1;
            _points = 1;
            Degree = deg0;
            Unchanged = false;
            return true;
        }
        ulong inv = f.Inv(DenseModP.Evaluate(m.AsSpan(0, pts + 1), alpha, f));
        bool changed = false;
        int deg = -1;
        for (int i = 0; i < _rows; i++)
        {
            var row = _coeffs.AsSpan(i * _cap, _cap);
            int rd = _rowDegree[i];
            ulong e = 0;
            for (int d = rd; d >= 0; d--) e = f.Add(f.Mul(e, alpha), row[d]);
            ulong v = i < image.Length ? image[i] : 0;
            ulong delta = f.Mul(f.Sub(v, e), inv);
            if (delta != 0)
            {
                for (int d = 0; d <= pts; d++) row[d] = f.Add(row[d], f.Mul(delta, m[d]));
                _rowDegree[i] = rd = pts;
                changed = true;
            }
            if (rd > deg) deg = rd;
        }
        ulong na = f.Neg(alpha);
        for (int d = pts + 1; d >= 1; d--) m[d] = f.Add(m[d - 1], f.Mul(na, m[d]));
        m[0] = f.Mul(na, m[0]);
        _points = pts + 1;
        Degree = deg;
        Unchanged = !changed;
        return true;
    }

    /// <summary>The interpolant as groups (descending power of x₀, zero rows dropped), dense in x₁.</summary>
    public void ToGroups(out int count, out int[] mainExps, out ulong[][] dense)
    {
        int n = 0;
        for (int i = 0; i < _rows; i++) if (_rowDegree[i] >= 0) n++;
        mainExps = new int[n];
        dense = new ulong[n][];
        int r = 0;
        for (int i = _rows - 1; i >= 0; i--)
        {
            if (_rowDegree[i] < 0) continue;
            mainExps[r] = i;
            dense[r] = _coeffs.AsSpan(i * _cap, _rowDegree[i] + 1).ToArray();
            r++;
        }
        count = n;
    }
}
