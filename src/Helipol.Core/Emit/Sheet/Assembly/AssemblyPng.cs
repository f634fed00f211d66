using SkiaSharp;
using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Emit.Sheet.Assembly;

/// <summary>assembly.png: the packet's assembly and bench-check pages for report.md, one under the
/// other at 100 dpi (for the screen; the packet's pages are the ones to print).</summary>
public static class AssemblyPng
{
    public const int Dpi = 100;

    public static byte[] Write(PolarizerGeometry g)
    {
        var pages = AssemblyPages.Pages(g);
        var (wMm, hMm) = PaperSheet.SizeMm(g.Input.Paper);
        var pxPerMm = (float)(Dpi / PaperSheet.MmPerInch);
        var w = (int)Math.Round(wMm * pxPerMm);
        var pageH = (int)Math.Round(hMm * pxPerMm);
        using var surface = SKSurface.Create(new SKImageInfo(w, pageH * pages.Count, SKColorType.Rgba8888, SKAlphaType.Premul))
            ?? throw new InvalidOperationException("could not allocate the raster for the assembly pages");
        var canvas = surface.Canvas;
        canvas.Clear(SKColors.White);
        for (var k = 0; k < pages.Count; k++)
        {
            canvas.Save();
            canvas.Translate(0, k * pageH);
            canvas.Scale(pxPerMm);
            pages[k](canvas);
            canvas.Restore();
        }
        using var image = surface.Snapshot();
        using var data = image.Encode(SKEncodedImageFormat.Png, 100)
            ?? throw new InvalidOperationException("PNG encoding failed");
        return data.ToArray();
    }
}
