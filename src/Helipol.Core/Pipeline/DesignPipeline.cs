using Helipol.Design;
using Helipol.Emit;
using Helipol.Emit.Report;
using Helipol.Geometry.FromModel;
using Helipol.Model;

namespace Helipol.Pipeline;

/// <summary>How <see cref="DesignPipeline.Build"/> runs; every field may be left out.</summary>
public sealed record BuildOptions
{
    /// <summary>Receives a line of what the solver is doing (search stage, refinement), for a progress display.</summary>
    public IProgress<string>? Progress { get; init; }
}

/// <summary>A built design: the solved polarizer, the analyses of it and every output file, in memory.</summary>
/// <param name="Files">report and fabrication files in the order they are listed to a user, file name → bytes</param>
/// <param name="FieldSolves">field solves the whole build took (search, sweep and tolerance runs)</param>
public sealed record BuildResult(PolarizerDesign Design, SolvedPolarizer Solved, SweepResult Sweep, ToleranceResult Tolerance,
    DesignVerdict Verdict, IReadOnlyList<(string Name, byte[] Bytes)> Files, long FieldSolves)
{
    /// <summary>The bytes of one file by name (as in <see cref="Files"/>, e.g. "report.md").</summary>
    public byte[] File(string name) => Files.First(f => f.Name == name).Bytes;
}

/// <summary>
/// The whole pipeline for one resolved design: solve (search the geometry and winding), sweep the
/// band, run the tolerance builds, judge, then render the report and the fabrication set. Nothing is
/// written to disk; a caller writes <see cref="BuildResult.Files"/> where it wants them.
/// </summary>
public static class DesignPipeline
{
    /// <summary>Solves, or throws <see cref="DesignRefusedException"/> with one line when the design cannot be solved.</summary>
    public static SolvedPolarizer Solve(PolarizerDesign design, FieldSolveCounter? counter = null, IProgress<string>? progress = null)
    {
        try
        {
            return PolarizerSolver.Solve(design, counter, progress);
        }
        catch (SearchException ex)
        {
            throw new DesignRefusedException(DesignRefusal.SearchLine(design, ex));
        }
        catch (Helipol.Engine.ModelException ex)
        {
            throw new DesignRefusedException($"{design.SourceFile}: polarizer: found a geometry the field model refuses ({ex.Message}), allowed wires that do not touch and are thin enough");
        }
    }

    /// <summary>Solves and renders every file; throws <see cref="DesignRefusedException"/> when the design cannot be solved or made.</summary>
    public static BuildResult Build(PolarizerDesign design, BuildOptions? options = null)
    {
        var counter = new FieldSolveCounter();
        var solved = Solve(design, counter, options?.Progress);
        var sweep = BandSweep.Run(design, solved.Build, counter: counter);
        var tolerance = ToleranceAnalysis.Run(design, solved.Build, counter: counter);
        var report = ReportFiles.Make(design, solved, sweep, tolerance);
        IReadOnlyList<FabricationFile> fabrication;
        try
        {
            fabrication = FabricationFiles(design, solved, sweep, tolerance, report);
        }
        catch (ArgumentException ex)
        {
            // The geometry refuses what cannot be made (a ring larger than the board, ...).
            throw new DesignRefusedException($"{design.SourceFile}: fabrication: {ex.Message}");
        }
        IReadOnlyList<(string Name, byte[] Bytes)> files = [.. report, .. fabrication.Select(f => (f.FileName, f.Bytes))];
        return new BuildResult(design, solved, sweep, tolerance, VerdictJudge.For(design, solved, tolerance), files, counter.Count);
    }

    /// <summary>The plots of the report the packet carries, in its page order.</summary>
    private static readonly string[] PacketPlots = ["ar-gain.png", "vswr.png", "pattern-azimuth.png", "pattern-elevation.png", "ar-map.png"];

    /// <summary>The fabrication set for the solved layout; the packet carries every plot of the report.</summary>
    private static IReadOnlyList<FabricationFile> FabricationFiles(PolarizerDesign design, SolvedPolarizer solved, SweepResult sweep,
        ToleranceResult tolerance, IReadOnlyList<(string Name, byte[] Bytes)> report)
    {
        var plots = PacketPlots.Select(n => report.First(r => r.Name == n).Bytes).ToList();
        var input = BuildInputFromModel.Create(design, solved.Layout, solved.Winding, PacketSummary.Lines(design, solved, sweep, tolerance), plots,
            (tolerance.CutToleranceMm, tolerance.RiseToleranceMm));
        return FabricationSet.Render(input);
    }
}
