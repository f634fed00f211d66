using System.Globalization;
using Helipol.Spec;

namespace Helipol.Model;

/// <summary>A design that can be built but deserves a second look; printed by <c>check</c>, never fatal.</summary>
public sealed record DesignWarning(string File, SourceMark Mark, string FieldPath, string Message)
{
    public override string ToString() => $"{File}:{Mark.Line}:{Mark.Column}: warning: {FieldPath}: {Message}";
}

/// <summary>
/// Soft limits: thin-wire validity (wire radius well below λ, elements long enough for segments
/// of at least about four radii; Harrington, Field Computation by Moment Methods, ch. 4; Gibson,
/// The Method of Moments in Electromagnetics, thin-wire chapter), and elements near the edges of
/// the former or beyond the whip, and printed grooves too shallow or too loose for the wire.
/// </summary>
public static class DesignWarnings
{
    /// <summary>Thin-wire kernels assume a ≪ λ; beyond a/λ = 0.01 their error grows quickly.</summary>
    public const double MaxRadiusOverWavelength = 0.01;

    /// <summary>Eight segments of at least four radii each: the shortest element the model resolves.</summary>
    public const double MinElementLengthOverRadius = 32;

    /// <summary>
    /// Depth of the printed sleeve's grooves in wire diameters; the sleeve itself is drawn by
    /// Geometry/FormerSleeve.cs (a test keeps the two equal).
    /// </summary>
    public const double GrooveDepthPerWireDiameter = 0.6;

    /// <summary>Shallowest groove a desktop FDM printer forms reliably: about one 0.2 mm layer (common practice, no source).</summary>
    public const double MinPrintedGrooveDepthMm = 0.2;

    public static IReadOnlyList<DesignWarning> For(SpecDocument doc, PolarizerDesign design)
    {
        var warnings = new List<DesignWarning>();
        void Warn(string path, string message) => warnings.Add(new DesignWarning(doc.File, doc.MarkOf(path), path, message));
        string Mm(double m) => (m * 1e3).ToString("0.##", CultureInfo.InvariantCulture) + " mm";

        var lambda = design.Band.WavelengthM;
        var p = design.Polarizer;
        if (p.Wire.RadiusM > MaxRadiusOverWavelength * lambda)
            Warn(Keys.PolarizerWireDiameter, $"wire radius {Mm(p.Wire.RadiusM)} is more than 1 % of the wavelength ({Mm(lambda)}); the thin-wire model loses accuracy");
        if (design.Whip.RadiusM > MaxRadiusOverWavelength * lambda)
            Warn(Keys.WhipDiameter, $"whip radius {Mm(design.Whip.RadiusM)} is more than 1 % of the wavelength ({Mm(lambda)}); the thin-wire model loses accuracy");

        var layout = design.Practice;
        if (layout.LengthM < MinElementLengthOverRadius * p.Wire.RadiusM)
            Warn(Keys.PolarizerElementLength, $"elements of {Mm(layout.LengthM)} are shorter than {MinElementLengthOverRadius} wire radii; too few thin-wire segments fit");

        var margin = (p.Former.HeightM - layout.RiseM) / 2;
        if (margin < p.Wire.DiameterM)
            Warn(Keys.PolarizerFormerHeight, $"element ends come within {Mm(Math.Max(0, margin))} of the former's edge (rise {Mm(layout.RiseM)}, height {Mm(p.Former.HeightM)}); glue and tape hold poorly there");

        // The printed sleeve's grooves: deep enough to print, narrow enough to locate the wire.
        var wireMm = p.Wire.DiameterM * 1e3;
        var grooveMm = GrooveDepthPerWireDiameter * wireMm;
        if (grooveMm < MinPrintedGrooveDepthMm)
            Warn(Keys.PolarizerWireDiameter, $"the printed sleeve's grooves would be {grooveMm.ToString("0.###", CultureInfo.InvariantCulture)} mm deep ({GrooveDepthPerWireDiameter} × wire diameter), less than one {MinPrintedGrooveDepthMm.ToString("0.#", CultureInfo.InvariantCulture)} mm print layer; too shallow to hold the wire");
        if (design.Fabrication.PrintClearanceMm > wireMm / 2)
            Warn(Keys.FabricationPrintClearance, $"grooves {(wireMm + design.Fabrication.PrintClearanceMm).ToString("0.##", CultureInfo.InvariantCulture)} mm wide for a {wireMm.ToString("0.##", CultureInfo.InvariantCulture)} mm wire let it wander more than a quarter diameter either side; the printed sleeve no longer places the element");

        var top = p.CentreHeightM + layout.RiseM / 2;
        var bottom = p.CentreHeightM - layout.RiseM / 2;
        var (whipLow, whipHigh) = design.Whip.Kind == WhipKind.Monopole ? (0.0, design.Whip.LengthM) : (-design.Whip.LengthM / 2, design.Whip.LengthM / 2);
        if (top > whipHigh || bottom < whipLow)
            Warn(Keys.PolarizerCentreHeight, $"elements span {Mm(bottom)} to {Mm(top)} but the whip spans {Mm(whipLow)} to {Mm(whipHigh)}; the elements reach past its ends");
        return warnings.OrderBy(w => w.Mark.Line).ThenBy(w => w.Mark.Column).ToList();
    }
}
