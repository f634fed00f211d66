namespace Helipol.Engine.Mesh;

/// <summary>Distances between segments.</summary>
internal static class Geometry3
{
    /// <summary>
    /// A cheap lower bound on the distance between two segments: centre distance minus both half
    /// lengths. Lets callers skip the exact distance for pairs that are clearly far apart.
    /// </summary>
    public static double DistanceLowerBound(Segment p, Segment q) =>
        Vector3.Distance(p.Centre, q.Centre) - 0.5 * (p.LengthM + q.LengthM);

    /// <summary>Shortest distance between segments [p0,p1] and [q0,q1] (clamped closest-point method).</summary>
    public static double SegmentDistance(Vector3 p0, Vector3 p1, Vector3 q0, Vector3 q1)
    {
        Vector3 d1 = p1 - p0, d2 = q1 - q0, r = p0 - q0;
        double a = Vector3.Dot(d1, d1), e = Vector3.Dot(d2, d2), f = Vector3.Dot(d2, r);
        double s, t;
        double c = Vector3.Dot(d1, r), b = Vector3.Dot(d1, d2);
        double denom = a * e - b * b;
        s = denom > 1e-14 * a * e ? Math.Clamp((b * f - c * e) / denom, 0, 1) : 0;
        t = (b * s + f) / e;
        if (t < 0) { t = 0; s = Math.Clamp(-c / a, 0, 1); }
        else if (t > 1) { t = 1; s = Math.Clamp((b - c) / a, 0, 1); }
        return Vector3.Distance(p0 + s * d1, q0 + t * d2);
    }
}
