namespace Helipol.Design.Loading;

/// <summary>
/// The region the wrap closes over: the convex hull of the (glue-coated) wire's disc of radius c
/// and the two points (±d, y_s) where the tape meets the former. Its boundary is the disc's upper
/// arc, the two tangents from those points, and the former's surface between them; the wrap lies
/// on the outside of this boundary. d = c with y_s below the centre is the hugging wrap: the
/// tangents are the wire's vertical sides.
/// </summary>
public sealed class TapeHull
{
    private readonly double _c;
    private readonly (double X, double Y)[] _polygon;

    public TapeHull(double discRadiusM, double meetDistanceM, double surfaceYM)
    {
        _c = discRadiusM;
        double d = Math.Max(meetDistanceM, discRadiusM);
        double dist = Math.Sqrt(d * d + surfaceYM * surfaceYM);
        // Tangent point from P = (d, y_s) on the circle r = c, on the side away from the former:
        // at angle atan2(y_s, d) + acos(c/|P|). A point on (or inside) the circle is its own tangent point.
        double angle = Math.Atan2(surfaceYM, d) + (dist > _c ? Math.Acos(_c / dist) : 0);
        var t = dist > _c ? (_c * Math.Cos(angle), _c * Math.Sin(angle)) : (d, surfaceYM);
        // Counter-clockwise: right meeting point, right tangent point, left tangent point, left meeting point.
        _polygon = new[] { (d, surfaceYM), t, (-t.Item1, t.Item2), (-d, surfaceYM) };
    }

    /// <summary>Distance from a point to the hull (0 inside), metres.</summary>
    public double Distance(double x, double y)
    {
        double disc = Math.Max(0, Math.Sqrt(x * x + y * y) - _c);
        if (disc == 0) return 0;
        bool inside = true;
        double best = double.PositiveInfinity;
        for (int k = 0; k < _polygon.Length; k++)
        {
            var p = _polygon[k];
            var q = _polygon[(k + 1) % _polygon.Length];
            double ex = q.X - p.X, ey = q.Y - p.Y;
            double len2 = ex * ex + ey * ey;
            if (len2 == 0) continue;
            if (ex * (y - p.Y) - ey * (x - p.X) < 0) inside = false;
            double s = Math.Clamp(((x - p.X) * ex + (y - p.Y) * ey) / len2, 0, 1);
            double dx = x - (p.X + s * ex), dy = y - (p.Y + s * ey);
            best = Math.Min(best, Math.Sqrt(dx * dx + dy * dy));
        }
        return inside ? 0 : Math.Min(disc, best);
    }
}
