using System.Text.Json;

namespace Integrable.Analyses;

/// <summary>The common face of every analysis report: an immutable answer that carries its evidence,
/// says how it was verified, and prints as text, LaTeX and JSON.</summary>
public interface IAnalysisReport
{
    /// <summary>How the answer was verified, in one sentence (e.g. "exact Laurent division over Q at every step").</summary>
    string Verification { get; }

    /// <summary>The limit that stopped the analysis early, or <see cref="BudgetLimit.None"/>.</summary>
    BudgetLimit Limit { get; }

    /// <summary>The report as LaTeX (a fragment for a document body or a notebook cell).</summary>
    /// <returns>LaTeX markup.</returns>
    string ToLatex();

    /// <summary>Writes the report as the members of the current JSON object (field names are part of the contract).</summary>
    /// <param name="writer">A writer positioned inside an object.</param>
    void WriteJsonProperties(Utf8JsonWriter writer);

    /// <summary>The report as one indented JSON object.</summary>
    /// <returns>JSON text.</returns>
    string ToJson();
}
