using System.Text.Json;
using System.Text.Json.Nodes;
using Helipol.Tests.Cli;

namespace Helipol.Tests.Verdict;

/// <summary>
/// The trimming hint never proposes a change that flips the sense anywhere in the coverage window:
/// the change it states is applied to the solved design (a copy of its design.json with the new
/// element length) and that geometry is evaluated again by analyze over the window.
/// </summary>
public class TrimmingSenseTests
{
    // A cut-down or refused hint says why, in the window's terms.
    [Fact]
    public void ACutDownHintNamesTheFlip()
    {
        var full = Helipol.Design.TrimmingHint.For(868e6, 850e6, -6.5, 1.34, 1.0);
        var limited = Helipol.Design.TrimmingHint.Limited(full, full.LengthChangeMm / 2, "868 MHz, 45° elevation");
        Assert.Equal(full.LengthChangeMm / 2, limited.LengthChangeMm, 12);
        Assert.Contains("flips the sense at 868 MHz, 45° elevation", limited.Text);
        var refused = Helipol.Design.TrimmingHint.Refused(full, "868 MHz, 45° elevation");
        Assert.Equal(0, refused.LengthChangeMm);
        Assert.StartsWith("no trimming", refused.Text);
    }

    [Fact]
    public void TheHintedChangeKeepsTheWantedSenseInTheWindow()
    {
        var r = VerdictRuns.Get;
        var sources = new[] { (Name: "lora-868", Text: r.StarterSolve.Out), (Name: VerdictRuns.GoodDemo, Text: File.ReadAllText(r.Output(VerdictRuns.GoodDemo, "design.json"))) };
        foreach (var (name, text) in sources)
        {
            var root = JsonNode.Parse(text)!.AsObject();
            var solved = root["solved"]!.AsObject();
            bool nominalRight = solved["band"]!.AsArray().All(p => p!["wrong_sense_share"]!.GetValue<double>() == 0);
            var change = solved["tolerance"]!["length_change_to_centre_mm"];
            // A change the hint itself calls too small to cut is not proposed.
            if (!nominalRight || change is null || solved["tolerance"]!["trimming_hint"]!.GetValue<string>().StartsWith("no trimming", StringComparison.Ordinal)) continue;
            double changeMm = change.GetValue<double>();
            solved["element_length_m"] = solved["element_length_m"]!.GetValue<double>() + changeMm * 1e-3;
            var path = Path.Combine(TestPaths.NewTempFolder(), "design.json");
            File.WriteAllText(path, root.ToJsonString());
            var run = CliRun.Of("analyze", path, "--json");
            Assert.True(run.ExitCode == 0, run.FirstErrorLine);
            using var doc = JsonDocument.Parse(run.Out);
            foreach (var p in doc.RootElement.GetProperty("points").EnumerateArray())
                Assert.True(p.GetProperty("window").GetProperty("wrong_sense_share").GetDouble() == 0,
                    $"{name}: a {changeMm:0.00} mm change flips the sense at {p.GetProperty("frequency_hz").GetDouble() / 1e6} MHz");
        }
    }
}
