using Helipol.Design.Loading;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// The dielectric surroundings of an element wire (former, glue, tape wrap) as the field model
/// sees them: the element's cross-section (<see cref="ElementCrossSection"/>, solved by
/// <see cref="AddedInductance"/>) and the calibration factor on its added inductance
/// (1 = the field solve as is).
/// </summary>
public sealed record Surroundings(ElementCrossSection Section, double CalibrationFactor)
{
    /// <summary>
    /// A printed sleeve's groove is this many wire diameters deep, the wire on its floor (the same
    /// figure the sleeve is printed with, Geometry/FormerSleeve.cs).
    /// </summary>
    public const double GrooveDepthPerWireDiameter = 0.6;

    /// <summary>Formers that are printed sleeves with a groove per element; the others are foam (or nothing) the wire rests on.</summary>
    public static bool IsPrinted(string formerMaterial) => formerMaterial is "pla" or "petg";

    /// <summary>No dielectric anywhere: the wire in air.</summary>
    public static Surroundings None(double wireRadiusM) => new(ElementCrossSection.Bare(wireRadiusM), 1);

    /// <summary>
    /// From a design. The former's wall, (outer − bore)/2 deep, is flattened into a slab as wide as the
    /// former's radius either side (beyond that its surface has turned away by a radian). The outer
    /// diameter is the design's (the practice one when auto), so the search, which varies the
    /// diameter, and the final build share one cross-section: the far former changes S little.
    /// An <c>air</c> former means no former: it counts as vacuum unless the design file gives it a
    /// permittivity.
    /// </summary>
    public static Surroundings From(PolarizerDesign design, double calibrationFactor)
    {
        var p = design.Polarizer;
        double outerDiameterM = p.OuterDiameterOrPracticeM(design.Band.CenterHz);
        double a = p.Wire.RadiusM;
        double formerEps = p.Former.Material.Key == "air" && p.Former.RelativePermittivity.Source != Helipol.Model.Materials.SourcedValue.DesignFile ? 1 : p.Former.RelativePermittivity.Value;
        bool printed = IsPrinted(p.Former.Material.Key);
        double clearanceM = design.Fabrication.PrintClearanceMm * 1e-3;
        var section = new ElementCrossSection(
            a, formerEps, Math.Max(0, (outerDiameterM - p.Former.BoreM) / 2), outerDiameterM / 2,
            printed ? a + clearanceM / 2 : null, printed ? GrooveDepthPerWireDiameter * 2 * a : 0,
            p.Glue?.RelativePermittivity.Value ?? 1, p.Glue?.ThicknessM ?? 0,
            p.Wrap?.RelativePermittivity.Value ?? 1, p.Wrap?.TotalThicknessM ?? 0, p.Wrap?.TentDistanceM);
        return new Surroundings(section, calibrationFactor);
    }

    /// <summary>How many times the section's wrap thickness the wrap is (the tolerance analysis varies it).</summary>
    public double WrapScale { get; init; } = 1;

    /// <summary>The same surroundings with the wrap <paramref name="scale"/> times as thick (tolerance analysis).</summary>
    public Surroundings WithWrapScaled(double scale) => this with { WrapScale = WrapScale * scale };

    /// <summary>S = L′/(μ0/2π) of the section with its wrap scaled (interpolated between a few solved thicknesses, <see cref="WrapScaleInterpolation"/>).</summary>
    public double ShapeFactor => WrapScaleInterpolation.ShapeFactor(Section, WrapScale);

    /// <summary>Added inductance per unit length, calibration included, H/m.</summary>
    public double AddedInductanceHPerM => CalibrationFactor * Helipol.Engine.PhysicalConstants.Mu0 / (2 * Math.PI) * ShapeFactor;

    /// <summary>The engine coating for the wire, or null when nothing loads it.</summary>
    public Helipol.Engine.DielectricCoating? CoatingFor(double wireRadiusM) => EffectiveCoating.For(this with { Section = Section with { WireRadiusM = wireRadiusM } });
}
