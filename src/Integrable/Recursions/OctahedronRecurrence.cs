using Integrable.Algebra;

namespace Integrable.Recursions;

/// <summary>The octahedron recurrence on Z³,
/// f(i, j, k+1)·f(i, j, k−1) = f(i+1, j, k)·f(i−1, j, k) + f(i, j+1, k)·f(i, j−1, k),
/// evaluated from initial data on a stepped surface, in the light cone of the requested value.</summary>
/// <remarks>With independent initial variables, f at height k above the flat two-layer surface is a
/// Laurent polynomial with 2^{k(k+1)/2} terms, all with coefficient 1 — one per domino tiling of the
/// Aztec diamond of order k (Elkies–Kuperberg–Larsen–Propp 1992; Speyer 2007).</remarks>
public static class OctahedronRecurrence
{
    /// <summary>Computes f(i, j, k).</summary>
    /// <typeparam name="T">Element type of the domain.</typeparam>
    /// <param name="ring">The domain (needs exact division).</param>
    /// <param name="surface">The stepped surface carrying the initial data.</param>
    /// <param name="initial">The initial value at (i, j, h(i, j)), as a function of (i, j).</param>
    /// <param name="i">First coordinate of the wanted value.</param>
    /// <param name="j">Second coordinate.</param>
    /// <param name="k">Height; k ≥ h(i, j) and k ≡ h(i, j) (mod 2).</param>
    /// <param name="cancellation">Cancels the computation.</param>
    /// <returns>The value f(i, j, k).</returns>
    /// <exception cref="ArgumentException">The point is below the surface or of the wrong parity, or the surface is not stepped.</exception>
    /// <exception cref="SingularStepException">A division fails in <paramref name="ring"/>.</exception>
    public static T Evaluate<T>(IRing<T> ring, SteppedSurface surface, Func<int, int, T> initial, int i, int j, int k,
        CancellationToken cancellation = default) =>
        Evaluate(ring, surface, initial, i, j, k, null, int.MinValue, int.MaxValue, cancellation);

    /// <summary>Computes f(i, j, k) with the first coordinate confined to a strip: the recurrence is applied
    /// only at points with <paramref name="iMin"/> ≤ i ≤ <paramref name="iMax"/>, and values just outside the
    /// strip come from <paramref name="boundary"/> (for the A_r T-system, f(0, j, k) = f(r + 1, j, k) = 1).</summary>
    /// <typeparam name="T">Element type of the domain.</typeparam>
    /// <param name="ring">The domain (needs exact division).</param>
    /// <param name="surface">The stepped surface carrying the initial data (its heights matter inside the strip only).</param>
    /// <param name="initial">The initial value at (i, j, h(i, j)), as a function of (i, j); called inside the strip only.</param>
    /// <param name="i">First coordinate of the wanted value, inside the strip.</param>
    /// <param name="j">Second coordinate.</param>
    /// <param name="k">Height; k ≥ h(i, j) and k ≡ h(i, j) (mod 2).</param>
    /// <param name="boundary">The value at (i, j, k) for i outside the strip; required when the strip is bounded.</param>
    /// <param name="iMin">Smallest first coordinate computed by the recurrence.</param>
    /// <param name="iMax">Largest first coordinate computed by the recurrence.</param>
    /// <param name="cancellation">Cancels the computation.</param>
    /// <returns>The value f(i, j, k).</returns>
    /// <exception cref="ArgumentException">The point is outside the strip, below the surface or of the wrong
    /// parity; the surface is not stepped; or a bounded strip has no boundary function.</exception>
    /// <exception cref="SingularStepException">A division fails in <paramref name="ring"/>.</exception>
    public static T Evaluate<T>(IRing<T> ring, SteppedSurface surface, Func<int, int, T> initial, int i, int j, int k,
        Func<int, int, int, T>? boundary, int iMin, int iMax, CancellationToken cancellation = default)
    {
        using var cancellationScope = Kernels.KernelCancellation.Enter(cancellation);
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(surface);
        ArgumentNullException.ThrowIfNull(initial);
        if ((iMin != int.MinValue || iMax != int.MaxValue) && boundary is null)
            throw new ArgumentException("a bounded strip needs a boundary function", nameof(boundary));
        if (i < iMin || i > iMax)
            throw new ArgumentException($"the first coordinate {i} is outside the strip [{iMin}, {iMax}]", nameof(i));
        int h0 = surface.Height(i, j);
        if (k < h0 || ((k - h0) & 1) != 0)
            throw new ArgumentException($"({i}, {j}, {k}) is not on or above the stepped surface with matching parity (surface height there: {h0})");
        var memo = new Dictionary<(int, int, int), T>();
        var fused = ring as IProductSumDivision<T>;
        T Value(int x, int y, int z)
        {
            if (x < iMin || x > iMax) return boundary!(x, y, z);
            int h = surface.Height(x, y);
            if (z == h) return initial(x, y);
            if (memo.TryGetValue((x, y, z), out var v)) return v;
            cancellation.ThrowIfCancellationRequested();
            foreach (var (dx, dy) in Neighbours)
                if (x + dx >= iMin && x + dx <= iMax && Math.Abs(surface.Height(x + dx, y + dy) - h) != 1)
                    throw new ArgumentException($"the surface is not stepped between ({x}, {y}) and ({x + dx}, {y + dy})");
            T a = Value(x + 1, y, z - 1), b = Value(x - 1, y, z - 1), c = Value(x, y + 1, z - 1), d = Value(x, y - 1, z - 1);
            var den = Value(x, y, z - 2);
            // The exchange step (a·b + c·d)/den, fused where the ring offers it (Laurent polynomials).
            T q;
            bool exact = fused is not null
                ? fused.TryDivideProductSum(a, b, c, d, den, out q)
                : ring.TryDivide(ring.Add(ring.Multiply(a, b), ring.Multiply(c, d)), den, out q);
            if (!exact)
                throw new SingularStepException(z, $"f({x},{y},{z})", $"division by f({x},{y},{z - 2}) is not exact in {ring}");
            memo[(x, y, z)] = q;
            return q;
        }
        return Value(i, j, k);
    }

    private static readonly (int, int)[] Neighbours = [(1, 0), (-1, 0), (0, 1), (0, -1)];
}
