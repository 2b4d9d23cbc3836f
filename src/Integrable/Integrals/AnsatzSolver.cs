using System.Numerics;
using Integrable.Analyses;
using Integrable.LinearAlgebra;
using Integrable.Numbers;
using Integrable.Polynomials;
using Integrable.RationalFunctions;

namespace Integrable.Integrals;

/// <summary>One verified solution of an ansatz: a polynomial per phase (a single one for autonomous maps).</summary>
internal sealed record AnsatzSolution(LaurentPolynomial[] Blocks);

/// <summary>The outcome of an ansatz search: verified solutions forming a basis over Q(parameters), the upper
/// bound on the dimension, and how many candidates failed the exact proof.</summary>
internal sealed record AnsatzOutcome(List<AnsatzSolution> Basis, int UpperBound, int Rejected, int ParameterDegree)
{
    public bool Complete => Basis.Count == UpperBound;
}

/// <summary>Finds all polynomials P_j (one per phase j) of degree ≤ d in the state variables, with coefficients in
/// Q(parameters), such that P_{j+1}(φ_j(x)) = c_j(x)·P_j(x) (c ≡ 1: first integrals; c fixed: Darboux
/// polynomials). Linear algebra mod p at random points with the parameters treated as extra variables of degree
/// ≤ e, rational reconstruction over several primes, exact proof of each returned solution.</summary>
internal sealed class AnsatzSolver
{
    private readonly IntegralMap _map;
    private readonly int _degree;
    private readonly int _minDegree;
    private readonly RationalFunction[]? _cofactors;
    private readonly BudgetClock _clock;
    private readonly Random _rng;
    private readonly IntegralOptions _options;
    private int _primeCursor;

    public AnsatzSolver(IntegralMap map, int degree, bool includeConstant, RationalFunction[]? cofactors,
        IntegralOptions options, BudgetClock clock, Random rng)
    {
        _map = map;
        _degree = degree;
        _minDegree = includeConstant ? 0 : 1;
        _cofactors = cofactors;
        _options = options;
        _clock = clock;
        _rng = rng;
        _primeCursor = rng.Next(0, 40);
        XMonomials = Monomials(map.Dimension, _minDegree, degree);
        if (options.MaxVariableDegree is { } m) XMonomials.RemoveAll(a => a.Any(e => e > m));
    }

    private int K => _map.Dimension;
    private int R => _map.Parameters.Length;
    private int P => _map.Period;
    public List<int[]> XMonomials { get; }

    /// <summary>Exact check: P_{j+1}∘φ_j = c_j·P_j for every phase.</summary>
    public bool Verify(LaurentPolynomial[] blocks)
    {
        var field = _map.Field;
        for (int j = 0; j < P; j++)
        {
            _clock.Check();
            var next = field.FromPolynomial(blocks[(j + 1) % P]).Compose(_map.Substitution(j));
            var here = field.FromPolynomial(blocks[j]);
            if (_cofactors is not null) here *= _cofactors[j];
            if (!(next - here).IsZero) return false;
        }
        return true;
    }

    /// <summary>Upper bound on the dimension over Q(parameters): the nullity of the sampled system mod p at one
    /// random parameter point (specialising and sampling can only lower the rank). Minimum over two primes.</summary>
    public int UpperBound()
    {
        int best = int.MaxValue;
        for (int attempt = 0; attempt < 2; attempt++)
        {
            var field = new PrimeField(NextPrime());
            var tau = new ulong[R];
            for (int i = 0; i < R; i++) tau[i] = RandomResidue(field);
            var cols = Columns(0);
            var m = BuildRows(field, cols, tau, cols.Count + 8);
            best = Math.Min(best, cols.Count - m.Rank());
        }
        return best;
    }

    private readonly record struct Column(int Block, int X, int[] T);

    private List<Column> Columns(int paramDegree)
    {
        var tMon = Monomials(R, 0, paramDegree);
        var cols = new List<Column>();
        for (int b = 0; b < P; b++)
            for (int x = 0; x < XMonomials.Count; x++)
                foreach (var t in tMon) cols.Add(new Column(b, x, t));
        if (cols.Count > _options.MaxUnknowns)
            throw new BudgetHit(BudgetLimit.Terms,
                $"the ansatz of degree {_degree} has {cols.Count} unknown coefficients, more than MaxUnknowns = {_options.MaxUnknowns}");
        // Low degree first so that RREF kernel vectors (support left of their free column) are low-degree solutions.
        return [.. cols.OrderBy(c => XMonomials[c.X].Sum()).ThenBy(c => c.T.Sum()).ThenBy(c => c.Block)];
    }

    private ulong NextPrime() => Primes.Large(_primeCursor++ % 200);

    private ulong RandomResidue(PrimeField f) => (ulong)_rng.NextInt64(1, (long)Math.Min(f.Modulus - 1, long.MaxValue));

    /// <summary>Rows of the linear conditions at random points (and, when <paramref name="fixedTau"/> is null,
    /// random parameter values), modulo the field's prime.</summary>
    private ModularMatrix BuildRows(PrimeField f, List<Column> cols, ulong[]? fixedTau, int rows, Random? smallPoints = null)
    {
        var b = new ModularMatrixBuilder(f, rows, cols.Count);
        var point = new ulong[K + R];
        var image = new ulong[K];
        int d = _degree;
        int maxT = 0;
        foreach (var c in cols) maxT = Math.Max(maxT, c.T.Sum());
        var xp = new ulong[K, d + 1];
        var yp = new ulong[K, d + 1];
        var tp = new ulong[Math.Max(R, 1), maxT + 1];
        var xMon = new ulong[XMonomials.Count];
        var yMon = new ulong[XMonomials.Count];
        int filled = 0, failures = 0;
        while (filled < rows)
        {
            _clock.Check();
            int phase = filled % P;
            for (int i = 0; i < K; i++) point[i] = smallPoints is null ? RandomResidue(f) : (ulong)smallPoints.Next(2, 60);
            for (int i = 0; i < R; i++) point[K + i] = fixedTau is not null ? fixedTau[i] : smallPoints is null ? RandomResidue(f) : (ulong)smallPoints.Next(2, 60);
            ulong cof = 1;
            try
            {
                var comps = _map.Components(phase);
                for (int i = 0; i < K; i++) image[i] = comps[i].Evaluate(f, point);
                if (_cofactors is not null) cof = _cofactors[phase].Evaluate(f, point);
            }
            catch (PoleException)
            {
                if (++failures > 1000) throw new InvalidOperationException($"the map has no value at 1000 random points modulo {f.Modulus}");
                continue;
            }
            for (int i = 0; i < K; i++)
            {
                xp[i, 0] = 1; yp[i, 0] = 1;
                for (int e = 1; e <= d; e++) { xp[i, e] = f.Multiply(xp[i, e - 1], point[i]); yp[i, e] = f.Multiply(yp[i, e - 1], image[i]); }
            }
            for (int i = 0; i < R; i++)
            {
                tp[i, 0] = 1;
                for (int e = 1; e <= maxT; e++) tp[i, e] = f.Multiply(tp[i, e - 1], point[K + i]);
            }
            for (int m = 0; m < XMonomials.Count; m++)
            {
                ulong vx = 1, vy = 1;
                var a = XMonomials[m];
                for (int i = 0; i < K; i++) { vx = f.Multiply(vx, xp[i, a[i]]); vy = f.Multiply(vy, yp[i, a[i]]); }
                xMon[m] = f.Multiply(vx, cof);
                yMon[m] = vy;
            }
            int target = (phase + 1) % P;
            for (int c = 0; c < cols.Count; c++)
            {
                var col = cols[c];
                ulong tv = 1;
                for (int i = 0; i < R; i++) tv = f.Multiply(tv, tp[i, col.T[i]]);
                ulong v = 0;
                if (col.Block == target) v = f.Add(v, yMon[col.X]);
                if (col.Block == phase) v = f.Subtract(v, xMon[col.X]);
                b[filled, c] = f.Multiply(v, tv);
            }
            filled++;
        }
        return b.ToImmutable();
    }

    /// <summary>The full search: parameter degree e = 0, 1, … until the verified solutions reach the upper bound.</summary>
    public AnsatzOutcome Solve(int? knownUpperBound = null)
    {
        int upper = knownUpperBound ?? UpperBound();
        var basis = new List<AnsatzSolution>();
        int rejected = 0;
        if (upper == 0) return new AnsatzOutcome(basis, 0, 0, 0);
        var checkField = new PrimeField(Primes.Large(250));
        var checkTau = new ulong[R];
        for (int i = 0; i < R; i++) checkTau[i] = RandomResidue(checkField);
        var echelon = new IncrementalRank(checkField, P * XMonomials.Count);
        int maxE = R == 0 ? 0 : _options.MaxParameterDegree;
        int e = 0;
        for (; e <= maxE && basis.Count < upper; e++)
        {
            var cols = Columns(e);
            int rows = cols.Count + 12;
            // Test hook: a deliberately small sample at fixed small integer points (the same for every prime), whose
            // kernel contains candidates that vanish at the sampled points only.
            bool small = _options.RowsOverride is not null && e == 0;
            Process(cols, Reconstruct(cols, small ? _options.RowsOverride!.Value : rows, small), _options.CandidateHook);
            if (basis.Count < upper && rejected > 0)
            {
                // A rejection means the sampled system was too small (or unlucky): once more with twice the points.
                Process(cols, Reconstruct(cols, 2 * rows, false), null);
            }
        }
        return new AnsatzOutcome(basis, upper, rejected, Math.Max(0, e - 1));

        void Process(List<Column> cols, List<Rational[]>? candidates, Func<IReadOnlyList<LaurentPolynomial[]>, IEnumerable<LaurentPolynomial[]>>? hook)
        {
            if (candidates is null) return;
            var polys = candidates.Select(v => ToBlocks(cols, v)).ToList();
            if (hook is not null) polys = [.. hook(polys)];
            foreach (var blocks in polys.OrderBy(Key))
            {
                if (basis.Count >= upper) break;
                var vector = Specialise(blocks, checkField, checkTau);
                if (!echelon.WouldIncrease(vector)) continue;
                var normal = Normalise(blocks);
                if (!Verify(normal)) { rejected++; continue; }
                echelon.Add(vector);
                basis.Add(new AnsatzSolution(normal));
            }
        }
    }

    private static (int, int, int) Key(LaurentPolynomial[] blocks)
    {
        int deg = 0, terms = 0;
        foreach (var b in blocks) { if (!b.IsZero) deg = Math.Max(deg, b.TotalDegree); terms += b.TermCount; }
        return (deg, terms, 0);
    }

    /// <summary>Kernel basis over Q by reconstruction from several primes (stable when two consecutive
    /// reconstructions agree), or null when the kernel is trivial.</summary>
    private List<Rational[]>? Reconstruct(List<Column> cols, int rows, bool fixedSmallPoints)
    {
        int[]? pivots = null;
        int[]? free = null;
        BigInteger[,]? residues = null;
        BigInteger modulus = BigInteger.One;
        List<Rational[]>? previous = null;
        for (int attempt = 0; attempt < _options.MaxPrimes; attempt++)
        {
            _clock.Check();
            var f = new PrimeField(NextPrime());
            var m = BuildRows(f, cols, null, rows, fixedSmallPoints ? new Random(4321) : null);
            var rref = m.ReducedRowEchelonForm();
            var pv = rref.PivotColumns.ToArray();
            if (pv.Length == cols.Count) return null;
            if (pivots is null || pv.Length > pivots.Length)
            {
                pivots = pv;
                free = rref.FreeColumns.ToArray();
                residues = new BigInteger[free.Length, pivots.Length];
                modulus = f.Modulus;
                for (int i = 0; i < free.Length; i++)
                    for (int r = 0; r < pivots.Length; r++) residues[i, r] = f.Negate(rref.Matrix[r, free[i]]);
                previous = null;
            }
            else if (pv.AsSpan().SequenceEqual(pivots))
            {
                for (int i = 0; i < free!.Length; i++)
                    for (int r = 0; r < pivots.Length; r++)
                        residues![i, r] = ChineseRemainder.Combine(residues[i, r], modulus, f.Negate(rref.Matrix[r, free[i]]), f.Modulus).Residue;
                modulus *= f.Modulus;
            }
            else continue;
            var current = new List<Rational[]>();
            bool ok = true;
            for (int i = 0; i < free!.Length && ok; i++)
            {
                var v = new Rational[cols.Count];
                for (int c = 0; c < v.Length; c++) v[c] = Rational.Zero;
                v[free[i]] = Rational.One;
                for (int r = 0; r < pivots.Length; r++)
                {
                    if (!RationalReconstruction.TryReconstruct(residues![i, r], modulus, out var q)) { ok = false; break; }
                    v[pivots[r]] = q;
                }
                current.Add(v);
            }
            if (!ok) { previous = null; continue; }
            if (previous is not null && Same(previous, current)) return current;
            previous = current;
        }
        throw new BudgetHit(BudgetLimit.Terms, $"coefficients did not stabilise after {_options.MaxPrimes} primes");
    }

    private static bool Same(List<Rational[]> a, List<Rational[]> b)
    {
        if (a.Count != b.Count) return false;
        for (int i = 0; i < a.Count; i++) if (!a[i].AsSpan().SequenceEqual(b[i])) return false;
        return true;
    }

    private LaurentPolynomial[] ToBlocks(List<Column> cols, Rational[] v)
    {
        var ring = _map.Field.PolynomialRing;
        var builders = Enumerable.Range(0, P).Select(_ => ring.CreateBuilder()).ToArray();
        var exps = new int[K + R];
        for (int c = 0; c < cols.Count; c++)
        {
            if (v[c].IsZero) continue;
            var col = cols[c];
            XMonomials[col.X].CopyTo(exps, 0);
            col.T.CopyTo(exps, K);
            builders[col.Block].Add(v[c], exps);
        }
        return [.. builders.Select(bl => bl.ToPolynomial())];
    }

    /// <summary>Coefficient vector in the x-monomials (per block) with the parameters set to τ, mod p.</summary>
    private ulong[] Specialise(LaurentPolynomial[] blocks, PrimeField f, ulong[] tau)
    {
        var index = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int m = 0; m < XMonomials.Count; m++) index[string.Join(",", XMonomials[m])] = m;
        var v = new ulong[P * XMonomials.Count];
        for (int b = 0; b < P; b++)
            foreach (var term in blocks[b].Terms)
            {
                var e = term.Exponents;
                string key = string.Join(",", e[..K].ToArray());
                ulong c = f.FromRational(term.Coefficient);
                for (int i = 0; i < R; i++) c = f.Multiply(c, f.Pow(tau[i], e[K + i]));
                int at = b * XMonomials.Count + index[key];
                v[at] = f.Add(v[at], c);
            }
        return v;
    }

    /// <summary>Divides by the gcd over Q[parameters] of the coefficients (in the state variables) and makes the
    /// result primitive with integer coefficients and a positive leading coefficient.</summary>
    private LaurentPolynomial[] Normalise(LaurentPolynomial[] blocks)
    {
        var ring = _map.Field.PolynomialRing;
        if (R > 0)
        {
            var groups = new Dictionary<string, LaurentPolynomialBuilder>(StringComparer.Ordinal);
            var exps = new int[K + R];
            foreach (var block in blocks)
                foreach (var term in block.Terms)
                {
                    var e = term.Exponents;
                    string key = string.Join(",", e[..K].ToArray());
                    if (!groups.TryGetValue(key, out var bl)) groups[key] = bl = ring.CreateBuilder();
                    Array.Clear(exps);
                    e[K..].CopyTo(exps.AsSpan(K));
                    bl.Add(term.Coefficient, exps);
                }
            var g = PolynomialGcd.Gcd(groups.Values.Select(bl => bl.ToPolynomial()), MonomialFactor.Keep);
            if (!g.IsZero && !g.IsConstant)
                blocks = [.. blocks.Select(b => b.IsZero ? b : b.DivideExact(g).Quotient)];
        }
        int lead = Array.FindIndex(blocks, b => !b.IsZero);
        if (lead < 0) return blocks;
        var content = blocks[lead].Content;
        return [.. blocks.Select(b => b * content.Inverse())];
    }

    /// <summary>Exponent vectors in <paramref name="n"/> variables of total degree in [lo, hi], by degree then lexicographically.</summary>
    internal static List<int[]> Monomials(int n, int lo, int hi)
    {
        var list = new List<int[]>();
        for (int d = lo; d <= hi; d++) Fill(new int[n], 0, d, list);
        return list;

        static void Fill(int[] cur, int pos, int left, List<int[]> output)
        {
            if (cur.Length == 0) { if (left == 0) output.Add([]); return; }
            if (pos == cur.Length - 1) { cur[pos] = left; output.Add((int[])cur.Clone()); return; }
            for (int e = left; e >= 0; e--) { cur[pos] = e; Fill(cur, pos + 1, left - e, output); }
        }
    }
}

/// <summary>Incremental rank over Z/pZ: reduced rows kept with their pivots.</summary>
internal sealed class IncrementalRank(PrimeField field, int width)
{
    private readonly List<(int Pivot, ulong[] Row)> _rows = [];

    public int Rank => _rows.Count;

    private ulong[] Reduce(ulong[] v)
    {
        var r = (ulong[])v.Clone();
        foreach (var (p, row) in _rows)
        {
            if (r[p] == 0) continue;
            ulong f = r[p];
            for (int j = 0; j < width; j++) if (row[j] != 0) r[j] = field.Subtract(r[j], field.Multiply(f, row[j]));
        }
        return r;
    }

    public bool WouldIncrease(ulong[] v) => Array.Exists(Reduce(v), x => x != 0);

    public bool Add(ulong[] v)
    {
        var r = Reduce(v);
        int p = Array.FindIndex(r, x => x != 0);
        if (p < 0) return false;
        ulong inv = field.Inverse(r[p]);
        for (int j = 0; j < width; j++) r[j] = field.Multiply(r[j], inv);
        _rows.Add((p, r));
        return true;
    }
}
