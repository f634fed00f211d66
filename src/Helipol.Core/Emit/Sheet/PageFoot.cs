using System.Globalization;
using SkiaSharp;
using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Emit.Sheet;

/// <summary>The foot of every printed page: the document's name on the left, "page n of m" on
/// the right, inside the bottom margin and below everything the layout places.</summary>
internal static class PageFoot
{
    public const double SizeMm = 2.6;

    /// <summary>Baseline of the foot line, mm above the paper's bottom edge.</summary>
    public const double BaselineAboveEdgeMm = 6;

    public static void Draw(SKCanvas canvas, Paper paper, string title, int page, int pages)
    {
        var (w, h) = PaperSheet.SizeMm(paper);
        using var pen = new SheetPen(canvas);
        var m = BendSheetPainter.MarginMm;
        var y = h - BaselineAboveEdgeMm;
        pen.Text(title, m, y, SizeMm, grey: true);
        pen.Text(string.Create(CultureInfo.InvariantCulture, $"page {page} of {pages}"), w - m, y, SizeMm, SKTextAlign.Right);
    }
}
