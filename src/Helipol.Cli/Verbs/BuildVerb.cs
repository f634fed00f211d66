using System.CommandLine;
using Helipol.Design;
using Helipol.Emit;
using Helipol.Emit.Report;
using Helipol.Geometry.FromModel;
using Helipol.Model;
using Helipol.Spec;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol build FILE... [-o DIR]</c>: solves each design and writes <c>DIR/&lt;name&gt;/</c>:
/// design.json (with the solved values), report.md and its plots. Every file is checked and every
/// design solved before anything is written, so a bad design leaves the output untouched.
/// </summary>
public static class BuildVerb
{
    public static Command Create(CliConsole console)
    {
        var files = new Argument<string[]>("FILE") { Description = "design files (.yaml)", Arity = ArgumentArity.OneOrMore };
        var outputDir = new Option<string>("--output", "-o") { Description = "folder that receives one sub-folder per design", DefaultValueFactory = _ => "output" };
        var strict = new Option<bool>("--strict") { Description = "exit with code 3 when any design's verdict is 'fails' (the files are still written)" };
        var command = new Command("build", "Check and solve designs, then write output/<name>/: design.json, report.md, plots and the fabrication files.") { files, outputDir, strict };
        command.SetAction(parse =>
        {
            var designs = DesignLoader.LoadAll(parse.GetValue(files)!, console);
            if (designs is null) return ExitCodes.BadInput;
            var clash = designs.GroupBy(d => d.Name, StringComparer.OrdinalIgnoreCase).FirstOrDefault(g => g.Count() > 1);
            if (clash is not null)
            {
                var second = clash.ElementAt(1);
                console.Error.WriteLine(new SpecError(second.SourceFile, null, "name", $"'{second.Name}', also the name in {clash.First().SourceFile}",
                    "a name unique among the designs built together (it names the output folder)").ToString());
                return ExitCodes.BadInput;
            }
            var results = new List<(PolarizerDesign Design, IReadOnlyList<(string Name, byte[] Bytes)> Files, long Solves)>();
            var judged = new List<(PolarizerDesign Design, SolvedPolarizer Solved, ToleranceResult Tolerance)>();
            foreach (var design in designs)
            {
                var counter = new FieldSolveCounter();
                SolvedPolarizer solved;
                solved = SolveRunner.Solve(console, design, counter);
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
                    console.Error.WriteLine($"{design.SourceFile}: fabrication: {ex.Message}");
                    return ExitCodes.BadInput;
                }
                IReadOnlyList<(string Name, byte[] Bytes)> made = [.. report, .. fabrication.Select(f => (f.FileName, f.Bytes))];
                if (NonFiniteGuard.Find(made) is { } bad)
                {
                    console.Error.WriteLine($"helipol: internal error: {design.Name}/{bad.File} would carry a non-finite number ({bad.Token}); nothing written");
                    return ExitCodes.Failure;
                }
                results.Add((design, made, counter.Count));
                judged.Add((design, solved, tolerance));
            }
            var root = parse.GetValue(outputDir)!;
            // Every file of every design is staged before any is renamed into place (AtomicFile.WriteAll).
            AtomicFile.WriteAll(results.SelectMany(r => r.Files.Select(f => (Path.Combine(root, r.Design.Name, f.Name), f.Bytes))).ToList());
            foreach (var (design, made, solves) in results)
            {
                console.Out.WriteLine($"wrote {Path.Combine(root, design.Name)}/ ({string.Join(", ", made.Select(m => m.Name))}; {solves} field solves)");
            }
            bool anyFails = false;
            foreach (var (design, solved, tolerance) in judged)
                anyFails |= VerdictOutput.Show(console, design, solved, tolerance, stdoutIsJson: false).Grade == Grade.Fails;
            return anyFails && parse.GetValue(strict) ? VerdictOutput.FailsExitCode : ExitCodes.Ok;
        });
        return command;
    }

    /// <summary>The fabrication set for the solved layout; the packet carries every plot of the report.</summary>
    private static IReadOnlyList<FabricationFile> FabricationFiles(PolarizerDesign design, SolvedPolarizer solved, SweepResult sweep,
        ToleranceResult tolerance, IReadOnlyList<(string Name, byte[] Bytes)> report)
    {
        string[] packetPlots = ["ar-gain.png", "vswr.png", "pattern-azimuth.png", "pattern-elevation.png", "ar-map.png"];
        var plots = packetPlots.Select(n => report.First(r => r.Name == n).Bytes).ToList();
        var input = BuildInputFromModel.Create(design, solved.Layout, solved.Winding, PacketSummary.Lines(design, solved, sweep, tolerance), plots,
            (tolerance.CutToleranceMm, tolerance.RiseToleranceMm));
        return FabricationSet.Render(input);
    }
}
