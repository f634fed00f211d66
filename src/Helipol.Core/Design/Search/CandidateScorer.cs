using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// Scores one candidate geometry for the search. With the winding left to the solver, it solves
/// only the right-wound build: the left-wound build is its mirror image in a plane through the
/// axis, and a mirror image radiates the same field with the circular components swapped
/// (reflection reverses the sense of rotation), so its objective is the right-wound build's
/// objective for the opposite sense. Both windings are thus tried for the price of one solve.
/// </summary>
public sealed class CandidateScorer
{
    /// <summary>Objective of a geometry that cannot be built or solved: far above any real score.</summary>
    public const double Unbuildable = 1e3;

    private readonly PolarizerDesign _design;
    private readonly PolarizerBuild _template;
    private readonly FabricationLimits _limits;
    private readonly Winding _winding;
    private readonly FieldSolveCounter _counter;

    public CandidateScorer(PolarizerDesign design, double calibrationFactor, Winding winding, FieldSolveCounter counter)
    {
        _design = design;
        _winding = winding;
        _counter = counter;
        _limits = FabricationLimits.For(design);
        _template = PolarizerBuild.From(design, 3, 1, 0.5, 1, Winding.Right, calibrationFactor);
    }

    public int Evaluations => _evaluations;
    private int _evaluations;

    public FabricationLimits Limits => _limits;

    /// <summary>The build for a candidate (all elements equal, evenly spaced).</summary>
    public PolarizerBuild BuildOf(int count, double outerDiameterM, double lengthM, double riseM, Winding winding) =>
        _template.WithElements(count, lengthM, riseM) with { OuterDiameterM = outerDiameterM, Winding = winding };

    /// <summary>
    /// Best objective over the allowed windings and that winding; <see cref="Unbuildable"/> when the
    /// geometry breaks a fabrication limit or the engine refuses it.
    /// </summary>
    public (double Value, Winding Winding) Score(int count, double outerDiameterM, double lengthM, double riseM)
    {
        var layout = new ElementLayout(count, lengthM, riseM, outerDiameterM, _design.Polarizer.Wire.DiameterM);
        if (_limits.Violation(layout) is not null) return (Unbuildable, _winding == Winding.Auto ? Winding.Right : _winding);
        var solved = _winding == Winding.Left ? Winding.Left : Winding.Right;
        var plan = EvaluationPlan.ForSearch(_design, count);
        IReadOnlyList<CircularSamples> samples;
        try
        {
            Interlocked.Increment(ref _evaluations);
            samples = PolarizerEvaluator.Sample(BuildOf(count, outerDiameterM, lengthM, riseM, solved), plan.FrequenciesHz, plan.Directions, _counter, maxParallelism: 1);
        }
        catch (ModelException)
        {
            return (Unbuildable, solved);
        }
        var sense = _design.Polarizer.Sense;
        double asSolved = plan.ObjectiveOf(samples.Select(s => s.Summarize(sense)).ToArray(), sense);
        if (_winding != Winding.Auto) return (asSolved, solved);
        var opposite = sense == Sense.Rhcp ? Sense.Lhcp : Sense.Rhcp;
        double mirrored = plan.ObjectiveOf(samples.Select(s => s.Summarize(opposite)).ToArray(), opposite);
        return mirrored < asSolved ? (mirrored, Winding.Left) : (asSolved, Winding.Right);
    }
}
