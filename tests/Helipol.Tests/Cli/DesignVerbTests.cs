using System.Text.Json;
using Helipol.Design;
using Helipol.Design.Mismatch;
using Helipol.Model;

namespace Helipol.Tests.Cli;

/// <summary>The solver's verbs: analyze, mismatch, calibrate (sweep, tolerance and build are covered through build).</summary>
public class DesignVerbTests
{
    private static string PinnedCopy(string winding)
    {
        var folder = TestPaths.NewTempFolder();
        var text = File.ReadAllText(Path.Combine(TestPaths.Data, "designs", "practice-foam-tape.yaml"))
            .Replace("  sense: rhcp\n", $"  sense: rhcp\n  winding: {winding}\n");
        var path = Path.Combine(folder, "pinned.yaml");
        File.WriteAllText(path, text);
        return path;
    }

    // The agreed JSON shape of analyze (more fields may follow).
    [Fact]
    public void AnalyzeJsonHasTheAgreedShape()
    {
        var run = CliRun.Of("analyze", PinnedCopy("left"), "--from", "5.7GHz", "--to", "5.9GHz", "--points", "3", "--json");
        Assert.Equal(0, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        var root = doc.RootElement;
        Assert.Equal("practice-foam-tape", root.GetProperty("name").GetString());
        Assert.Equal(16, root.GetProperty("element_length_mm").GetDouble(), 9);
        Assert.Equal(12.7, root.GetProperty("element_rise_mm").GetDouble(), 9);
        Assert.Equal("left", root.GetProperty("winding").GetString());
        var points = root.GetProperty("points");
        Assert.Equal(3, points.GetArrayLength());
        var p = points[1];
        Assert.Equal(5.8e9, p.GetProperty("frequency_hz").GetDouble(), 0);
        Assert.Equal(2, p.GetProperty("impedance_ohm").GetArrayLength());
        Assert.True(p.GetProperty("vswr_50").GetDouble() >= 1);
        var cut = p.GetProperty("cut");
        Assert.Equal(0, cut.GetProperty("elevation_deg").GetDouble());
        Assert.True(cut.GetProperty("axial_ratio_db_mean").GetDouble() <= cut.GetProperty("axial_ratio_db_max").GetDouble());
        Assert.Contains(cut.GetProperty("sense").GetString(), new[] { "RHCP", "LHCP" });
        Assert.True(cut.TryGetProperty("gain_rhcp_dbic", out _) && cut.TryGetProperty("gain_lhcp_dbic", out _));
    }

    // analyze works for every demo design. Keys left auto are evaluated at practice scaling
    // and named as such, so a practice value is never passed off as solved.
    [Fact]
    public void AnalyzeEvaluatesEveryDemoAndNamesThePracticeScaledKeys()
    {
        foreach (var design in Directory.GetFiles(TestPaths.Designs, "*.yaml").OrderBy(f => f, StringComparer.Ordinal))
        {
            var run = CliRun.Of("analyze", design, "--freq", "0.915GHz", "--json");
            Assert.True(run.ExitCode == 0, $"{design}: {run.FirstErrorLine}");
            using var doc = JsonDocument.Parse(run.Out);
            var root = doc.RootElement;
            var keys = root.GetProperty("practice_scaled_keys").EnumerateArray().Select(k => k.GetString()).ToList();
            var resolved = DesignResolver.ReadFile(design).Polarizer;
            Assert.Equal(resolved.ElementLengthM is null, keys.Contains("polarizer.element_length"));
            Assert.Equal(resolved.ElementRiseM is null, keys.Contains("polarizer.element_rise"));
            Assert.Equal(resolved.Winding == Winding.Auto, root.GetProperty("winding_chosen").GetBoolean());
            Assert.Equal(1, root.GetProperty("points").GetArrayLength());
        }
    }

    // With practice values for the auto keys, analyze of the practice build must report exactly the
    // practice-scaling layout the Model computes.
    [Fact]
    public void AnalyzeOfAnAutoDesignUsesThePracticeLayout()
    {
        var path = Path.Combine(TestPaths.Designs, "telemetry-915.yaml");
        var practice = DesignResolver.ReadFile(path).Practice;
        var run = CliRun.Of("analyze", path, "--json");
        Assert.Equal(0, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        Assert.Equal(practice.LengthM * 1e3, doc.RootElement.GetProperty("element_length_mm").GetDouble(), 9);
        Assert.Equal(practice.RiseM * 1e3, doc.RootElement.GetProperty("element_rise_mm").GetDouble(), 9);
    }

    // A linear whip against a CP partner loses about 3 dB (common practice, no source); the
    // polarization loss factor of linear against circular is 1/2 = 3.01 dB (Balanis §2.12.2).
    [Fact]
    public void MismatchOfALinearWhipAgainstCircularIsThreeDecibels()
    {
        var run = CliRun.Of("mismatch", "linear", "rhcp");
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("loss factor 0.5 (3.01 dB loss)", run.Out);
        var bad = CliRun.Of("mismatch", "rhcp:1.5", "linear");
        Assert.Equal(2, bad.ExitCode);
    }

    // Round trip: a measured best-AR frequency taken from the model at a known factor is fitted back
    // to that factor, and the file written is read back with the same number.
    [Fact]
    public void CalibrateFitsTheFactorThatPutsTheBestAxialRatioWhereItWasMeasured()
    {
        var path = PinnedCopy("left");
        var design = DesignResolver.ReadFile(path);
        double measured = CalibrationFit.BestArFrequencyHz(design, 6.0);
        var output = Path.Combine(Path.GetDirectoryName(path)!, "cal", "fitted.yaml");
        var run = CliRun.Of("calibrate", path, "--best-at", FormattableString.Invariant($"{measured / 1e9:0.#####}GHz"), "-o", output);
        Assert.Equal(0, run.ExitCode);
        var cal = CalibrationFile.Read(output);
        Assert.Equal(6.0, cal.Factor, 1);
        Assert.Equal("eps-foam + pvc-tape", cal.MaterialSet);
        var reach = CliRun.Of("calibrate", path, "--best-at", "9GHz", "-o", output + ".x");
        Assert.Equal(2, reach.ExitCode);
        Assert.False(File.Exists(output + ".x"));
    }

    // A misspelt key must not leave the factor silently at its default (the file's keys are the
    // ones CalibrationFile.Write writes).
    [Fact]
    public void CalibrationFileRefusesAnUnknownKey()
    {
        var folder = TestPaths.NewTempFolder();
        var bad = Path.Combine(folder, "bad.yaml");
        File.WriteAllText(bad, "material_set: foam\nloading_factor: 2\nloading_facter: 3\n");
        var ex = Assert.Throws<CalibrationException>(() => CalibrationFile.Read(bad, "bad.yaml"));
        Assert.Equal("bad.yaml:3:1: calibration: found key 'loading_facter', allowed material_set, loading_factor, fitted_by, design, source, added_inductance_h_per_m, residual, factor_low, factor_high, data", ex.Message);
        Directory.Delete(folder, recursive: true);
    }

    // A calibration file records a measurement: calibrate replaces one only when told to.
    [Fact]
    public void CalibrateKeepsAnExistingFileUnlessForced()
    {
        var path = PinnedCopy("left");
        var output = Path.Combine(Path.GetDirectoryName(path)!, "kept.yaml");
        File.WriteAllText(output, "loading_factor: 7\n");
        var run = CliRun.Of("calibrate", path, "--best-at", "5.8GHz", "-o", output);
        Assert.Equal(2, run.ExitCode);
        Assert.Equal($"helipol calibrate: {output}: found an existing file, allowed a new file (or --force to replace it)", run.FirstErrorLine);
        Assert.Equal("loading_factor: 7\n", File.ReadAllText(output));
    }

    // An 80-column terminal is the classic default (ECMA-48 and the VT100 lines are 80 wide): the
    // analyze table must fit it without cutting a header short.
    [Fact]
    public void AnalyzeTableFitsEightyColumnsWithWholeHeaders()
    {
        var run = CliRun.Of("analyze", PinnedCopy("left"), "--from", "5.7GHz", "--to", "5.9GHz", "--points", "2");
        Assert.Equal(0, run.ExitCode);
        // Colour codes (ECMA-48 SGR) take no columns on a terminal.
        var plain = System.Text.RegularExpressions.Regex.Replace(run.Out, "\u001b\\[[0-9;]*m", "");
        var table = plain.Split('\n').Skip(1).TakeWhile(l => !l.StartsWith("polarizer.", StringComparison.Ordinal)).ToList();
        Assert.All(table, l => Assert.True(l.Length <= 80, l));
        Assert.DoesNotContain("…", run.Out);
        Assert.Contains("window AR", run.Out);
    }

    // solve.sweep.points accepts 3 to 1001 (DesignKeys); the command-line override takes the same.
    [Fact]
    public void SweepPointsHaveTheDesignFileLimits()
    {
        var run = CliRun.Of("sweep", PinnedCopy("left"), "--points", "1500");
        Assert.Equal(2, run.ExitCode);
        Assert.Equal("helipol sweep: --points: found 1500, allowed 3 to 1001 (as solve.sweep.points)", run.FirstErrorLine);
    }

    [Fact]
    public void CalibrationFileErrorsNameTheLineAndKey()
    {
        var folder = TestPaths.NewTempFolder();
        var bad = Path.Combine(folder, "bad.yaml");
        File.WriteAllText(bad, "material_set: foam\nloading_factor: lots\n");
        var ex = Assert.Throws<CalibrationException>(() => CalibrationFile.Read(bad, "bad.yaml"));
        Assert.Equal("bad.yaml:2:17: loading_factor: found 'lots', allowed a number from 0 to 1000", ex.Message);
    }

    [Fact]
    public void ABadCalibrationFileReferencedByADesignIsBadInput()
    {
        var folder = TestPaths.NewTempFolder();
        Directory.CreateDirectory(Path.Combine(folder, "cal"));
        File.WriteAllText(Path.Combine(folder, "cal", "bad.yaml"), "loading_factor: -2\n");
        var text = File.ReadAllText(Path.Combine(TestPaths.Data, "designs", "practice-foam-tape.yaml"))
            .Replace("  sense: rhcp\n", "  sense: rhcp\n  winding: left\n") + "calibration: cal/bad.yaml\n";
        var design = Path.Combine(folder, "d.yaml");
        File.WriteAllText(design, text);
        var run = CliRun.Of("analyze", design, "--freq", "5.8GHz");
        Assert.Equal(2, run.ExitCode);
        Assert.EndsWith("bad.yaml:1:17: loading_factor: found '-2', allowed a number from 0 to 1000", run.FirstErrorLine);
    }
}
