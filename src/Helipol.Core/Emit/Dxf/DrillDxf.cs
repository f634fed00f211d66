using System.Globalization;
using Helipol.Geometry;

namespace Helipol.Emit.Dxf;

/// <summary>
/// drill.dxf: a drilling guide for the push-through build. For each ring the top face and the
/// bottom face (drawn as seen from below, so mirrored, and labelled so) show the hole centres on
/// layer DRILL as circles of the hole diameter, a line on MARK from each hole toward where it
/// leaves the other face, the ring outline and azimuth-0 tick on GUIDE, and the hole size and
/// drilling angle (and depth of blind holes, where an element ends inside the ring) on TEXT; an
/// element's end inside a ring is a cross on MARK on the face beyond it.
/// </summary>
public static class DrillDxf
{
    public static readonly IReadOnlyList<DxfLayer> Layers =
        [new("DRILL", 1), new("MARK", 5), new("TEXT", 3), new("GUIDE", 4)];

    /// <summary>Each face's caption lines (height, text), before fitting to the cell width.</summary>
    private static List<(double Height, string Text)> Caption(DrillFaceView v)
    {
        var ci = CultureInfo.InvariantCulture;
        var lines = new List<(double Height, string Text)> { (2.2, $"RING {v.RingNumber} {(v.Face == RingFace.Top ? "TOP" : "BOTTOM")}") };
        if (v.Face == RingFace.Bottom) lines.Add((1.8, "MIRRORED"));
        foreach (var (through, depth, tilt) in v.Holes.Select(h => (h.Through, Math.Round(h.DepthMm, 2), Math.Round(h.AngleFromNormalDeg, 1))).Distinct())
            lines.Add((1.8, through
                ? string.Create(ci, $"THROUGH, TILT {tilt:0.0} DEG")
                : string.Create(ci, $"BLIND {depth:0.00} MM DEEP, TILT {tilt:0.0} DEG")));
        foreach (var depth in v.Ends.Select(e => Math.Round(e.DepthMm, 2)).Distinct())
            lines.Add((1.8, string.Create(ci, $"X: ELEMENT END {depth:0.00} MM IN")));
        if (v.Enclosed.Count > 0)
            lines.Add((1.8, $"ELEMENTS {string.Join(",", v.Enclosed)} REACH NO FACE"));
        return lines.Select(l => (l.Height, DxfText.Clean(l.Text))).ToList();
    }

    /// <summary>Line pitch of the captions, mm.</summary>
    private const double LinePitchMm = 3;

    /// <summary>
    /// The layout step of the drill guide: the faces as <see cref="DrillTemplates.Views"/> gives
    /// them, with the row of bottom faces moved down far enough to clear the longest caption
    /// under the top faces. Captions are wrapped to the column width in <see cref="Write"/>, so
    /// columns need no more room than the rings themselves.
    /// </summary>
    public static IReadOnlyList<DrillFaceView> Placed(PolarizerGeometry g)
    {
        var views = DrillTemplates.Views(g);
        var width = ColumnWidthMm(g);
        var topLines = views.Where(v => v.Face == RingFace.Top).Max(v => Fitted(Caption(v), width).Count);
        var r = g.FormerOuterRadiusMm;
        // Top face: captions from r + 6.5 below its centre, one pitch per line, descender under the last;
        // bottom face: its numbers reach r + 2.5 + 0.9 + 1.8 above its centre. 2 mm clear between.
        var pitch = (r + 6.5) + (topLines - 1) * LinePitchMm + 1.8 * DxfText.DescentPerHeight + 2 + (r + 2.5 + 0.9 + 1.8);
        return views.Select(v => v.Face == RingFace.Top ? v : v with { Centre = new Point2(v.Centre.X, -pitch) }).ToList();
    }

    private static double ColumnWidthMm(PolarizerGeometry g) => RingTemplates.CellSize(g).W + RingTemplates.PartSpacingMm(g.Input) - 1;

    /// <summary>Caption lines wrapped at spaces to the column width (a word longer than the column shrinks).</summary>
    private static List<(double Height, string Text)> Fitted(List<(double Height, string Text)> lines, double width) =>
        lines.SelectMany(l => DxfText.Wrap(l.Text, width, l.Height).Select(t => (DxfText.HeightToFit(t, width, l.Height, 0.5), t))).ToList();

    public static byte[] Write(PolarizerGeometry g)
    {
        var doc = new DxfDocument(Layers);
        var ci = CultureInfo.InvariantCulture;
        var views = Placed(g);
        var top = views.Max(v => v.Centre.Y + v.OuterRadiusMm) + 9;
        doc.Text("TEXT", new Point2(0, top + 4), 2.5, DxfText.Clean($"{g.Input.DesignName} DRILL GUIDE"));
        doc.Text("TEXT", new Point2(0, top), 2.0, string.Create(ci,
            $"HOLES DIA {DrillTemplates.HoleDiameterMm(g):0.00} MM. DRILL FROM EACH HOLE ALONG ITS LINE, TILTED FROM THE AXIS BY THE ANGLE GIVEN (DEG FROM THE AXIS), THROUGH OR TO THE DEPTH GIVEN."));
        doc.Text("TEXT", new Point2(0, top - 3.5), 2.0, "BOTTOM FACES ARE DRAWN MIRRORED, AS SEEN FROM BELOW, TO CHECK WHERE EACH HOLE COMES OUT.");
        var width = ColumnWidthMm(g);
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
                Label(doc, c, v, h.Centre, h.ElementNumber);
            }
            // An element's end inside the ring: a cross, not a hole (nothing is drilled from this face there).
            foreach (var end in v.Ends)
            {
                var s = 0.6;
                doc.Line("MARK", c + end.Centre - new Point2(s, s), c + end.Centre + new Point2(s, s));
                doc.Line("MARK", c + end.Centre - new Point2(s, -s), c + end.Centre + new Point2(s, -s));
                // A hole of the same element on this face already carries its number there.
                if (!v.Holes.Any(h => h.ElementNumber == end.ElementNumber)) Label(doc, c, v, end.Centre, end.ElementNumber);
            }
            var below = c + new Point2(-v.OuterRadiusMm - 4, -v.OuterRadiusMm - 6.5);
            foreach (var (height, text) in Fitted(Caption(v), width))
            {
                doc.Text("TEXT", below, height, text);
                below -= new Point2(0, LinePitchMm);
            }
        }
        return doc.ToBytes();
    }

    private static void Label(DxfDocument doc, Point2 c, DrillFaceView v, Point2 at, int number)
    {
        var label = at.Length > 0 ? (1 / at.Length) * at : new Point2(1, 0);
        doc.Text("TEXT", c + (v.OuterRadiusMm + 2.5) * label - new Point2(0.7, 0.9), 1.8, number.ToString(CultureInfo.InvariantCulture));
    }
}
