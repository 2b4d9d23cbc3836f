using System.Text.Json;
using System.Text.Json.Serialization;
using Integrable.RationalFunctions;
using Integrable.Recursions;

namespace Integrable.Serialization;

/// <summary>A recurrence as <c>{"equation": "x_{n+1} x_{n-1} = x_n^2 + 1", "index": "n"}</c>; reading parses and
/// compiles the equation again.</summary>
internal sealed class RecurrenceJsonConverter : JsonConverter<Recurrence>
{
    private const string Name = "Recurrence";

    public override Recurrence Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        var f = JsonFields.Read(ref reader, Name, "equation", "index");
        string equation = f.String("equation");
        string? index = f.Has("index") ? f.String("index") : null;
        return f.Build("equation", () => Recurrence.Parse(equation, index));
    }

    public override void Write(Utf8JsonWriter writer, Recurrence value, JsonSerializerOptions options)
    {
        writer.WriteStartObject();
        writer.WriteString("equation", value.Text);
        writer.WriteString("index", value.Index);
        writer.WriteEndObject();
    }
}

/// <summary>A system of recurrences as <c>{"equations": "x_{n+1} = y_n; y_{n+1} = …", "index": "n"}</c>.</summary>
internal sealed class RecurrenceSystemJsonConverter : JsonConverter<RecurrenceSystem>
{
    private const string Name = "RecurrenceSystem";

    public override RecurrenceSystem Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        var f = JsonFields.Read(ref reader, Name, "equations", "index");
        string equations = f.String("equations");
        string? index = f.Has("index") ? f.String("index") : null;
        return f.Build("equations", () => RecurrenceSystem.Parse(equations, index));
    }

    public override void Write(Utf8JsonWriter writer, RecurrenceSystem value, JsonSerializerOptions options)
    {
        writer.WriteStartObject();
        writer.WriteString("equations", value.Text);
        writer.WriteString("index", value.Index);
        writer.WriteEndObject();
    }
}

/// <summary>A lattice recurrence as <c>{"equation": "…"}</c>.</summary>
internal sealed class LatticeRecurrenceJsonConverter : JsonConverter<LatticeRecurrence>
{
    private const string Name = "LatticeRecurrence";

    public override LatticeRecurrence Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        var f = JsonFields.Read(ref reader, Name, "equation");
        string equation = f.String("equation");
        return f.Build("equation", () => LatticeRecurrence.Parse(equation));
    }

    public override void Write(Utf8JsonWriter writer, LatticeRecurrence value, JsonSerializerOptions options)
    {
        writer.WriteStartObject();
        writer.WriteString("equation", value.Text);
        writer.WriteEndObject();
    }
}

/// <summary>A rational map as <c>{"stateVariables": ["x", "y"], "parameters": ["a"], "components": ["y", "(y + a)/x"]}</c>;
/// the components are read in the field of the state variables followed by the parameters.</summary>
internal sealed class RationalMapJsonConverter : JsonConverter<RationalMap>
{
    private const string Name = "RationalMap";

    public override RationalMap Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        var f = JsonFields.Read(ref reader, Name, "stateVariables", "parameters", "components");
        var state = f.Strings("stateVariables");
        var parameters = f.Has("parameters") ? f.Strings("parameters") : [];
        var texts = f.Strings("components");
        var field = f.Build("parameters", () => new RationalFunctionField([.. state, .. parameters]));
        var components = texts.Select((t, i) => f.Build($"components[{i}]", () => RationalFunction.Parse(field, t))).ToArray();
        return f.Build("components", () => RationalMap.Create(state, components));
    }

    public override void Write(Utf8JsonWriter writer, RationalMap value, JsonSerializerOptions options)
    {
        writer.WriteStartObject();
        LaurentPolynomialJsonConverter.WriteNames(writer, "stateVariables", value.StateVariables);
        LaurentPolynomialJsonConverter.WriteNames(writer, "parameters", value.Parameters);
        LaurentPolynomialJsonConverter.WriteNames(writer, "components", value.Components.Select(c => c.ToString()));
        writer.WriteEndObject();
    }
}
