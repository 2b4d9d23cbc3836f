namespace Integrable.Algebra;

/// <summary>A ring with a fused exchange step (a·b + c·d)/e. Straight-line programs use it for every
/// division of a sum of two single-use products (Somos, T-system, octahedron and cluster exchange
/// relations) instead of three separate operations.</summary>
/// <typeparam name="T">The element type.</typeparam>
internal interface IProductSumDivision<T>
{
    /// <summary>Exact (a·b + c·d)/e, with the same answer as the separate operations.</summary>
    /// <returns>False when <paramref name="e"/> does not divide the sum (or is zero).</returns>
    bool TryDivideProductSum(T a, T b, T c, T d, T e, out T quotient);
}
