namespace Helipol.Geometry;

/// <summary>A hole where an element's wire passes a ring face, in the view's coordinates, and the
/// straight drilling line through the ring that joins it to the hole on the other face.</summary>
public sealed record DrillHole(int ElementNumber, Point2 Centre, double DiameterMm, double AngleFromNormalDeg, Point2 ExitSeenFromHere);

/// <summary>One face of one ring as a drilling guide.</summary>
public sealed record DrillFaceView(int RingNumber, RingFace Face, Point2 Centre, double OuterRadiusMm, double BoreRadiusMm, IReadOnlyList<DrillHole> Holes);

/// <summary>
/// Drilling guides for the push-through build, where each wire runs inside the foam wall instead of
/// on its surface. Holes sit on a circle one hole diameter inside the outer surface, leaving half
/// a hole of foam outside the wire (a design choice of this tool, to keep the radius close to the
/// solved one while the skin holds); a wall thinner than two holes is drilled down its middle.
/// Each ring is drilled straight from the top hole to the bottom hole; the angle is measured from
/// the face normal (the whip axis).
/// </summary>
public static class DrillTemplates
{
    public static double HoleDiameterMm(PolarizerGeometry g) => g.Input.WireDiameterMm + g.Input.DrillClearanceMm;
    /// <summary>One hole diameter inside the outer surface, or mid-wall when the wall is thinner
    /// than two hole diameters.</summary>
    public static double HoleCircleRadiusMm(PolarizerGeometry g) =>
        Math.Max(g.FormerOuterRadiusMm - HoleDiameterMm(g), (g.FormerOuterRadiusMm + g.FormerBoreRadiusMm) / 2);

    public static IReadOnlyList<DrillFaceView> Views(PolarizerGeometry g)
    {
        var views = new List<DrillFaceView>();
        var cell = RingTemplates.CellSize(g);
        var gap = RingTemplates.PartSpacingMm(g.Input);
        var rd = HoleCircleRadiusMm(g);
        var dia = HoleDiameterMm(g);
        var faces = g.RingFaceHeightsMm;
        for (var ring = 1; ring <= g.Input.RingCount; ring++)
        {
            var zBottom = faces[ring - 1];
            var zTop = faces[ring];
            var passing = g.Elements.Where(e => e.UpperEndHeightMm > zBottom + 1e-9 && e.LowerEndHeightMm < zTop - 1e-9).ToList();
            foreach (var face in new[] { RingFace.Top, RingFace.Bottom })
            {
                var centre = new Point2((ring - 1) * (cell.W + gap) + cell.W / 2, face == RingFace.Top ? 0 : -(cell.H + gap));
                var holes = passing.Select(e =>
                {
                    var azTop = e.AzimuthAtHeightRad(zTop);
                    var azBottom = e.AzimuthAtHeightRad(zBottom);
                    var chord = 2 * rd * Math.Abs(Math.Sin((azTop - azBottom) / 2));
                    var angle = Math.Atan2(chord, zTop - zBottom) * 180 / Math.PI;
                    var here = face == RingFace.Top ? azTop : azBottom;
                    var there = face == RingFace.Top ? azBottom : azTop;
                    return new DrillHole(e.Number, Point2.Polar(rd, RingFaceView.DrawingAngle(face, here)), dia, angle,
                        Point2.Polar(rd, RingFaceView.DrawingAngle(face, there)));
                }).ToList();
                views.Add(new DrillFaceView(ring, face, centre, g.FormerOuterRadiusMm, g.FormerBoreRadiusMm, holes));
            }
        }
        return views;
    }
}
