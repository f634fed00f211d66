namespace Helipol.Design.Loading;

/// <summary>
/// The permittivity map of an <see cref="ElementCrossSection"/>: which material a point lies in,
/// by the stated model (former first, then glue, then wrap, air elsewhere).
/// </summary>
public sealed class CrossSectionMap : IPermittivityMap
{
    private readonly ElementCrossSection _s;
    private readonly double _a, _c, _floorY, _surfaceY, _bottomY;
    private readonly TapeHull _hull;

    public CrossSectionMap(ElementCrossSection s)
    {
        _s = s;
        _a = s.WireRadiusM;
        _c = _a + s.GlueThicknessM;
        _floorY = -_a;
        _surfaceY = s.GrooveHalfWidthM is null ? _floorY : _floorY + s.GrooveDepthM;
        _bottomY = _floorY - s.FormerDepthM;
        // Where the tape meets the former: the tent distance, or the wire's side (or a groove wall
        // beyond it, over which the tape must pass) when hugging.
        double meet = s.TentDistanceM ?? (s.GrooveHalfWidthM is { } w && s.GrooveDepthM > 0 ? Math.Max(w, _c) : _c);
        _hull = new TapeHull(_c, meet, _surfaceY);
    }

    public bool InFormer(double x, double y) => DistanceToFormer(x, y) == 0;

    private double DistanceToFormer(double x, double y)
    {
        if (_s.FormerDepthM <= 0) return double.PositiveInfinity;
        double best = Box(x, y, -_s.FormerHalfWidthM, _s.FormerHalfWidthM, _bottomY, _floorY);
        if (_s.GrooveHalfWidthM is { } w && w < _s.FormerHalfWidthM)
        {
            best = Math.Min(best, Box(x, y, w, _s.FormerHalfWidthM, _bottomY, _surfaceY));
            best = Math.Min(best, Box(x, y, -_s.FormerHalfWidthM, -w, _bottomY, _surfaceY));
        }
        return best;
    }

    private static double Box(double x, double y, double x0, double x1, double y0, double y1)
    {
        double dx = Math.Max(0, Math.Max(x0 - x, x - x1)), dy = Math.Max(0, Math.Max(y0 - y, y - y1));
        return Math.Sqrt(dx * dx + dy * dy);
    }

    public double At(double x, double y)
    {
        // Above everything (wire, glue, wrap and the former's surface): air, without the distance work.
        if (y > _c + _s.WrapThicknessM && y > _surfaceY + _s.WrapThicknessM) return 1;
        double dFormer = DistanceToFormer(x, y);
        if (dFormer == 0) return _s.FormerPermittivity;
        if (_s.GlueThicknessM > 0)
        {
            double r2 = x * x + y * y;
            bool coat = y >= 0 ? r2 <= _c * _c : Math.Abs(x) <= _c && y >= _floorY;
            if (coat) return _s.GluePermittivity;
        }
        if (_s.WrapThicknessM > 0 && Math.Abs(x) <= Math.Max(_s.FormerHalfWidthM, _c + _s.WrapThicknessM))
        {
            double dHull = _hull.Distance(x, y);
            // Outside the hull and not below the former's surface line (air under the tent stays air).
            if (dHull > 0 && Math.Min(dHull, dFormer) <= _s.WrapThicknessM) return _s.WrapPermittivity;
        }
        return 1;
    }
}
