using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Emit.Sheet;

/// <summary>Paper sizes: A4 is 210 × 297 mm (ISO 216); US Letter is 8.5 × 11 in. One PDF point is
/// 1/72 in (PDF 32000-1:2008, 8.3.2.3), so A4 is 595.28 × 841.89 pt and Letter 612 × 792 pt.</summary>
public static class PaperSheet
{
    public const double MmPerInch = 25.4;
    public const double PointsPerMm = 72.0 / MmPerInch;

    public static (double WidthMm, double HeightMm) SizeMm(Paper paper) => paper switch
    {
        Paper.A4 => (210.0, 297.0),
        Paper.Letter => (8.5 * MmPerInch, 11 * MmPerInch),
        _ => throw new ArgumentOutOfRangeException(nameof(paper)),
    };
}
