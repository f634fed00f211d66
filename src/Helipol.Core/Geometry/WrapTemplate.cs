namespace Helipol.Geometry;

/// <summary>A straight piece of an element's line on the unrolled wrap template, mm; x along the
/// circumference (increasing azimuth to the right, seen from outside), y up from the former's bottom.</summary>
public sealed record WrapLine(int ElementNumber, Point2 From, Point2 To);

/// <summary>
/// The former's surface unrolled: a strip one circumference (2π × outer radius) wide and one former
/// high, wrapped round the former to mark the element paths. A helix on a cylinder unrolls to a
/// straight line, so each element is a line climbing its rise over its arc angle × the former radius;
/// a line that runs off one edge continues from the other. A glue tab extends past the right edge.
/// </summary>
public sealed record WrapTemplate(double WidthMm, double HeightMm, double GlueTabMm, IReadOnlyList<WrapLine> Lines)
{
    public static WrapTemplate From(PolarizerGeometry g)
    {
        var r = g.FormerOuterRadiusMm;
        var width = 2 * Math.PI * r;
        var lines = new List<WrapLine>();
        foreach (var e in g.Elements)
        {
            var x0 = r * e.StartAzimuthRad;
            var dx = e.WindingSign * r * e.ArcAngleRad;
            var y0 = e.LowerEndHeightMm;
            var dy = e.RiseMm;
            // Walk along the line, cutting it where it crosses x = 0 or x = width.
            var t = 0.0;
            var guard = 0;
            while (t < 1 - 1e-12 && guard++ < 1000)
            {
                var xs = x0 + dx * t;
                var shift = Math.Floor(xs / width) * width;
                if (dx < 0 && Math.Abs(xs - shift) < 1e-9) shift -= width;
                var local = xs - shift;
                var edge = dx > 0 ? width : 0.0;
                var tEdge = dx == 0 ? 1.0 : t + (edge - local) / dx;
                var t1 = Math.Min(1.0, tEdge);
                lines.Add(new WrapLine(e.Number, new Point2(local, y0 + dy * t), new Point2(x0 + dx * t1 - shift, y0 + dy * t1)));
                t = t1;
            }
        }
        return new WrapTemplate(width, g.Input.FormerHeightMm, 10.0, lines);
    }
}
