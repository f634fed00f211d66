using System.CommandLine;
using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using Helipol.Design;
using Helipol.Emit.Report;
using Helipol.Engine;
using Helipol.Model;
using Helipol.Pipeline;
using Helipol.Spec;
using Spectre.Console;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol analyze FILE [--solve] [--freq F | --from F1 --to F2 --points N] [--elevation DEG] [--json]</c>:
/// evaluates one geometry (no search) and prints, per frequency, impedance, VSWR and realized gain
/// against the receiver, and the true axial ratio with its sense on a cone (the given elevation every 5°
/// of azimuth) and over the design's coverage window. FILE is a design file (auto keys at practice
/// scaling, said in the first line; with --solve it is solved first and the solution evaluated) or a
/// design.json written by build or solve (its solved geometry).
/// </summary>
public static class AnalyzeVerb
{
    public static Command Create(CliConsole console)
    {
        var file = new Argument<string>("FILE") { Description = "design file (.yaml) or a design.json written by build or solve; auto lengths at practice scaling unless --solve, a design.json at its solved geometry" };
        var solveFirst = new Option<bool>("--solve") { Description = "solve the design file first and evaluate the solution" };
        var freq = new Option<string>("--freq") { Description = "one frequency, e.g. 5.8GHz" };
        var from = new Option<string>("--from") { Description = "first frequency of a sweep" };
        var to = new Option<string>("--to") { Description = "last frequency of a sweep" };
        var points = new Option<int>("--points") { Description = "frequencies from --from to --to", DefaultValueFactory = _ => 11 };
        var elevation = new Option<string>("--elevation") { Description = "cone elevation above the horizon, e.g. 20deg (default 0 for a dipole, 20 for a monopole)" };
        var json = new Option<bool>("--json") { Description = "print JSON" };
        var command = new Command("analyze", "Evaluate one geometry (no search): impedance, VSWR, realized gain, true axial ratio and sense per frequency.")
            { file, solveFirst, freq, from, to, points, elevation, json };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(file)!;
            PolarizerDesign design;
            PolarizerBuild? solvedBuild = null;
            string source;
            if (SolvedDesignFile.Is(path))
            {
                if (parse.GetValue(solveFirst))
                {
                    console.Error.WriteLine($"helipol analyze: --solve: found it with a design.json, allowed with a design file only (design.json is already solved)");
                    return ExitCodes.BadInput;
                }
                var loaded = SolvedDesignFile.Read(path, out var readError);
                if (loaded is null)
                {
                    console.Error.WriteLine(readError);
                    return ExitCodes.BadInput;
                }
                if (DesignRefusal.LineFor(loaded.Design) is { } refused)
                {
                    console.Error.WriteLine(refused);
                    return ExitCodes.BadInput;
                }
                design = loaded.Design;
                solvedBuild = loaded.Build;
                source = "solved geometry from design.json";
            }
            else
            {
                var designs = DesignLoader.LoadAll(new[] { path }, console);
                if (designs is null) return ExitCodes.BadInput;
                design = designs[0];
                source = "as written";
                if (parse.GetValue(solveFirst))
                {
                    solvedBuild = SolveRunner.Solve(console, design, new FieldSolveCounter()).Build;
                    source = "solved first (--solve)";
                }
            }
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
            var window = EvaluationPlan.ForDesign(design).Directions;
            IReadOnlyList<(FrequencySummary Cone, FrequencySummary Window)> result;
            PolarizerBuild build;
            IReadOnlyList<string> practiceKeys = Array.Empty<string>();
            bool windingChosen = false;
            try
            {
                build = solvedBuild ?? AnalysisGeometry.For(design, cone, out practiceKeys, out windingChosen);
                result = Evaluate(build, freqs!, cone, window, design);
            }
            catch (ModelException ex)
            {
                console.Error.WriteLine($"{design.SourceFile}: polarizer: found a geometry the field model refuses ({ex.Message}), allowed wires that do not touch and are thin enough");
                return ExitCodes.BadInput;
            }
            if (practiceKeys.Count > 0) source = "practice scaling for the auto keys";
            string? note = practiceKeys.Count > 0
                ? $"{design.Name}: evaluates practice scaling, not a solution: {string.Join(", ", practiceKeys)} are auto in the file and take practice-scaling values (run 'helipol analyze FILE --solve' or analyze the build's design.json)"
                : null;
            if (parse.GetValue(json))
            {
                if (note is not null) console.Error.WriteLine(note);
                console.Out.Write(Json(design, build, elevationRad, result, practiceKeys, windingChosen, source));
            }
            else
            {
                if (note is not null) console.Out.WriteLine(note);
                Table(console, design, build, elevationRad, result, source);
                if (windingChosen)
                    console.Out.WriteLine($"{Keys.PolarizerWinding}: auto in the file; the winding that radiates the wanted sense better at the band centre was taken.");
            }
            return ExitCodes.Ok;
        });
        return command;
    }

    /// <summary>One solve per frequency, sampled on the cone and over the coverage window.</summary>
    private static IReadOnlyList<(FrequencySummary Cone, FrequencySummary Window)> Evaluate(PolarizerBuild build, IReadOnlyList<double> freqs,
        ObservationSet cone, ObservationSet window, PolarizerDesign design)
    {
        int nc = cone.Directions.Count;
        var all = ObservationSet.Of(cone.Directions.Concat(window.Directions));
        var sense = design.Polarizer.Sense;
        double receiver = design.Solve.ReceiverOhm;
        return PolarizerEvaluator.Sample(build, freqs, all).Select(s =>
        {
            var c = new CircularSamples(s.FrequencyHz, s.ImpedanceOhm, cone.Directions, s.GainRhcp[..nc], s.GainLhcp[..nc]);
            var w = new CircularSamples(s.FrequencyHz, s.ImpedanceOhm, window.Directions, s.GainRhcp[nc..], s.GainLhcp[nc..]);
            return (c.Summarize(sense, receiver), w.Summarize(sense, receiver));
        }).ToArray();
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

    private static string Json(PolarizerDesign design, PolarizerBuild build, double elevationRad, IReadOnlyList<(FrequencySummary Cone, FrequencySummary Window)> result,
        IReadOnlyList<string> practiceKeys, bool windingChosen, string source)
    {
        using var buffer = new MemoryStream();
        using (var j = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = false, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            j.WriteStartObject();
            j.WriteString("name", design.Name);
            j.WriteString("geometry", source);
            j.WriteNumber("element_length_mm", build.ElementLengthM * 1e3);
            j.WriteNumber("element_rise_mm", build.ElementRiseM * 1e3);
            j.WriteString("winding", build.Winding == Winding.Left ? "left" : "right");
            j.WriteStartArray("points");
            foreach (var (c, w) in result)
            {
                j.WriteStartObject();
                j.WriteNumber("frequency_hz", c.FrequencyHz);
                j.WriteStartArray("impedance_ohm");
                j.WriteNumberValue(c.ImpedanceOhm.Real);
                j.WriteNumberValue(c.ImpedanceOhm.Imaginary);
                j.WriteEndArray();
                j.WriteStartObject("cut");
                j.WriteNumber("elevation_deg", elevationRad * 180 / Math.PI);
                SolvedJson.WritePoint(j, c);
                j.WriteEndObject();
                j.WriteStartObject("window");
                j.WriteString("coverage", VerdictJudge.Window(design));
                SolvedJson.WritePoint(j, w);
                j.WriteEndObject();
                Number(j, "vswr_50", c.Vswr50);
                Number(j, "receiver_impedance_ohm", c.ReceiverOhm);
                Number(j, "vswr", c.Vswr);
                j.WriteEndObject();
            }
            j.WriteEndArray();
            j.WriteNumber("elements", build.ElementCount);
            j.WriteNumber("outer_diameter_mm", build.OuterDiameterM * 1e3);
            j.WriteNumber("calibration_factor", build.Surroundings.CalibrationFactor);
            SolvedJson.WriteLoading(j, Helipol.Design.Loading.LoadingSummary.For(build.Surroundings, build.ElementLengthM));
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

    private static void Table(CliConsole console, PolarizerDesign design, PolarizerBuild build, double elevationRad, IReadOnlyList<(FrequencySummary Cone, FrequencySummary Window)> result, string source)
    {
        var inv = CultureInfo.InvariantCulture;
        // The heading is a plain line (a terminal wraps it), not a table title that widens the table.
        console.Out.WriteLine(string.Create(inv,
                $"{design.Name} ({source}): {build.ElementCount} × {build.ElementLengthM * 1e3:0.##} mm elements, rise {build.ElementRiseM * 1e3:0.##} mm, {(build.Winding == Winding.Left ? "left" : "right")} winding; cone at {elevationRad * 180 / Math.PI:0.#}°; window {VerdictJudge.Window(design)}"));
        var t = new Table()
            // Units go in the caption and the cells stay bare numbers, so the table fits an
            // 80-column terminal without truncating a header.
            .Caption(Markup.Escape(string.Create(inv, $"Ω; VSWR and realized gain (real.) against {design.Solve.ReceiverOhm:0.#} Ω; AR: true axial ratio (dB) of the worst direction with its sense; gains in dBic")))
            .AddColumn("MHz").AddColumn("impedance").AddColumn("VSWR").AddColumn("cone AR").AddColumn("window AR").AddColumn("RHCP").AddColumn("LHCP").AddColumn("real.");
        string Ar(FrequencySummary p) => string.Create(inv, $"{p.Worst.AxialRatioDb:0.0} {SolvedJson.SenseWord(p.Worst.Sense)}{(p.AllWantedSense ? "" : "!")}");
        foreach (var (c, w) in result)
            t.AddRow(Markup.Escape(string.Create(inv, $"{c.FrequencyHz / 1e6:0.###}")),
                Markup.Escape(string.Create(inv, $"{c.ImpedanceOhm.Real:0.0}{(c.ImpedanceOhm.Imaginary < 0 ? "−" : "+")}j{Math.Abs(c.ImpedanceOhm.Imaginary):0.0}")),
                c.Vswr.ToString("0.00", inv), Markup.Escape(Ar(c)), Markup.Escape(Ar(w)),
                SignedNumber.Plain(c.GainRhcpDbic, "0.00"), SignedNumber.Plain(c.GainLhcpDbic, "0.00"), SignedNumber.Plain(c.RealizedGainDbic(design.Polarizer.Sense), "0.00"));
        console.Tables.Write(t);
        console.Out.WriteLine("AR marked ! has the wrong sense in part of the cone or window.");
    }
}
