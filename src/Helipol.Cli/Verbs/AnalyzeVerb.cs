using System.CommandLine;
using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using Helipol.Design;
using Helipol.Emit.Report;
using Helipol.Engine;
using Helipol.Model;
using Helipol.Spec;
using Spectre.Console;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol analyze FILE [--freq F | --from F1 --to F2 --points N] [--elevation DEG] [--json]</c>:
/// evaluates the geometry written in the file (no search; auto keys at practice scaling, labelled): impedance, VSWR against 50 Ω and, on a
/// cone at the given elevation every 5° of azimuth, mean and worst AR, sense and circular gains.
/// </summary>
public static class AnalyzeVerb
{
    public static Command Create(CliConsole console)
    {
        var file = new Argument<string>("FILE") { Description = "design file (.yaml); auto lengths are evaluated at practice scaling, an auto winding at the better of the two" };
        var freq = new Option<string>("--freq") { Description = "one frequency, e.g. 5.8GHz" };
        var from = new Option<string>("--from") { Description = "first frequency of a sweep" };
        var to = new Option<string>("--to") { Description = "last frequency of a sweep" };
        var points = new Option<int>("--points") { Description = "frequencies from --from to --to", DefaultValueFactory = _ => 11 };
        var elevation = new Option<string>("--elevation") { Description = "cone elevation above the horizon, e.g. 20deg (default 0 for a dipole, 20 for a monopole)" };
        var json = new Option<bool>("--json") { Description = "print JSON" };
        var command = new Command("analyze", "Evaluate the geometry written in a design (no search): impedance, VSWR, axial ratio, sense and gains per frequency.")
            { file, freq, from, to, points, elevation, json };
        command.SetAction(parse =>
        {
            var designs = DesignLoader.LoadAll(new[] { parse.GetValue(file)! }, console);
            if (designs is null) return ExitCodes.BadInput;
            var design = designs[0];
            var freqs = Frequencies(design, parse.GetValue(freq), parse.GetValue(from), parse.GetValue(to), parse.GetValue(points), out var problem);
            double elevationRad = AnalysisCone.DefaultElevationRad(design.Whip.Kind);
            if (problem is null && parse.GetValue(elevation) is { } e)
            {
                var el = CliQuantity.Read("--elevation", e, QuantityKind.Angle, out problem);
                if (el is { } v && (v < -Math.PI / 2 || v > Math.PI / 2)) problem = $"--elevation: found '{e}', allowed -90 deg to 90 deg";
                elevationRad = el ?? 0;
            }
            if (problem is not null)
            {
                console.Error.WriteLine($"helipol analyze: {problem}");
                return ExitCodes.BadInput;
            }
            var cone = ObservationSet.Cone(elevationRad, 5 * Math.PI / 180);
            IReadOnlyList<FrequencySummary> result;
            PolarizerBuild build;
            IReadOnlyList<string> practiceKeys;
            bool windingChosen;
            try
            {
                build = SolveRunner.AnalysisBuild(design, cone, out practiceKeys, out windingChosen);
                result = PolarizerEvaluator.Evaluate(build, freqs!, cone, design.Polarizer.Sense);
            }
            catch (ModelException ex)
            {
                console.Error.WriteLine($"{design.SourceFile}: polarizer: found a geometry the field model refuses ({ex.Message}), allowed wires that do not touch and are thin enough");
                return ExitCodes.BadInput;
            }
            if (parse.GetValue(json)) console.Out.Write(Json(design, build, elevationRad, result, practiceKeys, windingChosen));
            else
            {
                Table(console, design, build, elevationRad, result);
                if (practiceKeys.Count > 0)
                    console.Out.WriteLine($"{string.Join(", ", practiceKeys)}: auto in the file, evaluated at practice scaling (not solved; run 'helipol solve' to choose).");
                if (windingChosen)
                    console.Out.WriteLine("polarizer.winding: auto in the file; the winding that radiates the wanted sense better at the band centre was taken.");
            }
            return ExitCodes.Ok;
        });
        return command;
    }

    internal static double[]? Frequencies(PolarizerDesign design, string? freq, string? from, string? to, int points, out string? problem)
    {
        problem = null;
        if (freq is not null && (from is not null || to is not null)) { problem = "--freq: found it together with --from/--to, allowed one or the other"; return null; }
        if (freq is not null)
        {
            var f = CliQuantity.Read("--freq", freq, QuantityKind.Frequency, out problem);
            return f is { } v ? Check(new[] { v }, out problem) : null;
        }
        if (from is not null || to is not null)
        {
            if (from is null || to is null) { problem = "--from/--to: found only one of them, allowed both"; return null; }
            var a = CliQuantity.Read("--from", from, QuantityKind.Frequency, out problem);
            if (a is null) return null;
            var b = CliQuantity.Read("--to", to, QuantityKind.Frequency, out problem);
            if (b is null) return null;
            if (b <= a) { problem = $"--to: found '{to}', allowed a frequency above --from ({from})"; return null; }
            if (points < 2 || points > 2001) { problem = string.Create(CultureInfo.InvariantCulture, $"--points: found {points}, allowed 2 to 2001"); return null; }
            return Check(Enumerable.Range(0, points).Select(i => a.Value + (b.Value - a.Value) * i / (points - 1)).ToArray(), out problem);
        }
        return EvaluationPlan.BandFrequencies(design.Band, design.Solve.FrequencyCount);
    }

    private static double[]? Check(double[] freqs, out string? problem)
    {
        problem = null;
        foreach (var f in freqs)
            if (f < DesignKeys.LowestFrequencyHz || f > DesignKeys.HighestFrequencyHz)
            {
                problem = string.Create(CultureInfo.InvariantCulture, $"frequency: found {f / 1e6:0.###} MHz, allowed 100 MHz to 20 GHz");
                return null;
            }
        return freqs;
    }

    private static string Json(PolarizerDesign design, PolarizerBuild build, double elevationRad, IReadOnlyList<FrequencySummary> result,
        IReadOnlyList<string> practiceKeys, bool windingChosen)
    {
        using var buffer = new MemoryStream();
        using (var j = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = false, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            j.WriteStartObject();
            j.WriteString("name", design.Name);
            j.WriteNumber("element_length_mm", build.ElementLengthM * 1e3);
            j.WriteNumber("element_rise_mm", build.ElementRiseM * 1e3);
            j.WriteString("winding", build.Winding == Winding.Left ? "left" : "right");
            j.WriteStartArray("points");
            foreach (var p in result)
            {
                j.WriteStartObject();
                j.WriteNumber("frequency_hz", p.FrequencyHz);
                j.WriteStartArray("impedance_ohm");
                j.WriteNumberValue(p.ImpedanceOhm.Real);
                j.WriteNumberValue(p.ImpedanceOhm.Imaginary);
                j.WriteEndArray();
                Number(j, "vswr_50", p.Vswr50);
                j.WriteStartObject("cut");
                j.WriteNumber("elevation_deg", elevationRad * 180 / Math.PI);
                j.WriteNumber("axial_ratio_db_mean", p.MeanAxialRatioDb);
                j.WriteNumber("axial_ratio_db_max", p.WorstAxialRatioDb);
                j.WriteString("sense", SolvedJson.SenseWord(p.Sense));
                j.WriteNumber("gain_rhcp_dbic", p.GainRhcpDbic);
                j.WriteNumber("gain_lhcp_dbic", p.GainLhcpDbic);
                j.WriteEndObject();
                j.WriteEndObject();
            }
            j.WriteEndArray();
            j.WriteNumber("elements", build.ElementCount);
            j.WriteNumber("outer_diameter_mm", build.OuterDiameterM * 1e3);
            j.WriteNumber("calibration_factor", build.Surroundings.CalibrationFactor);
            // Keys left auto in the file and evaluated at practice scaling: never a solved result.
            j.WriteStartArray("practice_scaled_keys");
            foreach (var k in practiceKeys) j.WriteStringValue(k);
            j.WriteEndArray();
            j.WriteBoolean("winding_chosen", windingChosen);
            j.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.ToArray()) + "\n";
    }

    private static void Number(Utf8JsonWriter j, string name, double v)
    {
        if (double.IsFinite(v)) j.WriteNumber(name, v);
        else j.WriteNull(name);
    }

    private static void Table(CliConsole console, PolarizerDesign design, PolarizerBuild build, double elevationRad, IReadOnlyList<FrequencySummary> result)
    {
        var inv = CultureInfo.InvariantCulture;
        // The heading is a plain line (a terminal wraps it), not a table title that widens the table.
        console.Out.WriteLine(string.Create(inv,
                $"{design.Name}: {build.ElementCount} × {build.ElementLengthM * 1e3:0.##} mm elements, rise {build.ElementRiseM * 1e3:0.##} mm, {(build.Winding == Winding.Left ? "left" : "right")} winding; cone at {elevationRad * 180 / Math.PI:0.#}°"));
        var t = new Table()
            // Units go in the caption and the cells stay bare numbers, so the table fits an
            // 80-column terminal without truncating a header.
            .Caption("impedance in Ω, VSWR against 50 Ω, AR in dB, gains in dBic")
            .AddColumn("MHz").AddColumn("impedance").AddColumn("VSWR").AddColumn("AR mean").AddColumn("AR worst").AddColumn("sense").AddColumn("RHCP").AddColumn("LHCP");
        foreach (var p in result)
            t.AddRow(Markup.Escape(string.Create(inv, $"{p.FrequencyHz / 1e6:0.###}")),
                Markup.Escape(string.Create(inv, $"{p.ImpedanceOhm.Real:0.0}{(p.ImpedanceOhm.Imaginary < 0 ? "-" : "+")}j{Math.Abs(p.ImpedanceOhm.Imaginary):0.0}")),
                p.Vswr50.ToString("0.00", inv), p.MeanAxialRatioDb.ToString("0.0", inv), p.WorstAxialRatioDb.ToString("0.0", inv),
                SolvedJson.SenseWord(p.Sense), p.GainRhcpDbic.ToString("0.00", inv), p.GainLhcpDbic.ToString("0.00", inv));
        console.Tables.Write(t);
    }
}
