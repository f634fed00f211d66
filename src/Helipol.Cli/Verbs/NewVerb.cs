using System.CommandLine;
using System.Globalization;
using Helipol.Emit;
using Helipol.Model;
using Helipol.Pipeline;
using Helipol.Spec;
using Helipol.Spec.Fields;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol new NAME --center 2.45GHz [--whip dipole|monopole] [-o DIR]</c>: writes a commented
/// starter design sized by practice scaling for the band (<see cref="StarterSizes"/>). The text is
/// read back through the checker and the field model's guard before it is written, so a starter
/// always passes <c>check</c>; the schema its first line names is written beside it if missing.
/// </summary>
public static class NewVerb
{
    public static Command Create(CliConsole console)
    {
        var name = new Argument<string>("NAME") { Description = "design name: letters, digits, - and _ (also the file name)" };
        var center = new Option<string>("--center") { Description = "centre frequency with its unit, e.g. 2.45GHz", Required = true };
        var whip = new Option<string>("--whip") { Description = "dipole or monopole", DefaultValueFactory = _ => "dipole" };
        whip.AcceptOnlyFromAmong("dipole", "monopole");
        var folder = new Option<string>("--output", "-o") { Description = "folder for NAME.yaml", DefaultValueFactory = _ => "." };
        var command = new Command("new", "Write a commented starter design NAME.yaml sized by practice scaling.") { name, center, whip, folder };
        command.SetAction(parse =>
        {
            var designName = parse.GetValue(name)!;
            var probe = new ReadContext("--center", ".");
            new QuantityField(QuantityKind.Frequency, DesignKeys.LowestFrequencyHz, DesignKeys.HighestFrequencyHz, minInclusive: true)
                .Read(new YamlScalar(SourceMark.FileStart, parse.GetValue(center)!, true), Keys.BandCenter, probe);
            new TextField("^[A-Za-z0-9_-]+$", "letters, digits, - and _ only", 64)
                .Read(new YamlScalar(SourceMark.FileStart, designName, true), "name", probe);
            if (probe.Errors.Count > 0)
            {
                var first = probe.Errors.InFileOrder()[0];
                console.Error.WriteLine($"helipol new: {first.FieldPath}: found {first.Found}, allowed {first.Allowed}");
                return ExitCodes.BadInput;
            }
            var centerHz = ((QuantityValue)probe.Values[Keys.BandCenter]).Si;
            var folderPath = parse.GetValue(folder)!;
            var target = Path.Combine(folderPath, designName + ".yaml");
            if (File.Exists(target) || Directory.Exists(target))
            {
                console.Error.WriteLine($"helipol new: {target}: found an existing file, allowed a name or folder not yet used (new never overwrites)");
                return ExitCodes.BadInput;
            }
            var text = StarterDesign.Text(designName, centerHz, parse.GetValue(whip) == "monopole");
            // The same checks as `check`, on the text before it is written: a refused starter is
            // one line and exit 2 (DesignInputException is mapped in CliApp), and nothing is written.
            var doc = SpecReader.ReadText(text, target, Path.GetFullPath(folderPath));
            var design = DesignResolver.Resolve(doc);
            if (DesignRefusal.LineFor(design, doc) is { } refused)
                throw new DesignRefusedException(refused);
            AtomicFile.WriteAllText(target, text);
            console.Out.WriteLine($"wrote {target}");
            // The first line points editors at the schema beside the design; put it there unless one is already.
            var schema = Path.Combine(folderPath, DesignSchema.FileName);
            if (!File.Exists(schema))
            {
                AtomicFile.WriteAllText(schema, DesignSchema.Generate());
                console.Out.WriteLine($"wrote {schema}");
            }
            return ExitCodes.Ok;
        });
        return command;
    }
}
