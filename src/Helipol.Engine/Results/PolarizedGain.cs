namespace Helipol.Engine;

/// <summary>
/// Gain and polarization in one direction. Gains are referred to the accepted input power (IEEE Std
/// 145 gain), in dBic for the circular parts and dBi for the total; a null reads −300 dB.
/// <paramref name="AxialRatioDb"/> is 20·log10 of the major/minor axis ratio, capped at
/// <see cref="Polarization.MaxAxialRatioDb"/> for a purely linear field. <paramref name="TiltRad"/> is the
/// major axis angle from θ̂ towards φ̂, in (−π/2, π/2].
/// </summary>
public readonly record struct PolarizedGain(
    double GainRhcpDbic,
    double GainLhcpDbic,
    double GainTotalDbi,
    double AxialRatioDb,
    double TiltRad,
    PolarizationSense Sense);
