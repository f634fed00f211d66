using SkiaSharp;
using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Emit.Sheet;

/// <summary>
/// Vector PDF through SkiaSharp's PDF backend. Pages are sized in points (1/72 in); each page's
/// canvas is scaled so drawing is in millimetres. The document's metadata is fixed (no creation or
/// modification date) so the same drawing gives the same bytes.
/// </summary>
internal static class PdfPages
{
    /// <summary>Writes the pages, each with "page n of m" in its foot (a one-page sheet too), so
    /// a loose page can always be put back in order.</summary>
    public static byte[] Write(Paper paper, string title, IEnumerable<Action<SKCanvas>> pages)
    {
        var all = pages.ToList();
        var (wMm, hMm) = PaperSheet.SizeMm(paper);
        using var stream = new MemoryStream();
        var metadata = new SKDocumentPdfMetadata
        {
            Title = title,
            Creator = "helipol",
            Producer = "helipol",
            // Skia rounds the page size to whole raster pixels; at 7200 dpi that is 0.01 pt, which keeps
            // A4 at 595.28 × 841.89 pt. Nothing on these pages is rasterised.
            RasterDpi = 7200,
            // Above 100 Skia embeds images losslessly (Flate); a metadata value left at its struct
            // default of 0 would mean JPEG at quality 0 and blur the plots' axis labels.
            EncodingQuality = SKDocumentPdfMetadata.DefaultEncodingQuality,
            Creation = null,
            Modified = null,
        };
        using (var doc = SKDocument.CreatePdf(stream, metadata))
        {
            for (var k = 0; k < all.Count; k++)
            {
                var canvas = doc.BeginPage((float)(wMm * PaperSheet.PointsPerMm), (float)(hMm * PaperSheet.PointsPerMm));
                canvas.Scale((float)PaperSheet.PointsPerMm);
                all[k](canvas);
                PageFoot.Draw(canvas, paper, title, k + 1, all.Count);
                doc.EndPage();
            }
            doc.Close();
        }
        return stream.ToArray();
    }
}
