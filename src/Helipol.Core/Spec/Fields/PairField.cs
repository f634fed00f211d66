using System.Text.Json.Nodes;

namespace Helipol.Spec.Fields;

/// <summary>A [low, high] range written as a two-item list, each item of the same field type, low below high.</summary>
public sealed class PairField : FieldType
{
    public PairField(FieldType item) => Item = item;

    public FieldType Item { get; }

    public override string Allowed => $"a list [low, high] of {Item.Allowed}, low below high";

    public override void Read(YamlNode node, string path, ReadContext context)
    {
        if (node is not YamlSequence { Items.Count: 2 } sequence)
        {
            Fail(context, node, path, node is YamlSequence s ? $"a list of {s.Items.Count} items" : node.Describe(), Allowed);
            return;
        }
        var lowPath = path + "[0]";
        var highPath = path + "[1]";
        Item.Read(sequence.Items[0], lowPath, context);
        Item.Read(sequence.Items[1], highPath, context);
        if (!context.Values.Remove(lowPath, out var low) | !context.Values.Remove(highPath, out var high)) return;
        if (Order(low!) >= Order(high!))
        {
            Fail(context, node, path, $"[{low!.Written}, {high!.Written}]", "low below high");
            return;
        }
        context.Values[path] = new PairValue(low!, high!) { Mark = node.Mark };
    }

    private static double Order(SpecValue value) => value switch
    {
        IntegerValue i => i.Value,
        QuantityValue q => q.Si,
        NumberValue n => n.Value,
        _ => double.NaN,
    };

    public override JsonObject Schema() => new()
    {
        ["type"] = "array",
        ["prefixItems"] = new JsonArray(Item.Schema(), Item.Schema()),
        ["items"] = false,
        ["minItems"] = 2,
    };
}
