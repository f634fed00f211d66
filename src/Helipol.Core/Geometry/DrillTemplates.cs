namespace Helipol.Geometry;

/// <summary>A hole where an element's wire passes a ring face, in the view's coordinates, and the
/// straight drilling line through the ring that joins it to where the wire leaves the ring: the
/// hole on the other face, or the element's end inside the ring. <see cref="DepthMm"/> is how far
/// the hole runs along the axis: the ring's thickness when the wire passes right through, less
/// when it ends inside (a blind hole).</summary>
public sealed record DrillHole(int ElementNumber, Point2 Centre, double DiameterMm, double AngleFromNormalDeg, Point2 ExitSeenFromHere,
    double DepthMm, bool Through);

/// <summary>An element's end inside a ring, shown on the face beyond it (the lower end on the
/// bottom face, the upper end on the top face) with its depth into the ring from that face.</summary>
public sealed record DrillEnd(int ElementNumber, Point2 Centre, double DepthMm);

/// <summary>One face of one ring as a drilling guide. <see cref="Enclosed"/> lists elements that
/// lie wholly inside the ring, reach neither face and so cannot be pushed through it.</summary>
public sealed record DrillFaceView(int RingNumber, RingFace Face, Point2 Centre, double OuterRadiusMm, double BoreRadiusMm,
    IReadOnlyList<DrillHole> Holes, IReadOnlyList<DrillEnd> Ends, IReadOnlyList<int> Enclosed);

/// <summary>
/// Drilling guides for the push-through build, where each wire runs inside the foam wall instead of
/// on its surface. Holes sit on a circle one hole diameter inside the outer surface, leaving half
/// a hole of foam outside the wire (a design choice of this tool, to keep the radius close to the
/// solved one while the skin holds); a wall thinner than two holes is drilled down its middle.
/// A hole is drilled only from a face the wire crosses, straight to where the wire leaves the ring
/// (the other face, or the element's end for a blind hole); its angle is measured from the face
/// normal (the whip axis) over the height of wire actually inside the ring.
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
            var portions = g.Elements
                .Select(e => (Element: e, Portion: WirePortion.InRing(e, zBottom, zTop)))
                .Where(x => x.Portion is not null)
                .Select(x => (x.Element, Portion: x.Portion!.Value))
                .ToList();
            foreach (var face in new[] { RingFace.Top, RingFace.Bottom })
            {
                var centre = new Point2((ring - 1) * (cell.W + gap) + cell.W / 2, face == RingFace.Top ? 0 : -(cell.H + gap));
                Point2 At(double az) => Point2.Polar(rd, RingFaceView.DrawingAngle(face, az));
                var holes = new List<DrillHole>();
                var ends = new List<DrillEnd>();
                foreach (var (e, p) in portions)
                {
                    var azUpper = e.AzimuthAtHeightRad(p.UpperMm);
                    var azLower = e.AzimuthAtHeightRad(p.LowerMm);
                    var chord = 2 * rd * Math.Abs(Math.Sin((azUpper - azLower) / 2));
                    var angle = Math.Atan2(chord, p.HeightMm) * 180 / Math.PI;
                    var through = p.CrossesTop && p.CrossesBottom;
                    if (face == RingFace.Top && p.CrossesTop)
                        holes.Add(new DrillHole(e.Number, At(azUpper), dia, angle, At(azLower), p.HeightMm, through));
                    if (face == RingFace.Bottom && p.CrossesBottom)
                        holes.Add(new DrillHole(e.Number, At(azLower), dia, angle, At(azUpper), p.HeightMm, through));
                    if (face == RingFace.Top && p.EndsAtUpper)
                        ends.Add(new DrillEnd(e.Number, At(azUpper), zTop - p.UpperMm));
                    if (face == RingFace.Bottom && p.EndsAtLower)
                        ends.Add(new DrillEnd(e.Number, At(azLower), p.LowerMm - zBottom));
                }
                var enclosed = portions.Where(x => !x.Portion.CrossesTop && !x.Portion.CrossesBottom).Select(x => x.Element.Number).ToList();
                views.Add(new DrillFaceView(ring, face, centre, g.FormerOuterRadiusMm, g.FormerBoreRadiusMm, holes, ends, enclosed));
            }
        }
        return views;
    }
}
