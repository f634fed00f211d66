using Helipol.Design;
using Helipol.Model;
using ScottPlot;

namespace Helipol.Emit.Report;

/// <summary>
/// The report's plots as PNG bytes (ScottPlot 5). Fixed pixel sizes, fixed colours, no dates, so
/// the same results give the same bytes on one machine.
/// </summary>
public static class ReportPlots
{
    public const int Width = 900, Height = 560, PolarSize = 620;

    /// <summary>
    /// Renders under the invariant culture: ScottPlot's tick labels format numbers with the current
    /// culture, which would put decimal commas (and different bytes) in a German user's plots.
    /// </summary>
    private static byte[] Png(Plot plt, int width, int height, ImageFormat format)
    {
        var (culture, ui) = (System.Globalization.CultureInfo.CurrentCulture, System.Globalization.CultureInfo.CurrentUICulture);
        try
        {
            System.Globalization.CultureInfo.CurrentCulture = System.Globalization.CultureInfo.InvariantCulture;
            System.Globalization.CultureInfo.CurrentUICulture = System.Globalization.CultureInfo.InvariantCulture;
            return plt.GetImageBytes(width, height, format);
        }
        finally
        {
            System.Globalization.CultureInfo.CurrentCulture = culture;
            System.Globalization.CultureInfo.CurrentUICulture = ui;
        }
    }

    /// <summary>
    /// True axial ratio (worst direction of the cone, IEEE Std 145) and circular gains against frequency,
    /// with realized gains, the bare whip's realized gain and the band edges. Where part of the cone
    /// radiates the wrong sense the axial-ratio curve stops and the span is shaded and labelled: a
    /// wrong-sense axial ratio is never drawn as if it were the wanted one. Every line drawn has its
    /// legend entry, the band edges and the axial-ratio limit included.
    /// </summary>
    public static byte[] AxialRatioAndGain(SweepResult sweep, PolarizerDesign design)
    {
        var plt = PlotStyle.NewPlot();
        var f = sweep.Points.Select(p => p.Polarizer.FrequencyHz / 1e6).ToArray();
        var wanted = sweep.Points.Select(p => p.Polarizer.AllWantedSense).ToArray();
        var arDb = sweep.Points.Select(p => p.Polarizer.Worst.AxialRatioDb).ToArray();
        double arTop = Math.Min(ArAxisDb, AxisTop(arDb.Where((_, i) => wanted[i]).DefaultIfEmpty(3).Max(), 0));
        bool first = true;
        foreach (var (from, to) in Runs(wanted, true))
        {
            var ar = plt.Add.Scatter(f[from..(to + 1)], arDb[from..(to + 1)]);
            PlotStyle.Curve(ar, PlotStyle.Black, LinePattern.Solid, first ? $"worst axial ratio, {Word(design.Polarizer.Sense)} (dB, left axis)" : "");
            first = false;
            ar.MarkerSize = from == to ? 6 : 0;
            ar.LineWidth = PlotStyle.LineWidth + 0.5f;
        }
        bool firstWrong = true;
        foreach (var (from, to) in Runs(wanted, false))
        {
            double step = f.Length > 1 ? (f[1] - f[0]) / 2 : 1;
            var span = plt.Add.HorizontalSpan(f[from] - step, f[to] + step);
            span.FillStyle.Color = PlotStyle.Orange.WithAlpha(0.3);
            span.LineStyle.Width = 0;
            if (firstWrong) span.LegendText = $"wrong sense somewhere on the cone (not {Word(design.Polarizer.Sense)})";
            firstWrong = false;
        }
        var (rc, rp) = PlotStyle.Sense(true);
        var (lc, lp) = PlotStyle.Sense(false);
        var rh = plt.Add.Scatter(f, sweep.Points.Select(p => p.Polarizer.GainRhcpDbic).ToArray());
        PlotStyle.Curve(rh, rc, rp, "RHCP gain (dBic, right axis)");
        rh.Axes.YAxis = plt.Axes.Right;
        var lh = plt.Add.Scatter(f, sweep.Points.Select(p => p.Polarizer.GainLhcpDbic).ToArray());
        PlotStyle.Curve(lh, lc, lp, "LHCP gain (dBic, right axis)");
        lh.Axes.YAxis = plt.Axes.Right;
        var realized = plt.Add.Scatter(f, sweep.Points.Select(p => p.Polarizer.RealizedGainDbic(design.Polarizer.Sense)).ToArray());
        PlotStyle.Curve(realized, design.Polarizer.Sense == Sense.Rhcp ? rc : lc, LinePattern.Dotted,
            FormattableString.Invariant($"realized {Word(design.Polarizer.Sense)} gain into {design.Solve.ReceiverOhm:0.#} Ω (dBic, right axis)"));
        realized.Axes.YAxis = plt.Axes.Right;
        var bare = plt.Add.Scatter(f, sweep.Points.Select(p => p.BareWhipRealizedGainDbic).ToArray());
        PlotStyle.Curve(bare, PlotStyle.Grey, LinePattern.DenselyDashed, $"bare whip, realized {Word(design.Polarizer.Sense)} (dBic, right axis)");
        bare.Axes.YAxis = plt.Axes.Right;
        var limit = plt.Add.HorizontalLine(sweep.LimitDb);
        limit.Color = PlotStyle.ReddishPurple;
        limit.LineWidth = PlotStyle.GuideWidth;
        limit.LinePattern = LinePattern.Dotted;
        limit.LegendText = FormattableString.Invariant($"axial-ratio limit {sweep.LimitDb:0.#} dB (left axis)");
        BandEdges(plt, design);
        // Both axes set by hand: autoscaling let the AR curve run off the top, and the legend needs
        // free space above the curves. Axial ratios above the axis top leave the view; none is redrawn at the top.
        plt.Axes.SetLimitsY(0, arTop, plt.Axes.Left);
        var gains = sweep.Points.SelectMany(p => new[] { p.Polarizer.GainRhcpDbic, p.Polarizer.GainLhcpDbic, p.Polarizer.RealizedGainDbic(design.Polarizer.Sense), p.BareWhipRealizedGainDbic })
            .Where(double.IsFinite).Where(g => g > -60).ToArray();
        double gainLow = Math.Floor(gains.Min() / 5) * 5;
        plt.Axes.SetLimitsY(gainLow, AxisTop(gains.Max(), gainLow), plt.Axes.Right);
        bool clipped = arDb.Where((_, i) => wanted[i]).Any(a => a > arTop);
        plt.XLabel("frequency (MHz)");
        PlainFrequencyTicks(plt);
        plt.YLabel("axial ratio (dB)");
        plt.Axes.Right.Label.Text = "gain (dBic)";
        // Negative gains with the true minus sign, like every other figure helipol prints.
        plt.Axes.Right.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic { LabelFormatter = v => SignedNumber.Plain(v, "0.##") };
        plt.ShowLegend(Alignment.UpperRight);
        PlotStyle.Finish(plt, $"{design.Name}: axial ratio and gain, {ElevationWord(sweep.ElevationRad)}{(clipped ? FormattableString.Invariant($" (axial ratio above {arTop:0} dB off the axis)") : "")}");
        return Png(plt, Width, Height, ImageFormat.Png);
    }

    /// <summary>Index runs [from, to] where <paramref name="flags"/> equals <paramref name="value"/>.</summary>
    public static IEnumerable<(int From, int To)> Runs(bool[] flags, bool value)
    {
        for (int i = 0; i < flags.Length; i++)
        {
            if (flags[i] != value) continue;
            int j = i;
            while (j + 1 < flags.Length && flags[j + 1] == value) j++;
            yield return (i, j);
            i = j;
        }
    }

    /// <summary>Highest VSWR drawn; larger values stand at this value and the title says so.</summary>
    public const double VswrCap = 20;

    /// <summary>VSWR against the receiver impedance with and without the polarizer. The title names
    /// the cap only when a value was actually held down to it.</summary>
    public static byte[] Vswr(SweepResult sweep, PolarizerDesign design)
    {
        var plt = PlotStyle.NewPlot();
        var f = sweep.Points.Select(p => p.Polarizer.FrequencyHz / 1e6).ToArray();
        var withValues = sweep.Points.Select(p => Capped(p.Polarizer.Vswr)).ToArray();
        var bareValues = sweep.Points.Select(p => Capped(p.BareWhipVswr)).ToArray();
        var with = plt.Add.Scatter(f, withValues);
        PlotStyle.Curve(with, PlotStyle.Black, LinePattern.Solid, "with polarizer");
        var without = plt.Add.Scatter(f, bareValues);
        PlotStyle.Curve(without, PlotStyle.Grey, LinePattern.Dashed, "bare whip");
        BandEdges(plt, design);
        double top = withValues.Concat(bareValues).Max();
        bool capped = sweep.Points.Any(p => !(p.Polarizer.Vswr <= VswrCap) || !(p.BareWhipVswr <= VswrCap));
        plt.Axes.SetLimitsY(1, Math.Min(AxisTop(top, 1), VswrCap + 5));
        plt.XLabel("frequency (MHz)");
        PlainFrequencyTicks(plt);
        plt.YLabel(FormattableString.Invariant($"VSWR against {design.Solve.ReceiverOhm:0.#} Ω"));
        plt.ShowLegend(Alignment.UpperRight);
        PlotStyle.Finish(plt, FormattableString.Invariant($"{design.Name}: VSWR against {design.Solve.ReceiverOhm:0.#} Ω{(capped ? $" (values above {VswrCap:0} drawn at {VswrCap:0})" : "")}"));
        return Png(plt, Width, Height, ImageFormat.Png);
    }

    private static double Capped(double vswr) => double.IsFinite(vswr) ? Math.Min(VswrCap, vswr) : VswrCap;

    /// <summary>Depth of a polar plot below its top ring, dB: deeper nulls are drawn on the floor.</summary>
    public const double PolarRangeDb = 30;

    /// <summary>
    /// A polar plot of one cut: the radius is gain above a floor 30 dB under the top ring, RHCP
    /// solid and LHCP dashed. Every ring carries its value in dBic; the floor is written under the
    /// plot so a null is not mistaken for 0 dBic. On an elevation cut the zenith and both horizons
    /// are named.
    /// </summary>
    public static byte[] Polar(PatternCut cut, string title)
    {
        var plt = PlotStyle.NewPlot();
        double peak = Math.Max(cut.GainRhcpDbic.Where(double.IsFinite).DefaultIfEmpty(0).Max(), cut.GainLhcpDbic.Where(double.IsFinite).DefaultIfEmpty(0).Max());
        double top = Math.Ceiling(peak / 5) * 5 + 0.0, floor = top - PolarRangeDb; // + 0.0 turns −0 into 0 for the label
        var axis = plt.Add.PolarAxis(PolarRangeDb);
        const int rings = 6;
        var radii = Enumerable.Range(1, rings).Select(k => PolarRangeDb * k / rings).ToArray();
        axis.SetCircles(radii, radii.Select(_ => "").ToArray());
        bool elevation = cut.Name == "elevation";
        var spokes = Enumerable.Range(0, 12).Select(k => k * 30).Select(a => elevation ? ElevationSpoke(a) : FormattableString.Invariant($"{a}°")).ToArray();
        axis.SetSpokes(spokes, PolarRangeDb);
        foreach (var c in axis.Circles) { c.LineWidth = 1; c.LineColor = PlotStyle.Grey.WithAlpha(0.6); c.LabelStyle.FontSize = 11; }
        foreach (var s in axis.Spokes) { s.LineWidth = 1; s.LineColor = PlotStyle.Grey.WithAlpha(0.6); s.LabelStyle.FontSize = 12; }
        Coordinates[] Curve(double[] gains) => cut.AnglesDeg.Append(cut.AnglesDeg[0] + 360)
            .Zip(gains.Append(gains[0]), (a, g) => axis.GetCoordinates(double.IsFinite(g) ? Math.Max(0, g - floor) : 0, a)).ToArray();
        var (rc, rp) = PlotStyle.Sense(true);
        var (lc, lp) = PlotStyle.Sense(false);
        var r = plt.Add.Scatter(Curve(cut.GainRhcpDbic));
        PlotStyle.Curve(r, rc, rp, "RHCP");
        var l = plt.Add.Scatter(Curve(cut.GainLhcpDbic));
        PlotStyle.Curve(l, lc, lp, "LHCP");
        plt.ShowLegend(Alignment.UpperRight);
        plt.Axes.Frameless();
        plt.HideGrid();
        var ci = System.Globalization.CultureInfo.InvariantCulture;
        var note = plt.Add.Text(string.Create(ci, $"centre = floor {SignedNumber.Plain(floor, "0")} dBic ({PolarRangeDb:0} dB under the top ring); weaker directions are drawn on the floor{(cut.Name == "elevation" ? "\nangles above the horizon: right half towards azimuth 0°, left half towards 180°" : "")}\nrealized gain into {cut.ReceiverOhm:0.#} Ω = gain {SignedNumber.Format(cut.MismatchDb, "0.00")} dB (mismatch)"),
            axis.GetCoordinates(PolarRangeDb * 1.42, 270));
        note.LabelAlignment = Alignment.UpperCenter;
        note.LabelFontSize = 11;
        note.LabelFontColor = Colors.Black;
        note.LabelBackgroundColor = Colors.Transparent;
        note.LabelBorderWidth = 0;
        // Ring values stand along a line just off the 90° spoke, where consecutive labels sit one
        // ring apart vertically and cannot run into each other.
        foreach (var radius in radii)
        {
            var label = plt.Add.Text(SignedNumber.Plain(floor + radius, "0") + " dBic", axis.GetCoordinates(radius, 84));
            label.LabelAlignment = Alignment.LowerLeft;
            label.LabelFontSize = 11;
            label.LabelFontColor = PlotStyle.Black;
            label.LabelBackgroundColor = Colors.White.WithAlpha(0.8);
            label.LabelBorderWidth = 0;
        }
        plt.Axes.SetLimits(-PolarRangeDb * 1.3, PolarRangeDb * 1.3, -PolarRangeDb * 1.75, PolarRangeDb * 1.35);
        PlotStyle.Finish(plt, title);
        return Png(plt, PolarSize, PolarSize, ImageFormat.Png);
    }

    /// <summary>Spoke names of an elevation cut: angle above the horizon, zenith at the top.</summary>
    private static string ElevationSpoke(int a) => a switch
    {
        0 or 180 => "0°",
        90 => "90° zenith",
        _ when a < 90 => FormattableString.Invariant($"{a}°"),
        _ when a < 180 => FormattableString.Invariant($"{180 - a}°"),
        _ => FormattableString.Invariant($"−{(a < 270 ? a - 180 : 360 - a)}°"),
    };

    /// <summary>Heat map of the search's objective over element length × rise (blank: cannot be built).</summary>
    public static byte[] AxialRatioMap(AxialRatioMap map, double? solvedLengthM, double? solvedRiseM, string name)
    {
        var plt = PlotStyle.NewPlot();
        int nl = map.LengthsM.Length, nh = map.RisesM.Length;
        if (nl < 2 && nh < 2)
        {
            // Length and rise pinned: the "map" is a single cell, which a heat map draws as an
            // empty frame. Say so instead.
            plt.Axes.Frameless();
            plt.HideGrid();
            plt.Axes.SetLimits(-1, 1, -1, 1);
            var note = plt.Add.Text(string.Create(System.Globalization.CultureInfo.InvariantCulture,
                $"no map: element length and rise are pinned in the design\n({map.ElementCount} elements on {map.OuterDiameterM * 1e3:0.#} mm, one geometry scored)"), 0, 0);
            note.LabelAlignment = Alignment.MiddleCenter;
            note.LabelFontSize = 16;
            note.LabelFontColor = Colors.Black;
            note.LabelBackgroundColor = Colors.Transparent;
            note.LabelBorderWidth = 0;
            PlotStyle.Finish(plt, FormattableString.Invariant($"{name}: search objective map"));
            return Png(plt, Width, Height, ImageFormat.Png);
        }
        // Rows are drawn top to bottom: row 0 = highest rise.
        var data = new double[nh, nl];
        for (int i = 0; i < nl; i++)
            for (int j = 0; j < nh; j++)
                data[nh - 1 - j, i] = Math.Min(40, map.ObjectiveDb[i, j]);
        double dl = nl > 1 ? map.LengthsM[1] - map.LengthsM[0] : 1e-3;
        double dh = nh > 1 ? map.RisesM[1] - map.RisesM[0] : 1e-3;
        var hm = plt.Add.Heatmap(data);
        hm.Extent = new CoordinateRect((map.LengthsM[0] - dl / 2) * 1e3, (map.LengthsM[^1] + dl / 2) * 1e3,
            (map.RisesM[0] - dh / 2) * 1e3, (map.RisesM[^1] + dh / 2) * 1e3);
        hm.Colormap = new ScottPlot.Colormaps.Viridis();
        var bar = plt.Add.ColorBar(hm);
        bar.Label = "search objective score, not axial ratio (capped at 40)";
        PlotStyle.Plain(bar.LabelStyle);
        PlotStyle.Plain(bar.Axis.Label);
        if (solvedLengthM is { } l && solvedRiseM is { } h)
        {
            var m = plt.Add.Marker(l * 1e3, h * 1e3);
            m.Color = PlotStyle.Vermillion;
            m.Size = 16;
            m.LineWidth = PlotStyle.LineWidth;
            m.Shape = MarkerShape.Cross;
            m.LegendText = "solution";
            plt.ShowLegend(Alignment.UpperRight);
        }
        plt.XLabel("element length (mm)");
        plt.YLabel("element rise (mm)");
        PlotStyle.Finish(plt, FormattableString.Invariant($"{name}: search objective map, {map.ElementCount} elements on {map.OuterDiameterM * 1e3:0.#} mm"));
        return Png(plt, Width, Height, ImageFormat.Png);
    }

    /// <summary>Highest top of the axial-ratio axis, dB: larger true values leave the view (they are not redrawn at it).</summary>
    public const double ArAxisDb = 40;

    /// <summary>Top of an axis whose data end at <paramref name="max"/> from <paramref name="low"/>: a third more, on a 5-unit step, for the legend.</summary>
    public static double AxisTop(double max, double low) => Math.Ceiling((low + (max - low) * 1.35) / 5) * 5;

    /// <summary>The band's low and high edges as dashed bluish-green lines, one legend entry for both.</summary>
    /// <summary>Frequency ticks as plain numbers (5100, not the charting library's grouped "5,100"):
    /// the unit stands in the axis title.</summary>
    private static void PlainFrequencyTicks(Plot plt) =>
        plt.Axes.Bottom.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic { LabelFormatter = v => SignedNumber.Plain(v, "0.##") };

    private static void BandEdges(Plot plt, PolarizerDesign design)
    {
        bool first = true;
        foreach (var edge in new[] { design.Band.LowHz, design.Band.HighHz })
        {
            var v = plt.Add.VerticalLine(edge / 1e6);
            v.Color = PlotStyle.BluishGreen;
            v.LineWidth = PlotStyle.GuideWidth;
            v.LinePattern = LinePattern.Dashed;
            if (first) v.LegendText = FormattableString.Invariant($"band edges {design.Band.LowHz / 1e6:0.#} and {design.Band.HighHz / 1e6:0.#} MHz");
            first = false;
        }
    }

    private static string Word(Sense s) => ChoiceWords.Label(s);

    private static string ElevationWord(double rad) => Math.Abs(rad) < 1e-9 ? "at the horizon" : FormattableString.Invariant($"{rad * 180 / Math.PI:0.#}° above the horizon");
}
