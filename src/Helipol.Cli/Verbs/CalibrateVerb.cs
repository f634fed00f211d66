using System.CommandLine;
using System.Globalization;
using Helipol.Design;
using Helipol.Emit;
using Helipol.Pipeline;
using Helipol.Spec;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol calibrate FILE [--best-at 5.65GHz | --s1p F [--bare-s1p F] --spin F --contrast 7.5] [-o cal/x.yaml] [--force]</c>:
/// the design file describes a build as made (length, rise, count and diameter pinned). The
/// measured frequency of its best axial ratio, or a least-squares fit over reflection sweeps, spin
/// readings and a winding contrast (<see cref="MeasurementFit"/>), fixes the loading factor of its
/// material set. Writes a calibration file that designs reference with <c>calibration: cal/x.yaml</c>;
/// an existing file is replaced only with --force. A bad data file writes nothing.
/// </summary>
public static class CalibrateVerb
{
    public static Command Create(CliConsole console)
    {
        var file = new Argument<string>("FILE") { Description = "design file of the measured build (.yaml), geometry pinned" };
        var bestAt = new Option<string>("--best-at") { Description = "frequency where the build measured its best axial ratio, e.g. 5.65GHz" };
        var s1p = new Option<string>("--s1p") { Description = "VNA reflection sweep of the whip with the polarizer fitted (Touchstone v1 .s1p)" };
        var bareS1p = new Option<string>("--bare-s1p") { Description = "the same whip's sweep without the polarizer: the change between the two is fitted" };
        var spin = new Option<string>("--spin") { Description = "spin-test CSV: frequency_mhz,level_min_db,level_max_db" };
        var contrast = new Option<double?>("--contrast") { Description = "measured winding contrast (right against wrong winding) at the band centre, dB" };
        var output = new Option<string>("--output", "-o") { Description = "calibration file to write (default cal/<material set>.yaml next to the design)" };
        var force = new Option<bool>("--force") { Description = "replace an existing calibration file" };
        var command = new Command("calibrate", "Fit the dielectric-loading factor of a material set to measurements of a build.") { file, bestAt, s1p, bareS1p, spin, contrast, output, force };
        command.SetAction(parse =>
        {
            // What was measured is checked before the design is read: without a measurement there is nothing to fit.
            string? s1pPath = parse.GetValue(s1p), barePath = parse.GetValue(bareS1p), spinPath = parse.GetValue(spin);
            double? contrastDb = parse.GetValue(contrast);
            bool dataFit = s1pPath is not null || spinPath is not null || contrastDb is not null;
            bool bestGiven = parse.GetValue(bestAt) is not null;
            if (bestGiven == dataFit)
            {
                console.Error.WriteLine("helipol calibrate: found " + (dataFit ? "--best-at beside other measurements" : "no measurement") + ", allowed either --best-at or any of --s1p, --spin, --contrast");
                return ExitCodes.BadInput;
            }
            if (barePath is not null && s1pPath is null)
            {
                console.Error.WriteLine("helipol calibrate: --bare-s1p: found it without --s1p, allowed it only beside --s1p (the change between the two sweeps is fitted)");
                return ExitCodes.BadInput;
            }
            var designs = DesignLoader.LoadAll(new[] { parse.GetValue(file)! }, console);
            if (designs is null) return ExitCodes.BadInput;
            var design = designs[0];
            double? measured = null;
            if (parse.GetValue(bestAt) is { } bestText)
            {
                measured = CliQuantity.Read("--best-at", bestText, QuantityKind.Frequency, out var problem);
                if (measured is null)
                {
                    console.Error.WriteLine($"helipol calibrate: {problem}");
                    return ExitCodes.BadInput;
                }
            }
            Measurements? data = null;
            var hashes = new List<(string File, string Sha256)>();
            if (dataFit)
            {
                try
                {
                    var (fLow, fHigh) = MeasurementFit.SolvableBandHz(design);
                    void CheckBand(string shown, IEnumerable<(double F, int Line)> points)
                    {
                        foreach (var (f, line) in points)
                            if (f < fLow || f > fHigh)
                                throw new CalibrationException(string.Create(CultureInfo.InvariantCulture,
                                    $"{shown}:{line}:1: frequency: found {f / 1e6:0.###} MHz, allowed {fLow / 1e6:0.###} to {fHigh / 1e6:0.###} MHz (±50 % of the design's band centre, where the model can solve this build)"));
                    }
                    ReflectionSweep? fitted = null, bare = null;
                    IReadOnlyList<SpinPoint>? spins = null;
                    if (s1pPath is not null) { fitted = Touchstone.Read(s1pPath, s1pPath); CheckBand(s1pPath, fitted.Points.Select(p => (p.FrequencyHz, p.Line))); hashes.Add((s1pPath, Sha256(s1pPath))); }
                    if (barePath is not null) { bare = Touchstone.Read(barePath, barePath); CheckBand(barePath, bare.Points.Select(p => (p.FrequencyHz, p.Line))); hashes.Add((barePath, Sha256(barePath))); }
                    if (spinPath is not null) { spins = SpinReadings.Read(spinPath, spinPath); CheckBand(spinPath, spins.Select(p => (p.FrequencyHz, p.Line))); hashes.Add((spinPath, Sha256(spinPath))); }
                    data = new Measurements(fitted, bare, spins, contrastDb, design.Band.CenterHz);
                }
                catch (CalibrationException ex)
                {
                    console.Error.WriteLine(ex.Message);
                    return ExitCodes.BadInput;
                }
            }
            try
            {
                PinnedLayout.Require(design);
            }
            catch (PinnedLayoutException ex)
            {
                console.Error.WriteLine(DesignRefusal.PinnedError(design, ex.KeyPath));
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
            MeasurementFitResult? result = null;
            var counter = new FieldSolveCounter();
            try
            {
                if (data is not null)
                {
                    result = MeasurementFit.Fit(design, data, counter);
                    var kinds = new List<string>();
                    if (data.Fitted is not null) kinds.Add(data.Bare is null ? "reflection sweep" : "change of the reflection sweep with the polarizer fitted");
                    if (data.Spin is not null) kinds.Add("spin-test axial ratios");
                    if (data.ContrastDb is { } c) kinds.Add(string.Create(CultureInfo.InvariantCulture, $"winding contrast {c:0.##} dB"));
                    fit = new CoatingCalibration(CoatingCalibration.MaterialSetOf(design.Polarizer), result.Factor,
                        "least squares over " + string.Join(", ", kinds), design.SourceFile, "fitted by helipol calibrate to measurements of a build");
                }
                else fit = CalibrationFit.FitBestArFrequency(design, measured!.Value, design.SourceFile, counter);
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
            AtomicFile.WriteAllText(target, CalibrationFile.Write(fit, result, hashes));
            if (result is not null)
            {
                console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"loading factor {result.Factor:0.####} (range {result.FactorLow:0.###}-{result.FactorHigh:0.###}), added inductance {result.AddedInductanceHPerM * 1e9:0.#} nH/m, rms residual {result.Residual:0.####} over {result.Readings} readings"));
                foreach (var (f, h) in hashes) console.Out.WriteLine($"sha256 {h}  {f}");
            }
            console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"loading factor {fit.Factor:0.####} for {fit.MaterialSet} ({counter.Count} field solves); wrote {target}"));
            return ExitCodes.Ok;
        });
        return command;
    }

    private static string Sha256(string path)
    {
        using var stream = File.OpenRead(path);
        return Convert.ToHexString(System.Security.Cryptography.SHA256.HashData(stream)).ToLowerInvariant();
    }
}
