using Helipol.Model;

namespace Helipol.Geometry;

/// <summary>
/// The printed former: a sleeve that slides over the whip's cover, with one helical groove per
/// element. The wire rests on the groove floor, so the floor is at R − d/2 (R = solved element
/// radius, d = wire diameter) and the wire axis lands on R; the groove is 0.6·d deep, so the
/// sleeve's printed outer radius is R + 0.1·d. Groove walls lean out by a small taper so each wall
/// prints as a real surface, and each groove runs out (its floor rises to the surface) just past the
/// element's ends, which also shows the builder where the wire stops.
/// </summary>
public sealed record FormerSleeve(
    double OuterRadiusMm, double BoreRadiusMm, double HeightMm, double ChamferMm,
    double GrooveFloorRadiusMm, double GrooveWidthMm, double GrooveHalfWidthRad, double GrooveWallTaperRad,
    double GrooveLowerEndMm, double GrooveUpperEndMm, double RunOutBelowMm, double RunOutAboveMm,
    double ShearRadPerMm, SenseMark Mark)
{
    public const double GrooveDepthPerWireDiameter = 0.6;
    public const double GrooveWallTaperMm = 0.15;
    /// <summary>Depth of the sunk sense letter, mm (common practice for legible printed text, no source).</summary>
    public const double MarkDepthMm = 0.4;
    public double GrooveDepthMm => OuterRadiusMm - GrooveFloorRadiusMm;

    public static FormerSleeve From(PolarizerGeometry g)
    {
        var i = g.Input;
        var d = i.WireDiameterMm;
        var floor = g.ElementAxisRadiusMm - d / 2;
        var outer = floor + GrooveDepthPerWireDiameter * d;
        var bore = (i.CoverDiameterMm + i.PrintClearanceMm) / 2;
        var height = i.FormerHeightMm;
        if (floor - bore < 0.6)
            throw new ArgumentException($"former wall: found {floor - bore:F2} mm under the grooves, allowed at least 0.6 mm (a larger outer diameter or a smaller cover)");
        // A 45° lead-in on the bore's lower edge so the sleeve starts over the cover easily.
        var chamfer = Math.Min(1.0, Math.Min(0.4 * (floor - bore), 0.2 * height));
        var width = d + i.PrintClearanceMm;
        // Horizontal half-width of a band of perpendicular width W that climbs at pitch ψ is
        // (W/2)/sin ψ; ψ here is the helix's pitch on the floor cylinder.
        var psiFloor = HelixArc.PitchAngleRad(i.ElementRiseMm, g.ArcAngleRad * floor);
        var halfWidthRad = width / 2 / Math.Sin(psiFloor) / floor;
        var taperRad = GrooveWallTaperMm / floor;
        var pitchRad = 2 * Math.PI / i.ElementCount;
        if (2 * (halfWidthRad + taperRad) > 0.8 * pitchRad)
            throw new ArgumentException("element count: found grooves that would merge at this pitch, allowed fewer elements or a steeper pitch");
        var lower = g.Elements[0].LowerEndHeightMm;
        var upper = g.Elements[0].UpperEndHeightMm;
        var runOut = Math.Max(1.0, 2 * GrooveDepthPerWireDiameter * d);
        var shear = g.WindingSign * g.ArcAngleRad / i.ElementRiseMm;
        var mark = SenseMark.Place(i.Sense, lower, upper, pitchRad, halfWidthRad + taperRad, outer);
        return new FormerSleeve(outer, bore, height, chamfer, floor, width, halfWidthRad, taperRad,
            lower, upper, Math.Min(runOut, lower), Math.Min(runOut, height - upper), shear, mark);
    }

    /// <summary>Azimuth offset of the sheared grid at height z: the grooves follow the helix over
    /// the element and its run-outs and stand still above and below.</summary>
    public double ShearRad(double zMm) =>
        ShearRadPerMm * (Math.Clamp(zMm, GrooveLowerEndMm - RunOutBelowMm, GrooveUpperEndMm + RunOutAboveMm) - GrooveLowerEndMm);

    /// <summary>Fraction of the full groove depth at height z: 1 along the element, falling linearly
    /// to 0 over the run-outs.</summary>
    public double DepthFraction(double zMm)
    {
        if (zMm >= GrooveLowerEndMm && zMm <= GrooveUpperEndMm) return 1;
        if (zMm < GrooveLowerEndMm)
            return RunOutBelowMm <= 0 ? 0 : Math.Max(0, 1 - (GrooveLowerEndMm - zMm) / RunOutBelowMm);
        return RunOutAboveMm <= 0 ? 0 : Math.Max(0, 1 - (zMm - GrooveUpperEndMm) / RunOutAboveMm);
    }

    /// <summary>Fraction of the groove depth at angular offset s from a groove's centre line.</summary>
    public double ProfileFraction(double offsetRad)
    {
        var a = Math.Abs(offsetRad);
        if (a <= GrooveHalfWidthRad + 1e-12) return 1;
        if (a >= GrooveHalfWidthRad + GrooveWallTaperRad) return 0;
        return 1 - (a - GrooveHalfWidthRad) / GrooveWallTaperRad;
    }
}
