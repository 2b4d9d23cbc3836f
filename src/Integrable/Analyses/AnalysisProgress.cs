namespace Integrable.Analyses;

/// <summary>Progress of a long analysis, reported through <see cref="IProgress{T}"/> after each step.</summary>
/// <param name="Analysis">The analysis, e.g. <c>laurent</c>, <c>growth</c>, <c>period</c>, <c>confine</c>.</param>
/// <param name="Step">Steps done so far.</param>
/// <param name="TotalSteps">Steps requested (an upper bound; the analysis may stop earlier).</param>
/// <param name="Detail">A short description of the last step, e.g. <c>x_9: 359 terms</c>.</param>
public readonly record struct AnalysisProgress(string Analysis, int Step, int TotalSteps, string Detail);
