using System.Globalization;
using SkiaSharp;
using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Emit.Sheet;

/// <summary>
/// Draws the 1:1 bend sheet on canvases scaled to millimetres (y down). The same drawing becomes
/// the PNG and the vector PDF. Contents: calibration bars, element cut template with tolerance band,
/// unrolled wrap template, arc bend template, winding drawing, build table and cautions. The
/// sections are laid out as blocks and flowed onto as many pages as they need, so a large former
/// (a wrap template in several parts) pushes the later sections onto the next page instead of off
/// the paper; every page carries the title and both calibration bars.
/// </summary>
public static class BendSheetPainter
{
    public const double MarginMm = 12;
    public const double BarHeightMm = 3;
    public const double BarTopMm = 27;
    public const double MetricBarMm = 50;
    public const double InchBarMm = 2 * PaperSheet.MmPerInch;
    /// <summary>Top of the first section on every page, below the title and the bars, mm.</summary>
    public const double ContentTopMm = 38;
    /// <summary>Height of the bend template's two caption lines above each tile, mm.</summary>
    public const double ArcCaptionMm = 11;

    /// <summary>A section (or one part of one) that stays whole on a page: its height and how to
    /// draw it with its top edge at a given page height.</summary>
    private sealed record Block(double HeightMm, Action<SheetPen, double> Draw);

    /// <summary>One drawing action per page, in order.</summary>
    public static IReadOnlyList<Action<SKCanvas>> Pages(PolarizerGeometry g)
    {
        var (pageW, pageH) = PaperSheet.SizeMm(g.Input.Paper);
        var bottom = pageH - MarginMm;
        var pages = new List<List<(double Top, Block Block)>> { new() };
        var cursor = ContentTopMm;
        foreach (var block in Blocks(g, pageW))
        {
            if (cursor + block.HeightMm > bottom && pages[^1].Count > 0)
            {
                pages.Add([]);
                cursor = ContentTopMm;
            }
            pages[^1].Add((cursor, block));
            cursor += block.HeightMm;
        }
        return pages.Select((page, k) => (Action<SKCanvas>)(canvas =>
        {
            using var pen = new SheetPen(canvas);
            Header(pen, g, k + 1, pages.Count);
            foreach (var (top, block) in page) block.Draw(pen, top);
        })).ToList();
    }

    private static void Header(SheetPen pen, PolarizerGeometry g, int page, int pages)
    {
        var i = g.Input;
        var m = MarginMm;
        var ci = CultureInfo.InvariantCulture;
        pen.Text($"Bend sheet: {i.DesignName}", m, 17, 5);
        pen.Text(string.Create(ci, $"{ChoiceWords.Label(i.Sense)} · {i.ElementCount} elements · {BuildTable.FrequencyLabel(i.FrequencyHz)} · print at 100 % (actual size), then check both bars"), m, 23, 3, grey: true);
        CalibrationBars(pen, m);
    }

    /// <summary>The sections top to bottom; each block's section title sits 4 mm below its top.</summary>
    private static IEnumerable<Block> Blocks(PolarizerGeometry g, double pageW)
    {
        var i = g.Input;
        var m = MarginMm;
        var ci = CultureInfo.InvariantCulture;

        // 1. Element cut template.
        yield return new Block(20, (pen, top) =>
        {
            var y = top + 4;
            pen.Text("1  Element: lay the wire on the line, cut within the grey band", m, y, 3.2);
            var L = i.ElementLengthMm;
            var tol = i.LengthToleranceMm;
            pen.FillRect(m + L - tol, y + 2, 2 * tol, 8, new SKColor(200, 200, 200));
            pen.Line(m, y + 6, m + L, y + 6, 0.5);
            pen.Line(m, y + 2, m, y + 10, 0.3);
            pen.Line(m + L, y + 2, m + L, y + 10, 0.3);
            pen.Text(string.Create(ci, $"L = {L:0.00} mm, {(i.ToleranceIsCutFigure ? "cut to within" : "tolerance")} ± {tol:0.00} mm"), m, y + 14, 2.6, grey: true);
        });

        // 2. Wrap template, one block per part; the section title rides with the first part.
        var wrap = WrapTemplate.From(g);
        var maxWidth = pageW - 2 * m;
        var pieceW = maxWidth - wrap.GlueTabMm;
        var pieces = (int)Math.Ceiling(wrap.WidthMm / pieceW - 1e-9);
        for (var p = 0; p < pieces; p++)
        {
            var part = p;
            var first = p == 0;
            var caption = pieces > 1 ? 4.5 : 0;
            yield return new Block((first ? 8 : 0) + caption + wrap.HeightMm + 4, (pen, top) =>
            {
                if (first) pen.Text("2  Wrap template: cut out, printed side out, wrap round the former (bottom edge down), mark the lines", m, top + 4, 3.2);
                var y = first ? top + 8 : top;
                if (pieces > 1)
                    pen.Text(string.Create(ci, $"part {part + 1} of {pieces}{(part + 1 < pieces ? $": its right edge joins part {part + 2}'s left edge, crosses on crosses" : ": the glue tab closes the ring onto part 1")}"), m, y + 3, 2.4, grey: true);
                WrapTemplatePart(pen, wrap, part, pieces, pieceW, m, y + caption);
            });
        }
        yield return new Block(4, (pen, top) =>
            pen.Text(string.Create(ci, $"{wrap.WidthMm:0.00} mm = one turn of the former; numbers at each element's lower end"), m, top, 2.4, grey: true));

        // 3. Arc bend template at 1:1, tiled over as many pages as it needs, then 4. winding drawing.
        var arc = ArcDrawing.For(g);
        var tileW = pageW - 2 * m;
        var tileH = PaperSheet.SizeMm(i.Paper).HeightMm - ContentTopMm - MarginMm - ArcCaptionMm - 1;
        var half = (pageW - 2 * m) / 2;
        if (arc.WidthMm <= half - 2 && arc.HeightMm <= 120)
        {
            // A small arc stands beside the winding drawing, whole, in a box of its own width.
            yield return new Block(Math.Max(ArcCaptionMm + arc.HeightMm + 1, 60), (pen, top) =>
            {
                pen.Text("3  Bend: the wire must lie on this arc", m, top + 4, 3.2);
                pen.Text(string.Create(ci, $"radius {g.BendRadiusMm:0.00} mm about the cross"), m, top + 8, 2.4, grey: true);
                Layout.Tiling.Paint(pen, Layout.Tiling.Cut(arc.WidthMm, arc.HeightMm, tileW, tileH)[0], m, top + ArcCaptionMm, arc.Draw);
                pen.Text("4  Which way the elements run", m + half, top + 4, 3.2);
                WindingDrawing(pen, g, m + half, top + 8);
            });
        }
        else
        {
            foreach (var tile in Layout.Tiling.Cut(arc.WidthMm, arc.HeightMm, tileW, tileH))
            {
                var t = tile;
                yield return new Block(ArcCaptionMm + t.H + 1, (pen, top) =>
                {
                    var of = t.Count > 1 ? string.Create(ci, $", tile {t.Number} of {t.Count}: tape the tiles so the crosses of the same number coincide") : "";
                    pen.Text("3  Bend: the wire must lie on this arc, at 1:1" + of, m, top + 4, t.Count > 1 ? 2.8 : 3.2);
                    pen.Text(string.Create(ci, $"radius {g.BendRadiusMm:0.00} mm about the cross; end tick to end tick {g.Input.ElementLengthMm:0.00} mm along the arc"), m, top + 8, 2.4, grey: true);
                    Layout.Tiling.Paint(pen, t, m, top + ArcCaptionMm, arc.Draw);
                });
            }
            yield return new Block(60, (pen, top) =>
            {
                pen.Text("4  Which way the elements run", m, top + 4, 3.2);
                WindingDrawing(pen, g, m, top + 8);
            });
        }

        // 5. Build table.
        var rows = BuildTable.Rows(g);
        yield return new Block(5.5 + rows.Count * 4.4 + 2, (pen, top) =>
        {
            var y = top + 4;
            pen.Text("5  Build table", m, y, 3.2);
            y += 5.5;
            foreach (var (label, value) in rows)
            {
                pen.Text(label, m, y, 2.8);
                pen.Text(value, m + 34, y, 2.8);
                y += 4.4;
            }
        });

        // 6. Cautions.
        yield return new Block(5 + Cautions.Lines.Count * 3.8, (pen, top) =>
        {
            var y = top + 4;
            pen.Text("6  Cautions", m, y, 3.2);
            y += 5;
            foreach (var line in Cautions.Lines)
            {
                pen.Text(line, m, y, 2.5);
                y += 3.8;
            }
        });
    }

    /// <summary>Solid bars exactly 50 mm and 2 in long; a printer scaling the page shows here first.</summary>
    internal static void CalibrationBars(SheetPen pen, double x)
    {
        pen.FillRect(x, BarTopMm, MetricBarMm, BarHeightMm, SKColors.Black);
        pen.FillRect(x + 60, BarTopMm, InchBarMm, BarHeightMm, SKColors.Black);
        pen.Text("50 mm", x, BarTopMm + BarHeightMm + 3.5, 2.6);
        pen.Text("2 in (50.8 mm)", x + 60, BarTopMm + BarHeightMm + 3.5, 2.6);
    }

    /// <summary>Draws part p of the wrap template with its top edge at top.</summary>
    private static void WrapTemplatePart(SheetPen pen, WrapTemplate wrap, int p, int pieces, double pieceW, double x, double top)
    {
        var y = top;
        var from = p * pieceW;
        var w = Math.Min(pieceW, wrap.WidthMm - from);
        pen.Rect(x, y, w, wrap.HeightMm, 0.3);
        if (p == pieces - 1)
        {
            pen.Rect(x + w, y, wrap.GlueTabMm, wrap.HeightMm, 0.2, [1f, 1f]);
            pen.Text("glue", x + w + 1, y + wrap.HeightMm / 2 + 1, 2.2, grey: true);
        }
        if (pieces > 1)
        {
            // Join marks: numbered crosses on each cut edge, the same number on both parts of a joint.
            foreach (var f in new[] { 0.3, 0.7 })
            {
                var jy = y + f * wrap.HeightMm;
                if (p + 1 < pieces) JoinCross(pen, x + w, jy, p + 1, right: true);
                if (p > 0) JoinCross(pen, x, jy, p, right: false);
            }
        }
        pen.Canvas.Save();
        pen.Canvas.ClipRect(new SKRect((float)x, (float)y, (float)(x + w), (float)(y + wrap.HeightMm)));
        foreach (var line in wrap.Lines)
            pen.Line(x + line.From.X - from, y + wrap.HeightMm - line.From.Y, x + line.To.X - from, y + wrap.HeightMm - line.To.Y, 0.3);
        pen.Canvas.Restore();
        foreach (var label in wrap.Labels)
        {
            // Each number is drawn on the part that holds its element's lower end.
            var sx = label.LowerEnd.X - from;
            if (sx < 0 || sx > w + 1e-9 || (sx == 0 && p > 0)) continue;
            pen.Text(label.ElementNumber.ToString(CultureInfo.InvariantCulture), x + label.BaselineLeft.X - from,
                y + wrap.HeightMm - label.BaselineLeft.Y, WrapTemplate.LabelSizeMm);
        }
    }

    /// <summary>A cross on a cut edge with the joint's number outside the part.</summary>
    private static void JoinCross(SheetPen pen, double x, double y, int joint, bool right)
    {
        pen.Line(x - 2, y, x + 2, y, 0.3);
        pen.Line(x, y - 2, x, y + 2, 0.3);
        var label = "J" + joint.ToString(CultureInfo.InvariantCulture);
        pen.Text(label, right ? x + 2.5 : x - 2.5, y + 3.4, 2.2, right ? SKTextAlign.Left : SKTextAlign.Right);
    }

    private static void WindingDrawing(SheetPen pen, PolarizerGeometry g, double x, double top)
    {
        // Side view of the former: seen from outside, azimuth increases to the right, so a
        // right-hand element climbs to the right on the near side and to the left on the far side.
        var w = 22.0;
        var h = 34.0;
        var x0 = x + 4;
        var y0 = top + 4;
        pen.Rect(x0, y0, w, h, 0.3);
        var slope = Math.Clamp(g.PitchAngleRad, 0.35, 1.2);
        var dir = g.WindingSign;
        for (var k = 0; k < 3; k++)
        {
            var yb = y0 + h - 4 - k * 10;
            var dx = 14.0;
            var dy = Math.Tan(slope) * dx * 0.6;
            var (xa, xb) = dir > 0 ? (x0 + 4, x0 + 4 + dx) : (x0 + w - 4, x0 + w - 4 - dx);
            pen.Line(xa, yb, xb, yb - dy, 0.6);
            pen.Arrow(xb, yb - dy, Math.Atan2(-dy, xb - xa));
        }
        // Top view: the turn an element makes as it climbs, drawn as seen from above.
        var cx = x0 + w + 20;
        var cy = y0 + 12;
        pen.Circle(cx, cy, 8, 0.3);
        using var arc = new SKPath();
        // Seen from above with azimuth counter-clockwise; page y is down, so counter-clockwise on
        // paper is decreasing page angle.
        var sweep = dir > 0 ? -250f : 250f;
        arc.AddArc(new SKRect((float)cx - 5, (float)cy - 5, (float)cx + 5, (float)cy + 5), 90, sweep);
        pen.Path(arc, 0.4);
        var endA = (90 + sweep) * Math.PI / 180;
        var tangent = endA + (dir > 0 ? -Math.PI / 2 : Math.PI / 2);
        pen.Arrow(cx + 5 * Math.Cos(endA), cy + 5 * Math.Sin(endA), tangent);
        var words = dir > 0
            ? new[] { "Right-hand winding:", "from outside, each element", "climbs to the right; from", "above, it turns counter-", "clockwise as it climbs." }
            : new[] { "Left-hand winding:", "from outside, each element", "climbs to the left; from", "above, it turns clockwise", "as it climbs." };
        var ty = cy + 13;
        foreach (var line in words) { pen.Text(line, cx - 10, ty, 2.4); ty += 3.4; }
        pen.Text(ChoiceWords.Label(g.Input.Sense), x0, y0 + h + 4, 3);
    }
}
