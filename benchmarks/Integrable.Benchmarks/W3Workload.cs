namespace Integrable.Benchmarks;

/// <summary>W3: the Hietarinta–Viallet map on the line (<c>-- W3 N [reps]</c>).</summary>
public sealed class W3Workload : W3WorkloadBase
{
    /// <inheritdoc/>
    public override string Name => "W3";

    /// <inheritdoc/>
    protected override bool Hietarinta => true;

    /// <inheritdoc/>
    protected override int DefaultN => 14;
}
