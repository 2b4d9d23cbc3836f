using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using System.Text.Json;

namespace Integrable.Analyses;

/// <summary>The answer of a degree-growth analysis: the degree of every iterate as a rational function
/// of the initial values (measured on random lines over Z/pZ, two independent lines agreeing at every
/// step), the generating function fitted to the degrees with its confirmations, the growth class and
/// the algebraic entropy.</summary>
/// <example><code>
/// var r = DegreeGrowth.Analyse(Recurrence.Parse("x_{n+1} + x_{n-1} = x_n + 1/x_n^2"), 12);
/// Console.WriteLine(r.Fit.Class);     // Exponential
/// Console.WriteLine(r.Fit.Entropy);   // 0.9624… = log((3 + √5)/2)
/// </code></example>
public sealed class GrowthReport : IAnalysisReport
{
    internal GrowthReport(string subject, ImmutableArray<long> degrees, ImmutableArray<int> numeratorDegrees, ImmutableArray<int> denominatorDegrees,
        GrowthFit fit, int stepsRequested, ImmutableArray<ulong> primes, ImmutableArray<int> redoneSteps, int exactlyConfirmed, string? exactMismatch,
        BudgetLimit limit, string? limitMessage, TimeSpan elapsed)
    {
        Subject = subject;
        Degrees = degrees;
        NumeratorDegrees = numeratorDegrees;
        DenominatorDegrees = denominatorDegrees;
        Fit = fit;
        StepsRequested = stepsRequested;
        Primes = primes;
        RedoneSteps = redoneSteps;
        ExactlyConfirmed = exactlyConfirmed;
        ExactMismatch = exactMismatch;
        Limit = limit;
        LimitMessage = limitMessage;
        Elapsed = elapsed;
    }

    /// <summary>The map.</summary>
    public string Subject { get; }

    /// <summary>d_0, d_1, …: the degree of each term (initial values have degree 1; for a system, the largest degree of the step's new terms).</summary>
    public ImmutableArray<long> Degrees { get; }

    /// <summary>Numerator degree of each term on the line (same indexing as <see cref="Degrees"/>).</summary>
    public ImmutableArray<int> NumeratorDegrees { get; }

    /// <summary>Denominator degree of each term on the line.</summary>
    public ImmutableArray<int> DenominatorDegrees { get; }

    /// <summary>The generating function fitted to <see cref="Degrees"/> and the growth it implies.</summary>
    public GrowthFit Fit { get; }

    /// <summary>The number of steps asked for.</summary>
    public int StepsRequested { get; }

    /// <summary>The primes of the lines used (two, plus one per redone step).</summary>
    public ImmutableArray<ulong> Primes { get; }

    /// <summary>Steps at which the two lines disagreed and a fresh line decided.</summary>
    public ImmutableArray<int> RedoneSteps { get; }

    /// <summary>How many leading degrees (initial values included) were also confirmed by exact iterates (reduced rational functions over Q).</summary>
    public int ExactlyConfirmed { get; }

    /// <summary>A disagreement between an exact degree and the line degrees (null when none; should never happen).</summary>
    public string? ExactMismatch { get; }

    /// <inheritdoc/>
    public BudgetLimit Limit { get; }

    /// <summary>Why the budget stopped the iteration, or null.</summary>
    public string? LimitMessage { get; }

    /// <summary>Wall time spent.</summary>
    public TimeSpan Elapsed { get; }

    /// <inheritdoc/>
    public string Verification
    {
        get
        {
            var sb = new StringBuilder();
            sb.Append(CultureInfo.InvariantCulture, $"degrees measured on random lines modulo primes ({string.Join(", ", Primes)}), two independent lines agreeing at every step");
            if (RedoneSteps.Length > 0) sb.Append(CultureInfo.InvariantCulture, $" (steps {string.Join(", ", RedoneSteps)} decided by a further line)");
            if (ExactlyConfirmed > 0) sb.Append(CultureInfo.InvariantCulture, $"; the first {ExactlyConfirmed} degrees confirmed by exact iterates (reduced rational functions over Q)");
            if (ExactMismatch is not null) sb.Append("; WARNING: ").Append(ExactMismatch);
            sb.Append("; ").Append(Fit.IsFound
                ? $"generating function determined by {Fit.TermsUsed} degrees and confirmed by {Fit.TermsConfirmed} more (evidence, not proof)"
                : "no generating function confirmed");
            return sb.ToString();
        }
    }

    /// <summary>A readable report.</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append("Degree growth of ").AppendLine(Subject);
        sb.Append("degrees: ").AppendLine(string.Join(", ", Degrees));
        if (Fit.GeneratingFunction is not null) sb.Append("generating function: ").AppendLine(Fit.GeneratingFunction);
        if (Fit.Recurrence is not null) sb.Append("recurrence of the degrees: ").AppendLine(Fit.Recurrence);
        sb.Append("growth: ").AppendLine(Fit.ToString());
        if (Limit != BudgetLimit.None) sb.Append("stopped by the ").Append(ReportJson.LimitName(Limit)).Append(" limit: ").AppendLine(LimitMessage);
        sb.Append("verification: ").AppendLine(Verification);
        return sb.ToString();
    }

    /// <inheritdoc/>
    public string ToLatex()
    {
        var sb = new StringBuilder();
        sb.Append("d_n = ").Append(string.Join(", ", Degrees)).AppendLine("\\\\");
        if (Fit.Class == GrowthClass.Exponential)
            sb.Append("\\text{exponential growth, entropy } \\log\\lambda \\approx ").Append(Fit.Entropy.ToString("G10", CultureInfo.InvariantCulture))
              .Append(",\\ ").Append(Fit.MinimalPolynomialLatex?.Replace("x", "\\lambda")).AppendLine(" = 0");
        else
            sb.Append("\\text{").Append(Fit.ClassName).Append(" growth}").AppendLine();
        return sb.ToString();
    }

    /// <summary>Writes <c>degrees</c>, <c>class</c> (bounded, linear, quadratic, polynomial, exponential, or
    /// null), <c>entropy</c> (a number: 0 for polynomial growth; null when unknown), <c>generatingFunction</c>
    /// (text or null), <c>polynomialDegree</c>, <c>dominantRoot</c>, <c>minimalPolynomial</c>,
    /// <c>recurrence</c>, <c>found</c>, <c>termsUsed</c>, <c>termsConfirmed</c>, <c>numeratorDegrees</c>,
    /// <c>denominatorDegrees</c>, <c>exactlyConfirmed</c>, <c>redoneSteps</c>, <c>primes</c>,
    /// <c>stepsRequested</c>, <c>limit</c>, <c>verification</c>.</summary>
    /// <param name="writer">A writer positioned inside an object.</param>
    public void WriteJsonProperties(Utf8JsonWriter writer)
    {
        ArgumentNullException.ThrowIfNull(writer);
        writer.WriteStartArray("degrees");
        foreach (var d in Degrees) writer.WriteNumberValue(d);
        writer.WriteEndArray();
        if (Fit.Class is null) writer.WriteNull("class"); else writer.WriteString("class", Fit.ClassName);
        if (double.IsNaN(Fit.Entropy)) writer.WriteNull("entropy"); else writer.WriteNumber("entropy", Fit.Entropy);
        if (Fit.GeneratingFunction is null || !Fit.IsFound) writer.WriteNull("generatingFunction"); else writer.WriteString("generatingFunction", Fit.GeneratingFunction);
        writer.WriteNumber("polynomialDegree", Fit.PolynomialDegree);
        if (double.IsNaN(Fit.DominantRoot)) writer.WriteNull("dominantRoot"); else writer.WriteNumber("dominantRoot", Fit.DominantRoot);
        if (Fit.MinimalPolynomial is null) writer.WriteNull("minimalPolynomial"); else writer.WriteString("minimalPolynomial", Fit.MinimalPolynomial);
        if (Fit.Recurrence is null || !Fit.IsFound) writer.WriteNull("recurrence"); else writer.WriteString("recurrence", Fit.Recurrence);
        writer.WriteBoolean("found", Fit.IsFound);
        writer.WriteNumber("termsUsed", Fit.TermsUsed);
        writer.WriteNumber("termsConfirmed", Fit.TermsConfirmed);
        writer.WriteStartArray("numeratorDegrees");
        foreach (var d in NumeratorDegrees) writer.WriteNumberValue(d);
        writer.WriteEndArray();
        writer.WriteStartArray("denominatorDegrees");
        foreach (var d in DenominatorDegrees) writer.WriteNumberValue(d);
        writer.WriteEndArray();
        writer.WriteNumber("exactlyConfirmed", ExactlyConfirmed);
        writer.WriteStartArray("redoneSteps");
        foreach (var s in RedoneSteps) writer.WriteNumberValue(s);
        writer.WriteEndArray();
        writer.WriteStartArray("primes");
        foreach (var p in Primes) writer.WriteNumberValue(p);
        writer.WriteEndArray();
        writer.WriteNumber("stepsRequested", StepsRequested);
        ReportJson.WriteLimit(writer, Limit);
        writer.WriteString("verification", Verification);
    }

    /// <inheritdoc/>
    public string ToJson() => ReportJson.Object(this);
}
