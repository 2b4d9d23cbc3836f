using System.Numerics;
using Integrable.Kernels.Univariate;
using Integrable.Numbers;

namespace Integrable.Kernels;

internal static partial class PolynomialDivide
{
    /// <summary>Forces the Kronecker division for every dividend whose box allows it, on the current thread (tests).</summary>
    [ThreadStatic] internal static bool ForceKronecker;

    /// <summary>Counts, on the current thread, the divisions that ran by Kronecker substitution (a test hook).</summary>
    [ThreadStatic] internal static int KroneckerDivisions;

    /// <summary>Largest dividend box (cells) for the Kronecker division: its dense arrays hold one entry per cell.</summary>
    internal static long KroneckerMaxBox = 1L << 22;

    /// <summary>Exact division with wide integer coefficients by Kronecker substitution into Z[t] and the
    /// multi-modular univariate exact division (<see cref="IntegerPoly.TryDivideExact"/>: images modulo word
    /// primes, reconstruction, and verification by exact multiplication), for dense dividends whose
    /// coefficients span several words; false when it does not apply.</summary>
    /// <remarks>Cells are numbered in the dividend's mixed-radix box (radix = the dividend's range + 1), the
    /// divisor's from its own minimum and the quotient's from minA − minB, so A = Q·B maps to A(t) = Q(t)·B(t)
    /// without carries between digits. Conversely a univariate quotient whose every cell decodes to digits
    /// inside the quotient's ranges gives a multivariate Q with Q·B = A (again no carries), and one that does
    /// not proves B ∤ A (a true quotient would be that same univariate quotient). The divisor is made
    /// primitive first, so that by Gauss's lemma a rational quotient is an integral one over its content.</remarks>
    private static bool TryDivideKronecker(ReadOnlySpan<Rational> ca, int[] ea, ReadOnlySpan<Rational> cb, int[] eb, int n,
        int[] minA, int[] minB, long[] qRange, long[] radix, long box, out bool divides, out Rational[] coeffs, out int[] exps)
    {
        divides = false;
        coeffs = [];
        exps = [];
        if (PolynomialMultiply.ForceBig || box > KroneckerMaxBox || cb.Length < 2) return false;
        if (!ForceKronecker && (ForceDense is not null || box > DenseBoxPerTerm * ca.Length)) return false;
        int bitsA = CoefficientForm.IntegerBits(ca), bitsB = CoefficientForm.IntegerBits(cb);
        if (bitsA < 0 || bitsB < 0) return false;
        if (!ForceKronecker && (Math.Max(bitsA, bitsB) <= 63 || !KroneckerProduct.Worth(ca.Length, cb.Length, bitsA, bitsB, box))) return false;

        // Cell indices: descending lex order is descending index, so the first term of each operand is its top cell.
        var stride = PolynomialMultiply.Strides(radix);
        var ia = new long[ca.Length];
        var ib = new long[cb.Length];
        PolynomialMultiply.Index(ea, n, minA, stride, ia);
        PolynomialMultiply.Index(eb, n, minB, stride, ib);
        var a = new BigInteger[ia[0] + 1];
        for (int t = 0; t < ca.Length; t++) a[ia[t]] = ca[t].Numerator;
        var b = new BigInteger[ib[0] + 1];
        var content = BigInteger.Zero;
        foreach (var c in cb) content = BigInteger.GreatestCommonDivisor(content, c.Numerator);
        if (cb[0].Sign < 0) content = -content;
        for (int t = 0; t < cb.Length; t++) b[ib[t]] = cb[t].Numerator / content;

        KroneckerDivisions++;
        KernelCancellation.Poll();
        // A guessed number of primes and a check by multiplication first; undecided cases go to the modular
        // division with verification, which needs no guess.
        if (!KroneckerQuotient.TryDivide(a, b, bitsA, bitsB, out var q) && !IntegerPoly.TryDivideExact(a, b, out q)) return true;
        int count = 0;
        foreach (var c in q) if (!c.IsZero) count++;
        coeffs = new Rational[count];
        exps = new int[count * n];
        var scale = new Rational(BigInteger.One, content);
        int k = 0;
        for (int cell = q.Length - 1; cell >= 0; cell--)
        {
            if (q[cell].IsZero) continue;
            long x = cell;
            for (int v = 0; v < n; v++)
            {
                long digit = x / stride[v];
                x -= digit * stride[v];
                if (digit > qRange[v]) { coeffs = []; exps = []; return true; }   // outside the quotient's box: B ∤ A
                exps[k * n + v] = (int)(digit + (long)minA[v] - minB[v]);
            }
            coeffs[k++] = content.IsOne ? new Rational(q[cell]) : new Rational(q[cell]) * scale;
        }
        divides = true;
        return true;
    }
}
