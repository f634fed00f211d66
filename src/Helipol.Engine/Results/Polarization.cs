using System.Numerics;

namespace Helipol.Engine;

/// <summary>
/// Polarization of a far field per IEEE Std 145-2013 with the e^{jωt} convention and θ̂ × φ̂ = r̂:
/// E_R = (E_θ + jE_φ)/√2, E_L = (E_θ − jE_φ)/√2; AR = (|E_R| + |E_L|)/||E_R| − |E_L||; the major axis
/// lies at ½·arg(E_R·E_L*) from θ̂ towards φ̂ (the two counter-rotating vectors align there).
/// </summary>
public static class Polarization
{
    /// <summary>Axial ratio reported for a purely linear field, dB.</summary>
    public const double MaxAxialRatioDb = 100;

    /// <summary>Above this axial ratio (a 1000:1 ellipse) the sense is reported as linear.</summary>
    public const double LinearAxialRatioDb = 60;

    public static double AxialRatioDb(FarField f)
    {
        double r = f.RightHandV.Magnitude, l = f.LeftHandV.Magnitude;
        double diff = Math.Abs(r - l);
        if (diff <= (r + l) * Math.Pow(10, -MaxAxialRatioDb / 20)) return MaxAxialRatioDb;
        return 20 * Math.Log10((r + l) / diff);
    }

    public static double TiltRad(FarField f)
    {
        double tilt = 0.5 * (f.RightHandV * Complex.Conjugate(f.LeftHandV)).Phase;
        return tilt <= -Math.PI / 2 ? tilt + Math.PI : tilt;
    }

    public static PolarizationSense Sense(FarField f)
    {
        if (AxialRatioDb(f) > LinearAxialRatioDb) return PolarizationSense.Linear;
        return f.RightHandV.Magnitude > f.LeftHandV.Magnitude ? PolarizationSense.Rhcp : PolarizationSense.Lhcp;
    }
}
