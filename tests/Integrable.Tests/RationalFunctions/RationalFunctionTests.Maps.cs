using Integrable.RationalFunctions;

namespace Integrable.Tests.RationalFunctions;

/// <summary>Iterated birational maps computed exactly as rational functions.</summary>
public sealed class RationalFunctionMapsTests
{
    [Fact]
    public void LynessMap_FifthIterate_IsTheIdentity()
    {
        // Lyness (1942): x_{n+1} = (x_n + 1)/x_{n-1} has period 5, i.e. (x, y) -> (y, (y + 1)/x) has order 5.
        var f = new RationalFunctionField("x", "y");
        RationalFunction x = f.Variable("x"), y = f.Variable("y");
        var (a, b) = (x, y);
        for (int i = 1; i <= 5; i++)
        {
            (a, b) = (b, (b + 1) / a);
            if (i < 5) Assert.False(a == x && b == y, $"period divides {i}");
        }
        Assert.Equal(x, a);
        Assert.Equal(y, b);
    }

    [Fact]
    public void LynessMap_CompositionOfTheMapWithItself_FiveTimesIsTheIdentity()
    {
        var f = new RationalFunctionField("x", "y");
        var mapX = f.Variable("y");
        var mapY = f.Parse("(y + 1)/x");
        var (a, b) = (f.Variable("x"), f.Variable("y"));
        for (int i = 0; i < 5; i++) (a, b) = (a.Compose(mapX, mapY), b.Compose(mapX, mapY));
        Assert.Equal(f.Variable("x"), a);
        Assert.Equal(f.Variable("y"), b);
    }

    [Fact]
    public void HietarintaVialletMap_FirstIterates_HaveTheKnownDegrees()
    {
        // Hietarinta and Viallet, "Singularity confinement and chaos in discrete systems", PRL 81 (1998):
        // x_{n+1} = x_n + 1/x_n^2 - x_{n-1}; from x_0 = x, x_1 = y the iterates x_2, x_3, x_4, x_5 have
        // numerator/denominator total degrees 3/2, 9/8, 25/24, 67/66 (also the shared anchors' W3 biv run).
        var f = new RationalFunctionField("x", "y");
        var prev = f.Variable("x");
        var cur = f.Variable("y");
        int[][] expected = [[3, 2], [9, 8], [25, 24], [67, 66]];
        foreach (var e in expected)
        {
            (prev, cur) = (cur, cur + cur.Pow(-2) - prev);
            Assert.Equal(e[0], cur.NumeratorDegree());
            Assert.Equal(e[1], cur.DenominatorDegree());
        }
    }
}
