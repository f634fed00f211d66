using System.Globalization;

namespace Helipol.Design;

/// <summary>
/// The one way helipol prints a number whose sign matters: invariant culture, the true minus sign
/// U+2212 (never a hyphen), a plus sign on positive values, and no sign on a value that rounds to zero
/// (so "−0.0" and "+0.0" never appear).
/// </summary>
public static class SignedNumber
{
    public const char Minus = '\u2212';

    /// <summary>"+1.2", "−1.2" or "0.0" for <paramref name="format"/> "0.0".</summary>
    public static string Format(double value, string format = "0.0")
    {
        if (double.IsNaN(value)) return "n/a";
        if (double.IsInfinity(value)) return value > 0 ? "+∞" : Minus + "∞";
        string magnitude = Math.Abs(value).ToString(format, CultureInfo.InvariantCulture);
        if (IsZero(magnitude)) return magnitude;
        return (value < 0 ? Minus : '+') + magnitude;
    }

    /// <summary>A number with a minus sign when negative and none when positive: "1.2", "−1.2".</summary>
    public static string Plain(double value, string format = "0.0")
    {
        string s = Format(value, format);
        return s.Length > 0 && s[0] == '+' ? s[1..] : s;
    }

    private static bool IsZero(string digits) => digits.All(c => c == '0' || c == '.');
}
