using Helipol.Engine;

namespace Helipol.Design;

/// <summary>
/// The axial ratio itself: the ratio of the polarization ellipse's axes, from the circular
/// components (IEEE Std 145): AR = (|E_R| + |E_L|)/||E_R| − |E_L||, with |E| ∝ √(power gain).
/// A purely linear field is reported at <see cref="Polarization.MaxAxialRatioDb"/>, the engine's limit.
/// </summary>
public static class TrueAxialRatio
{
    /// <summary>AR in dB from the two circular power gains (linear, any common scale).</summary>
    public static double FromPowerGainsDb(double gainRhcp, double gainLhcp)
    {
        double r = Math.Sqrt(Math.Max(0, gainRhcp)), l = Math.Sqrt(Math.Max(0, gainLhcp));
        double diff = Math.Abs(r - l);
        if (diff <= (r + l) * Math.Pow(10, -Polarization.MaxAxialRatioDb / 20)) return Polarization.MaxAxialRatioDb;
        return 20 * Math.Log10((r + l) / diff);
    }

    /// <summary>AR in dB from the two circular gains in dBic.</summary>
    public static double FromGainsDbic(double rhcpDbic, double lhcpDbic) =>
        FromPowerGainsDb(Math.Pow(10, rhcpDbic / 10), Math.Pow(10, lhcpDbic / 10));

    /// <summary>The sense of rotation: the stronger circular component, linear when the axial ratio is past the engine's linear limit.</summary>
    public static PolarizationSense SenseOf(double gainRhcp, double gainLhcp)
    {
        if (FromPowerGainsDb(gainRhcp, gainLhcp) > Polarization.LinearAxialRatioDb) return PolarizationSense.Linear;
        return gainRhcp > gainLhcp ? PolarizationSense.Rhcp : PolarizationSense.Lhcp;
    }
}
