using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Helipol.Spec;

/// <summary>
/// JSON Schema (draft 2020-12, json-schema.org) of the design file, generated from
/// <see cref="DesignKeys"/>, so editors with a YAML language server can complete and check designs.
/// Quantities are strings with a unit; the schema's patterns accept exactly the units the reader does.
/// </summary>
public static class DesignSchema
{
    public const string FileName = "helipol.schema.json";

    public static string Generate()
    {
        var schema = new JsonObject
        {
            ["$schema"] = "https://json-schema.org/draft/2020-12/schema",
            ["title"] = "helipol design",
            ["description"] = "A parasitic helical polarizer for a linear whip: band, whip, polarizer and fabrication settings. Every length and frequency carries its unit.",
        };
        foreach (var (key, value) in DesignKeys.Root.Schema())
            schema[key] = value?.DeepClone();
        var text = schema.ToJsonString(new JsonSerializerOptions
        {
            WriteIndented = true,
            Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        });
        return text.Replace("\r\n", "\n") + "\n";
    }
}
