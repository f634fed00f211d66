namespace Helipol.Tests.Cli;

/// <summary>build writes the report, its plots and the fabrication set beside design.json, byte for byte the same on every run.</summary>
public class ReportBuildTests
{
    private static readonly string[] Expected =
    {
        "ar-gain.png", "ar-map.png", "assembly.png", "bend-sheet.pdf", "bend-sheet.png", "design.json", "drill.dxf", "former.3mf", "former.stl",
        "jig.stl", "packet.pdf", "pattern-azimuth.png", "pattern-elevation.png", "report.md", "rings.dxf", "vswr.png",
    };

    [Fact]
    public void BuildWritesTheReportAndPlotsIdenticallyTwice()
    {
        var design = Path.Combine(TestPaths.Designs, "ridge-video-rx.yaml");
        var a = TestPaths.NewTempFolder();
        var b = TestPaths.NewTempFolder();
        Assert.Equal(0, CliRun.Of("build", design, "-o", a).ExitCode);
        Assert.Equal(0, CliRun.Of("build", design, "-o", b).ExitCode);
        var files = Directory.GetFiles(Path.Combine(a, "ridge-video-rx")).Select(Path.GetFileName).OrderBy(n => n, StringComparer.Ordinal).ToArray();
        Assert.Equal(Expected, files);
        foreach (var name in Expected)
            Assert.Equal(File.ReadAllBytes(Path.Combine(a, "ridge-video-rx", name)), File.ReadAllBytes(Path.Combine(b, "ridge-video-rx", name)));
        var report = File.ReadAllText(Path.Combine(a, "ridge-video-rx", "report.md"));
        Assert.Contains("practice scaling", report);
        Assert.Contains("![search objective map](ar-map.png)", report);
        using var json = System.Text.Json.JsonDocument.Parse(File.ReadAllBytes(Path.Combine(a, "ridge-video-rx", "design.json")));
        var solved = json.RootElement.GetProperty("solved");
        Assert.Equal(0.016002, solved.GetProperty("element_length_m").GetDouble(), 12);
        Assert.True(solved.GetProperty("search").GetProperty("field_solves").GetInt64() > 0);
        Assert.Equal(500, solved.GetProperty("tolerance").GetProperty("builds").GetInt32());
    }
}
