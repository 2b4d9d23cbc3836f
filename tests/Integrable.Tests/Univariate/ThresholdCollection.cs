namespace Integrable.Tests.Univariate;

/// <summary>Tests that change the static algorithm thresholds run in this collection, one at a time.</summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class ThresholdCollection
{
    public const string Name = "Univariate thresholds";
}
