using System.CommandLine;
using System.Globalization;
using Helipol.Design;
using Helipol.Emit.Report;
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
        var points = new Option<int?>("--points") { Description = "frequencies in the sweep (default solve.sweep.points, 101)" };
        var json = new Option<bool>("--json") { Description = "print design.json with the solved values and the sweep" };
        var command = new Command("sweep", "Solve, then sweep the solution over the band: axial-ratio bandwidth, gains, impedance, VSWR with and without the polarizer.") { file, points, json };
        command.SetAction(parse =>
        {
            var designs = DesignLoader.LoadAll(new[] { parse.GetValue(file)! }, console);
            if (designs is null) return ExitCodes.BadInput;
            var design = designs[0];
            if (parse.GetValue(points) is { } n && (n < DesignKeys.MinSweepPoints || n > DesignKeys.MaxSweepPoints))
            {
                console.Error.WriteLine(string.Create(CultureInfo.InvariantCulture, $"helipol sweep: --points: found {n}, allowed {DesignKeys.MinSweepPoints} to {DesignKeys.MaxSweepPoints} (as solve.sweep.points)"));
                return ExitCodes.BadInput;
            }
            var counter = new FieldSolveCounter();
            var solved = SolveRunner.Solve(console, design, counter);
            var sweep = BandSweep.Run(design, solved.Build, points: parse.GetValue(points), counter: counter);
            if (parse.GetValue(json))
            {
                console.Out.Write(SolvedJson.Write(design, solved, sweep));
                return ExitCodes.Ok;
            }
            var inv = CultureInfo.InvariantCulture;
            var t = new Table().Title(Markup.Escape($"{design.Name}: sweep of the solved polarizer ({sweep.Points.Count} points)"))
                .AddColumn("frequency").AddColumn("worst AR").AddColumn("RHCP").AddColumn("LHCP").AddColumn("VSWR").AddColumn("bare VSWR");
            int every = Math.Max(1, sweep.Points.Count / 20);
            for (int i = 0; i < sweep.Points.Count; i += every)
            {
                var p = sweep.Points[i];
                t.AddRow(string.Create(inv, $"{p.Polarizer.FrequencyHz / 1e6:0.#} MHz"), string.Create(inv, $"{p.Polarizer.WorstScoreDb:0.0} dB"),
                    string.Create(inv, $"{p.Polarizer.GainRhcpDbic:0.00} dBic"), string.Create(inv, $"{p.Polarizer.GainLhcpDbic:0.00} dBic"),
                    p.Polarizer.Vswr50.ToString("0.00", inv), p.BareWhipVswr50.ToString("0.00", inv));
            }
            console.Tables.Write(t);
            console.Out.WriteLine(string.Create(inv, $"{(sweep.BestArInsideSweep ? "best AR" : sweep.BestArAtTopEdge ? "AR minimum above the sweep; at its top edge" : "AR minimum below the sweep; at its bottom edge")} {sweep.BestArDb:0.0} dB at {sweep.BestArFrequencyHz / 1e6:0.#} MHz; AR ≤ 3 dB bandwidth {sweep.BandwidthHz / 1e6:0.#} MHz ({sweep.BandwidthHz / design.Band.CenterHz * 100:0.##} %); {counter.Count} field solves"));
            return ExitCodes.Ok;
        });
        return command;
    }
}
