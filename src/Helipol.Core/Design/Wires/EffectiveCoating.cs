using Helipol.Design.Loading;
using Helipol.Engine;

namespace Helipol.Design;

/// <summary>
/// Hands the element's loading to the engine, whose coated thin-wire model takes one concentric
/// sleeve: L′ = (μ0/2π)(1 − 1/εr) ln(b/a) (Richmond and Newman, "Dielectric coated wire antennas",
/// Radio Science 11(1), 1976). The added inductance of the real cross-section comes from the field
/// solve (<see cref="AddedInductance"/>, S = L′/(μ0/2π)); the engine gets the sleeve with the same
/// S, times the calibration factor as the coating's inductance scale.
///
/// The sleeve's outer radius b is twice the wire radius, or more if the loading needs it
/// (S ≤ 0.8 ln(b/a) keeps εr finite and moderate). Only the product (1 − 1/εr) ln(b/a) reaches the
/// engine's current, so the choice of b changes nothing else. Dielectric loss (tan δ) is left
/// out: at these thicknesses its resistance is far below the wire's skin-effect resistance.
/// </summary>
public static class EffectiveCoating
{
    /// <summary>The equivalent single sleeve, or null when the wire sits in air.</summary>
    public static DielectricCoating? For(Surroundings s)
    {
        double sum = s.ShapeFactor;
        if (sum <= 1e-9 || s.CalibrationFactor <= 0) return null;
        double a = s.Section.WireRadiusM;
        double ln = Math.Max(Math.Log(2), sum / 0.8);
        // (1 − 1/εr) ln(b/a) = S  ⇒  εr = 1 / (1 − S/ln(b/a)).
        double eps = 1 / (1 - sum / ln);
        return new DielectricCoating(eps, a * Math.Exp(ln), s.CalibrationFactor);
    }
}
