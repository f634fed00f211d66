using System.Globalization;
using System.Text;
using System.Text.Json;
using Helipol.Design;
using Helipol.Model;
using Helipol.Spec;

namespace Helipol.Cli;

/// <summary>
/// Reads a <c>design.json</c> written by build or solve back into a design and the solved build, so
/// <c>analyze</c> evaluates exactly what was built. The resolved design in the file is written out as
/// design text in SI units (metres, hertz, radians: no unit conversion can round) and goes through the
/// ordinary reader and resolver, so every check and default applies as for a design file; the solved
/// count, length, rise, diameter and winding are pinned, and the loading factor the solve used is kept.
/// </summary>
public static class SolvedDesignFile
{
    public sealed record Loaded(PolarizerDesign Design, PolarizerBuild Build);

    public static bool Is(string path) => path.EndsWith(".json", StringComparison.OrdinalIgnoreCase);

    /// <summary>The design and its solved build, or null with one error line.</summary>
    public static Loaded? Read(string path, out string? error)
    {
        error = null;
        JsonElement root;
        try
        {
            using var doc = JsonDocument.Parse(File.ReadAllText(path));
            root = doc.RootElement.Clone();
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or JsonException)
        {
            error = $"{path}: found {(ex is JsonException ? "text that is not JSON" : "a file that cannot be read")}, allowed a design.json written by 'helipol build' or 'helipol solve --json'";
            return null;
        }
        if (root.ValueKind != JsonValueKind.Object || !root.TryGetProperty("solved", out var solved) || !root.TryGetProperty("format_version", out _))
        {
            error = $"{path}: solved: found no solved design, allowed a design.json written by 'helipol build' or 'helipol solve --json'";
            return null;
        }
        string text;
        try
        {
            text = DesignText(root, solved);
        }
        catch (Exception ex) when (ex is KeyNotFoundException or InvalidOperationException or FormatException)
        {
            error = $"{path}: found a design.json without a field this version needs ({ex.Message}), allowed one written by this version of helipol";
            return null;
        }
        PolarizerDesign design;
        try
        {
            var folder = Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".";
            design = DesignResolver.Resolve(SpecReader.ReadText(text, path, folder));
        }
        catch (DesignInputException ex)
        {
            error = $"{path}: the design in it does not resolve: {ex.Errors[0]}";
            return null;
        }
        var p = design.Polarizer;
        double factor = solved.GetProperty("calibration").GetProperty("loading_factor").GetDouble();
        var build = PolarizerBuild.From(design, p.ElementCount!.Value, p.ElementLengthM!.Value, p.ElementRiseM!.Value, p.Former.OuterDiameterM!.Value, p.Winding, factor);
        return new Loaded(design, build);
    }

    /// <summary>The design as design-file text, every quantity in SI units, the solved layout pinned.</summary>
    public static string DesignText(JsonElement root, JsonElement solved)
    {
        var y = new StringBuilder();
        string R(double v) => v.ToString("R", CultureInfo.InvariantCulture);
        double D(JsonElement e, string name) => e.GetProperty(name).GetDouble();
        double V(JsonElement e, string name) => e.GetProperty(name).GetProperty("value").GetDouble();
        string S(JsonElement e, string name) => e.GetProperty(name).GetString() ?? throw new FormatException(name);
        void Line(int indent, string text) => y.Append(' ', indent).Append(text).Append('\n');

        Line(0, $"name: {S(root, "name")}");
        var band = root.GetProperty("band");
        Line(0, "band:");
        Line(2, $"center: {R(D(band, "center_hz"))} Hz");
        if (band.GetProperty("edges_given").GetBoolean())
        {
            Line(2, $"low: {R(D(band, "low_hz"))} Hz");
            Line(2, $"high: {R(D(band, "high_hz"))} Hz");
        }
        var whip = root.GetProperty("whip");
        Line(0, "whip:");
        Line(2, $"kind: {S(whip, "kind")}");
        Line(2, $"length: {R(D(whip, "length_m"))} m");
        Line(2, $"diameter: {R(D(whip, "diameter_m"))} m");
        if (whip.GetProperty("cover_diameter_m").ValueKind == JsonValueKind.Number) Line(2, $"cover_diameter: {R(D(whip, "cover_diameter_m"))} m");

        var p = root.GetProperty("polarizer");
        Line(0, "polarizer:");
        Line(2, $"sense: {S(p, "sense")}");
        Line(2, $"winding: {S(solved, "winding")}");
        Line(2, $"elements: {solved.GetProperty("elements").GetInt32()}");
        Line(2, $"element_length: {R(D(solved, "element_length_m"))} m");
        Line(2, $"element_rise: {R(D(solved, "element_rise_m"))} m");
        Line(2, $"centre_height: {R(D(p, "centre_height_m"))} m");
        var wire = p.GetProperty("wire");
        Line(2, "wire:");
        Line(4, $"diameter: {R(D(wire, "diameter_m"))} m");
        Line(4, $"material: {S(wire, "material")}");
        if (wire.GetProperty("conductivity_s_per_m").ValueKind == JsonValueKind.Object) Line(4, $"conductivity: {R(V(wire, "conductivity_s_per_m"))} S/m");
        Line(4, $"permeability: {R(V(wire, "relative_permeability"))}");
        var former = p.GetProperty("former");
        Line(2, "former:");
        Line(4, $"material: {S(former, "material")}");
        Line(4, $"outer_diameter: {R(D(solved, "outer_diameter_m"))} m");
        Line(4, $"bore: {R(D(former, "bore_m"))} m");
        Line(4, $"height: {R(D(former, "height_m"))} m");
        Line(4, $"permittivity: {R(V(former, "relative_permittivity"))}");
        Line(4, $"loss_tangent: {R(V(former, "loss_tangent"))}");
        if (p.GetProperty("wrap") is { ValueKind: JsonValueKind.Object } wrap)
        {
            Line(2, "wrap:");
            Line(4, $"material: {S(wrap, "material")}");
            Line(4, $"thickness: {R(V(wrap, "layer_thickness_m"))} m");
            Line(4, $"layers: {wrap.GetProperty("layers").GetInt32()}");
            Line(4, $"permittivity: {R(V(wrap, "relative_permittivity"))}");
            Line(4, $"loss_tangent: {R(V(wrap, "loss_tangent"))}");
        }
        else Line(2, "wrap: none");
        if (p.GetProperty("glue") is { ValueKind: JsonValueKind.Object } glue)
        {
            Line(2, "glue:");
            Line(4, $"material: {S(glue, "material")}");
            Line(4, $"thickness: {R(D(glue, "thickness_m"))} m");
            Line(4, $"permittivity: {R(V(glue, "relative_permittivity"))}");
        }
        else Line(2, "glue: none");

        var f = root.GetProperty("fabrication");
        Line(0, "fabrication:");
        Line(2, $"kerf: {R(D(f, "kerf_mm"))} mm");
        Line(2, $"rings: {f.GetProperty("rings").GetInt32()}");
        Line(2, "board:");
        Line(4, $"width: {R(D(f, "board_width_mm"))} mm");
        Line(4, $"height: {R(D(f, "board_height_mm"))} mm");
        Line(4, $"thickness: {R(D(f, "board_thickness_mm"))} mm");
        Line(2, $"print_clearance: {R(D(f, "print_clearance_mm"))} mm");
        Line(2, $"paper: {S(f, "paper")}");
        Line(2, $"dpi: {f.GetProperty("dpi").GetInt32()}");

        var s = root.GetProperty("solve");
        Line(0, "solve:");
        Line(2, $"objective: {S(s, "objective")}");
        Line(2, "elevations:");
        Line(4, $"from: {R(D(s, "elevation_from_rad"))} rad");
        Line(4, $"to: {R(D(s, "elevation_to_rad"))} rad");
        Line(2, $"elevation_step: {R(D(s, "elevation_step_rad"))} rad");
        Line(2, $"azimuth_step: {R(D(s, "azimuth_step_rad"))} rad");
        if (s.TryGetProperty("azimuth_span_rad", out var span)) Line(2, $"azimuth_span: {R(span.GetDouble())} rad");
        if (s.TryGetProperty("axial_ratio_limit_db", out var limit)) Line(2, $"axial_ratio_limit: {R(limit.GetDouble())} dB");
        if (s.TryGetProperty("receiver_impedance_ohm", out var receiver)) Line(2, $"receiver_impedance: {R(receiver.GetDouble())} ohm");
        Line(2, $"frequencies: {s.GetProperty("frequencies").GetInt32()}");
        Line(2, $"gain_weight: {R(D(s, "gain_weight"))}");
        var search = s.GetProperty("search");
        Line(2, "search:");
        Line(4, $"elements: [{search.GetProperty("elements_min").GetInt32()}, {search.GetProperty("elements_max").GetInt32()}]");
        Line(4, $"element_length: [{R(D(search, "element_length_min_m"))} m, {R(D(search, "element_length_max_m"))} m]");
        Line(4, $"element_rise: [{R(D(search, "element_rise_min_m"))} m, {R(D(search, "element_rise_max_m"))} m]");
        Line(4, $"outer_diameter: [{R(D(search, "outer_diameter_min_m"))} m, {R(D(search, "outer_diameter_max_m"))} m]");
        Line(4, $"grid: {search.GetProperty("grid").GetInt32()}");
        var sweep = s.GetProperty("sweep");
        Line(2, "sweep:");
        Line(4, $"points: {sweep.GetProperty("points").GetInt32()}");
        Line(4, $"span: {R(D(sweep, "span_fraction") * 100)} %");

        var t = root.GetProperty("tolerance");
        Line(0, "tolerance:");
        Line(2, $"builds: {t.GetProperty("builds").GetInt32()}");
        Line(2, $"element_length: {R(D(t, "element_length_m"))} m");
        Line(2, $"element_rise: {R(D(t, "element_rise_m"))} m");
        Line(2, $"azimuth: {R(D(t, "azimuth_rad"))} rad");
        Line(2, $"wrap_thickness: {R(D(t, "wrap_thickness_fraction") * 100)} %");
        Line(2, $"seed: {t.GetProperty("seed").GetInt32()}");
        return y.ToString();
    }
}
