using System.Globalization;
using System.Numerics;
using System.Text.Json;
using System.Text.Json.Serialization;
using Integrable.LinearAlgebra;
using Integrable.Numbers;

namespace Integrable.Serialization;

/// <summary>A rational number as the string <c>"p/q"</c> (or <c>"p"</c> for an integer); reading also accepts a
/// JSON integer.</summary>
internal sealed class RationalJsonConverter : JsonConverter<Rational>
{
    public override bool HandleNull => true;

    public override Rational Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        using var doc = JsonDocument.ParseValue(ref reader);
        return ReadValue(doc.RootElement, "Rational", "value");
    }

    public override void Write(Utf8JsonWriter writer, Rational value, JsonSerializerOptions options) =>
        writer.WriteStringValue(value.ToString());

    /// <summary>A rational from a string or integer element; <paramref name="type"/> and <paramref name="field"/>
    /// name the place in messages.</summary>
    public static Rational ReadValue(JsonElement e, string type, string field)
    {
        if (e.ValueKind == JsonValueKind.String)
        {
            string s = e.GetString()!;
            return Rational.TryParse(s, out var r) ? r
                : throw new JsonException($"{type}: field '{field}' must be a rational number written \"p/q\", got \"{s}\"");
        }
        if (e.ValueKind == JsonValueKind.Number && BigInteger.TryParse(e.GetRawText(), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var n))
            return new Rational(n);
        throw new JsonException($"{type}: field '{field}' must be a rational number written \"p/q\" or an integer, got " +
            (e.ValueKind == JsonValueKind.Number ? e.GetRawText() : JsonFields.Kind(e)));
    }
}

/// <summary>A rational matrix as <c>{"rowCount": r, "columnCount": c, "entries": [["1", "-2/3"], …]}</c>.</summary>
internal sealed class RationalMatrixJsonConverter : JsonConverter<RationalMatrix>
{
    private const string Name = "RationalMatrix";

    public override RationalMatrix Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) =>
        ReadFrom(JsonFields.Read(ref reader, Name, "rowCount", "columnCount", "entries"));

    private static RationalMatrix ReadFrom(JsonFields f)
    {
        int rows = f.Int("rowCount"), columns = f.Int("columnCount");
        if (rows < 0 || columns < 0) throw new JsonException($"{Name}: rowCount and columnCount must be >= 0, got {rows} and {columns}");
        var entries = f.Array("entries");
        if (entries.Length != rows) throw new JsonException($"{Name}: field 'entries' has {entries.Length} rows, rowCount says {rows}");
        var data = new Rational[(long)rows * columns];
        for (int i = 0; i < rows; i++)
        {
            var row = f.ArrayValue(entries[i], $"entries[{i}]");
            if (row.Length != columns)
                throw new JsonException($"{Name}: field 'entries[{i}]' has {row.Length} entries, columnCount says {columns}");
            for (int j = 0; j < columns; j++) data[(long)i * columns + j] = RationalJsonConverter.ReadValue(row[j], Name, $"entries[{i}][{j}]");
        }
        return RationalMatrix.FromRowMajor(rows, columns, data);
    }

    public override void Write(Utf8JsonWriter writer, RationalMatrix value, JsonSerializerOptions options)
    {
        writer.WriteStartObject();
        writer.WriteNumber("rowCount", value.RowCount);
        writer.WriteNumber("columnCount", value.ColumnCount);
        writer.WriteStartArray("entries");
        for (int i = 0; i < value.RowCount; i++)
        {
            writer.WriteStartArray();
            foreach (var q in value.Row(i)) writer.WriteStringValue(q.ToString());
            writer.WriteEndArray();
        }
        writer.WriteEndArray();
        writer.WriteEndObject();
    }
}
