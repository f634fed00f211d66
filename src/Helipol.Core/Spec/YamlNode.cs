namespace Helipol.Spec;

/// <summary>
/// The small subset of YAML a design file may use: mappings, sequences and plain or quoted
/// scalars, each with the place it started. Anchors, aliases, tags and multiple documents are
/// refused while the tree is built (see <see cref="YamlTreeBuilder"/>).
/// </summary>
public abstract record YamlNode(SourceMark Mark)
{
    /// <summary>How the node is named in a "found ..." message.</summary>
    public abstract string Describe();
}

public sealed record YamlScalar(SourceMark Mark, string Value, bool IsPlain) : YamlNode(Mark)
{
    public bool IsNull => IsPlain && (Value.Length == 0 || Value == "~" || Value == "null" || Value == "Null" || Value == "NULL");

    public override string Describe() => IsNull ? "an empty value" : Shorten(Value);

    /// <summary>A user's key as it may appear in a field path: one line, at most 40 characters.</summary>
    internal static string KeyText(string key)
    {
        if (string.IsNullOrWhiteSpace(key)) return "(empty key)";
        var oneLine = key.Replace("\r", "\\r").Replace("\n", "\\n");
        return oneLine.Length <= 40 ? oneLine : oneLine[..37] + "...";
    }

    internal static string Shorten(string text)
    {
        var oneLine = text.Replace("\r", "\\r").Replace("\n", "\\n");
        return oneLine.Length <= 40 ? $"'{oneLine}'" : $"'{oneLine[..37]}...'";
    }
}

public sealed record YamlMapping(SourceMark Mark, IReadOnlyList<KeyValuePair<YamlScalar, YamlNode>> Entries) : YamlNode(Mark)
{
    public override string Describe() => "a mapping";
}

public sealed record YamlSequence(SourceMark Mark, IReadOnlyList<YamlNode> Items) : YamlNode(Mark)
{
    public override string Describe() => "a list";
}
