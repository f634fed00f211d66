using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// The dielectric surroundings of an element wire (former contact, glue, tape wrap) as the field
/// model sees them: an <b>effective coating</b>. See <see cref="EffectiveCoating"/> for the model and
/// its assumptions. Thicknesses in metres.
/// </summary>
public sealed record Surroundings(
    double FormerPermittivity,
    double GluePermittivity,
    double GlueThicknessM,
    double WrapPermittivity,
    double WrapThicknessM,
    double CoveredFraction,
    double CalibrationFactor)
{
    /// <summary>
    /// Share of the wire's circumference under glue and tape; the rest lies against the former.
    /// A round wire laid on a cylinder and taped over touches the former along its inner half
    /// and the tape along its outer half (common practice, no source: it is how the parts sit).
    /// </summary>
    public const double DefaultCoveredFraction = 0.5;

    /// <summary>No dielectric anywhere: the wire in air.</summary>
    public static Surroundings None { get; } = new(1, 1, 0, 1, 0, DefaultCoveredFraction, 1);

    /// <summary>
    /// From a design. An <c>air</c> former means no former at all: it counts as vacuum (εr = 1), so
    /// <c>pec</c> wire, <c>air</c> and <c>wrap: none</c> give a model with no dielectric.
    /// </summary>
    public static Surroundings From(Polarizer p, double calibrationFactor) => new(
        p.Former.Material.Key == "air" && p.Former.RelativePermittivity.Source != Helipol.Model.Materials.SourcedValue.DesignFile ? 1 : p.Former.RelativePermittivity.Value,
        p.Glue?.RelativePermittivity.Value ?? 1, p.Glue?.ThicknessM ?? 0,
        p.Wrap?.RelativePermittivity.Value ?? 1, p.Wrap?.TotalThicknessM ?? 0,
        DefaultCoveredFraction, calibrationFactor);

    /// <summary>The same surroundings with the wrap <paramref name="scale"/> times as thick (tolerance analysis).</summary>
    public Surroundings WithWrapScaled(double scale) => this with { WrapThicknessM = WrapThicknessM * scale };

    /// <summary>The engine coating for a wire of radius <paramref name="wireRadiusM"/>, or null when nothing loads it.</summary>
    public DielectricCoating? CoatingFor(double wireRadiusM) => EffectiveCoating.For(this, wireRadiusM);
}
