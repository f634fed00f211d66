using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using Helipol.Model.Materials;

namespace Helipol.Model;

/// <summary>
/// The resolved design as JSON (<c>design.json</c>): every number the later files are made from,
/// with its unit in its name. Deterministic by construction: fixed key order, numbers in the
/// shortest round-trip form (culture-independent), "\n" line ends, no timestamps.
/// </summary>
public static class DesignJson
{
    public const int FormatVersion = 1;

    public static string Write(PolarizerDesign design)
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, new JsonWriterOptions
               {
                   Indented = true,
                   NewLine = "\n",
                   Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
               }))
        {
            json.WriteStartObject();
            json.WriteNumber("format_version", FormatVersion);
            json.WriteString("name", design.Name);

            var band = design.Band;
            json.WriteStartObject("band");
            json.WriteNumber("center_hz", band.CenterHz);
            json.WriteNumber("low_hz", band.LowHz);
            json.WriteNumber("high_hz", band.HighHz);
            json.WriteBoolean("edges_given", band.EdgesGiven);
            json.WriteNumber("wavelength_m", band.WavelengthM);
            json.WriteEndObject();

            var whip = design.Whip;
            json.WriteStartObject("whip");
            json.WriteString("kind", whip.Kind == WhipKind.Monopole ? "monopole" : "dipole");
            json.WriteNumber("length_m", whip.LengthM);
            json.WriteNumber("diameter_m", whip.DiameterM);
            NumberOrNull(json, "cover_diameter_m", whip.CoverDiameterM);
            json.WriteEndObject();

            WritePolarizer(json, design);
            WriteFabrication(json, design.Fabrication);
            WriteSolve(json, design.Solve);
            WriteTolerance(json, design.Tolerance);

            if (design.Calibration is { } calibration) json.WriteString("calibration", calibration.Written);
            else json.WriteNull("calibration");

            var practice = design.Practice;
            json.WriteStartObject("practice_scaling");
            json.WriteString("label", PracticeScaling.Label);
            json.WriteNumber("reference_frequency_hz", PracticeScaling.ReferenceFrequencyHz);
            json.WriteNumber("element_count", practice.Count);
            json.WriteNumber("element_length_m", practice.LengthM);
            json.WriteNumber("element_rise_m", practice.RiseM);
            json.WriteNumber("outer_diameter_m", practice.OuterDiameterM);
            json.WriteNumber("element_axis_radius_m", practice.AxisRadiusM);
            json.WriteNumber("arc_angle_rad", practice.ArcAngleRad);
            json.WriteNumber("pitch_angle_rad", practice.PitchAngleRad);
            json.WriteString("winding", Word(PracticeScaling.WindingFor(design.Polarizer.Sense)));
            json.WriteEndObject();

            json.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.ToArray()) + "\n";
    }

    private static void WritePolarizer(Utf8JsonWriter json, PolarizerDesign design)
    {
        var p = design.Polarizer;
        json.WriteStartObject("polarizer");
        json.WriteString("sense", p.Sense == Sense.Lhcp ? "lhcp" : "rhcp");
        json.WriteString("winding", Word(p.Winding));
        NumberOrAuto(json, "elements", p.ElementCount);
        NumberOrAuto(json, "element_length_m", p.ElementLengthM);
        NumberOrAuto(json, "element_rise_m", p.ElementRiseM);
        json.WriteNumber("centre_height_m", p.CentreHeightM);

        json.WriteStartObject("wire");
        json.WriteNumber("diameter_m", p.Wire.DiameterM);
        json.WriteString("material", p.Wire.Material.Key);
        if (p.Wire.ConductivitySPerM is { } sigma) Sourced(json, "conductivity_s_per_m", sigma);
        else json.WriteNull("conductivity_s_per_m");
        Sourced(json, "relative_permeability", p.Wire.RelativePermeability);
        json.WriteEndObject();

        json.WriteStartObject("former");
        json.WriteString("material", p.Former.Material.Key);
        NumberOrAuto(json, "outer_diameter_m", p.Former.OuterDiameterM);
        json.WriteNumber("bore_m", p.Former.BoreM);
        json.WriteNumber("height_m", p.Former.HeightM);
        Sourced(json, "relative_permittivity", p.Former.RelativePermittivity);
        Sourced(json, "loss_tangent", p.Former.LossTangent);
        json.WriteEndObject();

        if (p.Wrap is { } wrap)
        {
            json.WriteStartObject("wrap");
            json.WriteString("material", wrap.Material.Key);
            Sourced(json, "layer_thickness_m", wrap.LayerThicknessM);
            json.WriteNumber("layers", wrap.Layers);
            json.WriteNumber("total_thickness_m", wrap.TotalThicknessM);
            if (wrap.TentDistanceM is { } tent) json.WriteNumber("tent_m", tent); else json.WriteNull("tent_m");
            Sourced(json, "relative_permittivity", wrap.RelativePermittivity);
            Sourced(json, "loss_tangent", wrap.LossTangent);
            json.WriteEndObject();
        }
        else json.WriteNull("wrap");

        if (p.Glue is { } glue)
        {
            json.WriteStartObject("glue");
            json.WriteString("material", glue.Material.Key);
            json.WriteNumber("thickness_m", glue.ThicknessM);
            Sourced(json, "relative_permittivity", glue.RelativePermittivity);
            Sourced(json, "loss_tangent", glue.LossTangent);
            json.WriteEndObject();
        }
        else json.WriteNull("glue");
        json.WriteEndObject();
    }

    private static void WriteFabrication(Utf8JsonWriter json, FabricationSettings f)
    {
        json.WriteStartObject("fabrication");
        json.WriteNumber("kerf_mm", f.KerfMm);
        json.WriteNumber("rings", f.Rings);
        json.WriteNumber("board_width_mm", f.BoardWidthMm);
        json.WriteNumber("board_height_mm", f.BoardHeightMm);
        json.WriteNumber("board_thickness_mm", f.BoardThicknessMm);
        json.WriteNumber("print_clearance_mm", f.PrintClearanceMm);
        json.WriteString("paper", f.Paper == Paper.Letter ? "letter" : "a4");
        json.WriteNumber("dpi", f.Dpi);
        json.WriteEndObject();
    }

    private static void WriteSolve(Utf8JsonWriter json, SolveOptions s)
    {
        json.WriteStartObject("solve");
        json.WriteString("objective", s.Objective == Objective.MeanAxialRatio ? "mean-ar" : "worst-ar");
        json.WriteNumber("elevation_from_rad", s.ElevationFromRad);
        json.WriteNumber("elevation_to_rad", s.ElevationToRad);
        json.WriteNumber("elevation_step_rad", s.ElevationStepRad);
        json.WriteNumber("azimuth_step_rad", s.AzimuthStepRad);
        json.WriteNumber("azimuth_span_rad", s.AzimuthSpanRad);
        json.WriteNumber("axial_ratio_limit_db", s.AxialRatioLimitDb);
        json.WriteNumber("receiver_impedance_ohm", s.ReceiverOhm);
        json.WriteNumber("frequencies", s.FrequencyCount);
        json.WriteNumber("gain_weight", s.GainWeight);
        json.WriteStartObject("search");
        json.WriteNumber("elements_min", s.Search.ElementCountMin);
        json.WriteNumber("elements_max", s.Search.ElementCountMax);
        json.WriteNumber("element_length_min_m", s.Search.ElementLengthMinM);
        json.WriteNumber("element_length_max_m", s.Search.ElementLengthMaxM);
        json.WriteNumber("element_rise_min_m", s.Search.ElementRiseMinM);
        json.WriteNumber("element_rise_max_m", s.Search.ElementRiseMaxM);
        json.WriteNumber("outer_diameter_min_m", s.Search.OuterDiameterMinM);
        json.WriteNumber("outer_diameter_max_m", s.Search.OuterDiameterMaxM);
        json.WriteNumber("grid", s.Search.GridPoints);
        json.WriteEndObject();
        json.WriteStartObject("sweep");
        json.WriteNumber("points", s.Sweep.Points);
        json.WriteNumber("span_fraction", s.Sweep.SpanFraction);
        json.WriteEndObject();
        json.WriteEndObject();
    }

    private static void WriteTolerance(Utf8JsonWriter json, ToleranceOptions t)
    {
        json.WriteStartObject("tolerance");
        json.WriteNumber("builds", t.Builds);
        json.WriteNumber("element_length_m", t.ElementLengthM);
        json.WriteNumber("element_rise_m", t.ElementRiseM);
        json.WriteNumber("azimuth_rad", t.AzimuthRad);
        json.WriteNumber("wrap_thickness_fraction", t.WrapThicknessFraction);
        json.WriteNumber("seed", t.Seed);
        json.WriteEndObject();
    }

    private static string Word(Winding winding) => winding switch { Winding.Left => "left", Winding.Right => "right", _ => "auto" };

    private static void Sourced(Utf8JsonWriter json, string name, SourcedValue value)
    {
        json.WriteStartObject(name);
        json.WriteNumber("value", value.Value);
        json.WriteString("source", value.Source);
        json.WriteEndObject();
    }

    private static void NumberOrNull(Utf8JsonWriter json, string name, double? value)
    {
        if (value is { } v) json.WriteNumber(name, v);
        else json.WriteNull(name);
    }

    private static void NumberOrAuto(Utf8JsonWriter json, string name, double? value)
    {
        if (value is { } v) json.WriteNumber(name, v);
        else json.WriteString(name, "auto");
    }

    private static void NumberOrAuto(Utf8JsonWriter json, string name, int? value)
    {
        if (value is { } v) json.WriteNumber(name, v);
        else json.WriteString(name, "auto");
    }
}
