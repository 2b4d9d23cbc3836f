using System.Numerics;
using System.Text;
using Integrable.Numbers;

namespace Integrable.Analyses;

/// <summary>Small dense univariate polynomials with integer coefficients (lowest degree first, no
/// trailing zeros; the zero polynomial is empty), for the little algebra the analyses need: rational
/// roots, cyclotomic factors, exact division, numeric roots.</summary>
internal static class IntegerPolynomial
{
    public static BigInteger[] Trim(BigInteger[] a)
    {
        int n = a.Length;
        while (n > 0 && a[n - 1].IsZero) n--;
        return n == a.Length ? a : a[..n];
    }

    public static int Degree(BigInteger[] a) => a.Length - 1;

    /// <summary>The primitive integer polynomial proportional to Σ c_i t^i (rational coefficients), sign of the leading coefficient positive.</summary>
    public static BigInteger[] FromRationals(IReadOnlyList<Rational> c)
    {
        BigInteger lcm = BigInteger.One;
        foreach (var r in c) lcm = lcm / BigInteger.GreatestCommonDivisor(lcm, r.Denominator) * r.Denominator;
        var a = c.Select(r => r.Numerator * (lcm / r.Denominator)).ToArray();
        return Primitive(Trim(a));
    }

    public static BigInteger[] Primitive(BigInteger[] a)
    {
        a = Trim(a);
        if (a.Length == 0) return a;
        BigInteger g = BigInteger.Zero;
        foreach (var x in a) g = BigInteger.GreatestCommonDivisor(g, x);
        if (a[^1].Sign < 0) g = -g;
        return g.IsOne ? a : a.Select(x => x / g).ToArray();
    }

    public static BigInteger[] Multiply(BigInteger[] a, BigInteger[] b)
    {
        if (a.Length == 0 || b.Length == 0) return [];
        var r = new BigInteger[a.Length + b.Length - 1];
        for (int i = 0; i < a.Length; i++)
            for (int j = 0; j < b.Length; j++) r[i + j] += a[i] * b[j];
        return Trim(r);
    }

    /// <summary>Exact division by a monic-or-not divisor over Z: true with the quotient when b divides a in Z[t].</summary>
    public static bool TryDivide(BigInteger[] a, BigInteger[] b, out BigInteger[] quotient)
    {
        quotient = [];
        b = Trim(b);
        if (b.Length == 0) return false;
        var r = (BigInteger[])Trim(a).Clone();
        if (r.Length < b.Length) return r.Length == 0;
        var q = new BigInteger[r.Length - b.Length + 1];
        for (int i = q.Length - 1; i >= 0; i--)
        {
            var top = r[i + b.Length - 1];
            if (top.IsZero) continue;
            var (c, rem) = BigInteger.DivRem(top, b[^1]);
            if (!rem.IsZero) return false;
            q[i] = c;
            for (int j = 0; j < b.Length; j++) r[i + j] -= c * b[j];
        }
        if (r.Any(x => !x.IsZero)) return false;
        quotient = Trim(q);
        return true;
    }

    /// <summary>The n-th cyclotomic polynomial Φ_n.</summary>
    public static BigInteger[] Cyclotomic(int n)
    {
        // x^n − 1 = Π_{d | n} Φ_d.
        var p = new BigInteger[n + 1];
        p[0] = -1;
        p[n] = 1;
        for (int d = 1; d < n; d++)
            if (n % d == 0 && TryDivide(p, Cyclotomic(d), out var q)) p = q;
        return p;
    }

    /// <summary>Euler's totient.</summary>
    public static int Totient(int n)
    {
        int result = n;
        for (int p = 2; p * p <= n; p++)
        {
            if (n % p != 0) continue;
            while (n % p == 0) n /= p;
            result -= result / p;
        }
        if (n > 1) result -= result / n;
        return result;
    }

    public static Rational Evaluate(BigInteger[] a, Rational x)
    {
        Rational s = Rational.Zero;
        for (int i = a.Length - 1; i >= 0; i--) s = s * x + new Rational(a[i]);
        return s;
    }

    /// <summary>Rational roots (distinct) by the rational root theorem, or null when the extreme
    /// coefficients are too large to factor by trial division.</summary>
    public static List<Rational>? RationalRoots(BigInteger[] a)
    {
        a = Trim(a);
        var roots = new List<Rational>();
        if (a.Length <= 1) return roots;
        int shift = 0;
        while (a[shift].IsZero) shift++;
        if (shift > 0) roots.Add(Rational.Zero);
        var b = a[shift..];
        if (b.Length <= 1) return roots;
        var ps = Divisors(BigInteger.Abs(b[0]));
        var qs = Divisors(BigInteger.Abs(b[^1]));
        if (ps is null || qs is null) return null;
        var seen = new HashSet<Rational>();
        foreach (var p in ps)
            foreach (var q in qs)
                foreach (var sign in new[] { 1, -1 })
                {
                    var r = new Rational(sign * p, q);
                    if (seen.Add(r) && Evaluate(b, r).IsZero) roots.Add(r);
                }
        return roots;
    }

    private static List<BigInteger>? Divisors(BigInteger n)
    {
        if (n > new BigInteger(1_000_000_000_000)) return null;
        long m = (long)n;
        var small = new List<BigInteger>();
        var large = new List<BigInteger>();
        for (long d = 1; d * d <= m; d++)
        {
            if (m % d != 0) continue;
            small.Add(d);
            if (d != m / d) large.Add(m / d);
        }
        large.Reverse();
        small.AddRange(large);
        return small;
    }

    /// <summary>All complex roots (Aberth–Ehrlich iteration in double precision, polished by Newton).</summary>
    public static Complex[] Roots(BigInteger[] a)
    {
        a = Trim(a);
        int n = a.Length - 1;
        if (n < 1) return [];
        var c = a.Select(x => (double)x).ToArray();
        double lead = c[^1];
        for (int i = 0; i < c.Length; i++) c[i] /= lead;
        double radius = 1 + c.Take(n).Max(Math.Abs);
        var z = new Complex[n];
        for (int i = 0; i < n; i++) z[i] = Complex.FromPolarCoordinates(radius * 0.9, 2 * Math.PI * i / n + 0.4);
        for (int iter = 0; iter < 500; iter++)
        {
            double change = 0;
            for (int i = 0; i < n; i++)
            {
                var (p, dp) = Horner(c, z[i]);
                if (p == Complex.Zero) continue;
                var ratio = p / dp;
                Complex s = Complex.Zero;
                for (int j = 0; j < n; j++) if (j != i) s += 1 / (z[i] - z[j]);
                var w = ratio / (1 - ratio * s);
                z[i] -= w;
                change = Math.Max(change, w.Magnitude / Math.Max(1, z[i].Magnitude));
            }
            if (change < 1e-15) break;
        }
        return z;
    }

    private static (Complex P, Complex D) Horner(double[] c, Complex x)
    {
        Complex p = c[^1], d = Complex.Zero;
        for (int i = c.Length - 2; i >= 0; i--)
        {
            d = d * x + p;
            p = p * x + c[i];
        }
        return (p, d);
    }

    /// <summary>Text such as <c>x^2 - 3*x + 1</c>.</summary>
    public static string Format(BigInteger[] a, string variable = "x")
    {
        a = Trim(a);
        if (a.Length == 0) return "0";
        var sb = new StringBuilder();
        for (int i = a.Length - 1; i >= 0; i--)
        {
            var c = a[i];
            if (c.IsZero) continue;
            bool neg = c.Sign < 0;
            var abs = BigInteger.Abs(c);
            if (sb.Length > 0) sb.Append(neg ? " - " : " + ");
            else if (neg) sb.Append('-');
            if (i == 0) { sb.Append(abs); continue; }
            if (!abs.IsOne) sb.Append(abs).Append('*');
            sb.Append(variable);
            if (i > 1) sb.Append('^').Append(i);
        }
        return sb.ToString();
    }

    /// <summary>LaTeX such as <c>x^{2} - 3 x + 1</c>.</summary>
    public static string Latex(BigInteger[] a, string variable = "x") =>
        System.Text.RegularExpressions.Regex.Replace(Format(a, variable).Replace("*", " "), @"\^(\d+)", "^{$1}");
}
