using Helipol.Geometry;

namespace Helipol.Emit.Sheet;

/// <summary>bend-sheet.pdf: the bend sheet as one vector page at true size.</summary>
public static class BendSheetPdf
{
    public static byte[] Write(PolarizerGeometry g) =>
        PdfPages.Write(g.Input.Paper, $"Bend sheet: {g.Input.DesignName}", [c => BendSheetPainter.Paint(c, g)]);
}
