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
        foreach (var v in DrillTemplates.Views(g))
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
            var below = c + new Point2(-v.OuterRadiusMm - 5, -v.OuterRadiusMm - 8.5);
            var face = v.Face == RingFace.Top ? "TOP FACE" : "BOTTOM FACE, MIRRORED (SEEN FROM BELOW)";
            doc.Text("TEXT", below, 2.5, DxfText.Clean($"RING {v.RingNumber} {face}"));
            if (v.Holes.Count > 0)
            {
                var h = v.Holes[0];
                doc.Text("TEXT", below - new Point2(0, 3.5), 2.0,
                    string.Create(ci, $"HOLE DIA {h.DiameterMm:0.00} MM, DRILL {h.AngleFromNormalDeg:0.0} DEG FROM THE AXIS ALONG THE LINE"));
            }
            doc.Text("TEXT", below - new Point2(0, 7), 2.0, DxfText.Clean(g.Input.DesignName));
        }
        return doc.ToBytes();
    }
}
