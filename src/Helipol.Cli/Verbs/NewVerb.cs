using System.CommandLine;
using System.Globalization;
using Helipol.Emit;
using Helipol.Model;
using Helipol.Spec;
using Helipol.Spec.Fields;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol new NAME --center 2.45GHz [--whip dipole|monopole] [-o DIR]</c>: writes a commented
/// starter design sized by practice scaling. The text is read back through the checker before it
/// is written, so a starter design always passes <c>check</c>.
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
                .Read(new YamlScalar(SourceMark.FileStart, parse.GetValue(center)!, true), "band.center", probe);
            new TextField("^[A-Za-z0-9_-]+$", "letters, digits, - and _ only", 64)
                .Read(new YamlScalar(SourceMark.FileStart, designName, true), "name", probe);
            if (probe.Errors.Count > 0)
            {
                var first = probe.Errors.InFileOrder()[0];
                console.Error.WriteLine($"helipol new: {first.FieldPath}: found {first.Found}, allowed {first.Allowed}");
                return ExitCodes.BadInput;
            }
            var centerHz = ((QuantityValue)probe.Values["band.center"]).Si;
            var text = StarterDesign.Text(designName, centerHz, parse.GetValue(whip) == "monopole");
            var target = Path.Combine(parse.GetValue(folder)!, designName + ".yaml");
            if (File.Exists(target))
            {
                console.Error.WriteLine($"helipol new: {target} already exists; choose another name or folder");
                return ExitCodes.Failure;
            }
            DesignResolver.Resolve(SpecReader.ReadText(text, target, Path.GetFullPath(parse.GetValue(folder)!)));
            AtomicFile.WriteAllText(target, text);
            console.Out.WriteLine($"wrote {target}");
            return ExitCodes.Ok;
        });
        return command;
    }
}

/// <summary>The starter design's text: every key a first build needs, with a comment on each.</summary>
public static class StarterDesign
{
    private static string Mm(double metres) => (metres * 1e3).ToString("0.#", CultureInfo.InvariantCulture) + " mm";

    public static string Text(string name, double centerHz, bool monopole)
    {
        var ghz = (centerHz / 1e9).ToString("0.####", CultureInfo.InvariantCulture);
        var wavelength = Helipol.Engine.PhysicalConstants.SpeedOfLight / centerHz;
        // A half-wave dipole is a little shorter than λ/2 (about 0.48 λ), a quarter-wave monopole about 0.24 λ (common practice, no source).
        var whipLength = monopole ? 0.24 * wavelength : 0.48 * wavelength;
        var height = PracticeScaling.FormerHeightM(centerHz);
        var rise = Math.Min(PracticeScaling.ElementRiseM(centerHz), height);
        var outer = Math.Max(PracticeScaling.FormerOuterDiameterM(centerHz), 12e-3);
        var centre = monopole ? Math.Max(whipLength / 2, rise / 2 + 2e-3) : 0;
        return $"""
            # yaml-language-server: $schema=./{DesignSchema.FileName}
            # Starter design written by `helipol new`. Sizes come from practice scaling (the 5.8 GHz
            # rule of thumb scaled by wavelength); `helipol solve` refines element length and rise.
            name: {name}                          # names the output folder: letters, digits, - and _
            band: {"{"} center: {ghz} GHz {"}"}             # add low: and high: for the edges (default ±1.5 %)
            whip:
              kind: {(monopole ? "monopole" : "dipole")}                      # dipole (free space) | monopole (on a ground plane)
              length: {Mm(whipLength)}                    # radiating length; measure your whip
              diameter: 1 mm                     # conductor diameter
              cover_diameter: 6 mm               # outside of the plastic cover; delete for a bare whip
            polarizer:
              sense: rhcp                        # rhcp | lhcp: match the antenna at the other end
              winding: auto                      # auto | left | right
              elements: 5                        # 3..8 or auto
              element_length: auto               # or a length to pin it, e.g. {Mm(PracticeScaling.ElementLengthM(centerHz))}
              element_rise: auto                 # or a length to pin it, e.g. {Mm(rise)}
              centre_height: {Mm(centre)}                 # above the dipole feed, or above the ground for a monopole
              wire: {"{"} diameter: 0.5 mm, material: copper {"}"}            # pec | copper | brass | steel | stainless
              former: {"{"} material: eps-foam, outer_diameter: {Mm(outer)}, bore: 6.4 mm, height: {Mm(height)} {"}"}
              wrap: {"{"} material: pvc-tape, layers: 1 {"}"}                # or: wrap: none
            fabrication:
              kerf: 0.2 mm                       # cut width of your laser, wire or blade
              paper: a4                          # a4 | letter
            """ + "\n";
    }
}
