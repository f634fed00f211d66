using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// The one number that ties the loading model to real builds: a factor on the added inductance of
/// the dielectric around the elements (see <see cref="EffectiveCoating"/>), with what it is for and
/// how it was obtained. 1 = the field solve of the cross-section as is.
/// </summary>
public sealed record CoatingCalibration(string MaterialSet, double Factor, string FittedBy, string? FromDesign, string Source)
{
    /// <summary>
    /// Built-in default: 1, the field solve of the element's cross-section as is (Design/Loading).
    /// Full-wave FDTD of the same cross-sections (docs/fullwave) agrees with the solve's loading;
    /// the measured build of the trade below does not, and only a builder's own measurement
    /// (<c>helipol calibrate</c>) can say which holds for a given build.
    /// </summary>
    public const double DefaultFactor = 1;

    public static CoatingCalibration Default { get; } = new(
        "any", DefaultFactor, "none: the added inductance is the 2-D field solve of the element's cross-section",
        null, "built-in default: physics (field solve of the cross-section, Design/Loading)");

    /// <summary>
    /// The factor a spoken account of one build (common practice, no source) would need: a 5.8 GHz
    /// dipole whip with three steel elements of 16 mm at 12.7 mm rise on a 28 mm expanded-polystyrene
    /// plug under one wrap of PVC tape gave 7-8 dB between the right and the wrong winding into a
    /// circularly polarized receiver. The factor is the smallest for which the model of that build
    /// (tests/Helipol.Tests/data/designs/practice-foam-tape.yaml) predicts 7.5 dB; checked by
    /// Design/MeasuredBuildTests. Shown beside the model, never used by default.
    /// </summary>
    public const double PracticeAccountFactor = 5.6;

    /// <summary>The comparison row for reports (figures held by Design/MeasuredBuildTests).</summary>
    public const string DefaultComparison =
        "Comparison with a measured build of the trade (common practice, no source): 3 elements of 16 mm at 12.7 mm rise on foam under one PVC wrap gave 7-8 dB between the right and the wrong winding into a circularly polarized receiver, and +1.6 dB over the bare whip. " +
        "The field-solved loading (factor 1) predicts 1.9 dB and +1.0 dB for that build; matching the 7.5 dB contrast would need 5.6 times the solved loading, which full-wave checks of the same cross-section (docs/fullwave) do not support. " +
        "What would settle it: a measurement of your own build (a VNA sweep with and without the polarizer, or a spin test), fitted by `helipol calibrate`.";

    /// <summary>The calibration a design uses: its calibration file, else the built-in default.</summary>
    public static CoatingCalibration For(PolarizerDesign design) =>
        design.Calibration is { } reference
            ? CalibrationFile.Read(reference.FullPath, reference.Written, Path.Combine(Path.GetDirectoryName(design.SourceFile) ?? "", reference.Written))
            : Default;

    /// <summary>
    /// True when this calibration was measured on other materials than <paramref name="p"/> is made of
    /// (a calibration file fitted on one build is borrowed by a design of other materials; the built-in
    /// default, physics, belongs to every material set).
    /// </summary>
    public bool IsBorrowedFor(Polarizer p) => MaterialSet != "any" && MaterialSet != MaterialSetOf(p);

    /// <summary>
    /// The factor and what it was measured on, for reports: a borrowed calibration says so, since its
    /// factor describes another material set's loading, not this design's.
    /// </summary>
    public string DescribeFor(Polarizer p) => IsBorrowedFor(p)
        ? FormattableString.Invariant($"calibration factor {Factor:0.###}, measured on {MaterialSet} and borrowed for this design's {MaterialSetOf(p)} (no build of these materials has been measured)")
        : MaterialSet == "any"
            ? FormattableString.Invariant($"calibration factor {Factor:0.###} for any material set")
            : FormattableString.Invariant($"calibration factor {Factor:0.###} for {MaterialSet}");

    /// <summary>The material set a design's surroundings belong to, as written in calibration files.</summary>
    public static string MaterialSetOf(Polarizer p)
    {
        var parts = new List<string> { p.Former.Material.Key };
        if (p.Glue is { } g) parts.Add(g.Material.Key);
        if (p.Wrap is { } w) parts.Add(w.Material.Key);
        return string.Join(" + ", parts);
    }
}
