using System.Text.Json;
using System.Text.Json.Serialization;
using Integrable.Polynomials;
using Integrable.RationalFunctions;

namespace Integrable.Serialization;

/// <summary>A Laurent polynomial as <c>{"ring": ["x", "y"], "text": "x^2*y^-1 + 1/2"}</c>: the ring's variable
/// names in order and the text that <see cref="LaurentPolynomial.Parse"/> reads back.</summary>
internal sealed class LaurentPolynomialJsonConverter : JsonConverter<LaurentPolynomial>
{
    private const string Name = "LaurentPolynomial";

    public override LaurentPolynomial Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        var f = JsonFields.Read(ref reader, Name, "ring", "text");
        var ring = ReadRing(f, "ring");
        string text = f.String("text");
        return f.Build("text", () => LaurentPolynomial.Parse(ring, text));
    }

    public override void Write(Utf8JsonWriter writer, LaurentPolynomial value, JsonSerializerOptions options)
    {
        writer.WriteStartObject();
        WriteNames(writer, "ring", value.Ring.Variables);
        writer.WriteString("text", value.ToString());
        writer.WriteEndObject();
    }

    /// <summary>The Laurent polynomial ring whose variable names are the string array <paramref name="field"/>.</summary>
    public static LaurentPolynomialRing ReadRing(JsonFields f, string field)
    {
        var names = f.Strings(field);
        return f.Build(field, () => new LaurentPolynomialRing(names));
    }

    /// <summary>Writes a string array property.</summary>
    public static void WriteNames(Utf8JsonWriter writer, string name, IEnumerable<string> names)
    {
        writer.WriteStartArray(name);
        foreach (var s in names) writer.WriteStringValue(s);
        writer.WriteEndArray();
    }
}

/// <summary>A rational function as <c>{"field": ["x", "y"], "text": "(x + 1)/(x*y - 2)"}</c>.</summary>
internal sealed class RationalFunctionJsonConverter : JsonConverter<RationalFunction>
{
    private const string Name = "RationalFunction";

    public override RationalFunction Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        var f = JsonFields.Read(ref reader, Name, "field", "text");
        var names = f.Strings("field");
        var field = f.Build("field", () => new RationalFunctionField(names));
        string text = f.String("text");
        return f.Build("text", () => RationalFunction.Parse(field, text));
    }

    public override void Write(Utf8JsonWriter writer, RationalFunction value, JsonSerializerOptions options)
    {
        writer.WriteStartObject();
        LaurentPolynomialJsonConverter.WriteNames(writer, "field", value.Field.Variables);
        writer.WriteString("text", value.ToString());
        writer.WriteEndObject();
    }
}
