using Helipol.Design;
using Helipol.Model;
using Helipol.Pipeline;
using Helipol.Spec;
using Spectre.Console;

namespace Helipol.Cli;

/// <summary>Shared by solve, sweep, tolerance and build: solves a design with a progress line on an interactive terminal.</summary>
public static class SolveRunner
{
    /// <summary>Solves, or throws <see cref="DesignRefusedException"/> with one line when the design cannot be solved.</summary>
    public static SolvedPolarizer Solve(CliConsole console, PolarizerDesign design, FieldSolveCounter counter) =>
        WithStatus(console, design, progress => DesignPipeline.Solve(design, counter, progress));

    /// <summary>Runs <paramref name="work"/> under a "solving" status line on an interactive terminal, fed by its progress.</summary>
    public static T WithStatus<T>(CliConsole console, PolarizerDesign design, Func<IProgress<string>?, T> work)
    {
        if (!console.Tables.Profile.Capabilities.Interactive) return work(null);
        T result = default!;
        console.Tables.Status().Start($"solving {design.Name}", ctx =>
        {
            result = work(new Progress<string>(s => ctx.Status(Markup.Escape(s))));
        });
        return result;
    }

    /// <summary>Error line for a verb that needs a pinned geometry (file:line:column: key: found auto, allowed ...).</summary>
    public static string PinnedError(PolarizerDesign design, string keyPath)
    {
        var doc = SpecReader.ReadFile(design.SourceFile, design.SourceFile);
        var mark = doc.Find(keyPath)?.Mark;
        return new SpecError(design.SourceFile, mark ?? SourceMark.FileStart, keyPath, "auto",
            "a pinned value (this verb evaluates the geometry as written; run 'helipol solve' to choose it)").ToString();
    }

    /// <summary>
    /// The geometry <c>analyze</c> evaluates without a search: pinned values as written; keys left
    /// <c>auto</c> take the practice-scaling value (named in <paramref name="practiceKeys"/>, never
    /// presented as solved); an <c>auto</c> winding takes whichever of the two windings radiates the
    /// wanted sense better on the given cone at the band centre.
    /// </summary>
    public static PolarizerBuild AnalysisBuild(PolarizerDesign design, ObservationSet cone, out IReadOnlyList<string> practiceKeys, out bool windingChosen)
    {
        var p = design.Polarizer;
        var layout = design.Practice;
        var keys = new List<string>();
        if (p.ElementCount is null) keys.Add("polarizer.elements");
        if (p.ElementLengthM is null) keys.Add("polarizer.element_length");
        if (p.ElementRiseM is null) keys.Add("polarizer.element_rise");
        if (p.Former.OuterDiameterM is null) keys.Add("polarizer.former.outer_diameter");
        practiceKeys = keys;
        var factor = CoatingCalibration.For(design).Factor;
        PolarizerBuild Build(Winding w) => PolarizerBuild.From(design, layout.Count, layout.LengthM, layout.RiseM, layout.OuterDiameterM, w, factor);
        windingChosen = p.Winding == Winding.Auto;
        if (!windingChosen) return Build(p.Winding);
        var centre = new[] { design.Band.CenterHz };
        double Score(Winding w) => PolarizerEvaluator.Evaluate(Build(w), centre, cone, p.Sense)[0].MeanScoreDb;
        return Score(Winding.Left) <= Score(Winding.Right) ? Build(Winding.Left) : Build(Winding.Right);
    }

    /// <summary>The pinned geometry and winding, or an error line.</summary>
    public static PolarizerBuild? PinnedBuild(PolarizerDesign design, out string? error)
    {
        error = null;
        try
        {
            var layout = PinnedLayout.Require(design);
            if (design.Polarizer.Winding == Winding.Auto)
            {
                error = PinnedError(design, "polarizer.winding");
                return null;
            }
            return PolarizerBuild.From(design, layout.Count, layout.LengthM, layout.RiseM, layout.OuterDiameterM, design.Polarizer.Winding,
                CoatingCalibration.For(design).Factor);
        }
        catch (PinnedLayoutException ex)
        {
            error = PinnedError(design, ex.KeyPath);
            return null;
        }
    }
}
