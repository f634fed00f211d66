using Helipol.Geometry;

namespace Helipol.Emit.Sheet;

/// <summary>bend-sheet.pdf: the bend sheet as vector pages at true size (one page unless the
/// templates of a large former need more).</summary>
public static class BendSheetPdf
{
    public static byte[] Write(PolarizerGeometry g) =>
        PdfPages.Write(g.Input.Paper, $"Bend sheet: {g.Input.DesignName}", BendSheetPainter.Pages(g));
}
