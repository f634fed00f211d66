using System.Text.Json.Nodes;
using System.Text.RegularExpressions;

namespace Helipol.Spec.Fields;

/// <summary>
/// Free text checked against a pattern. Used for the design name (which becomes a folder name,
/// so path separators and <c>..</c> are named explicitly in the error) and for file paths.
/// </summary>
public sealed class TextField : FieldType
{
    public TextField(string pattern, string allowed, int maxLength)
    {
        Pattern = pattern;
        AllowedText = allowed;
        MaxLength = maxLength;
    }

    public string Pattern { get; }
    public string AllowedText { get; }
    public int MaxLength { get; }

    public override string Allowed => AllowedText;

    public override void Read(YamlNode node, string path, ReadContext context)
    {
        if (node is not YamlScalar scalar || scalar.IsNull)
        {
            Fail(context, node, path, node.Describe(), Allowed);
            return;
        }
        var text = scalar.Value;
        if (text.Length > MaxLength)
        {
            Fail(context, node, path, $"{text.Length} characters", $"{Allowed}, at most {MaxLength} characters");
            return;
        }
        if (!Regex.IsMatch(text, Pattern, RegexOptions.CultureInvariant))
        {
            var why = text.Contains("..") ? " (a parent-folder step '..')"
                : text.IndexOfAny(new[] { '/', '\\' }) >= 0 ? " (a path separator)"
                : "";
            Fail(context, node, path, YamlScalar.Shorten(text) + why, Allowed);
            return;
        }
        context.Values[path] = new TextValue(text) { Mark = node.Mark };
    }

    public override JsonObject Schema() => new() { ["type"] = "string", ["pattern"] = Pattern, ["maxLength"] = MaxLength };
}
