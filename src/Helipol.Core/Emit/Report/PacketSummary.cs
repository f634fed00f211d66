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
        var verdict = VerdictJudge.For(design, solved, tolerance);
        return
        [
            new("Verdict", verdict.Grade.Word().ToUpperInvariant()),
            new("Deciding figures", verdict.Figures),
            new("Next step", verdict.NextStep),
            new("Design", design.Name),
            new("Band", F($"{design.Band.LowHz / 1e9:0.####} - {design.Band.HighHz / 1e9:0.####} GHz (centre {design.Band.CenterHz / 1e9:0.####} GHz)")),
            new("Whip", F($"{ChoiceWords.WhipKind.Word(design.Whip.Kind)}, {design.Whip.LengthM * 1000:0.##} mm")),
            new("Sense / winding", F($"{ChoiceWords.Label(solved.Sense)} / {ChoiceWords.Winding.Word(solved.Winding)} ({Source(solved.WindingPinned)})")),
            new("Elements", F($"{l.Count} ({Source(solved.CountPinned)})")),
            new("Element length", F($"{l.LengthM * 1000:0.00} mm ({Source(solved.LengthPinned)}); practice scaling {practice.LengthM * 1000:0.00} mm")),
            new("Cut to within", double.IsFinite(tolerance.CutToleranceMm) && tolerance.CutToleranceMm > 0
                ? F($"±{tolerance.CutToleranceMm:0.0#} mm in length, ±{tolerance.RiseToleranceMm:0.0#} mm in rise (best AR stays in the band in 90 % of builds)")
                : tolerance.CutText),
            new("Element rise", F($"{l.RiseM * 1000:0.00} mm ({Source(solved.RisePinned)}); practice scaling {practice.RiseM * 1000:0.00} mm")),
            new("Former outer diameter", F($"{l.OuterDiameterM * 1000:0.00} mm ({Source(solved.DiameterPinned)})")),
            new("Worst axial ratio", $"{ReportMarkdown.Worst(solved.Points, solved.Sense)} over the band and coverage window"),
            new("Mean gain, wanted sense", F($"{SignedNumber.Plain(solved.MeanGainDbic)} dBic, realized {SignedNumber.Plain(solved.MeanRealizedGainDbic)} dBic into {design.Solve.ReceiverOhm:0.#} ohm")),
            new("Best axial ratio", !double.IsFinite(sweep.BestArDb)
                ? F($"wrong sense in part of the cone even at its best point ({sweep.BestArFrequencyHz / 1e6:0.#} MHz)")
                : sweep.BestArInsideSweep
                ? F($"{sweep.BestArDb:0.0} dB at {sweep.BestArFrequencyHz / 1e6:0.#} MHz")
                : F($"{(sweep.BestArAtTopEdge ? "above" : "below")} the sweep ({sweep.BestArDb:0.0} dB at its edge, {sweep.BestArFrequencyHz / 1e6:0.#} MHz)")),
            new(F($"AR <= {sweep.LimitDb:0.#} dB bandwidth"), sweep.BandwidthHz > 0
                ? F($"{sweep.BandwidthHz / 1e6:0.#} MHz ({100 * sweep.BandwidthHz / sweep.BestArFrequencyHz:0.0} %)")
                : F($"none: the axial ratio stays above {sweep.LimitDb:0.#} dB")),
            new("Tolerance yield", F($"{100 * tolerance.Yield:0.#} % of {tolerance.Builds} simulated builds keep AR <= {tolerance.LimitDb:0.#} dB in the wanted sense over band and window")),
            new("Trimming", tolerance.TrimmingSummary),
            new("Coating calibration", solved.Calibration.IsBorrowedFor(design.Polarizer)
                ? F($"factor {solved.Calibration.Factor:0.###}, borrowed from {solved.Calibration.MaterialSet}")
                : F($"factor {solved.Calibration.Factor:0.###}, measured on {solved.Calibration.MaterialSet}")),
        ];
    }
}
