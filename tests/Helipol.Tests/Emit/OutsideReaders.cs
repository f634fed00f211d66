using System.Diagnostics;

namespace Helipol.Tests.Emit;

/// <summary>
/// Runs the outside programs the emitter checks trust: Debian's python3-ezdxf (through
/// /usr/bin/python3, not whatever python3 comes first on PATH) and admesh. On CI (CI=true) a
/// missing program fails the test; elsewhere the test is skipped with the reason.
/// </summary>
internal static class OutsideReaders
{
    public const string SystemPython = "/usr/bin/python3";
    public const string Admesh = "/usr/bin/admesh";

    public static void RequireEzdxf() =>
        Require(File.Exists(SystemPython) && Run(SystemPython, ["-c", "import ezdxf"], out _).ExitCode == 0,
            "python3-ezdxf for /usr/bin/python3 is not installed (bash .ci/deps.sh python3-ezdxf)");

    public static void RequireAdmesh() =>
        Require(File.Exists(Admesh), "admesh is not installed (bash .ci/deps.sh admesh)");

    private static void Require(bool present, string why)
    {
        if (present) return;
        if (string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase))
            Assert.Fail("outside reader missing on CI: " + why);
        Skip.If(true, why);
    }

    public static (int ExitCode, string Stdout) Run(string program, IEnumerable<string> args, out string stderr)
    {
        var psi = new ProcessStartInfo(program) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args) psi.ArgumentList.Add(a);
        using var p = Process.Start(psi) ?? throw new InvalidOperationException("could not start " + program);
        var errTask = p.StandardError.ReadToEndAsync();
        var output = p.StandardOutput.ReadToEnd();
        p.WaitForExit();
        stderr = errTask.Result;
        return (p.ExitCode, output);
    }

    /// <summary>A scratch folder for files handed to outside programs.</summary>
    public static string TempFolder()
    {
        var dir = Path.Combine(Path.GetTempPath(), "helipol-tests-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        return dir;
    }
}
