using System.Diagnostics;

namespace Helipol.Tests.Cli;

/// <summary>
/// Runs the real <c>helipol</c> program as a child process (dotnet helipol.dll), for what an
/// in-process run cannot show: a process killed mid-write, the user's real culture, env settings.
/// </summary>
internal static class CliProcess
{
    public static string CliDll => Path.Combine(AppContext.BaseDirectory, "helipol.dll");

    /// <summary>
    /// A runtime configuration like the shipped one but with real culture data (ICU), so the
    /// child process runs under the culture LANG names instead of the invariant one.
    /// </summary>
    public static string RealCultureRuntimeConfig(string folder)
    {
        var shipped = File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "helipol.runtimeconfig.json"));
        var path = Path.Combine(folder, "helipol.realculture.runtimeconfig.json");
        File.WriteAllText(path, shipped.Replace("\"System.Globalization.Invariant\": true", "\"System.Globalization.Invariant\": false")
            .Replace("\"System.Globalization.PredefinedCulturesOnly\": true", "\"System.Globalization.PredefinedCulturesOnly\": false"));
        return path;
    }

    public static ProcessStartInfo StartInfo(IReadOnlyDictionary<string, string> env, string? runtimeConfig, params string[] args)
    {
        var psi = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        if (runtimeConfig is null) psi.ArgumentList.Add(CliDll);
        else
        {
            psi.ArgumentList.Add("exec");
            psi.ArgumentList.Add("--runtimeconfig");
            psi.ArgumentList.Add(runtimeConfig);
            psi.ArgumentList.Add(CliDll);
        }
        foreach (var a in args) psi.ArgumentList.Add(a);
        foreach (var name in new[] { "HELIPOL_THREADS", "HELIPOL_DEBUG", StartupHook.PauseVariable, "DOTNET_STARTUP_HOOKS", "LANG", "LC_ALL" })
            psi.Environment.Remove(name);
        foreach (var (k, v) in env) psi.Environment[k] = v;
        return psi;
    }

    public static (int ExitCode, string Out, string Error) Run(IReadOnlyDictionary<string, string> env, string? runtimeConfig, params string[] args)
    {
        using var p = Process.Start(StartInfo(env, runtimeConfig, args)) ?? throw new InvalidOperationException("could not start dotnet");
        var err = p.StandardError.ReadToEndAsync();
        var output = p.StandardOutput.ReadToEnd();
        p.WaitForExit();
        return (p.ExitCode, output, err.Result);
    }
}
