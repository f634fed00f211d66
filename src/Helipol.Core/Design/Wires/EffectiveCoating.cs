using Helipol.Engine;

namespace Helipol.Design;

/// <summary>
/// Turns the partial, layered dielectric around a polarizer element into the single coating the
/// engine's coated thin-wire model takes.
///
/// <para><b>Published basis.</b> A wire of radius a inside a concentric dielectric sleeve of outer
/// radius b and permittivity εr behaves, for the current along it, like a bare wire with an added
/// series inductance per unit length L' = (μ0/2π)(1 − 1/εr) ln(b/a) (Richmond and Newman,
/// "Dielectric coated wire antennas", Radio Science 11(1), 1976). The term comes from the extra
/// radial voltage the sleeve's lower field costs the charge on the wire; for several concentric
/// layers the contributions add: L' = (μ0/2π) Σ (1 − 1/εi) ln(r(i+1)/ri).</para>
///
/// <para><b>Our assumptions (stated, not published).</b>
/// (1) The wire's circumference is split into two sectors: the covered share
/// (<see cref="Surroundings.CoveredFraction"/>, default one half) under glue and then tape, and the
/// rest against the former. Sectors are taken to act in parallel for the radial field, so in each
/// radial shell the permittivities mix linearly by share: ε = f·ε_cover + (1 − f)·ε_former.
/// (2) Glue lies directly on the wire, the wrap over the glue; the former sector is solid former
/// material out to one wire diameter from the axis (or the outside of the wrap, if farther).
/// (3) Dielectric loss (tan δ) is left out: at these thicknesses its resistance is far below the
/// wire's skin-effect resistance.
/// (4) Tape spanning the gaps between elements, the whip's plastic cover and the bulk former
/// are not modelled: their effect on the element current is second order next to the material
/// touching the wire.
/// (5) A single calibration factor multiplies the added inductance, so a measured build can
/// correct everything the assumptions above miss (see Design/Calibration).</para>
///
/// The layered result is handed to the engine as one sleeve with the same L': outer radius b = the
/// outermost shell, and εr chosen so (1 − 1/εr) ln(b/a) equals the layered sum.
/// </summary>
public static class EffectiveCoating
{
    /// <summary>
    /// Added inductance per unit length before calibration, divided by μ0/2π (dimensionless):
    /// Σ (1 − 1/ε_shell) ln(r_outer/r_inner) over the shells described above.
    /// </summary>
    public static double LayerSum(Surroundings s, double wireRadiusM)
    {
        double a = wireRadiusM;
        double glueOuter = a + s.GlueThicknessM;
        double wrapOuter = glueOuter + s.WrapThicknessM;
        double formerOuter = Math.Max(2 * a, wrapOuter);
        var radii = new SortedSet<double> { a, glueOuter, wrapOuter, formerOuter };
        double sum = 0;
        double inner = a;
        foreach (var outer in radii)
        {
            if (outer <= inner * (1 + 1e-12)) continue;
            double mid = 0.5 * (inner + outer);
            double cover = mid < glueOuter ? s.GluePermittivity : mid < wrapOuter ? s.WrapPermittivity : 1.0;
            double former = mid < formerOuter ? s.FormerPermittivity : 1.0;
            double eps = s.CoveredFraction * cover + (1 - s.CoveredFraction) * former;
            sum += (1 - 1 / eps) * Math.Log(outer / inner);
            inner = outer;
        }
        return sum;
    }

    /// <summary>Added inductance per unit length after calibration, H/m.</summary>
    public static double InductanceHPerM(Surroundings s, double wireRadiusM) =>
        s.CalibrationFactor * PhysicalConstants.Mu0 / (2 * Math.PI) * LayerSum(s, wireRadiusM);

    /// <summary>The equivalent single sleeve for the engine, or null when the wire sits in air.</summary>
    public static DielectricCoating? For(Surroundings s, double wireRadiusM)
    {
        double sum = LayerSum(s, wireRadiusM);
        if (sum <= 1e-12 || s.CalibrationFactor <= 0) return null;
        double a = wireRadiusM;
        double b = Math.Max(Math.Max(2 * a, a + s.GlueThicknessM + s.WrapThicknessM), a * (1 + 1e-9));
        double ln = Math.Log(b / a);
        // (1 − 1/εr) ln(b/a) = sum  ⇒  εr = 1 / (1 − sum/ln(b/a)); sum < ln(b/a) because every shell's factor is < 1.
        double eps = 1 / (1 - Math.Min(sum / ln, 1 - 1e-12));
        return new DielectricCoating(eps, b, s.CalibrationFactor);
    }
}
