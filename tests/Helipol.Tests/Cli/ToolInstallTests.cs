using System.Diagnostics;
using System.Text.RegularExpressions;

namespace Helipol.Tests.Cli;

/// <summary>
/// helipol packs as a .NET tool and runs as the command `helipol` from any folder, the way
/// `make install` installs it. The .NET SDK's own `dotnet pack` and `dotnet tool install` do the
/// work (into a temporary tool path, so the user's global tools are left alone); the package is
/// taken from a local folder, with only the package registries beside it.
/// </summary>
public class ToolInstallTests
{
    [Fact]
    public void PackedToolRunsFromAnotherFolder()
    {
        var root = TestPaths.RepositoryRoot;
        // The configuration this test assembly was built in, so `--no-build` packs what was just built.
        var config = AppContext.BaseDirectory.Contains($"{Path.DirectorySeparatorChar}Debug{Path.DirectorySeparatorChar}") ? "Debug" : "Release";
        var version = Regex.Match(File.ReadAllText(Path.Combine(root, "Directory.Build.props")), "<Version>([^<]+)</Version>").Groups[1].Value;
        var temp = TestPaths.NewTempFolder();
        try
        {
            var packages = Path.Combine(temp, "pkg");
            var tools = Path.Combine(temp, "bin");
            Run(root, "dotnet", "pack", Path.Combine(root, "src", "Helipol.Cli", "Helipol.Cli.csproj"), "-c", config, "--no-build", "-nologo", "-v", "quiet", "-o", packages).AssertOk();
            Assert.True(File.Exists(Path.Combine(packages, $"helipol.{version}.nupkg")));
            Run(temp, "dotnet", "tool", "install", "--tool-path", tools, "--add-source", packages, "--ignore-failed-sources", "helipol", "--version", version).AssertOk();

            var helipol = Path.Combine(tools, "helipol");
            var shown = Run(temp, helipol, "--version");
            shown.AssertOk();
            Assert.Equal(version, shown.Out.Trim());

            var demo = TestPaths.DemoDesigns.First();
            var check = Run(temp, helipol, "check", demo);
            check.AssertOk();
            Assert.Contains(": ok (", check.Out);

            var typo = Run(temp, helipol, "biuld", demo);
            Assert.Equal(2, typo.ExitCode);
            Assert.Equal("helipol: found unknown verb 'biuld' (did you mean 'build'?)", typo.Error.Trim());
        }
        finally { Directory.Delete(temp, recursive: true); }
    }

    private sealed record Result(int ExitCode, string Out, string Error)
    {
        public void AssertOk() => Assert.True(ExitCode == 0, $"exit {ExitCode}: {Out}\n{Error}");
    }

    private static Result Run(string folder, string program, params string[] args)
    {
        var psi = new ProcessStartInfo(program) { WorkingDirectory = folder, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args) psi.ArgumentList.Add(a);
        foreach (var name in new[] { "HELIPOL_THREADS", "HELIPOL_DEBUG", StartupHook.PauseVariable, "DOTNET_STARTUP_HOOKS" }) psi.Environment.Remove(name);
        psi.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        psi.Environment["DOTNET_NOLOGO"] = "1";
        using var p = Process.Start(psi) ?? throw new InvalidOperationException($"could not start {program}");
        var err = p.StandardError.ReadToEndAsync();
        var output = p.StandardOutput.ReadToEnd();
        p.WaitForExit();
        return new Result(p.ExitCode, output, err.Result);
    }
}
