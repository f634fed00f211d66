using System.Text.Json.Nodes;

namespace Helipol.Spec.Fields;

/// <summary>A number with a unit (e.g. <c>16 mm</c>), optionally <c>auto</c>, within SI limits.</summary>
public sealed class QuantityField : FieldType
{
    public QuantityField(QuantityKind kind, double minSi, double maxSi, bool minInclusive = false, bool allowAuto = false)
    {
        Kind = kind;
        MinSi = minSi;
        MaxSi = maxSi;
        MinInclusive = minInclusive;
        AllowAuto = allowAuto;
    }

    public QuantityKind Kind { get; }
    public double MinSi { get; }
    public double MaxSi { get; }
    public bool MinInclusive { get; }
    public bool AllowAuto { get; }

    private string Range => MinInclusive
        ? $"from {Kind.FormatSi(MinSi)} to {Kind.FormatSi(MaxSi)}"
        : $"above {Kind.FormatSi(MinSi)} up to {Kind.FormatSi(MaxSi)}";

    private string Units => "units: " + string.Join(", ", Kind.UnitsWritten());

    public override string Allowed => (AllowAuto ? "auto or " : "") + $"{Kind.Noun()} {Range} ({Units})";

    public override void Read(YamlNode node, string path, ReadContext context)
    {
        if (!TryTakeScalar(node, path, context, AllowAuto, out var text)) return;
        switch (NumberText.TrySplit(text, out var number, out var unit))
        {
            case NumberText.Outcome.NotANumber:
                Fail(context, node, path, YamlScalar.Shorten(text), $"a finite number with a unit, e.g. {Kind.Example()}");
                return;
            case NumberText.Outcome.NonFinite:
                Fail(context, node, path, $"{YamlScalar.Shorten(text)} (too large to represent)", Allowed);
                return;
            case NumberText.Outcome.Malformed:
                Fail(context, node, path, YamlScalar.Shorten(text), Allowed);
                return;
        }
        if (unit.Length == 0)
        {
            Fail(context, node, path, $"a bare number {text}", $"{Kind.Noun()} with its unit, e.g. {Kind.Example()} ({Units})");
            return;
        }
        if (!Kind.TryToSi(number, unit, out var si))
        {
            Fail(context, node, path, $"{YamlScalar.Shorten(text)} (unit '{unit}')", $"{Kind.Noun()} in {string.Join(", ", Kind.UnitsWritten())}{Kind.UnitHint(unit)}");
            return;
        }
        var below = MinInclusive ? si < MinSi : si <= MinSi;
        if (below || si > MaxSi || !double.IsFinite(si))
        {
            Fail(context, node, path, text, $"{Kind.Noun()} {Range}");
            return;
        }
        context.Values[path] = new QuantityValue(si, Kind, text) { Mark = node.Mark };
    }

    public override JsonObject Schema()
    {
        var units = string.Join("|", Kind.UnitsWritten().Select(u => u switch { "%" => "%", "S/m" => "S/m", _ => u }));
        var quantity = new JsonObject
        {
            ["type"] = "string",
            ["pattern"] = $@"^\s*[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?\s*({units})\s*$",
        };
        if (!AllowAuto) return quantity;
        return new JsonObject { ["anyOf"] = new JsonArray(new JsonObject { ["const"] = "auto" }, quantity) };
    }
}
