using System.Globalization;
using UnitsNet;
using UnitsNet.Units;

namespace Helipol.Spec;

/// <summary>
/// The kinds of quantity a design file carries, the units a user may write for each, and the
/// conversion to SI. Conversions are done by UnitsNet (1 in = 25.4 mm exactly, NIST SP 811).
/// </summary>
public enum QuantityKind
{
    Length,
    Frequency,
    Angle,
    /// <summary>A share written in percent; stored as a fraction (30 % = 0.3).</summary>
    Percent,
    Conductivity,
    /// <summary>A power ratio in decibels (an axial-ratio limit); stored as dB.</summary>
    Level,
    /// <summary>A resistance in ohms (a receiver's reference impedance).</summary>
    Resistance,
}

public static class QuantityKinds
{
    public static string Noun(this QuantityKind kind) => kind switch
    {
        QuantityKind.Length => "a length",
        QuantityKind.Frequency => "a frequency",
        QuantityKind.Angle => "an angle",
        QuantityKind.Percent => "a percentage",
        QuantityKind.Conductivity => "a conductivity",
        QuantityKind.Level => "a level",
        QuantityKind.Resistance => "a resistance",
        _ => throw new ArgumentOutOfRangeException(nameof(kind)),
    };

    /// <summary>Units as users write them, in the order the help lists them.</summary>
    public static IReadOnlyList<string> UnitsWritten(this QuantityKind kind) => kind switch
    {
        QuantityKind.Length => new[] { "mm", "cm", "m", "in" },
        QuantityKind.Frequency => new[] { "Hz", "kHz", "MHz", "GHz" },
        QuantityKind.Angle => new[] { "deg", "°", "rad" },
        QuantityKind.Percent => new[] { "%" },
        QuantityKind.Conductivity => new[] { "S/m" },
        QuantityKind.Level => new[] { "dB" },
        QuantityKind.Resistance => new[] { "ohm", "Ω" },
        _ => throw new ArgumentOutOfRangeException(nameof(kind)),
    };

    /// <summary>An example used in hints ("write it as 16 mm").</summary>
    public static string Example(this QuantityKind kind) => kind switch
    {
        QuantityKind.Length => "16 mm",
        QuantityKind.Frequency => "5.8 GHz",
        QuantityKind.Angle => "5 deg",
        QuantityKind.Percent => "30 %",
        QuantityKind.Conductivity => "5.8e7 S/m",
        QuantityKind.Level => "3 dB",
        QuantityKind.Resistance => "50 ohm",
        _ => throw new ArgumentOutOfRangeException(nameof(kind)),
    };

    /// <summary>
    /// The accepted unit that differs from <paramref name="unit"/> only in letter case ("mhz" → "MHz"),
    /// or null. Case is never guessed silently: m is milli and M is mega (SI Brochure, 9th ed., §3).
    /// </summary>
    public static string? UnitWithOtherCase(this QuantityKind kind, string unit) =>
        kind.UnitsWritten().FirstOrDefault(u => u != unit && string.Equals(u, unit, StringComparison.OrdinalIgnoreCase));

    /// <summary>" (did you mean 'MHz'?)" for a unit written in the wrong case, else "".</summary>
    public static string UnitHint(this QuantityKind kind, string unit) =>
        kind.UnitWithOtherCase(unit) is { } fixedUnit ? $" (did you mean '{fixedUnit}'?)" : "";

    /// <summary>Converts a number in a written unit to SI; false if the unit is not one this kind accepts.</summary>
    public static bool TryToSi(this QuantityKind kind, double number, string unit, out double si)
    {
        si = double.NaN;
        var provider = CultureInfo.InvariantCulture;
        switch (kind)
        {
            case QuantityKind.Length:
                if (!UnitParser.Default.TryParse<LengthUnit>(unit, provider, out var lengthUnit)) return false;
                if (lengthUnit is not (LengthUnit.Millimeter or LengthUnit.Centimeter or LengthUnit.Meter or LengthUnit.Inch)) return false;
                si = Length.From(number, lengthUnit).Meters;
                return true;
            case QuantityKind.Frequency:
                if (!UnitParser.Default.TryParse<FrequencyUnit>(unit, provider, out var frequencyUnit)) return false;
                if (frequencyUnit is not (FrequencyUnit.Hertz or FrequencyUnit.Kilohertz or FrequencyUnit.Megahertz or FrequencyUnit.Gigahertz)) return false;
                if (unit is not ("Hz" or "kHz" or "MHz" or "GHz")) return false; // never guess between mHz and MHz
                si = Frequency.From(number, frequencyUnit).Hertz;
                return true;
            case QuantityKind.Angle:
                var angleUnit = unit switch { "deg" or "°" => AngleUnit.Degree, "rad" => AngleUnit.Radian, _ => (AngleUnit?)null };
                if (angleUnit is null) return false;
                si = Angle.From(number, angleUnit.Value).Radians;
                return true;
            case QuantityKind.Percent:
                if (unit != "%") return false;
                si = Ratio.From(number, RatioUnit.Percent).DecimalFractions;
                return true;
            case QuantityKind.Conductivity:
                if (unit != "S/m") return false;
                si = ElectricConductivity.From(number, ElectricConductivityUnit.SiemensPerMeter).SiemensPerMeter;
                return true;
            case QuantityKind.Level:
                if (unit != "dB") return false;
                si = number;
                return true;
            case QuantityKind.Resistance:
                if (unit is not ("ohm" or "Ω")) return false;
                si = number;
                return true;
            default:
                return false;
        }
    }

    /// <summary>Formats an SI value in the unit a user would pick, for range limits in messages.</summary>
    public static string FormatSi(this QuantityKind kind, double si)
    {
        string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);
        return kind switch
        {
            QuantityKind.Length => $"{F(si * 1e3)} mm",
            QuantityKind.Frequency => si >= 1e9 ? $"{F(si / 1e9)} GHz" : si >= 1e6 ? $"{F(si / 1e6)} MHz" : si >= 1e3 ? $"{F(si / 1e3)} kHz" : $"{F(si)} Hz",
            QuantityKind.Angle => $"{F(si * 180.0 / Math.PI)} deg",
            QuantityKind.Percent => $"{F(si * 100.0)} %",
            QuantityKind.Conductivity => $"{si.ToString("0.###e0", CultureInfo.InvariantCulture)} S/m",
            QuantityKind.Level => $"{F(si)} dB",
            QuantityKind.Resistance => $"{F(si)} ohm",
            _ => throw new ArgumentOutOfRangeException(nameof(kind)),
        };
    }
}
