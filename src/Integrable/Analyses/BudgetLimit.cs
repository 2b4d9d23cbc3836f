namespace Integrable.Analyses;

/// <summary>Which budget limit stopped an analysis before it had done all the work it was asked for.</summary>
public enum BudgetLimit
{
    /// <summary>No limit was reached: the analysis did all the requested work.</summary>
    None,
    /// <summary>An intermediate or final value had more terms than <see cref="AnalysisBudget.MaxTerms"/>.</summary>
    Terms,
    /// <summary>The wall-clock time exceeded <see cref="AnalysisBudget.TimeLimit"/>.</summary>
    Time,
    /// <summary>A degree exceeded <see cref="AnalysisBudget.MaxDegree"/>.</summary>
    Degree,
    /// <summary>A series ran out of precision even at <see cref="AnalysisBudget.MaxPrecision"/> terms.</summary>
    Precision,
}
