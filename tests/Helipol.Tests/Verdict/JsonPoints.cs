using System.Numerics;
using System.Text.Json;

namespace Helipol.Tests.Verdict;

/// <summary>Walks a JSON document for the per-frequency points the checks below apply to.</summary>
internal static class JsonPoints
{
    /// <summary>Every object that carries a worst direction (its own circular gains and the axial ratio claimed for it).</summary>
    public static IEnumerable<JsonElement> WithWorstDirection(JsonElement e) =>
        Objects(e).Where(o => o.TryGetProperty("worst_direction", out _));

    /// <summary>Every (impedance, point-with-realized-gains) pair: the gains sit beside the impedance or in a child object.</summary>
    public static IEnumerable<(Complex Impedance, JsonElement Point)> WithRealizedGain(JsonElement e)
    {
        foreach (var o in Objects(e))
        {
            if (!o.TryGetProperty("impedance_ohm", out var z) || z.ValueKind != JsonValueKind.Array) continue;
            var impedance = new Complex(z[0].GetDouble(), z[1].GetDouble());
            if (o.TryGetProperty("realized_gain_rhcp_dbic", out _)) yield return (impedance, o);
            foreach (var child in o.EnumerateObject().Where(p => p.Value.ValueKind == JsonValueKind.Object && p.Value.TryGetProperty("realized_gain_rhcp_dbic", out _)))
                yield return (impedance, child.Value);
        }
    }

    public static IEnumerable<JsonElement> Objects(JsonElement e)
    {
        if (e.ValueKind == JsonValueKind.Object)
        {
            yield return e;
            foreach (var p in e.EnumerateObject())
                foreach (var o in Objects(p.Value)) yield return o;
        }
        else if (e.ValueKind == JsonValueKind.Array)
            foreach (var item in e.EnumerateArray())
                foreach (var o in Objects(item)) yield return o;
    }
}
