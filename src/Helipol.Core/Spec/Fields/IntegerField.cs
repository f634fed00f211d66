using System.Globalization;
using System.Text.Json.Nodes;

namespace Helipol.Spec.Fields;

/// <summary>A whole number within limits, optionally <c>auto</c>.</summary>
public sealed class IntegerField : FieldType
{
    public IntegerField(int min, int max, bool allowAuto = false)
    {
        Min = min;
        Max = max;
        AllowAuto = allowAuto;
    }

    public int Min { get; }
    public int Max { get; }
    public bool AllowAuto { get; }

    public override string Allowed => (AllowAuto ? "auto or " : "") + $"a whole number from {Min} to {Max}";

    public override void Read(YamlNode node, string path, ReadContext context)
    {
        if (!TryTakeScalar(node, path, context, AllowAuto, out var text)) return;
        if (!long.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var value))
        {
            Fail(context, node, path, YamlScalar.Shorten(text), Allowed);
            return;
        }
        if (value < Min || value > Max)
        {
            Fail(context, node, path, text, Allowed);
            return;
        }
        context.Values[path] = new IntegerValue((int)value) { Mark = node.Mark };
    }

    public override JsonObject Schema()
    {
        var integer = new JsonObject { ["type"] = "integer", ["minimum"] = Min, ["maximum"] = Max };
        if (!AllowAuto) return integer;
        return new JsonObject { ["anyOf"] = new JsonArray(new JsonObject { ["const"] = "auto" }, integer) };
    }
}
