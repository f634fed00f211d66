using System.CommandLine;
using Helipol.Model;
using Helipol.Pipeline;
using Helipol.Spec;

namespace Helipol.Cli.Verbs;

/// <summary><c>helipol check FILE...</c>: reads and checks designs, writes nothing.</summary>
public static class CheckVerb
{
    public static Command Create(CliConsole console)
    {
        var files = new Argument<string[]>("FILE") { Description = "design files (.yaml)", Arity = ArgumentArity.OneOrMore };
        var command = new Command("check", "Check design files, report every problem and warning; writes nothing.") { files };
        command.SetAction(parse =>
        {
            var bad = false;
            foreach (var file in parse.GetValue(files)!)
            {
                try
                {
                    var doc = SpecReader.ReadFile(file, file);
                    var design = DesignResolver.Resolve(doc);
                    if (DesignRefusal.LineFor(design, doc) is { } refused)
                    {
                        console.Error.WriteLine(refused);
                        bad = true;
                        continue;
                    }
                    var warnings = DesignWarnings.For(doc, design);
                    console.Out.WriteLine($"{file}: ok ({design.Name}){(warnings.Count > 0 ? $", {warnings.Count} warning(s)" : "")}");
                    foreach (var warning in warnings) console.Out.WriteLine(warning.ToString());
                }
                catch (DesignInputException ex)
                {
                    foreach (var problem in ex.Errors) console.Error.WriteLine(problem.ToString());
                    bad = true;
                }
                catch (Helipol.Design.CalibrationException ex)
                {
                    console.Error.WriteLine(ex.Message);
                    bad = true;
                }
            }
            return bad ? ExitCodes.BadInput : ExitCodes.Ok;
        });
        return command;
    }
}
