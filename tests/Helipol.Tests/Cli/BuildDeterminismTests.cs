using System.Globalization;

namespace Helipol.Tests.Cli;

/// <summary>The same design gives the same design.json bytes: across runs and whatever the user's culture.</summary>
public class BuildDeterminismTests
{
    private static byte[] BuildOnce(string design, CultureInfo culture)
    {
        var previous = CultureInfo.CurrentCulture;
        var output = TestPaths.NewTempFolder();
        try
        {
            CultureInfo.CurrentCulture = culture;
            var run = CliRun.Of("build", design, "-o", output);
            Assert.Equal(0, run.ExitCode);
            var name = Path.GetFileNameWithoutExtension(design);
            return File.ReadAllBytes(Path.Combine(output, name, "design.json"));
        }
        finally
        {
            CultureInfo.CurrentCulture = previous;
            Directory.Delete(output, recursive: true);
        }
    }

    public static TheoryData<string> Designs() => TestPaths.DemoDesignNames();

    [Theory]
    [MemberData(nameof(Designs))]
    public void DesignJsonIsByteIdenticalAcrossRunsAndCultures(string name)
    {
        var design = Path.Combine(TestPaths.Designs, name);
        var first = BuildOnce(design, CultureInfo.InvariantCulture);
        var second = BuildOnce(design, CultureInfo.InvariantCulture);
        var german = BuildOnce(design, new CultureInfo("de-DE")); // decimal comma culture
        Assert.Equal(first, second);
        Assert.Equal(first, german);
        Assert.DoesNotContain((byte)'\r', first);
    }

    [Fact]
    public void DesignJsonIsValidJsonAndCarriesTheResolvedNumbers()
    {
        var bytes = BuildOnce(Path.Combine(TestPaths.Designs, "ridge-video-rx.yaml"), CultureInfo.InvariantCulture);
        using var doc = System.Text.Json.JsonDocument.Parse(bytes);
        var root = doc.RootElement;
        Assert.Equal(5.8e9, root.GetProperty("band").GetProperty("center_hz").GetDouble());
        // 0.63 in = 16.002 mm (NIST SP 811: 1 in = 25.4 mm exactly).
        Assert.Equal(0.016002, root.GetProperty("polarizer").GetProperty("element_length_m").GetDouble(), 12);
        Assert.Equal("practice scaling, not solved", root.GetProperty("practice_scaling").GetProperty("label").GetString());
    }

    [Fact]
    public void SolveJsonIsTheSameDocumentAsDesignJson()
    {
        var design = Path.Combine(TestPaths.Designs, "telemetry-915.yaml");
        var run = CliRun.Of("solve", design, "--json");
        Assert.Equal(0, run.ExitCode);
        Assert.Equal(BuildOnce(design, CultureInfo.InvariantCulture), System.Text.Encoding.UTF8.GetBytes(run.Out));
    }
}
