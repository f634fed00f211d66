using System.Globalization;

namespace Helipol.Tests.Cli;

/// <summary>
/// Every file of a build (PNG, PDF, STL, 3MF, DXF, JSON, Markdown) is the same bytes across runs,
/// under the user's real culture (en-US and de-DE, whose decimal comma would leak into any number
/// formatted with the current culture), and with one worker thread or one per processor
/// (HELIPOL_THREADS). The runs are child processes with real culture data, as a user runs them.
/// </summary>
public class SetDeterminismTests
{
    private static string QuickBuild => Path.Combine(TestPaths.Data, "robust", "quick-build.yaml");

    private static Dictionary<string, byte[]> Build(string folder, string runtimeConfig, string tag, string locale, string? threads)
    {
        var output = Path.Combine(folder, tag);
        var env = new Dictionary<string, string> { ["LANG"] = locale, ["LC_ALL"] = locale };
        if (threads is not null) env["HELIPOL_THREADS"] = threads;
        var run = CliProcess.Run(env, runtimeConfig, "build", QuickBuild, "-o", output);
        Assert.True(run.ExitCode == 0, $"{tag}: exit {run.ExitCode}: {run.Error}");
        var set = Path.Combine(output, "quick-build");
        return Directory.GetFiles(set).ToDictionary(f => Path.GetFileName(f), File.ReadAllBytes);
    }

    [Fact]
    public void EveryFileIsByteIdenticalAcrossRunsCulturesAndThreadCounts()
    {
        // The child's culture is real only if culture data (ICU) is present: de-DE writes 1,5.
        Assert.Equal("1,5", 1.5.ToString(new CultureInfo("de-DE")));
        var folder = TestPaths.NewTempFolder();
        try
        {
            var config = CliProcess.RealCultureRuntimeConfig(folder);
            var english = Build(folder, config, "en", "en_US.UTF-8", null);
            var germanOneThread = Build(folder, config, "de1", "de_DE.UTF-8", "1");
            var germanAllThreads = Build(folder, config, "de", "de_DE.UTF-8", null);
            var englishOneThread = Build(folder, config, "en1", "en_US.UTF-8", "1");

            string[] kinds = [".png", ".pdf", ".stl", ".3mf", ".dxf", ".json", ".md"];
            Assert.All(kinds, k => Assert.Contains(english.Keys, n => n.EndsWith(k, StringComparison.Ordinal)));
            foreach (var other in new[] { germanOneThread, germanAllThreads, englishOneThread })
            {
                Assert.Equal(english.Keys.Order(StringComparer.Ordinal), other.Keys.Order(StringComparer.Ordinal));
                foreach (var (name, bytes) in english)
                    Assert.True(bytes.AsSpan().SequenceEqual(other[name]), $"{name} differs between runs");
            }
        }
        finally { Directory.Delete(folder, recursive: true); }
    }

    [Fact]
    public void ThreadsVariableMustBeAPositiveWholeNumber()
    {
        var run = CliProcess.Run(new Dictionary<string, string> { ["HELIPOL_THREADS"] = "0" }, null, "check", QuickBuild);
        Assert.Equal(2, run.ExitCode);
        Assert.Equal("helipol: HELIPOL_THREADS: found '0', allowed a whole number of threads ≥ 1\n", run.Error);
    }
}
