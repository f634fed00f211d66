using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;
using Helipol.Design;
using Helipol.Model;

namespace Helipol.Emit.Report;

/// <summary>
/// <c>design.json</c> with the solver's results: the resolved design as <see cref="DesignJson"/>
/// writes it, plus a <c>solved</c> object (geometry, calibration, band results, practice column,
/// search record, and the sweep and tolerance when given). Deterministic: fixed key order,
/// shortest round-trip numbers, non-finite numbers as null, "\n" line ends.
/// </summary>
public static class SolvedJson
{
    public static string Write(PolarizerDesign design, SolvedPolarizer solved, SweepResult? sweep = null, ToleranceResult? tolerance = null)
    {
        var root = JsonNode.Parse(DesignJson.Write(design))!.AsObject();
        root["solved"] = JsonNode.Parse(SolvedObject(design, solved, sweep, tolerance));
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, Options)) root.WriteTo(json);
        return Encoding.UTF8.GetString(buffer.ToArray()) + "\n";
    }

    private static readonly JsonWriterOptions Options = new() { Indented = true, NewLine = "\n", Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    private static string SolvedObject(PolarizerDesign design, SolvedPolarizer s, SweepResult? sweep, ToleranceResult? tolerance)
    {
        using var buffer = new MemoryStream();
        using (var j = new Utf8JsonWriter(buffer, Options))
        {
            j.WriteStartObject();
            j.WriteString("label", "solved by the method-of-moments field model");
            Layout(j, s.Layout, s.Winding);
            j.WriteString("sense", s.Sense == Sense.Lhcp ? "lhcp" : "rhcp");
            j.WriteStartObject("pinned");
            j.WriteBoolean("elements", s.CountPinned);
            j.WriteBoolean("element_length", s.LengthPinned);
            j.WriteBoolean("element_rise", s.RisePinned);
            j.WriteBoolean("outer_diameter", s.DiameterPinned);
            j.WriteBoolean("winding", s.WindingPinned);
            j.WriteEndObject();
            j.WriteStartObject("calibration");
            j.WriteString("material_set", s.Calibration.MaterialSet);
            j.WriteString("design_material_set", CoatingCalibration.MaterialSetOf(design.Polarizer));
            j.WriteBoolean("borrowed", s.Calibration.IsBorrowedFor(design.Polarizer));
            Number(j, "loading_factor", s.Calibration.Factor);
            j.WriteString("fitted_by", s.Calibration.FittedBy);
            j.WriteString("source", s.Calibration.Source);
            j.WriteEndObject();
            if (s.Loading is { } loading) WriteLoading(j, loading);
            var verdict = VerdictJudge.For(design, s, tolerance);
            j.WriteStartObject("verdict");
            j.WriteString("grade", verdict.Grade.Word());
            j.WriteStartArray("reasons");
            foreach (var reason in verdict.Reasons) j.WriteStringValue(reason);
            j.WriteEndArray();
            j.WriteString("next_step", verdict.NextStep);
            j.WriteString("figures", verdict.Figures);
            Number(j, "axial_ratio_limit_db", design.Solve.AxialRatioLimitDb);
            Number(j, "receiver_impedance_ohm", design.Solve.ReceiverOhm);
            j.WriteEndObject();
            // The search's score (axial ratio extended past linear into the wrong sense, less the weighted gain): not an axial ratio.
            Number(j, "objective_score", s.ObjectiveDb);
            // True worst axial ratio in the wanted sense over band and window; null where some direction has the wrong sense.
            Number(j, "worst_axial_ratio_db", s.WorstAxialRatioDb);
            j.WriteBoolean("wrong_sense_in_window", s.Points.Any(p => !p.AllWantedSense));
            Number(j, "mean_gain_dbic", s.MeanGainDbic);
            Number(j, "mean_realized_gain_dbic", s.MeanRealizedGainDbic);
            Points(j, "band", s.Points);
            Points(j, "bare_whip_band", s.BareWhip);

            j.WriteStartObject("practice");
            j.WriteString("label", PracticeScaling.Label);
            Layout(j, s.Practice.Layout, s.Practice.Winding);
            Number(j, "objective_score", s.Practice.ObjectiveDb);
            if (s.Practice.Problem is { } problem) j.WriteString("problem", problem);
            Points(j, "band", s.Practice.Points);
            j.WriteEndObject();

            j.WriteStartObject("search");
            j.WriteNumber("evaluations", s.Search.Evaluations);
            j.WriteNumber("field_solves", s.FieldSolves);
            j.WriteStartArray("steps");
            foreach (var step in s.Search.Steps) j.WriteStringValue(step);
            j.WriteEndArray();
            j.WriteStartArray("limits_reached");
            foreach (var limit in s.Search.LimitsReached) j.WriteStringValue(limit);
            j.WriteEndArray();
            j.WriteEndObject();

            if (sweep is not null)
            {
                j.WriteStartObject("sweep");
                Number(j, "elevation_deg", sweep.ElevationRad * 180 / Math.PI);
                Number(j, "best_axial_ratio_frequency_hz", sweep.BestArFrequencyHz);
                Number(j, "best_axial_ratio_db", sweep.BestArDb);
                j.WriteBoolean("best_axial_ratio_inside_sweep", sweep.BestArInsideSweep);
                Number(j, "axial_ratio_limit_db", sweep.LimitDb);
                Number(j, "axial_ratio_3db_low_hz", sweep.BandwidthLowHz);
                Number(j, "axial_ratio_3db_high_hz", sweep.BandwidthHighHz);
                Number(j, "axial_ratio_3db_bandwidth_hz", sweep.BandwidthHz);
                j.WriteStartArray("points");
                foreach (var p in sweep.Points)
                {
                    j.WriteStartObject();
                    Point(j, p.Polarizer);
                    Number(j, "bare_whip_vswr_50", p.BareWhipVswr50);
                    Number(j, "bare_whip_gain_dbic", p.BareWhipGainDbic);
                    Number(j, "bare_whip_realized_gain_dbic", p.BareWhipRealizedGainDbic);
                    Number(j, "bare_whip_vswr", p.BareWhipVswr);
                    j.WriteEndObject();
                }
                j.WriteEndArray();
                j.WriteEndObject();
            }
            if (tolerance is not null)
            {
                j.WriteStartObject("tolerance");
                j.WriteNumber("builds", tolerance.Builds);
                j.WriteNumber("seed", tolerance.Seed);
                Number(j, "yield", tolerance.Yield);
                Number(j, "axial_ratio_limit_db", tolerance.LimitDb);
                Number(j, "usable_yield", tolerance.UsableYield);
                Number(j, "cut_tolerance_mm", tolerance.CutToleranceMm);
                Number(j, "rise_tolerance_mm", tolerance.RiseToleranceMm);
                j.WriteString("cut_tolerance", tolerance.CutText);
                Number(j, "axial_ratio_db_p10", tolerance.ArP10Db);
                Number(j, "axial_ratio_db_p50", tolerance.ArP50Db);
                Number(j, "axial_ratio_db_p90", tolerance.ArP90Db);
                Number(j, "axial_ratio_db_per_mm_length", tolerance.ArPerMmLengthDb);
                Number(j, "axial_ratio_db_per_mm_rise", tolerance.ArPerMmRiseDb);
                Number(j, "best_ar_mhz_per_mm_length", tolerance.BestArMHzPerMmLength);
                Number(j, "best_ar_mhz_per_mm_rise", tolerance.BestArMHzPerMmRise);
                Number(j, "best_ar_frequency_hz", tolerance.BestArFrequencyHz);
                Number(j, "length_change_to_centre_mm", tolerance.LengthChangeToCentreMm);
                j.WriteString("trimming_hint", tolerance.TrimmingHint);
                j.WriteNumber("field_solves", tolerance.FieldSolves);
                j.WriteEndObject();
            }
            j.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    private static void Layout(Utf8JsonWriter j, ElementLayout l, Winding w)
    {
        j.WriteNumber("elements", l.Count);
        Number(j, "element_length_m", l.LengthM);
        Number(j, "element_rise_m", l.RiseM);
        Number(j, "outer_diameter_m", l.OuterDiameterM);
        Number(j, "element_axis_radius_m", l.AxisRadiusM);
        Number(j, "arc_angle_rad", l.ArcAngleRad);
        Number(j, "pitch_angle_rad", l.PitchAngleRad);
        j.WriteString("winding", w == Winding.Left ? "left" : "right");
    }

    private static void Points(Utf8JsonWriter j, string name, IReadOnlyList<FrequencySummary> points)
    {
        j.WriteStartArray(name);
        foreach (var p in points)
        {
            j.WriteStartObject();
            Point(j, p);
            j.WriteEndObject();
        }
        j.WriteEndArray();
    }

    private static void Point(Utf8JsonWriter j, FrequencySummary p)
    {
        Number(j, "frequency_hz", p.FrequencyHz);
        j.WriteStartArray("impedance_ohm");
        Value(j, p.ImpedanceOhm.Real);
        Value(j, p.ImpedanceOhm.Imaginary);
        j.WriteEndArray();
        WritePoint(j, p);
    }

    /// <summary>
    /// The fields of one frequency, shared with <c>analyze</c>: impedance and VSWR, realized gains
    /// against the receiver impedance, and the true axial ratio with its sense. <c>axial_ratio_db</c> is
    /// the deciding direction's (named in <c>worst_direction</c> with its own circular gains, from which it
    /// follows); <c>axial_ratio_db_worst_wanted_sense</c> is null when some direction has the wrong sense.
    /// </summary>
    public static void WritePoint(Utf8JsonWriter j, FrequencySummary p)
    {
        Number(j, "vswr_50", p.Vswr50);
        Number(j, "receiver_impedance_ohm", p.ReceiverOhm);
        Number(j, "vswr", p.Vswr);
        Number(j, "mismatch_db", p.MismatchDb);
        Number(j, "axial_ratio_db", p.Worst.AxialRatioDb);
        j.WriteString("axial_ratio_sense", SenseWord(p.Worst.Sense));
        Number(j, "axial_ratio_db_worst_wanted_sense", p.WorstWantedAxialRatioDb);
        Number(j, "wrong_sense_share", p.WrongSenseShare);
        j.WriteStartObject("worst_direction");
        Number(j, "elevation_deg", p.Worst.Direction.ElevationRad * 180 / Math.PI);
        Number(j, "azimuth_deg", p.Worst.Direction.AzimuthRad * 180 / Math.PI);
        Number(j, "gain_rhcp_dbic", p.Worst.GainRhcpDbic);
        Number(j, "gain_lhcp_dbic", p.Worst.GainLhcpDbic);
        Number(j, "axial_ratio_db", p.Worst.AxialRatioDb);
        j.WriteString("sense", SenseWord(p.Worst.Sense));
        j.WriteEndObject();
        Number(j, "axial_ratio_db_mean", p.MeanAxialRatioDb);
        Number(j, "axial_ratio_db_max", p.MaxAxialRatioDb);
        j.WriteString("sense", SenseWord(p.Sense));
        Number(j, "gain_rhcp_dbic", p.GainRhcpDbic);
        Number(j, "gain_lhcp_dbic", p.GainLhcpDbic);
        Number(j, "realized_gain_rhcp_dbic", p.RealizedGainRhcpDbic);
        Number(j, "realized_gain_lhcp_dbic", p.RealizedGainLhcpDbic);
    }

    public static string SenseWord(Helipol.Engine.PolarizationSense s) => s switch
    {
        Helipol.Engine.PolarizationSense.Rhcp => "RHCP",
        Helipol.Engine.PolarizationSense.Lhcp => "LHCP",
        _ => "linear",
    };

    private static void Number(Utf8JsonWriter j, string name, double? value)
    {
        if (value is { } v && double.IsFinite(v)) j.WriteNumber(name, v);
        else j.WriteNull(name);
    }

    private static void Value(Utf8JsonWriter j, double v)
    {
        if (double.IsFinite(v)) j.WriteNumberValue(v);
        else j.WriteNullValue();
    }

    /// <summary>The element loading: added inductance after the factor, the factor, the physics figure, layer shares, shortening.</summary>
    public static void WriteLoading(Utf8JsonWriter j, Helipol.Design.Loading.LoadingSummary l)
    {
        j.WriteStartObject("loading");
        Number(j, "added_inductance_h_per_m", l.AddedHPerM);
        Number(j, "factor", l.Factor);
        Number(j, "physics_added_inductance_h_per_m", l.PhysicsHPerM);
        j.WriteStartObject("layer_share");
        Number(j, "wrap", l.WrapShare);
        Number(j, "glue", l.GlueShare);
        Number(j, "former", l.FormerShare);
        j.WriteEndObject();
        Number(j, "shortening_percent", l.ShorteningPercent);
        j.WriteEndObject();
    }
}
