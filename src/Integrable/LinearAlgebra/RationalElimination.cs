using System.Buffers;
using System.Diagnostics;
using System.Numerics;
using Integrable.Kernels.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.LinearAlgebra;

/// <summary>Exact reduced row echelon forms and determinants over Q: the dispatcher between the
/// multimodular method and fraction-free elimination, and the multimodular method itself.</summary>
/// <remarks>
/// <para>Both methods first clear denominators row by row (<see cref="IntegerRows"/>), which changes
/// neither the rank profile, nor the reduced form, nor the kernel.</para>
/// <para>Multimodular method. For primes p from the supply the integer matrix is reduced mod p and
/// eliminated (<see cref="ModularEchelon"/>). A prime whose rank is lower, or whose pivot columns are
/// lexicographically later, than another prime's is unlucky (p divides some minor) and is discarded;
/// images with the same profile are combined by Chinese remaindering and the free-column entries are
/// rationally reconstructed (Lehmer-accelerated half-extended Euclid, one running common denominator
/// for all entries, so usually one full reconstruction per attempt). A reconstruction is accepted
/// only after an exact check over Z: every kernel vector read off the candidate form is multiplied by
/// the integer matrix and must give zero. That check also proves the result: the rank mod p is at most
/// the rank over Q, so the kernel has dimension at most cols − r, and the cols − r verified vectors
/// (independent, the identity on the free columns) span it; as each vector vanishes beyond its free
/// column, the free columns are exactly the non-pivot columns over Q and the candidate is the reduced
/// form over Q. When the check is cheap compared with one more prime it is tried as soon as a
/// reconstruction exists (one prime is enough for small outputs); otherwise, and after any failed
/// check, two successive reconstructions must agree first (early termination). Attempts after a
/// failed reconstruction are spaced geometrically in the size of the modulus. If the number of primes
/// that the Hadamard bound guarantees (plus a margin) is exhausted, fraction-free elimination finishes
/// the job, so a wrong image is never returned.</para>
/// </remarks>
internal static class RationalElimination
{
    // Dispatcher (measured with the LAsmall workload, benchmarks/Integrable.Benchmarks/
    // LinearAlgebraCrossoverWorkload.cs, random n×n and n×(n+1) matrices, entries below 100 or 2^40).
    // Fraction-free elimination costs about m·c·r big-integer operations on numbers that grow to r times
    // the entry size, and needs no check. The multimodular method costs, per prime, a reduction of every
    // entry plus m·c·r word operations, plus Chinese remaindering and reconstruction of the reduced
    // entries and one exact check; it is output-sensitive: a full-rank square matrix (no free column)
    // or a nullspace with small vectors needs one or two primes whatever the entry sizes, while a
    // reduced form with full-size entries needs about 2·log₂(Hadamard bound)/61 primes.
    // Measured: for up to about 10×10 cells fraction-free wins or ties in every case (its fixed cost
    // is a few microseconds; the multimodular fixed cost — field, pooled arrays, reconstruction — is
    // several times that); on 16×17 with full-size outputs the two are within 2×; from 24×25 on the
    // multimodular method wins even with full-size outputs, and with small outputs (the nullspaces of
    // the invariant search) it wins by orders of magnitude. A single row or column is trivial either way.
    internal const int FractionFreeMaxCells = 100;

    // Determinants: fraction-free up to this order; above it the multimodular method with the Hadamard
    // bound (a proven bound, so no check is needed) is faster. Measured (LAsmall): the two tie at
    // order 6–8; at order 10 multimodular is 1.4× (entries below 100) to 2.5× (below 2^40) faster, at
    // order 32 15–16× faster.
    internal const int DeterminantFractionFreeMaxOrder = 8;

    // Prime supply. Primes below 2^31 make each elimination step about three times cheaper (one
    // 32×32-bit product per term, no carries: ModularReducer.Dot) but carry half the bits of the 62-bit
    // primes of Primes.Large, so twice as many are needed for the same modulus, and every prime also
    // has a fixed cost (reduction of the entries, Chinese remaindering, pivot inverses). Measured
    // (LAprofile): half-word primes win once the elimination work m·c·min(m, c) passes about 2·10^5 word
    // operations; below that the large primes are used.
    internal const long HalfWordPrimeMinWork = 200_000;

    internal static Func<int, ulong> PrimeSupply(EliminationOptions options, int rows, int cols) =>
        options.PrimeSequence ?? ((long)rows * cols * Math.Min(rows, cols) >= HalfWordPrimeMinWork ? HalfWordPrimes.Get : Primes.Large);

    /// <summary>The verified reduced row echelon data of a row-major rational matrix.</summary>
    public static EchelonData<Rational> Echelon(ReadOnlySpan<Rational> data, int rows, int cols, EliminationOptions options)
    {
        if (rows == 0 || cols == 0)
            return new EchelonData<Rational>(rows, cols, [], EchelonData<Rational>.Complement([], cols), []);
        var diag = options.Diagnostics;
        var sw = Stopwatch.StartNew();
        using var b = IntegerRows.FromRational(data, rows, cols);
        if (diag is not null) diag.ClearingTime += sw.Elapsed;
        return Echelon(b, options);
    }

    /// <summary>The verified reduced row echelon data of an integer matrix.</summary>
    public static EchelonData<Rational> Echelon(IntegerRows b, EliminationOptions options)
    {
        var method = options.Method;
        if (method == EliminationMethod.Auto)
            method = b.Rows * b.Cols <= FractionFreeMaxCells || b.Rows == 1 || b.Cols == 1
                ? EliminationMethod.FractionFree : EliminationMethod.Multimodular;
        if (options.Diagnostics is not null) options.Diagnostics.MethodUsed = method;
        if (method == EliminationMethod.FractionFree) return EchelonFractionFree(b);
        return EchelonMultimodular(b, options) ?? FallBack(b, options);
    }

    private static EchelonData<Rational> FallBack(IntegerRows b, EliminationOptions options)
    {
        if (options.Diagnostics is not null) options.Diagnostics.FellBackToFractionFree = true;
        return EchelonFractionFree(b);
    }

    /// <summary>Fraction-free (Bareiss) elimination; exact by construction.</summary>
    public static EchelonData<Rational> EchelonFractionFree(IntegerRows b)
    {
        var ff = FractionFreeElimination.Compute(b.ToBigIntegers(), b.Rows, b.Cols);
        var free = EchelonData<Rational>.Complement(ff.PivotColumns, b.Cols);
        return new EchelonData<Rational>(b.Rows, b.Cols, ff.PivotColumns, free, ff.ReducedFreeEntries(free));
    }

    /// <summary>The multimodular method; null when the prime limit is exhausted.</summary>
    private static EchelonData<Rational>? EchelonMultimodular(IntegerRows b, EliminationOptions options)
    {
        var rented = ArrayPool<ulong>.Shared.Rent(b.Rows * b.Cols);
        try { return EchelonMultimodular(b, options, rented.AsSpan(0, b.Rows * b.Cols)); }
        finally { ArrayPool<ulong>.Shared.Return(rented); }
    }

    private static EchelonData<Rational>? EchelonMultimodular(IntegerRows b, EliminationOptions options, Span<ulong> image)
    {
        int m = b.Rows, c = b.Cols;
        var diag = options.Diagnostics;
        // The Hadamard-based budget costs a pass over all entries, so it is only worked out once the
        // first few primes have not finished the job (most calls end after one or two).
        int limit = options.PrimeLimit ?? int.MaxValue;
        int[]? bestPivots = null;
        int[]? free = null;
        MixedRadixAccumulator? residues = null;
        Rational[]? previous = null;
        bool mayVerifyEarly = true;
        int sentinel = -1;
        var sw = new Stopwatch();
        // Reconstruction attempts are rationed geometrically: after a failed attempt with a modulus of
        // B bits the next one waits for 1.2·B bits (at least one more prime). Outputs that need up to
        // five primes are still tried after every prime, and large outputs (many cheap primes on a
        // small matrix) cost O(log) attempts and at most 20% extra primes. Deterministic, unlike a
        // schedule based on measured times.
        long nextAttemptBits = 0;
        var primeSupply = PrimeSupply(options, m, c);
        int minPrimeBits = 64;
        for (int index = 0, used = 0; used < limit; index++)
        {
            if (used == 4 && options.PrimeLimit is null) limit = GuaranteedPrimeCount(b, minPrimeBits) + 8;
            if (used >= limit) break;
            ulong p = primeSupply(index);
            minPrimeBits = Math.Min(minPrimeBits, 63 - BitOperations.LeadingZeroCount(p));
            var field = Field(p);
            used++;
            if (diag is not null) diag.PrimesUsed++;
            sw.Restart();
            var reducer = new ModularReducer(field);
            b.ReduceColumnMajor(reducer, image);
            using var ech = ModularEchelon.Compute(image, m, c, reducer);
            int cmp = bestPivots is null ? 1 : CompareProfiles(ech.PivotColumns, bestPivots);
            if (cmp < 0)
            {
                if (diag is not null) { diag.UnluckyPrimes++; diag.ModularTime += sw.Elapsed; }
                continue;
            }
            if (cmp > 0)
            {
                if (bestPivots is not null && diag is not null) diag.UnluckyPrimes += 1;
                bestPivots = ech.PivotColumns;
                free = ech.FreeColumns();
                residues = null;
                previous = null;
                sentinel = -1;
            }
            var e = ech.ReducedFreeEntries(free!);
            if (diag is not null) diag.ModularTime += sw.Elapsed;
            int r = bestPivots!.Length, nf = free!.Length;
            if (nf == 0)
            {
                // Full column rank mod p, hence over Q: the reduced form is the identity on top.
                return new EchelonData<Rational>(m, c, bestPivots, free, []);
            }
            sw.Restart();
            residues ??= new MixedRadixAccumulator(r * nf);
            residues.Add(reducer, e);
            long bits = residues.Modulus.GetBitLength();
            bool lastChance = used >= limit;
            if (bits < nextAttemptBits && !lastChance)
            {
                if (diag is not null) diag.ReconstructionTime += sw.Elapsed;
                continue;
            }
            bool ok = TryReconstruct(residues, r, nf, ref sentinel, out var candidate);
            if (diag is not null) diag.ReconstructionTime += sw.Elapsed;
            nextAttemptBits = ok ? 0 : bits + Math.Max(1, bits / 5);
            if (!ok)
            {
                if (diag is not null) diag.ReconstructionFailures++;
                previous = null;
                continue;
            }
            bool stable = previous is not null && candidate.AsSpan().SequenceEqual(previous);
            previous = candidate;
            if (!stable && !lastChance && !(mayVerifyEarly && VerificationIsCheap(b, candidate, r, nf))) continue;
            sw.Restart();
            bool verified = Verify(b, bestPivots, free, candidate);
            if (diag is not null) { diag.Verifications++; diag.VerificationTime += sw.Elapsed; }
            if (verified) return new EchelonData<Rational>(m, c, bestPivots, free, candidate);
            if (diag is not null) diag.VerificationFailures++;
            mayVerifyEarly = false;
        }
        return null;
    }

    /// <summary>+1 when <paramref name="candidate"/> is a better rank profile than <paramref name="best"/>
    /// (higher rank, or same rank and lexicographically earlier pivots), 0 when equal, −1 when worse.</summary>
    internal static int CompareProfiles(int[] candidate, int[] best)
    {
        if (candidate.Length != best.Length) return candidate.Length > best.Length ? 1 : -1;
        for (int k = 0; k < candidate.Length; k++)
            if (candidate[k] != best[k]) return candidate[k] < best[k] ? 1 : -1;
        return 0;
    }

    /// <summary>Number of primes of at least 2^<paramref name="primeBits"/> after which the reconstruction
    /// of the reduced form is certain: every entry is a quotient of two r×r minors of B, each at most
    /// H = Π ‖B_i‖ over the largest rows (Hadamard), and reconstruction is unique once the modulus
    /// exceeds 2H².</summary>
    internal static int GuaranteedPrimeCount(IntegerRows b, int primeBits = 61)
    {
        double log2H = HadamardLog2(b, Math.Min(b.Rows, b.Cols));
        return (int)Math.Ceiling((2 * log2H + 2) / Math.Max(1, primeBits)) + 1;
    }

    /// <summary>An upper bound for log2 of the product of the <paramref name="count"/> largest Euclidean row norms.</summary>
    internal static double HadamardLog2(IntegerRows b, int count)
    {
        var norms = new double[b.Rows];
        for (int i = 0; i < b.Rows; i++)
        {
            // log2 ‖row‖ ≤ ½ log2 Σ 2^(2·bits), computed relative to the largest term.
            long maxBits = 0;
            var bits = new long[b.Cols];
            for (int j = 0; j < b.Cols; j++)
            {
                long bt = b.EntryBits(i, j);
                bits[j] = bt == 0 ? -1 : bt;
                if (bits[j] > maxBits) maxBits = bits[j];
            }
            double sum = 0;
            foreach (var bt in bits) if (bt >= 0) sum += Math.Pow(2, 2.0 * (bt - maxBits));
            norms[i] = sum == 0 ? 0 : maxBits + 0.5 * Math.Log2(sum);
        }
        Array.Sort(norms);
        double total = 0;
        for (int t = 0; t < count && t < norms.Length; t++) total += Math.Max(0, norms[norms.Length - 1 - t]);
        return total;
    }

    private static readonly System.Collections.Concurrent.ConcurrentDictionary<ulong, PrimeField> Fields = new();

    /// <summary>The field of a supplied prime; constructing one runs a primality test, so they are cached.</summary>
    private static PrimeField Field(ulong p)
    {
        if (Fields.TryGetValue(p, out var f)) return f;
        try { f = new PrimeField(p); }
        catch (ArgumentException) { throw new InvalidOperationException($"prime supply returned {p}, which is not a prime below 2^62"); }
        if (Fields.Count < 4096) Fields.TryAdd(p, f);
        return f;
    }

    /// <summary>Rational reconstruction of every entry (row-major r × nf), column by column with a
    /// running common denominator, within the symmetric bounds N = D = ⌊√(M/2)⌋. The entry that failed
    /// last time (<paramref name="sentinel"/>) is tried first, so a premature attempt costs one
    /// reconstruction; on failure it is updated to the entry that failed.</summary>
    private static bool TryReconstruct(MixedRadixAccumulator residues, int r, int nf, ref int sentinel, out Rational[] values)
    {
        values = [];
        var modulus = residues.Modulus;
        var result = new Rational[r * nf];
        if (residues.PrimeCount == 1) return TryReconstructWord(residues, (ulong)modulus, r, nf, ref sentinel, result, out values);
        var bound = RationalReconstruction.Sqrt(modulus / 2);
        if (sentinel >= 0 && !residues.IsZero(sentinel) && !TryReconstructOne(residues.Value(sentinel), modulus, bound, bound, out _))
            return false;
        var half = modulus >> 1;
        // One running denominator for all entries: the entries of a reduced form share the
        // denominator of a pivot minor, so after the first full reconstruction the others are usually a
        // multiplication and a comparison.
        BigInteger den = BigInteger.One;
        for (int q = 0; q < nf; q++)
        {
            for (int k = 0; k < r; k++)
            {
                int index = k * nf + q;
                if (residues.IsZero(index)) continue;
                var a = residues.Value(index);
                var y = den.IsOne ? a : a * den % modulus;
                var s = y > half ? y - modulus : y;
                if (BigInteger.Abs(s) <= bound)
                {
                    result[index] = den.IsOne ? new Rational(s) : new Rational(s, den);
                    continue;
                }
                if (!TryReconstructOne(y, modulus, bound, bound / den, out var frac))
                {
                    sentinel = index;
                    return false;
                }
                den *= frac.Denominator;
                result[index] = new Rational(frac.Numerator, den);
            }
        }
        values = result;
        return true;
    }

    /// <summary>The same for a modulus below 2^63 (one prime), in word arithmetic.</summary>
    private static bool TryReconstructWord(MixedRadixAccumulator residues, ulong m, int r, int nf, ref int sentinel, Rational[] result, out Rational[] values)
    {
        values = [];
        ulong bound = (ulong)RationalReconstruction.Sqrt(m / 2);
        ulong half = m >> 1;
        ulong den = 1;
        for (int q = 0; q < nf; q++)
        {
            for (int k = 0; k < r; k++)
            {
                int index = k * nf + q;
                ulong a = residues.Word(index);
                if (a == 0) continue;
                ulong y = den == 1 ? a : (ulong)((UInt128)a * den % m);
                long sv = y > half ? -(long)(m - y) : (long)y;
                if ((ulong)Math.Abs(sv) <= bound)
                {
                    result[index] = new Rational(sv, (long)den);
                    continue;
                }
                if (!TryReconstructOne(y, m, bound, bound / den, out var frac))
                {
                    sentinel = index;
                    return false;
                }
                den *= (ulong)frac.Denominator;
                result[index] = new Rational(frac.Numerator, den);
            }
        }
        values = result;
        return true;
    }

    /// <summary>One rational reconstruction; 128-bit arithmetic while the modulus fits (one or two
    /// primes), big integers beyond.</summary>
    private static bool TryReconstructOne(BigInteger a, BigInteger modulus, BigInteger numeratorBound, BigInteger denominatorBound, out Rational value)
    {
        if (modulus.GetBitLength() > 126 || denominatorBound.IsZero)
            return LehmerReconstruction.TryReconstruct(a, modulus, numeratorBound, denominatorBound, out value);
        value = default;
        UInt128 m = (UInt128)modulus, n = (UInt128)numeratorBound, dBound = (UInt128)denominatorBound;
        UInt128 r0 = m, r1 = (UInt128)a % m;
        Int128 t0 = 0, t1 = 1;
        while (r1 > n)
        {
            UInt128 q = r0 / r1;
            (r0, r1) = (r1, r0 - q * r1);
            (t0, t1) = (t1, t0 - (Int128)q * t1);
        }
        UInt128 absT = (UInt128)(t1 < 0 ? -t1 : t1);
        if (absT == 0 || absT > dBound) return false;
        // gcd(t, m) must be 1.
        UInt128 x = m, y = absT;
        while (y != 0) (x, y) = (y, x % y);
        if (x != 1) return false;
        var num = (BigInteger)r1;
        value = new Rational(t1 < 0 ? -num : num, (BigInteger)absT);
        return true;
    }

    /// <summary>Whether the exact check is cheaper than one more prime (then it runs right away).</summary>
    private static bool VerificationIsCheap(IntegerRows b, Rational[] candidate, int r, int nf)
    {
        // Check: for each free column, m rows times the support, each a product of an entry of B by a
        // kernel entry. One more prime: reducing every entry (about four multiplications per word) and
        // m·c·r word multiplications.
        long valueWords = 0;
        int nonZero = 0;
        foreach (var v in candidate)
        {
            if (v.IsZero) continue;
            nonZero++;
            valueWords += v.IsSmall ? 1 : 1 + (v.Numerator.GetBitLength() + v.Denominator.GetBitLength()) / 64;
        }
        double avgEntryWords = Math.Max(1.0, (double)b.TotalWords / Math.Max(1, b.Rows * b.Cols));
        double avgValueWords = nonZero == 0 ? 1 : (double)valueWords / nonZero + 1;
        double check = (double)b.Rows * (nonZero + nf) * avgEntryWords * avgValueWords;
        double prime = 4.0 * b.TotalWords + (double)b.Rows * b.Cols * r;
        return check <= prime;
    }

    /// <summary>The exact check: B·w = 0 for the integer multiple w of every kernel vector read off the candidate.</summary>
    private static bool Verify(IntegerRows b, int[] pivots, int[] free, Rational[] e)
    {
        int r = pivots.Length, nf = free.Length;
        var support = new int[r + 1];
        var values = new BigInteger[r + 1];
        for (int q = 0; q < nf; q++)
        {
            BigInteger l = BigInteger.One;
            for (int k = 0; k < r; k++)
            {
                var x = e[k * nf + q];
                if (x.IsZero || x.IsInteger) continue;
                var d = x.Denominator;
                l = l / BigInteger.GreatestCommonDivisor(l, d) * d;
            }
            int n = 0;
            for (int k = 0; k < r; k++)
            {
                var x = e[k * nf + q];
                if (x.IsZero) continue;
                support[n] = pivots[k];
                values[n] = -(x.Numerator * (l / x.Denominator));
                n++;
            }
            support[n] = free[q];
            values[n] = l;
            n++;
            if (!b.Annihilates(support.AsSpan(0, n), values.AsSpan(0, n))) return false;
        }
        return true;
    }

    /// <summary>The determinant of a square row-major rational matrix.</summary>
    public static Rational Determinant(ReadOnlySpan<Rational> data, int n, EliminationOptions options)
    {
        if (n == 0) return Rational.One;
        using var b = IntegerRows.FromRational(data, n, n);
        BigInteger scale = BigInteger.One;
        foreach (var s in b.RowScales) scale *= s;
        var method = options.Method;
        if (method == EliminationMethod.Auto)
            method = n <= DeterminantFractionFreeMaxOrder ? EliminationMethod.FractionFree : EliminationMethod.Multimodular;
        if (options.Diagnostics is not null) options.Diagnostics.MethodUsed = method;
        BigInteger det = method == EliminationMethod.FractionFree
            ? FractionFreeElimination.Compute(b.ToBigIntegers(), n, n).Determinant()
            : DeterminantMultimodular(b, options);
        return new Rational(det, scale);
    }

    /// <summary>det B by Chinese remaindering up to twice the Hadamard bound (a proven bound, so the
    /// result is exact without a further check).</summary>
    private static BigInteger DeterminantMultimodular(IntegerRows b, EliminationOptions options)
    {
        int n = b.Rows;
        double log2H = HadamardLog2(b, n);
        var target = BigInteger.One << (int)Math.Ceiling(log2H + 2);   // modulus must exceed 2H
        var image = new ulong[n * n];
        BigInteger residue = BigInteger.Zero, modulus = BigInteger.One;
        int zeros = 0;
        var diag = options.Diagnostics;
        var primeSupply = PrimeSupply(options, n, n);
        for (int index = 0; modulus < target; index++)
        {
            ulong p = primeSupply(index);
            var field = Field(p);
            var reducer = new ModularReducer(field);
            b.ReduceColumnMajor(reducer, image);
            using var ech = ModularEchelon.Compute(image, n, n, reducer);
            if (diag is not null) diag.PrimesUsed++;
            ulong d = ech.Determinant();
            if (d == 0 && ++zeros == 2 && residue.IsZero)
            {
                // Two primes say singular: settle it with the verified rank (exact), which is much
                // cheaper than running up to the bound.
                var echQ = Echelon(b, options);
                if (echQ.Rank < n) return BigInteger.Zero;
            }
            if (modulus.IsOne) { residue = d; modulus = p; continue; }
            ulong inv = field.Inverse((ulong)(modulus % p));
            ulong diff = field.Subtract(d, (ulong)(residue % p));
            residue += modulus * field.Multiply(diff, inv);
            modulus *= p;
        }
        return ChineseRemainder.Symmetric(residue, modulus);
    }
}
