using System.Globalization;

namespace Helipol.Design.Mismatch;

/// <summary>Hand of an antenna's polarization, per IEEE Std 145 (right hand = clockwise seen
/// by an observer looking in the direction of propagation).</summary>
public enum PolarizationHand { Right, Left, Linear }

/// <summary>
/// The polarization of one antenna in the direction of the link: hand, axial ratio (≥ 1, linear is
/// infinite) and tilt of the ellipse's major axis. Tilts of two antennas are compared in one frame,
/// the one seen looking along the propagation direction.
/// </summary>
public sealed record PolarizationState(PolarizationHand Hand, double AxialRatioDb, double TiltDeg)
{
    public static PolarizationState Linear(double tiltDeg = 0) => new(PolarizationHand.Linear, double.PositiveInfinity, tiltDeg);
    public static PolarizationState Rhcp(double axialRatioDb = 0, double tiltDeg = 0) => new(PolarizationHand.Right, axialRatioDb, tiltDeg);
    public static PolarizationState Lhcp(double axialRatioDb = 0, double tiltDeg = 0) => new(PolarizationHand.Left, axialRatioDb, tiltDeg);

    /// <summary>Axial ratio as a plain ratio |major/minor| ≥ 1 (infinite for linear).</summary>
    public double AxialRatio => Hand == PolarizationHand.Linear ? double.PositiveInfinity : Math.Pow(10, AxialRatioDb / 20);

    /// <summary>
    /// Signed axial ratio: positive for right hand, negative for left hand; infinite for linear.
    /// This is the sign convention the loss-factor formula needs (same hand, same sign).
    /// </summary>
    public double SignedAxialRatio => Hand switch
    {
        PolarizationHand.Right => AxialRatio,
        PolarizationHand.Left => -AxialRatio,
        _ => double.PositiveInfinity,
    };

    /// <summary>
    /// Reads the notation used on the command line: <c>rhcp</c>, <c>lhcp:1.5dB</c>,
    /// <c>rhcp:3dB@20deg</c>, <c>linear</c>, <c>linear@45deg</c>. Axial ratio in dB (default 0),
    /// tilt in degrees (default 0).
    /// </summary>
    public static PolarizationState Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var s = text.Trim().ToLowerInvariant();
        double tiltDeg = 0;
        var at = s.IndexOf('@');
        if (at >= 0)
        {
            tiltDeg = ParseNumberWithUnit(s[(at + 1)..], "deg", text, "a tilt", "30deg");
            s = s[..at];
        }
        var colon = s.IndexOf(':');
        var handText = colon >= 0 ? s[..colon] : s;
        var arText = colon >= 0 ? s[(colon + 1)..] : null;
        var hand = handText switch
        {
            "rhcp" => PolarizationHand.Right,
            "lhcp" => PolarizationHand.Left,
            "linear" => PolarizationHand.Linear,
            _ => throw new FormatException($"found '{text}', allowed rhcp, lhcp or linear, with an optional :ARdB and @TILTdeg (e.g. rhcp:1.5dB@30deg)"),
        };
        if (hand == PolarizationHand.Linear)
        {
            if (arText is not null)
                throw new FormatException($"found '{text}', allowed linear or linear@TILTdeg (a linear antenna takes no axial ratio)");
            return Linear(tiltDeg);
        }
        var arDb = arText is null ? 0 : ParseNumberWithUnit(arText, "db", text, "an axial ratio", "1.5dB");
        if (arDb < 0)
            throw new FormatException($"found '{text}', allowed an axial ratio of 0 dB or more");
        return new PolarizationState(hand, arDb, tiltDeg);
    }

    private static double ParseNumberWithUnit(string part, string unit, string whole, string what, string example)
    {
        var p = part.Trim();
        var number = p.EndsWith(unit, StringComparison.Ordinal) ? p[..^unit.Length].Trim() : null;
        if (number is null || !double.TryParse(number, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) || !double.IsFinite(value))
            throw new FormatException($"found '{whole}', allowed {what} as a finite number with its unit, e.g. {example}");
        return value;
    }

    public override string ToString() => Hand switch
    {
        PolarizationHand.Linear => string.Create(CultureInfo.InvariantCulture, $"linear@{TiltDeg:0.#}deg"),
        _ => string.Create(CultureInfo.InvariantCulture, $"{(Hand == PolarizationHand.Right ? "rhcp" : "lhcp")}:{AxialRatioDb:0.##}dB@{TiltDeg:0.#}deg"),
    };
}
