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

    /// <summary>Axial ratio (wanted sense) and circular gains against frequency, with the bare whip's gain and the band edges.</summary>
    public static byte[] AxialRatioAndGain(SweepResult sweep, PolarizerDesign design)
    {
        var plt = new Plot();
        var f = sweep.Points.Select(p => p.Polarizer.FrequencyHz / 1e6).ToArray();
        var arDb = sweep.Points.Select(p => Math.Min(ArCapDb, p.Polarizer.WorstScoreDb)).ToArray();
        var ar = plt.Add.Scatter(f, arDb);
        ar.LegendText = $"worst AR, {Word(design.Polarizer.Sense)} (dB, left axis)";
        ar.MarkerSize = 0;
        ar.LineWidth = 2;
        ar.Color = Colors.Black;
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
        var bare = plt.Add.Scatter(f, sweep.Points.Select(p => p.BareWhipGainDbic).ToArray());
        bare.LegendText = $"bare whip, {Word(design.Polarizer.Sense)} (dBic, right axis)";
        bare.MarkerSize = 0;
        bare.Color = Colors.Gray;
        bare.LinePattern = LinePattern.Dashed;
        bare.Axes.YAxis = plt.Axes.Right;
        var limit = plt.Add.HorizontalLine(3);
        limit.Color = Colors.Black.WithAlpha(0.4);
        limit.LinePattern = LinePattern.Dotted;
        BandEdges(plt, design);
        // Both axes set by hand: autoscaling let the AR curve run off the top, and the legend needs
        // free space above the curves.
        plt.Axes.SetLimitsY(0, AxisTop(arDb.Max(), 0), plt.Axes.Left);
        var gains = sweep.Points.SelectMany(p => new[] { p.Polarizer.GainRhcpDbic, p.Polarizer.GainLhcpDbic, p.BareWhipGainDbic }).Where(double.IsFinite).ToArray();
        double gainLow = Math.Floor(gains.Min() / 5) * 5;
        plt.Axes.SetLimitsY(gainLow, AxisTop(gains.Max(), gainLow), plt.Axes.Right);
        plt.Title($"{design.Name}: axial ratio and gain, {ElevationWord(sweep.ElevationRad)}{(arDb.Max() >= ArCapDb ? FormattableString.Invariant($" (AR capped at {ArCapDb:0} dB)") : "")}");
        plt.XLabel("frequency (MHz)");
        plt.YLabel("axial ratio (dB)");
        plt.Axes.Right.Label.Text = "gain (dBic)";
        plt.ShowLegend(Alignment.UpperRight);
        return Png(plt, Width, Height, ImageFormat.Png);
    }

    /// <summary>VSWR against 50 Ω with and without the polarizer.</summary>
    public static byte[] Vswr(SweepResult sweep, PolarizerDesign design)
    {
        var plt = new Plot();
        var f = sweep.Points.Select(p => p.Polarizer.FrequencyHz / 1e6).ToArray();
        var with = plt.Add.Scatter(f, sweep.Points.Select(p => Math.Min(20, p.Polarizer.Vswr50)).ToArray());
        with.LegendText = "with polarizer";
        with.MarkerSize = 0;
        with.Color = Colors.Black;
        var without = plt.Add.Scatter(f, sweep.Points.Select(p => Math.Min(20, p.BareWhipVswr50)).ToArray());
        without.LegendText = "bare whip";
        without.MarkerSize = 0;
        without.Color = Colors.Gray;
        without.LinePattern = LinePattern.Dashed;
        BandEdges(plt, design);
        double top = sweep.Points.Max(p => Math.Max(Math.Min(20, p.Polarizer.Vswr50), Math.Min(20, p.BareWhipVswr50)));
        plt.Axes.SetLimitsY(1, AxisTop(double.IsFinite(top) ? top : 20, 1));
        plt.Title($"{design.Name}: VSWR against 50 Ω (capped at 20), band edges dashed");
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
        plt.Add.Annotation(FormattableString.Invariant($"{title}; outer ring {top:0} dBic, 5 dB per ring"), Alignment.UpperLeft);
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
        bar.Label = "objective (dB, capped at 40)";
        if (solvedLengthM is { } l && solvedRiseM is { } h)
        {
            var m = plt.Add.Marker(l * 1e3, h * 1e3);
            m.Color = Colors.Red;
            m.Size = 14;
            m.Shape = MarkerShape.Cross;
        }
        plt.Title($"{name}: axial-ratio map, {map.ElementCount} elements on {map.OuterDiameterM * 1e3:0.#} mm");
        plt.XLabel("element length (mm)");
        plt.YLabel("element rise (mm)");
        return Png(plt, Width, Height, ImageFormat.Png);
    }

    /// <summary>Axial ratios above this are drawn at it, dB: past it the curve says nothing a builder can use.</summary>
    public const double ArCapDb = 40;

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
