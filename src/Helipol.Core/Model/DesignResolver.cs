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
            Keys.WhipKind.From(doc),
            doc.Si(Keys.WhipLength)!.Value,
            doc.Si(Keys.WhipDiameter)!.Value,
            doc.Si(Keys.WhipCoverDiameter));
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
        var center = doc.Si(Keys.BandCenter)!.Value;
        var low = doc.Si(Keys.BandLow) ?? center * (1 - Band.DefaultHalfWidthFraction);
        var high = doc.Si(Keys.BandHigh) ?? center * (1 + Band.DefaultHalfWidthFraction);
        var given = doc.Find(Keys.BandLow) is not null || doc.Find(Keys.BandHigh) is not null;
        if (low >= high)
            errors.Add(doc.MarkOf(doc.Find(Keys.BandLow) is not null ? Keys.BandLow : Keys.BandHigh),
                doc.Find(Keys.BandLow) is not null ? Keys.BandLow : Keys.BandHigh,
                $"low {Hz(low)} and high {Hz(high)}", $"{Keys.BandLow} below {Keys.BandHigh}");
        else if (center < low || center > high)
            errors.Add(doc.MarkOf(Keys.BandCenter), Keys.BandCenter, doc.WrittenOf(Keys.BandCenter), $"a center between {Keys.BandLow} ({Hz(low)}) and {Keys.BandHigh} ({Hz(high)})");
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
        var metal = MaterialTable.Conductor(doc.Choice(Keys.PolarizerWireMaterial));
        SourcedValue? conductivity = metal.ConductivitySPerM is null && doc.Find(Keys.PolarizerWireConductivity) is null
            ? null
            : Override(doc, Keys.PolarizerWireConductivity, metal.ConductivitySPerM ?? new SourcedValue(double.PositiveInfinity, "perfect conductor"));
        var wire = new ElementWire(doc.Si(Keys.PolarizerWireDiameter)!.Value, metal, conductivity,
            Override(doc, Keys.PolarizerWirePermeability, metal.RelativePermeability));

        var formerMaterial = MaterialTable.Former(doc.Choice(Keys.PolarizerFormerMaterial));
        var former = new Former(formerMaterial, doc.Si(Keys.PolarizerFormerOuterDiameter),
            doc.Si(Keys.PolarizerFormerBore)!.Value, doc.Si(Keys.PolarizerFormerHeight)!.Value,
            Override(doc, Keys.PolarizerFormerPermittivity, formerMaterial.RelativePermittivity),
            Override(doc, Keys.PolarizerFormerLossTangent, formerMaterial.LossTangent));

        Wrap? wrap = null;
        if (!doc.IsNone(Keys.PolarizerWrap))
        {
            var tape = MaterialTable.Wrap(doc.Choice(Keys.PolarizerWrapMaterial));
            wrap = new Wrap(tape, Override(doc, Keys.PolarizerWrapThickness, tape.TypicalThicknessM!), doc.Integer(Keys.PolarizerWrapLayers),
                Override(doc, Keys.PolarizerWrapPermittivity, tape.RelativePermittivity),
                Override(doc, Keys.PolarizerWrapLossTangent, tape.LossTangent)) { TentDistanceM = doc.Si(Keys.PolarizerWrapTent) };
        }

        Glue? glue = null;
        if (!doc.IsNone(Keys.PolarizerGlue))
        {
            var adhesive = MaterialTable.Glue(doc.Choice(Keys.PolarizerGlueMaterial));
            glue = new Glue(adhesive, doc.Si(Keys.PolarizerGlueThickness)!.Value,
                Override(doc, Keys.PolarizerGluePermittivity, adhesive.RelativePermittivity), adhesive.LossTangent);
        }

        return new Polarizer(
            Keys.PolarizerSense.From(doc),
            Keys.PolarizerWinding.From(doc),
            doc.Find(Keys.PolarizerElements) is IntegerValue count ? count.Value : null,
            doc.Si(Keys.PolarizerElementLength),
            doc.Si(Keys.PolarizerElementRise),
            doc.Si(Keys.PolarizerCentreHeight)!.Value,
            wire, former, wrap, glue);
    }

    private static FabricationSettings ResolveFabrication(SpecDocument doc)
    {
        double Mm(string path) => doc.Si(path)!.Value * 1e3;
        return new FabricationSettings(Mm(Keys.FabricationKerf), doc.Integer(Keys.FabricationRings),
            Mm(Keys.FabricationBoardWidth), Mm(Keys.FabricationBoardHeight), Mm(Keys.FabricationBoardThickness),
            Mm(Keys.FabricationPrintClearance), Keys.FabricationPaper.From(doc),
            doc.Integer(Keys.FabricationDpi));
    }

    /// <summary>
    /// Elevation window defaults: ±30° around the horizon for a dipole; 10° to 50° for a monopole,
    /// because over a perfect ground the horizontal field vanishes at grazing incidence (image theory).
    /// </summary>
    private static SolveOptions ResolveSolve(SpecDocument doc, Whip whip, Polarizer polarizer, Band band, SpecErrors errors)
    {
        const double Deg = Math.PI / 180;
        var monopole = whip.Kind == WhipKind.Monopole;
        var from = doc.Si(Keys.SolveElevationsFrom) ?? (monopole ? 10 : -30) * Deg;
        var to = doc.Si(Keys.SolveElevationsTo) ?? (monopole ? 50 : 30) * Deg;
        if (from >= to)
        {
            var at = doc.Find(Keys.SolveElevationsTo) is not null ? Keys.SolveElevationsTo : Keys.SolveElevationsFrom;
            errors.Add(doc.MarkOf(at), at, $"from {QuantityKind.Angle.FormatSi(from)} to {QuantityKind.Angle.FormatSi(to)}", $"{Keys.SolveElevationsFrom} below {Keys.SolveElevationsTo}");
        }

        var lengthRange = doc.Find(Keys.SolveSearchElementLength) as PairValue;
        var riseRange = doc.Find(Keys.SolveSearchElementRise) as PairValue;
        var diameterRange = doc.Find(Keys.SolveSearchOuterDiameter) as PairValue;
        var counts = doc.Get<PairValue>(Keys.SolveSearchElements);
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
            doc.Integer(Keys.SolveSearchGrid));

        return new SolveOptions(
            Keys.SolveObjective.From(doc),
            from, to, doc.Si(Keys.SolveElevationStep)!.Value, doc.Si(Keys.SolveAzimuthStep)!.Value,
            doc.Integer(Keys.SolveFrequencies), doc.Number(Keys.SolveGainWeight)!.Value, search,
            new SweepOptions(doc.Integer(Keys.SolveSweepPoints), doc.Si(Keys.SolveSweepSpan)!.Value))
        {
            AzimuthSpanRad = doc.Si(Keys.SolveAzimuthSpan)!.Value,
            AxialRatioLimitDb = doc.Si(Keys.SolveAxialRatioLimit)!.Value,
            ReceiverOhm = doc.Si(Keys.SolveReceiverImpedance)!.Value,
        };
    }

    private static double? Low(PairValue? pair) => pair?.Low is QuantityValue q ? q.Si : null;
    private static double? High(PairValue? pair) => pair?.High is QuantityValue q ? q.Si : null;

    private static ToleranceOptions ResolveTolerance(SpecDocument doc) => new(
        doc.Integer(Keys.ToleranceBuilds),
        doc.Si(Keys.ToleranceElementLength)!.Value,
        doc.Si(Keys.ToleranceElementRise)!.Value,
        doc.Si(Keys.ToleranceAzimuth)!.Value,
        doc.Si(Keys.ToleranceWrapThickness)!.Value,
        doc.Integer(Keys.ToleranceSeed));

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
