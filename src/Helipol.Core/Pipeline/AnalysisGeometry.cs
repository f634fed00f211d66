using Helipol.Design;
using Helipol.Model;

namespace Helipol.Pipeline;

/// <summary>The geometry a verb evaluates as written, without a search, and the winding it takes when the file leaves it to helipol.</summary>
public static class AnalysisGeometry
{
    /// <summary>
    /// The geometry <c>analyze</c> evaluates without a search: pinned values as written; keys left
    /// <c>auto</c> take the practice-scaling value (named in <paramref name="practiceKeys"/>, never
    /// presented as solved); an <c>auto</c> winding takes whichever of the two windings radiates the
    /// wanted sense better on the given cone at the band centre.
    /// </summary>
    public static PolarizerBuild For(PolarizerDesign design, ObservationSet cone, out IReadOnlyList<string> practiceKeys, out bool windingChosen)
    {
        var p = design.Polarizer;
        var layout = design.Practice;
        var keys = new List<string>();
        if (p.ElementCount is null) keys.Add(Keys.PolarizerElements);
        if (p.ElementLengthM is null) keys.Add(Keys.PolarizerElementLength);
        if (p.ElementRiseM is null) keys.Add(Keys.PolarizerElementRise);
        if (p.Former.OuterDiameterM is null) keys.Add(Keys.PolarizerFormerOuterDiameter);
        practiceKeys = keys;
        var factor = CoatingCalibration.For(design).Factor;
        PolarizerBuild Build(Winding w) => PolarizerBuild.From(design, layout.Count, layout.LengthM, layout.RiseM, layout.OuterDiameterM, w, factor);
        windingChosen = p.Winding == Winding.Auto;
        if (!windingChosen) return Build(p.Winding);
        var centre = new[] { design.Band.CenterHz };
        double Score(Winding w) => PolarizerEvaluator.Evaluate(Build(w), centre, cone, p.Sense)[0].MeanScoreDb;
        return Score(Winding.Left) <= Score(Winding.Right) ? Build(Winding.Left) : Build(Winding.Right);
    }
}
