using Helipol.Spec;

namespace Helipol.Tests.Cli;

public class VerbTests
{
    [Theory]
    [InlineData("check")]
    [InlineData("solve")]
    [InlineData("build")]
    [InlineData("new")]
    [InlineData("schema")]
    public void EveryVerbHasHelp(string verb)
    {
        var run = CliRun.Of(verb, "--help");
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Usage:", run.Out);
    }

    [Fact]
    public void VersionIsPrinted()
    {
        var run = CliRun.Of("--version");
        Assert.Equal(0, run.ExitCode);
        Assert.StartsWith("0.1.0", run.Out.Trim());
    }

    [Fact]
    public void UnknownVerbIsBadInput()
    {
        var run = CliRun.Of("frobnicate");
        Assert.Equal(2, run.ExitCode);
        Assert.Single(run.Error.TrimEnd('\n').Split('\n'));
    }

    [Fact]
    public void CheckAcceptsEveryDemoDesign()
    {
        var run = CliRun.Of(new[] { "check" }.Concat(TestPaths.DemoDesigns).ToArray());
        Assert.Equal(0, run.ExitCode);
        Assert.Equal(TestPaths.DemoDesigns.Count(), run.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length);
    }

    [Fact]
    public void SolveLabelsPracticeScaling()
    {
        var run = CliRun.Of("solve", Path.Combine(TestPaths.Designs, "farm-survey-2g4.yaml"));
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("practice scaling, not solved", run.Out);
    }

    [Theory]
    [InlineData("2.45GHz", "dipole")]
    [InlineData("915 MHz", "dipole")]
    [InlineData("1.28GHz", "monopole")]
    [InlineData("5.8GHz", "monopole")]
    public void NewWritesADesignThatPassesCheck(string center, string whip)
    {
        var folder = TestPaths.NewTempFolder();
        try
        {
            var run = CliRun.Of("new", "starter", "--center", center, "--whip", whip, "-o", folder);
            Assert.Equal(0, run.ExitCode);
            var path = Path.Combine(folder, "starter.yaml");
            Assert.Equal(0, CliRun.Of("check", path).ExitCode);
            Assert.StartsWith("# yaml-language-server: $schema=./helipol.schema.json", File.ReadAllText(path));
            // The schema the first line names is beside the design, and is the current one.
            Assert.Equal(Helipol.Spec.DesignSchema.Generate(), File.ReadAllText(Path.Combine(folder, "helipol.schema.json")));
            var again = CliRun.Of("new", "starter", "--center", center, "-o", folder);
            Assert.Equal(2, again.ExitCode); // never overwrites: an existing name is bad input
            Assert.Contains("starter.yaml: found an existing file", again.FirstErrorLine);
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    // The whole band the design file accepts (100 MHz to 20 GHz), both whips: every starter passes
    // `check` with no warning, except the printed-sleeve groove note from about 17 GHz, where the
    // thin-wire limit (wire radius under 1 % of λ, DesignWarnings) leaves a wire under 0.33 mm
    // whose 0.6-diameter groove is shallower than one 0.2 mm print layer.
    [Theory]
    [InlineData("dipole")]
    [InlineData("monopole")]
    public void NewWritesACheckedDesignForEveryBand(string whip)
    {
        var folder = TestPaths.NewTempFolder();
        try
        {
            foreach (var center in new[] { "100MHz", "144MHz", "433MHz", "868MHz", "1.575GHz", "2.45GHz", "5.8GHz", "10GHz", "14GHz", "17GHz", "20GHz" })
            {
                var name = "s" + center.Replace(".", "_");
                var run = CliRun.Of("new", name, "--center", center, "--whip", whip, "-o", folder);
                Assert.True(run.ExitCode == 0, $"{center} {whip}: {run.FirstErrorLine}");
                var check = CliRun.Of("check", Path.Combine(folder, name + ".yaml"));
                Assert.True(check.ExitCode == 0, $"{center} {whip}: {check.FirstErrorLine}");
                var warnings = check.Out.Split('\n').Where(l => l.Contains(": warning: ")).ToList();
                var allowed = center is "17GHz" or "20GHz" ? warnings.Where(w => !w.Contains("printed sleeve's grooves would be")) : warnings;
                Assert.True(!allowed.Any(), $"{center} {whip}: {string.Join(" | ", warnings)}");
            }
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    // Comments start in one column, so the file reads as a table.
    [Fact]
    public void NewAlignsItsComments()
    {
        var text = Helipol.Cli.Verbs.StarterDesign.Text("aligned", 2.45e9, monopole: false);
        var columns = text.Split('\n').Where(l => !l.StartsWith('#') && l.Contains(" # ")).Select(l => l.IndexOf(" # ", StringComparison.Ordinal)).Distinct().ToList();
        Assert.Single(columns);
    }

    // A starter must build, not only check: the ends of the band and a low UHF band, with a
    // small search so the test stays cheap.
    [Theory]
    [InlineData("100MHz", "dipole")]
    [InlineData("433MHz", "monopole")]
    [InlineData("20GHz", "dipole")]
    [InlineData("20GHz", "monopole")]
    public void NewWritesADesignThatBuilds(string center, string whip)
    {
        var folder = TestPaths.NewTempFolder();
        try
        {
            Assert.Equal(0, CliRun.Of("new", "starter", "--center", center, "--whip", whip, "-o", folder).ExitCode);
            var path = Path.Combine(folder, "starter.yaml");
            File.AppendAllText(path, "solve:\n  frequencies: 1\n  search: { grid: 3 }\n  sweep: { points: 3 }\ntolerance: { builds: 2 }\n");
            var run = CliRun.Of("build", path, "-o", Path.Combine(folder, "out"));
            Assert.True(run.ExitCode == 0, $"{center} {whip}: {run.FirstErrorLine}");
            Assert.True(File.Exists(Path.Combine(folder, "out", "starter", "rings.dxf")));
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    [Theory]
    [InlineData("2.45", "starter")]
    [InlineData("50 MHz", "starter")]
    [InlineData("2.45GHz", "../escape")]
    public void NewRefusesBadInputAndWritesNothing(string center, string name)
    {
        var folder = TestPaths.NewTempFolder();
        try
        {
            var run = CliRun.Of("new", name, "--center", center, "-o", folder);
            Assert.Equal(2, run.ExitCode);
            Assert.Empty(Directory.EnumerateFileSystemEntries(folder));
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    [Fact]
    public void DuplicateNamesInOneBuildAreRefused()
    {
        var folder = TestPaths.NewTempFolder();
        try
        {
            var a = Path.Combine(folder, "a.yaml");
            var b = Path.Combine(folder, "b.yaml");
            File.Copy(Path.Combine(TestPaths.Designs, "ridge-video-rx.yaml"), a);
            File.Copy(Path.Combine(TestPaths.Designs, "ridge-video-rx.yaml"), b);
            var output = Path.Combine(folder, "out");
            var run = CliRun.Of("build", a, b, "-o", output);
            Assert.Equal(2, run.ExitCode);
            Assert.False(Directory.Exists(output));
            Assert.Equal($"{b}: name: found 'ridge-video-rx', also the name in {a}, allowed a name unique among the designs built together (it names the output folder)", run.FirstErrorLine);
        }
        finally { Directory.Delete(folder, recursive: true); }
    }
}

public class BuildFaultTests
{
    [Fact]
    public void UnwritableOutputIsARuntimeFailureWithOneLine()
    {
        var folder = TestPaths.NewTempFolder();
        try
        {
            var blocker = Path.Combine(folder, "not-a-folder");
            File.WriteAllText(blocker, "a file where the output folder should be");
            var run = CliRun.Of("build", Path.Combine(TestPaths.Designs, "ridge-video-rx.yaml"), "-o", blocker);
            Assert.Equal(1, run.ExitCode);
            Assert.StartsWith("helipol: ", run.Error);
            Assert.Single(run.Error.TrimEnd('\n').Split('\n'));
            Assert.Equal("a file where the output folder should be", File.ReadAllText(blocker));
        }
        finally { Directory.Delete(folder, recursive: true); }
    }
}
