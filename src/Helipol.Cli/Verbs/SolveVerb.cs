using System.CommandLine;
using System.Globalization;
using Helipol.Model;
using Spectre.Console;

namespace Helipol.Cli.Verbs;

/// <summary>
/// <c>helipol solve FILE [--json]</c>: the resolved design and element length and rise. Until the
/// field solver is wired in, the element values shown are practice scaling, labelled as such.
/// </summary>
public static class SolveVerb
{
    public static Command Create(CliConsole console)
    {
        var file = new Argument<string>("FILE") { Description = "design file (.yaml)" };
        var json = new Option<bool>("--json") { Description = "print the resolved design as JSON (the same as design.json)" };
        var command = new Command("solve", "Show the resolved design and element length and rise.") { file, json };
        command.SetAction(parse =>
        {
            var designs = DesignLoader.LoadAll(new[] { parse.GetValue(file)! }, console);
            if (designs is null) return ExitCodes.BadInput;
            var design = designs[0];
            if (parse.GetValue(json))
            {
                console.Out.Write(DesignJson.Write(design));
                return ExitCodes.Ok;
            }
            Show(console.Tables, design);
            return ExitCodes.Ok;
        });
        return command;
    }

    private static string Mm(double metres) => (metres * 1e3).ToString("0.00", CultureInfo.InvariantCulture) + " mm";
    private static string MHz(double hz) => (hz / 1e6).ToString("0.###", CultureInfo.InvariantCulture) + " MHz";
    private static string Deg(double rad) => (rad * 180 / Math.PI).ToString("0.0", CultureInfo.InvariantCulture) + " deg";

    private static void Show(IAnsiConsole console, PolarizerDesign d)
    {
        var p = d.Polarizer;
        var design = new Table().Title($"design {Markup.Escape(d.Name)}").AddColumn("quantity").AddColumn("value");
        void Row(string name, string value) => design.AddRow(Markup.Escape(name), Markup.Escape(value));
        Row("band", $"{MHz(d.Band.LowHz)} .. {MHz(d.Band.HighHz)} (center {MHz(d.Band.CenterHz)}{(d.Band.EdgesGiven ? "" : ", edges ±1.5 % by default")})");
        Row("wavelength", Mm(d.Band.WavelengthM));
        Row("whip", $"{(d.Whip.Kind == WhipKind.Monopole ? "monopole" : "dipole")}, {Mm(d.Whip.LengthM)} long, {Mm(d.Whip.DiameterM)} diameter"
            + (d.Whip.CoverDiameterM is { } c ? $", cover {Mm(c)}" : ""));
        Row("sense", p.Sense == Sense.Lhcp ? "LHCP" : "RHCP");
        Row("wire", $"{Mm(p.Wire.DiameterM)} {p.Wire.Material.Name}" + (p.Wire.ConductivitySPerM is { } s ? $", {s.Value.ToString("0.###e0", CultureInfo.InvariantCulture)} S/m" : ", lossless"));
        Row("former", $"{p.Former.Material.Name}, bore {Mm(p.Former.BoreM)}, height {Mm(p.Former.HeightM)}, εr {p.Former.RelativePermittivity.Value.ToString("0.###", CultureInfo.InvariantCulture)}");
        Row("wrap", p.Wrap is { } w ? $"{w.Layers} × {Mm(w.LayerThicknessM.Value)} {w.Material.Name}, εr {w.RelativePermittivity.Value.ToString("0.##", CultureInfo.InvariantCulture)}" : "none");
        Row("glue", p.Glue is { } g ? $"{Mm(g.ThicknessM)} {g.Material.Name}" : "none");
        console.Write(design);

        var practice = d.Practice;
        var elements = new Table().Title(Markup.Escape($"elements ({PracticeScaling.Label})")).AddColumn("quantity").AddColumn("value").AddColumn("from");
        string From(bool pinned) => pinned ? "design file" : "practice scaling";
        elements.AddRow("elements", practice.Count.ToString(CultureInfo.InvariantCulture), From(p.ElementCount is not null));
        elements.AddRow("element length", Mm(practice.LengthM), From(p.ElementLengthM is not null));
        elements.AddRow("element rise", Mm(practice.RiseM), From(p.ElementRiseM is not null));
        elements.AddRow("former outer diameter", Mm(practice.OuterDiameterM), From(p.Former.OuterDiameterM is not null));
        elements.AddRow("element axis radius", Mm(practice.AxisRadiusM), "derived");
        elements.AddRow("arc angle", Deg(practice.ArcAngleRad), "derived");
        elements.AddRow("pitch angle", Deg(practice.PitchAngleRad), "derived");
        elements.AddRow("winding", p.Winding == Winding.Auto ? $"{PracticeScaling.WindingFor(p.Sense).ToString().ToLowerInvariant()} (builders' rule)" : p.Winding.ToString().ToLowerInvariant(),
            p.Winding == Winding.Auto ? "practice scaling" : "design file");
        console.Write(elements);
        console.WriteLine("Practice scaling is the 5.8 GHz rule of thumb scaled by wavelength; it is not a solved result.");
    }
}
