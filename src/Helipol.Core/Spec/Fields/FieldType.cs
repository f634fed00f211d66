using System.Text.Json.Nodes;

namespace Helipol.Spec.Fields;

/// <summary>
/// What one key of the design file accepts. The same object checks a value, describes what is
/// allowed (for error messages and the README) and writes its JSON Schema, so the three never
/// disagree.
/// </summary>
public abstract class FieldType
{
    /// <summary>Plain words for "allowed ...": e.g. "a length from 0.05 mm to 10 mm (units: mm, cm, m, in)".</summary>
    public abstract string Allowed { get; }

    /// <summary>Checks a node and stores its value under <paramref name="path"/>; on failure adds an error.</summary>
    public abstract void Read(YamlNode node, string path, ReadContext context);

    /// <summary>The JSON Schema (draft 2020-12) fragment for this key.</summary>
    public abstract JsonObject Schema();

    /// <summary>Stores the value of a scalar field that the file left out (with no mark of its own).</summary>
    public virtual void ApplyDefault(string defaultText, string path, SourceMark parentMark, ReadContext context)
    {
        var probe = new ReadContext(context.Errors.File, context.DesignFolder);
        var node = YamlTreeBuilder.Build(defaultText, "(default)", probe.Errors)
            ?? throw new InvalidOperationException($"default of {path} is empty");
        Read(node, path, probe);
        if (probe.Errors.Count > 0)
            throw new InvalidOperationException($"default '{defaultText}' of {path} is not valid: {probe.Errors.InFileOrder()[0]}");
        foreach (var (key, value) in probe.Values)
            context.Values[key] = value with { IsDefault = true, Mark = parentMark };
    }

    /// <summary>
    /// The common start of reading a scalar key: refuses a missing or non-scalar value, stores
    /// <c>auto</c> where the key allows it, and otherwise hands back the trimmed text to parse.
    /// </summary>
    protected bool TryTakeScalar(YamlNode node, string path, ReadContext context, bool allowAuto, out string text)
    {
        text = "";
        if (node is not YamlScalar scalar || scalar.IsNull)
        {
            Fail(context, node, path, node.Describe(), Allowed);
            return false;
        }
        text = scalar.Value.Trim();
        if (allowAuto && text == "auto")
        {
            context.Values[path] = new AutoValue { Mark = node.Mark };
            return false;
        }
        return true;
    }

    protected static void Fail(ReadContext context, YamlNode node, string path, string found, string allowed) =>
        context.Errors.Add(node.Mark, path, found, allowed);
}

/// <summary>State shared while one file is read: the errors so far and the values by field path.</summary>
public sealed class ReadContext
{
    public ReadContext(string file, string designFolder)
    {
        Errors = new SpecErrors(file);
        DesignFolder = designFolder;
    }

    public SpecErrors Errors { get; }

    /// <summary>Folder of the design file: relative paths inside it (calibration) resolve from here.</summary>
    public string DesignFolder { get; }

    public Dictionary<string, SpecValue> Values { get; } = new(StringComparer.Ordinal);
}
