using System.CommandLine;
using System.Globalization;
using Helipol.Design;
using Helipol.Emit.Report;
using Helipol.Model;
using Helipol.Spec;
using Spectre.Console;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol sweep FILE [--points N] [--json]</c>: solves the design (pinned values kept), then
/// sweeps the result over the band ± span: AR ≤ 3 dB bandwidth, the whip's detuning, gains.
/// </summary>
public static class SweepVerb
{
    public static Command Create(CliConsole console)
    {
        var file = new Argument<string>("FILE") { Description = "design file (.yaml)" };
        var points = new Option<int?>("--points") { Description = $"frequencies in the sweep (default {Keys.SolveSweepPoints}, 101)" };
        var json = new Option<bool>("--json") { Description = "print design.json with the solved values and the sweep" };
        var command = new Command("sweep", "Solve, then sweep the solution over the band: axial-ratio bandwidth, gains, impedance, VSWR with and without the polarizer.") { file, points, json };
        command.SetAction(parse =>
        {
            var designs = DesignLoader.LoadAll(new[] { parse.GetValue(file)! }, console);
            if (designs is null) return ExitCodes.BadInput;
            var design = designs[0];
            if (parse.GetValue(points) is { } n && (n < DesignKeys.MinSweepPoints || n > DesignKeys.MaxSweepPoints))
            {
                console.Error.WriteLine(string.Create(CultureInfo.InvariantCulture, $"helipol sweep: --points: found {n}, allowed {DesignKeys.MinSweepPoints} to {DesignKeys.MaxSweepPoints} (as {Keys.SolveSweepPoints})"));
                return ExitCodes.BadInput;
            }
            var counter = new FieldSolveCounter();
            var solved = SolveRunner.Solve(console, design, counter);
            var sweep = BandSweep.Run(design, solved.Build, points: parse.GetValue(points), counter: counter);
            if (parse.GetValue(json))
            {
                console.Out.Write(SolvedJson.Write(design, solved, sweep));
                VerdictOutput.Show(console, design, solved, null, stdoutIsJson: true);
                return ExitCodes.Ok;
            }
            var inv = CultureInfo.InvariantCulture;
            var t = new Table().Title(Markup.Escape($"{design.Name}: sweep of the solved polarizer ({sweep.Points.Count} points)"))
                .Caption(Markup.Escape(string.Create(inv, $"AR: true axial ratio of the worst direction on the cone, with its sense; realized gain into {design.Solve.ReceiverOhm:0.#} Ω")))
                .AddColumn("frequency").AddColumn("AR").AddColumn("sense").AddColumn("RHCP").AddColumn("LHCP").AddColumn("realized").AddColumn("VSWR").AddColumn("bare VSWR");
            int every = Math.Max(1, sweep.Points.Count / 20);
            for (int i = 0; i < sweep.Points.Count; i += every)
            {
                var p = sweep.Points[i];
                var sense = p.Polarizer.AllWantedSense ? SolvedJson.SenseWord(p.Polarizer.Worst.Sense) : $"{SolvedJson.SenseWord(p.Polarizer.Worst.Sense)} (wrong)";
                t.AddRow(string.Create(inv, $"{p.Polarizer.FrequencyHz / 1e6:0.#} MHz"), string.Create(inv, $"{p.Polarizer.Worst.AxialRatioDb:0.0} dB"), Markup.Escape(sense),
                    SignedNumber.Plain(p.Polarizer.GainRhcpDbic, "0.00") + " dBic", SignedNumber.Plain(p.Polarizer.GainLhcpDbic, "0.00") + " dBic",
                    SignedNumber.Plain(p.Polarizer.RealizedGainDbic(design.Polarizer.Sense), "0.00") + " dBic",
                    p.Polarizer.Vswr.ToString("0.00", inv), p.BareWhipVswr.ToString("0.00", inv));
            }
            console.Tables.Write(t);
            string best = !double.IsFinite(sweep.BestArDb)
                ? string.Create(inv, $"wrong sense on part of the cone even at the best point, {sweep.BestArFrequencyHz / 1e6:0.#} MHz")
                : string.Create(inv, $"{(sweep.BestArInsideSweep ? "best AR" : sweep.BestArAtTopEdge ? "AR minimum above the sweep; at its top edge" : "AR minimum below the sweep; at its bottom edge")} {sweep.BestArDb:0.0} dB at {sweep.BestArFrequencyHz / 1e6:0.#} MHz");
            console.Out.WriteLine(string.Create(inv, $"{best}; AR ≤ {sweep.LimitDb:0.#} dB bandwidth {sweep.BandwidthHz / 1e6:0.#} MHz ({sweep.BandwidthHz / design.Band.CenterHz * 100:0.##} %); {counter.Count} field solves"));
            VerdictOutput.Show(console, design, solved, null, stdoutIsJson: false);
            return ExitCodes.Ok;
        });
        return command;
    }
}
