using Integrable.RationalFunctions;

namespace Integrable.Recursions;

public sealed partial class RationalMap
{
    /// <summary>The composition this ∘ <paramref name="inner"/>: first <paramref name="inner"/>, then this map.</summary>
    /// <param name="inner">A map on the same state variables.</param>
    /// <returns>p ↦ this(inner(p)); its parameters are the union of both maps' parameters.</returns>
    /// <exception cref="ArgumentException">The state variables differ.</exception>
    /// <exception cref="PoleException">A denominator vanishes identically after substitution (the image of
    /// <paramref name="inner"/> lies in the polar locus of this map).</exception>
    public RationalMap Compose(RationalMap inner)
    {
        ArgumentNullException.ThrowIfNull(inner);
        if (!StateVariables.SequenceEqual(inner.StateVariables))
            throw new ArgumentException($"cannot compose maps on ({string.Join(", ", StateVariables)}) and ({string.Join(", ", inner.StateVariables)})", nameof(inner));
        var values = new Dictionary<string, RationalFunction>(StringComparer.Ordinal);
        for (int i = 0; i < Dimension; i++) values[StateVariables[i]] = inner.Components[i];
        return Create(StateVariables, [.. Components.Select(c => c.Substitute(values))]);
    }

    /// <summary>The iterate φⁿ (φ⁰ = identity; negative n iterates the verified inverse).</summary>
    /// <param name="n">The exponent.</param>
    /// <returns>φⁿ, computed by repeated squaring.</returns>
    /// <exception cref="MapInversionException">n &lt; 0 and the map cannot be inverted.</exception>
    public RationalMap Power(int n)
    {
        if (n < 0) return Invert().Inverse.Power(checked(-n));
        var result = Identity([.. StateVariables]);
        var b = this;
        bool first = true;
        while (n > 0)
        {
            if ((n & 1) != 0) { result = first ? b : result.Compose(b); first = false; }
            n >>= 1;
            if (n > 0) b = b.Compose(b);
        }
        return result;
    }

    /// <summary>True when every component is the corresponding state variable.</summary>
    public bool IsIdentity => Enumerable.Range(0, Dimension).All(i => Components[i] == Field.Variable(StateVariables[i]));

    /// <summary>The pull-back f ∘ φ of a function of the state variables (and parameters).</summary>
    /// <param name="f">The function.</param>
    /// <returns>f(φ₁, …, φ_k).</returns>
    /// <exception cref="PoleException">f's denominator vanishes identically on the image.</exception>
    public RationalFunction Pullback(RationalFunction f)
    {
        ArgumentNullException.ThrowIfNull(f);
        var values = new Dictionary<string, RationalFunction>(StringComparer.Ordinal);
        for (int i = 0; i < Dimension; i++)
            if (f.Field.PolynomialRing.Contains(StateVariables[i])) values[StateVariables[i]] = Components[i];
        return values.Count == 0 ? f : f.Substitute(values);
    }

    /// <summary>Checks exactly whether f ∘ φ = f (a conserved quantity of the map).</summary>
    /// <param name="f">The candidate invariant.</param>
    /// <returns>True when the pull-back equals f as rational functions.</returns>
    public bool IsInvariant(RationalFunction f)
    {
        ArgumentNullException.ThrowIfNull(f);
        var g = Pullback(f);
        var common = g.Field.Unify(f.Field);
        return common.Embed(g) == common.Embed(f);
    }

    /// <summary>The Jacobian matrix J_{ij} = ∂φ_i/∂x_j.</summary>
    /// <returns>A k×k array of rational functions.</returns>
    public RationalFunction[,] JacobianMatrix()
    {
        var j = new RationalFunction[Dimension, Dimension];
        for (int r = 0; r < Dimension; r++)
            for (int c = 0; c < Dimension; c++)
                j[r, c] = Components[r].Derivative(StateVariables[c]);
        return j;
    }

    /// <summary>The Jacobian determinant det(∂φ_i/∂x_j), by Gaussian elimination over the field of
    /// rational functions.</summary>
    /// <returns>The determinant (zero exactly when the map is not dominant).</returns>
    public RationalFunction JacobianDeterminant() => Determinant(Field, JacobianMatrix());

    /// <summary>For a density ρ, the ratio (ρ ∘ φ)·det Dφ / ρ: it is 1 exactly when φ preserves the measure
    /// ρ dx₁…dx_k, and −1 when φ maps it to its negative (an orientation-reversing measure-preserving map).</summary>
    /// <param name="density">ρ, a non-zero rational function of the state variables (and parameters).</param>
    /// <returns>The ratio, exact.</returns>
    /// <exception cref="ArgumentException"><paramref name="density"/> is zero.</exception>
    public RationalFunction DensityRatio(RationalFunction density)
    {
        ArgumentNullException.ThrowIfNull(density);
        if (density.IsZero) throw new ArgumentException("a density must be non-zero", nameof(density));
        var pulled = Pullback(density) * JacobianDeterminant();
        var common = pulled.Field.Unify(density.Field);
        return common.Embed(pulled) / common.Embed(density);
    }

    internal static RationalFunction Determinant(RationalFunctionField field, RationalFunction[,] m)
    {
        int n = m.GetLength(0);
        var a = (RationalFunction[,])m.Clone();
        var det = field.One;
        for (int k = 0; k < n; k++)
        {
            int p = k;
            while (p < n && a[p, k].IsZero) p++;
            if (p == n) return field.Zero;
            if (p != k)
            {
                for (int c = 0; c < n; c++) (a[k, c], a[p, c]) = (a[p, c], a[k, c]);
                det = -det;
            }
            det *= a[k, k];
            for (int r = k + 1; r < n; r++)
            {
                if (a[r, k].IsZero) continue;
                var f = a[r, k] / a[k, k];
                for (int c = k; c < n; c++) a[r, c] -= f * a[k, c];
            }
        }
        return det;
    }
}
