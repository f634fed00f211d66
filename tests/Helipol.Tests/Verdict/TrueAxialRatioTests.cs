using System.Numerics;
using System.Text.Json;
using Helipol.Tests.Cli;

namespace Helipol.Tests.Verdict;

/// <summary>
/// Every axial ratio helipol writes is the polarization ellipse's axis ratio, and every realized gain
/// is the gain less the mismatch loss, checked point by point against the definitions of IEEE Std 145
/// (AR = (|E_R| + |E_L|)/||E_R| − |E_L||, with |E| ∝ √(power gain); realized gain = gain × (1 − |Γ|²),
/// Γ = (Z − Z0)/(Z + Z0)), recomputed here from the figures each point reports.
/// </summary>
public class TrueAxialRatioTests
{
    private static double ArFromGainsDb(double rhcpDbic, double lhcpDbic)
    {
        double r = Math.Pow(10, rhcpDbic / 20), l = Math.Pow(10, lhcpDbic / 20);
        return 20 * Math.Log10((r + l) / Math.Abs(r - l));
    }

    private static void EveryPointsAxialRatioFollowsFromItsAmplitudes(JsonElement root)
    {
        int n = 0;
        foreach (var p in JsonPoints.WithWorstDirection(root))
        {
            var w = p.GetProperty("worst_direction");
            double gr = w.GetProperty("gain_rhcp_dbic").GetDouble(), gl = w.GetProperty("gain_lhcp_dbic").GetDouble();
            double expected = Math.Min(100, ArFromGainsDb(gr, gl)); // 100 dB: the engine's figure for an exactly linear field
            Assert.Equal(expected, p.GetProperty("axial_ratio_db").GetDouble(), 6);
            Assert.Equal(expected, w.GetProperty("axial_ratio_db").GetDouble(), 6);
            // The sense is the stronger circular component's; past a 1000:1 ellipse (60 dB) the engine calls it linear.
            Assert.Equal(expected > 60 ? "linear" : gr > gl ? "RHCP" : "LHCP", p.GetProperty("axial_ratio_sense").GetString());
            // The mean and the largest axial ratio over the directions bracket... at least the largest is no smaller than this one.
            Assert.True(p.GetProperty("axial_ratio_db_max").GetDouble() >= expected - 1e-9);
            n++;
        }
        Assert.True(n >= 10, $"only {n} points checked");
    }

    private static void EveryRealizedGainIsTheGainLessTheMismatch(JsonElement root)
    {
        int n = 0;
        foreach (var (z, p) in JsonPoints.WithRealizedGain(root))
        {
            double z0 = p.GetProperty("receiver_impedance_ohm").GetDouble();
            double gamma = ((z - z0) / (z + z0)).Magnitude;
            double loss = 10 * Math.Log10(1 - gamma * gamma);
            Assert.Equal(p.GetProperty("gain_rhcp_dbic").GetDouble() + loss, p.GetProperty("realized_gain_rhcp_dbic").GetDouble(), 0.05);
            Assert.Equal(p.GetProperty("gain_lhcp_dbic").GetDouble() + loss, p.GetProperty("realized_gain_lhcp_dbic").GetDouble(), 0.05);
            n++;
        }
        Assert.True(n >= 10, $"only {n} points checked");
    }

    [Fact]
    public void SolveJsonAxialRatiosAreTrueAxialRatios()
    {
        using var doc = VerdictRuns.Get.StarterJson();
        EveryPointsAxialRatioFollowsFromItsAmplitudes(doc.RootElement);
    }

    [Fact]
    public void BuildJsonAxialRatiosAreTrueAxialRatios()
    {
        using var doc = VerdictRuns.Get.GoodJson();
        EveryPointsAxialRatioFollowsFromItsAmplitudes(doc.RootElement);
    }

    [Fact]
    public void SolveAndBuildRealizedGainsCountTheMismatch()
    {
        using var a = VerdictRuns.Get.StarterJson();
        EveryRealizedGainIsTheGainLessTheMismatch(a.RootElement);
        using var b = VerdictRuns.Get.GoodJson();
        EveryRealizedGainIsTheGainLessTheMismatch(b.RootElement);
    }

    // analyze against a receiver other than 50 Ω: the identity must hold for the impedance it names.
    [Fact]
    public void AnalyzeRealizedGainsMatchTheirImpedance()
    {
        var folder = TestPaths.NewTempFolder();
        var text = File.ReadAllText(Path.Combine(TestPaths.Data, "designs", "practice-foam-tape.yaml"));
        var path = Path.Combine(folder, "z75.yaml");
        File.WriteAllText(path, text + (text.Contains("\nsolve:") ? "" : "solve:\n  receiver_impedance: 75 ohm\n"));
        var run = CliRun.Of("analyze", path, "--from", "5.6GHz", "--to", "6GHz", "--points", "5", "--json");
        Assert.True(run.ExitCode == 0, run.FirstErrorLine);
        using var doc = JsonDocument.Parse(run.Out);
        EveryRealizedGainIsTheGainLessTheMismatch(doc.RootElement);
        EveryPointsAxialRatioFollowsFromItsAmplitudes(doc.RootElement);
        Assert.Equal(75, doc.RootElement.GetProperty("points")[0].GetProperty("receiver_impedance_ohm").GetDouble());
    }

    // No text output labels the search's score as an axial ratio: past 30 dB the score runs on
    // linearly, so a printed axial ratio above the engine's linear limit (60 dB) in the wanted sense
    // or a "capped" axial ratio would betray it.
    [Fact]
    public void ReportsNameNoCappedOrExtendedAxialRatio()
    {
        var r = VerdictRuns.Get;
        var report = File.ReadAllText(r.Output(VerdictRuns.GoodDemo, "report.md"));
        Assert.DoesNotContain("AR capped", report);
        Assert.DoesNotContain("a LHCP", report);
        Assert.DoesNotContain("a RHCP", report);
        using var doc = r.StarterJson();
        var solved = doc.RootElement.GetProperty("solved");
        Assert.False(solved.TryGetProperty("objective_db", out _));
        Assert.True(solved.TryGetProperty("objective_score", out _));
    }
}
