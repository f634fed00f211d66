using System.Globalization;
using SkiaSharp;
using Helipol.Geometry;

namespace Helipol.Emit.Sheet;

/// <summary>Draws one ring face at 1:1 for cutting by hand: the part's true outline (no kerf: a
/// knife removes next to nothing), the orientation notch, the element marks and numbers: a tick
/// where a wire crosses the face, a small circle where an element ends inside the ring.</summary>
internal static class RingTemplatePainter
{
    public static void Paint(SheetPen pen, RingFaceView v, double cx, double cy, string designName)
    {
        // View coordinates have y up; the page has y down.
        (double X, double Y) P(Point2 p) => (cx + p.X, cy - p.Y);
        var r = v.OuterRadiusMm;
        var a = v.Notch.DrawingAngleRad;
        var half = Math.Asin(RingTemplates.NotchHalfWidthMm / r);
        using var outline = new SKPath();
        var steps = 360;
        for (var k = 0; k <= steps; k++)
        {
            var t = a + half + (2 * Math.PI - 2 * half) * k / steps;
            var (x, y) = P(Point2.Polar(r, t));
            if (k == 0) outline.MoveTo((float)x, (float)y); else outline.LineTo((float)x, (float)y);
        }
        var (tx, ty) = P(Point2.Polar(r - RingTemplates.NotchDepthMm, a));
        outline.LineTo((float)tx, (float)ty);
        outline.Close();
        pen.Path(outline, 0.3);
        pen.Circle(cx, cy, v.BoreRadiusMm, 0.3);
        pen.Line(cx - 1.5, cy, cx + 1.5, cy, 0.15);
        pen.Line(cx, cy - 1.5, cx, cy + 1.5, 0.15);
        foreach (var m in v.Marks)
        {
            var (x0, y0) = P(Point2.Polar(r, RingFaceView.DrawingAngle(v.Face, m.AzimuthRad)));
            var (x1, y1) = P(Point2.Polar(r - RingTemplates.MarkLengthMm, RingFaceView.DrawingAngle(v.Face, m.AzimuthRad)));
            if (m.Kind == FaceMarkKind.Crossing) pen.Line(x0, y0, x1, y1, 0.4);
            else pen.Circle(x1, y1, RingTemplates.EndMarkRadiusMm, 0.3);
            var (lx, ly) = P(Point2.Polar(r + 2.5, RingFaceView.DrawingAngle(v.Face, m.AzimuthRad)));
            pen.Text(m.ElementNumber.ToString(CultureInfo.InvariantCulture), lx, ly + 1, 2.6, SKTextAlign.Center);
        }
        var lines = Caption(v, designName);
        var baseline = cy + r + 8;
        foreach (var (text, size) in lines)
        {
            pen.Text(text, cx - r - 4, baseline, size, grey: text == designName);
            baseline += 3.5;
        }
    }

    /// <summary>The caption lines under a face and their sizes.</summary>
    private static List<(string Text, double Size)> Caption(RingFaceView v, string designName)
    {
        var lines = new List<(string, double)>
        {
            ($"Ring {v.RingNumber}, {(v.Face == RingFace.Top ? "top face" : "bottom face, mirrored")}", 2.8),
        };
        if (v.Face == RingFace.Bottom) lines.Add(("lay the ring face down on this one", 2.4));
        lines.Add((designName, 2.4));
        if (RingTemplates.EndNote(v) is { } note) lines.Add((note + " from this face", 2.4));
        return lines;
    }

    /// <summary>The face as a drawing whose box holds the outline, the element numbers round it and
    /// every caption line (measured with the sheet font), origin at the box's top-left.</summary>
    public static Layout.Drawing AsDrawing(RingFaceView v, string designName)
    {
        var r = v.OuterRadiusMm;
        var lines = Caption(v, designName);
        var textW = lines.Max(l => SheetPen.TextWidth(l.Text, l.Size));
        // Numbers stand 2.5 mm outside the outline, 2.6 mm high: 6 mm round the ring holds them.
        // The captions start 4 mm left of the outline, that is 2 mm inside the box.
        var w = Math.Max(2 * (r + 6), 2 + textW + 1);
        var h = 2 * (r + 6) + 2 + 3.5 * lines.Count;
        return new Layout.Drawing(w, h, pen => Paint(pen, v, r + 6, r + 6, designName),
            $"ring {v.RingNumber}, {(v.Face == RingFace.Top ? "top face" : "bottom face, mirrored")}");
    }
}
