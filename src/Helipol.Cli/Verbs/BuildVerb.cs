using System.CommandLine;
using Helipol.Design;
using Helipol.Emit;
using Helipol.Pipeline;
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
            var results = new List<BuildResult>();
            foreach (var design in designs)
            {
                var built = SolveRunner.WithStatus(console, design, progress => DesignPipeline.Build(design, new BuildOptions { Progress = progress }));
                if (NonFiniteGuard.Find(built.Files) is { } bad)
                {
                    console.Error.WriteLine($"helipol: internal error: {design.Name}/{bad.File} would carry a non-finite number ({bad.Token}); nothing written");
                    return ExitCodes.Failure;
                }
                results.Add(built);
            }
            var root = parse.GetValue(outputDir)!;
            // Every file of every design is staged before any is renamed into place (AtomicFile.WriteAll).
            AtomicFile.WriteAll(results.SelectMany(r => r.Files.Select(f => (Path.Combine(root, r.Design.Name, f.Name), f.Bytes))).ToList());
            foreach (var r in results)
            {
                console.Out.WriteLine($"wrote {Path.Combine(root, r.Design.Name)}/ ({string.Join(", ", r.Files.Select(m => m.Name))}; {r.FieldSolves} field solves)");
            }
            bool anyFails = false;
            foreach (var r in results)
                anyFails |= VerdictOutput.Show(console, r.Design, r.Verdict, stdoutIsJson: false).Grade == Grade.Fails;
            return anyFails && parse.GetValue(strict) ? VerdictOutput.FailsExitCode : ExitCodes.Ok;
        });
        return command;
    }
}
