using System.CommandLine;
using System.Globalization;
using Helipol.Design;
using Helipol.Emit.Report;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol tolerance FILE [--builds N] [--json]</c>: solves the design, then simulates hand-made
/// builds around the solution: yield, AR percentiles, sensitivities and a trimming hint.
/// </summary>
public static class ToleranceVerb
{
    public static Command Create(CliConsole console)
    {
        var file = new Argument<string>("FILE") { Description = "design file (.yaml)" };
        var builds = new Option<int?>("--builds") { Description = "simulated builds (default tolerance.builds, 500)" };
        var json = new Option<bool>("--json") { Description = "print design.json with the solved values and the tolerance analysis" };
        var command = new Command("tolerance", "Solve, then estimate the yield of hand-made builds and how sensitive the result is to length and rise.") { file, builds, json };
        command.SetAction(parse =>
        {
            var designs = DesignLoader.LoadAll(new[] { parse.GetValue(file)! }, console);
            if (designs is null) return ExitCodes.BadInput;
            var design = designs[0];
            if (parse.GetValue(builds) is { } n && (n < 1 || n > 100000))
            {
                console.Error.WriteLine(string.Create(CultureInfo.InvariantCulture, $"helipol tolerance: --builds: found {n}, allowed 1 to 100000"));
                return ExitCodes.BadInput;
            }
            var counter = new FieldSolveCounter();
            var solved = SolveRunner.Solve(console, design, counter);
            var t = ToleranceAnalysis.Run(design, solved.Build, parse.GetValue(builds), counter);
            if (parse.GetValue(json))
            {
                console.Out.Write(SolvedJson.Write(design, solved, tolerance: t));
                return ExitCodes.Ok;
            }
            var inv = CultureInfo.InvariantCulture;
            console.Out.WriteLine(string.Create(inv, $"{design.Name}: {t.Builds} builds (seed {t.Seed}) around {solved.Layout.LengthM * 1e3:0.00} mm × {solved.Layout.RiseM * 1e3:0.00} mm"));
            console.Out.WriteLine(string.Create(inv, $"  yield (worst AR ≤ 3 dB at band low, centre, high): {t.Yield * 100:0.#} %"));
            console.Out.WriteLine(string.Create(inv, $"  worst AR: 10 % {t.ArP10Db:0.0} dB, median {t.ArP50Db:0.0} dB, 90 % {t.ArP90Db:0.0} dB"));
            console.Out.WriteLine(string.Create(inv, $"  AR per mm: {t.ArPerMmLengthDb:+0.0;-0.0} dB (length), {t.ArPerMmRiseDb:+0.0;-0.0} dB (rise)"));
            if (double.IsFinite(t.BestArMHzPerMmLength) && double.IsFinite(t.BestArMHzPerMmRise))
                console.Out.WriteLine(string.Create(inv, $"  best-AR frequency per mm: {t.BestArMHzPerMmLength:+0.0;-0.0} MHz (length), {t.BestArMHzPerMmRise:+0.0;-0.0} MHz (rise)"));
            else
                console.Out.WriteLine("  best-AR frequency per mm: not defined (no AR minimum within ±8 % of the centre)");
            console.Out.WriteLine($"  {t.TrimmingHint}");
            console.Out.WriteLine(string.Create(inv, $"  {t.FieldSolves} field solves in the tolerance analysis, {counter.Count} in all"));
            return ExitCodes.Ok;
        });
        return command;
    }
}
