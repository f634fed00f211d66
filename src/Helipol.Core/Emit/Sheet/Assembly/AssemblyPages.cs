using System.Globalization;
using SkiaSharp;
using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Emit.Sheet.Assembly;

/// <summary>
/// The packet's assembly and test pages: numbered steps, each with its words and, where a picture
/// helps, a view drawn from the geometry (<see cref="AssemblyViews"/>). The steps follow the path
/// the design's former takes (foam rings or a printed sleeve) and say so first. Steps are blocks
/// flowed onto pages; words are wrapped to the measured text width, so nothing runs off the page.
/// </summary>
internal static class AssemblyPages
{
    private const double TextMm = 2.8;
    private const double LineMm = 4.0;

    private sealed record Step(string Title, IReadOnlyList<string> Words, double ViewHeightMm,
        Action<SheetPen, PolarizerGeometry, double, double, double, double>? View);

    public static IReadOnlyList<Action<SKCanvas>> Pages(PolarizerGeometry g) =>
        Flow(g, "Assembly: " + g.Input.DesignName, AssemblySteps(g)).Concat(Flow(g, "Checks on the bench: " + g.Input.DesignName, TestSteps(g))).ToList();

    private static string F(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);

    private static IEnumerable<Step> AssemblySteps(PolarizerGeometry g)
    {
        var i = g.Input;
        var hand = g.WindingSign > 0 ? "right-hand" : "left-hand";
        var bottom = i.CentreAboveFeedMm - i.FormerHeightMm / 2;
        var reference = i.Whip == WhipKind.Dipole ? "the feed gap" : "the ground plane";
        if (i.FormerPrinted)
        {
            yield return new Step("This build: a printed sleeve", [
                F($"The former is one printed part ({i.FormerMaterial}, former.stl or former.3mf) with a groove for each element."),
                "Skip the foam-ring templates, rings.dxf and drill.dxf: they are only for a former stacked from foam rings."], 0, null);
            yield return new Step("1  Print the sleeve upright", [
                "Print it standing on its bottom face with the axis vertical; the grooves then need no support.",
                F($"Check the bore slides over the {i.CoverDiameterMm:0.#} mm cover and a {i.WireDiameterMm:0.##} mm wire drops into a groove.")],
                48, AssemblyViews.PrintedSleeve);
        }
        else
        {
            yield return new Step("This build: a stack of foam rings", [
                F($"The former is {i.RingCount} ring{(i.RingCount > 1 ? "s" : "")} of {i.FormerMaterial}, each {g.RingThicknessMm:0.##} mm thick, cut from rings.dxf or the ring templates."),
                "Ignore former.stl and former.3mf unless you choose to print the former instead."], 0, null);
            yield return new Step("1  Cut and stack the rings", [
                "Cut every ring on its outline and bore. Ring 1 is the bottom; write each ring's number on its top face.",
                "The V-notch marks azimuth 0: stack the rings in order with all notches in one line, then glue them.",
                "Drill or push a wire through at each dot, along the line drill.dxf gives (through or blind, at its tilt)."],
                62, AssemblyViews.ExplodedRings);
        }
        yield return new Step("2  Cut the elements", [
            F($"Cut {i.ElementCount} wires of {i.ElementLengthMm:0.00} mm: lay each on the bend sheet's line with one end on a tick, cut in the grey band."),
            "Bend each one until it lies on the bend sheet's arc along its whole length."],
            22, AssemblyViews.ElementOnLine);
        yield return new Step(i.FormerPrinted ? "3  Seat the wires and wrap" : "3  Fit the wires and wrap", [
            i.FormerPrinted
                ? "Press each wire into its groove starting at the lower end; it must sit flush along the whole groove."
                : "Follow the marks of the wrap template; each element runs along its numbered line, its lower end at the number.",
            F($"Wrap the template round the former printed side out, its bottom edge on the former's bottom face; the elements are {hand}."),
            i.WrapLayers > 0 ? F($"Finish with {i.WrapLayers} layer{(i.WrapLayers > 1 ? "s" : "")} of {i.WrapMaterial}, wound the same way.") : "No wrap is called for: fix the wires with a dot of glue at each end."],
            34, AssemblyViews.WrapDirection);
        yield return new Step("4  Fit the former on the whip", [
            F($"Slide the former over the whip with ring 1 (the bottom face) toward {reference}; its bottom face sits {Math.Abs(bottom):0.0} mm {(bottom >= 0 ? "above" : "below")} {reference}."),
            F($"Seen from outside, the elements climb to the {(g.WindingSign > 0 ? "right" : "left")}; the polarizer then gives {ChoiceWords.Label(i.Sense)}.")],
            92, AssemblyViews.FormerOnWhip);
    }

    private static IEnumerable<Step> TestSteps(PolarizerGeometry g)
    {
        var sense = ChoiceWords.Label(g.Input.Sense);
        var other = ChoiceWords.Label(g.Input.Sense == Sense.Rhcp ? Sense.Lhcp : Sense.Rhcp);
        yield return new Step("5  Winding check", [
            F($"Receive a {sense} test source at a fixed distance and note the level. Then either fit a copy wound the other way, or"),
            F($"turn the partner antenna to {other}: the level must drop by 10 dB or more. If it rises, the elements are wound the wrong way."),
            "Caution: transmit only where and at the power your licence or local rules allow; keep people clear of the transmitting antenna."], 0, null);
        yield return new Step("6  Axial ratio with a spinning linear source", [
            "Spin a linear (whip or dipole) source slowly about the line to the polarizer and record the lowest and highest level at each frequency.",
            "The axial ratio is the difference in dB; where it is smallest is the best axial ratio, which helipol calibrate fits the coating factor to.",
            "Save the readings as CSV with the header frequency_mhz,level_min_db,level_max_db (one row per frequency).",
            "Caution: a spinning dipole has sharp wire ends at head height; guard it and stand clear while it turns."], 0, null);
        yield return new Step("7  Reflection check with a VNA", [
            "Calibrate the analyser at the end of the feed cable. Save the whip's reflection as Touchstone (.s1p) without the polarizer,",
            "then fit the polarizer and save again: helipol calibrate reads both files with the spin CSV.",
            "Caution: never transmit into the whip while the polarizer is off, half fitted or being adjusted: a detuned antenna reflects power back",
            "into the transmitter. Measure with the analyser only."], 0, null);
        yield return new Step("Cautions for the build", Cautions.Lines, 0, null);
    }

    private static IEnumerable<Action<SKCanvas>> Flow(PolarizerGeometry g, string title, IEnumerable<Step> steps)
    {
        var (pageW, pageH) = PaperSheet.SizeMm(g.Input.Paper);
        var m = BendSheetPainter.MarginMm;
        var width = pageW - 2 * m;
        var blocks = new List<(double Height, Action<SheetPen, double> Draw)>();
        foreach (var step in steps)
        {
            var lines = step.Words.SelectMany(w => Wrap(w, width - 4, TextMm)).ToList();
            var h = 6 + lines.Count * LineMm + (step.View is null ? 2 : step.ViewHeightMm + 4);
            blocks.Add((h, (pen, top) =>
            {
                pen.Text(step.Title, m, top + 4.5, 3.4);
                var y = top + 6 + LineMm;
                foreach (var l in lines) { pen.Text(l, m + 2, y, TextMm); y += LineMm; }
                if (step.View is { } view)
                {
                    var boxTop = y - LineMm + 3;
                    pen.Canvas.Save();
                    pen.Canvas.ClipRect(new SKRect((float)m, (float)boxTop, (float)(m + width), (float)(boxTop + step.ViewHeightMm)));
                    view(pen, g, m, boxTop, width, step.ViewHeightMm);
                    pen.Canvas.Restore();
                }
            }));
        }
        var pages = new List<List<(double Top, Action<SheetPen, double> Draw)>> { new() };
        var top = BendSheetPainter.ContentTopMm - 12;
        var cursor = top;
        foreach (var (h, draw) in blocks)
        {
            if (cursor + h > pageH - m && pages[^1].Count > 0) { pages.Add([]); cursor = top; }
            pages[^1].Add((cursor, draw));
            cursor += h;
        }
        return pages.Select(p => (Action<SKCanvas>)(canvas =>
        {
            using var pen = new SheetPen(canvas);
            pen.Text(title, m, 17, 5);
            foreach (var (t, d) in p) d(pen, t);
        }));
    }

    /// <summary>Breaks words into lines no wider than the width in the sheet font.</summary>
    internal static IEnumerable<string> Wrap(string text, double widthMm, double sizeMm)
    {
        var line = "";
        foreach (var word in text.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            var next = line.Length == 0 ? word : line + " " + word;
            if (line.Length > 0 && SheetPen.TextWidth(next, sizeMm) > widthMm) { yield return line; line = word; }
            else line = next;
        }
        if (line.Length > 0) yield return line;
    }
}
