namespace Helipol.Model;

/// <summary>
/// Closest approach between neighbouring elements. The former's surface is unrolled into a plane
/// (x = radius·azimuth, z = height), where every element is a straight segment of the same slope;
/// copies shifted by one turn cover elements that wrap past each other. Unrolling keeps distances
/// along the surface, which is what decides whether two wires laid on it touch.
/// </summary>
public static class ElementClearance
{
    /// <summary>Smallest centre-to-centre distance between any two elements' wire axes, in metres.</summary>
    public static double MinimumAxisDistanceM(ElementLayout layout)
    {
        var circumference = 2 * Math.PI * layout.AxisRadiusM;
        var run = layout.ArcLengthM;
        var (ax, az, bx, bz) = (0.0, -layout.RiseM / 2, run, layout.RiseM / 2);
        var best = double.PositiveInfinity;
        for (var k = 1; k < layout.Count; k++)
        {
            for (var turn = -2; turn <= 2; turn++)
            {
                var shift = circumference * k / layout.Count + circumference * turn;
                best = Math.Min(best, SegmentDistance(ax, az, bx, bz, ax + shift, az, bx + shift, bz));
            }
        }
        // An element longer than one turn would also meet itself.
        for (var turn = 1; turn <= 2 && run > circumference; turn++)
            best = Math.Min(best, SegmentDistance(ax, az, bx, bz, ax + circumference * turn, az, bx + circumference * turn, bz));
        return best;
    }

    private static double SegmentDistance(double ax, double az, double bx, double bz, double cx, double cz, double dx, double dz)
    {
        if (SegmentsCross(ax, az, bx, bz, cx, cz, dx, dz)) return 0;
        return Math.Min(Math.Min(PointToSegment(ax, az, cx, cz, dx, dz), PointToSegment(bx, bz, cx, cz, dx, dz)),
            Math.Min(PointToSegment(cx, cz, ax, az, bx, bz), PointToSegment(dx, dz, ax, az, bx, bz)));
    }

    private static double PointToSegment(double px, double pz, double ax, double az, double bx, double bz)
    {
        var (ux, uz) = (bx - ax, bz - az);
        var lengthSquared = ux * ux + uz * uz;
        var t = lengthSquared == 0 ? 0 : Math.Clamp(((px - ax) * ux + (pz - az) * uz) / lengthSquared, 0, 1);
        var (qx, qz) = (ax + t * ux - px, az + t * uz - pz);
        return Math.Sqrt(qx * qx + qz * qz);
    }

    private static bool SegmentsCross(double ax, double az, double bx, double bz, double cx, double cz, double dx, double dz)
    {
        static double Cross(double ox, double oz, double px, double pz, double qx, double qz) => (px - ox) * (qz - oz) - (pz - oz) * (qx - ox);
        var d1 = Cross(cx, cz, dx, dz, ax, az);
        var d2 = Cross(cx, cz, dx, dz, bx, bz);
        var d3 = Cross(ax, az, bx, bz, cx, cz);
        var d4 = Cross(ax, az, bx, bz, dx, dz);
        return d1 * d2 < 0 && d3 * d4 < 0;
    }
}
