using System.Text.Json;
using Helipol.Tests.Cli;

namespace Helipol.Tests.Verdict;

/// <summary>
/// The solved runs the verdict tests share, made once per test run: a starter that cannot work in its
/// band (`helipol new lora-868 --center 868MHz --whip monopole`), solved with --json and built with
/// --strict, and a good demo built normally.
/// </summary>
internal sealed class VerdictRuns
{
    private static readonly Lazy<VerdictRuns> Shared = new(() => new VerdictRuns(), LazyThreadSafetyMode.ExecutionAndPublication);
    public static VerdictRuns Get => Shared.Value;

    public const string GoodDemo = "telemetry-915";

    private VerdictRuns()
    {
        Folder = TestPaths.NewTempFolder();
        var made = CliRun.Of("new", "lora-868", "--center", "868MHz", "--whip", "monopole", "-o", Folder);
        if (made.ExitCode != 0) throw new InvalidOperationException("helipol new failed: " + made.FirstErrorLine);
        StarterPath = Path.Combine(Folder, "lora-868.yaml");
        StarterSolve = CliRun.Of("solve", StarterPath, "--json");
        StarterBuild = CliRun.Of("build", StarterPath, "-o", Path.Combine(Folder, "out"), "--strict");
        GoodBuild = CliRun.Of("build", Path.Combine(TestPaths.Designs, GoodDemo + ".yaml"), "-o", Path.Combine(Folder, "out"));
    }

    public string Folder { get; }
    public string StarterPath { get; }
    public CliRun StarterSolve { get; }
    public CliRun StarterBuild { get; }
    public CliRun GoodBuild { get; }

    public string Output(string name, string file) => Path.Combine(Folder, "out", name, file);

    public JsonDocument StarterJson() => JsonDocument.Parse(StarterSolve.Out);
    public JsonDocument GoodJson() => JsonDocument.Parse(File.ReadAllBytes(Output(GoodDemo, "design.json")));
}
