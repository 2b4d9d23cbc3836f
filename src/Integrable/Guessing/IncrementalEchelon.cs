using Integrable.Series;

namespace Integrable.Guessing;

/// <summary>A minimal internal Gaussian elimination over a field that takes equations one at a time and keeps
/// the reduced row echelon form, so that the rank after each equation is known (used to tell the equations
/// that determined a solution space from those that only confirmed it).</summary>
internal sealed class IncrementalEchelon<T>
{
    private readonly CoefficientDomain<T> _d;
    private readonly int _columns;
    private readonly List<T[]> _rows = new();
    private readonly List<int> _pivots = new();

    public IncrementalEchelon(CoefficientDomain<T> domain, int columns)
    {
        _d = domain;
        _columns = columns;
    }

    public int Rank => _rows.Count;

    /// <summary>Adds an equation row·v = 0; returns true when it increased the rank.</summary>
    public bool Add(T[] row)
    {
        var d = _d;
        for (int r = 0; r < _rows.Count; r++)
        {
            int c = _pivots[r];
            if (d.IsZero(row[c])) continue;
            var f = row[c];
            var pr = _rows[r];
            for (int j = 0; j < _columns; j++)
                if (!d.IsZero(pr[j])) row[j] = d.Subtract(row[j], d.Multiply(f, pr[j]));
        }
        int pivot = -1;
        for (int j = 0; j < _columns; j++) if (!d.IsZero(row[j])) { pivot = j; break; }
        if (pivot < 0) return false;
        var inv = d.Inverse(row[pivot]);
        for (int j = 0; j < _columns; j++) if (!d.IsZero(row[j])) row[j] = d.Multiply(row[j], inv);
        for (int r = 0; r < _rows.Count; r++)
        {
            var pr = _rows[r];
            if (d.IsZero(pr[pivot])) continue;
            var f = pr[pivot];
            for (int j = 0; j < _columns; j++)
                if (!d.IsZero(row[j])) pr[j] = d.Subtract(pr[j], d.Multiply(f, row[j]));
        }
        _rows.Add(row);
        _pivots.Add(pivot);
        return true;
    }

    /// <summary>A basis of the solution space {v : every equation holds}, one vector per free column.</summary>
    public List<T[]> Nullspace()
    {
        var d = _d;
        var isPivot = new bool[_columns];
        foreach (var p in _pivots) isPivot[p] = true;
        var basis = new List<T[]>();
        for (int f = 0; f < _columns; f++)
        {
            if (isPivot[f]) continue;
            var v = new T[_columns];
            Array.Fill(v, d.Zero);
            v[f] = d.One;
            for (int r = 0; r < _rows.Count; r++) v[_pivots[r]] = d.Negate(_rows[r][f]);
            basis.Add(v);
        }
        return basis;
    }
}
