using SkiaSharp;
using Helipol.Geometry;

namespace Helipol.Emit.Sheet;

/// <summary>bend-sheet.png: the bend sheet rasterised at the design's dpi on the chosen paper, with
/// a pHYs chunk so image viewers and printers reproduce it at 1:1.</summary>
public static class BendSheetPng
{
    public static (int Width, int Height) PixelSize(PaperSize paper, int dpi)
    {
        var (w, h) = Paper.SizeMm(paper);
        return ((int)Math.Round(w / Paper.MmPerInch * dpi), (int)Math.Round(h / Paper.MmPerInch * dpi));
    }

    public static byte[] Write(PolarizerGeometry g)
    {
        var (w, h) = PixelSize(g.Input.Paper, g.Input.Dpi);
        using var surface = SKSurface.Create(new SKImageInfo(w, h, SKColorType.Rgba8888, SKAlphaType.Premul))
            ?? throw new InvalidOperationException("could not allocate the raster for the bend sheet");
        var canvas = surface.Canvas;
        canvas.Clear(SKColors.White);
        var pxPerMm = (float)(g.Input.Dpi / Paper.MmPerInch);
        canvas.Scale(pxPerMm);
        BendSheetPainter.Paint(canvas, g);
        canvas.Flush();
        using var image = surface.Snapshot();
        using var pixels = image.PeekPixels();
        using var data = pixels.Encode(new SKPngEncoderOptions(SKPngEncoderFilterFlags.AllFilters, 6))
            ?? throw new InvalidOperationException("PNG encoding failed");
        return PngPhysicalSize.SetDpi(data.ToArray(), g.Input.Dpi);
    }
}
