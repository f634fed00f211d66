using System.Globalization;
using Helipol.Geometry;

namespace Helipol.Emit.Dxf;

/// <summary>
/// drill.dxf: a drilling guide for the push-through build. For each ring the top face and the
/// bottom face (drawn as seen from below, so mirrored, and labelled so) show the hole centres on
/// layer DRILL as circles of the hole diameter, a line on MARK from each hole toward where it
/// leaves the other face, the ring outline and azimuth-0 tick on GUIDE, and the hole size and
/// drilling angle on TEXT.
/// </summary>
public static class DrillDxf
{
    public static readonly IReadOnlyList<DxfLayer> Layers =
        [new("DRILL", 1), new("MARK", 5), new("TEXT", 3), new("GUIDE", 4)];

    public static byte[] Write(PolarizerGeometry g)
    {
        var doc = new DxfDocument(Layers);
        var ci = CultureInfo.InvariantCulture;
        var views = DrillTemplates.Views(g);
        var top = views.Max(v => v.Centre.Y + v.OuterRadiusMm) + 9;
        doc.Text("TEXT", new Point2(0, top + 4), 2.5, DxfText.Clean($"{g.Input.DesignName} DRILL GUIDE"));
        doc.Text("TEXT", new Point2(0, top), 2.0, string.Create(ci,
            $"HOLES DIA {DrillTemplates.HoleDiameterMm(g):0.00} MM. DRILL FROM EACH TOP-FACE HOLE ALONG ITS LINE, TILTED FROM THE AXIS BY THE ANGLE GIVEN (DEG FROM THE AXIS)."));
        doc.Text("TEXT", new Point2(0, top - 3.5), 2.0, "BOTTOM FACES ARE DRAWN MIRRORED, AS SEEN FROM BELOW, TO CHECK WHERE EACH HOLE COMES OUT.");
        foreach (var v in views)
        {
            var c = v.Centre;
            doc.Circle("GUIDE", c, v.OuterRadiusMm);
            doc.Circle("GUIDE", c, v.BoreRadiusMm);
            var zeroAngle = RingFaceView.DrawingAngle(v.Face, 0);
            doc.Line("GUIDE", c + Point2.Polar(v.OuterRadiusMm, zeroAngle), c + Point2.Polar(v.OuterRadiusMm + 2, zeroAngle));
            foreach (var h in v.Holes)
            {
                doc.Circle("DRILL", c + h.Centre, h.DiameterMm / 2);
                doc.Line("MARK", c + h.Centre, c + h.ExitSeenFromHere);
                var label = h.Centre.Length > 0 ? (1 / h.Centre.Length) * h.Centre : new Point2(1, 0);
                doc.Text("TEXT", c + (v.OuterRadiusMm + 2.5) * label - new Point2(0.7, 0.9), 1.8, h.ElementNumber.ToString(ci));
            }
            var below = c + new Point2(-v.OuterRadiusMm - 4, -v.OuterRadiusMm - 6.5);
            doc.Text("TEXT", below, 2.2, DxfText.Clean($"RING {v.RingNumber} {(v.Face == RingFace.Top ? "TOP" : "BOTTOM")}"));
            var next = below - new Point2(0, 3);
            if (v.Face == RingFace.Bottom)
            {
                doc.Text("TEXT", next, 1.8, "MIRRORED");
                next -= new Point2(0, 3);
            }
            if (v.Holes.Count > 0)
                doc.Text("TEXT", next, 1.8, string.Create(ci, $"TILT {v.Holes.Max(h => h.AngleFromNormalDeg):0.0} DEG"));
        }
        return doc.ToBytes();
    }
}
