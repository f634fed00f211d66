namespace Helipol.Geometry;

/// <summary>
/// One parasitic element: a helical arc at constant radius round the whip axis. It starts at its
/// lower end at <see cref="StartAzimuthRad"/> and turns through <see cref="ArcAngleRad"/> in the
/// winding's direction while it climbs <see cref="RiseMm"/>.
/// </summary>
public sealed record HelicalElement(
    int Number, double AxisRadiusMm, double StartAzimuthRad, double ArcAngleRad, int WindingSign,
    double LowerEndHeightMm, double RiseMm)
{
    public double UpperEndHeightMm => LowerEndHeightMm + RiseMm;
    public double EndAzimuthRad => StartAzimuthRad + WindingSign * ArcAngleRad;

    /// <summary>Azimuth of the wire where it passes height z; clamped to the element's ends.</summary>
    public double AzimuthAtHeightRad(double zMm)
    {
        var t = Math.Clamp((zMm - LowerEndHeightMm) / RiseMm, 0.0, 1.0);
        return StartAzimuthRad + WindingSign * ArcAngleRad * t;
    }

    /// <summary>Point on the wire axis at fraction t (0 = lower end, 1 = upper end).</summary>
    public Point3 PointAt(double t) =>
        Point3.Cylindrical(AxisRadiusMm, StartAzimuthRad + WindingSign * ArcAngleRad * t, LowerEndHeightMm + RiseMm * t);
}
