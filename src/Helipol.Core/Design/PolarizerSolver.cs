using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// Solves a design: search (see <see cref="PolarizerSearch"/>), then the chosen geometry built with
/// its own winding and evaluated over the design's full window (every azimuth, not one period),
/// and the practice-scaling layout evaluated the same way beside it.
/// </summary>
public static class PolarizerSolver
{
    public static SolvedPolarizer Solve(PolarizerDesign design, FieldSolveCounter? counter = null, IProgress<string>? progress = null, CoatingCalibration? calibration = null)
    {
        counter ??= new FieldSolveCounter();
        calibration ??= CoatingCalibration.For(design);
        var search = PolarizerSearch.Run(design, calibration.Factor, counter, progress);
        var plan = EvaluationPlan.ForDesign(design);
        var build = PolarizerBuild.From(design, search.ElementCount, search.ElementLengthM, search.ElementRiseM, search.OuterDiameterM, search.Winding, calibration.Factor);
        var points = PolarizerEvaluator.Evaluate(build, plan.FrequenciesHz, plan.Directions, design.Polarizer.Sense, counter, receiverOhm: design.Solve.ReceiverOhm);
        var bare = PolarizerEvaluator.SampleBareWhip(design.Whip.Kind, design.Whip.LengthM, design.Whip.RadiusM, plan.FrequenciesHz, plan.Directions, counter,
            meshFrequencyHz: build.MeshFrequencyHz).Select(x => x.Summarize(design.Polarizer.Sense, design.Solve.ReceiverOhm)).ToArray();
        var layout = new ElementLayout(search.ElementCount, search.ElementLengthM, search.ElementRiseM, search.OuterDiameterM, design.Polarizer.Wire.DiameterM);
        var p = design.Polarizer;
        return new SolvedPolarizer(design.Name, p.Sense, build, layout, search.Winding, calibration,
            plan.ObjectiveOf(points, p.Sense), points, Practice(design, plan, calibration.Factor, counter), search, counter.Count)
        {
            BareWhip = bare,
            Loading = Loading.LoadingSummary.For(build.Surroundings, search.ElementLengthM),
            LengthPinned = p.ElementLengthM is not null,
            RisePinned = p.ElementRiseM is not null,
            CountPinned = p.ElementCount is not null,
            DiameterPinned = p.Former.OuterDiameterM is not null,
            WindingPinned = p.Winding != Winding.Auto,
        };
    }

    /// <summary>The practice layout with the builders' winding rule, evaluated like the solution.</summary>
    public static PracticeComparison Practice(PolarizerDesign design, EvaluationPlan plan, double factor, FieldSolveCounter? counter)
    {
        var layout = design.Practice;
        var winding = design.Polarizer.Winding == Winding.Auto ? PracticeScaling.WindingFor(design.Polarizer.Sense) : design.Polarizer.Winding;
        var build = PolarizerBuild.From(design, layout.Count, layout.LengthM, layout.RiseM, layout.OuterDiameterM, winding, factor);
        try
        {
            var points = PolarizerEvaluator.Evaluate(build, plan.FrequenciesHz, plan.Directions, design.Polarizer.Sense, counter, receiverOhm: design.Solve.ReceiverOhm);
            return new PracticeComparison(layout, winding, plan.ObjectiveOf(points, design.Polarizer.Sense), points, null);
        }
        catch (ModelException ex)
        {
            return new PracticeComparison(layout, winding, null, Array.Empty<FrequencySummary>(), ex.Message);
        }
    }
}
