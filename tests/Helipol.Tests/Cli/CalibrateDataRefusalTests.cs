using Helipol.Tests.Design;

namespace Helipol.Tests.Cli;

/// <summary>
/// Bad measurement files for calibrate: exit 2, one line with file:line, nothing written. The
/// Touchstone cases follow the version 1 format (option line `# GHz S RI R 50`, `!` comments).
/// </summary>
public class CalibrateDataRefusalTests
{
    private const string Good = "# GHz S RI R 50\n5.6 0.1 0.2\n5.7 0.1 0.2\n5.8 0.1 0.2\n5.9 0.1 0.2\n6.0 0.1 0.2\n";

    [Theory]
    [InlineData("5.6 0.1 0.2\n5.7 0.1 0.2\n5.8 0.1 0.2\n5.9 0.1 0.2\n6.0 0.1 0.2\n", ":1:1: found data before an option line")]
    [InlineData("! sweep\n# GHz S RI R 50\n5.6 0.1 0.2\n5.7 0.1 x\n5.8 0.1 0.2\n5.9 0.1 0.2\n6.0 0.1 0.2\n", ":4:9: found 'x', allowed a number")]
    [InlineData("# GHz S RI R 50\n5.6 0.1 0.2\n5.7 0.1 0.2\n5.8 0.1 0.2\n", "found 3 data points, allowed at least 5")]
    [InlineData("# MHz S DB R 50\n100 -3 0\n200 -3 0\n300 -3 0\n400 -3 0\n500 -3 0\n", ":2:1: frequency: found 100 MHz, allowed 2900 to 8700 MHz")]
    [InlineData("# GHz S XX R 50\n5.6 0.1 0.2\n", ":1:1: option line: found 'XX'")]
    public void ABadSweepIsRefusedWithItsLineAndNothingIsWritten(string text, string expected)
    {
        var folder = TestPaths.NewTempFolder();
        var bad = Path.Combine(folder, "bad.s1p");
        File.WriteAllText(bad, text);
        var cal = Path.Combine(folder, "cal.yaml");
        var run = CliRun.Of("calibrate", DesignFiles.PathOf("tape-on-foam"), "--s1p", bad, "-o", cal);
        Assert.Equal(2, run.ExitCode);
        Assert.StartsWith(bad + ":", run.FirstErrorLine);
        Assert.Contains(expected, run.FirstErrorLine);
        Assert.False(File.Exists(cal));
    }

    [Fact]
    public void ABadSpinFileIsRefusedAndAGoodSweepBesideItWritesNothing()
    {
        var folder = TestPaths.NewTempFolder();
        var good = Path.Combine(folder, "good.s1p");
        File.WriteAllText(good, Good);
        var spin = Path.Combine(folder, "spin.csv");
        File.WriteAllText(spin, "frequency_mhz,level_min_db,level_max_db\n5700,-40,-35\n5800,-41,oops\n");
        var cal = Path.Combine(folder, "cal.yaml");
        var run = CliRun.Of("calibrate", DesignFiles.PathOf("tape-on-foam"), "--s1p", good, "--spin", spin, "-o", cal);
        Assert.Equal(2, run.ExitCode);
        Assert.StartsWith(spin + ":3:", run.FirstErrorLine);
        Assert.False(File.Exists(cal));
    }
}
