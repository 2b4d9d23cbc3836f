using System.Globalization;
using System.Text;
using Integrable.Numbers;

namespace Integrable.Benchmarks;

/// <summary>The W5 matrices built in process, entry for entry the same as the anchor generator
/// (../shared/anchors/w5_nullspace/gen_matrices.py): the random integer matrix with a built-in rank
/// deficiency (same 64-bit LCG, same sampling order) and the orbit matrices of the map
/// (x, y) → (y, (y − 1)/(g y) − y − x), g = 1/12, from (1/2, 2/3).</summary>
public static class W5Matrices
{
    private sealed class Lcg(ulong seed)
    {
        private ulong _s = seed;

        public ulong Next()
        {
            _s = unchecked(6364136223846793005UL * _s + 1442695040888963407UL);
            return _s >> 33;
        }

        public long RandInt(long lo, long hi) => lo + (long)(Next() % (ulong)(hi - lo + 1));
    }

    /// <summary>R × C integer matrix, entries in [−100, 100], DEF columns are sums of two others, columns shuffled.</summary>
    public static (int Rows, int Cols, Rational[] Data) Random(int rows, int cols, int deficiency, ulong seed = 20240601)
    {
        var rng = new Lcg(seed);
        int baseCols = cols - deficiency;
        var a = new long[rows][];
        for (int r = 0; r < rows; r++)
        {
            a[r] = new long[cols];
            for (int c = 0; c < baseCols; c++) a[r][c] = rng.RandInt(-100, 100);
        }
        for (int r = 0; r < rows; r++)
        {
            for (int j = 0; j < deficiency; j++)
            {
                int x = 2 * j, y = 2 * j + 1;
                while (Math.Abs(a[r][x] + a[r][y]) > 100)
                {
                    a[r][x] = rng.RandInt(-100, 100);
                    a[r][y] = rng.RandInt(-100, 100);
                }
                a[r][baseCols + j] = a[r][x] + a[r][y];
            }
        }
        var perm = Enumerable.Range(0, cols).ToArray();
        for (int i = cols - 1; i > 0; i--)
        {
            int k = (int)rng.RandInt(0, i);
            (perm[i], perm[k]) = (perm[k], perm[i]);
        }
        var data = new Rational[rows * cols];
        for (int r = 0; r < rows; r++)
            for (int c = 0; c < cols; c++) data[r * cols + c] = a[r][perm[c]];
        return (rows, cols, data);
    }

    /// <summary>Rows = orbit points 1..M, columns = monomials x^i y^j with i + j ≤ D (graded, i descending).</summary>
    public static (int Rows, int Cols, Rational[] Data) Orbit(int points, int degree)
    {
        var g = new Rational(1, 12);
        Rational x = new(1, 2), y = new(2, 3);
        var mons = new List<(int I, int J)>();
        for (int d = 0; d <= degree; d++)
            for (int i = d; i >= 0; i--) mons.Add((i, d - i));
        var data = new Rational[points * mons.Count];
        for (int k = 0; k < points; k++)
        {
            (x, y) = (y, (y - 1) / (g * y) - y - x);
            for (int c = 0; c < mons.Count; c++) data[k * mons.Count + c] = x.Pow(mons[c].I) * y.Pow(mons[c].J);
        }
        return (points, mons.Count, data);
    }

    /// <summary>The text format of the generator: "rows cols", then one row per line.</summary>
    public static string ToText(int rows, int cols, Rational[] data)
    {
        var sb = new StringBuilder();
        sb.Append(rows.ToString(CultureInfo.InvariantCulture)).Append(' ').Append(cols.ToString(CultureInfo.InvariantCulture)).Append('\n');
        for (int r = 0; r < rows; r++)
        {
            for (int c = 0; c < cols; c++)
            {
                if (c > 0) sb.Append(' ');
                sb.Append(data[r * cols + c].ToString());
            }
            sb.Append('\n');
        }
        return sb.ToString();
    }
}
