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
            Assert.Equal(1, CliRun.Of("new", "starter", "--center", center, "-o", folder).ExitCode); // never overwrites
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
