using System.Globalization;
using SkiaSharp;

namespace Helipol.Emit.Sheet.Layout;

/// <summary>One tile of a 1:1 drawing: the window of the drawing it shows (drawing mm), its place
/// in the grid and the join marks that fall inside it.</summary>
public sealed record Tile(int Number, int Count, int Column, int Row, double X, double Y, double W, double H,
    IReadOnlyList<(double X, double Y, string Label)> Joins);

/// <summary>
/// Cuts a drawing too large for one page into page-sized tiles that overlap by a fixed band, at
/// 1:1. Each band carries numbered crosses on the same drawing coordinates in both neighbouring
/// tiles, so the builder lays one tile over the next until the crosses coincide and tapes them.
/// A drawing that fits is one tile with no marks.
/// </summary>
public static class Tiling
{
    /// <summary>Overlap between neighbouring tiles, mm (wide enough to see and tape; common practice, no source).</summary>
    public const double OverlapMm = 12;
    public const double CrossMm = 3;

    public static IReadOnlyList<Tile> Cut(double drawingW, double drawingH, double tileW, double tileH)
    {
        if (tileW <= 2 * OverlapMm || tileH <= 2 * OverlapMm) throw new ArgumentException("tile smaller than its overlap");
        int nx = drawingW <= tileW ? 1 : (int)Math.Ceiling((drawingW - OverlapMm) / (tileW - OverlapMm) - 1e-9);
        int ny = drawingH <= tileH ? 1 : (int)Math.Ceiling((drawingH - OverlapMm) / (tileH - OverlapMm) - 1e-9);
        var w = nx == 1 ? drawingW : tileW;
        var h = ny == 1 ? drawingH : tileH;
        var stepX = w - OverlapMm;
        var stepY = h - OverlapMm;
        // Join crosses in the middle of every overlap band, at a quarter and three quarters of the
        // other direction's span of the tile, numbered once for the whole drawing.
        var joins = new List<(double X, double Y, string Label)>();
        var n = 0;
        for (var c = 0; c < nx; c++)
            for (var r = 0; r < ny; r++)
            {
                if (c + 1 < nx)
                    foreach (var f in new[] { 0.25, 0.75 })
                        joins.Add(((c + 1) * stepX + OverlapMm / 2, r * stepY + f * h, "J" + (++n).ToString(CultureInfo.InvariantCulture)));
                if (r + 1 < ny)
                    foreach (var f in new[] { 0.25, 0.75 })
                        joins.Add((c * stepX + f * w, (r + 1) * stepY + OverlapMm / 2, "J" + (++n).ToString(CultureInfo.InvariantCulture)));
            }
        var tiles = new List<Tile>();
        for (var r = 0; r < ny; r++)
            for (var c = 0; c < nx; c++)
            {
                double x = c * stepX, y = r * stepY;
                var inside = joins.Where(j => j.X >= x && j.X <= x + w && j.Y >= y && j.Y <= y + h).ToList();
                tiles.Add(new Tile(tiles.Count + 1, nx * ny, c, r, x, y, w, h, inside));
            }
        return tiles;
    }

    /// <summary>Draws one tile with its top-left corner at (left, top) on the page: the drawing
    /// clipped to the tile's window, a thin frame when there is more than one tile, and the join crosses.</summary>
    internal static void Paint(SheetPen pen, Tile t, double left, double top, Action<SheetPen> drawInDrawingMm)
    {
        pen.Canvas.Save();
        pen.Canvas.ClipRect(new SKRect((float)left, (float)top, (float)(left + t.W), (float)(top + t.H)));
        pen.Canvas.Translate((float)(left - t.X), (float)(top - t.Y));
        pen.TextWindow = t.Count == 1 ? null : new SKRect((float)t.X, (float)t.Y, (float)(t.X + t.W), (float)(t.Y + t.H));
        drawInDrawingMm(pen);
        pen.TextWindow = null;
        pen.Canvas.Restore();
        if (t.Count == 1) return;
        pen.Rect(left, top, t.W, t.H, 0.2, [1.5f, 1.5f]);
        foreach (var (x, y, label) in t.Joins)
        {
            var px = left + x - t.X;
            var py = top + y - t.Y;
            pen.Line(px - CrossMm, py, px + CrossMm, py, 0.3);
            pen.Line(px, py - CrossMm, px, py + CrossMm, 0.3);
            pen.Circle(px, py, CrossMm / 2, 0.2);
            pen.Text(label, px + 1.2, py - 1.2, 2.2);
        }
    }
}
