using Helipol.Spec;
using Helipol.Tests.Cli;

namespace Helipol.Tests.Spec;

/// <summary>Inputs that are too big to keep in the corpus, or are built to hurt a parser.</summary>
public class HostileInputTests
{
    [Fact]
    public void TenMegabyteFileIsRefusedBeforeParsing()
    {
        var folder = TestPaths.NewTempFolder();
        try
        {
            var path = Path.Combine(folder, "huge.yaml");
            File.WriteAllText(path, "name: x\n# " + new string('x', 10 * 1024 * 1024) + "\n");
            var run = CliRun.Of("check", path);
            Assert.Equal(2, run.ExitCode);
            Assert.Equal($"{path}:1:1: (file): found {new FileInfo(path).Length} bytes, allowed at most 1048576 bytes (1 MiB) in a design file", run.FirstErrorLine);
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    [Fact]
    public void MissingFileIsBadInput()
    {
        var run = CliRun.Of("check", "/nonexistent/folder/design.yaml");
        Assert.Equal(2, run.ExitCode);
        Assert.Equal("/nonexistent/folder/design.yaml: (file): found no such file, allowed an existing design file", run.FirstErrorLine);
    }

    [Fact]
    public void Utf8ByteOrderMarkIsAccepted()
    {
        // A UTF-8 byte-order mark is allowed by YAML 1.2 (§5.2) and common from Windows editors.
        var text = File.ReadAllText(TestPaths.DemoDesigns.First());
        var bytes = new byte[] { 0xEF, 0xBB, 0xBF }.Concat(System.Text.Encoding.UTF8.GetBytes(text)).ToArray();
        Assert.Equal(text, DesignText.Decode(bytes, "bom.yaml"));
    }

    [Fact]
    public void AllErrorsOfAFileAreReportedInFileOrder()
    {
        var text = "name: ok\nband: { center: 5 }\nwhip: { length: 10 mm, diameter: -1 mm }\npolarizer: 3\n";
        var ex = Assert.Throws<DesignInputException>(() => SpecReader.ReadText(text, "x.yaml", "."));
        Assert.Equal(new[] { 2, 3, 4 }, ex.Errors.Select(e => e.Mark!.Value.Line).ToArray());
        Assert.Equal("x.yaml:2:17: band.center: found a bare number 5, allowed a frequency with its unit, e.g. 5.8 GHz (units: Hz, kHz, MHz, GHz)", ex.Errors[0].ToString());
    }
}
