using System.CommandLine;
using System.Globalization;
using Helipol.Design;
using Helipol.Emit.Report;
using Helipol.Model;

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
        var builds = new Option<int?>("--builds") { Description = $"simulated builds (default {Keys.ToleranceBuilds}, 500)" };
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
                VerdictOutput.Show(console, design, solved, t, stdoutIsJson: true);
                return ExitCodes.Ok;
            }
            var inv = CultureInfo.InvariantCulture;
            console.Out.WriteLine(string.Create(inv, $"{design.Name}: {t.Builds} builds (seed {t.Seed}) around {solved.Layout.LengthM * 1e3:0.00} mm × {solved.Layout.RiseM * 1e3:0.00} mm"));
            string Ar(double db) => double.IsFinite(db) ? string.Create(inv, $"{db:0.0} dB") : "wrong sense";
            console.Out.WriteLine(string.Create(inv, $"  yield (every direction of the window in the wanted sense with AR ≤ {t.LimitDb:0.#} dB at band low, centre, high): {t.Yield * 100:0.#} %"));
            console.Out.WriteLine($"  worst AR: 10 % {Ar(t.ArP10Db)}, median {Ar(t.ArP50Db)}, 90 % {Ar(t.ArP90Db)}");
            console.Out.WriteLine($"  {t.CutText}");
            console.Out.WriteLine($"  AR per mm: {SignedNumber.Format(t.ArPerMmLengthDb)} dB (length), {SignedNumber.Format(t.ArPerMmRiseDb)} dB (rise)");
            if (double.IsFinite(t.BestArMHzPerMmLength) && double.IsFinite(t.BestArMHzPerMmRise))
                console.Out.WriteLine($"  best-AR frequency per mm: {SignedNumber.Format(t.BestArMHzPerMmLength)} MHz (length), {SignedNumber.Format(t.BestArMHzPerMmRise)} MHz (rise)");
            else
                console.Out.WriteLine("  best-AR frequency per mm: not defined (no AR minimum within ±8 % of the centre)");
            console.Out.WriteLine($"  {t.TrimmingHint}");
            console.Out.WriteLine(string.Create(inv, $"  {t.FieldSolves} field solves in the tolerance analysis, {counter.Count} in all"));
            VerdictOutput.Show(console, design, solved, t, stdoutIsJson: false);
            return ExitCodes.Ok;
        });
        return command;
    }
}
