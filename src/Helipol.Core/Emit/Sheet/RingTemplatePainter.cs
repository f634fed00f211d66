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
        var face = v.Face == RingFace.Top ? "top face" : "bottom face, mirrored (lay the ring face down)";
        pen.Text($"Ring {v.RingNumber}, {face}", cx - r - 4, cy + r + 8, 2.8);
        pen.Text(designName, cx - r - 4, cy + r + 11.5, 2.4, grey: true);
        if (RingTemplates.EndNote(v) is { } note) pen.Text(note + " from this face", cx - r - 4, cy + r + 15, 2.4);
    }
}
