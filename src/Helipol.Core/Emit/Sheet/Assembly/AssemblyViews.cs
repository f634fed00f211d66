using System.Globalization;
using SkiaSharp;
using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Emit.Sheet.Assembly;

/// <summary>
/// The assembly views, drawn from the geometry itself as vector paths (no pictures). Solids are
/// painted back to front (painter's algorithm): a wire's far half is drawn before the former that
/// hides it, and rings of an exploded stack are drawn bottom up so each upper ring covers the one
/// beneath. Each view draws into a box (left, top, width, height) in page millimetres and never
/// outside it: the geometry is scaled to fit.
/// </summary>
internal static class AssemblyViews
{
    private static readonly SKColor Foam = new(236, 236, 236);
    private static readonly SKColor FoamSide = new(205, 205, 205);
    private static readonly SKColor Wire = new(0xD5, 0x5E, 0x00);
    private static readonly SKColor WireBehind = new(0xE6, 0xB8, 0x90);

    /// <summary>Side view of the whip with the former at its solved height, the feed marked and the
    /// elements drawn on the former as seen from outside.</summary>
    public static void FormerOnWhip(SheetPen pen, PolarizerGeometry g, double left, double top, double w, double h)
    {
        var i = g.Input;
        var whip = i.WhipLengthMm > 0 ? i.WhipLengthMm : 2 * i.FormerHeightMm;
        var dipole = i.Whip == WhipKind.Dipole;
        // The feed (dipole) or the ground (monopole) is height 0; the whip spans [-L/2, L/2] or [0, L].
        var whipBottom = dipole ? -whip / 2 : 0;
        var whipTop = dipole ? whip / 2 : whip;
        var zMin = whipBottom;
        var zMax = whipTop;
        var formerBottom = i.CentreAboveFeedMm - i.FormerHeightMm / 2;
        zMin = Math.Min(zMin, formerBottom);
        zMax = Math.Max(zMax, formerBottom + i.FormerHeightMm);
        var s = Math.Min((h - 10) / (zMax - zMin), (w * 0.45) / (2 * g.FormerOuterRadiusMm));
        var cx = left + w * 0.3;
        double Y(double z) => top + 4 + (zMax - z) * s;
        // Whip: drawn first, the former covers it.
        pen.Line(cx, Y(zMin), cx, Y(zMax), Math.Max(0.4, i.CoverDiameterMm * s * 0.5), SKColors.DimGray);
        if (dipole)
        {
            pen.FillRect(cx - 1.5, Y(0) - 0.6, 3, 1.2, SKColors.White);
            pen.Line(cx, Y(0), cx + w * 0.35, Y(0), 0.2, dash: [1f, 1f]);
            pen.Text("feed gap: height 0", cx + w * 0.35 + 1, Y(0) + 1, 2.4);
        }
        else
        {
            pen.Line(cx - w * 0.25, Y(0), cx + w * 0.25, Y(0), 0.8);
            pen.Text("ground plane (feed): height 0", cx + w * 0.05, Y(0) + 4, 2.4);
        }
        var r = g.FormerOuterRadiusMm * s;
        var ci = CultureInfo.InvariantCulture;
        // Wire behind the former first, then the former, then the wire in front.
        Helices(pen, g, cx, Y, s, front: false);
        pen.FillRect(cx - r, Y(formerBottom + i.FormerHeightMm), 2 * r, i.FormerHeightMm * s, Foam.WithAlpha(230));
        pen.Rect(cx - r, Y(formerBottom + i.FormerHeightMm), 2 * r, i.FormerHeightMm * s, 0.3);
        // The whip inside the former as a hidden (dashed) line, the drafting convention, so that a whip
        // the former covers whole (a short monopole) still shows where it runs.
        var hiddenBottom = Math.Max(whipBottom, formerBottom);
        var hiddenTop = Math.Min(whipTop, formerBottom + i.FormerHeightMm);
        if (hiddenTop > hiddenBottom) pen.Line(cx, Y(hiddenBottom), cx, Y(hiddenTop), 0.3, SKColors.DimGray, dash: [1.2f, 0.8f]);
        Helices(pen, g, cx, Y, s, front: true);
        // Dimension from the feed to the former's bottom face.
        var dx = cx + r + 3;
        pen.Line(dx, Y(0), dx, Y(formerBottom), 0.2);
        pen.Arrow(dx, Y(formerBottom), formerBottom > 0 ? -Math.PI / 2 : Math.PI / 2, 1.2);
        pen.Text(string.Create(ci, $"bottom face {Math.Abs(formerBottom):0.0} mm {(formerBottom >= 0 ? "above" : "below")} the {(dipole ? "feed" : "ground")}"), dx + 1.5, (Y(0) + Y(formerBottom)) / 2 + 1, 2.4);
        pen.Text(string.Create(ci, $"former {i.FormerOuterDiameterMm:0.#} mm across, {i.FormerHeightMm:0.#} mm tall"), dx + 1.5, Y(formerBottom + i.FormerHeightMm) + 2.5, 2.4);
        pen.Text(string.Create(ci, $"{ChoiceWords.Label(i.Sense)}: elements climb to the {(g.WindingSign > 0 ? "right" : "left")} on the near side"), dx + 1.5, Y(formerBottom + i.FormerHeightMm) + 6, 2.4);
    }

    private static void Helices(SheetPen pen, PolarizerGeometry g, double cx, Func<double, double> y, double s, bool front)
    {
        var bottom = g.Input.CentreAboveFeedMm - g.Input.FormerHeightMm / 2;
        foreach (var e in g.Elements)
        {
            using var path = new SKPath();
            var drawing = false;
            const int steps = 120;
            for (var k = 0; k <= steps; k++)
            {
                var p = e.PointAt((double)k / steps);
                // The viewer stands at −y: the near half has y < 0.
                var near = p.Y < 0;
                var px = (float)(cx + p.X * s);
                var py = (float)y(bottom + p.Z);
                if (near == front) { if (!drawing) path.MoveTo(px, py); else path.LineTo(px, py); drawing = true; }
                else drawing = false;
            }
            pen.StrokePath(path, front ? 0.6 : 0.4, front ? Wire : WireBehind);
        }
    }

    /// <summary>The rings drawn apart, ring 1 at the bottom, seen from in front and a little above:
    /// the notches (azimuth 0) stand in one line toward the viewer; dots on each top face mark where
    /// the wires cross it (where to drill or push through), and the wire inside each ring is drawn
    /// on the near side.</summary>
    public static void ExplodedRings(SheetPen pen, PolarizerGeometry g, double left, double top, double w, double h)
    {
        var n = g.Input.RingCount;
        var t = g.RingThicknessMm;
        var R = g.FormerOuterRadiusMm;
        const double k = 0.35; // ellipse ratio of a circle seen from about 20° above
        var gap = Math.Max(t * 0.8, R * 0.25);
        var s = Math.Min((w * 0.6) / (2 * R), (h - 8) / (n * t + (n - 1) * gap + 2 * R * k));
        var cx = left + w * 0.35;
        var baseY = top + h - 4 - R * k * s;
        double Lift(int ring, double z) => (z + (ring - 1) * gap) * s;
        (float X, float Y) P(int ring, double r, double az, double z) =>
            ((float)(cx + r * s * Math.Sin(az)), (float)(baseY - Lift(ring, z) + r * s * k * Math.Cos(az)));
        var faces = g.RingFaceHeightsMm;
        for (var ring = 1; ring <= n; ring++)
        {
            double z0 = faces[ring - 1], z1 = faces[ring];
            // Side band, then top face, then the bore, then the near wire and the crossing dots.
            using (var side = new SKPath())
            {
                for (var a = -90; a <= 90; a += 3) { var (x, yy) = P(ring, R, a * Math.PI / 180, z0); if (a == -90) side.MoveTo(x, yy); else side.LineTo(x, yy); }
                for (var a = 90; a >= -90; a -= 3) { var (x, yy) = P(ring, R, a * Math.PI / 180, z1); side.LineTo(x, yy); }
                side.Close();
                pen.FillPath(side, FoamSide);
                pen.Path(side, 0.25);
            }
            using (var face = Ellipse(p => P(ring, R, p, z1)))
            {
                pen.FillPath(face, Foam);
                pen.Path(face, 0.3);
            }
            using (var bore = Ellipse(p => P(ring, g.FormerBoreRadiusMm, p, z1)))
            {
                pen.FillPath(bore, SKColors.White);
                pen.Path(bore, 0.25);
            }
            // Notch at azimuth 0, on the near edge.
            var (nx, ny) = P(ring, R, 0, z1);
            using (var v = new SKPath())
            {
                v.MoveTo(nx - 1.2f, ny); v.LineTo(nx, ny - 1.2f); v.LineTo(nx + 1.2f, ny); v.Close();
                pen.FillPath(v, SKColors.Black);
            }
            foreach (var e in g.Elements)
            {
                var portion = WirePortion.InRing(e, z0, z1);
                if (portion is not { } part) continue;
                using var path = new SKPath();
                var started = false;
                for (var q = 0; q <= 40; q++)
                {
                    var z = part.LowerMm + (part.UpperMm - part.LowerMm) * q / 40;
                    var az = e.AzimuthAtHeightRad(z);
                    if (Math.Cos(az) < 0) { started = false; continue; }
                    var (x, yy) = P(ring, g.ElementAxisRadiusMm, az, z);
                    if (!started) path.MoveTo(x, yy); else path.LineTo(x, yy);
                    started = true;
                }
                pen.StrokePath(path, 0.5, Wire);
                if (part.CrossesTop)
                {
                    var az = e.AzimuthAtHeightRad(z1);
                    var (x, yy) = P(ring, g.ElementAxisRadiusMm, az, z1);
                    pen.FillCircle(x, yy, 0.7, SKColors.Black);
                }
            }
            var (lx, ly) = P(ring, R, Math.PI / 2, (z0 + z1) / 2);
            pen.Text("ring " + ring.ToString(CultureInfo.InvariantCulture) + (ring == 1 ? " (bottom)" : ring == n ? " (top)" : ""), lx + 3, ly + 1, 2.6);
        }
        if (n < 2) return;
        // The notches line up: a dashed line through them all.
        var (ax, ay) = P(1, R, 0, faces[1]);
        var (bx, by) = P(n, R, 0, faces[n]);
        pen.Line(ax, top + h - 3.5, bx, by - 2, 0.2, dash: [1f, 1f]);
        // Under the bottom ring's near edge, where nothing else is drawn.
        pen.Text("notches in one line", cx, top + h - 1, 2.4, SKTextAlign.Center);
    }

    private static SKPath Ellipse(Func<double, (float X, float Y)> at)
    {
        var path = new SKPath();
        for (var a = 0; a <= 360; a += 4)
        {
            var (x, y) = at(a * Math.PI / 180);
            if (a == 0) path.MoveTo(x, y); else path.LineTo(x, y);
        }
        path.Close();
        return path;
    }

    /// <summary>A cut element lying on its template line: the wire drawn at its true length on the
    /// page's scale with both ends on the end ticks and the grey band where the cut may fall.</summary>
    public static void ElementOnLine(SheetPen pen, PolarizerGeometry g, double left, double top, double w, double h)
    {
        var L = g.Input.ElementLengthMm;
        var s = Math.Min(1.0, (w - 8) / L);
        var y = top + h / 2;
        var tol = g.Input.LengthToleranceMm * s;
        pen.FillRect(left + 2 + L * s - tol, y - 3, 2 * tol + 0.2, 6, new SKColor(200, 200, 200));
        pen.Line(left + 2, y, left + 2 + L * s, y, 0.25);
        pen.Line(left + 2, y - 3, left + 2, y + 3, 0.3);
        pen.Line(left + 2 + L * s, y - 3, left + 2 + L * s, y + 3, 0.3);
        pen.Line(left + 2, y - 0.9, left + 2 + L * s, y - 0.9, Math.Max(0.4, g.Input.WireDiameterMm * s), Wire);
        pen.Text(s < 1 ? string.Create(CultureInfo.InvariantCulture, $"drawn at {s * 100:0} %; the bend sheet's line is 1:1") : "1:1", left + 2, y + 7, 2.4, grey: true);
    }

    /// <summary>The wrap template going round the former: printed side out, bottom edge on the
    /// former's bottom face, wound the way the arrow turns (seen from above).</summary>
    public static void WrapDirection(SheetPen pen, PolarizerGeometry g, double left, double top, double w, double h)
    {
        var r = Math.Min(h * 0.32, w * 0.18);
        var cx = left + r + 4;
        var cy = top + h / 2;
        pen.FillPath(Circle(cx, cy, r), Foam);
        pen.Circle(cx, cy, r, 0.3);
        pen.Circle(cx, cy, r + 1.2, 0.5);
        // Seen from above, the strip goes on in the direction the elements turn as they climb.
        var sign = g.WindingSign;
        using var arc = new SKPath();
        arc.AddArc(new SKRect((float)(cx - r - 4), (float)(cy - r - 4), (float)(cx + r + 4), (float)(cy + r + 4)), 90, sign > 0 ? -270 : 270);
        pen.Path(arc, 0.5);
        var end = (90 + (sign > 0 ? -270 : 270)) * Math.PI / 180;
        pen.Arrow(cx + (r + 4) * Math.Cos(end), cy + (r + 4) * Math.Sin(end), end + (sign > 0 ? -Math.PI / 2 : Math.PI / 2));
        var tx = cx + r + 8;
        pen.Text("seen from above:", tx, cy - 6, 2.4);
        pen.Text(sign > 0 ? "wrap counter-clockwise" : "wrap clockwise", tx, cy - 2.5, 2.4);
        pen.Text("printed side out,", tx, cy + 1, 2.4);
        pen.Text("bottom edge on the bottom face", tx, cy + 4.5, 2.4);
    }

    /// <summary>The printed sleeve on the print bed: upright, bottom face down, the grooves as the
    /// wires will lie in them, and a wire pressed into one groove from its lower end.</summary>
    public static void PrintedSleeve(SheetPen pen, PolarizerGeometry g, double left, double top, double w, double h)
    {
        var i = g.Input;
        var s = Math.Min((h - 12) / i.FormerHeightMm, (w * 0.45) / i.FormerOuterDiameterMm);
        var cx = left + w * 0.3;
        var bed = top + h - 6;
        double Y(double z) => bed - z * s;
        pen.FillRect(left + 2, bed, w * 0.6, 2, FoamSide);
        pen.Text("print bed", left + 2, bed + 5, 2.4);
        Helices(pen, g, cx, z => Y(z - (i.CentreAboveFeedMm - i.FormerHeightMm / 2)), s, front: false);
        var r = g.FormerOuterRadiusMm * s;
        pen.FillRect(cx - r, Y(i.FormerHeightMm), 2 * r, i.FormerHeightMm * s, Foam.WithAlpha(230));
        pen.Rect(cx - r, Y(i.FormerHeightMm), 2 * r, i.FormerHeightMm * s, 0.3);
        Helices(pen, g, cx, z => Y(z - (i.CentreAboveFeedMm - i.FormerHeightMm / 2)), s, front: true);
        var tx = cx + r + 4;
        pen.Text("stand the sleeve on its bottom face,", tx, Y(i.FormerHeightMm * 0.8), 2.4);
        pen.Text("axis up; grooves print without support", tx, Y(i.FormerHeightMm * 0.8) + 3.5, 2.4);
        pen.Text("press each wire into its groove from", tx, Y(i.FormerHeightMm * 0.4), 2.4);
        pen.Text("the lower end up until it sits flush", tx, Y(i.FormerHeightMm * 0.4) + 3.5, 2.4);
    }

    private static SKPath Circle(double cx, double cy, double r)
    {
        var p = new SKPath();
        p.AddCircle((float)cx, (float)cy, (float)r);
        return p;
    }
}
