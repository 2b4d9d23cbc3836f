using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;

namespace Integrable.Cli;

/// <summary>Writes one JSON object to the output (indented, UTF-8, no escaping of ^ or +).</summary>
internal static class JsonOutput
{
    public static void Write(TextWriter output, Action<Utf8JsonWriter> body)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            w.WriteStartObject();
            body(w);
            w.WriteEndObject();
        }
        output.WriteLine(Encoding.UTF8.GetString(stream.ToArray()));
    }
}
