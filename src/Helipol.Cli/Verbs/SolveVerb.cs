using System.CommandLine;
using System.Globalization;
using Helipol.Design;
using Helipol.Emit.Report;
using Helipol.Model;
using Spectre.Console;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol solve FILE [--json]</c>: searches element length and rise (and count and diameter
/// when auto) with the field model and shows them beside the practice-scaling values. --json
/// prints design.json with the solved values, the sweep, the tolerance analysis and the practice column;
/// --map writes the search's objective map (the score it minimized, not an axial ratio) as a PNG heat map.
/// </summary>
public static class SolveVerb
{
    public static Command Create(CliConsole console)
    {
        var file = new Argument<string>("FILE") { Description = "design file (.yaml)" };
        var json = new Option<bool>("--json") { Description = "print design.json with the solved values, sweep, tolerance and practice column" };
        var map = new Option<string>("--map") { Description = "PNG file to write the search's objective map to, as a heat map; its score over length × rise, not an axial ratio" };
        var command = new Command("solve", "Solve element length and rise with the field model; show them beside practice scaling.") { file, json, map };
        command.SetAction(parse =>
        {
            var designs = DesignLoader.LoadAll(new[] { parse.GetValue(file)! }, console);
            if (designs is null) return ExitCodes.BadInput;
            var design = designs[0];
            var counter = new FieldSolveCounter();
            SolvedPolarizer solved;
            solved = SolveRunner.Solve(console, design, counter);
            if (parse.GetValue(map) is { } mapFile)
                Helipol.Emit.AtomicFile.WriteAllBytes(mapFile, ReportPlots.AxialRatioMap(solved.Search.Map, solved.Layout.LengthM, solved.Layout.RiseM, design.Name));
            if (parse.GetValue(json))
            {
                var sweep = BandSweep.Run(design, solved.Build, counter: counter);
                var tolerance = ToleranceAnalysis.Run(design, solved.Build, counter: counter);
                console.Out.Write(SolvedJson.Write(design, solved, sweep, tolerance));
                VerdictOutput.Show(console, design, solved, tolerance, stdoutIsJson: true);
                return ExitCodes.Ok;
            }
            Show(console.Tables, design, solved);
            VerdictOutput.Show(console, design, solved, null, stdoutIsJson: false);
            return ExitCodes.Ok;
        });
        return command;
    }

    private static string Mm(double metres) => (metres * 1e3).ToString("0.00", CultureInfo.InvariantCulture) + " mm";
    private static string MHz(double hz) => (hz / 1e6).ToString("0.###", CultureInfo.InvariantCulture) + " MHz";
    private static string Deg(double rad) => (rad * 180 / Math.PI).ToString("0.0", CultureInfo.InvariantCulture) + " deg";

    private static void Show(IAnsiConsole console, PolarizerDesign d, SolvedPolarizer s)
    {
        var p = d.Polarizer;
        var design = new Table().Title($"design {Markup.Escape(d.Name)}").AddColumn("quantity").AddColumn("value");
        void Row(string name, string value) => design.AddRow(Markup.Escape(name), Markup.Escape(value));
        Row("band", $"{MHz(d.Band.LowHz)} .. {MHz(d.Band.HighHz)} (center {MHz(d.Band.CenterHz)}{(d.Band.EdgesGiven ? "" : ", edges ±1.5 % by default")})");
        Row("wavelength", Mm(d.Band.WavelengthM));
        Row("whip", $"{ChoiceWords.WhipKind.Word(d.Whip.Kind)}, {Mm(d.Whip.LengthM)} long, {Mm(d.Whip.DiameterM)} diameter"
            + (d.Whip.CoverDiameterM is { } c ? $", cover {Mm(c)}" : ""));
        Row("sense", ChoiceWords.Label(p.Sense));
        Row("wire", $"{Mm(p.Wire.DiameterM)} {p.Wire.Material.Name}" + (p.Wire.ConductivitySPerM is { } sigma ? $", {sigma.Value.ToString("0.###e0", CultureInfo.InvariantCulture)} S/m" : ", lossless"));
        Row("former", $"{p.Former.Material.Name}, bore {Mm(p.Former.BoreM)}, height {Mm(p.Former.HeightM)}, εr {p.Former.RelativePermittivity.Value.ToString("0.###", CultureInfo.InvariantCulture)}");
        Row("wrap", p.Wrap is { } w ? $"{w.Layers} × {Mm(w.LayerThicknessM.Value)} {w.Material.Name}, εr {w.RelativePermittivity.Value.ToString("0.##", CultureInfo.InvariantCulture)}" : "none");
        Row("glue", p.Glue is { } g ? $"{Mm(g.ThicknessM)} {g.Material.Name}" : "none");
        console.Write(design);

        var practice = s.Practice.Layout;
        // Row names stay short so the whole column label "practice scaling, not solved" fits 80 columns.
        var elements = new Table().Title("elements, solved by the field model")
            .AddColumn("quantity").AddColumn("solved").AddColumn(Markup.Escape(PracticeScaling.Label)).AddColumn("from");
        string From(bool pinned) => pinned ? "design file" : "search";
        string W(Winding w) => ChoiceWords.Winding.Word(w);
        elements.AddRow("elements", s.Layout.Count.ToString(CultureInfo.InvariantCulture), practice.Count.ToString(CultureInfo.InvariantCulture), From(s.CountPinned));
        elements.AddRow("element length", Mm(s.Layout.LengthM), Mm(practice.LengthM), From(s.LengthPinned));
        elements.AddRow("element rise", Mm(s.Layout.RiseM), Mm(practice.RiseM), From(s.RisePinned));
        elements.AddRow("former diameter", Mm(s.Layout.OuterDiameterM), Mm(practice.OuterDiameterM), From(s.DiameterPinned));
        elements.AddRow("element axis radius", Mm(s.Layout.AxisRadiusM), Mm(practice.AxisRadiusM), "derived");
        elements.AddRow("arc angle", Deg(s.Layout.ArcAngleRad), Deg(practice.ArcAngleRad), "derived");
        elements.AddRow("pitch angle", Deg(s.Layout.PitchAngleRad), Deg(practice.PitchAngleRad), "derived");
        elements.AddRow("winding", W(s.Winding), W(s.Practice.Winding) + " (builders' rule)", s.WindingPinned ? "design file" : "field model");
        elements.AddRow(Markup.Escape($"worst AR, {ChoiceWords.Label(s.Sense)}"), Markup.Escape(Short(s.Points)),
            s.Practice.ObjectiveDb is null ? "not modelled" : Markup.Escape(Short(s.Practice.Points)), "field model");
        elements.AddRow("gain, wanted sense", Db(s.MeanGainDbic) + "ic", "", "field model");
        elements.AddRow(Markup.Escape($"realized gain, {d.Solve.ReceiverOhm.ToString("0.#", CultureInfo.InvariantCulture)} Ω"), Db(s.MeanRealizedGainDbic) + "ic", "", "field model");
        console.Write(elements);
        console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"Calibration factor {s.Calibration.Factor:0.###}: {s.Calibration.Source}{(s.Calibration.IsBorrowedFor(d.Polarizer) ? $"; measured on {s.Calibration.MaterialSet}, borrowed for {CoatingCalibration.MaterialSetOf(d.Polarizer)}" : "")}."));
        console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{s.Search.Evaluations} geometries scored, {s.FieldSolves} field solves."));
        foreach (var limit in s.Search.LimitsReached)
            console.WriteLine($"At a search limit: {limit}; the optimum may lie beyond it.");
        console.WriteLine("Practice scaling: the 5.8 GHz rule of thumb scaled by wavelength; not a solved result.");
    }

    /// <summary>The worst true axial ratio in the wanted sense, or the wrong sense that appears instead (short, for a table cell).</summary>
    private static string Short(IReadOnlyList<FrequencySummary> points)
    {
        var w = points.MaxBy(p => p.WorstScoreDb)!;
        return points.All(p => p.AllWantedSense)
            ? Db(points.Max(p => p.WorstWantedAxialRatioDb))
            : $"wrong sense ({SolvedJson.SenseWord(w.Worst.Sense)})";
    }

    private static string Db(double db) => SignedNumber.Plain(db, "0.0") + " dB";
}
