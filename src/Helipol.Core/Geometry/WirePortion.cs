namespace Helipol.Geometry;

/// <summary>
/// The part of one element's wire that lies within one ring (between heights
/// <see cref="LowerMm"/> and <see cref="UpperMm"/>), and whether the wire leaves the ring through
/// its faces or ends inside it. A wire end lying exactly on a face belongs to the ring on the
/// wire's side of that face, and does not count as a crossing.
/// </summary>
public readonly record struct WirePortion(double LowerMm, double UpperMm, bool CrossesBottom, bool CrossesTop)
{
    private const double ToleranceMm = 1e-9;

    public double HeightMm => UpperMm - LowerMm;
    /// <summary>The element's lower end lies in this ring (on or above its bottom face).</summary>
    public bool EndsAtLower => !CrossesBottom;
    /// <summary>The element's upper end lies in this ring (on or below its top face).</summary>
    public bool EndsAtUpper => !CrossesTop;

    /// <summary>The element's wire within the ring between face heights zBottom and zTop, or null
    /// when no wire lies inside that ring.</summary>
    public static WirePortion? InRing(HelicalElement e, double zBottomMm, double zTopMm)
    {
        var lower = Math.Max(zBottomMm, e.LowerEndHeightMm);
        var upper = Math.Min(zTopMm, e.UpperEndHeightMm);
        if (upper - lower <= ToleranceMm) return null;
        return new WirePortion(lower, upper,
            e.LowerEndHeightMm < zBottomMm - ToleranceMm,
            e.UpperEndHeightMm > zTopMm + ToleranceMm);
    }
}
