using Helipol.Design;
using Helipol.Model;

namespace Helipol.Cli;

/// <summary>
/// The verdict as a terminal shows it: one line per design on stdout ("name: grade: figures; next:
/// step"), on stderr when stdout carries JSON; a design that fails also gets a plain warning line on
/// stderr, so it cannot scroll by unseen. <c>build --strict</c> turns a failing verdict into exit code 3.
/// </summary>
public static class VerdictOutput
{
    /// <summary>Exit code of <c>build --strict</c> when a design's verdict is <c>fails</c>.</summary>
    public const int FailsExitCode = 3;

    public static DesignVerdict Show(CliConsole console, PolarizerDesign design, SolvedPolarizer solved, ToleranceResult? tolerance, bool stdoutIsJson) =>
        Show(console, design, VerdictJudge.For(design, solved, tolerance), stdoutIsJson);

    public static DesignVerdict Show(CliConsole console, PolarizerDesign design, DesignVerdict verdict, bool stdoutIsJson)
    {
        (stdoutIsJson ? console.Error : console.Out).WriteLine($"verdict {verdict.Line(design.Name)}");
        if (verdict.Grade == Grade.Fails)
            console.Error.WriteLine($"helipol: warning: {design.Name} FAILS: it will not work as designed in {Band(design)} ({verdict.Reasons[0]}); next: {verdict.NextStep}");
        return verdict;
    }

    private static string Band(PolarizerDesign d) => string.Create(System.Globalization.CultureInfo.InvariantCulture,
        $"{d.Band.LowHz / 1e6:0.#}-{d.Band.HighHz / 1e6:0.#} MHz");
}
