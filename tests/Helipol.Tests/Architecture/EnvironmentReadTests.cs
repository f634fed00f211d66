using System.Text.RegularExpressions;

namespace Helipol.Tests.Architecture;

/// <summary>
/// The program reads only the environment variables a user is told about (README, "Verbs"):
/// HELIPOL_THREADS and HELIPOL_DEBUG, both in the command entry. Test hooks go through seams the
/// tests set (AtomicFile.BeforeRenames via a startup hook), never through a variable production
/// code looks for.
/// </summary>
public sealed class EnvironmentReadTests
{
    private static IEnumerable<string> Sources() =>
        Directory.GetFiles(Path.Combine(TestPaths.RepositoryRoot, "src"), "*.cs", SearchOption.AllDirectories)
            .Where(f => !Regex.IsMatch(f, @"[/\\](bin|obj)[/\\]"));

    [Fact]
    public void Only_the_command_entry_reads_the_environment_and_only_documented_variables()
    {
        var reads = Sources().SelectMany(f => Regex.Matches(File.ReadAllText(f), @"Environment\.(GetEnvironmentVariables?)\(([^)]*)\)")
            .Select(m => (File: Path.GetFileName(f), Argument: m.Groups[2].Value))).ToList();
        Assert.Equal([("CliApp.cs", "ThreadsVariable"), ("CliApp.cs", "DebugVariable")], reads);
        Assert.Equal("HELIPOL_THREADS", Helipol.Cli.CliApp.ThreadsVariable);
        Assert.Equal("HELIPOL_DEBUG", Helipol.Cli.CliApp.DebugVariable);
        var readme = File.ReadAllText(Path.Combine(TestPaths.RepositoryRoot, "README.md"));
        Assert.Contains("HELIPOL_THREADS", readme);
        Assert.Contains("HELIPOL_DEBUG", readme);
    }
}
