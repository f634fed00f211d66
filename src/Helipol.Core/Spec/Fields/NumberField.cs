using System.Globalization;
using System.Text.Json.Nodes;

namespace Helipol.Spec.Fields;

/// <summary>A dimensionless number (relative permittivity, relative permeability, loss tangent, weight).</summary>
public sealed class NumberField : FieldType
{
    public NumberField(double min, double max, string noun)
    {
        Min = min;
        Max = max;
        Noun = noun;
    }

    public double Min { get; }
    public double Max { get; }
    public string Noun { get; }

    private static string F(double v) => v.ToString("0.#####", CultureInfo.InvariantCulture);

    public override string Allowed => $"{Noun} from {F(Min)} to {F(Max)} (a plain number, no unit)";

    public override void Read(YamlNode node, string path, ReadContext context)
    {
        if (node is not YamlScalar scalar || scalar.IsNull)
        {
            Fail(context, node, path, node.Describe(), Allowed);
            return;
        }
        var text = scalar.Value.Trim();
        var outcome = NumberText.TrySplit(text, out var value, out var unit);
        if (outcome == NumberText.Outcome.NotANumber)
        {
            Fail(context, node, path, YamlScalar.Shorten(text), $"a finite number: {Allowed}");
            return;
        }
        if (outcome != NumberText.Outcome.Ok || unit.Length > 0)
        {
            Fail(context, node, path, YamlScalar.Shorten(text), Allowed);
            return;
        }
        if (value < Min || value > Max)
        {
            Fail(context, node, path, text, Allowed);
            return;
        }
        context.Values[path] = new NumberValue(value, text) { Mark = node.Mark };
    }

    public override JsonObject Schema() => new() { ["type"] = "number", ["minimum"] = Min, ["maximum"] = Max };
}
