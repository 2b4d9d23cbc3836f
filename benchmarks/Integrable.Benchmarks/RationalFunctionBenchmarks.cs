using BenchmarkDotNet.Attributes;
using Integrable.RationalFunctions;

namespace Integrable.Benchmarks;

/// <summary>BenchmarkDotNet suite for rational-function arithmetic: one step of the Hietarinta–Viallet
/// map at the fifth and sixth iterate (sums with Henrici's gcd tricks, an inverse square), and five
/// compositions of the Lyness map.</summary>
/// <remarks>Run: <c>dotnet run -c Release --project benchmarks/Integrable.Benchmarks -- --filter '*RationalFunctionBenchmarks*'</c>.</remarks>
[MemoryDiagnoser]
public class RationalFunctionBenchmarks
{
    private RationalFunction _prev = null!, _cur = null!, _lynessY = null!;
    private RationalFunctionField _field = null!;

    /// <summary>Index of the iterate x_N that the step starts from.</summary>
    [Params(5, 6)]
    public int N { get; set; }

    /// <summary>Builds the iterates.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _field = new RationalFunctionField("x", "y");
        _prev = _field.Variable(0);
        _cur = _field.Variable(1);
        for (int n = 2; n <= N; n++) (_prev, _cur) = (_cur, _cur + _cur.Pow(-2) - _prev);
        _lynessY = _field.Parse("(y + 1)/x");
    }

    /// <summary>x_{N+1} = x_N + 1/x_N² − x_{N−1}.</summary>
    /// <returns>The next iterate.</returns>
    [Benchmark]
    public RationalFunction HietarintaVialletStep() => _cur + _cur.Pow(-2) - _prev;

    /// <summary>Five compositions of (x, y) → (y, (y + 1)/x), the identity.</summary>
    /// <returns>The first component after five steps.</returns>
    [Benchmark]
    public RationalFunction LynessFiveCompositions()
    {
        RationalFunction a = _field.Variable(0), b = _field.Variable(1);
        var mx = _field.Variable(1);
        for (int i = 0; i < 5; i++) (a, b) = (a.Compose(mx, _lynessY), b.Compose(mx, _lynessY));
        return a;
    }
}
