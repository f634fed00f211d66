using System.Globalization;
using System.Text;
using Helipol.Design;
using Helipol.Model;

namespace Helipol.Emit.Report;

/// <summary>
/// <c>report.md</c>: what was solved and why, in plain words and tables, with the plots beside
/// it. Numbers in invariant culture; no dates, so the same results give the same bytes.
/// </summary>
public static class ReportMarkdown
{
    public static string Write(PolarizerDesign design, SolvedPolarizer s, SweepResult sweep, ToleranceResult tolerance)
    {
        var r = new StringBuilder();
        void L(FormattableString line) => r.Append(line.ToString(CultureInfo.InvariantCulture)).Append('\n');
        string sense = ChoiceWords.Label(s.Sense);
        string winding = ChoiceWords.Winding.Word(s.Winding);
        double centre = design.Band.CenterHz;

        L($"# {design.Name}: solved polarizer");
        L($"");
        var verdict = VerdictJudge.For(design, s, tolerance);
        L($"**Verdict: {verdict.Grade.Word()}.** {verdict.Figures}. Next step: {verdict.NextStep}.");
        L($"");
        foreach (var reason in verdict.Reasons) L($"- {reason}");
        L($"");
        L($"Band {design.Band.LowHz / 1e6:0.###}-{design.Band.HighHz / 1e6:0.###} MHz (centre {centre / 1e6:0.###} MHz), {design.Whip.LengthM * 1e3:0.##} mm {(design.Whip.Kind == WhipKind.Monopole ? "monopole whip on a ground plane" : "dipole whip")}, wanted sense {sense}.");
        L($"");
        L($"## What to build");
        L($"");
        L($"| quantity | solved | practice scaling | from |");
        L($"|---|---|---|---|");
        L($"| elements | {s.Layout.Count} | {s.Practice.Layout.Count} | {(s.CountPinned ? "design file" : "search")} |");
        L($"| element length | {s.Layout.LengthM * 1e3:0.00} mm | {s.Practice.Layout.LengthM * 1e3:0.00} mm | {(s.LengthPinned ? "design file" : "search")} |");
        L($"| element rise | {s.Layout.RiseM * 1e3:0.00} mm | {s.Practice.Layout.RiseM * 1e3:0.00} mm | {(s.RisePinned ? "design file" : "search")} |");
        L($"| former outer diameter | {s.Layout.OuterDiameterM * 1e3:0.00} mm | {s.Practice.Layout.OuterDiameterM * 1e3:0.00} mm | {(s.DiameterPinned ? "design file" : "search")} |");
        L($"| arc angle | {s.Layout.ArcAngleRad * 180 / Math.PI:0.0}° | {s.Practice.Layout.ArcAngleRad * 180 / Math.PI:0.0}° | derived |");
        L($"| winding | {winding} | {ChoiceWords.Winding.Word(s.Practice.Winding)} (builders' rule) | {(s.WindingPinned ? "design file" : "field model")} |");
        L($"| worst axial ratio over band and window | {Worst(s.Points, s.Sense)} | {Worst(s.Practice.Points, s.Sense, s.Practice.ObjectiveDb is null)} | |");
        L($"");
        L($"Right winding means the azimuth grows as the element rises; left means it falls, so seen from outside a left-wound element descends to the right.");
        L($"The field model chose the {winding} winding because it gives {sense} here; the builders' rule says elements descending to the right give RHCP (common practice, no source){(RuleAgrees(s) ? ", and the model agrees." : ". The model disagrees for this geometry: see below.")}");
        L($"");
        L($"## How it was solved");
        L($"");
        L($"A thin-wire method-of-moments model of the whip and the elements (triangle basis, Galerkin, reduced kernel) is solved at {design.Solve.FrequencyCount} frequencies across the band; the far field is sampled every {design.Solve.AzimuthStepRad * 180 / Math.PI:0.#}° of azimuth at elevations {SignedNumber.Plain(design.Solve.ElevationFromRad * 180 / Math.PI, "0.#")}° to {SignedNumber.Plain(design.Solve.ElevationToRad * 180 / Math.PI, "0.#")}°{(design.Solve.AzimuthSpanRad < 2 * Math.PI - 1e-9 ? $", azimuths within ±{design.Solve.AzimuthSpanRad * 90 / Math.PI:0.#}°" : "")}. The objective is the {(design.Solve.Objective == Objective.MeanAxialRatio ? "mean" : "worst")} axial ratio in the wanted sense (a wrong-sense direction always scores worse than any right-sense one) minus {design.Solve.GainWeight:0.##} × the mean {sense} gain in dBic.");
        foreach (var step in s.Search.Steps) L($"- {step}");
        L($"- {s.Search.Evaluations} geometries scored, {s.FieldSolves} field solves in all.");
        L($"");
        L($"The step figures are objective scores (the axial-ratio score, which grows on past linear into the wrong sense, less the weighted gain), not axial ratios; the band table below gives the axial ratio itself.");
        if (s.Search.LimitsReached.Count > 0)
        {
            L($"");
            L($"**At a search limit:** {string.Join("; ", s.Search.LimitsReached)}. The objective may keep improving beyond it: widen that range (or change the limit) in the design file and solve again.");
        }
        L($"");
        L($"Dielectric around the elements (former contact, glue, wrap) enters as an added series inductance per unit length from a 2-D field solve of the element's cross-section (Design/Loading), handed to the engine as the equivalent coated wire of Richmond and Newman with {s.Calibration.DescribeFor(design.Polarizer)}: {s.Calibration.Source}; {s.Calibration.FittedBy}.");
        if (s.Loading is { } loading) L($"{LoadingLine(loading)}");
        L($"");
        L($"## Band");
        L($"");
        L($"Over the coverage window ({VerdictJudge.Window(design)}); axial ratios are true axial ratios with the sense they have; the worst direction is the one furthest from {sense} (the one with the largest axial ratio while every direction is {sense}). Gains are means over the window; realized gains count the mismatch to {design.Solve.ReceiverOhm:0.#} Ω (IEEE Std 145).");
        L($"");
        L($"| frequency | impedance | VSWR {design.Solve.ReceiverOhm:0.#} Ω | worst direction AR | its sense | wrong sense | mean AR | RHCP | LHCP | realized RHCP | realized LHCP |");
        L($"|---|---|---|---|---|---|---|---|---|---|---|");
        foreach (var p in s.Points)
            L($"| {p.FrequencyHz / 1e6:0.###} MHz | {p.ImpedanceOhm.Real:0.0} {(p.ImpedanceOhm.Imaginary < 0 ? "−" : "+")} j{Math.Abs(p.ImpedanceOhm.Imaginary):0.0} Ω | {p.Vswr:0.00} | {p.Worst.AxialRatioDb:0.0} dB | {SolvedJson.SenseWord(p.Worst.Sense)} | {p.WrongSenseShare * 100:0} % of directions | {p.MeanAxialRatioDb:0.0} dB | {G(p.GainRhcpDbic)} | {G(p.GainLhcpDbic)} | {G(p.RealizedGainRhcpDbic)} | {G(p.RealizedGainLhcpDbic)} |");
        L($"");
        L($"![axial ratio and gain](ar-gain.png)");
        L($"");
        L($"On the analysis cone ({(sweep.ElevationRad == 0 ? "the horizon" : $"{sweep.ElevationRad * 180 / Math.PI:0.#}° above the ground")}, every 5° of azimuth) {BestAr(sweep)} {Bandwidth(sweep, centre)}");
        L($"");
        var mid = sweep.Points.OrderBy(p => Math.Abs(p.Polarizer.FrequencyHz - centre)).First();
        L($"## Against the bare whip");
        L($"");
        double withGain = mid.Polarizer.RealizedGainDbic(s.Sense), bareGain = mid.BareWhipRealizedGainDbic;
        L($"At {mid.Polarizer.FrequencyHz / 1e6:0.#} MHz, into an {sense} receiver of {design.Solve.ReceiverOhm:0.#} Ω on the analysis cone (mean over azimuth), realized gain (gain × (1 − |Γ|²), IEEE Std 145): {G(withGain)} with the polarizer, {G(bareGain)} for the bare whip ({SignedNumber.Format(withGain - bareGain, "0.00")} dB; without the mismatch {G(mid.Polarizer.GainDbic(s.Sense))} against {G(mid.BareWhipGainDbic)}, {SignedNumber.Format(mid.Polarizer.GainDbic(s.Sense) - mid.BareWhipGainDbic, "0.00")} dB). A linear whip gives away 3 dB to a circular partner by polarization mismatch alone. VSWR against {design.Solve.ReceiverOhm:0.#} Ω goes from {mid.BareWhipVswr:0.00} (bare) to {mid.Polarizer.Vswr:0.00} (with the polarizer): the elements detune the whip.");
        L($"");
        L($"![VSWR](vswr.png)");
        L($"");
        L($"## Pattern cuts at {centre / 1e6:0.###} MHz");
        L($"");
        L($"![azimuth cut](pattern-azimuth.png) ![elevation cut](pattern-elevation.png)");
        L($"");
        L($"## Search map");
        L($"");
        if (s.Search.Map.LengthsM.Length * s.Search.Map.RisesM.Length == 1)
            L($"Element length and rise are both pinned, so there was no map to search: the plot holds the one geometry as written.");
        else
            L($"The coarse search map over element length × rise ({s.Search.Map.ElementCount} elements on {s.Search.Map.OuterDiameterM * 1e3:0.#} mm; blank cells cannot be built). Its colours are the search's objective score, not an axial ratio: the score equals the worst axial ratio only while that is under 30 dB in the wanted sense, and grows on through linear into the wrong sense. The cross marks the solution.");
        L($"");
        L($"![search objective map](ar-map.png)");
        L($"");
        L($"## Assembly and bench checks");
        L($"");
        L($"The packet's assembly steps and bench checks, with the views drawn from this design's geometry (print packet.pdf to build; these are for the screen).");
        L($"");
        L($"![assembly steps and bench checks](assembly.png)");
        L($"");
        L($"## Tolerance");
        L($"");
        L($"{tolerance.Builds} simulated builds (seed {tolerance.Seed}; every element ±{design.Tolerance.ElementLengthM * 1e3:0.##} mm in length, ±{design.Tolerance.ElementRiseM * 1e3:0.##} mm in rise, ±{design.Tolerance.AzimuthRad * 180 / Math.PI:0.#}° in placement; wrap ±{design.Tolerance.WrapThicknessFraction * 100:0}% thick), judged like the verdict: at band low, centre and high over the coverage window ({VerdictJudge.Window(design)}, elevations at least 10° apart, every 10° of azimuth):");
        L($"");
        L($"- yield (every direction {sense} with axial ratio ≤ {tolerance.LimitDb:0.#} dB): {tolerance.Yield * 100:0.#} %; short of failing (≤ {tolerance.LimitDb + VerdictJudge.MarginalArExtraDb:0.#} dB): {tolerance.UsableYield * 100:0.#} %");
        L($"- worst axial ratio percentiles (wrong sense counts as infinite): 10 % {ArText(tolerance.ArP10Db)}, median {ArText(tolerance.ArP50Db)}, 90 % {ArText(tolerance.ArP90Db)}");
        L($"- {tolerance.CutText}");
        L($"- sensitivity at the centre on the analysis cone: {SignedNumber.Format(tolerance.ArPerMmLengthDb)} dB of axial ratio per mm of length, {SignedNumber.Format(tolerance.ArPerMmRiseDb)} dB per mm of rise");
        if (double.IsFinite(tolerance.BestArMHzPerMmLength) && double.IsFinite(tolerance.BestArMHzPerMmRise))
            L($"- best-AR frequency: {SignedNumber.Format(tolerance.BestArMHzPerMmLength)} MHz per mm of length, {SignedNumber.Format(tolerance.BestArMHzPerMmRise)} MHz per mm of rise");
        else
            L($"- best-AR frequency: no minimum within ±8 % of the centre, so its sensitivity is not defined");
        L($"- {tolerance.TrimmingHint}.");
        L($"");
        L($"## Practice scaling beside the solution");
        L($"");
        L($"Practice scaling is the builders' 5.8 GHz rule (about 16 mm elements, 12.7 mm rise, common practice, no source) scaled by wavelength, with pinned values kept. It is {SignedNumber.Format((s.Practice.Layout.LengthM - s.Layout.LengthM) * 1e3, "0.00")} mm in length and {SignedNumber.Format((s.Practice.Layout.RiseM - s.Layout.RiseM) * 1e3, "0.00")} mm in rise from the solution; its worst axial ratio in the same window is {Worst(s.Practice.Points, s.Sense, s.Practice.ObjectiveDb is null)}.");
        L($"The rule was stated for one build (foam, PVC tape, 5.8 GHz); the field model includes this design's own whip, former diameter, wire and wrap, so the two differ wherever those differ, and the model's dielectric loading is the field solve times a factor of {s.Calibration.Factor:0.###}.");
        if (s.Practice.Problem is { } problem) L($"The practice layout could not be modelled: {problem}");
        if (s.Calibration.Factor == CoatingCalibration.DefaultFactor)
        {
            L($"");
            L($"{CoatingCalibration.DefaultComparison}");
        }
        return r.ToString();
    }

    /// <summary>The loading in one paragraph: the added inductance, each layer's share, the shortening against a bare element.</summary>
    public static string LoadingLine(Helipol.Design.Loading.LoadingSummary l) => FormattableString.Invariant(
        $"Element loading: {l.AddedHPerM * 1e9:0.#} nH/m added ({l.PhysicsHPerM * 1e9:0.#} nH/m from the field solve × factor {l.Factor:0.###}); of the layers taken one at a time, the wrap gives {100 * l.WrapShare:0} %, the glue {100 * l.GlueShare:0} % and the former {100 * l.FormerShare:0} %. A straight element of the solved length resonates {l.ShorteningPercent:0.0} % lower than the same wire bare, so it is cut about that much shorter than a bare element would be.");

    private static bool RuleAgrees(SolvedPolarizer s) => PracticeScaling.WindingFor(s.Sense) == s.Winding;

    /// <summary>The worst true axial ratio in the wanted sense, or where the wrong sense appears.</summary>
    public static string Worst(IReadOnlyList<FrequencySummary> points, Sense sense, bool notModelled = false)
    {
        if (notModelled || points.Count == 0) return "not modelled";
        var inv = CultureInfo.InvariantCulture;
        var w = points.MaxBy(p => p.WorstScoreDb)!;
        string word = ChoiceWords.Label(sense);
        return w.AllWantedSense && points.All(p => p.AllWantedSense)
            ? string.Create(inv, $"{points.Max(p => p.WorstWantedAxialRatioDb):0.0} dB {word}")
            : string.Create(inv, $"wrong sense: {SolvedJson.SenseWord(w.Worst.Sense)}, axial ratio {w.Worst.AxialRatioDb:0.0} dB at {w.FrequencyHz / 1e6:0.#} MHz, {SignedNumber.Plain(w.Worst.Direction.ElevationRad * 180 / Math.PI, "0.#")}° elevation");
    }

    private static string G(double dbic) => SignedNumber.Plain(dbic, "0.00") + " dBic";

    private static string ArText(double db) => double.IsFinite(db) ? string.Create(CultureInfo.InvariantCulture, $"{db:0.0} dB") : "wrong sense";

    /// <summary>The best AR of the sweep, or, when its lowest point is a sweep edge, that the minimum lies beyond it.</summary>
    public static string BestAr(SweepResult sweep) => !double.IsFinite(sweep.BestArDb)
        ? string.Create(CultureInfo.InvariantCulture, $"even at its best point ({sweep.BestArFrequencyHz / 1e6:0.#} MHz) part of the cone radiates the wrong sense.")
        : sweep.BestArInsideSweep
        ? string.Create(CultureInfo.InvariantCulture, $"the best axial ratio is {sweep.BestArDb:0.0} dB at {sweep.BestArFrequencyHz / 1e6:0.#} MHz.")
        : string.Create(CultureInfo.InvariantCulture, $"the axial ratio is still falling at the sweep's {(sweep.BestArAtTopEdge ? "top" : "bottom")} edge ({sweep.BestArDb:0.0} dB at {sweep.BestArFrequencyHz / 1e6:0.#} MHz), so its minimum lies {(sweep.BestArAtTopEdge ? "above" : "below")} the sweep.");

    private static string Bandwidth(SweepResult sweep, double centre) => sweep.BandwidthHz > 0
        ? string.Create(CultureInfo.InvariantCulture, $"The axial ratio stays ≤ {sweep.LimitDb:0.#} dB in the wanted sense from {sweep.BandwidthLowHz / 1e6:0.#} to {sweep.BandwidthHighHz / 1e6:0.#} MHz: {sweep.BandwidthHz / 1e6:0.#} MHz, {sweep.BandwidthHz / centre * 100:0.##} % of the centre frequency.")
        : string.Create(CultureInfo.InvariantCulture, $"The axial ratio never comes down to {sweep.LimitDb:0.#} dB in the wanted sense on this cone, so there is no axial-ratio bandwidth.");
}
