using System.Globalization;
using System.Text.RegularExpressions;

namespace Helipol.Spec;

/// <summary>
/// Splits "16 mm", "5.8GHz" or "0.64in" into a finite number and a unit. Our own strict pattern
/// is used instead of double.Parse because the latter also accepts "NaN", "Infinity" and
/// thousands separators, none of which belong in a design file.
/// </summary>
public static partial class NumberText
{
    [GeneratedRegex(@"^(?<number>[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(?<unit>.*?)\s*$")]
    private static partial Regex NumberThenUnit();

    [GeneratedRegex(@"^[+-]?\.?(nan|inf|infinity)$", RegexOptions.IgnoreCase)]
    private static partial Regex NotANumber();

    public enum Outcome { Ok, NotANumber, NonFinite, Malformed }

    public static Outcome TrySplit(string text, out double number, out string unit)
    {
        number = double.NaN;
        unit = "";
        var trimmed = text.Trim();
        var head = trimmed.Split(' ', 2)[0];
        if (NotANumber().IsMatch(head)) return Outcome.NotANumber;
        var match = NumberThenUnit().Match(trimmed);
        if (!match.Success) return Outcome.Malformed;
        number = double.Parse(match.Groups["number"].Value, NumberStyles.Float, CultureInfo.InvariantCulture);
        unit = match.Groups["unit"].Value;
        return double.IsFinite(number) ? Outcome.Ok : Outcome.NonFinite;
    }
}
