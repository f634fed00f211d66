using SkiaSharp;
using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Emit.Sheet;

/// <summary>
/// packet.pdf: the build packet. Summary pages (the summary lines, then every plot), the assembly
/// steps with their drawn views and the bench checks, the bend sheet, then (for a former of foam
/// rings) the ring templates at 1:1 for cutting by hand.
/// </summary>
public static class PacketPdf
{
    private const double LineMm = 5.0;

    public static byte[] Write(PolarizerGeometry g)
    {
        var pages = new List<Action<SKCanvas>>();
        pages.AddRange(SummaryPages(g));
        pages.AddRange(Assembly.AssemblyPages.Pages(g));
        pages.AddRange(BendSheetPainter.Pages(g));
        if (!g.Input.FormerPrinted) pages.AddRange(RingPages(g));
        return PdfPages.Write(g.Input.Paper, $"Build packet: {g.Input.DesignName}", pages);
    }

    private static IEnumerable<Action<SKCanvas>> SummaryPages(PolarizerGeometry g)
    {
        var (pageW, pageH) = PaperSheet.SizeMm(g.Input.Paper);
        var m = BendSheetPainter.MarginMm;
        var width = pageW - 2 * m;
        var bottom = pageH - m;
        // Lay out first (text rows, then plots), then cut into pages.
        var items = new List<(double Height, Action<SheetPen, double> Draw)>();
        items.Add((10, (p, y) => p.Text($"Build packet: {g.Input.DesignName}", m, y + 6, 5)));
        var rows = g.Input.SummaryLines.Count > 0
            ? g.Input.SummaryLines.Select(s => (s.Key, s.Value)).ToList()
            : BuildTable.Rows(g).Select(r => (r.Label, r.Value)).ToList();
        foreach (var (key, value) in rows)
            items.Add((LineMm, (p, y) => { p.Text(key, m, y + 3.5, 3); p.Text(value, m + 50, y + 3.5, 3); }));
        foreach (var png in g.Input.PlotPngs)
        {
            using var probe = SKImage.FromEncodedData(png);
            if (probe is null) continue;
            var scale = Math.Min(width / probe.Width, 120.0 / probe.Height);
            var h = probe.Height * scale;
            var w = probe.Width * scale;
            items.Add((h + 6, (p, y) =>
            {
                // Decoded to raw pixels first: Skia's PDF backend re-encodes a still-encoded PNG as
                // JPEG whatever the document's quality, while raw pixels at a quality above 100 are
                // stored losslessly (Flate), which keeps the plots' axis lettering sharp.
                using var bitmap = SKBitmap.Decode(png);
                using var image = SKImage.FromBitmap(bitmap);
                p.Canvas.DrawImage(image, new SKRect((float)m, (float)(y + 3), (float)(m + w), (float)(y + 3 + h)), new SKSamplingOptions(SKFilterMode.Linear));
            }));
        }
        var pages = new List<List<(double Y, Action<SheetPen, double> Draw)>>();
        var current = new List<(double, Action<SheetPen, double>)>();
        var cursor = m;
        foreach (var (height, draw) in items)
        {
            if (cursor + height > bottom && current.Count > 0)
            {
                pages.Add(current);
                current = [];
                cursor = m;
            }
            current.Add((cursor, draw));
            cursor += height;
        }
        pages.Add(current);
        return pages.Select(page => (Action<SKCanvas>)(canvas =>
        {
            using var pen = new SheetPen(canvas);
            foreach (var (y, draw) in page) draw(pen, y);
        }));
    }

    /// <summary>
    /// Ring templates at 1:1: every ring's top face and its mirrored bottom face as separate
    /// drawings, placed by <see cref="Layout.ShelfLayout"/> so none overlaps another or leaves the
    /// printable area; a face too large for one page is tiled with numbered join crosses.
    /// </summary>
    private static IEnumerable<Action<SKCanvas>> RingPages(PolarizerGeometry g)
    {
        var (pageW, pageH) = PaperSheet.SizeMm(g.Input.Paper);
        var m = BendSheetPainter.MarginMm;
        var r = g.FormerOuterRadiusMm;
        var top = BendSheetPainter.ContentTopMm;
        var drawings = new List<Layout.Drawing>();
        for (var ring = 1; ring <= g.Input.RingCount; ring++)
            foreach (var face in new[] { RingFace.Top, RingFace.Bottom })
                drawings.Add(RingTemplatePainter.AsDrawing(RingTemplates.View(g, ring, face, new Point2(0, 0), r, g.FormerBoreRadiusMm), g.Input.DesignName));
        var placements = Layout.ShelfLayout.Place(drawings, m, top, pageW - m, pageH - m);
        foreach (var page in placements.GroupBy(p => p.Page).OrderBy(p => p.Key))
        {
            var items = page.ToList();
            yield return canvas =>
            {
                using var pen = new SheetPen(canvas);
                pen.Text($"Ring templates at 1:1: {g.Input.DesignName}", m, 17, 5);
                var tiled = items.FirstOrDefault(p => p.Tile.Count > 1);
                pen.Text(tiled is null ? "Cut on the outline; the V-notch marks azimuth 0 and lines the rings up when stacked"
                    : string.Create(System.Globalization.CultureInfo.InvariantCulture, $"Tile {tiled.Tile.Number} of {tiled.Tile.Count} of {tiled.Drawing.Name}: tape the tiles so the crosses of the same number coincide"), m, 23, 3, grey: true);
                BendSheetPainter.CalibrationBars(pen, m);
                foreach (var p in items) Layout.Tiling.Paint(pen, p.Tile, p.Left, p.Top, p.Drawing.Draw);
            };
        }
    }
}
