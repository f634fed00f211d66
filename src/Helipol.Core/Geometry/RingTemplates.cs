using Helipol.Model;

namespace Helipol.Geometry;

/// <summary>
/// The foam rings that stack into the former, as cutting templates. Each ring has a top-face view
/// (the cut piece, nested on the board) and a bottom-face view (mirrored, drawn beside the board as
/// a guide for marking the underside). A face gets a tick only where an element's wire crosses it.
/// An element that ends inside a ring gets an end mark instead, on the face beyond that end (the
/// lower end on the ring's bottom face, the upper end on its top face), at the end's azimuth and
/// with its depth into the ring from that face, so nobody glues a wire out to a face it never reaches.
/// </summary>
public static class RingTemplates
{
    /// <summary>Space round a ring's contour for the element numbers, mm (<see cref="RingBoardLayout"/>).</summary>
    public const double LabelMarginMm = RingBoardLayout.LabelMarginMm;
    /// <summary>Band under each view for its ring number, design name and element-end note, mm.</summary>
    public const double TextBandMm = RingBoardLayout.TextBandMm;
    /// <summary>Radius of the circle that marks an element's end, mm.</summary>
    public const double EndMarkRadiusMm = 0.6;

    /// <summary>The note under a face with element ends, e.g. "o element end 3.40 mm into the ring";
    /// null when the face has none.</summary>
    public static string? EndNote(RingFaceView v)
    {
        var depths = v.Marks.Where(m => m.Kind == FaceMarkKind.End)
            .Select(m => m.DepthMm.ToString("0.00", System.Globalization.CultureInfo.InvariantCulture)).Distinct().ToList();
        return depths.Count == 0 ? null : $"o element end {string.Join(" / ", depths)} mm into the ring";
    }
    public const double MarkLengthMm = 2.0;
    public const double NotchDepthMm = 1.5;
    public const double NotchHalfWidthMm = 1.0;
    /// <summary>Margin inside the board edge, mm.</summary>
    public const double BoardMarginMm = RingBoardLayout.BoardMarginMm;
    /// <summary>Gap between boards when the rings need more than one, mm.</summary>
    public const double BoardGapMm = 20.0;

    /// <summary>Gap between nested parts: at least 3 mm of web and two kerfs (common practice, no source).</summary>
    public static double PartSpacingMm(PolarizerBuildInput input) => Math.Max(3.0, 2 * input.KerfMm);

    public static RingFaceView View(PolarizerGeometry g, int ringNumber, RingFace face, Point2 centre, double markRadiusMm, double boreRadiusMm)
    {
        var kerf = g.Input.KerfMm;
        var faces = g.RingFaceHeightsMm;
        var faceZ = faces[face == RingFace.Top ? ringNumber : ringNumber - 1];
        var cutOuter = g.FormerOuterRadiusMm + kerf / 2;
        var cutBore = boreRadiusMm - kerf / 2;
        FaceMark Mark(HelicalElement e, double az, FaceMarkKind kind, double depth)
        {
            var a = RingFaceView.DrawingAngle(face, az);
            return new FaceMark(e.Number, az, Point2.Polar(markRadiusMm, a), Point2.Polar(markRadiusMm - MarkLengthMm, a),
                Point2.Polar(cutOuter + LabelMarginMm / 2, a), kind, depth);
        }
        var marks = new List<FaceMark>();
        foreach (var e in g.Elements)
        {
            var portion = WirePortion.InRing(e, faces[ringNumber - 1], faces[ringNumber]);
            if (portion is not { } p) continue;
            if (face == RingFace.Top && p.CrossesTop) marks.Add(Mark(e, e.AzimuthAtHeightRad(faceZ), FaceMarkKind.Crossing, 0));
            if (face == RingFace.Bottom && p.CrossesBottom) marks.Add(Mark(e, e.AzimuthAtHeightRad(faceZ), FaceMarkKind.Crossing, 0));
            if (face == RingFace.Top && !p.CrossesTop && p.EndsAtUpper)
                marks.Add(Mark(e, e.EndAzimuthRad, FaceMarkKind.End, faceZ - e.UpperEndHeightMm));
            if (face == RingFace.Bottom && !p.CrossesBottom && p.EndsAtLower)
                marks.Add(Mark(e, e.StartAzimuthRad, FaceMarkKind.End, e.LowerEndHeightMm - faceZ));
        }
        var notchAngle = RingFaceView.DrawingAngle(face, 0);
        var half = Math.Asin(NotchHalfWidthMm / cutOuter);
        var notch = new OrientationNotch(Point2.Polar(cutOuter, notchAngle - half), Point2.Polar(cutOuter - NotchDepthMm, notchAngle),
            Point2.Polar(cutOuter, notchAngle + half), half, notchAngle);
        return new RingFaceView(ringNumber, face, centre, faceZ, g.FormerOuterRadiusMm, boreRadiusMm, cutOuter, cutBore, notch, marks);
    }

    /// <summary>Cut pieces (top faces) nested row by row on as many boards as needed.</summary>
    public static IReadOnlyList<RingFaceView> NestedTopFaces(PolarizerGeometry g) =>
        Nest(g, RingFace.Top).Select(p => View(g, p.Ring, RingFace.Top, p.Centre, g.FormerOuterRadiusMm, g.FormerBoreRadiusMm)).ToList();

    /// <summary>Bottom-face guides in one row under the first board.</summary>
    public static IReadOnlyList<RingFaceView> BottomFaceGuides(PolarizerGeometry g)
    {
        var cell = CellSize(g);
        var gap = PartSpacingMm(g.Input);
        return Enumerable.Range(1, g.Input.RingCount).Select(i =>
            View(g, i, RingFace.Bottom,
                new Point2(BoardMarginMm + cell.W / 2 + (i - 1) * (cell.W + gap), -BoardGapMm - cell.W / 2),
                g.FormerOuterRadiusMm, g.FormerBoreRadiusMm)).ToList();
    }

    /// <summary>Lower-left corner of each board used; boards stand side by side.</summary>
    public static IReadOnlyList<Point2> BoardOrigins(PolarizerGeometry g)
    {
        var count = Nest(g, RingFace.Top).Max(p => p.Board) + 1;
        return Enumerable.Range(0, count).Select(b => new Point2(b * (g.Input.BoardWidthMm + BoardGapMm), 0)).ToList();
    }

    public static (double W, double H) CellSize(PolarizerGeometry g)
    {
        var w = 2 * (g.FormerOuterRadiusMm + g.Input.KerfMm / 2 + LabelMarginMm);
        return (w, w + TextBandMm);
    }

    private static IEnumerable<(int Ring, int Board, Point2 Centre)> Nest(PolarizerGeometry g, RingFace face)
    {
        var i = g.Input;
        var cell = CellSize(g);
        var gap = PartSpacingMm(i);
        var usableW = i.BoardWidthMm - 2 * BoardMarginMm;
        var usableH = i.BoardHeightMm - 2 * BoardMarginMm;
        if (cell.W > usableW || cell.H > usableH)
            throw new ArgumentException($"board: found {i.BoardWidthMm} x {i.BoardHeightMm} mm, allowed at least {cell.W + 2 * BoardMarginMm:F1} x {cell.H + 2 * BoardMarginMm:F1} mm to hold one ring");
        var perRow = (int)Math.Floor((usableW + gap) / (cell.W + gap));
        var rows = (int)Math.Floor((usableH + gap) / (cell.H + gap));
        var perBoard = perRow * rows;
        for (var r = 0; r < i.RingCount; r++)
        {
            var board = r / perBoard;
            var slot = r % perBoard;
            var col = slot % perRow;
            var row = slot / perRow;
            var x = board * (i.BoardWidthMm + BoardGapMm) + BoardMarginMm + col * (cell.W + gap) + cell.W / 2;
            // Rows run from the top edge down; the text band sits under each ring.
            var y = i.BoardHeightMm - BoardMarginMm - row * (cell.H + gap) - cell.W / 2;
            yield return (r + 1, board, new Point2(x, y));
        }
    }
}
