using System.Globalization;
using System.Text.RegularExpressions;
using Helipol.Spec;

namespace Helipol.Cli;

/// <summary>Reads quantities typed on the command line (<c>5.8GHz</c>, <c>5.8 GHz</c>, <c>20deg</c>) with the design file's units.</summary>
public static partial class CliQuantity
{
    [GeneratedRegex(@"^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*([A-Za-z°%/]+)\s*$")]
    private static partial Regex Pattern();

    /// <summary>The SI value, or null with <paramref name="problem"/> set to "found ..., allowed ..." text.</summary>
    public static double? Read(string option, string text, QuantityKind kind, out string? problem)
    {
        problem = null;
        var m = Pattern().Match(text ?? "");
        if (m.Success && double.TryParse(m.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out var number)
            && kind.TryToSi(number, m.Groups[2].Value, out var si) && double.IsFinite(si))
            return si;
        var hint = m.Success ? kind.UnitHint(m.Groups[2].Value) : "";
        problem = $"{option}: found '{text}', allowed {kind.Noun()} with its unit, e.g. {kind.Example()}{hint}";
        return null;
    }
}
