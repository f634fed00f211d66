using SkiaSharp;
using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Emit.Sheet;

/// <summary>bend-sheet.png: the bend sheet rasterised at the design's dpi on the chosen paper, with
/// a pHYs chunk so image viewers and printers reproduce it at 1:1. When the sheet needs more than
/// one page, the pages stand one under the other, each exactly one paper tall.</summary>
public static class BendSheetPng
{
    public static (int Width, int Height) PixelSize(Paper paper, int dpi)
    {
        var (w, h) = PaperSheet.SizeMm(paper);
        return ((int)Math.Round(w / PaperSheet.MmPerInch * dpi), (int)Math.Round(h / PaperSheet.MmPerInch * dpi));
    }

    public static byte[] Write(PolarizerGeometry g)
    {
        var pages = BendSheetPainter.Pages(g);
        var (w, pageH) = PixelSize(g.Input.Paper, g.Input.Dpi);
        var h = pageH * pages.Count;
        using var surface = SKSurface.Create(new SKImageInfo(w, h, SKColorType.Rgba8888, SKAlphaType.Premul))
            ?? throw new InvalidOperationException("could not allocate the raster for the bend sheet");
        var canvas = surface.Canvas;
        canvas.Clear(SKColors.White);
        var pxPerMm = (float)(g.Input.Dpi / PaperSheet.MmPerInch);
        for (var k = 0; k < pages.Count; k++)
        {
            canvas.Save();
            canvas.Translate(0, k * pageH);
            canvas.Scale(pxPerMm);
            pages[k](canvas);
            PageFoot.Draw(canvas, g.Input.Paper, $"Bend sheet: {g.Input.DesignName}", k + 1, pages.Count);
            canvas.Restore();
        }
        canvas.Flush();
        using var image = surface.Snapshot();
        using var pixels = image.PeekPixels();
        using var data = pixels.Encode(new SKPngEncoderOptions(SKPngEncoderFilterFlags.AllFilters, 6))
            ?? throw new InvalidOperationException("PNG encoding failed");
        return PngPhysicalSize.SetDpi(data.ToArray(), g.Input.Dpi);
    }
}
