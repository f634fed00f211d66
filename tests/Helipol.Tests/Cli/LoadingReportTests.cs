using System.Text.Json;
using Helipol.Tests.Design;

namespace Helipol.Tests.Cli;

/// <summary>
/// What analyze --json reports as the element loading, against the full-wave figures of the
/// project's issue 9 (openEMS FDTD of the same cross-section, docs/fullwave/README.md): tape on foam
/// needs 104-122 nH/m on NEC-2, and the band accepted here is 80-125 nH/m; foam alone (wrap none)
/// 4-20 nH/m.
/// </summary>
public class LoadingReportTests
{
    private static JsonElement Loading(string yaml)
    {
        var folder = TestPaths.NewTempFolder();
        var path = Path.Combine(folder, "d.yaml");
        File.WriteAllText(path, yaml);
        var run = CliRun.Of("analyze", path, "--json");
        Assert.Equal(0, run.ExitCode);
        using var doc = JsonDocument.Parse(run.Out);
        return doc.RootElement.GetProperty("loading").Clone();
    }

    [Fact]
    public void TapeOnFoamAndFoamAloneFallInTheFullWaveBands()
    {
        var tape = File.ReadAllText(DesignFiles.PathOf("tape-on-foam"));
        var l = Loading(tape);
        Assert.InRange(l.GetProperty("added_inductance_h_per_m").GetDouble(), 80e-9, 125e-9);
        Assert.Equal(1, l.GetProperty("factor").GetDouble());
        // FDTD: −8.5 % for the tape hugging the wire (issue 9); within 1.5 points.
        Assert.InRange(l.GetProperty("shortening_percent").GetDouble(), 8.5 - 1.5, 8.5 + 1.5);
        Assert.True(l.GetProperty("layer_share").GetProperty("wrap").GetDouble() > 0.8);
        var none = Loading(System.Text.RegularExpressions.Regex.Replace(tape, "  wrap: .*", "  wrap: none"));
        Assert.InRange(none.GetProperty("added_inductance_h_per_m").GetDouble(), 4e-9, 20e-9);
    }
}
