namespace Helipol.Model;

/// <summary>
/// The spacing of the ring templates on the cut board, in one place: the check that a board holds a
/// ring (<see cref="DesignChecks"/>) and the templates that draw the rings (Geometry.RingTemplates)
/// both read these, so the board `check` accepts is the board `build` can nest.
/// </summary>
public static class RingBoardLayout
{
    /// <summary>Space round a ring's contour for the element numbers, mm.</summary>
    public const double LabelMarginMm = 5.0;
    /// <summary>Band under each ring for its number, the design name and the element-end note, mm.</summary>
    public const double TextBandMm = 11.0;
    /// <summary>Margin inside the board's edge, mm.</summary>
    public const double BoardMarginMm = 5.0;
}
