using Helipol.Spec.Fields;

namespace Helipol.Spec;

/// <summary>
/// Every key of a design file, what it accepts, its default and its meaning. The reader, the
/// error messages, the JSON Schema and the README's reference table all come from this one table.
/// Limits are sanity limits of the thin-wire model and of hand fabrication, not design rules.
/// </summary>
public static class DesignKeys
{
    private const double Mm = 1e-3;
    private const double Deg = Math.PI / 180.0;

    private static FieldDefinition F(string name, FieldType type, string description) => new(name, type, description);

    private static QuantityField Length(double minMm, double maxMm, bool minInclusive = false, bool auto = false) =>
        new(QuantityKind.Length, minMm * Mm, maxMm * Mm, minInclusive, auto);

    /// <summary>The thin-wire model and our fabrication outputs are meant for 100 MHz to 20 GHz.</summary>
    public const double LowestFrequencyHz = 100e6;
    public const double HighestFrequencyHz = 20e9;

    /// <summary>Frequencies in a reported sweep: solve.sweep.points and `sweep --points` share these limits.</summary>
    public const int MinSweepPoints = 3;
    public const int MaxSweepPoints = 1001;

    private static QuantityField Frequency() => new(QuantityKind.Frequency, LowestFrequencyHz, HighestFrequencyHz, minInclusive: true);

    public static readonly string[] WireMaterials = { "pec", "copper", "brass", "steel", "stainless" };
    public static readonly string[] FormerMaterials = { "air", "eps-foam", "xps-foam", "pla", "petg" };
    public static readonly string[] WrapMaterials = { "pvc-tape", "packing-tape", "masking-tape" };
    public static readonly string[] GlueMaterials = { "hot-melt", "epoxy" };

    private static readonly MappingField Band = new(false,
        F("center", Frequency(), "centre frequency of the link") with { Required = true },
        F("low", Frequency(), "lower edge of the band the polarizer must cover") with { DefaultRule = "center − 1.5 %" },
        F("high", Frequency(), "upper edge of the band") with { DefaultRule = "center + 1.5 %" });

    private static readonly MappingField Whip = new(false,
        F("kind", new ChoiceField("dipole", "monopole"), "dipole: centre-fed in free space, centred at z = 0 | monopole: standing on a perfect ground plane at z = 0") with { Default = "dipole" },
        F("length", Length(1, 3000), "radiating length: tip to tip for a dipole, ground to tip for a monopole") with { Required = true },
        F("diameter", Length(0.05, 20), "conductor diameter of the whip") with { Required = true },
        F("cover_diameter", Length(0.1, 100), "outside diameter of the plastic cover the former slides over; leave out for a bare whip"));

    private static readonly MappingField Wire = new(false,
        F("diameter", Length(0.05, 5), "diameter of the element wire") with { Required = true },
        F("material", new ChoiceField(WireMaterials), "wire metal, from the built-in table (pec = perfect conductor, no loss)") with { Default = "copper" },
        F("conductivity", new QuantityField(QuantityKind.Conductivity, 0, 1e9), "overrides the table's conductivity") with { DefaultRule = "from the material table" },
        F("permeability", new NumberField(1, 10000, "a relative permeability"), "overrides the table's relative permeability (steel is magnetic)") with { DefaultRule = "from the material table" });

    private static readonly MappingField Former = new(false,
        F("material", new ChoiceField(FormerMaterials), "material of the ring or sleeve that carries the elements") with { Default = "eps-foam" },
        F("outer_diameter", Length(1, 1000, auto: true), "outside diameter of the former; the element wire lies on it; auto = practice scaling") with { Default = "auto" },
        F("bore", Length(0.1, 1000), "diameter of the hole that slides over the whip or its cover") with { Required = true },
        F("height", Length(1, 1000), "height of the former along the whip") with { Required = true },
        F("permittivity", new NumberField(1, 20, "a relative permittivity"), "overrides the table's relative permittivity") with { DefaultRule = "from the material table" },
        F("loss_tangent", new NumberField(0, 1, "a loss tangent"), "overrides the table's loss tangent") with { DefaultRule = "from the material table" });

    private static readonly MappingField Wrap = new(true,
        F("material", new ChoiceField(WrapMaterials), "tape wound over the elements to hold them") with { Default = "pvc-tape" },
        F("thickness", Length(0.005, 5), "thickness of one layer of tape") with { DefaultRule = "the material's typical thickness" },
        F("layers", new IntegerField(1, 10), "number of layers") with { Default = "1" },
        F("tent", Length(0.01, 50), "distance from the wire axis where the tape comes down onto the former beside the wire (air under the tent)") with { DefaultRule = "hugging: the tape follows the wire's side down to the former" },
        F("permittivity", new NumberField(1, 20, "a relative permittivity"), "overrides the table's relative permittivity") with { DefaultRule = "from the material table" },
        F("loss_tangent", new NumberField(0, 1, "a loss tangent"), "overrides the table's loss tangent") with { DefaultRule = "from the material table" });

    private static readonly MappingField Glue = new(true,
        F("material", new ChoiceField(GlueMaterials), "adhesive holding the elements on the former") with { Default = "hot-melt" },
        F("thickness", Length(0.01, 5), "thickness of the adhesive over the wire") with { Default = "0.3 mm" },
        F("permittivity", new NumberField(1, 20, "a relative permittivity"), "overrides the table's relative permittivity") with { DefaultRule = "from the material table" });

    private static readonly MappingField Polarizer = new(false,
        F("sense", new ChoiceField("rhcp", "lhcp"), "circular polarization wanted (IEEE Std 145 sense)") with { Required = true },
        F("winding", new ChoiceField("auto", "left", "right"), "right = azimuth increases as the element rises; auto = the one that gives the sense") with { Default = "auto" },
        F("elements", new IntegerField(3, 8, allowAuto: true), "number of elements around the former") with { Default = "5" },
        F("element_length", Length(1, 2000, auto: true), "wire length of one element; a length pins it, auto lets the solver choose") with { Default = "auto" },
        F("element_rise", Length(0.1, 2000, auto: true), "vertical rise of one element; a length pins it, auto lets the solver choose") with { Default = "auto" },
        F("centre_height", Length(-3000, 3000, minInclusive: true), "height of the element centres above the dipole feed, or above the ground for a monopole") with { Default = "0 mm" },
        F("wire", Wire, "element wire") with { Required = true },
        F("former", Former, "ring or sleeve carrying the elements") with { Required = true },
        F("wrap", Wrap, "tape over the elements, or none") with { Default = "none" },
        F("glue", Glue, "adhesive on the elements, or none") with { Default = "none" });

    private static readonly MappingField Board = new(false,
        F("width", Length(10, 3000), "foam board width") with { Default = "300 mm" },
        F("height", Length(10, 3000), "foam board height") with { Default = "200 mm" },
        F("thickness", Length(1, 200), "foam board thickness (best equal to one ring's thickness)") with { Default = "38 mm" });

    private static readonly MappingField Fabrication = new(false,
        F("kerf", Length(0, 5, minInclusive: true), "width of the cut (laser, wire or blade), compensated in cut contours") with { Default = "0.2 mm" },
        F("rings", new IntegerField(1, 50), "number of foam rings stacked to make the former, each (former height / rings) thick") with { Default = "6" },
        F("board", Board, "foam board the rings are cut from"),
        F("print_clearance", Length(0, 2, minInclusive: true), "extra room added to printed bores and grooves") with { Default = "0.2 mm" },
        F("paper", new ChoiceField("a4", "letter"), "paper size of the bend sheet") with { Default = "a4" },
        F("dpi", new IntegerField(72, 1200), "resolution of the PNG bend sheet") with { Default = "300" });

    private static readonly MappingField Elevations = new(false,
        F("from", new QuantityField(QuantityKind.Angle, -90 * Deg, 90 * Deg, minInclusive: true), "lowest elevation above the horizon") with { DefaultRule = "-30 deg for a dipole, 10 deg for a monopole" },
        F("to", new QuantityField(QuantityKind.Angle, -90 * Deg, 90 * Deg, minInclusive: true), "highest elevation above the horizon") with { DefaultRule = "30 deg for a dipole, 50 deg for a monopole" });

    private static readonly MappingField Search = new(false,
        F("elements", new PairField(new IntegerField(3, 8)), "element counts tried when polarizer.elements is auto") with { Default = "[3, 8]" },
        F("element_length", new PairField(Length(1, 2000)), "range searched for element_length") with { DefaultRule = "practice length × [0.6, 1.6]" },
        F("element_rise", new PairField(Length(0.1, 2000)), "range searched for element_rise") with { DefaultRule = "practice rise × [0.3, 1.5], capped by the former height" },
        F("outer_diameter", new PairField(Length(1, 1000)), "range searched for the former diameter when it is auto") with { DefaultRule = "practice diameter × [0.7, 1.4]" },
        F("grid", new IntegerField(3, 41), "points per axis of the coarse map before local refinement") with { Default = "9" });

    private static readonly MappingField Sweep = new(false,
        F("points", new IntegerField(MinSweepPoints, MaxSweepPoints), "frequencies in the sweep") with { Default = "101" },
        F("span", new QuantityField(QuantityKind.Percent, 0, 0.5), "sweep from band low − span to high + span, as a share of center") with { Default = "10 %" });

    private static readonly MappingField Solve = new(false,
        F("objective", new ChoiceField("worst-ar", "mean-ar"), "worst-ar: the largest axial ratio over band, azimuth and elevation | mean-ar: its mean") with { Default = "worst-ar" },
        F("elevations", Elevations, "elevation window of the coverage window the axial ratio is judged over"),
        F("azimuth_span", new QuantityField(QuantityKind.Angle, 0, 360 * Deg), "azimuth span of the coverage window, centred on azimuth 0 (360 deg = all round)") with { Default = "360 deg" },
        F("axial_ratio_limit", new QuantityField(QuantityKind.Level, 0.1, 20), "largest axial ratio in the wanted sense that counts as circular, over band and coverage window (verdict, yield)") with { Default = "3 dB" },
        F("receiver_impedance", new QuantityField(QuantityKind.Resistance, 1, 1000), "resistance of the radio port: VSWR and realized gain are referred to it") with { Default = "50 ohm" },
        F("elevation_step", new QuantityField(QuantityKind.Angle, 0, 45 * Deg), "step across the elevation window") with { Default = "5 deg" },
        F("azimuth_step", new QuantityField(QuantityKind.Angle, 0, 90 * Deg), "step around the azimuth") with { Default = "5 deg" },
        F("frequencies", new IntegerField(1, 101), "frequencies across the band in the objective") with { Default = "5" },
        F("gain_weight", new NumberField(0, 10, "a weight"), "dB of axial ratio traded for 1 dB of gain in the wanted sense (0 = axial ratio only)") with { Default = "0.1" },
        F("search", Search, "where and how finely element length, rise, count and diameter are searched"),
        F("sweep", Sweep, "frequency sweep reported after the solve"));

    private static readonly MappingField Tolerance = new(false,
        F("builds", new IntegerField(1, 100000), "simulated builds in the Monte Carlo yield") with { Default = "500" },
        F("element_length", Length(0, 10, minInclusive: true), "± spread of cut element length (uniform)") with { Default = "0.5 mm" },
        F("element_rise", Length(0, 10, minInclusive: true), "± spread of element rise") with { Default = "1 mm" },
        F("azimuth", new QuantityField(QuantityKind.Angle, 0, 45 * Deg, minInclusive: true), "± spread of element placement around the former") with { Default = "3 deg" },
        F("wrap_thickness", new QuantityField(QuantityKind.Percent, 0, 1, minInclusive: true), "± spread of the wrap thickness") with { Default = "30 %" },
        F("seed", new IntegerField(0, int.MaxValue), "seed of the random builds, for repeatable results") with { Default = "1" });

    /// <summary>The whole design file.</summary>
    public static readonly MappingField Root = new(false,
        F("name", new TextField("^[A-Za-z0-9_-]+$", "letters, digits, - and _ only (it names the output folder)", 64), "design name; becomes output/<name>/") with { Required = true },
        F("band", Band, "frequency band") with { Required = true },
        F("whip", Whip, "the linear antenna the polarizer converts") with { Required = true },
        F("polarizer", Polarizer, "the parasitic helical polarizer") with { Required = true },
        F("fabrication", Fabrication, "settings for the cutting, printing and bend-sheet files"),
        F("solve", Solve, "how the solver judges and searches designs"),
        F("tolerance", Tolerance, "build-to-build spreads for the yield estimate"),
        F("calibration", new TextField(@"^[^\x00-\x1f]+$", "a path to a calibration file, relative to this design file", 260), "calibration file written by a measured build; leave out for the built-in default"));

    static DesignKeys()
    {
        var paths = AllKeyPaths().ToList();
        foreach (var block in Blocks(Root)) block.AllPaths = () => paths;
    }

    /// <summary>Every key path (e.g. "polarizer.former.bore"), depth first in table order.</summary>
    public static IEnumerable<string> AllKeyPaths() => Walk(Root, "").Select(e => e.Path);

    /// <summary>Every key with its path, depth first in table order (for documentation).</summary>
    public static IEnumerable<(string Path, FieldDefinition Field)> Walk(MappingField block, string path)
    {
        foreach (var field in block.Fields)
        {
            var keyPath = path.Length == 0 ? field.Name : $"{path}.{field.Name}";
            yield return (keyPath, field);
            if (field.Type is MappingField inner)
                foreach (var child in Walk(inner, keyPath)) yield return child;
        }
    }

    private static IEnumerable<MappingField> Blocks(MappingField block) =>
        new[] { block }.Concat(block.Fields.Select(f => f.Type).OfType<MappingField>().SelectMany(Blocks));
}
