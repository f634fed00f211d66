using Helipol.Tests.Cli;

namespace Helipol.Tests.Spec;

/// <summary>
/// Every file in data/bad/ must be refused by the real <c>check</c> and <c>build</c> paths with
/// exactly the one-line message in its sibling .expected file, exit code 2, and nothing written.
/// The expected lines follow the error contract of the project (file:line:column: field.path:
/// found ..., allowed ...); each was read and judged against the file by hand.
/// </summary>
public class BadDesignCorpusTests
{
    private static string BadFolder => Path.Combine(TestPaths.Data, "bad");

    public static TheoryData<string> BadFiles()
    {
        var data = new TheoryData<string>();
        foreach (var file in Directory.GetFiles(BadFolder, "*.yaml").OrderBy(f => f, StringComparer.Ordinal))
            data.Add(Path.GetFileName(file));
        return data;
    }

    [Fact]
    public void CorpusHasAtLeastSixtyFilesEachWithAnExpectedMessage()
    {
        var files = Directory.GetFiles(BadFolder, "*.yaml");
        Assert.True(files.Length >= 60, $"only {files.Length} bad designs");
        Assert.All(files, f => Assert.True(File.Exists(Path.ChangeExtension(f, ".expected")), f));
    }

    [Theory]
    [MemberData(nameof(BadFiles))]
    public void CheckPrintsTheExpectedLineAndExitsWithTwo(string name)
    {
        var path = Path.Combine(BadFolder, name);
        var expected = File.ReadAllText(Path.ChangeExtension(path, ".expected")).TrimEnd('\n');

        var run = CliRun.Of("check", path);

        Assert.Equal(2, run.ExitCode);
        Assert.Equal(Path.Combine(BadFolder, expected), run.FirstErrorLine);
        Assert.Equal("", run.Out);
        Assert.DoesNotContain("   at ", run.Error); // no stack trace
    }

    [Theory]
    [MemberData(nameof(BadFiles))]
    public void BuildWritesNothing(string name)
    {
        var output = TestPaths.NewTempFolder();
        try
        {
            var run = CliRun.Of("build", Path.Combine(BadFolder, name), "-o", output);
            Assert.Equal(2, run.ExitCode);
            Assert.Empty(Directory.EnumerateFileSystemEntries(output));
        }
        finally { Directory.Delete(output, recursive: true); }
    }

    [Fact]
    public void OneBadFileAmongGoodOnesStopsTheWholeBuild()
    {
        var output = TestPaths.NewTempFolder();
        try
        {
            var good = TestPaths.DemoDesigns.First();
            var run = CliRun.Of("build", good, Path.Combine(BadFolder, "zero-bore.yaml"), "-o", output);
            Assert.Equal(2, run.ExitCode);
            Assert.Empty(Directory.EnumerateFileSystemEntries(output));
        }
        finally { Directory.Delete(output, recursive: true); }
    }
}
