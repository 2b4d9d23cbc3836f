using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Serialization;

namespace Integrable.Serialization;

/// <summary>JSON for the library's values with System.Text.Json: converters that write each value in a small,
/// readable form and read it back to an equal value, checked again on the way in.</summary>
/// <remarks>
/// <para><b>Forms.</b> <see cref="Numbers.Rational"/> is the string <c>"p/q"</c> (<c>"p"</c> for integers);
/// <see cref="Polynomials.LaurentPolynomial"/> is <c>{"ring": [names], "text": …}</c>;
/// <see cref="RationalFunctions.RationalFunction"/> is <c>{"field": [names], "text": …}</c>;
/// <see cref="LinearAlgebra.RationalMatrix"/> is <c>{"rowCount", "columnCount", "entries": [[…]]}</c>;
/// <see cref="Recursions.Recurrence"/> is <c>{"equation", "index"}</c> and is parsed and compiled again on reading
/// (same text, order, parameters and iterates); <see cref="Recursions.RecurrenceSystem"/> is <c>{"equations", "index"}</c>;
/// <see cref="Recursions.LatticeRecurrence"/> is <c>{"equation"}</c>; <see cref="Recursions.RationalMap"/> is
/// <c>{"stateVariables", "parameters", "components"}</c>; <see cref="Clusters.ExchangeMatrix"/> is
/// <c>{"mutableCount", "rows"}</c>; <see cref="Clusters.Quiver"/> is <c>{"mutableCount", "frozenCount", "arrows"}</c>
/// (1-based vertices); <c>Seed&lt;LaurentPolynomial&gt;</c> is <c>{"ring", "matrix", "variables"}</c> and
/// <c>Seed&lt;Rational&gt;</c> is <c>{"matrix", "variables"}</c>. Every report (<see cref="Analyses.IAnalysisReport"/>)
/// is written as its <see cref="Analyses.IAnalysisReport.ToJson"/> object; reports are not read back.</para>
/// <para><b>Errors.</b> Malformed or invalid JSON gives a <see cref="JsonException"/> whose message names the type
/// and the field (e.g. <c>Recurrence: field 'equation' is not valid: …</c>); the library's own exception, when
/// there is one, is the inner exception. Field names are matched case-insensitively; unknown fields are errors.</para>
/// <para>The options are shared and read-only; use <see cref="AddConverters"/> to add the converters to options of
/// your own.</para>
/// </remarks>
/// <example><code>
/// var rec = Recurrence.Parse("x_{n+1} x_{n-1} = x_n^2 + x_n + 1");
/// string json = IntegrableJson.Serialize(rec);        // {"equation":"x_{n+1} x_{n-1} = x_n^2 + x_n + 1","index":"n"}
/// var back = IntegrableJson.Deserialize&lt;Recurrence&gt;(json);
/// record Run(Recurrence Rule, Rational Start);       // your own types work through IntegrableJson.Options
/// </code></example>
public static class IntegrableJson
{
    private static readonly JsonSerializerOptions Shared = CreateOptions();

    /// <summary>Read-only options with every converter registered, web defaults (camelCase names,
    /// case-insensitive reading) and unescaped non-ASCII text; pass them to <see cref="JsonSerializer"/> for
    /// records of your own that contain library values.</summary>
    public static JsonSerializerOptions Options => Shared;

    /// <summary>Adds the library's converters to <paramref name="options"/> (which must not be in use yet).</summary>
    /// <param name="options">Options of your own.</param>
    /// <exception cref="ArgumentNullException"><paramref name="options"/> is null.</exception>
    /// <exception cref="InvalidOperationException">The options are read-only (already used for serialization).</exception>
    public static void AddConverters(JsonSerializerOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        foreach (var c in Converters()) options.Converters.Add(c);
    }

    /// <summary>The JSON text of <paramref name="value"/> (any type; library values inside it use the converters).</summary>
    /// <typeparam name="T">The declared type; <c>object</c> serializes by the run-time type.</typeparam>
    /// <param name="value">The value.</param>
    /// <returns>Compact JSON text.</returns>
    /// <exception cref="JsonException">A value that cannot be written, e.g. a seed over a ring other than Laurent
    /// polynomials or rationals.</exception>
    public static string Serialize<T>(T value) => JsonSerializer.Serialize(value, Shared);

    /// <summary>Reads a value of type <typeparamref name="T"/> from JSON text.</summary>
    /// <typeparam name="T">The type to read.</typeparam>
    /// <param name="json">The JSON text.</param>
    /// <returns>The value, never null.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="json"/> is null.</exception>
    /// <exception cref="JsonException">Malformed JSON, a missing, unknown or ill-typed field, a value that the library
    /// rejects (the message names the type and field), or the JSON <c>null</c>.</exception>
    public static T Deserialize<T>(string json)
    {
        ArgumentNullException.ThrowIfNull(json);
        return JsonSerializer.Deserialize<T>(json, Shared)
            ?? throw new JsonException($"{typeof(T).Name}: the JSON is null, expected a value");
    }

    private static JsonSerializerOptions CreateOptions()
    {
        var options = new JsonSerializerOptions(JsonSerializerDefaults.Web) { Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };
        AddConverters(options);
        options.MakeReadOnly(populateMissingResolver: true);
        return options;
    }

    private static IEnumerable<JsonConverter> Converters() =>
    [
        new RationalJsonConverter(),
        new RationalMatrixJsonConverter(),
        new LaurentPolynomialJsonConverter(),
        new RationalFunctionJsonConverter(),
        new ExchangeMatrixJsonConverter(),
        new QuiverJsonConverter(),
        new LaurentSeedJsonConverter(),
        new RationalSeedJsonConverter(),
        new RecurrenceJsonConverter(),
        new RecurrenceSystemJsonConverter(),
        new LatticeRecurrenceJsonConverter(),
        new RationalMapJsonConverter(),
        new ReportJsonConverterFactory(),
    ];
}
