using System.Globalization;
using Helipol.Geometry;

namespace Helipol.Emit.Dxf;

/// <summary>
/// rings.dxf: foam rings nested on the board for laser, CNC or knife. Layer CUT holds the
/// kerf-compensated contours (outer with the orientation notch, bore), MARK the element marks to
/// score or draw (ticks where a wire crosses the face, circles where an element ends inside the ring), TEXT the labels, BOARD the stock outline, GUIDE the mirrored bottom-face views
/// drawn under the board for marking each ring's underside by hand (never cut).
/// </summary>
public static class RingsDxf
{
    public static readonly IReadOnlyList<DxfLayer> Layers =
        [new("BOARD", 8), new("CUT", 1), new("MARK", 5), new("TEXT", 3), new("GUIDE", 4)];

    public static byte[] Write(PolarizerGeometry g)
    {
        var doc = new DxfDocument(Layers);
        var i = g.Input;
        foreach (var origin in RingTemplates.BoardOrigins(g))
        {
            doc.Rectangle("BOARD", origin, i.BoardWidthMm, i.BoardHeightMm);
            // The header is wrapped to its own board's width and stacked upwards from just above
            // it, so it never reaches the next board (boards stand BoardGapMm apart).
            var header = DxfText.Clean(string.Create(CultureInfo.InvariantCulture,
                $"BOARD {i.BoardWidthMm:0.#} X {i.BoardHeightMm:0.#} X {i.BoardThicknessMm:0.#} MM, KERF {i.KerfMm:0.###} MM, RINGS {g.RingThicknessMm:0.##} MM THICK, TICKS WHERE AN ELEMENT CROSSES THE FACE, CIRCLES WHERE ONE ENDS INSIDE THE RING"));
            var lines = DxfText.Wrap(header, i.BoardWidthMm - 4, HeaderMm);
            for (var k = 0; k < lines.Count; k++)
                doc.Text("TEXT", origin + new Point2(2, i.BoardHeightMm + 2 + (lines.Count - 1 - k) * HeaderMm * 1.5), HeaderMm, lines[k]);
        }
        foreach (var v in RingTemplates.NestedTopFaces(g)) DrawView(doc, v, "CUT", g);
        var guides = RingTemplates.BottomFaceGuides(g);
        const string guideTitle = "BOTTOM FACES, MIRRORED: GUIDES FOR MARKING THE UNDERSIDE BY HAND, DO NOT CUT";
        doc.Text("TEXT", new Point2(RingTemplates.BoardMarginMm, -RingTemplates.BoardGapMm + 4), 
            DxfText.HeightToFit(guideTitle, Math.Max(i.BoardWidthMm, guides.Count * (RingTemplates.CellSize(g).W + RingTemplates.PartSpacingMm(i))) - 2 * RingTemplates.BoardMarginMm, 2.5), guideTitle);
        foreach (var v in guides) DrawView(doc, v, "GUIDE", g);
        return doc.ToBytes();
    }

    internal static void DrawView(DxfDocument doc, RingFaceView v, string contourLayer, PolarizerGeometry g)
    {
        var c = v.Centre;
        var n = v.Notch;
        // Outer contour: the long arc from the notch's right edge round to its left edge
        // (counter-clockwise, included angle 2π − 2·half), then the two sides of the V.
        var arc = 2 * Math.PI - 2 * n.HalfAngleRad;
        doc.ClosedPolyline(contourLayer, [c + n.Right, c + n.Left, c + n.Tip], [Math.Tan(arc / 4), 0, 0]);
        doc.Circle(contourLayer, c, v.CutBoreRadiusMm);
        foreach (var m in v.Marks)
        {
            // A tick where the wire crosses the face; a small circle where an element ends inside the ring.
            if (m.Kind == FaceMarkKind.Crossing) doc.Line("MARK", c + m.OnContour, c + m.Inner);
            else doc.Circle("MARK", c + m.Inner, RingTemplates.EndMarkRadiusMm);
            doc.Text("TEXT", c + m.LabelAt - new Point2(0.7, 0.9), 1.8, m.ElementNumber.ToString(CultureInfo.InvariantCulture));
        }
        // Up to four lines in the cell's text band (RingTemplates.TextBandMm), each shrunk to the
        // cell's width so it cannot reach the neighbouring cell.
        var width = 2 * v.HalfSizeMm - 2;
        var below = c + new Point2(-v.HalfSizeMm + 1, -v.HalfSizeMm - 2.5);
        var lines = new List<(double Height, string Text)> { (2.2, DxfText.Clean($"RING {v.RingNumber} {(v.Face == RingFace.Top ? "TOP" : "BOTTOM, MIRRORED")}")) };
        lines.Add((1.8, DxfText.Clean(g.Input.DesignName)));
        if (RingTemplates.EndNote(v) is { } note) lines.Add((1.8, DxfText.Clean(note)));
        foreach (var (height, text) in lines)
        {
            doc.Text("TEXT", below, DxfText.HeightToFit(text, width, height, 0.5), text);
            below -= new Point2(0, 3);
        }
    }

    /// <summary>Height of a board's header lines, mm.</summary>
    public const double HeaderMm = 3;
}
