namespace Helipol.Model;

/// <summary>
/// A handle on one key of the design file's table (Spec/DesignKeys): layers past the Spec reader
/// name a key through these, never by typing its path, so a renamed key breaks the build, not a message.
/// The path converts to the string the Spec document is indexed by.
/// </summary>
public record DesignKey(string Path)
{
    public static implicit operator string(DesignKey key) => key.Path;

    /// <summary>The table's entry: what the key accepts, its default and its meaning.</summary>
    public Spec.Fields.FieldDefinition Field => Spec.DesignKeys.Walk(Spec.DesignKeys.Root, "").First(e => e.Path == Path).Field;

    public override string ToString() => Path;
}

/// <summary>A key whose value is one word of a fixed list, bound to the enum it stands for.</summary>
public sealed record ChoiceKey<T>(string Path, WordMap<T> Words) : DesignKey(Path) where T : struct, Enum
{
    /// <summary>The value the (already checked) document holds for this key.</summary>
    public T From(Spec.SpecDocument doc) => Words.Value(doc.Choice(Path));

    public override string ToString() => Path;
}

/// <summary>
/// Every key of the design file as a <see cref="DesignKey"/>, in table order. Each path is checked
/// against the table when the class is first used, and a test checks that no table key is missing here.
/// </summary>
public static class Keys
{
    public static readonly DesignKey Name = Known("name");

    public static readonly DesignKey Band = Known("band");
    public static readonly DesignKey BandCenter = Known("band.center");
    public static readonly DesignKey BandLow = Known("band.low");
    public static readonly DesignKey BandHigh = Known("band.high");

    public static readonly DesignKey Whip = Known("whip");
    public static readonly ChoiceKey<Model.WhipKind> WhipKind = Choice("whip.kind", ChoiceWords.WhipKind);
    public static readonly DesignKey WhipLength = Known("whip.length");
    public static readonly DesignKey WhipDiameter = Known("whip.diameter");
    public static readonly DesignKey WhipCoverDiameter = Known("whip.cover_diameter");

    public static readonly DesignKey Polarizer = Known("polarizer");
    public static readonly ChoiceKey<Model.Sense> PolarizerSense = Choice("polarizer.sense", ChoiceWords.Sense);
    public static readonly ChoiceKey<Model.Winding> PolarizerWinding = Choice("polarizer.winding", ChoiceWords.Winding);
    public static readonly DesignKey PolarizerElements = Known("polarizer.elements");
    public static readonly DesignKey PolarizerElementLength = Known("polarizer.element_length");
    public static readonly DesignKey PolarizerElementRise = Known("polarizer.element_rise");
    public static readonly DesignKey PolarizerCentreHeight = Known("polarizer.centre_height");
    public static readonly DesignKey PolarizerWire = Known("polarizer.wire");
    public static readonly DesignKey PolarizerWireDiameter = Known("polarizer.wire.diameter");
    public static readonly DesignKey PolarizerWireMaterial = Known("polarizer.wire.material");
    public static readonly DesignKey PolarizerWireConductivity = Known("polarizer.wire.conductivity");
    public static readonly DesignKey PolarizerWirePermeability = Known("polarizer.wire.permeability");
    public static readonly DesignKey PolarizerFormer = Known("polarizer.former");
    public static readonly DesignKey PolarizerFormerMaterial = Known("polarizer.former.material");
    public static readonly DesignKey PolarizerFormerOuterDiameter = Known("polarizer.former.outer_diameter");
    public static readonly DesignKey PolarizerFormerBore = Known("polarizer.former.bore");
    public static readonly DesignKey PolarizerFormerHeight = Known("polarizer.former.height");
    public static readonly DesignKey PolarizerFormerPermittivity = Known("polarizer.former.permittivity");
    public static readonly DesignKey PolarizerFormerLossTangent = Known("polarizer.former.loss_tangent");
    public static readonly DesignKey PolarizerWrap = Known("polarizer.wrap");
    public static readonly DesignKey PolarizerWrapMaterial = Known("polarizer.wrap.material");
    public static readonly DesignKey PolarizerWrapThickness = Known("polarizer.wrap.thickness");
    public static readonly DesignKey PolarizerWrapLayers = Known("polarizer.wrap.layers");
    public static readonly DesignKey PolarizerWrapTent = Known("polarizer.wrap.tent");
    public static readonly DesignKey PolarizerWrapPermittivity = Known("polarizer.wrap.permittivity");
    public static readonly DesignKey PolarizerWrapLossTangent = Known("polarizer.wrap.loss_tangent");
    public static readonly DesignKey PolarizerGlue = Known("polarizer.glue");
    public static readonly DesignKey PolarizerGlueMaterial = Known("polarizer.glue.material");
    public static readonly DesignKey PolarizerGlueThickness = Known("polarizer.glue.thickness");
    public static readonly DesignKey PolarizerGluePermittivity = Known("polarizer.glue.permittivity");

    public static readonly DesignKey Fabrication = Known("fabrication");
    public static readonly DesignKey FabricationKerf = Known("fabrication.kerf");
    public static readonly DesignKey FabricationRings = Known("fabrication.rings");
    public static readonly DesignKey FabricationBoard = Known("fabrication.board");
    public static readonly DesignKey FabricationBoardWidth = Known("fabrication.board.width");
    public static readonly DesignKey FabricationBoardHeight = Known("fabrication.board.height");
    public static readonly DesignKey FabricationBoardThickness = Known("fabrication.board.thickness");
    public static readonly DesignKey FabricationPrintClearance = Known("fabrication.print_clearance");
    public static readonly ChoiceKey<Model.Paper> FabricationPaper = Choice("fabrication.paper", ChoiceWords.Paper);
    public static readonly DesignKey FabricationDpi = Known("fabrication.dpi");

    public static readonly DesignKey Solve = Known("solve");
    public static readonly ChoiceKey<Model.Objective> SolveObjective = Choice("solve.objective", ChoiceWords.Objective);
    public static readonly DesignKey SolveElevations = Known("solve.elevations");
    public static readonly DesignKey SolveElevationsFrom = Known("solve.elevations.from");
    public static readonly DesignKey SolveElevationsTo = Known("solve.elevations.to");
    public static readonly DesignKey SolveAzimuthSpan = Known("solve.azimuth_span");
    public static readonly DesignKey SolveAxialRatioLimit = Known("solve.axial_ratio_limit");
    public static readonly DesignKey SolveReceiverImpedance = Known("solve.receiver_impedance");
    public static readonly DesignKey SolveElevationStep = Known("solve.elevation_step");
    public static readonly DesignKey SolveAzimuthStep = Known("solve.azimuth_step");
    public static readonly DesignKey SolveFrequencies = Known("solve.frequencies");
    public static readonly DesignKey SolveGainWeight = Known("solve.gain_weight");
    public static readonly DesignKey SolveSearch = Known("solve.search");
    public static readonly DesignKey SolveSearchElements = Known("solve.search.elements");
    public static readonly DesignKey SolveSearchElementLength = Known("solve.search.element_length");
    public static readonly DesignKey SolveSearchElementRise = Known("solve.search.element_rise");
    public static readonly DesignKey SolveSearchOuterDiameter = Known("solve.search.outer_diameter");
    public static readonly DesignKey SolveSearchGrid = Known("solve.search.grid");
    public static readonly DesignKey SolveSweep = Known("solve.sweep");
    public static readonly DesignKey SolveSweepPoints = Known("solve.sweep.points");
    public static readonly DesignKey SolveSweepSpan = Known("solve.sweep.span");

    public static readonly DesignKey Tolerance = Known("tolerance");
    public static readonly DesignKey ToleranceBuilds = Known("tolerance.builds");
    public static readonly DesignKey ToleranceElementLength = Known("tolerance.element_length");
    public static readonly DesignKey ToleranceElementRise = Known("tolerance.element_rise");
    public static readonly DesignKey ToleranceAzimuth = Known("tolerance.azimuth");
    public static readonly DesignKey ToleranceWrapThickness = Known("tolerance.wrap_thickness");
    public static readonly DesignKey ToleranceSeed = Known("tolerance.seed");

    public static readonly DesignKey Calibration = Known("calibration");

    /// <summary>A choice key whose table choices must be exactly the word map's words, in order.</summary>
    private static ChoiceKey<T> Choice<T>(string path, WordMap<T> words) where T : struct, Enum =>
        Known(path).Field.Type is Spec.Fields.ChoiceField choice && choice.Choices.SequenceEqual(words.Words)
            ? new ChoiceKey<T>(path, words)
            : throw new InvalidOperationException($"{path}: the table's choices and the {typeof(T).Name} word map differ");

    private static DesignKey Known(string path) =>
        Spec.DesignKeys.AllKeyPaths().Contains(path, StringComparer.Ordinal)
            ? new DesignKey(path)
            : throw new InvalidOperationException($"{path} is not in the key table");
}
