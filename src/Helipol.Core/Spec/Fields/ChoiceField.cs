using System.Text.Json.Nodes;

namespace Helipol.Spec.Fields;

/// <summary>One word out of a fixed list (e.g. <c>rhcp | lhcp</c>).</summary>
public sealed class ChoiceField : FieldType
{
    public ChoiceField(params string[] choices) => Choices = choices;

    public IReadOnlyList<string> Choices { get; }

    public override string Allowed => string.Join(" | ", Choices);

    public override void Read(YamlNode node, string path, ReadContext context)
    {
        if (node is not YamlScalar scalar || scalar.IsNull)
        {
            Fail(context, node, path, node.Describe(), Allowed);
            return;
        }
        var text = scalar.Value.Trim();
        if (!Choices.Contains(text, StringComparer.Ordinal))
        {
            var hint = DidYouMean.Closest(text, Choices);
            Fail(context, node, path, YamlScalar.Shorten(text), Allowed + (hint is null ? "" : $" (did you mean '{hint}'?)"));
            return;
        }
        context.Values[path] = new ChoiceValue(text) { Mark = node.Mark };
    }

    public override JsonObject Schema() => new() { ["enum"] = new JsonArray(Choices.Select(c => (JsonNode)c).ToArray()) };
}
