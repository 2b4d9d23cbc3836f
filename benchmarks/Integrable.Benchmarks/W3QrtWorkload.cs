namespace Integrable.Benchmarks;

/// <summary>W3 control: the integrable QRT map x_{n+1} = 1/x_n + 1/x_n² − x_{n−1} on the line (<c>-- W3qrt N [reps]</c>).</summary>
public sealed class W3QrtWorkload : W3WorkloadBase
{
    /// <inheritdoc/>
    public override string Name => "W3qrt";

    /// <inheritdoc/>
    protected override bool Hietarinta => false;

    /// <inheritdoc/>
    protected override int DefaultN => 60;
}
