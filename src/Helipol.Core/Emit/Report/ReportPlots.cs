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
    /// wrong-sense axial ratio is never drawn as if it were the wanted one.
    /// </summary>
    public static byte[] AxialRatioAndGain(SweepResult sweep, PolarizerDesign design)
    {
        var plt = new Plot();
        var f = sweep.Points.Select(p => p.Polarizer.FrequencyHz / 1e6).ToArray();
        var wanted = sweep.Points.Select(p => p.Polarizer.AllWantedSense).ToArray();
        var arDb = sweep.Points.Select(p => p.Polarizer.Worst.AxialRatioDb).ToArray();
        double arTop = Math.Min(ArAxisDb, AxisTop(arDb.Where((_, i) => wanted[i]).DefaultIfEmpty(3).Max(), 0));
        bool first = true;
        foreach (var (from, to) in Runs(wanted, true))
        {
            var ar = plt.Add.Scatter(f[from..(to + 1)], arDb[from..(to + 1)]);
            if (first) ar.LegendText = $"worst axial ratio, {Word(design.Polarizer.Sense)} (dB, left axis)";
            first = false;
            ar.MarkerSize = from == to ? 4 : 0;
            ar.LineWidth = 2;
            ar.Color = Colors.Black;
        }
        bool firstWrong = true;
        foreach (var (from, to) in Runs(wanted, false))
        {
            double step = f.Length > 1 ? (f[1] - f[0]) / 2 : 1;
            var span = plt.Add.HorizontalSpan(f[from] - step, f[to] + step);
            span.FillStyle.Color = Colors.Orange.WithAlpha(0.25);
            span.LineStyle.Width = 0;
            if (firstWrong) span.LegendText = $"wrong sense somewhere on the cone (not {Word(design.Polarizer.Sense)})";
            firstWrong = false;
        }
        var rh = plt.Add.Scatter(f, sweep.Points.Select(p => p.Polarizer.GainRhcpDbic).ToArray());
        rh.LegendText = "RHCP gain (dBic, right axis)";
        rh.MarkerSize = 0;
        rh.Color = Colors.Red;
        rh.Axes.YAxis = plt.Axes.Right;
        var lh = plt.Add.Scatter(f, sweep.Points.Select(p => p.Polarizer.GainLhcpDbic).ToArray());
        lh.LegendText = "LHCP gain (dBic, right axis)";
        lh.MarkerSize = 0;
        lh.Color = Colors.Blue;
        lh.Axes.YAxis = plt.Axes.Right;
        var realized = plt.Add.Scatter(f, sweep.Points.Select(p => p.Polarizer.RealizedGainDbic(design.Polarizer.Sense)).ToArray());
        realized.LegendText = FormattableString.Invariant($"realized {Word(design.Polarizer.Sense)} gain into {design.Solve.ReceiverOhm:0.#} Ω (dBic, right axis)");
        realized.MarkerSize = 0;
        realized.Color = design.Polarizer.Sense == Sense.Rhcp ? Colors.Red : Colors.Blue;
        realized.LinePattern = LinePattern.Dotted;
        realized.Axes.YAxis = plt.Axes.Right;
        var bare = plt.Add.Scatter(f, sweep.Points.Select(p => p.BareWhipRealizedGainDbic).ToArray());
        bare.LegendText = $"bare whip, realized {Word(design.Polarizer.Sense)} (dBic, right axis)";
        bare.MarkerSize = 0;
        bare.Color = Colors.Gray;
        bare.LinePattern = LinePattern.Dashed;
        bare.Axes.YAxis = plt.Axes.Right;
        var limit = plt.Add.HorizontalLine(sweep.LimitDb);
        limit.Color = Colors.Black.WithAlpha(0.4);
        limit.LinePattern = LinePattern.Dotted;
        BandEdges(plt, design);
        // Both axes set by hand: autoscaling let the AR curve run off the top, and the legend needs
        // free space above the curves. Axial ratios above the axis top leave the view; none is redrawn at the top.
        plt.Axes.SetLimitsY(0, arTop, plt.Axes.Left);
        var gains = sweep.Points.SelectMany(p => new[] { p.Polarizer.GainRhcpDbic, p.Polarizer.GainLhcpDbic, p.Polarizer.RealizedGainDbic(design.Polarizer.Sense), p.BareWhipRealizedGainDbic })
            .Where(double.IsFinite).Where(g => g > -60).ToArray();
        double gainLow = Math.Floor(gains.Min() / 5) * 5;
        plt.Axes.SetLimitsY(gainLow, AxisTop(gains.Max(), gainLow), plt.Axes.Right);
        bool clipped = arDb.Where((_, i) => wanted[i]).Any(a => a > arTop);
        plt.Title($"{design.Name}: axial ratio and gain, {ElevationWord(sweep.ElevationRad)}{(clipped ? FormattableString.Invariant($" (axial ratio above {arTop:0} dB off the axis)") : "")}");
        plt.XLabel("frequency (MHz)");
        plt.YLabel("axial ratio (dB)");
        plt.Axes.Right.Label.Text = "gain (dBic)";
        // Negative gains with the true minus sign, like every other figure helipol prints.
        plt.Axes.Right.TickGenerator = new ScottPlot.TickGenerators.NumericAutomatic { LabelFormatter = v => SignedNumber.Plain(v, "0.##") };
        plt.ShowLegend(Alignment.UpperRight);
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

    /// <summary>VSWR against the receiver impedance with and without the polarizer.</summary>
    public static byte[] Vswr(SweepResult sweep, PolarizerDesign design)
    {
        var plt = new Plot();
        var f = sweep.Points.Select(p => p.Polarizer.FrequencyHz / 1e6).ToArray();
        var with = plt.Add.Scatter(f, sweep.Points.Select(p => Math.Min(20, p.Polarizer.Vswr)).ToArray());
        with.LegendText = "with polarizer";
        with.MarkerSize = 0;
        with.Color = Colors.Black;
        var without = plt.Add.Scatter(f, sweep.Points.Select(p => Math.Min(20, p.BareWhipVswr)).ToArray());
        without.LegendText = "bare whip";
        without.MarkerSize = 0;
        without.Color = Colors.Gray;
        without.LinePattern = LinePattern.Dashed;
        BandEdges(plt, design);
        double top = sweep.Points.Max(p => Math.Max(Math.Min(20, p.Polarizer.Vswr), Math.Min(20, p.BareWhipVswr)));
        plt.Axes.SetLimitsY(1, AxisTop(double.IsFinite(top) ? top : 20, 1));
        plt.Title(FormattableString.Invariant($"{design.Name}: VSWR against {design.Solve.ReceiverOhm:0.#} Ω (axis ends at 20), band edges dashed"));
        plt.XLabel("frequency (MHz)");
        plt.YLabel("VSWR");
        plt.ShowLegend(Alignment.UpperRight);
        return Png(plt, Width, Height, ImageFormat.Png);
    }

    /// <summary>A polar plot of one cut: radius = gain above a floor 30 dB under the peak, RHCP and LHCP.</summary>
    public static byte[] Polar(PatternCut cut, string title)
    {
        var plt = new Plot();
        double peak = Math.Max(cut.GainRhcpDbic.Max(), cut.GainLhcpDbic.Max());
        double top = Math.Ceiling(peak / 5) * 5 + 0.0, floor = top - 30; // + 0.0 turns −0 into 0 for the label
        var axis = plt.Add.PolarAxis(30);
        axis.SetCircles(30, 6);
        axis.SetSpokes(12, 33, true);
        Coordinates[] Curve(double[] gains) => cut.AnglesDeg.Append(cut.AnglesDeg[0] + 360)
            .Zip(gains.Append(gains[0]), (a, g) => axis.GetCoordinates(Math.Max(0, g - floor), a)).ToArray();
        var r = plt.Add.Scatter(Curve(cut.GainRhcpDbic));
        r.LegendText = "RHCP";
        r.MarkerSize = 0;
        r.LineWidth = 2;
        r.Color = Colors.Red;
        var l = plt.Add.Scatter(Curve(cut.GainLhcpDbic));
        l.LegendText = "LHCP";
        l.MarkerSize = 0;
        l.LineWidth = 2;
        l.Color = Colors.Blue;
        plt.ShowLegend(Alignment.UpperRight);
        plt.Axes.Frameless();
        plt.HideGrid();
        // A frameless plot has no title panel: the title goes in as an annotation.
        plt.Add.Annotation(FormattableString.Invariant($"{title}; outer ring {SignedNumber.Plain(top, "0")} dBic, 5 dB per ring\nrealized gain into {cut.ReceiverOhm:0.#} Ω = gain {SignedNumber.Format(cut.MismatchDb, "0.00")} dB (mismatch)"), Alignment.UpperLeft);
        return Png(plt, PolarSize, PolarSize, ImageFormat.Png);
    }

    /// <summary>Heat map of the search's objective over element length × rise (blank: cannot be built).</summary>
    public static byte[] AxialRatioMap(AxialRatioMap map, double? solvedLengthM, double? solvedRiseM, string name)
    {
        var plt = new Plot();
        int nl = map.LengthsM.Length, nh = map.RisesM.Length;
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
        if (solvedLengthM is { } l && solvedRiseM is { } h)
        {
            var m = plt.Add.Marker(l * 1e3, h * 1e3);
            m.Color = Colors.Red;
            m.Size = 14;
            m.Shape = MarkerShape.Cross;
        }
        plt.Title($"{name}: search objective map, {map.ElementCount} elements on {map.OuterDiameterM * 1e3:0.#} mm");
        plt.XLabel("element length (mm)");
        plt.YLabel("element rise (mm)");
        return Png(plt, Width, Height, ImageFormat.Png);
    }

    /// <summary>Highest top of the axial-ratio axis, dB: larger true values leave the view (they are not redrawn at it).</summary>
    public const double ArAxisDb = 40;

    /// <summary>Top of an axis whose data end at <paramref name="max"/> from <paramref name="low"/>: a third more, on a 5-unit step, for the legend.</summary>
    public static double AxisTop(double max, double low) => Math.Ceiling((low + (max - low) * 1.35) / 5) * 5;

    /// <summary>The band's low and high edges as dashed green lines.</summary>
    private static void BandEdges(Plot plt, PolarizerDesign design)
    {
        foreach (var edge in new[] { design.Band.LowHz, design.Band.HighHz })
        {
            var v = plt.Add.VerticalLine(edge / 1e6);
            v.Color = Colors.Green.WithAlpha(0.6);
            v.LinePattern = LinePattern.Dashed;
        }
    }

    private static string Word(Sense s) => s == Sense.Rhcp ? "RHCP" : "LHCP";

    private static string ElevationWord(double rad) => Math.Abs(rad) < 1e-9 ? "at the horizon" : FormattableString.Invariant($"{rad * 180 / Math.PI:0.#}° above the horizon");
}
