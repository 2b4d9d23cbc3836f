using System.Text.Json;

namespace Integrable.Serialization;

/// <summary>Reads the fields of one JSON object for a converter: every failure is a
/// <see cref="JsonException"/> whose message names the type and the field.</summary>
internal sealed class JsonFields
{
    private readonly Dictionary<string, JsonElement> _fields;

    private JsonFields(string type, Dictionary<string, JsonElement> fields)
    {
        Type = type;
        _fields = fields;
    }

    /// <summary>The name of the type being read, used in messages.</summary>
    public string Type { get; }

    /// <summary>Reads the object at the reader's position; field names match case-insensitively, and a
    /// repeated or unknown field is an error.</summary>
    public static JsonFields Read(ref Utf8JsonReader reader, string type, params string[] known)
    {
        using var doc = JsonDocument.ParseValue(ref reader);
        return Of(doc.RootElement.Clone(), type, known);
    }

    /// <summary>The fields of an element that must be an object.</summary>
    public static JsonFields Of(JsonElement element, string type, params string[] known)
    {
        if (element.ValueKind != JsonValueKind.Object)
            throw new JsonException($"{type}: expected a JSON object, got {Kind(element)}");
        var fields = new Dictionary<string, JsonElement>(StringComparer.OrdinalIgnoreCase);
        foreach (var p in element.EnumerateObject())
        {
            string? name = known.FirstOrDefault(k => string.Equals(k, p.Name, StringComparison.OrdinalIgnoreCase));
            if (name is null)
                throw new JsonException($"{type}: unknown field '{p.Name}' (expected {string.Join(", ", known.Select(k => "'" + k + "'"))})");
            if (!fields.TryAdd(name, p.Value))
                throw new JsonException($"{type}: field '{name}' appears twice");
        }
        return new JsonFields(type, fields);
    }

    /// <summary>The required field.</summary>
    public JsonElement Required(string field) =>
        _fields.TryGetValue(field, out var e) ? e : throw new JsonException($"{Type}: required field '{field}' is missing");

    /// <summary>True when the field is present and not null.</summary>
    public bool Has(string field) => _fields.TryGetValue(field, out var e) && e.ValueKind != JsonValueKind.Null;

    /// <summary>A required string field.</summary>
    public string String(string field) => StringValue(Required(field), field);

    /// <summary>A required integer field.</summary>
    public int Int(string field) => IntValue(Required(field), field);

    /// <summary>A required array of strings.</summary>
    public string[] Strings(string field) => Array(field).Select((e, i) => StringValue(e, $"{field}[{i}]")).ToArray();

    /// <summary>A required array.</summary>
    public JsonElement[] Array(string field) => ArrayValue(Required(field), field);

    /// <summary>The element as an array, or an error naming <paramref name="field"/>.</summary>
    public JsonElement[] ArrayValue(JsonElement e, string field) =>
        e.ValueKind == JsonValueKind.Array ? [.. e.EnumerateArray()]
            : throw new JsonException($"{Type}: field '{field}' must be an array, got {Kind(e)}");

    /// <summary>The element as a string, or an error naming <paramref name="field"/>.</summary>
    public string StringValue(JsonElement e, string field) =>
        e.ValueKind == JsonValueKind.String ? e.GetString()!
            : throw new JsonException($"{Type}: field '{field}' must be a string, got {Kind(e)}");

    /// <summary>The element as a 32-bit integer, or an error naming <paramref name="field"/>.</summary>
    public int IntValue(JsonElement e, string field) =>
        e.ValueKind == JsonValueKind.Number && e.TryGetInt32(out int v) ? v
            : throw new JsonException($"{Type}: field '{field}' must be a 32-bit integer, got {(e.ValueKind == JsonValueKind.Number ? e.GetRawText() : Kind(e))}");

    /// <summary>Runs a library factory; its typed exception becomes a <see cref="JsonException"/> naming the
    /// field, with the original as inner exception.</summary>
    public T Build<T>(string field, Func<T> factory)
    {
        try
        {
            return factory();
        }
        catch (Exception ex) when (ex is not JsonException and not OutOfMemoryException and not OperationCanceledException)
        {
            throw new JsonException($"{Type}: field '{field}' is not valid: {ex.Message}", ex);
        }
    }

    /// <summary>A short description of the element's kind for messages.</summary>
    public static string Kind(JsonElement e) => e.ValueKind switch
    {
        JsonValueKind.Object => "an object",
        JsonValueKind.Array => "an array",
        JsonValueKind.String => "a string",
        JsonValueKind.Number => "a number",
        JsonValueKind.True or JsonValueKind.False => "a boolean",
        JsonValueKind.Null => "null",
        _ => e.ValueKind.ToString(),
    };
}
