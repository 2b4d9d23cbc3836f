using System.Text.Json;
using System.Text.Json.Serialization;
using Integrable.Analyses;

namespace Integrable.Serialization;

/// <summary>Writes any <see cref="IAnalysisReport"/> as the same object as its <see cref="IAnalysisReport.ToJson"/>;
/// reports are results, so reading one back is refused with a clear message.</summary>
internal sealed class ReportJsonConverterFactory : JsonConverterFactory
{
    public override bool CanConvert(Type typeToConvert) => typeof(IAnalysisReport).IsAssignableFrom(typeToConvert);

    public override JsonConverter CreateConverter(Type typeToConvert, JsonSerializerOptions options) =>
        (JsonConverter)Activator.CreateInstance(typeof(ReportJsonConverter<>).MakeGenericType(typeToConvert))!;

    private sealed class ReportJsonConverter<T> : JsonConverter<T> where T : IAnalysisReport
    {
        public override T Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) =>
            throw new JsonException($"{typeToConvert.Name}: reports are written, not read back; read the figures with JsonDocument " +
                "or into a record of your own, or store the recurrence and rerun the analysis");

        public override void Write(Utf8JsonWriter writer, T value, JsonSerializerOptions options)
        {
            writer.WriteStartObject();
            value.WriteJsonProperties(writer);
            writer.WriteEndObject();
        }
    }
}
