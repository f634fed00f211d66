using SkiaSharp;
using Helipol.Geometry;

namespace Helipol.Emit.Sheet;

/// <summary>
/// The bend template as a drawing in its own millimetres (origin at its top-left, y down): the
/// arc of the bend radius standing apex up, a tick across each end, the centre cross and a dashed
/// radius from the centre to the apex, so the arc can be checked with a rule at 1:1. No text is
/// drawn inside it: a tiled drawing's text would be cut at the tile edges.
/// </summary>
internal sealed record ArcDrawing(double WidthMm, double HeightMm, Action<SheetPen> Draw)
{
    private const double PadMm = 4;

    public static ArcDrawing For(PolarizerGeometry g)
    {
        var rho = g.BendRadiusMm;
        var sweep = Math.Min(g.Input.ElementLengthMm / rho, 2 * Math.PI - 0.01);
        var half = sweep / 2;
        var halfWidth = half >= Math.PI / 2 ? rho : rho * Math.Sin(half);
        var below = half > Math.PI / 2 ? -rho * Math.Cos(half) : 0;
        var w = 2 * (halfWidth + PadMm);
        var h = rho + Math.Max(below, 0) + 2 * PadMm;
        var cx = w / 2;
        var cy = PadMm + rho;
        return new ArcDrawing(w, h, pen =>
        {
            using var path = new SKPath();
            const int steps = 400;
            for (var k = 0; k <= steps; k++)
            {
                var a = -half + sweep * k / steps;
                var px = (float)(cx + rho * Math.Sin(a));
                var py = (float)(cy - rho * Math.Cos(a));
                if (k == 0) path.MoveTo(px, py); else path.LineTo(px, py);
            }
            pen.Path(path, 0.5);
            foreach (var a in new[] { -half, half })
            {
                var (sx, sy) = (Math.Sin(a), -Math.Cos(a));
                pen.Line(cx + (rho - 2.5) * sx, cy + (rho - 2.5) * sy, cx + (rho + 2.5) * sx, cy + (rho + 2.5) * sy, 0.35);
            }
            pen.Line(cx - 2.5, cy, cx + 2.5, cy, 0.25);
            pen.Line(cx, cy - 2.5, cx, cy + 2.5, 0.25);
            pen.Line(cx, cy, cx, cy - rho, 0.15, dash: [1f, 1f]);
        });
    }
}
