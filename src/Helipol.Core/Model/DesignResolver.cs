using Helipol.Model.Materials;
using Helipol.Spec;

namespace Helipol.Model;

/// <summary>
/// Turns a checked <see cref="SpecDocument"/> into a <see cref="PolarizerDesign"/> in SI units:
/// resolves materials and overrides, applies defaults that depend on other keys, and refuses
/// geometry that cannot be built (every problem reported with the place of the key at fault).
/// </summary>
public static class DesignResolver
{
    public static PolarizerDesign ReadFile(string path, string? shownAs = null) => Resolve(SpecReader.ReadFile(path, shownAs));

    public static PolarizerDesign Resolve(SpecDocument doc)
    {
        var errors = new SpecErrors(doc.File);
        var band = ResolveBand(doc, errors);
        var whip = new Whip(
            doc.Choice("whip.kind") == "monopole" ? WhipKind.Monopole : WhipKind.Dipole,
            doc.Si("whip.length")!.Value,
            doc.Si("whip.diameter")!.Value,
            doc.Si("whip.cover_diameter"));
        var polarizer = ResolvePolarizer(doc);
        var design = new PolarizerDesign(
            doc.Get<TextValue>("name").Value,
            doc.File,
            band,
            whip,
            polarizer,
            ResolveFabrication(doc),
            ResolveSolve(doc, whip, polarizer, band, errors),
            ResolveTolerance(doc),
            ResolveCalibration(doc, errors));
        DesignChecks.Check(doc, design, errors);
        errors.ThrowIfAny();
        return design;
    }

    private static Band ResolveBand(SpecDocument doc, SpecErrors errors)
    {
        var center = doc.Si("band.center")!.Value;
        var low = doc.Si("band.low") ?? center * (1 - Band.DefaultHalfWidthFraction);
        var high = doc.Si("band.high") ?? center * (1 + Band.DefaultHalfWidthFraction);
        var given = doc.Find("band.low") is not null || doc.Find("band.high") is not null;
        if (low >= high)
            errors.Add(doc.MarkOf(doc.Find("band.low") is not null ? "band.low" : "band.high"),
                doc.Find("band.low") is not null ? "band.low" : "band.high",
                $"low {Hz(low)} and high {Hz(high)}", "band.low below band.high");
        else if (center < low || center > high)
            errors.Add(doc.MarkOf("band.center"), "band.center", doc.WrittenOf("band.center"), $"a center between band.low ({Hz(low)}) and band.high ({Hz(high)})");
        return new Band(center, low, high, given);
    }

    private static string Hz(double hz) => QuantityKind.Frequency.FormatSi(hz);

    private static SourcedValue Override(SpecDocument doc, string path, SourcedValue table) =>
        doc.Find(path) switch
        {
            NumberValue n => new SourcedValue(n.Value, SourcedValue.DesignFile),
            QuantityValue q => new SourcedValue(q.Si, SourcedValue.DesignFile),
            _ => table,
        };

    private static Polarizer ResolvePolarizer(SpecDocument doc)
    {
        var metal = MaterialTable.Conductor(doc.Choice("polarizer.wire.material"));
        SourcedValue? conductivity = metal.ConductivitySPerM is null && doc.Find("polarizer.wire.conductivity") is null
            ? null
            : Override(doc, "polarizer.wire.conductivity", metal.ConductivitySPerM ?? new SourcedValue(double.PositiveInfinity, "perfect conductor"));
        var wire = new Wire(doc.Si("polarizer.wire.diameter")!.Value, metal, conductivity,
            Override(doc, "polarizer.wire.permeability", metal.RelativePermeability));

        var formerMaterial = MaterialTable.Former(doc.Choice("polarizer.former.material"));
        var former = new Former(formerMaterial, doc.Si("polarizer.former.outer_diameter"),
            doc.Si("polarizer.former.bore")!.Value, doc.Si("polarizer.former.height")!.Value,
            Override(doc, "polarizer.former.permittivity", formerMaterial.RelativePermittivity),
            Override(doc, "polarizer.former.loss_tangent", formerMaterial.LossTangent));

        Wrap? wrap = null;
        if (!doc.IsNone("polarizer.wrap"))
        {
            var tape = MaterialTable.Wrap(doc.Choice("polarizer.wrap.material"));
            wrap = new Wrap(tape, Override(doc, "polarizer.wrap.thickness", tape.TypicalThicknessM!), doc.Integer("polarizer.wrap.layers"),
                Override(doc, "polarizer.wrap.permittivity", tape.RelativePermittivity),
                Override(doc, "polarizer.wrap.loss_tangent", tape.LossTangent)) { TentDistanceM = doc.Si("polarizer.wrap.tent") };
        }

        Glue? glue = null;
        if (!doc.IsNone("polarizer.glue"))
        {
            var adhesive = MaterialTable.Glue(doc.Choice("polarizer.glue.material"));
            glue = new Glue(adhesive, doc.Si("polarizer.glue.thickness")!.Value,
                Override(doc, "polarizer.glue.permittivity", adhesive.RelativePermittivity), adhesive.LossTangent);
        }

        return new Polarizer(
            doc.Choice("polarizer.sense") == "lhcp" ? Sense.Lhcp : Sense.Rhcp,
            doc.Choice("polarizer.winding") switch { "left" => Winding.Left, "right" => Winding.Right, _ => Winding.Auto },
            doc.Find("polarizer.elements") is IntegerValue count ? count.Value : null,
            doc.Si("polarizer.element_length"),
            doc.Si("polarizer.element_rise"),
            doc.Si("polarizer.centre_height")!.Value,
            wire, former, wrap, glue);
    }

    private static FabricationSettings ResolveFabrication(SpecDocument doc)
    {
        double Mm(string path) => doc.Si(path)!.Value * 1e3;
        return new FabricationSettings(Mm("fabrication.kerf"), doc.Integer("fabrication.rings"),
            Mm("fabrication.board.width"), Mm("fabrication.board.height"), Mm("fabrication.board.thickness"),
            Mm("fabrication.print_clearance"), doc.Choice("fabrication.paper") == "letter" ? Paper.Letter : Paper.A4,
            doc.Integer("fabrication.dpi"));
    }

    /// <summary>
    /// Elevation window defaults: ±30° around the horizon for a dipole; 10° to 50° for a monopole,
    /// because over a perfect ground the horizontal field vanishes at grazing incidence (image theory).
    /// </summary>
    private static SolveOptions ResolveSolve(SpecDocument doc, Whip whip, Polarizer polarizer, Band band, SpecErrors errors)
    {
        const double Deg = Math.PI / 180;
        var monopole = whip.Kind == WhipKind.Monopole;
        var from = doc.Si("solve.elevations.from") ?? (monopole ? 10 : -30) * Deg;
        var to = doc.Si("solve.elevations.to") ?? (monopole ? 50 : 30) * Deg;
        if (from >= to)
        {
            var at = doc.Find("solve.elevations.to") is not null ? "solve.elevations.to" : "solve.elevations.from";
            errors.Add(doc.MarkOf(at), at, $"from {QuantityKind.Angle.FormatSi(from)} to {QuantityKind.Angle.FormatSi(to)}", "solve.elevations.from below solve.elevations.to");
        }

        var lengthRange = doc.Find("solve.search.element_length") as PairValue;
        var riseRange = doc.Find("solve.search.element_rise") as PairValue;
        var diameterRange = doc.Find("solve.search.outer_diameter") as PairValue;
        var counts = doc.Get<PairValue>("solve.search.elements");
        var practiceRise = PracticeScaling.ElementRiseM(band.CenterHz);
        var practiceDiameter = polarizer.OuterDiameterOrPracticeM(band.CenterHz);
        var search = new SearchOptions(
            ((IntegerValue)counts.Low).Value, ((IntegerValue)counts.High).Value,
            Low(lengthRange) ?? 0.6 * PracticeScaling.ElementLengthM(band.CenterHz),
            High(lengthRange) ?? 1.6 * PracticeScaling.ElementLengthM(band.CenterHz),
            Low(riseRange) ?? 0.3 * Math.Min(practiceRise, polarizer.Former.HeightM),
            High(riseRange) ?? Math.Min(1.5 * practiceRise, polarizer.Former.HeightM),
            Low(diameterRange) ?? Math.Max(0.7 * practiceDiameter, polarizer.Former.BoreM + 2 * polarizer.MinimumWallM),
            High(diameterRange) ?? Math.Max(1.4 * practiceDiameter, polarizer.Former.BoreM + 4 * polarizer.MinimumWallM),
            doc.Integer("solve.search.grid"));

        return new SolveOptions(
            doc.Choice("solve.objective") == "mean-ar" ? Objective.MeanAxialRatio : Objective.WorstAxialRatio,
            from, to, doc.Si("solve.elevation_step")!.Value, doc.Si("solve.azimuth_step")!.Value,
            doc.Integer("solve.frequencies"), doc.Number("solve.gain_weight")!.Value, search,
            new SweepOptions(doc.Integer("solve.sweep.points"), doc.Si("solve.sweep.span")!.Value))
        {
            AzimuthSpanRad = doc.Si("solve.azimuth_span")!.Value,
            AxialRatioLimitDb = doc.Si("solve.axial_ratio_limit")!.Value,
            ReceiverOhm = doc.Si("solve.receiver_impedance")!.Value,
        };
    }

    private static double? Low(PairValue? pair) => pair?.Low is QuantityValue q ? q.Si : null;
    private static double? High(PairValue? pair) => pair?.High is QuantityValue q ? q.Si : null;

    private static ToleranceOptions ResolveTolerance(SpecDocument doc) => new(
        doc.Integer("tolerance.builds"),
        doc.Si("tolerance.element_length")!.Value,
        doc.Si("tolerance.element_rise")!.Value,
        doc.Si("tolerance.azimuth")!.Value,
        doc.Si("tolerance.wrap_thickness")!.Value,
        doc.Integer("tolerance.seed"));

    private static CalibrationReference? ResolveCalibration(SpecDocument doc, SpecErrors errors)
    {
        if (doc.Find("calibration") is not TextValue path) return null;
        var full = Path.GetFullPath(Path.Combine(doc.DesignFolder, path.Value));
        if (!File.Exists(full))
        {
            errors.Add(path.Mark, "calibration", $"'{path.Value}' (no such file next to the design)", "a path to an existing calibration file, relative to the design file");
            return null;
        }
        return new CalibrationReference(path.Value, full);
    }
}
