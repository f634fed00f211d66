using System.Diagnostics;
using System.Runtime.InteropServices;
using System.Text.RegularExpressions;

namespace Helipol.Tests.Architecture;

/// <summary>
/// The README's "Use as a library" example is compiled with the SDK's own C# compiler (csc) against
/// the built Helipol.Core and Helipol.Engine, run on a demo design, and its files compared byte for
/// byte with what <c>helipol build</c> writes for the same design, so the example cannot rot.
/// </summary>
public sealed class ReadmeExampleTests
{
    /// <summary>The implicit usings of an SDK console project (Microsoft.NET.Sdk), which the example relies on.</summary>
    private const string ImplicitUsings = """
        global using System;
        global using System.Collections.Generic;
        global using System.IO;
        global using System.Linq;
        global using System.Threading;
        global using System.Threading.Tasks;
        """;

    private static string Example()
    {
        var readme = File.ReadAllText(Path.Combine(TestPaths.RepositoryRoot, "README.md"));
        var section = readme[readme.IndexOf("## Use as a library", StringComparison.Ordinal)..];
        var block = Regex.Match(section, "```csharp\n(.*?)```", RegexOptions.Singleline);
        Assert.True(block.Success, "README: no csharp block under 'Use as a library'");
        return block.Groups[1].Value;
    }

    private static (int Exit, string Out, string Error) Run(string file, params string[] args)
    {
        var psi = new ProcessStartInfo(file) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args) psi.ArgumentList.Add(a);
        using var p = Process.Start(psi)!;
        var err = p.StandardError.ReadToEndAsync();
        var output = p.StandardOutput.ReadToEnd();
        p.WaitForExit();
        return (p.ExitCode, output, err.Result);
    }

    [Fact]
    public void The_library_example_compiles_runs_and_writes_what_build_writes()
    {
        // The running runtime lies at <root>/shared/Microsoft.NETCore.App/<version>/; the SDK and the reference pack beside it.
        var runtimeDir = new DirectoryInfo(RuntimeEnvironment.GetRuntimeDirectory());
        var root = runtimeDir.Parent!.Parent!.Parent!.FullName;
        var dotnet = Path.Combine(root, "dotnet");
        var csc = Directory.GetFiles(Path.Combine(root, "sdk"), "csc.dll", SearchOption.AllDirectories).Order(StringComparer.Ordinal).Last();
        var refs = Directory.GetFiles(Path.Combine(root, "packs", "Microsoft.NETCore.App.Ref", runtimeDir.Name, "ref"), "*.dll", SearchOption.AllDirectories);
        var bin = AppContext.BaseDirectory;

        var work = TestPaths.NewTempFolder();
        var exe = Path.Combine(bin, $"readme-example-{Guid.NewGuid():N}.dll");
        try
        {
            File.WriteAllText(Path.Combine(work, "Program.cs"), Example());
            File.WriteAllText(Path.Combine(work, "Usings.cs"), ImplicitUsings);
            var compile = Run(dotnet, [csc, "-nologo", "-noconfig", "-nostdlib", "-target:exe", "-langversion:latest", "-nullable:enable",
                $"-out:{exe}", .. refs.Select(r => $"-r:{r}"), $"-r:{Path.Combine(bin, "Helipol.Core.dll")}", $"-r:{Path.Combine(bin, "Helipol.Engine.dll")}",
                Path.Combine(work, "Program.cs"), Path.Combine(work, "Usings.cs")]);
            Assert.True(compile.Exit == 0, compile.Out + compile.Error);

            // Run beside the built assemblies, with the shipped program's dependency list (native SkiaSharp included).
            var design = Path.Combine(TestPaths.Designs, "ridge-video-rx.yaml");
            var fromExample = Path.Combine(work, "example");
            var run = Run(dotnet, ["exec", "--depsfile", Path.Combine(bin, "helipol.deps.json"), "--runtimeconfig", Path.Combine(bin, "helipol.runtimeconfig.json"),
                exe, design, fromExample]);
            Assert.True(run.Exit == 0, run.Out + run.Error);

            var fromCli = Path.Combine(work, "cli");
            var cli = Cli.CliRun.Of("build", design, "-o", fromCli);
            Assert.Equal(0, cli.ExitCode);
            // The example prints the verdict line the command prints.
            var verdict = cli.Out.Split('\n').Single(l => l.StartsWith("verdict ", StringComparison.Ordinal));
            Assert.Equal(verdict, run.Out.Split('\n')[0]);
            var expected = Directory.GetFiles(Path.Combine(fromCli, "ridge-video-rx")).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToList();
            var written = Directory.GetFiles(Path.Combine(fromExample, "ridge-video-rx")).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToList();
            Assert.Equal(expected, written);
            Assert.Contains("packet.pdf", written);
            foreach (var name in written)
                Assert.True(File.ReadAllBytes(Path.Combine(fromCli, "ridge-video-rx", name!)).SequenceEqual(File.ReadAllBytes(Path.Combine(fromExample, "ridge-video-rx", name!))),
                    $"{name} differs between the example and helipol build");
        }
        finally
        {
            File.Delete(exe);
            Directory.Delete(work, recursive: true);
        }
    }
}
