namespace Helipol.Tests.Cli;

/// <summary>
/// Every verb that solves refuses a geometry the thin-wire model cannot trust before any solve,
/// with the same single line as <c>check</c> and exit code 2: segments shorter than four wire
/// radii (the thin-wire kernel's validity limit; Harrington, Field Computation by Moment Methods,
/// ch. 4), a searched former that would put the elements inside the cover, a calibration file
/// that is not usable. The expected lines are the corpus's .expected files.
/// </summary>
public class RefusalTests
{
    private static string Bad(string name) => Path.Combine(TestPaths.Data, "bad", name);

    public static TheoryData<string, string> Cases()
    {
        var data = new TheoryData<string, string>();
        foreach (var file in new[] { "segments-under-four-radii.yaml", "former-inside-cover.yaml", "calibration-nan-factor.yaml", "elements-touch.yaml" })
            foreach (var verb in new[] { "solve", "build", "analyze", "sweep", "tolerance", "calibrate" })
                data.Add(verb, file);
        return data;
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void VerbRefusesWithTheCheckLineAndExitTwo(string verb, string file)
    {
        var path = Bad(file);
        var expected = Path.Combine(Path.GetDirectoryName(path)!, File.ReadAllText(Path.ChangeExtension(path, ".expected")).TrimEnd('\n'));
        var output = TestPaths.NewTempFolder();
        try
        {
            string[] args = verb switch
            {
                "build" => ["build", path, "-o", output],
                "calibrate" => ["calibrate", path, "--best-at", "5.7 GHz", "-o", Path.Combine(output, "cal.yaml")],
                _ => [verb, path],
            };
            var run = CliRun.Of(args);
            Assert.Equal(2, run.ExitCode);
            Assert.Equal(expected + "\n", run.Error);
            Assert.Equal("", run.Out);
            Assert.Empty(Directory.EnumerateFileSystemEntries(output));
        }
        finally { Directory.Delete(output, recursive: true); }
    }

    [Fact]
    public void SearchThatFindsNothingBuildableIsBadInputInEveryVerb()
    {
        // Auto length and rise on a former too low for any element with its end margins: the
        // search has no candidate; sweep and tolerance used to end in an internal error here.
        var folder = TestPaths.NewTempFolder();
        try
        {
            var design = Path.Combine(folder, "low.yaml");
            File.WriteAllText(design, File.ReadAllText(Bad("missing-calibration.yaml"))
                .Replace("element_length: 16 mm", "element_length: auto").Replace("element_rise: 12.7 mm", "element_rise: auto")
                .Replace("height: 19 mm", "height: 2 mm").Replace("calibration: cal/does-not-exist.yaml\n", ""));
            foreach (var verb in new[] { "solve", "sweep", "tolerance" })
            {
                var run = CliRun.Of(verb, design);
                Assert.Equal(2, run.ExitCode);
                Assert.Equal($"{design}: polarizer: found no element length and rise in the search range can be built on this former (rise, spacing or bend radius out of limits), allowed a search range with buildable geometry (widen solve.search or the former)\n", run.Error);
            }
        }
        finally { Directory.Delete(folder, recursive: true); }
    }
}
