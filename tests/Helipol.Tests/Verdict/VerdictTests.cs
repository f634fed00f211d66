using System.Text.Json;
using Helipol.Tests.Cli;

namespace Helipol.Tests.Verdict;

/// <summary>
/// The verdict on designs whose outcome is known from the physics: a starter whose 216 mm monopole
/// (0.62 λ at 868 MHz) and pinned practice layout give no circular polarization over its window, and a
/// demo solved for its band.
/// </summary>
public class VerdictTests
{
    [Fact]
    public void TheStarterThatCannotWorkFails()
    {
        var r = VerdictRuns.Get;
        Assert.True(r.StarterSolve.ExitCode == 0, r.StarterSolve.FirstErrorLine);
        using var doc = r.StarterJson();
        var verdict = doc.RootElement.GetProperty("solved").GetProperty("verdict");
        Assert.Equal("fails", verdict.GetProperty("grade").GetString());
        Assert.True(verdict.GetProperty("reasons").GetArrayLength() >= 3);
        Assert.False(string.IsNullOrWhiteSpace(verdict.GetProperty("next_step").GetString()));
        // Stdout carries only the JSON; the verdict line and the warning go to stderr.
        Assert.Contains("verdict lora-868: fails:", r.StarterSolve.Error);
        Assert.Contains("FAILS", r.StarterSolve.Error);
    }

    [Fact]
    public void StrictBuildExitsThreeOnFailsAndStillWritesTheFiles()
    {
        var r = VerdictRuns.Get;
        Assert.Equal(3, r.StarterBuild.ExitCode);
        Assert.Contains("verdict lora-868: fails:", r.StarterBuild.Out);
        Assert.Contains("helipol: warning: lora-868 FAILS", r.StarterBuild.Error);
        var report = File.ReadAllLines(r.Output("lora-868", "report.md"));
        Assert.StartsWith("**Verdict: fails.**", report[2]);
    }

    [Fact]
    public void AGoodDemoDoesNotFail()
    {
        var r = VerdictRuns.Get;
        Assert.True(r.GoodBuild.ExitCode == 0, r.GoodBuild.FirstErrorLine);
        using var doc = r.GoodJson();
        var grade = doc.RootElement.GetProperty("solved").GetProperty("verdict").GetProperty("grade").GetString();
        Assert.NotEqual("fails", grade);
        Assert.Contains($"verdict {VerdictRuns.GoodDemo}: {grade}:", r.GoodBuild.Out);
        Assert.DoesNotContain("FAILS", r.GoodBuild.Error);
        var report = File.ReadAllLines(r.Output(VerdictRuns.GoodDemo, "report.md"));
        Assert.StartsWith($"**Verdict: {grade}.**", report[2]);
    }

    // The grade is the worst of its reasons, each ending in its own grade word.
    [Fact]
    public void TheGradeIsTheWorstOfItsReasons()
    {
        foreach (var doc in new[] { VerdictRuns.Get.StarterJson(), VerdictRuns.Get.GoodJson() })
            using (doc)
            {
                var v = doc.RootElement.GetProperty("solved").GetProperty("verdict");
                var words = v.GetProperty("reasons").EnumerateArray().Select(x => x.GetString()!.Split(": ")[^1]).ToArray();
                string[] order = ["works", "marginal", "fails"];
                Assert.All(words, w => Assert.Contains(w, order));
                Assert.Equal(order[words.Max(w => Array.IndexOf(order, w))], v.GetProperty("grade").GetString());
            }
    }

    // The acceptance: analyze of the build's design.json evaluates the solved geometry and gives the
    // build's centre-frequency worst axial ratio again (to 0.05 dB).
    [Fact]
    public void AnalyzeOfTheBuildsDesignJsonReproducesItsCentreAxialRatio()
    {
        var r = VerdictRuns.Get;
        var path = r.Output(VerdictRuns.GoodDemo, "design.json");
        var run = CliRun.Of("analyze", path, "--json");
        Assert.True(run.ExitCode == 0, run.FirstErrorLine);
        using var built = r.GoodJson();
        using var analyzed = JsonDocument.Parse(run.Out);
        var centre = built.RootElement.GetProperty("band").GetProperty("center_hz").GetDouble();
        var band = built.RootElement.GetProperty("solved").GetProperty("band").EnumerateArray().Single(p => p.GetProperty("frequency_hz").GetDouble() == centre);
        var point = analyzed.RootElement.GetProperty("points").EnumerateArray().Single(p => p.GetProperty("frequency_hz").GetDouble() == centre);
        Assert.Equal(band.GetProperty("axial_ratio_db").GetDouble(), point.GetProperty("window").GetProperty("axial_ratio_db").GetDouble(), 0.05);
        Assert.Equal(built.RootElement.GetProperty("solved").GetProperty("element_length_m").GetDouble() * 1e3, analyzed.RootElement.GetProperty("element_length_mm").GetDouble(), 9);
        Assert.Equal("solved geometry from design.json", analyzed.RootElement.GetProperty("geometry").GetString());
        Assert.Empty(analyzed.RootElement.GetProperty("practice_scaled_keys").EnumerateArray());
    }

    // A design file with auto keys is evaluated at practice scaling, and the first line says so.
    [Fact]
    public void PlainAnalyzeOfAnAutoDesignSaysItEvaluatesPracticeScaling()
    {
        var run = CliRun.Of("analyze", Path.Combine(TestPaths.Designs, VerdictRuns.GoodDemo + ".yaml"), "--freq", "915MHz");
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("evaluates practice scaling", run.Out.Split('\n')[0]);
    }

    // --solve evaluates the solution, not practice scaling: no key is named practice-scaled.
    [Fact]
    public void AnalyzeWithSolveEvaluatesTheSolution()
    {
        var run = CliRun.Of("analyze", Path.Combine(TestPaths.Designs, VerdictRuns.GoodDemo + ".yaml"), "--solve", "--freq", "915MHz", "--json");
        Assert.True(run.ExitCode == 0, run.FirstErrorLine);
        using var doc = JsonDocument.Parse(run.Out);
        Assert.Equal("solved first (--solve)", doc.RootElement.GetProperty("geometry").GetString());
        Assert.Empty(doc.RootElement.GetProperty("practice_scaled_keys").EnumerateArray());
        Assert.DoesNotContain("practice scaling", run.Error);
    }

    [Fact]
    public void AnalyzeRefusesAFileThatIsNoDesignJson()
    {
        var folder = TestPaths.NewTempFolder();
        var path = Path.Combine(folder, "other.json");
        File.WriteAllText(path, "{\"name\": \"x\"}");
        var run = CliRun.Of("analyze", path);
        Assert.Equal(2, run.ExitCode);
        Assert.StartsWith($"{path}: solved: found no solved design", run.FirstErrorLine);
    }

    // The cut tolerance stands beside the element length on the bend sheet and in the packet summary.
    [Fact]
    public void TheToleranceSaysHowPreciselyToCut()
    {
        using var doc = VerdictRuns.Get.GoodJson();
        var t = doc.RootElement.GetProperty("solved").GetProperty("tolerance");
        Assert.True(t.TryGetProperty("cut_tolerance_mm", out var cut));
        Assert.Contains(t.GetProperty("cut_tolerance").GetString(), new[] { "cut to within", "no cut tolerance" }, new PrefixComparer());
        if (cut.ValueKind == JsonValueKind.Number && cut.GetDouble() > 0)
            Assert.Contains(cut.GetDouble().ToString("0.0#", System.Globalization.CultureInfo.InvariantCulture), t.GetProperty("cut_tolerance").GetString());
    }

    // The bend sheet (read back with PdfPig, an outside PDF reader) prints the cut figure beside the
    // element length, and page 1 of the packet opens with the verdict.
    [Fact]
    public void TheBendSheetAndPacketCarryTheCutFigureAndVerdict()
    {
        var r = VerdictRuns.Get;
        using var doc = r.GoodJson();
        var solved = doc.RootElement.GetProperty("solved");
        var cut = solved.GetProperty("tolerance").GetProperty("cut_tolerance_mm");
        using (var sheet = UglyToad.PdfPig.PdfDocument.Open(r.Output(VerdictRuns.GoodDemo, "bend-sheet.pdf")))
        {
            var text = string.Join(" ", sheet.GetPages().Select(p => string.Join(" ", p.GetWords().Select(w => w.Text))));
            if (cut.ValueKind == JsonValueKind.Number && cut.GetDouble() > 0)
                Assert.Contains($"cut to within ± {cut.GetDouble().ToString("0.00", System.Globalization.CultureInfo.InvariantCulture)} mm", text);
            else
                Assert.Contains("tolerance ±", text);
        }
        using var packet = UglyToad.PdfPig.PdfDocument.Open(r.Output(VerdictRuns.GoodDemo, "packet.pdf"));
        var first = string.Join(" ", packet.GetPage(1).GetWords().Select(w => w.Text));
        Assert.Contains("Verdict " + solved.GetProperty("verdict").GetProperty("grade").GetString()!.ToUpperInvariant(), first);
    }

    private sealed class PrefixComparer : IEqualityComparer<string?>
    {
        public bool Equals(string? x, string? y) => x is not null && y is not null && (x.StartsWith(y, StringComparison.Ordinal) || y.StartsWith(x, StringComparison.Ordinal));
        public int GetHashCode(string? s) => 0;
    }
}
