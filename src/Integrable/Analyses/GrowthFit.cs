using System.Collections.Immutable;
using System.Globalization;
using System.Numerics;
using Integrable.Guessing;
using Integrable.Numbers;

namespace Integrable.Analyses;

/// <summary>A rational generating function fitted to a degree sequence and what it says about growth:
/// the class (bounded, linear, quadratic, polynomial of degree d, exponential) read from the roots of its
/// denominator, and for exponential growth the algebraic entropy log λ with λ given by its minimal
/// polynomial and a decimal value.</summary>
/// <remarks>
/// The generating function Σ d_n z^n = P(z)/Q(z) is found by Berlekamp–Massey and checked against every
/// degree; <see cref="TermsConfirmed"/> counts the degrees beyond those that determined it. The
/// reciprocal polynomial of Q is split into cyclotomic factors (exact division) and the rest: when
/// nothing else remains, every root is a root of unity (Kronecker) and the growth is polynomial of
/// degree (largest multiplicity − 1); otherwise the rest has a root λ with |λ| &gt; 1, the growth is
/// exponential and the entropy is log λ. The minimal polynomial of λ is the smallest integer factor of
/// the rest that has λ as a root (found from numerical roots, verified by exact division).
/// Reference: M. Bellon, C.-M. Viallet, "Algebraic entropy", Comm. Math. Phys. 204 (1999) 425–437.
/// </remarks>
/// <example><code>
/// var fit = GrowthFit.FromDegrees([1, 1, 3, 9, 25, 67, 177, 465, 1219, 3193, 8361, 21891]);
/// // fit.Class = Exponential, fit.MinimalPolynomial = "x^2 - 3*x + 1", fit.Entropy ≈ 0.9624
/// </code></example>
public sealed class GrowthFit
{
    private GrowthFit(ImmutableArray<long> degrees, string? generatingFunction, string? recurrence, bool found, int used, int confirmed,
        GrowthClass? growthClass, int polynomialDegree, BigInteger[]? minimal, double dominantRoot, string explanation)
    {
        Degrees = degrees;
        GeneratingFunction = generatingFunction;
        Recurrence = recurrence;
        IsFound = found;
        TermsUsed = used;
        TermsConfirmed = confirmed;
        Class = growthClass;
        PolynomialDegree = polynomialDegree;
        _minimal = minimal;
        DominantRoot = dominantRoot;
        Explanation = explanation;
    }

    private readonly BigInteger[]? _minimal;

    /// <summary>The degree sequence fitted.</summary>
    public ImmutableArray<long> Degrees { get; }

    /// <summary>The generating function P(x)/Q(x) as text, or null when none was found.</summary>
    public string? GeneratingFunction { get; }

    /// <summary>The linear recurrence of the degrees as text, or null.</summary>
    public string? Recurrence { get; }

    /// <summary>True when the generating function was confirmed by enough extra degrees.</summary>
    public bool IsFound { get; }

    /// <summary>Degrees that determined the generating function.</summary>
    public int TermsUsed { get; }

    /// <summary>Further degrees that agreed with it.</summary>
    public int TermsConfirmed { get; }

    /// <summary>The growth class, or null when no generating function was found.</summary>
    public GrowthClass? Class { get; }

    /// <summary>d for growth like n^d (0 bounded, 1 linear, 2 quadratic, …); −1 for exponential or unknown growth.</summary>
    public int PolynomialDegree { get; }

    /// <summary>The dominant root λ (1 for polynomial growth, NaN when unknown).</summary>
    public double DominantRoot { get; }

    /// <summary>The algebraic entropy log λ (0 for polynomial growth, NaN when unknown).</summary>
    public double Entropy => double.IsNaN(DominantRoot) ? double.NaN : Math.Log(DominantRoot);

    /// <summary>The minimal polynomial of λ over Q as text in x (e.g. <c>x^2 - 3*x + 1</c>), or null.</summary>
    public string? MinimalPolynomial => _minimal is null ? null : IntegerPolynomial.Format(_minimal);

    /// <summary>The minimal polynomial in LaTeX, or null.</summary>
    public string? MinimalPolynomialLatex => _minimal is null ? null : IntegerPolynomial.Latex(_minimal);

    /// <summary>Why the class is what it is (or why none was found).</summary>
    public string Explanation { get; }

    /// <summary>The class name used in reports: bounded, linear, quadratic, polynomial, exponential (or unknown).</summary>
    public string ClassName => Class switch
    {
        GrowthClass.Bounded => "bounded",
        GrowthClass.Linear => "linear",
        GrowthClass.Quadratic => "quadratic",
        GrowthClass.Polynomial => "polynomial",
        GrowthClass.Exponential => "exponential",
        _ => "unknown",
    };

    /// <summary>Fits a generating function to a degree sequence and classifies the growth.</summary>
    /// <param name="degrees">d_0, d_1, … (non-negative).</param>
    /// <param name="minimumConfirmations">Extra degrees required to confirm the fit (default 5).</param>
    /// <returns>The fit; <see cref="IsFound"/> is false when the degrees do not determine it yet.</returns>
    /// <exception cref="ArgumentException">A degree is negative.</exception>
    public static GrowthFit FromDegrees(IReadOnlyList<long> degrees, int minimumConfirmations = GuessDefaults.MinimumConfirmations)
    {
        ArgumentNullException.ThrowIfNull(degrees);
        for (int i = 0; i < degrees.Count; i++)
            if (degrees[i] < 0) throw new ArgumentException($"degree {i} is negative ({degrees[i]})", nameof(degrees));
        var seq = degrees.ToImmutableArray();
        var terms = degrees.Select(d => new Rational(d)).ToArray();
        var guess = BerlekampMassey.Find(terms, minimumConfirmations);
        if (!guess.IsFound)
            return new GrowthFit(seq, guess.Candidate?.GeneratingFunction.ToString(), guess.Candidate?.ToString(), false, guess.TermsUsed, guess.TermsConfirmed,
                null, -1, null, double.NaN, $"no generating function confirmed: {guess.Explanation}");
        var rec = guess.Value;
        string gf = rec.GeneratingFunction.ToString();
        // Characteristic polynomial x^L − c_1 x^{L−1} − … − c_L, made integral and primitive.
        int l = rec.Order;
        var chi = new Rational[l + 1];
        chi[l] = Rational.One;
        for (int i = 1; i <= l; i++) chi[l - i] = -rec.Coefficients[i - 1];
        var poly = IntegerPolynomial.FromRationals(chi);
        int shift = 0;
        while (shift < poly.Length - 1 && poly[shift].IsZero) shift++;
        poly = poly[shift..];
        if (poly.Length <= 1)
            return new GrowthFit(seq, gf, rec.ToString(), true, guess.TermsUsed, guess.TermsConfirmed, GrowthClass.Bounded, 0, null, 1,
                "the degrees are eventually zero");
        // Cyclotomic part.
        int maxMultiplicity = 0;
        var rest = poly;
        // φ(m) ≥ √(m/2), so only m ≤ 2·deg² can give a factor.
        int mMax = 2 * IntegerPolynomial.Degree(poly) * IntegerPolynomial.Degree(poly) + 2;
        for (int m = 1; m <= mMax; m++)
        {
            if (IntegerPolynomial.Totient(m) > IntegerPolynomial.Degree(rest)) continue;
            var phi = IntegerPolynomial.Cyclotomic(m);
            int mult = 0;
            while (IntegerPolynomial.Degree(rest) >= IntegerPolynomial.Degree(phi) && IntegerPolynomial.TryDivide(rest, phi, out var q)) { rest = q; mult++; }
            maxMultiplicity = Math.Max(maxMultiplicity, mult);
        }
        if (IntegerPolynomial.Degree(rest) == 0)
        {
            int d = maxMultiplicity - 1;
            var cls = d switch { 0 => GrowthClass.Bounded, 1 => GrowthClass.Linear, 2 => GrowthClass.Quadratic, _ => GrowthClass.Polynomial };
            return new GrowthFit(seq, gf, rec.ToString(), true, guess.TermsUsed, guess.TermsConfirmed, cls, d, null, 1,
                $"every root of the denominator is a root of unity (largest multiplicity {maxMultiplicity}): degrees grow like n^{d}");
        }
        var roots = IntegerPolynomial.Roots(rest);
        int best = 0;
        for (int i = 1; i < roots.Length; i++)
            if (roots[i].Magnitude > roots[best].Magnitude + 1e-9 || (Math.Abs(roots[i].Magnitude - roots[best].Magnitude) <= 1e-9 && Math.Abs(roots[i].Imaginary) < Math.Abs(roots[best].Imaginary)))
                best = i;
        double lambda = roots[best].Magnitude;
        var minimal = MinimalFactor(rest, roots, best);
        if (minimal is not null && minimal.Length > 0 && IntegerPolynomial.Degree(minimal) >= 1)
            lambda = Polish(minimal, lambda);
        return new GrowthFit(seq, gf, rec.ToString(), true, guess.TermsUsed, guess.TermsConfirmed, GrowthClass.Exponential, -1, minimal, lambda,
            $"the denominator has the root 1/λ with λ = {lambda.ToString("R", CultureInfo.InvariantCulture)} > 1, a root of {IntegerPolynomial.Format(minimal ?? rest)}: exponential growth");
    }

    /// <summary>The smallest-degree factor of <paramref name="rest"/> over Z having the chosen root, from products of subsets of the numerical roots, verified by exact division.</summary>
    private static BigInteger[]? MinimalFactor(BigInteger[] rest, Complex[] roots, int chosen)
    {
        int n = roots.Length;
        if (n > 16) return rest;
        var others = Enumerable.Range(0, n).Where(i => i != chosen).ToArray();
        for (int size = 0; size < n; size++)
        {
            foreach (var subset in Subsets(others, size))
            {
                var product = new Complex[] { Complex.One };
                foreach (int i in subset.Append(chosen))
                {
                    var next = new Complex[product.Length + 1];
                    for (int j = 0; j < product.Length; j++) { next[j + 1] += product[j]; next[j] -= product[j] * roots[i]; }
                    product = next;
                }
                var rounded = new BigInteger[product.Length];
                bool ok = true;
                for (int j = 0; j < product.Length && ok; j++)
                {
                    double re = Math.Round(product[j].Real);
                    if (Math.Abs(product[j].Imaginary) > 1e-6 || Math.Abs(product[j].Real - re) > 1e-6 * Math.Max(1, Math.Abs(re))) ok = false;
                    else rounded[j] = new BigInteger(re);
                }
                if (ok && IntegerPolynomial.TryDivide(rest, rounded, out _)) return rounded;
            }
        }
        return rest;
    }

    private static IEnumerable<int[]> Subsets(int[] items, int size)
    {
        if (size == 0) { yield return []; yield break; }
        for (int i = 0; i <= items.Length - size; i++)
            foreach (var tail in Subsets(items[(i + 1)..], size - 1))
                yield return [items[i], .. tail];
    }

    /// <summary>Newton steps on the exact polynomial from the numerical root.</summary>
    private static double Polish(BigInteger[] p, double x)
    {
        var c = p.Select(v => (double)v).ToArray();
        for (int it = 0; it < 50; it++)
        {
            double f = 0, d = 0;
            for (int i = c.Length - 1; i >= 0; i--) { d = d * x + f; f = f * x + c[i]; }
            if (d == 0) break;
            double step = f / d;
            x -= step;
            if (Math.Abs(step) < 1e-16 * Math.Abs(x)) break;
        }
        return x;
    }

    /// <summary>Text such as <c>exponential: entropy log λ ≈ 0.9624, λ root of x^2 - 3*x + 1</c>.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Class switch
    {
        null => Explanation,
        GrowthClass.Exponential => $"exponential: entropy log λ = {Entropy.ToString("G10", CultureInfo.InvariantCulture)}, λ = {DominantRoot.ToString("G12", CultureInfo.InvariantCulture)} root of {MinimalPolynomial}",
        GrowthClass.Polynomial => $"polynomial of degree {PolynomialDegree}",
        _ => ClassName,
    };
}
