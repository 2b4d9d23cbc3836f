namespace Integrable.Recursions;

/// <summary>Initial data support for the octahedron recurrence: a height function h on Z² whose values
/// at lattice neighbours differ by exactly 1 (a stepped surface). The initial values sit at the points
/// (i, j, h(i, j)); every point above the surface with the same parity is determined by them.</summary>
public sealed class SteppedSurface
{
    private readonly Func<int, int, int> _height;

    /// <summary>A stepped surface given by its height function.</summary>
    /// <param name="height">h(i, j); neighbours must differ by exactly 1 (checked where it is used).</param>
    public SteppedSurface(Func<int, int, int> height) => _height = height ?? throw new ArgumentNullException(nameof(height));

    /// <summary>The flat surface on the two layers k = 0 and k = 1: h(i, j) = (i + j + parity) mod 2.</summary>
    /// <param name="parity">0 or 1: which layer holds the point (0, 0).</param>
    /// <returns>The surface.</returns>
    public static SteppedSurface Flat(int parity = 0)
    {
        if (parity is not (0 or 1)) throw new ArgumentOutOfRangeException(nameof(parity), parity, "parity is 0 or 1");
        return new SteppedSurface((i, j) => (int)(((long)i + j + parity) & 1));
    }

    /// <summary>The height h(i, j).</summary>
    /// <param name="i">First coordinate.</param>
    /// <param name="j">Second coordinate.</param>
    /// <returns>The height.</returns>
    public int Height(int i, int j) => _height(i, j);
}
