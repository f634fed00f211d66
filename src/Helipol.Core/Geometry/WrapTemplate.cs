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
/// <summary>An element's number on the wrap template: its lower end, and the left end of the
/// number's baseline, both in the template's coordinates (mm, y up).</summary>
public sealed record WrapLabel(int ElementNumber, Point2 LowerEnd, Point2 BaselineLeft);

public sealed record WrapTemplate(double WidthMm, double HeightMm, double GlueTabMm, IReadOnlyList<WrapLine> Lines)
{
    /// <summary>Em size of the element numbers, mm.</summary>
    public const double LabelSizeMm = 2.4;
    /// <summary>Clear space between a number and its line, mm.</summary>
    public const double LabelGapMm = 0.8;

    /// <summary>Box a number of this many digits takes, mm: at most 0.6 em per digit wide and
    /// 0.75 em tall above the baseline (typical sans-serif figures, from memory).</summary>
    public static (double W, double H) LabelBoxMm(int digits) => (0.6 * LabelSizeMm * digits, 0.75 * LabelSizeMm);

    /// <summary>
    /// One number per element, beside its lower end in a corner the line never enters. A line
    /// climbs from its lower end up and to one side (right for a right winding), so the two free
    /// corners are above on the other side and below on the same side; the number goes in the
    /// first that stays inside the strip, else above and clear of the line.
    /// </summary>
    public IReadOnlyList<WrapLabel> Labels => Lines.GroupBy(l => l.ElementNumber).Select(grp =>
    {
        var first = grp.First();
        var s = first.From;
        var d = first.To - first.From;
        var dir = Math.Sign(d.X) >= 0 ? 1 : -1;
        var (bw, bh) = LabelBoxMm(grp.Key.ToString(System.Globalization.CultureInfo.InvariantCulture).Length);
        var g = LabelGapMm;
        // Above, on the side the line does not go.
        var aboveX = dir > 0 ? s.X - g - bw : s.X + g;
        if (aboveX >= 0 && aboveX + bw <= WidthMm && s.Y + g + bh <= HeightMm)
            return new WrapLabel(grp.Key, s, new Point2(aboveX, s.Y + g));
        // Below, on the side the line goes.
        var belowX = dir > 0 ? s.X + g : s.X - g - bw;
        if (belowX >= 0 && belowX + bw <= WidthMm && s.Y - g - bh >= 0)
            return new WrapLabel(grp.Key, s, new Point2(belowX, s.Y - g - bh));
        // Above, beyond where the line has got to at the top of the number.
        var run = d.Y == 0 ? 0 : Math.Abs(d.X / d.Y) * (g + bh);
        var x = dir > 0 ? s.X + run + g : s.X - run - g - bw;
        return new WrapLabel(grp.Key, s, new Point2(x, s.Y + g));
    }).ToList();

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
