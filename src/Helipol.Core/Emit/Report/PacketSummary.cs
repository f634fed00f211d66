using System.Globalization;
using Helipol.Design;
using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Emit.Report;

/// <summary>
/// The lines on the build packet's summary page: what was solved and how well, in the words of
/// the report, so the paper packet and report.md never disagree.
/// </summary>
public static class PacketSummary
{
    public static IReadOnlyList<SummaryLine> Lines(PolarizerDesign design, SolvedPolarizer solved, SweepResult sweep, ToleranceResult tolerance)
    {
        static string F(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
        var l = solved.Layout;
        var practice = solved.Practice.Layout;
        string Source(bool pinned) => pinned ? "pinned in the design" : "solved";
        return
        [
            new("Design", design.Name),
            new("Band", F($"{design.Band.LowHz / 1e9:0.####} - {design.Band.HighHz / 1e9:0.####} GHz (centre {design.Band.CenterHz / 1e9:0.####} GHz)")),
            new("Whip", F($"{(design.Whip.Kind == WhipKind.Dipole ? "dipole" : "monopole")}, {design.Whip.LengthM * 1000:0.##} mm")),
            new("Sense / winding", F($"{(solved.Sense == Sense.Rhcp ? "RHCP" : "LHCP")} / {(solved.Winding == Winding.Right ? "right" : "left")} ({Source(solved.WindingPinned)})")),
            new("Elements", F($"{l.Count} ({Source(solved.CountPinned)})")),
            new("Element length", F($"{l.LengthM * 1000:0.00} mm ({Source(solved.LengthPinned)}); practice scaling {practice.LengthM * 1000:0.00} mm")),
            new("Element rise", F($"{l.RiseM * 1000:0.00} mm ({Source(solved.RisePinned)}); practice scaling {practice.RiseM * 1000:0.00} mm")),
            new("Former outer diameter", F($"{l.OuterDiameterM * 1000:0.00} mm ({Source(solved.DiameterPinned)})")),
            new("Worst axial ratio", F($"{solved.WorstAxialRatioDb:0.0} dB over the band and elevation window")),
            new("Mean gain, wanted sense", F($"{solved.MeanGainDbic:0.0} dBic")),
            new("Best axial ratio", sweep.BestArInsideSweep
                ? F($"{sweep.BestArDb:0.0} dB at {sweep.BestArFrequencyHz / 1e6:0.#} MHz")
                : F($"{(sweep.BestArAtTopEdge ? "above" : "below")} the sweep ({sweep.BestArDb:0.0} dB at its edge, {sweep.BestArFrequencyHz / 1e6:0.#} MHz)")),
            new("AR <= 3 dB bandwidth", sweep.BandwidthHz > 0
                ? F($"{sweep.BandwidthHz / 1e6:0.#} MHz ({100 * sweep.BandwidthHz / sweep.BestArFrequencyHz:0.0} %)")
                : "none: the axial ratio stays above 3 dB"),
            new("Tolerance yield", F($"{100 * tolerance.Yield:0.#} % of {tolerance.Builds} simulated builds reach AR <= 3 dB")),
            new("Trimming", tolerance.TrimmingSummary),
            new("Coating calibration", solved.Calibration.IsBorrowedFor(design.Polarizer)
                ? F($"factor {solved.Calibration.Factor:0.###}, borrowed from {solved.Calibration.MaterialSet}")
                : F($"factor {solved.Calibration.Factor:0.###}, measured on {solved.Calibration.MaterialSet}")),
        ];
    }
}
