using System.Numerics;

namespace Helipol.Engine.Mesh;

/// <summary>
/// Series impedance per unit length of a wire (Ω/m) at angular frequency ω: skin effect plus a
/// dielectric coating.
/// Skin effect: Z' = (1 + j)/(2πa) · sqrt(ωμ0μr/(2σ)) — the surface impedance of a good conductor
/// spread round the circumference (any EM handbook, e.g. Ramo, Whinnery and Van Duzer, *Fields and Waves*;
/// valid while the skin depth is much smaller than the radius).
/// Coating: jωL' with L' = (μ0/2π)(1 − 1/εr) ln(b/a) (Richmond and Newman, dielectric-coated wire
/// antennas, Radio Science 1976), times a calibration factor.
/// </summary>
internal readonly record struct WireImpedance(double SkinCoefficient, double CoatingInductanceHPerM)
{
    public static WireImpedance For(double radiusM, Conductor conductor, DielectricCoating? coating)
    {
        double skin = conductor is LossyConductor lossy
            ? Math.Sqrt(PhysicalConstants.Mu0 * lossy.RelativePermeability / (2 * lossy.ConductivitySPerM)) / (2 * Math.PI * radiusM)
            : 0;
        double inductance = coating is null
            ? 0
            : coating.InductanceScale * PhysicalConstants.Mu0 / (2 * Math.PI)
              * (1 - 1 / coating.RelativePermittivity) * Math.Log(coating.OuterRadiusM / radiusM);
        return new WireImpedance(skin, inductance);
    }

    public bool IsZero => SkinCoefficient == 0 && CoatingInductanceHPerM == 0;

    /// <summary>Series impedance per metre at angular frequency ω (rad/s).</summary>
    public Complex PerMetreOhm(double omega)
    {
        double skin = SkinCoefficient * Math.Sqrt(omega);
        return new Complex(skin, skin + omega * CoatingInductanceHPerM);
    }
}
