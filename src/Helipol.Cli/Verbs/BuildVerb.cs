using System.CommandLine;
using Helipol.Emit;
using Helipol.Model;
using Helipol.Spec;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol build FILE... [-o DIR]</c>: writes <c>DIR/&lt;name&gt;/design.json</c> per design.
/// Every file is checked before anything is written, so one bad design leaves the output untouched.
/// </summary>
public static class BuildVerb
{
    public static Command Create(CliConsole console)
    {
        var files = new Argument<string[]>("FILE") { Description = "design files (.yaml)", Arity = ArgumentArity.OneOrMore };
        var outputDir = new Option<string>("--output", "-o") { Description = "folder that receives one sub-folder per design", DefaultValueFactory = _ => "output" };
        var command = new Command("build", "Check designs, then write output/<name>/design.json (and later the fabrication files).") { files, outputDir };
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
            var root = parse.GetValue(outputDir)!;
            foreach (var design in designs)
            {
                var target = Path.Combine(root, design.Name, "design.json");
                AtomicFile.WriteAllText(target, DesignJson.Write(design));
                console.Out.WriteLine($"wrote {target}");
            }
            return ExitCodes.Ok;
        });
        return command;
    }
}
