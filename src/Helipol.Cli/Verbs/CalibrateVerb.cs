using System.CommandLine;
using System.Globalization;
using Helipol.Design;
using Helipol.Emit;
using Helipol.Spec;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol calibrate FILE --best-at 5.65GHz [-o cal/x.yaml] [--force]</c>: the design file describes a
/// build as made (length, rise, count and diameter pinned); the measured frequency of its best
/// axial ratio fixes the coating factor of its material set. Writes a calibration file that
/// designs reference with <c>calibration: cal/x.yaml</c>; an existing file is replaced only with --force.
/// </summary>
public static class CalibrateVerb
{
    public static Command Create(CliConsole console)
    {
        var file = new Argument<string>("FILE") { Description = "design file of the measured build (.yaml), geometry pinned" };
        var bestAt = new Option<string>("--best-at") { Description = "frequency where the build measured its best axial ratio, e.g. 5.65GHz", Required = true };
        var output = new Option<string>("--output", "-o") { Description = "calibration file to write (default cal/<material set>.yaml next to the design)" };
        var force = new Option<bool>("--force") { Description = "replace an existing calibration file" };
        var command = new Command("calibrate", "Fit the dielectric-loading factor of a material set to a measured build's best-AR frequency.") { file, bestAt, output, force };
        command.SetAction(parse =>
        {
            var designs = DesignLoader.LoadAll(new[] { parse.GetValue(file)! }, console);
            if (designs is null) return ExitCodes.BadInput;
            var design = designs[0];
            var measured = CliQuantity.Read("--best-at", parse.GetValue(bestAt)!, QuantityKind.Frequency, out var problem);
            if (measured is null)
            {
                console.Error.WriteLine($"helipol calibrate: {problem}");
                return ExitCodes.BadInput;
            }
            try
            {
                PinnedLayout.Require(design);
            }
            catch (PinnedLayoutException ex)
            {
                console.Error.WriteLine(SolveRunner.PinnedError(design, ex.KeyPath));
                return ExitCodes.BadInput;
            }
            var folder = Path.GetDirectoryName(Path.GetFullPath(design.SourceFile)) ?? ".";
            // A calibration file holds a measurement; replacing one silently could lose it.
            if (parse.GetValue(output) is { } asked && File.Exists(asked) && !parse.GetValue(force))
            {
                console.Error.WriteLine($"helipol calibrate: {asked}: found an existing file, allowed a new file (or --force to replace it)");
                return ExitCodes.BadInput;
            }
            CoatingCalibration fit;
            var counter = new FieldSolveCounter();
            try
            {
                fit = CalibrationFit.FitBestArFrequency(design, measured.Value, design.SourceFile, counter);
            }
            catch (CalibrationException ex)
            {
                console.Error.WriteLine(ex.Message);
                return ExitCodes.BadInput;
            }
            var target = parse.GetValue(output) ?? Path.Combine(folder, "cal", fit.MaterialSet.Replace(" + ", "-") + ".yaml");
            if (File.Exists(target) && !parse.GetValue(force))
            {
                console.Error.WriteLine($"helipol calibrate: {target}: found an existing file, allowed a new file (or --force to replace it)");
                return ExitCodes.BadInput;
            }
            AtomicFile.WriteAllText(target, CalibrationFile.Write(fit));
            console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"loading factor {fit.Factor:0.####} for {fit.MaterialSet} ({counter.Count} field solves); wrote {target}"));
            return ExitCodes.Ok;
        });
        return command;
    }
}
