using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// What a builder can make: the limits a searched geometry must respect. Margins are workshop
/// habits (common practice, no source), stated here so a reviewer can change them in one place.
/// </summary>
public sealed record FabricationLimits(double FormerHeightM, double WireDiameterM, double CentreHeightM, bool OnGround, double BoreM = 0)
{
    /// <summary>Foam left above and below the element ends, in wire diameters, so the ends stay held (common practice, no source).</summary>
    public const double EndMarginInWireDiameters = 1;

    /// <summary>Free gap between neighbouring wires beyond one wire diameter, m: room for glue and hand placement (common practice, no source).</summary>
    public const double ExtraGapM = 0.5e-3;

    /// <summary>Tightest bend radius of the helix, in wire diameters; tighter bends crack hard wire (common practice, no source).</summary>
    public const double MinimumBendRadiusInWireDiameters = 2;

    /// <summary>An element must run at least this share of its length around the former (rise &lt; length with room for an arc).</summary>
    public const double MinimumRunFraction = 0.2;

    public static FabricationLimits For(PolarizerDesign design) => new(
        design.Polarizer.Former.HeightM, design.Polarizer.Wire.DiameterM, design.Polarizer.CentreHeightM, design.Whip.Kind == WhipKind.Monopole,
        design.Polarizer.Former.BoreM);

    /// <summary>Largest rise that fits the former height with the end margins.</summary>
    public double MaximumRiseM => FormerHeightM - 2 * EndMarginInWireDiameters * WireDiameterM - WireDiameterM;

    /// <summary>Null when the layout can be built; otherwise the first reason it cannot.</summary>
    public string? Violation(ElementLayout layout) => Check(layout)?.Reason;

    /// <summary>Null when the layout can be built; otherwise the first reason and which input causes it.</summary>
    public FabricationViolation? Check(ElementLayout layout)
    {
        double d = WireDiameterM;
        FabricationViolation V(FabricationCause cause, string reason) => new(cause, reason);
        if (layout.RiseM <= 0) return V(FabricationCause.Rise, "rise must be positive");
        // A search step can propose a length below the rise (or below zero), where the helix's arc
        // sqrt(L² − h²) is not a number and every comparison below would pass; the engine's old
        // 4-radius segment limit used to refuse such elements before this check was needed.
        if (!(layout.LengthM > layout.RiseM)) return V(FabricationCause.Length, "element not longer than its rise");
        // The bore already clears the whip's cover; a wall thinner than the wire would put the
        // elements inside the cover (or the whip).
        if ((layout.OuterDiameterM - BoreM) / 2 <= d) return V(FabricationCause.Wire, "former wall thinner than the wire (elements would sit inside the cover)");
        // The wire is to blame when its end margins would not fit even at the practice proportion
        // of rise to former height (12.7 mm in 15.9 mm, PracticeScaling); otherwise the rise is.
        if (layout.RiseM > MaximumRiseM + 1e-12)
            return V((2 * EndMarginInWireDiameters + 1) * d > FormerHeightM * (1 - PracticeScaling.ElementRiseAtReferenceM / PracticeScaling.FormerHeightAtReferenceM)
                ? FabricationCause.Wire : FabricationCause.Rise, "rise does not fit the former height");
        if (layout.ArcLengthM < MinimumRunFraction * layout.LengthM) return V(FabricationCause.Rise, "rise too close to the element length");
        if (ElementClearance.MinimumAxisDistanceM(layout) < 2 * d + ExtraGapM) return V(FabricationCause.Length, "neighbouring elements too close");
        double pitchOverTurn = layout.RiseM / layout.ArcAngleRad; // helix c = rise per radian
        double r = layout.AxisRadiusM;
        if ((r * r + pitchOverTurn * pitchOverTurn) / r < MinimumBendRadiusInWireDiameters * d) return V(FabricationCause.Wire, "bend radius too tight");
        if (OnGround && CentreHeightM - layout.RiseM / 2 < d) return V(FabricationCause.Ground, "element touches the ground plane");
        return null;
    }
}

/// <summary>The input a builder would change to clear a <see cref="FabricationViolation"/>.</summary>
public enum FabricationCause { Length, Rise, Wire, Ground }

/// <summary>Why a layout cannot be built, and which input causes it.</summary>
public sealed record FabricationViolation(FabricationCause Cause, string Reason)
{
    public override string ToString() => Reason;
}
