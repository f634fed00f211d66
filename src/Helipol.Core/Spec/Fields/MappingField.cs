using System.Text.Json.Nodes;

namespace Helipol.Spec.Fields;

/// <summary>
/// A block of keys. Unknown keys are refused with a did-you-mean (from the block's own keys, or
/// the full path when the key belongs to another block); required keys must be present; absent
/// keys take their documented defaults. <c>none</c> may stand for the whole block where allowed.
/// </summary>
public sealed class MappingField : FieldType
{
    public MappingField(bool allowNone, params FieldDefinition[] fields)
    {
        AllowNone = allowNone;
        Fields = fields;
    }

    public bool AllowNone { get; }
    public IReadOnlyList<FieldDefinition> Fields { get; }

    /// <summary>Every key path of the whole design, for "did you mean polarizer.former.bore?" hints.</summary>
    public Func<IEnumerable<string>>? AllPaths { get; set; }

    private string KeyList => string.Join(", ", Fields.Select(f => f.Name));

    public override string Allowed => (AllowNone ? "none or " : "") + $"a mapping with keys {KeyList}";

    public override void Read(YamlNode node, string path, ReadContext context)
    {
        if (AllowNone && node is YamlScalar { Value: "none", IsPlain: true })
        {
            context.Values[path] = new NoneValue { Mark = node.Mark };
            return;
        }
        if (node is not YamlMapping mapping)
        {
            Fail(context, node, Shown(path), node.Describe(), Allowed);
            return;
        }
        context.Values[path] = new BlockValue { Mark = node.Mark };
        var given = new HashSet<string>(StringComparer.Ordinal);
        foreach (var (key, value) in mapping.Entries)
        {
            var keyPath = Join(path, YamlScalar.KeyText(key.Value));
            var field = Fields.FirstOrDefault(f => f.Name == key.Value);
            if (field is null)
            {
                if (string.IsNullOrWhiteSpace(key.Value))
                    Fail(context, value, keyPath, "a value with an empty key", KeyList); // the value is where the user looks
                else
                    Fail(context, key, keyPath, $"unknown key '{YamlScalar.KeyText(key.Value)}'", $"{KeyList}{Hint(key.Value, path)}");
                continue;
            }
            given.Add(field.Name);
            field.Type.Read(value, keyPath, context);
        }
        foreach (var field in Fields.Where(f => !given.Contains(f.Name)))
        {
            var keyPath = Join(path, field.Name);
            if (field.Required)
                context.Errors.Add(node.Mark, keyPath, "no value (the key is missing)", field.Type.Allowed);
            else
                ApplyFieldDefault(field, keyPath, node.Mark, context);
        }
    }

    internal static void ApplyFieldDefault(FieldDefinition field, string keyPath, SourceMark mark, ReadContext context)
    {
        if (field.Type is MappingField block)
        {
            if (field.Default == "none")
                context.Values[keyPath] = new NoneValue { Mark = mark, IsDefault = true };
            else
                block.ApplyDefaults(keyPath, mark, context);
        }
        else if (field.Default is not null)
        {
            field.Type.ApplyDefault(field.Default, keyPath, mark, context);
        }
    }

    /// <summary>Fills a block the file left out entirely with its keys' defaults.</summary>
    public void ApplyDefaults(string path, SourceMark mark, ReadContext context)
    {
        context.Values[path] = new BlockValue { Mark = mark, IsDefault = true };
        foreach (var field in Fields)
            ApplyFieldDefault(field, Join(path, field.Name), mark, context);
    }

    private string Hint(string key, string path)
    {
        // A key that exists, spelled right, in another block is more likely misplaced than misspelled.
        var elsewhere = AllPaths?.Invoke().Where(p => p.Contains('.') && p.Split('.')[^1] == key && p != Join(path, key))
            .OrderBy(p => p, StringComparer.Ordinal).FirstOrDefault();
        if (elsewhere is not null) return $" ('{key}' belongs under {elsewhere[..elsewhere.LastIndexOf('.')]})";
        var local = DidYouMean.Closest(key, Fields.Select(f => f.Name));
        return local is null ? "" : $" (did you mean '{local}'?)";
    }

    private static string Join(string path, string key) => path.Length == 0 ? key : $"{path}.{key}";

    private static string Shown(string path) => path.Length == 0 ? "(document)" : path;

    public override JsonObject Schema()
    {
        var properties = new JsonObject();
        foreach (var field in Fields)
        {
            var schema = field.Type.Schema();
            schema["description"] = field.Description;
            if (field.Default is not null) schema["default"] = DefaultAsJson(field);
            properties[field.Name] = schema;
        }
        var block = new JsonObject
        {
            ["type"] = "object",
            ["properties"] = properties,
            ["additionalProperties"] = false,
        };
        var required = Fields.Where(f => f.Required).Select(f => (JsonNode)f.Name).ToArray();
        if (required.Length > 0) block["required"] = new JsonArray(required);
        if (!AllowNone) return block;
        return new JsonObject { ["anyOf"] = new JsonArray(new JsonObject { ["const"] = "none" }, block) };
    }

    private static JsonNode? DefaultAsJson(FieldDefinition field) => field.Type switch
    {
        IntegerField when int.TryParse(field.Default, out var whole) => whole,
        NumberField when double.TryParse(field.Default, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out var number) => number,
        PairField => JsonNode.Parse(field.Default!),
        _ => field.Default,
    };
}
