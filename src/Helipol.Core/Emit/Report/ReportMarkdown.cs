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
        string sense = s.Sense == Sense.Rhcp ? "RHCP" : "LHCP";
        string winding = s.Winding == Winding.Left ? "left" : "right";
        double centre = design.Band.CenterHz;

        L($"# {design.Name}: solved polarizer");
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
        L($"| winding | {winding} | {(s.Practice.Winding == Winding.Left ? "left" : "right")} (builders' rule) | {(s.WindingPinned ? "design file" : "field model")} |");
        L($"| worst AR over band and window, {sense} | {s.WorstAxialRatioDb:0.0} dB | {Worst(s.Practice)} | |");
        L($"");
        L($"Right winding means the azimuth grows as the element rises; left means it falls, so seen from outside a left-wound element descends to the right.");
        L($"The field model chose the {winding} winding because it gives {sense} here; the builders' rule says elements descending to the right give RHCP (common practice, no source){(RuleAgrees(s) ? ", and the model agrees." : ". The model disagrees for this geometry: see below.")}");
        L($"");
        L($"## How it was solved");
        L($"");
        L($"A thin-wire method-of-moments model of the whip and the elements (triangle basis, Galerkin, reduced kernel) is solved at {design.Solve.FrequencyCount} frequencies across the band; the far field is sampled every {design.Solve.AzimuthStepRad * 180 / Math.PI:0.#}° of azimuth at elevations {design.Solve.ElevationFromRad * 180 / Math.PI:0.#}° to {design.Solve.ElevationToRad * 180 / Math.PI:0.#}°. The objective is the {(design.Solve.Objective == Objective.MeanAxialRatio ? "mean" : "worst")} axial ratio in the wanted sense (a wrong-sense direction always scores worse than any right-sense one) minus {design.Solve.GainWeight:0.##} × the mean {sense} gain in dBic.");
        foreach (var step in s.Search.Steps) L($"- {step}");
        L($"- {s.Search.Evaluations} geometries scored, {s.FieldSolves} field solves in all.");
        L($"");
        L($"The step figures are objective scores (axial ratio in dB less the weighted gain), not axial ratios; the band table below gives the axial ratio itself.");
        if (s.Search.LimitsReached.Count > 0)
        {
            L($"");
            L($"**At a search limit:** {string.Join("; ", s.Search.LimitsReached)}. The objective may keep improving beyond it: widen that range (or change the limit) in the design file and solve again.");
        }
        L($"");
        L($"Dielectric around the elements (former contact, glue, wrap) enters as an effective coating (Richmond and Newman's coated-wire inductance, partial coverage by mixing, see Design/Wires/EffectiveCoating.cs) with {s.Calibration.DescribeFor(design.Polarizer)}: {s.Calibration.Source}; {s.Calibration.FittedBy}.");
        L($"");
        L($"## Band");
        L($"");
        L($"| frequency | impedance | VSWR 50 Ω | worst AR ({sense}) | mean AR | sense | RHCP | LHCP |");
        L($"|---|---|---|---|---|---|---|---|");
        foreach (var p in s.Points)
            L($"| {p.FrequencyHz / 1e6:0.###} MHz | {p.ImpedanceOhm.Real:0.0} {(p.ImpedanceOhm.Imaginary < 0 ? "−" : "+")} j{Math.Abs(p.ImpedanceOhm.Imaginary):0.0} Ω | {p.Vswr50:0.00} | {p.WorstScoreDb:0.0} dB | {p.MeanAxialRatioDb:0.0} dB | {SolvedJson.SenseWord(p.Sense)} | {p.GainRhcpDbic:0.00} dBic | {p.GainLhcpDbic:0.00} dBic |");
        L($"");
        L($"![axial ratio and gain](ar-gain.png)");
        L($"");
        L($"On the analysis cone ({(sweep.ElevationRad == 0 ? "the horizon" : $"{sweep.ElevationRad * 180 / Math.PI:0.#}° above the ground")}, every 5° of azimuth) {BestAr(sweep)} {Bandwidth(sweep, centre)}");
        L($"");
        var mid = sweep.Points.OrderBy(p => Math.Abs(p.Polarizer.FrequencyHz - centre)).First();
        L($"## Against the bare whip");
        L($"");
        L($"At {mid.Polarizer.FrequencyHz / 1e6:0.#} MHz, into a {sense} receiver on the analysis cone (mean over azimuth): {mid.Polarizer.GainDbic(s.Sense):0.00} dBic with the polarizer, {mid.BareWhipGainDbic:0.00} dBic for the bare whip ({mid.Polarizer.GainDbic(s.Sense) - mid.BareWhipGainDbic:+0.00;−0.00} dB). A linear whip gives away 3 dB to a circular partner by polarization mismatch alone. VSWR against 50 Ω goes from {mid.BareWhipVswr50:0.00} (bare) to {mid.Polarizer.Vswr50:0.00} (with the polarizer): the elements detune the whip.");
        L($"");
        L($"![VSWR](vswr.png)");
        L($"");
        L($"## Pattern cuts at {centre / 1e6:0.###} MHz");
        L($"");
        L($"![azimuth cut](pattern-azimuth.png) ![elevation cut](pattern-elevation.png)");
        L($"");
        L($"## Axial-ratio map");
        L($"");
        if (s.Search.Map.LengthsM.Length * s.Search.Map.RisesM.Length == 1)
            L($"Element length and rise are both pinned, so there was no map to search: the plot holds the one geometry as written.");
        else
            L($"The coarse search map over element length × rise ({s.Search.Map.ElementCount} elements on {s.Search.Map.OuterDiameterM * 1e3:0.#} mm; blank cells cannot be built). The cross marks the solution.");
        L($"");
        L($"![axial-ratio map](ar-map.png)");
        L($"");
        L($"## Tolerance");
        L($"");
        L($"{tolerance.Builds} simulated builds (seed {tolerance.Seed}; every element ±{design.Tolerance.ElementLengthM * 1e3:0.##} mm in length, ±{design.Tolerance.ElementRiseM * 1e3:0.##} mm in rise, ±{design.Tolerance.AzimuthRad * 180 / Math.PI:0.#}° in placement; wrap ±{design.Tolerance.WrapThicknessFraction * 100:0}% thick), judged at band low, centre and high on the analysis cone every 10° of azimuth:");
        L($"");
        L($"- yield (worst AR ≤ 3 dB): {tolerance.Yield * 100:0.#} %");
        L($"- worst AR percentiles: 10 % {tolerance.ArP10Db:0.0} dB, median {tolerance.ArP50Db:0.0} dB, 90 % {tolerance.ArP90Db:0.0} dB");
        L($"- sensitivity at the centre: {tolerance.ArPerMmLengthDb:+0.0;−0.0} dB of AR per mm of length, {tolerance.ArPerMmRiseDb:+0.0;−0.0} dB per mm of rise");
        if (double.IsFinite(tolerance.BestArMHzPerMmLength) && double.IsFinite(tolerance.BestArMHzPerMmRise))
            L($"- best-AR frequency: {tolerance.BestArMHzPerMmLength:+0.0;−0.0} MHz per mm of length, {tolerance.BestArMHzPerMmRise:+0.0;−0.0} MHz per mm of rise");
        else
            L($"- best-AR frequency: no minimum within ±8 % of the centre, so its sensitivity is not defined");
        L($"- {tolerance.TrimmingHint}.");
        L($"");
        L($"## Practice scaling beside the solution");
        L($"");
        L($"Practice scaling is the builders' 5.8 GHz rule (about 16 mm elements, 12.7 mm rise, common practice, no source) scaled by wavelength, with pinned values kept. It is {(s.Practice.Layout.LengthM - s.Layout.LengthM) * 1e3:+0.00;−0.00} mm in length and {(s.Practice.Layout.RiseM - s.Layout.RiseM) * 1e3:+0.00;−0.00} mm in rise from the solution; its worst AR in the same window is {Worst(s.Practice)}.");
        L($"The rule was stated for one build (foam, PVC tape, 5.8 GHz); the field model includes this design's own whip, former diameter, wire and wrap, so the two differ wherever those differ, and the model's dielectric loading rests on one calibration (factor {s.Calibration.Factor:0.###}).");
        if (s.Practice.Problem is { } problem) L($"The practice layout could not be modelled: {problem}");
        if (s.Calibration.Factor == CoatingCalibration.DefaultFactor)
        {
            L($"");
            L($"{CoatingCalibration.DefaultComparison}");
        }
        return r.ToString();
    }

    private static bool RuleAgrees(SolvedPolarizer s) => PracticeScaling.WindingFor(s.Sense) == s.Winding;

    private static string Worst(PracticeComparison p) => p.ObjectiveDb is null ? "not modelled" : string.Create(CultureInfo.InvariantCulture, $"{p.Points.Max(x => x.WorstScoreDb):0.0} dB");

    /// <summary>The best AR of the sweep, or, when its lowest point is a sweep edge, that the minimum lies beyond it.</summary>
    public static string BestAr(SweepResult sweep) => sweep.BestArInsideSweep
        ? string.Create(CultureInfo.InvariantCulture, $"the best axial ratio is {sweep.BestArDb:0.0} dB at {sweep.BestArFrequencyHz / 1e6:0.#} MHz.")
        : string.Create(CultureInfo.InvariantCulture, $"the axial ratio is still falling at the sweep's {(sweep.BestArAtTopEdge ? "top" : "bottom")} edge ({sweep.BestArDb:0.0} dB at {sweep.BestArFrequencyHz / 1e6:0.#} MHz), so its minimum lies {(sweep.BestArAtTopEdge ? "above" : "below")} the sweep.");

    private static string Bandwidth(SweepResult sweep, double centre) => sweep.BandwidthHz > 0
        ? string.Create(CultureInfo.InvariantCulture, $"AR stays ≤ 3 dB from {sweep.BandwidthLowHz / 1e6:0.#} to {sweep.BandwidthHighHz / 1e6:0.#} MHz: {sweep.BandwidthHz / 1e6:0.#} MHz, {sweep.BandwidthHz / centre * 100:0.##} % of the centre frequency.")
        : "AR never reaches 3 dB on this cone, so there is no 3 dB axial-ratio bandwidth.";
}
