using System.Text.Json;
using System.Text.Json.Serialization;
using Integrable.Algebra;
using Integrable.Clusters;
using Integrable.Numbers;
using Integrable.Polynomials;

namespace Integrable.Serialization;

/// <summary>An exchange matrix as <c>{"mutableCount": n, "rows": [[0, 1], [-1, 0], …]}</c>: the n + m rows of n
/// entries, mutable rows first; reading checks skew-symmetrizability again.</summary>
internal sealed class ExchangeMatrixJsonConverter : JsonConverter<ExchangeMatrix>
{
    private const string Name = "ExchangeMatrix";

    public override ExchangeMatrix Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        using var doc = JsonDocument.ParseValue(ref reader);
        return ReadValue(doc.RootElement, Name);
    }

    /// <summary>The matrix stored in <paramref name="element"/>; <paramref name="type"/> names the place in messages.</summary>
    public static ExchangeMatrix ReadValue(JsonElement element, string type)
    {
        var f = JsonFields.Of(element, type, "mutableCount", "rows");
        int n = f.Int("mutableCount");
        if (n < 1) throw new JsonException($"{type}: field 'mutableCount' must be at least 1, got {n}");
        var rows = f.Array("rows");
        if (rows.Length < n)
            throw new JsonException($"{type}: field 'rows' has {rows.Length} rows, fewer than mutableCount = {n}");
        var b = new int[(long)rows.Length * n];
        for (int i = 0; i < rows.Length; i++)
        {
            var row = f.ArrayValue(rows[i], $"rows[{i}]");
            if (row.Length != n) throw new JsonException($"{type}: field 'rows[{i}]' has {row.Length} entries, mutableCount says {n}");
            for (int j = 0; j < n; j++) b[(long)i * n + j] = f.IntValue(row[j], $"rows[{i}][{j}]");
        }
        return f.Build("rows", () => ExchangeMatrix.FromRows(n, rows.Length - n, b));
    }

    public override void Write(Utf8JsonWriter writer, ExchangeMatrix value, JsonSerializerOptions options) => WriteValue(writer, value);

    /// <summary>Writes the matrix object.</summary>
    public static void WriteValue(Utf8JsonWriter writer, ExchangeMatrix value)
    {
        writer.WriteStartObject();
        writer.WriteNumber("mutableCount", value.MutableCount);
        writer.WriteStartArray("rows");
        for (int i = 1; i <= value.RowCount; i++)
        {
            writer.WriteStartArray();
            for (int j = 1; j <= value.MutableCount; j++) writer.WriteNumberValue(value[i, j]);
            writer.WriteEndArray();
        }
        writer.WriteEndArray();
        writer.WriteEndObject();
    }
}

/// <summary>A quiver as <c>{"mutableCount": n, "frozenCount": m, "arrows": [{"from": 1, "to": 2, "multiplicity": 1}, …]}</c>
/// with 1-based vertices (frozen vertices are n+1 … n+m).</summary>
internal sealed class QuiverJsonConverter : JsonConverter<Quiver>
{
    private const string Name = "Quiver";

    public override Quiver Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        var f = JsonFields.Read(ref reader, Name, "mutableCount", "frozenCount", "arrows");
        int n = f.Int("mutableCount"), m = f.Int("frozenCount");
        var list = f.Array("arrows");
        var arrows = new Arrow[list.Length];
        for (int i = 0; i < list.Length; i++)
        {
            var a = JsonFields.Of(list[i], $"{Name} arrows[{i}]", "from", "to", "multiplicity");
            arrows[i] = new Arrow(a.Int("from"), a.Int("to"), a.Has("multiplicity") ? a.Int("multiplicity") : 1);
        }
        return f.Build("arrows", () => new Quiver(n, m, arrows));
    }

    public override void Write(Utf8JsonWriter writer, Quiver value, JsonSerializerOptions options)
    {
        writer.WriteStartObject();
        writer.WriteNumber("mutableCount", value.MutableCount);
        writer.WriteNumber("frozenCount", value.FrozenCount);
        writer.WriteStartArray("arrows");
        foreach (var a in value.Arrows)
        {
            writer.WriteStartObject();
            writer.WriteNumber("from", a.From);
            writer.WriteNumber("to", a.To);
            writer.WriteNumber("multiplicity", a.Multiplicity);
            writer.WriteEndObject();
        }
        writer.WriteEndArray();
        writer.WriteEndObject();
    }
}

/// <summary>A seed of Laurent polynomials as <c>{"ring": ["x_1", "x_2"], "matrix": {…}, "variables": ["x_1", "(x_1 + 1)/x_2"]}</c>:
/// the ring's variable names, the exchange matrix, and the n cluster then m frozen variables as text in the ring.</summary>
internal sealed class LaurentSeedJsonConverter : JsonConverter<Seed<LaurentPolynomial>>
{
    private const string Name = "Seed";

    public override Seed<LaurentPolynomial> Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        var f = JsonFields.Read(ref reader, Name, "ring", "matrix", "variables");
        var ring = LaurentPolynomialJsonConverter.ReadRing(f, "ring");
        var matrix = ExchangeMatrixJsonConverter.ReadValue(f.Required("matrix"), $"{Name} matrix");
        var texts = f.Strings("variables");
        var x = texts.Select((t, i) => f.Build($"variables[{i}]", () => LaurentPolynomial.Parse(ring, t))).ToArray();
        return f.Build("variables", () => new Seed<LaurentPolynomial>(ring, matrix, x));
    }

    public override void Write(Utf8JsonWriter writer, Seed<LaurentPolynomial> value, JsonSerializerOptions options)
    {
        if (value.Ring is not LaurentPolynomialRing ring)
            throw new JsonException($"{Name}: only seeds over a LaurentPolynomialRing can be written, this one is over {value.Ring.GetType().Name}");
        writer.WriteStartObject();
        LaurentPolynomialJsonConverter.WriteNames(writer, "ring", ring.Variables);
        writer.WritePropertyName("matrix");
        ExchangeMatrixJsonConverter.WriteValue(writer, value.Matrix);
        LaurentPolynomialJsonConverter.WriteNames(writer, "variables", value.Variables.Select(p => p.ToString()));
        writer.WriteEndObject();
    }
}

/// <summary>A seed of rational numbers (a seed evaluated at a point) as
/// <c>{"matrix": {…}, "variables": ["2", "3/4"]}</c>, over <see cref="RationalField"/>.</summary>
internal sealed class RationalSeedJsonConverter : JsonConverter<Seed<Rational>>
{
    private const string Name = "Seed";

    public override Seed<Rational> Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        var f = JsonFields.Read(ref reader, Name, "matrix", "variables");
        var matrix = ExchangeMatrixJsonConverter.ReadValue(f.Required("matrix"), $"{Name} matrix");
        var x = f.Array("variables").Select((e, i) => RationalJsonConverter.ReadValue(e, Name, $"variables[{i}]")).ToArray();
        return f.Build("variables", () => new Seed<Rational>(RationalField.Instance, matrix, x));
    }

    public override void Write(Utf8JsonWriter writer, Seed<Rational> value, JsonSerializerOptions options)
    {
        if (value.Ring is not RationalField)
            throw new JsonException($"{Name}: only seeds of rationals over RationalField can be written, this one is over {value.Ring.GetType().Name}");
        writer.WriteStartObject();
        writer.WritePropertyName("matrix");
        ExchangeMatrixJsonConverter.WriteValue(writer, value.Matrix);
        LaurentPolynomialJsonConverter.WriteNames(writer, "variables", value.Variables.Select(q => q.ToString()));
        writer.WriteEndObject();
    }
}
